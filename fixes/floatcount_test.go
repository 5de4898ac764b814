package fixes_test

import (
	"math"
	"math/big"
)

// refTallyChoose is what fixcounts.Stalls computes with exact arithmetic
// for any float operands: its factorial loop over a float counter,
// for i := 2.0; i <= x; i++, multiplies 2, 3, …, ⌊x⌋, so tally(x) is
// ⌊x⌋! for x ≥ 0 and 1 below 2; Stalls(n, k) is tally(n)/(tally(k)·
// tally(n−k)) with n−k taken in float64 (exact on the grid's quarters).
// For integers 0 ≤ k ≤ n it is C(n, k) (math/big, chooseBig); for k > n
// it is n!/k!, and for fractions the floors' ratio, which the fix keeps.
func refTallyChoose(x []float64) *big.Float {
	tally := func(v float64) *big.Float {
		if v < 2 {
			return fl(1)
		}
		return bf(factorialBig(int64(math.Floor(v))))
	}
	return quo(tally(x[0]), mul(tally(x[1]), tally(x[0]-x[1])))
}

var _ = big.NewInt

// refLogGamma is ln Γ(x) for x = n/2 > 0 (n a positive integer): for
// an integer x, ln (x−1)!; for a half-integer, ln((2m)!√π/(4^m m!)) with
// m = x − ½ (DLMF 5.4.6). The logarithm of the exact big value is taken
// from its mantissa and exponent in float64 (error about 1e-16 of the
// result), and ln √π = 0.5723649429247001 (common practice).
func refLogGamma(x []float64) *big.Float {
	ln := func(v *big.Float) float64 {
		mant := new(big.Float)
		e := v.MantExp(mant)
		m, _ := mant.Float64()
		return math.Log(m) + float64(e)*math.Ln2
	}
	if x[0] == math.Trunc(x[0]) {
		return fl(ln(bf(factorialBig(int64(x[0]) - 1))))
	}
	m := int64(x[0] - 0.5)
	num := bf(factorialBig(2 * m))
	den := bf(new(big.Int).Mul(new(big.Int).Lsh(big.NewInt(1), uint(2*m)), factorialBig(m)))
	return fl(ln(num) - ln(den) + 0.5723649429247001)
}
