package thresholds

import (
	"math"
	"math/big"
)

// CentralFalling returns the first n at which the falling factorial
// n!/(n−k)! with k = ⌊n/2⌋ does not fit t: the numerator of C(n, k)
// computed as n(n−1)…(n−k+1) divided by k! (int64: 30, float64: 270;
// the test re-derives them with a math/big scan).
// LastGood is C(n, ⌊n/2⌋) at the n before, Peak the numerator there.
func CentralFalling(t Num) Limit {
	return memoLimit(cacheKey{shape: "cfalling", t: t}, func() Limit {
		n := firstBad(centralFallingShape, t.maxInt(), t.logMax())
		if n == math.MaxInt64 {
			return Limit{FirstBad: n}
		}
		return Limit{FirstBad: n, LastGood: central(n - 1), Peak: fallingProduct(n-1, (n-1)/2)}
	})
}

// centralFallingShape is n!/(n−⌊n/2⌋)!, bracketed by Robbins' bound
// on both factorials.
var centralFallingShape = shape{
	from: 0,
	bounds: func(n int64) (lo, hi float64) {
		nlo, nhi := LogFactorialBounds(n)
		rlo, rhi := LogFactorialBounds(n - n/2)
		return widen(nlo-rhi, nhi-rlo, nhi+rhi)
	},
	fits: func(n int64, max *big.Int) bool {
		return fallingProduct(n, n/2).CmpAbs(max) <= 0
	},
}
