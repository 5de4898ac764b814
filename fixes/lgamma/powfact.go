package lgamma

// Power-over-factorial terms xᵏ/k!, the terms of the Taylor series of eˣ
// (DLMF 4.2.19). Evaluated as exp(k·ln|x| − ln k!) in double-double, so
// neither xᵏ nor k! needs to be representable.

import "math"

// logPowOverFactorialDD returns ln|xᵏ/k!| for finite x ≠ 0 and k ≥ 1.
func logPowOverFactorialDD(x float64, k int) dd {
	return ddLog(dd{math.Abs(x), 0}).mulF(float64(k)).sub(lnFactDD(uint64(k)))
}

// LogPowOverFactorial returns ln|xᵏ/k!|. The sign of xᵏ/k! is negative
// exactly when x < 0 and k is odd.
//
// Accuracy: within 1 ulp for all finite x and k up to MaxInt64; the mpmath sweep of docs/numerics.md
// measured at most 0.5 ulp.
//
// Special cases are:
//
//	LogPowOverFactorial(x, 0) = 0 (also for x = 0, as math.Pow(0, 0) = 1)
//	LogPowOverFactorial(0, k > 0) = -Inf
//	LogPowOverFactorial(±Inf, k > 0) = +Inf
//	LogPowOverFactorial(x, k < 0) = NaN
//	LogPowOverFactorial(NaN, k) = NaN
func LogPowOverFactorial(x float64, k int) float64 {
	switch {
	case k < 0 || math.IsNaN(x):
		return math.NaN()
	case k == 0:
		return 0
	case x == 0:
		return math.Inf(-1)
	case math.IsInf(x, 0):
		return math.Inf(1)
	}
	return logPowOverFactorialDD(x, k).float()
}

// PowOverFactorial returns xᵏ/k!.
//
// Accuracy: within 1 ulp wherever the result is a normal float64, for
// k up to MaxInt64; the mpmath sweep of docs/numerics.md measured at most 0.5 ulp.
//
// Special cases are:
//
//	PowOverFactorial(x, 0) = 1 (also for x = 0, as math.Pow(0, 0) = 1)
//	PowOverFactorial(0, k > 0) = 0
//	PowOverFactorial(±Inf, k > 0) = math.Pow(±Inf, k)
//	PowOverFactorial(x, k < 0) = NaN
//	PowOverFactorial(NaN, k) = NaN
func PowOverFactorial(x float64, k int) float64 {
	switch {
	case k < 0 || math.IsNaN(x):
		return math.NaN()
	case k == 0:
		return 1
	case x == 0 || math.IsInf(x, 0):
		return math.Pow(x, float64(k))
	}
	v := expOf(logPowOverFactorialDD(x, k))
	if x < 0 && k%2 == 1 {
		return -v
	}
	return v
}
