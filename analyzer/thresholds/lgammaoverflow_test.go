package thresholds

import (
	"math"
	"math/big"
	"testing"
)

// TestExpMaxArg: math.Exp is finite at ExpMaxArg and +Inf at the next
// float64, which is at most ln of the largest float64, 709.78 (common
// practice).
func TestExpMaxArg(t *testing.T) {
	x := ExpMaxArg()
	if math.IsInf(math.Exp(x), 1) || !math.IsInf(math.Exp(math.Nextafter(x, 800)), 1) {
		t.Errorf("ExpMaxArg() = %.17g: exp there %g, next %g", x, math.Exp(x), math.Exp(math.Nextafter(x, 800)))
	}
	if x > math.Log(math.MaxFloat64) || x < 709 {
		t.Errorf("ExpMaxArg() = %.17g, outside [709, ln MaxFloat64]", x)
	}
}

// TestExpLgammaFirstBad: exp(ln Γ(n+1)) is +Inf from n = 171, where n!
// first exceeds the largest float64 (the factorial threshold, resolved
// with math/big; 170! ≈ 7.26e306 is the largest that fits, OEIS A000142).
func TestExpLgammaFirstBad(t *testing.T) {
	got, ok := ExpLgammaFirstBad(func(n int64) float64 { return math.Exp(lgammaOf(float64(n) + 1)) }, 0, 1<<20)
	want := Factorial(mustNamed(t, "float64", nil)).FirstBad
	if !ok || got != want {
		t.Errorf("first n = %d, %v; want %d", got, ok, want)
	}
	// Over a float variable: Γ(x) itself is finite up to about 171.62
	// (the gamma threshold); exp of its logarithm can only stop sooner.
	x, ok := ExpLgammaFirstBadFloat(func(x float64) float64 { return math.Exp(lgammaOf(x)) }, 1, 1e300)
	if !ok || x > GammaFirstBad(mustNamed(t, "float64", nil)) || x < 171 {
		t.Errorf("first x = %.17g, %v", x, ok)
	}
	if _, ok := ExpLgammaFirstBad(func(n int64) float64 { return math.Exp(lgammaOf(float64(n) + 1)) }, 0, 170); ok {
		t.Error("a first bad n below 171")
	}
}

// TestCentralBinomialExp: the first n at which math.Exp of ln C(n, ⌊n/2⌋)
// is +Inf, against ln C computed from the exact coefficient with
// math/big (mantissa and binary exponent, so the logarithm is good to
// an ulp) and against the log-gamma difference as code computes it;
// C(1029, 514) ≈ 1.43e308 is the largest central coefficient that fits
// float64 (math/big), so the limit is at most 1030.
func TestCentralBinomialExp(t *testing.T) {
	f64 := mustNamed(t, "float64", nil)
	lim := CentralBinomialExp(f64)
	if lim.FirstBad > CentralBinomial(f64).FirstBad || lim.FirstBad < CentralBinomial(f64).FirstBad-2 {
		t.Fatalf("FirstBad = %d, CentralBinomial's %d", lim.FirstBad, CentralBinomial(f64).FirstBad)
	}
	t.Logf("C(n, ⌊n/2⌋) as an exponential is +Inf from n = %d (the coefficient from %d)", lim.FirstBad, CentralBinomial(f64).FirstBad)
	lnBig := func(n int64) float64 {
		c := new(big.Float).SetInt(new(big.Int).Binomial(n, n/2))
		mant := new(big.Float)
		e := c.MantExp(mant)
		m, _ := mant.Float64()
		return math.Log(m) + float64(e)*math.Ln2
	}
	lnGamma := func(n int64) float64 {
		a, _ := math.Lgamma(float64(n) + 1)
		b, _ := math.Lgamma(float64(n/2) + 1)
		c, _ := math.Lgamma(float64(n-n/2) + 1)
		return a - b - c
	}
	for n := int64(1000); n <= 1040; n++ {
		want := n >= lim.FirstBad
		if got := math.IsInf(math.Exp(lnBig(n)), 1); got != want {
			t.Errorf("n = %d: exp(ln C) from math/big is +Inf: %v, want %v", n, got, want)
		}
		if got := math.IsInf(math.Exp(lnGamma(n)), 1); got != want {
			t.Errorf("n = %d: exp of log-gamma values is +Inf: %v, want %v", n, got, want)
		}
	}
	if lim.LastGood.Cmp(new(big.Int).Binomial(lim.FirstBad-1, (lim.FirstBad-1)/2)) != 0 {
		t.Errorf("LastGood = %v", lim.LastGood)
	}
	if f32 := mustNamed(t, "float32", nil); CentralBinomialExp(f32).FirstBad != CentralBinomial(f32).FirstBad {
		t.Error("float32: not CentralBinomial")
	}
}
