package fixes_test

import (
	"math"
	"math/big"
	"testing"

	"github.com/overfact/overfact/fixes/lgamma"
)

// TestInverseBetaForm checks the form the inverse Beta fix writes,
// 1/lgamma.Beta(a, b), against 1/B(a,b) = (a+b−1)!/((a−1)!(b−1)!)
// computed with math/big (DLMF 5.12.1 and 5.4.1), where 1/B is largest
// and B is subnormal or near it: a+b from 1000 to 1060. It logs the
// worst relative error of math.Exp(-lgamma.LogBeta(a, b)) beside it, the
// form that was not chosen.
func TestInverseBetaForm(t *testing.T) {
	t.Parallel()
	top := fl(math.MaxFloat64)
	var worst, worstExp float64
	pairs, sub, expInf := 0, 0, 0
	for s := int64(1000); s <= 1060; s++ {
		// Sparse far from a = b, dense near it, where B is smallest.
		for a := int64(1); a <= s/2; a += max(1, min(1+a/8, s/2-80-a)) {
			b := s - a
			inv := quo(bf(factorialBig(a+b-1)), bf(new(big.Int).Mul(factorialBig(a-1), factorialBig(b-1))))
			beta := lgamma.Beta(float64(a), float64(b))
			got := 1 / beta
			if inv.Cmp(top) > 0 {
				if !math.IsInf(got, 1) {
					t.Errorf("1/Beta(%d, %d) = %g, want +Inf (1/B = %s)", a, b, got, inv.Text('g', 6))
				}
				continue
			}
			pairs++
			if beta < 0x1p-1022 {
				sub++
			}
			e := relErr(got, inv)
			if e > 1e-15 {
				t.Errorf("1/Beta(%d, %d) = %g, off by %.3g relative (1/B = %s)", a, b, got, e, inv.Text('g', 17))
			}
			worst = math.Max(worst, e)
			if ex := math.Exp(-lgamma.LogBeta(float64(a), float64(b))); math.IsInf(ex, 1) {
				expInf++
			} else {
				worstExp = math.Max(worstExp, relErr(ex, inv))
			}
		}
	}
	if pairs == 0 || sub == 0 {
		t.Fatalf("%d finite pairs, %d with B subnormal: the grid misses the band", pairs, sub)
	}
	t.Logf("%d pairs with finite 1/B (%d with B subnormal): 1/Beta off by at most %.2g; Exp(-LogBeta) by %.2g where finite, +Inf on %d", pairs, sub, worst, worstExp, expInf)
}

func relErr(got float64, want *big.Float) float64 {
	if math.IsInf(got, 0) || math.IsNaN(got) {
		return math.Inf(1)
	}
	d := new(big.Float).SetPrec(refPrec).Sub(fl(got), want)
	r, _ := new(big.Float).Quo(d, want).Float64()
	return math.Abs(r)
}
