package lgamma

// Poisson probabilities λᵏe^(−λ)/k! by the saddle-point expansion of
// Loader (2000), "Fast and accurate computation of binomial
// probabilities": ln p = −δ(k) − bd0(k, λ) − ½ln(2πk), with δ the
// Stirling remainder (stirling.go) and bd0 the deviance (bd0.go). All
// terms are carried in double-double and exponentiated once.

import "math"

// poissonLogDD returns ln P(X = k) for k ≥ 1 and finite λ > 0.
func poissonLogDD(k int, lambda float64) dd {
	x := ddInt(int64(k))
	r := bd0(x, dd{lambda, 0}).addF(stirlingInt(uint64(k))).add(halfLn2Pi)
	return r.add(ddLogFast(x).mulF(0.5)).neg()
}

// poissonSpecial handles the arguments outside the main formula: it
// returns the log-probability and true, or false for k ≥ 1, 0 < λ < ∞.
func poissonSpecial(k int, lambda float64) (float64, bool) {
	switch {
	case math.IsNaN(lambda) || lambda < 0 || math.IsInf(lambda, 1):
		return math.NaN(), true
	case k < 0:
		return math.Inf(-1), true
	case k == 0:
		return -lambda, true
	case lambda == 0:
		return math.Inf(-1), true
	}
	return 0, false
}

// PoissonLogPMF returns ln P(X = k) for X ~ Poisson(λ), that is
// k·ln λ − λ − ln k!.
//
// Accuracy: within 1 ulp for every k ≥ 0 and 0 < λ ≤ MaxFloat64 (k up
// to MaxInt64); the mpmath sweep of docs/numerics.md measured at most 0.5 ulp.
//
// Special cases are:
//
//	PoissonLogPMF(0, λ) = -λ
//	PoissonLogPMF(k < 0, λ) = -Inf
//	PoissonLogPMF(k > 0, 0) = -Inf
//	PoissonLogPMF(k, λ < 0) = NaN
//	PoissonLogPMF(k, +Inf) = NaN
//	PoissonLogPMF(k, NaN) = NaN
func PoissonLogPMF(k int, lambda float64) float64 {
	if v, ok := poissonSpecial(k, lambda); ok {
		return v
	}
	return poissonLogDD(k, lambda).float()
}

// PoissonPMF returns P(X = k) = λᵏe^(−λ)/k! for X ~ Poisson(λ), with a
// relative error of a few 1e-16 wherever the result is a normal float64.
//
// Accuracy: within 1 ulp wherever the result is a normal float64, for
// every k ≥ 0 and 0 < λ (k up to MaxInt64), and correctly rounded at
// k = 0; the mpmath sweep of docs/numerics.md measured at most 0.5 ulp.
//
// Special cases are:
//
//	PoissonPMF(0, λ) = e^(−λ)
//	PoissonPMF(k < 0, λ) = 0
//	PoissonPMF(k > 0, 0) = 0
//	PoissonPMF(k, λ < 0) = NaN
//	PoissonPMF(k, +Inf) = NaN
//	PoissonPMF(k, NaN) = NaN
func PoissonPMF(k int, lambda float64) float64 {
	if v, ok := poissonSpecial(k, lambda); ok {
		if k == 0 && !math.IsNaN(v) {
			return expOf(dd{v, 0}) // e^(−λ), correctly rounded but in rare ties
		}
		return math.Exp(v)
	}
	return expOf(poissonLogDD(k, lambda))
}

// PoissonTerm returns λᵏe^(−λ)/k!, the Poisson probability's formula
// taken at any real λ: for λ > 0 it is PoissonPMF(k, λ); for λ < 0 it
// is the term of e^(−λ)·Σ λᵏ/k! that code summing a Poisson series
// forms, (−1)ᵏ·|λ|ᵏe^|λ|/k!, evaluated as exp(k·ln|λ| + |λ| − ln k!) so
// that neither e^(−λ) nor λᵏ nor k! needs to be representable.
//
// Accuracy: as PoissonPMF for λ > 0; within a few ulps for λ < 0
// wherever the result is a normal float64 (the exponent is carried in
// double-double).
//
// Special cases are:
//
//	PoissonTerm(0, λ) = e^(−λ) (also for λ = 0)
//	PoissonTerm(k < 0, λ) = 0 (1/k! = 0 at a negative integer)
//	PoissonTerm(k > 0, 0) = 0
//	PoissonTerm(k > 0, +Inf) = NaN (0·∞, as e^(−λ)·λᵏ)
//	PoissonTerm(k > 0, -Inf) = +Inf for even k, -Inf for odd k
//	PoissonTerm(k, NaN) = NaN
func PoissonTerm(k int, lambda float64) float64 {
	switch {
	case math.IsNaN(lambda):
		return math.NaN()
	case k < 0:
		return 0
	case k == 0:
		return math.Exp(-lambda)
	case lambda >= 0:
		return PoissonPMF(k, lambda)
	case math.IsInf(lambda, -1):
		return math.Pow(lambda, float64(k))
	}
	v := expOf(logPowOverFactorialDD(lambda, k).addF(-lambda))
	if k%2 == 1 {
		return -v
	}
	return v
}
