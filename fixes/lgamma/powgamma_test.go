package lgamma

import (
	"math"
	"math/big"
	"testing"
)

// refPowOverGamma returns x^p/Γ(a) for x > 0 and a > 0 as
// exp(p·ln x − ln Γ(a)) with the math/big references of ref_test.go.
func refPowOverGamma(x, p, a float64) *big.Float {
	l := bnew().Mul(bf(p), refLog(bf(x)))
	return refExp(l.Sub(l, refLnGamma(bf(a))))
}

func TestPowOverGamma(t *testing.T) {
	// The unit-ball volume π^(d/2)/Γ(d/2+1) past d = 341, where Γ is
	// +Inf, powers past float64 over Gamma values that are not, and
	// values in range, which must be the quotient itself.
	for _, c := range []struct{ x, p, a float64 }{
		{math.Pi, 200, 201}, {math.Pi, 171, 172}, {200, 150.5, 76.25}, {12.25, 374, 175},
		{1500, 100, 171.5}, {2, 1100, 200}, {0.5, 60, 0.75}, {1e-5, 60, 0.1},
		{math.Pi, 2.5, 3.5}, {7, 3, 4},
	} {
		want := refPowOverGamma(c.x, c.p, c.a)
		if f, _ := want.Float64(); f == 0 || math.IsInf(f, 0) || math.Abs(f) < 0x1p-1022 {
			t.Fatalf("case %v: reference %g is not a normal float64", c, f)
		}
		got := PowOverGamma(c.x, c.p, c.a)
		if off := relOff(got, want); off > 1e-14 {
			t.Errorf("PowOverGamma(%g, %g, %g) = %g, want %s (math/big), relative error %.3g", c.x, c.p, c.a, got, want.Text('g', 17), off)
		}
	}
}

func TestPowOverGammaNegative(t *testing.T) {
	// Γ(−170.5) = π/(sin(−170.5π)·Γ(171.5)) = −π/Γ(171.5) by the
	// reflection formula (DLMF 5.5.3): about −1e-309, below the normal
	// range, while 0.5^1100 underflows too; their quotient is normal.
	l := bnew().Mul(bf(1100), refLog(bf(0.5)))
	l.Add(l, refLnGamma(bf(171.5)))
	l.Sub(l, refLog(refPi()))
	want := bnew().Neg(refExp(l))
	got := PowOverGamma(0.5, 1100, -170.5)
	if off := relOff(got, want); off > 1e-14 {
		t.Errorf("PowOverGamma(0.5, 1100, -170.5) = %g, want %s (math/big), relative error %.3g", got, want.Text('g', 17), off)
	}
}

func TestPowOverGammaKeepsQuotient(t *testing.T) {
	// Where math.Pow and math.Gamma form a normal quotient, it is
	// returned bit for bit (the fixed code then returns what the code
	// returned), negative bases and arguments included.
	for _, c := range []struct{ x, p, a float64 }{
		{math.Pi, 2.5, 3.5}, {-2, 3, 4.5}, {-2, 4, -0.5}, {3, -2, -1.5}, {10, 100, 50}, {0.5, 7, 160.5},
	} {
		want := math.Pow(c.x, c.p) / math.Gamma(c.a)
		if got := PowOverGamma(c.x, c.p, c.a); got != want {
			t.Errorf("PowOverGamma(%g, %g, %g) = %g, quotient %g", c.x, c.p, c.a, got, want)
		}
	}
	// Signs in log space: (−200)^151 is negative.
	if got := PowOverGamma(-200, 151, 80); got >= 0 || math.IsInf(got, 0) {
		t.Errorf("PowOverGamma(-200, 151, 80) = %g, want a finite negative value", got)
	}
	if got, want := PowOverGamma(-200, 151, 80), -PowOverGamma(200, 151, 80); got != want {
		t.Errorf("PowOverGamma(-200, 151, 80) = %g, want %g", got, want)
	}
}

func TestPowOverGammaSpecial(t *testing.T) {
	nan, inf := math.NaN(), math.Inf(1)
	for _, c := range []struct {
		name      string
		got, want float64
	}{
		{"PowOverGamma(-2, 0.5, 3)", PowOverGamma(-2, 0.5, 3), nan},
		{"PowOverGamma(2, 3, -1)", PowOverGamma(2, 3, -1), nan},
		{"PowOverGamma(2, 3, 0)", PowOverGamma(2, 3, 0), 0},
		{"PowOverGamma(0, 3, 200)", PowOverGamma(0, 3, 200), 0},
		{"PowOverGamma(2, 3, +Inf)", PowOverGamma(2, 3, inf), 0},
		{"PowOverGamma(NaN, 3, 2)", PowOverGamma(nan, 3, 2), nan},
		{"PowOverGamma(π, 750, 751)", PowOverGamma(math.Pi, 750, 751), 0},
	} {
		if !(c.got == c.want || math.IsNaN(c.got) && math.IsNaN(c.want)) {
			t.Errorf("%s = %g, want %g", c.name, c.got, c.want)
		}
	}
}
