package thresholds

import "math/big"

// BinomialLoopDownFits reports whether every intermediate r·(n−d+1) of
// the loop r = 1; for d = 1..k { r = r*(n−d+1)/d } fits t, that is
// whether the loop that counts its factor down from n computes C(n, k)
// without overflow. After step d the product is C(n, d), so the
// intermediate of step d is d·C(n, d) = n·C(n−1, d−1), which grows while
// d−1 ≤ (n−1)/2 (common practice); the largest is at
// d = min(k, ⌊(n−1)/2⌋+1).
func BinomialLoopDownFits(t Num, n, k int64) bool {
	return memo(cacheKey{shape: "loopdownfits", t: t, a: n, b: k}, func() bool {
		max := t.maxInt()
		switch {
		case k <= 0:
			return true
		case n < 0 || k > n:
			return simulateDown(n, k, max)
		}
		d := min(k, (n-1)/2+1)
		if tooWide(n-1, d-1, max) {
			return false
		}
		peak := new(big.Int).Binomial(n-1, d-1)
		peak.Mul(peak, big.NewInt(n))
		return peak.CmpAbs(max) <= 0
	})
}

// simulateDown runs the downward loop exactly where its factors reach
// zero or below; it stops at the first intermediate past max or at a
// zero product.
func simulateDown(n, k int64, max *big.Int) bool {
	r, f, q := big.NewInt(1), big.NewInt(n), new(big.Int)
	one := big.NewInt(1)
	for d := int64(1); d <= k; d++ {
		r.Mul(r, f)
		if r.CmpAbs(max) > 0 {
			return false
		}
		if r.Sign() == 0 {
			return true
		}
		r.Quo(r, q.SetInt64(d))
		f.Sub(f, one)
	}
	return true
}
