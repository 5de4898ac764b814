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

// gammaSpecial reports whether x is one of math.Gamma's special cases:
// NaN, ±Inf, or a pole (±0 or a negative integer), where Γ(x) as a
// float64 is ±Inf or NaN. At every other float64 x, Γ(x) is a nonzero
// real number, though one that may leave float64.
func gammaSpecial(x float64) bool {
	return math.IsNaN(x) || math.IsInf(x, 0) || isPole(x)
}

// gammaStandIn returns what stands for Γ(x) in a ratio with a special
// case: math.Gamma's own value at a special case, and elsewhere ±1 with
// the sign of Γ(x), so that the quotient of the two stand-ins is the
// quotient of math.Gamma's values wherever the other one is finite and
// the limit of the ratio where it leaves float64 (Γ(+Inf)/Γ(200) is
// +Inf, not math.Gamma's Inf/Inf).
func gammaStandIn(x float64) float64 {
	if gammaSpecial(x) {
		return math.Gamma(x)
	}
	return float64(GammaSign(x))
}

// LogGammaRatio returns ln|Γ(a)/Γ(b)|.
//
// Accuracy: within 1 ulp for positive a and b, close ones included,
// and next to the curve Γ(a) = Γ(b) (taken in math/big there for
// a, b < 2^40); for negative arguments the absolute error is below
// about 1e-29, which is within 1 ulp unless the result is below about
// 1e-13; the mpmath sweep of docs/numerics.md measured at most 0.5 ulp.
//
// Special cases are those of LogGamma(a) − LogGamma(b), which are
// math.Lgamma's, so the value is the one math.Lgamma(a) − math.Lgamma(b)
// has wherever a or b is ±Inf, NaN or a pole (0, −0 or a negative
// integer; "finite" below means finite and not a pole):
//
//	LogGammaRatio(+Inf, b) = LogGammaRatio(pole, b) = +Inf for finite b
//	LogGammaRatio(a, +Inf) = LogGammaRatio(a, pole) = -Inf for finite a
//	LogGammaRatio(-Inf, b) = -Inf for finite b
//	LogGammaRatio(a, -Inf) = +Inf for finite a
//	LogGammaRatio(+Inf, -Inf) = LogGammaRatio(pole, -Inf) = +Inf
//	LogGammaRatio(-Inf, +Inf) = LogGammaRatio(-Inf, pole) = -Inf
//	LogGammaRatio(a, b) = NaN if a or b is NaN, or both are +Inf or
//	    poles, or both are -Inf
func LogGammaRatio(a, b float64) float64 {
	if gammaSpecial(a) || gammaSpecial(b) {
		return LogGamma(a) - LogGamma(b)
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
// Special cases are those of math.Gamma (Gamma(+Inf) = +Inf,
// Gamma(+0) = +Inf, Gamma(-0) = -Inf, Gamma(x) = NaN for integer x < 0,
// Gamma(-Inf) = NaN, Gamma(NaN) = NaN), so the value is the one
// math.Gamma(a)/math.Gamma(b) has wherever a or b is one of them and
// the other's Γ is a float64; where the other's Γ leaves float64 it is
// the limit ("finite" below means finite and not zero or a negative
// integer; ±1 is the sign of Γ at the finite argument):
//
//	GammaRatio(+Inf, b) = GammaRatio(+0, b) = ±Inf for finite b
//	GammaRatio(-0, b) = ∓Inf for finite b
//	GammaRatio(a, +Inf) = GammaRatio(a, +0) = ±0 for finite a
//	GammaRatio(a, -0) = ∓0 for finite a
//	GammaRatio(a, b) = NaN if a or b is NaN, -Inf or a negative
//	    integer, or both are ±0 or +Inf
func GammaRatio(a, b float64) float64 {
	if gammaSpecial(a) || gammaSpecial(b) {
		return gammaStandIn(a) / gammaStandIn(b)
	}
	v := expOf(lnAbsGammaRatioDD(a, b))
	if GammaSign(a) != GammaSign(b) {
		return -v
	}
	return v
}
