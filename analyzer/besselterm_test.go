package analyzer

import (
	"math"
	"math/big"
	"testing"
)

// TestBesselTermProbe shows the Beam case of
// testdata/src/poweroverfactorial/bessel.go beside math/big: its 300
// terms (x/2)^(2k)·(−1)^k/(k!·k!) at n = 0, x = 10, summed in float64
// with each factorial computed on its own, give NaN, while the same
// finite sum in 300-bit arithmetic is J_0(10) ≈ −0.2459 (DLMF 10.2.2 is
// the series; the value of J_0(10) is from memory, and the test checks
// only that the exact sum is finite and in (−0.25, −0.24)).
func TestBesselTermProbe(t *testing.T) {
	fact := func(n int) float64 {
		r := 1.0
		for i := 2; i <= n; i++ {
			r *= float64(i)
		}
		return r
	}
	x := 10.0
	got := 0.0
	for k := 0; k < 300; k++ {
		got += math.Pow(-1, float64(k)) * math.Pow(x/2, float64(2*k)) / (fact(k) * fact(k))
	}
	const prec = 300
	sum := new(big.Float).SetPrec(prec)
	half := new(big.Float).SetPrec(prec).SetFloat64(x / 2)
	for k := 0; k < 300; k++ {
		term := new(big.Float).SetPrec(prec).SetInt64(1)
		for i := 0; i < 2*k; i++ {
			term.Mul(term, half)
		}
		kf := new(big.Float).SetPrec(prec).SetInt(new(big.Int).MulRange(1, int64(k)))
		term.Quo(term, kf)
		term.Quo(term, kf)
		if k%2 == 1 {
			term.Neg(term)
		}
		sum.Add(sum, term)
	}
	exact, _ := sum.Float64()
	if !math.IsNaN(got) || !(exact > -0.25 && exact < -0.24) {
		t.Errorf("Beam(0, 10) = %v, exact %v: want NaN where the exact sum is about -0.2459", got, exact)
	}
}
