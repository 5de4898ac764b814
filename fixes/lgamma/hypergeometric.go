package lgamma

// Hypergeometric probabilities C(K,k)·C(N−K,n−k)/C(N,n) (DLMF 26.3 for
// the binomials; the law is common practice), as the ratio of three
// binomial probabilities with the same p,
//
//	b(k; K, p)·b(n−k; N−K, p)/b(n; N, p),
//
// in which every power of p and 1−p cancels, whatever p is (Loader 2000,
// "Fast and accurate computation of binomial probabilities", §4). With
// p = n/N each factor is a saddle-point form of binomial.go whose terms
// are no larger than its result, whereas the three log-binomials of
// size N·H(n/N) would lose their last digits to rounding for N ≳ 1e14.

import "math"

// hypergeometricSpecial checks the parameters and the support. It returns
// the log-probability and true when the main formula is not needed.
func hypergeometricSpecial(k, total, successes, draws int) (float64, bool) {
	switch {
	case total < 0 || successes < 0 || successes > total || draws < 0 || draws > total:
		return math.NaN(), true
	case k < 0 || k > draws || k > successes || draws-k > total-successes:
		return math.Inf(-1), true
	}
	return 0, false
}

// hypergeometricLogDD returns the log-probability for k in the support.
func hypergeometricLogDD(k, total, successes, draws int) dd {
	if draws == 0 || draws == total {
		return dd{} // k is forced: 0, or successes
	}
	p := float64(draws) / float64(total)
	if p == 1 {
		p = 1 - 0x1p-53 // draws = total−1 beyond 2^53; any p in (0, 1) will do
	}
	return binomialLogDD(k, successes, p).add(binomialLogDD(draws-k, total-successes, p)).sub(binomialLogDD(draws, total, p))
}

// HypergeometricLogPMF returns ln P(X = k) where X counts the successes
// in draws items taken without replacement from total items of which
// successes are successes.
//
// Accuracy: within 1 ulp for totals up to MaxInt64; the mpmath sweep of docs/numerics.md
// measured at most 0.53 ulp.
//
// Special cases are:
//
//	HypergeometricLogPMF(k, ...) = -Inf if k is outside the support
//	    max(0, draws+successes−total) ≤ k ≤ min(draws, successes)
//	HypergeometricLogPMF(k, total, successes, draws) = NaN if total < 0,
//	    successes or draws is outside [0, total]
func HypergeometricLogPMF(k, total, successes, draws int) float64 {
	if v, ok := hypergeometricSpecial(k, total, successes, draws); ok {
		return v
	}
	return hypergeometricLogDD(k, total, successes, draws).float()
}

// HypergeometricPMF returns P(X = k) = C(successes, k)·C(total−successes,
// draws−k)/C(total, draws).
//
// Accuracy: within 1 ulp wherever the result is a normal float64, for
// totals up to MaxInt64; the mpmath sweep of docs/numerics.md measured at most 0.54 ulp.
//
// Special cases are:
//
//	HypergeometricPMF(k, ...) = 0 if k is outside the support
//	    max(0, draws+successes−total) ≤ k ≤ min(draws, successes)
//	HypergeometricPMF(k, total, successes, draws) = NaN if total < 0,
//	    successes or draws is outside [0, total]
func HypergeometricPMF(k, total, successes, draws int) float64 {
	if v, ok := hypergeometricSpecial(k, total, successes, draws); ok {
		return math.Exp(v)
	}
	return expOf(hypergeometricLogDD(k, total, successes, draws))
}
