package lgamma

import (
	"math"
	"math/big"
	"testing"
)

// exactNegBinomial is C(f+s−1, f)·pˢ·(1−p)ᶠ in exact rationals (math/big),
// the textbook form (common practice).
func exactNegBinomial(f, s int64, p *big.Rat) float64 {
	q := new(big.Rat).Sub(big.NewRat(1, 1), p)
	pow := func(x *big.Rat, e int64) *big.Rat {
		num := new(big.Int).Exp(x.Num(), big.NewInt(e), nil)
		den := new(big.Int).Exp(x.Denom(), big.NewInt(e), nil)
		return new(big.Rat).SetFrac(num, den)
	}
	v := new(big.Rat).SetInt(new(big.Int).Binomial(f+s-1, f))
	v.Mul(v, pow(p, s))
	v.Mul(v, pow(q, f))
	out, _ := v.Float64()
	return out
}

// TestNegativeBinomialPMF compares the helper with math/big over counts
// past those at which C(f+s−1, f) or the powers overflow or underflow
// float64, at probabilities that are exact binary fractions.
func TestNegativeBinomialPMF(t *testing.T) {
	for _, p := range []*big.Rat{big.NewRat(1, 8), big.NewRat(1, 2), big.NewRat(3, 4), big.NewRat(1, 1024)} {
		pf, _ := p.Float64()
		for _, f := range []int64{0, 1, 2, 7, 40, 170, 171, 600, 2000} {
			for _, s := range []int64{1, 2, 5, 30, 171, 900} {
				want := exactNegBinomial(f, s, p)
				if want < 0x1p-1000 {
					continue // far below the normal range: nothing to compare in a float64
				}
				got := NegativeBinomialPMF(int(f), int(s), pf)
				if math.Abs(got-want) > 1e-14*want {
					t.Errorf("NegativeBinomialPMF(%d, %d, %v) = %v, math/big %v", f, s, pf, got, want)
				}
				if lg := NegativeBinomialLogPMF(int(f), int(s), pf); math.Abs(lg-math.Log(want)) > 1e-13*math.Max(1, math.Abs(lg)) {
					t.Errorf("NegativeBinomialLogPMF(%d, %d, %v) = %v, ln of math/big %v", f, s, pf, lg, math.Log(want))
				}
			}
		}
	}
}

// The special cases of the doc comment.
func TestNegativeBinomialSpecial(t *testing.T) {
	nan := math.NaN()
	for _, c := range []struct {
		name      string
		got, want float64
	}{
		{"NegativeBinomialPMF(-1, 3, 0.5)", NegativeBinomialPMF(-1, 3, 0.5), 0},
		{"NegativeBinomialPMF(0, 3, 1)", NegativeBinomialPMF(0, 3, 1), 1},
		{"NegativeBinomialPMF(2, 3, 1)", NegativeBinomialPMF(2, 3, 1), 0},
		{"NegativeBinomialPMF(2, 3, 0)", NegativeBinomialPMF(2, 3, 0), 0},
		{"NegativeBinomialPMF(2, 0, 0.5)", NegativeBinomialPMF(2, 0, 0.5), nan},
		{"NegativeBinomialPMF(2, 3, 1.5)", NegativeBinomialPMF(2, 3, 1.5), nan},
		{"NegativeBinomialPMF(2, 3, NaN)", NegativeBinomialPMF(2, 3, nan), nan},
		{"NegativeBinomialLogPMF(-1, 3, 0.5)", NegativeBinomialLogPMF(-1, 3, 0.5), math.Inf(-1)},
		{"NegativeBinomialLogPMF(0, 3, 1)", NegativeBinomialLogPMF(0, 3, 1), 0},
		{"NegativeBinomialLogPMF(2, 0, 0.5)", NegativeBinomialLogPMF(2, 0, 0.5), nan},
		{"NegativeBinomialPMF(MaxInt, 2, 0.5)", NegativeBinomialPMF(math.MaxInt, 2, 0.5), nan},
	} {
		if !(c.got == c.want || math.IsNaN(c.got) && math.IsNaN(c.want)) {
			t.Errorf("%s = %v, want %v", c.name, c.got, c.want)
		}
	}
	// A small case by hand: f = 2, s = 3, p = 1/2 gives C(4, 2)/2^5 = 6/32.
	if got := NegativeBinomialPMF(2, 3, 0.5); math.Abs(got-6.0/32) > 1e-16 {
		t.Errorf("NegativeBinomialPMF(2, 3, 0.5) = %v, want 0.1875", got)
	}
}
