package thresholds

import (
	"math"
	"math/big"
)

// Catalan returns the first n at which the Catalan number written as
// (2n)!/((n+1)! n!) breaks: its numerator (2n)! stops fitting t. It is
// derived from Factorial(t): the first n with 2n ≥ Factorial(t).FirstBad.
// LastGood is the Catalan number at the n before, Peak the numerator
// there.
func Catalan(t Num) Limit {
	return memoLimit(cacheKey{shape: "catratio", t: t}, func() Limit {
		n := (Factorial(t).FirstBad + 1) / 2
		return Limit{FirstBad: n, LastGood: catalan(n - 1), Peak: factorial(2 * (n - 1))}
	})
}

// CatalanValue returns the first n whose true Catalan number
// C(2n, n)/(n+1) does not fit t (int64: 36, as C35 fits).
func CatalanValue(t Num) Limit {
	return shapeLimit("catvalue", t, catalanShape, catalan)
}

// catalan returns C(2n, n)/(n+1) exactly.
func catalan(n int64) *big.Int {
	c := new(big.Int).Binomial(2*n, n)
	return c.Quo(c, big.NewInt(n+1))
}

var catalanShape = shape{
	from: 0,
	bounds: func(n int64) (lo, hi float64) {
		lo, hi = logBinomialBounds(2*n, n)
		l1 := math.Log1p(float64(n))
		return widen(lo-l1, hi-l1, hi+l1)
	},
	fits: func(n int64, max *big.Int) bool {
		return catalan(n).CmpAbs(max) <= 0
	},
}
