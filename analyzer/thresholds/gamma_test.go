package thresholds

import (
	"math"
	"testing"
)

func TestGammaFirstBad64(t *testing.T) {
	x := GammaFirstBad(mustNamed(t, "float64", nil))
	if !math.IsInf(math.Gamma(x), 1) {
		t.Errorf("Γ(%v) = %v, want +Inf", x, math.Gamma(x))
	}
	if g := math.Gamma(math.Nextafter(x, 0)); math.IsInf(g, 0) {
		t.Errorf("Γ just below %v is %v, want finite", x, g)
	}
	// Cody's SPECFUN GAMMA gives XBIG = 171.624 for IEEE double (from
	// memory).
	if math.Abs(x-171.624) > 1e-3 {
		t.Errorf("GammaFirstBad(float64) = %v, want ≈ 171.624", x)
	}
	// ln Γ(x) ≈ ln MaxFloat64 there (math.Lgamma as reference): one
	// float64 step changes ln Γ by about ψ(x)·ulp ≈ 1.5e-13.
	lg, _ := math.Lgamma(x)
	if d := lg - math.Log(math.MaxFloat64); math.Abs(d) > 1e-11 {
		t.Errorf("ln Γ(%v) − ln MaxFloat64 = %v", x, d)
	}
}

func TestGammaFirstBad32(t *testing.T) {
	x := GammaFirstBad(mustNamed(t, "float32", nil))
	x32 := float32(x)
	if float64(x32) != x {
		t.Fatalf("GammaFirstBad(float32) = %v is not a float32", x)
	}
	if math.Gamma(x) <= math.MaxFloat32 || math.Gamma(float64(math.Nextafter32(x32, 0))) > math.MaxFloat32 {
		t.Errorf("Γ does not cross MaxFloat32 at %v", x)
	}
	// Cody's SPECFUN GAMMA gives XBIG = 35.040 for IEEE single (from
	// memory).
	if math.Abs(x-35.040) > 1e-3 {
		t.Errorf("GammaFirstBad(float32) = %v, want ≈ 35.040", x)
	}
}

func TestGammaInts(t *testing.T) {
	if g := GammaFirstBad(mustNamed(t, "int64", nil)); g != 0 {
		t.Errorf("GammaFirstBad(int64) = %v, want 0", g)
	}
}
