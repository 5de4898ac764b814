package thresholds

import (
	"math"
	"math/big"
)

// powerSeriesTerms caps the terms PowerSeriesFirstBad sums: from there
// on the answer is the point where e^x itself passes the type (about
// 709.78 for float64), and the terms past k = 4000 add less than
// 2^-1000 of the sum at any x below 1000 (x^k/k! ≤ (e·x/k)^k).
const powerSeriesTerms = 4000

// PowerSeriesFirstBad returns, for a float type t and a count n ≥ 0 of
// terms after the first, the smallest float64 x ≥ 0 at which the
// partial exponential series Σ_{k=0}^{n} x^k/k! rounds to +Inf in t: a series summed term by term in t is +Inf from
// there on, although e^−x times it, or a term over it, is not. Each
// candidate sum is formed exactly enough in 256-bit big.Float (a
// rounding error of 2^-250 relative per term cannot move a comparison
// with a float64 boundary but at its last bit); the float64 values are
// bisected.
//
// Special cases are:
//
//	PowerSeriesFirstBad(t, n) = +Inf for an integer type, and for n < 2
//	    (1 + x is +Inf only where x is)
//	PowerSeriesFirstBad(t, n) is that of n = 4000 for n > 4000
func PowerSeriesFirstBad(t Num, n int64) float64 {
	if !t.Float {
		return math.Inf(1)
	}
	if n > powerSeriesTerms {
		n = powerSeriesTerms
	}
	if n < 0 {
		n = 0
	}
	return memo(cacheKey{shape: "power-series", t: t, a: n}, func() float64 {
		over := overflowBound(t)
		return bisect64(0, math.Inf(1), func(x float64) bool {
			return partialExp(x, n).Cmp(over) >= 0
		})
	})
}

// overflowBound returns the least real that rounds to +Inf in t,
// halfway between its largest finite value and the next power of two
// (IEEE 754 round to nearest, ties to even: the tie goes to the power
// of two, which is out of range).
func overflowBound(t Num) *big.Float {
	max := new(big.Float).SetPrec(256).SetFloat64(maxFloat(t))
	e := max.MantExp(nil)
	top := new(big.Float).SetPrec(256).SetMantExp(big.NewFloat(1), e)
	return max.Add(max, top).Quo(max, big.NewFloat(2))
}

// partialExp returns Σ_{k=0}^{n} x^k/k! in 256-bit big.Float, each term
// from the one before.
func partialExp(x float64, n int64) *big.Float {
	const prec = 256
	bx := new(big.Float).SetPrec(prec).SetFloat64(x)
	term := new(big.Float).SetPrec(prec).SetInt64(1)
	sum := new(big.Float).SetPrec(prec).SetInt64(1)
	k := new(big.Float).SetPrec(prec)
	for i := int64(1); i <= n; i++ {
		term.Mul(term, bx)
		term.Quo(term, k.SetInt64(i))
		sum.Add(sum, term)
	}
	return sum
}
