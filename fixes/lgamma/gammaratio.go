package lgamma

// Gamma ratios Γ(a)/Γ(b) as exp(ln Γ(a) − ln Γ(b)) with both logarithms
// in double-double (gamma.go), so neither Γ(a) nor Γ(b) has to be
// representable and a ≈ b loses nothing to cancellation. Negative
// arguments go through the reflection formula (DLMF 5.5.3).

import "math"

// lnGammaRatioDD returns ln Γ(a) − ln Γ(b) for finite a, b > 0. Above
// the series threshold the two Stirling forms are merged as
// (a−½)·ln(a/b) + (a−b)·(ln b − 1) + δ(a) − δ(b), so that for large,
// close a and b no term is larger than the result by more than ln b.
func lnGammaRatioDD(a, b dd) dd {
	if a.hi < stirlingSeriesMin || b.hi < stirlingSeriesMin {
		return lgammaDD(a).sub(lgammaDD(b))
	}
	r := a.addF(-0.5).mul(ddLog(a.div(b))).add(a.sub(b).mul(ddLog(b).addF(-1)))
	return r.addF(stirlingSeries(a.hi) - stirlingSeries(b.hi))
}

// lnAbsGammaDD returns ln|Γ(x)| for finite x that is not a pole.
func lnAbsGammaDD(x float64) dd {
	if x > 0 {
		return lgammaDD(dd{x, 0})
	}
	return dd{lnPi - math.Log(math.Abs(sinPi(x))), 0}.sub(lgammaDD(twoSum(1, -x)))
}

// gammaRatioSpecial returns ln|Γ(a)/Γ(b)|, its sign and true for NaNs,
// infinities and poles, and false when both arguments are finite and
// neither is a pole.
func gammaRatioSpecial(a, b float64) (float64, int, bool) {
	badA := math.IsNaN(a) || math.IsInf(a, -1)
	badB := math.IsNaN(b) || math.IsInf(b, -1)
	bigA := isPole(a) || math.IsInf(a, 1)
	bigB := isPole(b) || math.IsInf(b, 1)
	switch {
	case badA || badB || (bigA && bigB) || isPole(a):
		return math.NaN(), 0, true
	case bigA:
		return math.Inf(1), GammaSign(b), true
	case bigB:
		return math.Inf(-1), GammaSign(a), true
	}
	return 0, 0, false
}

// LogGammaRatio returns ln|Γ(a)/Γ(b)|.
//
// Special cases are:
//
//	LogGammaRatio(+Inf, b) = +Inf for finite b that is not a pole
//	LogGammaRatio(a, +Inf) = LogGammaRatio(a, pole) = -Inf for finite a
//	    that is not a pole
//	LogGammaRatio(pole, b) = NaN (Γ(a) has no sign there)
//	LogGammaRatio(a, b) = NaN if a or b is NaN or -Inf, or both are
//	    +Inf or poles
func LogGammaRatio(a, b float64) float64 {
	if v, _, ok := gammaRatioSpecial(a, b); ok {
		return v
	}
	return lnAbsGammaRatioDD(a, b).float()
}

// lnAbsGammaRatioDD returns ln|Γ(a)/Γ(b)| for finite a, b that are not
// poles.
func lnAbsGammaRatioDD(a, b float64) dd {
	if a > 0 && b > 0 {
		return lnGammaRatioDD(dd{a, 0}, dd{b, 0})
	}
	return lnAbsGammaDD(a).sub(lnAbsGammaDD(b))
}

// GammaRatio returns Γ(a)/Γ(b) without forming either gamma value, so it
// stays finite whenever the ratio is.
//
// Special cases are:
//
//	GammaRatio(+Inf, b) = ±Inf (the sign of Γ(b)) for finite b that is
//	    not a pole
//	GammaRatio(a, +Inf) = GammaRatio(a, pole) = 0 for finite a that is
//	    not a pole
//	GammaRatio(pole, b) = NaN (Γ(a) has no sign there)
//	GammaRatio(a, b) = NaN if a or b is NaN or -Inf, or both are +Inf
//	    or poles
func GammaRatio(a, b float64) float64 {
	if v, s, ok := gammaRatioSpecial(a, b); ok {
		if math.IsNaN(v) {
			return v
		}
		return float64(s) * math.Exp(v)
	}
	v := expOf(lnAbsGammaRatioDD(a, b))
	if GammaSign(a) != GammaSign(b) {
		return -v
	}
	return v
}
