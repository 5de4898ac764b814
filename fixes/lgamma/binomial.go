package lgamma

// Binomial probabilities C(n,k)pᵏqⁿ⁻ᵏ by the saddle-point expansion of
// Loader (2000), "Fast and accurate computation of binomial
// probabilities":
//
//	ln p = δ(n) − δ(k) − δ(n−k) − bd0(k, np) − bd0(n−k, nq)
//	       − ½ln(2πk(n−k)/n)
//
// with δ the Stirling remainder and bd0 the deviance. q = 1 − p and the
// means np, nq are formed exactly in double-double.

import "math"

// tinyP is the p below which the mean n·p is formed scaled.
const tinyP = 0x1p-900

// binomialLogDD returns ln P(X = k) for 0 ≤ k ≤ n and 0 < p < 1.
func binomialLogDD(k, n int, p float64) dd {
	q := twoSum(1, -p)
	nd := ddInt(int64(n))
	switch k {
	case 0:
		// n·ln(1−p) through ln(1+x): 1−p itself would lose a p below 2^-53
		return ddLog1p(dd{-p, 0}).mul(nd)
	case n:
		return ddLog(dd{p, 0}).mul(nd)
	}
	x, y := ddInt(int64(k)), ddInt(int64(n-k))
	r := dd{stirlingInt(uint64(n)), 0}.addF(-stirlingInt(uint64(k))).addF(-stirlingInt(uint64(n - k)))
	var dk dd
	if p < tinyP {
		// n·p could be subnormal and lose bits: form it scaled by 2^200.
		// The mean itself, below 2^-837, vanishes next to k ≥ 1 in bd0.
		ms := nd.mulF(p * 0x1p200)
		dk = x.mul(ddLog(x).sub(ddLog(ms)).add(ln2.mulF(200))).sub(x)
	} else {
		dk = bd0(x, nd.mulF(p))
	}
	r = r.sub(dk).sub(bd0(y, nd.mul(q)))
	return r.sub(halfLn2Pi).sub(ddLogFast(x.mul(y).div(nd)).mulF(0.5))
}

// binomialSpecial handles the arguments outside the main formula: it
// returns the log-probability and true, or false for 0 ≤ k ≤ n, 0 < p < 1.
func binomialSpecial(k, n int, p float64) (float64, bool) {
	switch {
	case n < 0 || math.IsNaN(p) || p < 0 || p > 1:
		return math.NaN(), true
	case k < 0 || k > n:
		return math.Inf(-1), true
	case p == 0:
		if k == 0 {
			return 0, true
		}
		return math.Inf(-1), true
	case p == 1:
		if k == n {
			return 0, true
		}
		return math.Inf(-1), true
	}
	return 0, false
}

// BinomialLogPMF returns ln P(X = k) for X ~ Binomial(n, p).
//
// Accuracy: within 1 ulp for all 0 ≤ k ≤ n ≤ MaxInt64 and p in [0, 1],
// subnormal p included; the mpmath sweep of docs/numerics.md measured at most 0.52 ulp.
//
// Special cases are:
//
//	BinomialLogPMF(k < 0 or k > n, n, p) = -Inf
//	BinomialLogPMF(0, n, 0) = BinomialLogPMF(n, n, 1) = 0
//	BinomialLogPMF(k, n < 0, p) = NaN
//	BinomialLogPMF(k, n, p) = NaN if p is NaN or outside [0, 1]
func BinomialLogPMF(k, n int, p float64) float64 {
	if v, ok := binomialSpecial(k, n, p); ok {
		return v
	}
	return binomialLogDD(k, n, p).float()
}

// BinomialPMF returns P(X = k) = C(n,k)pᵏ(1−p)ⁿ⁻ᵏ for X ~ Binomial(n, p),
// with a relative error of a few 1e-16 wherever the result is a normal
// float64.
//
// Accuracy: within 1 ulp wherever the result is a normal float64, for
// all 0 ≤ k ≤ n ≤ MaxInt64; the mpmath sweep of docs/numerics.md measured at most 0.53 ulp.
//
// Special cases are:
//
//	BinomialPMF(k < 0 or k > n, n, p) = 0
//	BinomialPMF(0, n, 0) = BinomialPMF(n, n, 1) = 1
//	BinomialPMF(k, n < 0, p) = NaN
//	BinomialPMF(k, n, p) = NaN if p is NaN or outside [0, 1]
func BinomialPMF(k, n int, p float64) float64 {
	if v, ok := binomialSpecial(k, n, p); ok {
		return math.Exp(v)
	}
	return expOf(binomialLogDD(k, n, p))
}
