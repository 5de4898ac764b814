package thresholds

import (
	"math"
	"math/big"
	"testing"

	"gonum.org/v1/gonum/stat/combin"
)

// a001405 holds C(n, ⌊n/2⌋) for n = 0 … 20, OEIS A001405 (from memory).
var a001405 = []int64{1, 1, 2, 3, 6, 10, 20, 35, 70, 126, 252, 462, 924, 1716, 3432, 6435, 12870, 24310, 48620, 92378, 184756}

func TestCentralValues(t *testing.T) {
	for n, want := range a001405 {
		if got := central(int64(n)); got.Int64() != want {
			t.Errorf("C(%d, %d) = %v, want %d (OEIS A001405)", n, n/2, got, want)
		}
	}
}

func TestCentralThresholds(t *testing.T) {
	// C(66, 33) = 7219428434016265740 fits int64, C(67, 33) =
	// 14226520737620288370 does not (math/big Binomial; also in the
	// brute-force test); the loop breaks at n = 62, where
	// 31·C(62, 31) > 2^63−1 (simulated in TestLoopBySimulation).
	i64 := mustNamed(t, "int64", nil)
	if got := CentralBinomial(i64).FirstBad; got != 67 {
		t.Errorf("CentralBinomial(int64) = %d, want 67", got)
	}
	if got := CentralBinomialLoop(i64).FirstBad; got != 62 {
		t.Errorf("CentralBinomialLoop(int64) = %d, want 62", got)
	}
	if got := CentralBinomialRatio(i64).FirstBad; got != 21 {
		t.Errorf("CentralBinomialRatio(int64) = %d, want 21", got)
	}
	want, _ := new(big.Int).SetString("7219428434016265740", 10)
	if got := CentralBinomial(i64).LastGood; got.Cmp(want) != 0 {
		t.Errorf("CentralBinomial(int64).LastGood = %v, want %v", got, want)
	}
}

// simulateLoopRef runs b = b*(n-k+i)/i, i = 1..k in math/big and reports
// whether every intermediate b*(n-k+i) stays within max. It is the
// outside reference for the loop shape: the loop itself, not a formula.
func simulateLoopRef(n, k int64, max *big.Int) bool {
	b := big.NewInt(1)
	for i := int64(1); i <= k; i++ {
		b.Mul(b, big.NewInt(n-k+i))
		if b.CmpAbs(max) > 0 {
			return false
		}
		b.Quo(b, big.NewInt(i))
	}
	return true
}

func TestLoopBySimulation(t *testing.T) {
	for _, name := range []string{"int8", "uint8", "int16", "int32", "uint32", "int64", "uint64"} {
		n := mustNamed(t, name, nil)
		max := n.MaxInt()
		l := CentralBinomialLoop(n)
		if !simulateLoopRef(l.FirstBad-1, (l.FirstBad-1)/2, max) || simulateLoopRef(l.FirstBad, l.FirstBad/2, max) {
			t.Errorf("%s: loop limit %d disagrees with simulation", name, l.FirstBad)
		}
		for nn := int64(-5); nn <= 80; nn++ {
			for k := int64(0); k <= nn+8; k++ {
				if got, want := BinomialLoopFits(n, nn, k), simulateLoopRef(nn, k, max); got != want {
					t.Errorf("BinomialLoopFits(%s, %d, %d) = %v, simulation %v", name, nn, k, got, want)
				}
			}
		}
	}
}

// TestLoopAgainstGonum uses gonum's combin.Binomial, real Go code that
// computes C(n, k) with exactly this loop in int (after k = min(k, n−k)),
// as a corpus: it returns the right value where BinomialLoopFits says
// so, and a wrapped one from the first n the loop limit names.
func TestLoopAgainstGonum(t *testing.T) {
	it := mustNamed(t, "int", nil) // gonum computes in the host's int
	if it.Bits != 64 {
		t.Skip("host int is not 64-bit")
	}
	for n := int64(0); n <= 70; n++ {
		k := min(n/2, n-n/2)
		exact := new(big.Int).Binomial(n, k)
		got := big.NewInt(int64(combin.Binomial(int(n), int(k))))
		if fits := BinomialLoopFits(it, n, k); fits != (got.Cmp(exact) == 0) {
			t.Errorf("n = %d: BinomialLoopFits = %v, gonum %v vs exact %v", n, fits, got, exact)
		}
	}
	if lim := CentralBinomialLoop(it).FirstBad; lim != 62 {
		t.Errorf("loop limit for int = %d, want 62", lim)
	}
}

func TestBinomialFits(t *testing.T) {
	i64 := mustNamed(t, "int64", nil)
	max := i64.MaxInt()
	for n := int64(-2); n <= 80; n++ {
		for k := int64(-1); k <= n+1; k++ {
			want := true
			if n >= 0 && k >= 0 && k <= n {
				want = new(big.Int).Binomial(n, k).Cmp(max) <= 0
			}
			if got := BinomialFits(i64, n, k); got != want {
				t.Errorf("BinomialFits(int64, %d, %d) = %v, want %v", n, k, got, want)
			}
		}
	}
	// Far beyond any exact computation: C(10^15, 5·10^14) does not fit,
	// C(10^15, 1) = 10^15 does.
	// k far beyond n: the loop's first factors are about −k, and the
	// second product already exceeds int64.
	if BinomialLoopFits(i64, 0, 1e18) || !BinomialLoopFits(i64, 0, 3) {
		t.Error("loops with k > n misjudged")
	}
	if BinomialFits(i64, 1e15, 5e14) || !BinomialFits(i64, 1e15, 1) || !BinomialLoopFits(i64, 1e15, 1) {
		t.Error("wide binomials misjudged")
	}
	// 2^62 choose 2 ≈ 2^123 does not fit; the loop forms 2·C(n, 2).
	if BinomialFits(i64, 1<<62, 2) || BinomialLoopFits(i64, 1<<62, 2) {
		t.Error("C(2^62, 2) judged to fit")
	}
}

func TestLogBinomialBoundsAgainstGonum(t *testing.T) {
	// gonum's LogGeneralizedBinomial (from math.Lgamma) lies within the
	// Robbins bracket, up to its own float error.
	for _, nk := range [][2]int64{{10, 5}, {66, 33}, {1000, 500}, {1030, 515}, {100000, 3}} {
		lo, hi := logBinomialBounds(nk[0], nk[1])
		g := combin.LogGeneralizedBinomial(float64(nk[0]), float64(nk[1]))
		tol := 1e-12 * math.Max(1, g)
		if g < lo-tol || g > hi+tol {
			t.Errorf("C(%d, %d): gonum %v outside [%v, %v]", nk[0], nk[1], g, lo, hi)
		}
	}
}
