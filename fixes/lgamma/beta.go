package lgamma

// The beta function B(a,b) = Γ(a)Γ(b)/Γ(a+b) (DLMF 5.12.1), from three
// double-double log-gamma values; a+b is formed exactly, so a large a
// and a tiny b do not lose b to rounding.

import (
	"math"
	"math/big"
)

// betaSpecial handles the arguments outside a, b finite and positive.
func betaSpecial(a, b float64) (float64, bool) {
	switch {
	case math.IsNaN(a) || math.IsNaN(b) || a < 0 || b < 0:
		return math.NaN(), true
	case a == 0 || b == 0:
		return math.Inf(1), true
	case math.IsInf(a, 1) || math.IsInf(b, 1):
		return math.Inf(-1), true
	}
	return 0, false
}

// LogBeta returns ln B(a,b) = ln Γ(a) + ln Γ(b) − ln Γ(a+b) for a, b > 0.
//
// Accuracy: within 1 ulp for all a, b > 0, a > 2^1000 with small b
// included, and next to the curve B(a,b) = 1 (taken in math/big there
// for a+b < 2^40); the mpmath sweep of docs/numerics.md measured at most 0.5 ulp.
//
// Special cases are:
//
//	LogBeta(0, b) = LogBeta(a, 0) = +Inf for a, b ≥ 0
//	LogBeta(+Inf, b) = LogBeta(a, +Inf) = -Inf for a, b > 0
//	LogBeta(a, b) = NaN if a or b is negative or NaN
func LogBeta(a, b float64) float64 {
	if v, ok := betaSpecial(a, b); ok {
		return v
	}
	r := lnBetaDD(a, b)
	if math.Abs(r.hi) < 0x1p-20 && a+b < bigMax {
		// Next to the curve B(a,b) = 1 the double-double's absolute
		// error (up to about 2^-77·b) could exceed the ulp: math/big.
		s := bigNew().Add(bigNew().SetFloat64(a), bigNew().SetFloat64(b))
		return bigLnGammaSum([]*big.Float{bigNew().SetFloat64(a), bigNew().SetFloat64(b), s}, []int{1, 1, -1})
	}
	return r.float()
}

// lnBetaDD returns ln B(a,b) for finite a, b > 0 as ln Γ(min) plus the
// ratio ln Γ(max) − ln Γ(a+b), which stays accurate when max ≫ min.
func lnBetaDD(a, b float64) dd {
	if a < b {
		a, b = b, a
	}
	switch {
	case a > 0x1p900 && b < stirlingSeriesMin:
		// ln Γ(a) − ln Γ(a+b) = −b·ψ(a) − b²ψ′(a)/2 − … with
		// ψ(a) = ln a − 1/(2a) − … (DLMF 5.11.2) and ψ′(a) ≈ 1/a: every
		// term after −b·ln a is below 2^-890 absolute. (b/a itself would
		// be subnormal here, and ln(1 − b/(a+b)) would lose its digits.)
		return lgammaDD(dd{b, 0}).sub(ddLog(dd{a, 0}).mulF(b))
	case a > 0x1p1000:
		return lnBetaHuge(a, b)
	}
	return lgammaDD(dd{b, 0}).add(lnGammaRatioDD(dd{a, 0}, twoSum(a, b)))
}

// lnBetaHuge returns ln B(a,b) for a ≥ b ≥ 16 when a+b may overflow: the
// Stirling forms with ln(a+b) = ln a + ln(1 + b/a) give
// (b−½)·ln(b/a) − ½ln a − (a+b−½)·ln(1+b/a) + ½ln 2π + δ(a) + δ(b) − δ(a+b),
// in which a+b only appears multiplied by a logarithm below ln 2.
func lnBetaHuge(a, b float64) dd {
	ad, bd := dd{a, 0}, dd{b, 0}
	l1 := ddLog(bd.divF(a).addF(1))
	r := bd.addF(-0.5).mul(ddLog(bd.divF(a))).sub(ddLog(ad).mulF(0.5))
	r = r.sub(l1.mulF(a)).sub(l1.mul(bd.addF(-0.5))).add(halfLn2Pi)
	return r.addF(stirlingSeries(a) + stirlingSeries(b) - stirlingSeries(a+b))
}

// Beta returns B(a,b) = Γ(a)Γ(b)/Γ(a+b), for negative arguments too
// (DLMF 5.12.1 with Γ continued to the negative axis: the sign of each
// Γ from GammaSign, its magnitude from ln|Γ|).
//
// Accuracy: for a, b > 0 within 1 ulp wherever the result is a normal
// float64; the mpmath sweep of docs/numerics.md measured at most 0.5
// ulp. Where a or b is negative, a+b is rounded to float64 first, which
// adds a relative error of about |ψ(a+b)|·ulp(a+b) (below 1e-13 for
// |a+b| < 1000).
//
// Special cases are:
//
//	Beta(0, b) = Beta(a, 0) = +Inf for a, b ≥ 0
//	Beta(+Inf, b) = Beta(a, +Inf) = 0 for a, b > 0
//	Beta(a, b) = 0 if a+b is 0 or a negative integer and a, b are not
//	Beta(a, b) = NaN if a or b is 0 or a negative integer and the other is negative
//	Beta(a, b) = NaN if a or b is a negative integer, NaN or -Inf
func Beta(a, b float64) float64 {
	if (a < 0 || b < 0) && !math.IsInf(a, 0) && !math.IsInf(b, 0) {
		return betaNeg(a, b)
	}
	if v, ok := betaSpecial(a, b); ok {
		return math.Exp(v)
	}
	return expOf(lnBetaDD(a, b))
}

// betaNeg returns B(a,b) for finite a, b with at least one negative.
// Γ(a)Γ(b) is not finite at a pole of a or b, and Γ has no sign there:
// NaN, as math.Gamma's quotient gives. A pole of Γ(a+b) alone makes
// the quotient 0 (its limit).
func betaNeg(a, b float64) float64 {
	s := a + b
	switch {
	case math.IsNaN(s) || isPole(a) || isPole(b):
		return math.NaN()
	case isPole(s):
		return 0
	}
	l := lnAbsGammaAnyDD(a).add(lnAbsGammaAnyDD(b)).sub(lnAbsGammaAnyDD(s))
	v := expOf(l)
	if GammaSign(a)*GammaSign(b)*GammaSign(s) < 0 {
		return -v
	}
	return v
}

// lnAbsGammaAnyDD returns ln|Γ(x)| for finite x that is not a pole.
func lnAbsGammaAnyDD(x float64) dd {
	if x > 0 {
		return lgammaDD(dd{x, 0})
	}
	return lnAbsGammaNegDD(x)
}
