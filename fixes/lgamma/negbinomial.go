package lgamma

// Negative binomial probabilities C(f+s−1, f)·pˢ·(1−p)ᶠ, the chance of
// f failures before the s-th success (common practice), through the
// identity C(f+s−1, f) = s/(f+s)·C(f+s, s) (from the factorial form of
// C, DLMF 26.3.2, from memory): the probability is s/(f+s) times the
// binomial probability b(s; f+s, p), which binomial.go evaluates by
// Loader's saddle-point expansion without forming the coefficient or
// the powers.

import "math"

// negBinomialSpecial handles the arguments outside the main formula: it
// returns the log-probability and true, or false for f ≥ 0, s ≥ 1,
// 0 < p < 1 and f+s representable.
func negBinomialSpecial(f, s int, p float64) (float64, bool) {
	switch {
	case s < 1 || math.IsNaN(p) || p < 0 || p > 1:
		return math.NaN(), true
	case f < 0:
		return math.Inf(-1), true
	case f > math.MaxInt-s:
		return math.NaN(), true // f+s trials do not fit an int
	case p == 1:
		if f == 0 {
			return 0, true
		}
		return math.Inf(-1), true
	case p == 0:
		return math.Inf(-1), true
	}
	return 0, false
}

// negBinomialLogDD returns ln P(F = f) inside the support.
func negBinomialLogDD(f, s int, p float64) dd {
	n := f + s
	return binomialLogDD(s, n, p).add(ddLog(ddInt(int64(s)).div(ddInt(int64(n)))))
}

// NegativeBinomialLogPMF returns ln P(F = f) for F, the number of
// failures before the s-th success in trials that succeed with
// probability p.
//
// Special cases are:
//
//	NegativeBinomialLogPMF(f < 0, s, p) = -Inf
//	NegativeBinomialLogPMF(0, s, 1) = 0
//	NegativeBinomialLogPMF(f, s, 0) = -Inf
//	NegativeBinomialLogPMF(f, s < 1, p) = NaN
//	NegativeBinomialLogPMF(f, s, p) = NaN if p is NaN or outside [0, 1]
func NegativeBinomialLogPMF(f, s int, p float64) float64 {
	if v, ok := negBinomialSpecial(f, s, p); ok {
		return v
	}
	return negBinomialLogDD(f, s, p).float()
}

// NegativeBinomialPMF returns P(F = f) = C(f+s−1, f)·pˢ·(1−p)ᶠ for F,
// the number of failures before the s-th success in trials that succeed
// with probability p, with a relative error of a few 1e-16 wherever the
// result is a normal float64.
//
// Special cases are:
//
//	NegativeBinomialPMF(f < 0, s, p) = 0
//	NegativeBinomialPMF(0, s, 1) = 1
//	NegativeBinomialPMF(f, s, 0) = 0
//	NegativeBinomialPMF(f, s < 1, p) = NaN
//	NegativeBinomialPMF(f, s, p) = NaN if p is NaN or outside [0, 1]
func NegativeBinomialPMF(f, s int, p float64) float64 {
	if v, ok := negBinomialSpecial(f, s, p); ok {
		return math.Exp(v)
	}
	return expOf(negBinomialLogDD(f, s, p))
}
