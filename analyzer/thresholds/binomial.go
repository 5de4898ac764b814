package thresholds

import (
	"math"
	"math/big"
)

// CentralBinomial returns the first n whose true C(n, ⌊n/2⌋) does not
// fit t (int64: 67, as C(66, 33) fits).
func CentralBinomial(t Num) Limit {
	return shapeLimit("cbin", t, centralShape, central)
}

// CentralBinomialRatio returns the first n at which C(n, ⌊n/2⌋) written
// as n!/(k!(n−k)!) breaks: its numerator n! stops fitting at
// Factorial(t).FirstBad. LastGood is the binomial at the n before, Peak
// the numerator there.
func CentralBinomialRatio(t Num) Limit {
	return memoLimit(cacheKey{shape: "cratio", t: t}, func() Limit {
		n := Factorial(t).FirstBad
		return Limit{FirstBad: n, LastGood: central(n - 1), Peak: factorial(n - 1)}
	})
}

// CentralBinomialLoop returns the first n at which the multiplicative
// loop b = b*(n-k+i)/i, i = 1..k, with k = ⌊n/2⌋, forms an intermediate
// b*(n-k+i) that does not fit t (int64: 62). LastGood is C(n, ⌊n/2⌋) at
// the n before, Peak the largest intermediate there.
func CentralBinomialLoop(t Num) Limit {
	return memoLimit(cacheKey{shape: "cloop", t: t}, func() Limit {
		n := firstBad(centralLoopShape, t.maxInt(), t.logMax())
		if n == math.MaxInt64 {
			return Limit{FirstBad: n}
		}
		return Limit{FirstBad: n, LastGood: central(n - 1), Peak: loopPeak(n-1, (n-1)/2)}
	})
}

// ChooseFits reports whether the true C(n, k) fits the integer type t,
// for 0 ≤ k ≤ n.
func ChooseFits(t Num, n, k int64) bool {
	return new(big.Int).Binomial(n, k).CmpAbs(t.maxInt()) <= 0
}

// central returns C(n, ⌊n/2⌋) exactly.
func central(n int64) *big.Int { return new(big.Int).Binomial(n, n/2) }

// logBinomialBounds bounds ln C(n, k) for 0 ≤ k ≤ n by Robbins' bound on
// each of the three factorials.
func logBinomialBounds(n, k int64) (lo, hi float64) {
	nlo, nhi := LogFactorialBounds(n)
	klo, khi := LogFactorialBounds(k)
	rlo, rhi := LogFactorialBounds(n - k)
	return widen(nlo-khi-rhi, nhi-klo-rlo, nhi+khi+rhi)
}

var centralShape = shape{
	from:   0,
	bounds: func(n int64) (lo, hi float64) { return logBinomialBounds(n, n/2) },
	fits: func(n int64, max *big.Int) bool {
		return central(n).CmpAbs(max) <= 0
	},
}

// centralLoopShape is the largest intermediate of the loop for C(n, k),
// k = ⌊n/2⌋. At step i the loop forms C(n−k+i−1, i−1)·(n−k+i) =
// i·C(n−k+i, i), which grows with i, so the largest is k·C(n, k).
var centralLoopShape = shape{
	from: 0,
	bounds: func(n int64) (lo, hi float64) {
		k := n / 2
		if k == 0 {
			return math.Inf(-1), math.Inf(-1) // the loop does not run
		}
		lo, hi = logBinomialBounds(n, k)
		lk := math.Log(float64(k))
		return widen(lo+lk, hi+lk, hi+lk)
	},
	fits: func(n int64, max *big.Int) bool {
		return loopPeak(n, n/2).CmpAbs(max) <= 0
	},
}

// loopPeak returns k·C(n, k), the largest intermediate of the loop for
// 0 ≤ k ≤ n; 0 when the loop does not run.
func loopPeak(n, k int64) *big.Int {
	b := new(big.Int).Binomial(n, k)
	return b.Mul(b, big.NewInt(k))
}

// BinomialLoopFits reports whether every intermediate b*(n-k+i) of the
// loop b = 1; for i = 1..k { b = b*(n-k+i)/i } fits t, that is whether
// the loop computes C(n, k) without overflow.
func BinomialLoopFits(t Num, n, k int64) bool {
	return memo(cacheKey{shape: "loopfits", t: t, a: n, b: k}, func() bool {
		max := t.maxInt()
		switch {
		case k <= 0:
			return true // the loop does not run
		case k > n || n < 0:
			return simulateLoop(n, k, max)
		case tooWide(n, k, max):
			return false
		}
		return loopPeak(n, k).CmpAbs(max) <= 0
	})
}

// tooWide reports whether C(n, k) surely exceeds max without computing
// it: with j = min(k, n−k), C(n, j) ≥ (n/j)^j ≥ 2^j.
func tooWide(n, k int64, max *big.Int) bool {
	return min(k, n-k) > int64(max.BitLen())
}

// simulateLoop runs the loop exactly for k > n (or n < 0), where the
// factors n−k+i start negative and may reach zero at i = k−n. It stops
// at the first intermediate beyond max or at a zero product; the
// magnitudes grow like binomial coefficients, so a long run ends early.
func simulateLoop(n, k int64, max *big.Int) bool {
	// The factors are kept in big.Int: n−k can pass the int64 range.
	b, q, one := big.NewInt(1), new(big.Int), big.NewInt(1)
	f := new(big.Int).Sub(big.NewInt(n), big.NewInt(k))
	for i := int64(1); i <= k; i++ {
		f.Add(f, one)
		b.Mul(b, f)
		if b.CmpAbs(max) > 0 {
			return false
		}
		if b.Sign() == 0 {
			return true
		}
		b.Quo(b, q.SetInt64(i))
	}
	return true
}
