package thresholds

import (
	"math"
	"math/big"
)

// Exponentials of log-gamma values that overflow.
//
// math.Exp(lgamma(x)) is Γ(x) rebuilt from its logarithm: it is +Inf as
// soon as ln Γ(x) passes the largest argument math.Exp maps to a finite
// value, as math.Gamma(x) is, although the code that goes through the
// logarithm usually meant to stay finite.

// ExpMaxArg returns the largest float64 x with math.Exp(x) finite, found
// by bisection over the float64 values between 709 and 710 (ln of the
// largest float64 is about 709.78, common practice).
func ExpMaxArg() float64 {
	return memo(cacheKey{shape: "exp-max-arg"}, func() float64 {
		first := bisect64(709, 710, func(x float64) bool { return math.IsInf(math.Exp(x), 1) })
		return math.Nextafter(first, 0)
	})
}

// ExpLgammaFirstBad returns the smallest integer v in [from, to] at
// which the float64 computation eval(v) of an exponential of log-gamma
// values, as the code performs it, is +Inf; eval must not decrease with
// v past from. ok is false when eval(to) is finite.
func ExpLgammaFirstBad(eval func(v int64) float64, from, to int64) (int64, bool) {
	bad := func(v int64) bool { return math.IsInf(eval(v), 1) }
	if from > to || !bad(to) {
		return 0, false
	}
	if bad(from) {
		return from, true
	}
	return firstTrue(from, to, bad), true
}

// ExpLgammaFirstBadFloat is ExpLgammaFirstBad over the float64 values of
// a float variable in [from, to]: the smallest float64 v with eval(v) =
// +Inf, for from ≥ 0.
func ExpLgammaFirstBadFloat(eval func(v float64) float64, from, to float64) (float64, bool) {
	bad := func(v float64) bool { return math.IsInf(eval(v), 1) }
	if from > to || from < 0 || !bad(to) {
		return 0, false
	}
	if bad(from) {
		return from, true
	}
	return bisect64(from, to, bad), true
}

// CentralBinomialExp returns the first n at which C(n, ⌊n/2⌋) formed
// as math.Exp of its logarithm (exp of log-gamma differences) is +Inf in
// t. math.Exp is +Inf past ExpMaxArg, which the platform's math.Exp may
// put below ln of the largest float64 (amd64: about 709.44, against
// 709.78), so the exponential can stop one or two n before the
// coefficient itself stops fitting (CentralBinomial). For other types
// than float64 it is CentralBinomial. LastGood is the coefficient at
// the n before, the largest central one whose exponential is finite.
func CentralBinomialExp(t Num) Limit {
	lim := CentralBinomial(t)
	if !t.Float || t.Bits != 64 || lim.FirstBad == math.MaxInt64 {
		return lim
	}
	return memoLimit(cacheKey{shape: "cbin-exp", t: t}, func() Limit {
		// math.Exp(x) is +Inf exactly for x > ExpMaxArg, that is for a
		// coefficient past e^ExpMaxArg, which math.Exp(ExpMaxArg) is to
		// an ulp; consecutive central coefficients differ by a factor
		// near 2, so the ulp cannot move n.
		edge := new(big.Float).SetFloat64(math.Exp(ExpMaxArg()))
		n := lim.FirstBad
		for n > 1 && new(big.Float).SetInt(central(n-1)).Cmp(edge) > 0 {
			n--
		}
		return exactLimit(n, central)
	})
}
