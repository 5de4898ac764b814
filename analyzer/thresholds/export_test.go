package thresholds

import (
	"math"
	"math/big"
)

// Test-only exports: functions the tests check against math/big and
// DLMF that the analyzer does not call, kept out of the package API.

// BinomialFits reports whether the true C(n, k) fits t. C(n, k) is 0,
// and fits, when k < 0 or k > n.
func BinomialFits(t Num, n, k int64) bool {
	return memo(cacheKey{shape: "binfits", t: t, a: n, b: k}, func() bool {
		max := t.maxInt()
		switch {
		case k < 0 || n < 0 || k > n:
			return true
		case tooWide(n, k, max):
			return false
		}
		return new(big.Int).Binomial(n, k).CmpAbs(max) <= 0
	})
}

// StirlingLogFactorial returns Stirling's series for ln n! (DLMF 5.11.1
// with z = n+1, written for ln n!),
//
//	(n+½)ln n − n + ½ln(2π) + Σ_{k=1..terms} B_{2k} / (2k(2k−1) n^(2k−1)),
//
// truncated after terms correction terms; terms = 0 gives the leading
// term √(2πn)(n/e)^n.
//
// Special cases are:
//
//	StirlingLogFactorial(n ≤ 0, terms) = NaN
//	terms above 20 are treated as 20 (the series diverges)
func StirlingLogFactorial(n float64, terms int) float64 {
	if !(n > 0) {
		return math.NaN()
	}
	s := halfLn2Pi + (n+0.5)*math.Log(n) - n
	inv2 := 1 / (n * n)
	p := 1 / n
	for k := 1; k <= min(terms, maxStirlingTerms); k++ {
		c, _ := StirlingCoefficient(k).Float64()
		s += c * p
		p *= inv2
	}
	return s
}
