package lgamma

import (
	"math"
	"math/big"
	"testing"
)

// refPoissonTerm returns λᵏe^(−λ)/k! by math/big: the exact product
// λᵏ/k! (integer powers and factorials in big.Float at refPrec bits)
// times e^(−λ) from refExp, independent of the package's log-space
// code.
func refPoissonTerm(k int64, lambda float64) *big.Float {
	v := bi(1)
	l := bf(lambda)
	for i := int64(1); i <= k; i++ {
		v.Mul(v, l)
		v.Quo(v, bi(i))
	}
	return v.Mul(v, refExp(bf(-lambda)))
}

func TestPoissonTerm(t *testing.T) {
	// λ on both sides of 0, where e^(−λ) underflows (λ > 745) or
	// overflows (λ < −709), and k where λᵏ or k! leaves float64.
	for _, c := range []struct {
		k      int64
		lambda float64
	}{
		{1, 2.5}, {10, 2.5}, {171, 750}, {750, 750}, {700, 750}, {1, 1e-300},
		{1, -2.5}, {2, -2.5}, {7, -2.5}, {171, -12.25}, {200, -150.5}, {1030, -300.5},
		{800, -150.5}, {3, -0.25}, {171, 12.25}, {500, 300.5},
	} {
		want := refPoissonTerm(c.k, c.lambda)
		if f, _ := want.Float64(); f == 0 || math.IsInf(f, 0) || math.Abs(f) < 0x1p-1022 {
			t.Fatalf("case k=%d λ=%g: reference %g is not a normal float64", c.k, c.lambda, f)
		}
		got := PoissonTerm(int(c.k), c.lambda)
		if off := relOff(got, want); off > 1e-14 {
			t.Errorf("PoissonTerm(%d, %g) = %g, want %s (math/big), relative error %.3g", c.k, c.lambda, got, want.Text('g', 17), off)
		}
	}
}

func TestPoissonTermSpecial(t *testing.T) {
	nan, inf := math.NaN(), math.Inf(1)
	for _, c := range []struct {
		name      string
		got, want float64
	}{
		{"PoissonTerm(0, 2.5)", PoissonTerm(0, 2.5), math.Exp(-2.5)},
		{"PoissonTerm(0, -2.5)", PoissonTerm(0, -2.5), math.Exp(2.5)},
		{"PoissonTerm(0, 0)", PoissonTerm(0, 0), 1},
		{"PoissonTerm(-1, 2)", PoissonTerm(-1, 2), 0},
		{"PoissonTerm(-1, -2)", PoissonTerm(-1, -2), 0},
		{"PoissonTerm(3, 0)", PoissonTerm(3, 0), 0},
		{"PoissonTerm(3, +Inf)", PoissonTerm(3, inf), nan},
		{"PoissonTerm(3, -Inf)", PoissonTerm(3, -inf), -inf},
		{"PoissonTerm(2, -Inf)", PoissonTerm(2, -inf), inf},
		{"PoissonTerm(2, NaN)", PoissonTerm(2, nan), nan},
	} {
		if !(c.got == c.want || math.IsNaN(c.got) && math.IsNaN(c.want)) {
			t.Errorf("%s = %g, want %g", c.name, c.got, c.want)
		}
	}
	// Where λ > 0 it is the probability itself.
	for _, k := range []int{1, 5, 171} {
		if got, want := PoissonTerm(k, 12.25), PoissonPMF(k, 12.25); got != want {
			t.Errorf("PoissonTerm(%d, 12.25) = %g, PoissonPMF = %g", k, got, want)
		}
	}
}
