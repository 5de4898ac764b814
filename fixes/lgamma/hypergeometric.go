package lgamma

// Hypergeometric probabilities C(K,k)·C(N−K,n−k)/C(N,n) (DLMF 26.3 for
// the binomials; the law is common practice): the three log-binomials of
// choose.go are combined in double-double and exponentiated once.

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

func hypergeometricLogDD(k, total, successes, draws int) dd {
	n, K, d, kk := uint64(total), uint64(successes), uint64(draws), uint64(k)
	return logChooseDD(K, kk).add(logChooseDD(n-K, d-kk)).sub(logChooseDD(n, d))
}

// HypergeometricLogPMF returns ln P(X = k) where X counts the successes
// in draws items taken without replacement from total items of which
// successes are successes.
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
