package thresholds

import (
	"math"
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
