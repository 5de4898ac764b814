package lgamma

// Powers over Gamma values x^p/Γ(a) with real p and a: the volume
// π^(d/2)/Γ(d/2+1) of the unit d-ball (DLMF 5.19.4) and the
// normalising constants of the gamma and chi-square densities. Where
// x^p or Γ(a) alone leaves float64 the quotient is taken in log space,
// exp(p·ln|x| − ln|Γ(a)|), carried in double-double.

import "math"

// PowOverGamma returns x^p/Γ(a).
//
// Where math.Pow(x, p) and math.Gamma(a) are both finite and nonzero and
// their quotient is a normal float64 (or zero), PowOverGamma returns that
// quotient itself, bit for bit; elsewhere it returns the value of the
// quotient, which math.Pow and math.Gamma cannot form: π^750/Γ(751)
// underflows to 0 rather than being NaN, 200^150.5/Γ(76.25) ≈ 6.1e265
// rather than +Inf.
//
// Accuracy: in log space within a few ulps wherever the result is a
// normal float64 (the exponent is carried in double-double).
//
// Special cases are (as the quotient of math.Pow and math.Gamma):
//
//	PowOverGamma(x, p, a) = NaN if math.Pow(x, p) or math.Gamma(a) is NaN
//	    (x < 0 with p not an integer, a a negative integer)
//	PowOverGamma(x, p, a) = math.Pow(x, p)/math.Gamma(a) if x is 0 or
//	    ±Inf, p is ±Inf, or a is ±Inf or a pole (0, -1, -2, …)
func PowOverGamma(x, p, a float64) float64 {
	num, den := math.Pow(x, p), math.Gamma(a)
	q := num / den
	switch {
	case math.IsNaN(num) || math.IsNaN(den) || math.IsNaN(q) && (math.IsNaN(x) || math.IsNaN(p) || math.IsNaN(a)):
		return q
	case x == 0 || math.IsInf(x, 0) || math.IsInf(p, 0) || math.IsInf(a, 0) || isPole(a):
		return q
	case !math.IsInf(num, 0) && !math.IsInf(den, 0) && num != 0 && den != 0 && !math.IsInf(q, 0) && math.Abs(q) >= 0x1p-1022:
		return q
	}
	l := ddLog(dd{math.Abs(x), 0}).mulF(p).sub(lnAbsGammaDD(a))
	v := expOf(l)
	if x < 0 && math.Mod(p, 2) != 0 {
		v = -v // p is an odd integer: math.Pow(x, p) was not NaN
	}
	if GammaSign(a) < 0 {
		v = -v
	}
	return v
}
