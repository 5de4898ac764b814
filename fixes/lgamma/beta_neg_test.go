package lgamma

import (
	"math"
	"math/big"
	"testing"
)

// halfGammaOverSqrtPi is Γ(h/2)/√π for an odd h (positive or
// negative), exactly: Γ(½) = √π and Γ(x+1) = xΓ(x) (DLMF 5.4.6, 5.5.1).
func halfGammaOverSqrtPi(h int64) *big.Rat {
	r := big.NewRat(1, 1) // Γ(½)/√π
	for x := int64(1); x < h; x += 2 {
		r.Mul(r, big.NewRat(x, 2)) // Γ(x/2 + 1) = (x/2)·Γ(x/2)
	}
	for x := int64(1); x > h; x -= 2 {
		r.Quo(r, big.NewRat(x-2, 2)) // Γ(x/2 − 1) = Γ(x/2)/(x/2 − 1)
	}
	return r
}

// TestBetaNegative checks B(a, b) = Γ(a)Γ(b)/Γ(a+b) for a half-integer
// a (negative among them) and an integer b ≥ 1, where √π cancels and
// the value is the rational Γ(a)/Γ(a+b)·(b−1)! (math/big), to 1e-14
// relative; and the poles (DLMF 5.2.1: Γ has poles at 0, −1, −2, …).
func TestBetaNegative(t *testing.T) {
	for _, h := range []int64{-241, -101, -15, -5, -3, -1, 1, 3, 201, 399} {
		for _, b := range []int64{1, 2, 3, 10, 51, 200} {
			a := float64(h) / 2
			if h > 0 && b > 0 {
				continue // the positive case has its own tests
			}
			want := new(big.Rat).Quo(halfGammaOverSqrtPi(h), halfGammaOverSqrtPi(h+2*b))
			want.Mul(want, new(big.Rat).SetInt(new(big.Int).MulRange(1, b-1)))
			w, _ := want.Float64()
			for _, got := range []float64{Beta(a, float64(b)), Beta(float64(b), a)} {
				if math.IsInf(w, 0) || w == 0 {
					continue
				}
				if math.Abs(got-w) > 1e-14*math.Abs(w) {
					t.Errorf("Beta(%g, %d) = %g, want %g (math/big)", a, b, got, w)
				}
			}
		}
	}
	for _, c := range []struct{ a, b, want float64 }{
		{-1.5, -1.5, 0}, // Γ(−3) is a pole: the quotient's limit is 0
		{-0.5, -0.5, 0}, // Γ(−1)
		{-2, 0.5, math.NaN()},
		{0, -0.5, math.NaN()},
		{-3, -1.5, math.NaN()},
		{math.NaN(), -1, math.NaN()},
		{math.Inf(-1), 2, math.NaN()},
	} {
		got := Beta(c.a, c.b)
		if !(got == c.want || math.IsNaN(got) && math.IsNaN(c.want)) {
			t.Errorf("Beta(%g, %g) = %g, want %g", c.a, c.b, got, c.want)
		}
	}
	// Non-half-integer arguments against mpmath (Debian python3-mpmath,
	// mp.dps = 30, mpmath.beta of the float64 arguments taken exactly).
	for _, c := range []struct{ a, b, want float64 }{
		{-2.3, 7.1, -70.4946532797397679126413286428},
		{-10.25, -3.6, -1413.0350005599475107978134731},
		{-0.7, 0.2, 5.5346295633834028310521929433},
		{-150.3, 20.9, -2.86379199617934474805953595744e-27},
	} {
		if got := Beta(c.a, c.b); math.Abs(got-c.want) > 1e-13*math.Abs(c.want) {
			t.Errorf("Beta(%g, %g) = %g, want %g (mpmath)", c.a, c.b, got, c.want)
		}
	}
	// The value from the real-code corpus: B(200, −50.5) ≈ −1.83e48 (the
	// exact form is the corpus label's reference, computed here).
	want := new(big.Rat).Quo(new(big.Rat).SetInt(new(big.Int).MulRange(1, 199)), big.NewRat(1, 1))
	want.Mul(want, halfGammaOverSqrtPi(-101))
	want.Quo(want, halfGammaOverSqrtPi(299))
	w, _ := want.Float64()
	if got := Beta(200, -50.5); math.Abs(got-w) > 1e-14*math.Abs(w) {
		t.Errorf("Beta(200, -50.5) = %g, want %g", got, w)
	}
}
