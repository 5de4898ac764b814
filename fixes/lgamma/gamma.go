package lgamma

// ln Γ(x) for x > 0: Stirling's series (DLMF §5.11.1, see stirling.go)
// at z ≥ 16, with smaller arguments shifted up by the recurrence
// Γ(x) = Γ(x+m)/(x(x+1)…(x+m−1)) (DLMF 5.5.1); negative arguments use
// the reflection formula Γ(x)Γ(1−x) = π/sin(πx) (DLMF 5.5.3).

import "math"

// lgammaStirling returns ln Γ(z) for z ≥ 16 in double-double.
func lgammaStirling(z dd) dd {
	return z.addF(-0.5).mul(ddLog(z)).sub(z).add(halfLn2Pi).addF(stirlingSeries(z.hi))
}

// lgammaDD returns ln Γ(x) for a finite x > 0 in double-double.
func lgammaDD(x dd) dd {
	if x.lo == 0 && x.hi <= float64(len(lnFactTable)) && x.hi == math.Trunc(x.hi) {
		return lnFactTable[int(x.hi)-1]
	}
	if x.hi >= stirlingSeriesMin {
		return lgammaStirling(x)
	}
	p := x
	z := x.addF(1)
	for z.hi < stirlingSeriesMin {
		p = p.mul(z)
		z = z.addF(1)
	}
	return lgammaStirling(z).sub(ddLog(p))
}

// lnPi is ln π rounded to float64 (1.1447298858494002; from memory,
// checked against math/big in the tests).
const lnPi = 1.1447298858494002

// isPole reports whether Γ has a pole at x (zero or a negative integer).
func isPole(x float64) bool { return x <= 0 && x == math.Trunc(x) }

// LogGamma returns ln|Γ(x)|. The sign of Γ(x) is not part of the result;
// GammaSign returns it, and the pair replaces math.Lgamma. For x > 0 the
// result is within about 1 ulp; for x < 0 it comes from the reflection
// formula and loses relative accuracy near the zeros of ln|Γ|.
//
// Special cases are:
//
//	LogGamma(+Inf) = +Inf
//	LogGamma(0) = +Inf
//	LogGamma(-integer) = +Inf
//	LogGamma(-Inf) = -Inf
//	LogGamma(NaN) = NaN
//
// These are the values math.Lgamma returns.
func LogGamma(x float64) float64 {
	switch {
	case math.IsNaN(x):
		return x
	case math.IsInf(x, 0):
		return x
	case isPole(x):
		return math.Inf(1)
	case x > 0:
		return lgammaDD(dd{x, 0}).float()
	}
	// ln|Γ(x)| = ln π − ln|sin πx| − ln Γ(1−x).
	return lnPi - math.Log(math.Abs(sinPi(x))) - lgammaDD(twoSum(1, -x)).float()
}

// sinPi returns sin(πx) with the argument reduced exactly to [−½, ½]
// first, so that it stays accurate near the integers.
func sinPi(x float64) float64 {
	r := x - 2*math.Round(x/2) // exact: r in [−1, 1]
	switch {
	case r > 0.5:
		r = 1 - r
	case r < -0.5:
		r = -1 - r
	}
	return math.Sin(math.Pi * r)
}

// GammaSign returns the sign of Γ(x): +1 or −1. Γ is positive for x > 0
// and alternates in sign between the negative integers.
//
// Special cases are:
//
//	GammaSign(+Inf) = +1
//	GammaSign(0) = 0
//	GammaSign(-integer) = 0
//	GammaSign(-Inf) = 0
//	GammaSign(NaN) = 0
//
// The 0 marks the poles, where Γ has no sign; math.Lgamma reports +1
// there instead.
func GammaSign(x float64) int {
	switch {
	case math.IsNaN(x) || isPole(x) || math.IsInf(x, -1):
		return 0
	case x > 0:
		return 1
	case int64(math.Floor(x))%2 != 0:
		return -1
	}
	return 1
}
