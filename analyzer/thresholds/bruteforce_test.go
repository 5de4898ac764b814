package thresholds

import (
	"go/types"
	"math"
	"math/big"
	"testing"
)

// scan is the outside reference for every Limit: the first n ≥ from at
// which value(n) exceeds max, by trying n = from, from+1, … in math/big.
func scan(from int64, max *big.Int, value func(int64) *big.Int) int64 {
	for n := from; ; n++ {
		if value(n).CmpAbs(max) > 0 {
			return n
		}
	}
}

// scanPred is scan for a predicate that reports a break at n.
func scanPred(from int64, breaks func(int64) bool) int64 {
	for n := from; ; n++ {
		if breaks(n) {
			return n
		}
	}
}

func refFactorial(n int64) *big.Int {
	z := big.NewInt(1)
	for i := int64(2); i <= n; i++ {
		z.Mul(z, big.NewInt(i))
	}
	return z
}

func refDouble(n int64) *big.Int {
	z := big.NewInt(1)
	for i := n; i > 1; i -= 2 {
		z.Mul(z, big.NewInt(i))
	}
	return z
}

func refCentral(n int64) *big.Int { return new(big.Int).Binomial(n, n/2) }

func refCatalan(n int64) *big.Int {
	c := new(big.Int).Binomial(2*n, n)
	return c.Div(c, big.NewInt(n+1))
}

// exactIn reports whether the integer x converts to the float type of
// t and back unchanged.
func exactIn(t Num, x *big.Int) bool {
	f := new(big.Float).SetInt(x)
	var back *big.Float
	if t.Bits == 32 {
		v, _ := f.Float32()
		if math.IsInf(float64(v), 0) {
			return false
		}
		back = new(big.Float).SetFloat64(float64(v))
	} else {
		v, _ := f.Float64()
		if math.IsInf(v, 0) {
			return false
		}
		back = new(big.Float).SetFloat64(v)
	}
	return back.Cmp(f) == 0
}

func TestBruteForce(t *testing.T) {
	for _, arch := range []string{"amd64", "386"} {
		for _, typ := range All(types.SizesFor("gc", arch)) {
			max := typ.MaxInt()
			checkLimit(t, typ, "Factorial", Factorial(typ), scan(0, max, refFactorial), refFactorial, refFactorial)
			checkLimit(t, typ, "DoubleFactorial", DoubleFactorial(typ), scan(0, max, refDouble), refDouble, refDouble)
			checkLimit(t, typ, "CentralBinomial", CentralBinomial(typ), scan(0, max, refCentral), refCentral, refCentral)
			checkLimit(t, typ, "CentralBinomialRatio", CentralBinomialRatio(typ), scan(0, max, refFactorial), refCentral, refFactorial)
			loop := scanPred(0, func(n int64) bool { return !simulateLoopRef(n, n/2, max) })
			checkLimit(t, typ, "CentralBinomialLoop", CentralBinomialLoop(typ), loop, refCentral, func(n int64) *big.Int {
				k := n / 2
				return new(big.Int).Mul(refCentral(n), big.NewInt(k)) // largest b*(n-k+i), at i = k
			})
			checkLimit(t, typ, "CatalanValue", CatalanValue(typ), scan(0, max, refCatalan), refCatalan, refCatalan)
			cat := scan(0, max, func(n int64) *big.Int { return refFactorial(2 * n) })
			checkLimit(t, typ, "Catalan", Catalan(typ), cat, refCatalan, func(n int64) *big.Int { return refFactorial(2 * n) })
			fe := scan(0, max, refFactorial)
			if typ.Float {
				fe = scanPred(0, func(n int64) bool { return !exactIn(typ, refFactorial(n)) })
			}
			checkLimit(t, typ, "FloatExact", FloatExact(typ), fe, refFactorial, refFactorial)
			for _, x := range []int64{2, 3, 10} {
				want := scan(1, max, func(n int64) *big.Int { return fallingRef(x+n-1, n) })
				if got := RisingFirstBad(typ, x); got != want {
					t.Errorf("%s/%s: RisingFirstBad(%d) = %d, scan %d", typ, arch, x, got, want)
				}
				pw := scan(0, max, func(k int64) *big.Int { return new(big.Int).Exp(big.NewInt(x), big.NewInt(k), nil) })
				if got := PowerFirstBad(typ, float64(x)); got != pw {
					t.Errorf("%s/%s: PowerFirstBad(%d) = %d, scan %d", typ, arch, x, got, pw)
				}
			}
			if typ.Bits <= 32 && !typ.Float {
				for _, k := range []int64{2, 3, 5} {
					want := scan(k, max, func(n int64) *big.Int { return fallingRef(n, k) })
					if got := FallingFirstBad(typ, k); got != want {
						t.Errorf("%s/%s: FallingFirstBad(%d) = %d, scan %d", typ, arch, k, got, want)
					}
				}
			}
		}
	}
}

// checkLimit compares l with the scanned first bad n and the reference
// result and peak at the n before.
func checkLimit(t *testing.T, typ Num, shape string, l Limit, want int64, result, peak func(int64) *big.Int) {
	t.Helper()
	if l.FirstBad != want {
		t.Errorf("%s(%s).FirstBad = %d, scan says %d", shape, typ, l.FirstBad, want)
		return
	}
	if l.LastGood.Cmp(result(want-1)) != 0 {
		t.Errorf("%s(%s).LastGood = %v, want %v", shape, typ, l.LastGood, result(want-1))
	}
	if l.Peak.Cmp(peak(want-1)) != 0 {
		t.Errorf("%s(%s).Peak = %v, want %v", shape, typ, l.Peak, peak(want-1))
	}
}

// TestBoundsDoTheWork checks that the factorial search settles on
// Robbins' bracket and needs only a few exact evaluations, rather than
// scanning: it counts the calls of the exact test.
func TestBoundsDoTheWork(t *testing.T) {
	for _, typ := range All(nil) {
		calls := 0
		s := factorialShape
		s.fits = func(n int64, max *big.Int) bool {
			calls++
			return factorialShape.fits(n, max)
		}
		got := firstBad(s, typ.maxInt(), typ.logMax())
		if got != Factorial(typ).FirstBad {
			t.Errorf("%s: counted search %d, Factorial %d", typ, got, Factorial(typ).FirstBad)
		}
		// One exact test on each side of the answer confirms it; the
		// straddle Robbins leaves is at most one n wide here.
		if calls > 3 {
			t.Errorf("%s: %d exact evaluations, want at most 3", typ, calls)
		}
		t.Logf("%s: n! breaks at %d after %d exact evaluations", typ, got, calls)
	}
}
