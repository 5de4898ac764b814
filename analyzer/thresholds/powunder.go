package thresholds

import "math"

// PowUnderflow returns, for float64 and a base b in (0, 1), the first
// integer k ≥ 0 at which math.Pow(b, k) is subnormal (below 2^−1022,
// where its significant digits start to fall away) and the first at
// which it is 0. A running product that starts from b^k (the first
// probability p^s of a negative binomial, (1−p)^n of a binomial) is then
// wrong in every digit, or 0, and so is every term it is multiplied
// into, although the terms near the distribution's mode are not small.
// Both are located by bisection with math.Pow itself, since the code
// under analysis calls it, over a power that falls with k.
//
// Special cases are:
//
//	PowUnderflow(t, b) = (MaxInt64, MaxInt64) for any type but float64
//	PowUnderflow(t, b) = (MaxInt64, MaxInt64) for b ≤ 0, b ≥ 1 or NaN
func PowUnderflow(t Num, b float64) (subnormal, zero int64) {
	if !t.Float || t.Bits != 64 || !(b > 0 && b < 1) {
		return math.MaxInt64, math.MaxInt64
	}
	type pair struct{ a, b int64 }
	p := memo(cacheKey{shape: "powunder", t: t, a: int64(math.Float64bits(b))}, func() pair {
		// b^k ≤ 2^−1075 once k·log2(1/b) ≥ 1075, so hi is past both.
		hi := int64(math.Ceil(1076/-math.Log2(b))) + 1
		sub := firstTrue(0, hi, func(k int64) bool { return math.Pow(b, float64(k)) < 0x1p-1022 })
		zero := firstTrue(0, hi, func(k int64) bool { return math.Pow(b, float64(k)) == 0 })
		return pair{sub, zero}
	})
	return p.a, p.b
}
