package lgamma

// Gamma ratios Γ(a)/Γ(b) as exp(ln Γ(a) − ln Γ(b)) with both logarithms
// in double-double (gamma.go), so neither Γ(a) nor Γ(b) has to be
// representable and a ≈ b loses nothing to cancellation. Negative
// arguments go through the reflection formula (DLMF 5.5.3).

import (
	"math"
	"math/big"
)

// lnGammaRatioDD returns ln Γ(a) − ln Γ(b) for finite a, b > 0.
//
// Above the series threshold the two Stirling forms are merged as
// (a−½)·ln(1 + (a−b)/b) + (a−b)·(ln b − 1) + δ(a) − δ(b), so that for
// large, close a and b no term is larger than the result by more than
// ln b. δ(a) − δ(b) is the series difference in divided-difference form
// (Horner's rule run on both points with the divided difference carried
// along, common practice), a multiple of 1/a − 1/b = (b−a)/(ab), so it
// keeps its relative accuracy however close a and b are.
//
// Below the threshold, close arguments (|a−b| ≤ min(a,b)/4) are shifted
// together: ln Γ(a) − ln Γ(b) = [ln Γ(a+m) − ln Γ(b+m)] −
// ln Π (1 + (a−b)/(b+i)), the product kept as its deviation from 1.
// Other arguments take the difference of the two log-gammas, whose
// absolute error (about 1e-30) is far below the result's ulp.
func lnGammaRatioDD(a, b dd) dd {
	h := a.sub(b)
	if a.hi >= stirlingSeriesMin && b.hi >= stirlingSeriesMin {
		return stirlingRatio(a, b, h)
	}
	lo := math.Min(a.hi, b.hi)
	if !(math.Abs(h.hi) <= lo/4) {
		return lgammaDD(a).sub(lgammaDD(b))
	}
	var dev dd // Π(1 + tᵢ) − 1
	for i := 0.0; lo+i < stirlingSeriesMin; i++ {
		t := h.div(b.addF(i))
		dev = dev.add(t).add(dev.mul(t))
	}
	m := math.Ceil(stirlingSeriesMin - lo)
	return stirlingRatio(a.addF(m), b.addF(m), h).sub(ddLog1p(dev))
}

// ratioTerms is how many Stirling coefficients the divided difference
// uses: at z = 16 the 13th term is below 1e-27 of the first.
const ratioTerms = 12

// stirlingRatio returns ln Γ(a) − ln Γ(b) for a, b ≥ 16 with h = a − b.
func stirlingRatio(a, b, h dd) dd {
	r := a.addF(-0.5).mul(ddLog1p(h.div(b))).add(h.mul(ddLog(b).addF(-1)))
	// δ(a) − δ(b) = Σ cₖ(raᵏ − rbᵏ) over odd powers, = d·[P(ua) +
	// rb(ra+rb)·D] with d = ra − rb, u = r², P(u) = Σ cₖu^(k−1) and D the
	// divided difference of P between ua and ub.
	ra, rb := 1/a.hi, 1/b.hi
	ua, ub := ra*ra, rb*rb
	pa := stirlingCoef[ratioTerms-1].hi
	pb, dv := pa, 0.0
	for i := ratioTerms - 2; i >= 0; i-- {
		dv = dv*ua + pb
		pa = pa*ua + stirlingCoef[i].hi
		pb = pb*ub + stirlingCoef[i].hi
	}
	d := h.neg().div(a).div(b)
	return r.add(d.mulF(pa + rb*(ra+rb)*dv))
}

// lnAbsGammaDD returns ln|Γ(x)| for finite x that is not a pole.
func lnAbsGammaDD(x float64) dd {
	if x > 0 {
		return lgammaDD(dd{x, 0})
	}
	return lnAbsGammaNegDD(x)
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
// Accuracy: within 1 ulp for positive a and b, close ones included,
// and next to the curve Γ(a) = Γ(b) (taken in math/big there for
// a, b < 2^40); for negative arguments the absolute error is below
// about 1e-29, which is within 1 ulp unless the result is below about
// 1e-13. the mpmath sweep of docs/numerics.md measured at most 0.5 ulp.
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
	r := lnAbsGammaRatioDD(a, b)
	if a != b && a > 0 && b > 0 && a < bigMax && b < bigMax && math.Abs(r.hi) < 0x1p-20*math.Max(math.Abs(a-b), 0x1p-20) {
		// Next to the curve Γ(a) = Γ(b) (or where ψ nearly vanishes
		// between a and b) the double-double's absolute error, up to
		// about 2^-77·|a−b|, could exceed the ulp: math/big.
		return bigLnGammaSum([]*big.Float{bigNew().SetFloat64(a), bigNew().SetFloat64(b)}, []int{1, -1})
	}
	return r.float()
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
// Accuracy: within 1 ulp wherever the result is a normal float64,
// negative arguments included; the mpmath sweep of docs/numerics.md measured at most 0.5 ulp.
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
