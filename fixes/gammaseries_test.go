package fixes_test

import (
	"math/big"

	"github.com/overfact/overfact/internal/exacteval"
)

// The hydrology desk's incomplete gamma series, summed until its term
// no longer changes the sum: past x ≈ 709 the float64 sum is +Inf, past
// x ≈ 745 the factor e^(−x) is 0, while γ(a, x) ≤ Γ(a) fits. The fix
// carries the term and the sum in log space, and the exit compares them
// there (Product.Less), so that the series runs to where it converges.
func init() {
	fixPackages = append(fixPackages, "fixgammaseries")
	diffCases = append(diffCases,
		diffCase{pkg: "fixgammaseries", fn: "StormGamma", loops: []string{"a := 1; a <= 340; a += 37", "x := 25; x <= 1525; x += 125"}, args: "float64(a) / 2, float64(x)", typ: "float64", ref: refStormGamma},
	)
}

// refStormGamma is StormGamma's sum in math/big, its exit taken on the
// exact term and sum, times x^a·e^(−x) from exacteval's Pow and Exp
// (checked against mpmath in their package): γ(a, x) truncated where
// the code stops (DLMF 8.7.1 for the series, from memory).
func refStormGamma(in []float64) *big.Float {
	a, x := fl(in[0]), fl(in[1])
	ap, del := fl(in[0]), quo(fl(1), fl(in[0]))
	sum := new(big.Float).Copy(del)
	eps := fl(1e-15)
	for n := 0; n < 2000; n++ {
		ap = new(big.Float).SetPrec(refPrec).Add(ap, fl(1))
		del = mul(del, quo(x, ap))
		sum = new(big.Float).SetPrec(refPrec).Add(sum, del)
		if new(big.Float).Abs(del).Cmp(mul(new(big.Float).Abs(sum), eps)) < 0 {
			break
		}
	}
	pw, err := exacteval.Pow(x, a)
	if err != nil {
		panic(err)
	}
	return mul(mul(sum, pw), exacteval.Exp(new(big.Float).SetPrec(refPrec).Neg(x)))
}
