package thresholds

import (
	"math"
	"math/big"
	"testing"
)

func TestStirlingCoefficients(t *testing.T) {
	// DLMF 5.11.1: ln Γ(z) ~ (z−½)ln z − z + ½ln(2π) + Σ B_{2k}/(2k(2k−1) z^(2k−1)),
	// with coefficients 1/12, −1/360, 1/1260, −1/1680.
	// DLMF 24.2 (Table 24.2.1): B2 = 1/6, B4 = −1/30, B6 = 1/42, B8 = −1/30.
	tests := []struct {
		k     int
		dlmf  *big.Rat
		bern2 *big.Rat
	}{
		{1, big.NewRat(1, 12), big.NewRat(1, 6)},
		{2, big.NewRat(-1, 360), big.NewRat(-1, 30)},
		{3, big.NewRat(1, 1260), big.NewRat(1, 42)},
		{4, big.NewRat(-1, 1680), big.NewRat(-1, 30)},
	}
	for _, tt := range tests {
		got := StirlingCoefficient(tt.k)
		if got.Cmp(tt.dlmf) != 0 {
			t.Errorf("StirlingCoefficient(%d) = %v, want %v (DLMF 5.11.1)", tt.k, got, tt.dlmf)
		}
		fromB := new(big.Rat).Quo(tt.bern2, big.NewRat(int64(2*tt.k*(2*tt.k-1)), 1))
		if got.Cmp(fromB) != 0 {
			t.Errorf("StirlingCoefficient(%d) = %v, B_%d/(2k(2k−1)) = %v (DLMF 24.2)", tt.k, got, 2*tt.k, fromB)
		}
	}
	// B10 = 5/66, B12 = −691/2730 (DLMF Table 24.2.1).
	b := bernoulli(12)
	if b[10].Cmp(big.NewRat(5, 66)) != 0 || b[12].Cmp(big.NewRat(-691, 2730)) != 0 {
		t.Errorf("B10 = %v, B12 = %v", b[10], b[12])
	}
	if StirlingCoefficient(0) != nil || StirlingCoefficient(21) != nil {
		t.Error("out-of-range coefficient not nil")
	}
}

func TestStirlingLeadingTerm(t *testing.T) {
	// Relative error of √(2πn)(n/e)^n against n!: 7.79 %, 1.65 %, 0.83 %
	// at n = 1, 5, 10; it is about 1/(12n) (common practice).
	tests := []struct {
		n    int64
		want float64
	}{
		{1, 0.0779}, {5, 0.0165}, {10, 0.0083},
	}
	for _, tt := range tests {
		exact, _ := new(big.Float).SetInt(factorial(tt.n)).Float64()
		approx := math.Exp(StirlingLogFactorial(float64(tt.n), 0))
		rel := (exact - approx) / exact
		if math.Abs(rel-tt.want) > 5e-5 {
			t.Errorf("n = %d: relative error %.5f, want %.4f", tt.n, rel, tt.want)
		}
	}
}

func TestStirlingSeriesAccuracy(t *testing.T) {
	// Against math.Lgamma (ln Γ(n+1) = ln n!): the four-term series is
	// good to better than 1e-12 absolute by n = 10, since the next term
	// is B10/(90 n^9) = 5/5940 · 10^-9 (DLMF 5.11.1).
	for _, n := range []float64{10, 20, 50, 170, 1000} {
		want, _ := math.Lgamma(n + 1)
		got := StirlingLogFactorial(n, 4)
		if math.Abs(got-want) > 1e-12*math.Max(1, want) {
			t.Errorf("n = %v: series %v, Lgamma %v", n, got, want)
		}
	}
	if !math.IsNaN(StirlingLogFactorial(0, 1)) {
		t.Error("StirlingLogFactorial(0) is not NaN")
	}
}

// TestRobbinsAgainstLgamma checks lo ≤ ln n! ≤ hi for n = 1 … 10^6, with
// ln n! from math.Lgamma(n+1), accurate to a few ulps.
func TestRobbinsAgainstLgamma(t *testing.T) {
	for n := int64(1); n <= 1_000_000; n++ {
		lo, hi := LogFactorialBounds(n)
		lg, _ := math.Lgamma(float64(n) + 1)
		if !(lo <= lg && lg <= hi) {
			t.Fatalf("n = %d: Lgamma %v outside [%v, %v]", n, lg, lo, hi)
		}
	}
}

// TestRobbinsStrictExact checks Robbins' strict inequalities, before the
// package widens them, against ln n! taken from the exact math/big n!.
// Up to n = 100 the distance from ln n! to either side (at least
// 1/(360n³) ≈ 2.8e-9) is far above the float64 error of the check.
func TestRobbinsStrictExact(t *testing.T) {
	for n := int64(1); n <= 100; n++ {
		x := float64(n)
		base := halfLn2Pi + (x+0.5)*math.Log(x) - x
		lo, hi := base+1/(12*x+1), base+1/(12*x)
		ln := lnExactFactorial(n)
		if !(lo < ln && ln < hi) {
			t.Errorf("n = %d: ln n! = %v outside (%v, %v)", n, ln, lo, hi)
		}
		wlo, whi := LogFactorialBounds(n)
		if wlo > lo || whi < hi {
			t.Errorf("n = %d: widened bounds [%v, %v] inside Robbins' [%v, %v]", n, wlo, whi, lo, hi)
		}
	}
}

// lnExactFactorial returns ln n! from the exact big.Int, as
// ln(mantissa) + exponent·ln 2.
func lnExactFactorial(n int64) float64 {
	f := new(big.Float).SetPrec(64).SetInt(new(big.Int).MulRange(1, n))
	m := new(big.Float)
	e := f.MantExp(m)
	mf, _ := m.Float64()
	return math.Log(mf) + float64(e)*math.Ln2
}

func TestLogFactorialBoundsSpecial(t *testing.T) {
	if lo, hi := LogFactorialBounds(0); lo != 0 || hi != 0 {
		t.Errorf("LogFactorialBounds(0) = %v, %v", lo, hi)
	}
	if lo, hi := LogFactorialBounds(-1); !math.IsNaN(lo) || !math.IsNaN(hi) {
		t.Errorf("LogFactorialBounds(-1) = %v, %v", lo, hi)
	}
}

func TestInvertStirling(t *testing.T) {
	// ln 170! ≈ 706.5731 and ln 171! ≈ 711.7147 (math.Lgamma); the real
	// n at which the leading term reaches ln(MaxFloat64) lies between.
	n := invertStirling(math.Log(math.MaxFloat64))
	if !(170 < n && n < 171) {
		t.Errorf("invertStirling(ln MaxFloat64) = %v, want in (170, 171)", n)
	}
}
