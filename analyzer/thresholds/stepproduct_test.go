package thresholds

import (
	"math"
	"math/big"
	"math/bits"
	"testing"
)

// exactSeq is a StepSeq from an exact sequence, its logarithm from the
// exact value.
func exactSeq(f func(n int64) *big.Int) StepSeq {
	return StepSeq{
		Log:   func(n int64) (float64, bool) { return logBig(f(n)), true },
		Exact: func(n int64) (*big.Int, bool) { return f(n), true },
	}
}

// runStep runs acc = acc*mul(k)/div(k) for k < n in uint64 or int64 as
// the machine does, and reports the first n whose last trip's product
// wraps (math/bits, exact in 128 bits).
func runStep(signed bool, mul, div func(k uint64) uint64, limit int) int64 {
	acc := uint64(1)
	for n := 1; n <= limit; n++ {
		k := uint64(n - 1)
		hi, lo := bits.Mul64(acc, mul(k))
		if hi != 0 || signed && lo > math.MaxInt64 {
			return int64(n)
		}
		acc = lo / div(k)
	}
	return -1
}

// TestStepProduct checks the first wrapping count of two running
// products against the loops run in machine integers (math/bits) and
// the values against math/big: the Catalan numbers' step
// c·2(2k+1)/(k+2) (OEIS A000108, C_n = C(2n, n)/(n+1)) and the
// pairings' step m·(2k+1)(2k+2)/(2(k+1)), whose value is (2n−1)!!
// (OEIS A001147).
func TestStepProduct(t *testing.T) {
	catalanStep := func(n int64) *big.Int { // C_{n−1}·2(2n−1) = C_n·(n+1)
		c := catalan(n)
		return c.Mul(c, big.NewInt(n+1))
	}
	pairs := func(n int64) *big.Int { // (2n−1)!!
		out := big.NewInt(1)
		for i := int64(1); i < 2*n; i += 2 {
			out.Mul(out, big.NewInt(i))
		}
		return out
	}
	pairStep := func(n int64) *big.Int { // (2n−3)!!·(2n−1)(2n) = (2n−1)!!·2n
		p := pairs(n)
		return p.Mul(p, big.NewInt(2*n))
	}
	for _, c := range []struct {
		name        string
		value, step func(int64) *big.Int
		mul, div    func(k uint64) uint64
	}{
		{"catalan", catalan, catalanStep, func(k uint64) uint64 { return 2 * (2*k + 1) }, func(k uint64) uint64 { return k + 2 }},
		{"pairings", pairs, pairStep, func(k uint64) uint64 { return (2*k + 1) * (2*k + 2) }, func(k uint64) uint64 { return 2 * (k + 1) }},
	} {
		for _, name := range []string{"uint64", "int64"} {
			num := mustNamed(t, name, nil)
			first, last, ok := StepProduct(num, 1, exactSeq(c.value), exactSeq(c.step))
			want := runStep(num.Signed, c.mul, c.div, 200)
			if !ok || first != want {
				t.Errorf("%s in %s: first wrapping count %d (ok %v), the loop run in %s wraps first at %d", c.name, name, first, ok, name, want)
			}
			lim := num.MaxInt()
			if c.value(last).Cmp(lim) > 0 || c.value(last+1).Cmp(lim) <= 0 {
				t.Errorf("%s in %s: value fits up to %d, math/big disagrees", c.name, name, last)
			}
			if first > last {
				t.Errorf("%s in %s: the product wraps at %d, past the value's own limit %d", c.name, name, first, last)
			}
		}
	}
	// A value that never leaves the type within the scan gives no answer.
	lin := func(n int64) *big.Int { return big.NewInt(n + 1) }
	if _, _, ok := StepProduct(mustNamed(t, "int64", nil), 1, exactSeq(lin), exactSeq(lin)); ok {
		t.Error("a slowly growing value reported a wrapping step")
	}
}

// TestProductFirstBad checks the first wrapping count of running
// products of two factors a trip against a math/big scan and, in 64
// bits, the loops run in machine integers (math/bits), and the largest
// value that fits against math/big: h·i(i−1), whose value n!(n−1)! is OEIS A010790, and
// h·(2i−1)(2i), whose value is (2n)! (OEIS A010050).
func TestProductFirstBad(t *testing.T) {
	fact := func(n int64) *big.Int { return new(big.Int).MulRange(1, n) }
	for _, c := range []struct {
		name  string
		from  int64 // the first count at which the loop runs
		value func(int64) *big.Int
		mul   func(k uint64) uint64 // the factor of trip k (from 0)
	}{
		{"n!(n-1)!", 2, func(n int64) *big.Int { return new(big.Int).Mul(fact(n), fact(n-1)) }, func(k uint64) uint64 { return (k + 2) * (k + 1) }},
		{"(2n)!", 1, func(n int64) *big.Int { return fact(2 * n) }, func(k uint64) uint64 { return (2*k + 1) * (2*k + 2) }},
	} {
		for _, name := range []string{"uint64", "int64", "int32", "uint8"} {
			num := mustNamed(t, name, nil)
			first, last, ok := ProductFirstBad(num, c.from, exactSeq(c.value))
			// A plain math/big scan, and for the 64-bit types the loop
			// run in machine integers, whose counts start at 1 for trip
			// 0: shifted to the value's count.
			want := c.from
			for c.value(want).Cmp(num.MaxInt()) <= 0 {
				want++
			}
			if num.Bits == 64 {
				if run := runStep(num.Signed, c.mul, func(uint64) uint64 { return 1 }, 200) + c.from - 1; run != want {
					t.Errorf("%s in %s: the loop run in machine integers wraps first at %d, math/big at %d", c.name, name, run, want)
				}
			}
			if !ok || first != want {
				t.Errorf("%s in %s: first wrapping count %d (ok %v), math/big says %d", c.name, name, first, ok, want)
				continue
			}
			if last.Cmp(c.value(first-1)) != 0 || last.Cmp(num.MaxInt()) > 0 || c.value(first).Cmp(num.MaxInt()) <= 0 {
				t.Errorf("%s in %s: largest value that fits %v at %d, math/big disagrees", c.name, name, last, first-1)
			}
		}
	}
	if _, _, ok := ProductFirstBad(mustNamed(t, "float64", nil), 1, exactSeq(fact)); ok {
		t.Error("float64: a first wrapping count for a float type")
	}
}
