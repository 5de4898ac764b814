package lgamma

// ln Γ(x), in two forms: LogGamma's fast paths, rounded once to float64
// with a relative error near 2^-62 before the rounding, and lgammaDD, a
// double-double with an absolute error near 1e-30 that the ratio
// functions subtract. LogGamma:
//
//   - x ≥ 16: Stirling's series (DLMF 5.11.1) as (x−½)ln x − x + ½ln 2π +
//     Σ B₂ₖ/(2k(2k−1)x^(2k−1)), beyond 2^52 as x(ln x − 1) − ½ln x, so
//     nothing overflows before the result does;
//   - 1/2 ≤ x < 16: the Taylor expansion about the nearest c = 1/2 + j/8
//     (DLMF 5.15.1, coefficients ψ⁽ᵏ⁻¹⁾(c)/k! from mpmath); the centres 1
//     and 2 have a zero constant term, so the result keeps its relative
//     accuracy next to the zeros of ln Γ (the expansions about the zeros,
//     as in Cody and Hillstrom, "Chebyshev approximations for the natural
//     logarithm of the gamma function", Math. Comp. 21, 1967);
//   - 0 < x < 1/2: ln Γ(1+x) − ln x (DLMF 5.5.1);
//   - x < 0: the upward recurrence above −20 and the reflection formula
//     Γ(x)Γ(1−x) = π/sin(πx) (DLMF 5.5.3) below; next to the zeros of
//     ln|Γ| between −18 and −2, Taylor expansions about each zero.
//
// lgammaDD: the expansions about 1 and 2 (DLMF 5.7.3) within 1/64,
// Stirling's series in double-double at z ≥ 16, and the rest shifted up
// to 16 by Γ(x) = Γ(x+m)/(x(x+1)…(x+m−1)).

import "math"

// stirlingAccurateMax is where the float64 series of stirling.go is
// accurate enough for ln Γ: above 2^20 its rounding error is below
// 2^-80 absolute while ln Γ(z) exceeds 10⁷.
const stirlingAccurateMax = 0x1p20

// stirlingSeriesDD returns Σ B₂ₖ/(2k(2k−1)z^(2k−1)) for z ≥ 16, to about
// 1e-33 absolute: twenty terms (the first omitted is below 1e-34 at
// z = 16), the six largest in double-double.
func stirlingSeriesDD(z dd) dd {
	r := dd{1, 0}.div(z)
	r2 := r.mul(r)
	x := r2.hi
	t := stirlingCoef[len(stirlingCoef)-1].hi
	for i := len(stirlingCoef) - 2; i >= 6; i-- {
		t = t*x + stirlingCoef[i].hi
	}
	s := dd{t, 0}
	for i := 5; i >= 0; i-- {
		s = s.mul(r2).add(stirlingCoef[i])
	}
	return s.mul(r)
}

// lgammaStirling returns ln Γ(z) for z ≥ 16 in double-double.
func lgammaStirling(z dd) dd {
	l := ddLog(z)
	r := z.mul(l.addF(-1)).sub(l.mulF(0.5)).add(halfLn2Pi)
	if z.hi < stirlingAccurateMax {
		return r.add(stirlingSeriesDD(z))
	}
	return r.addF(stirlingSeries(z.hi))
}

// lgammaLarge returns ln Γ(x) for x ≥ 16 rounded to float64. Below 2^52
// x−½ is exact, and the double-double sum of lgammaLargeDD reduces to
// two error-free additions: (x−½)·ln x − x and then ½ln 2π + series,
// with all low parts added last.
func lgammaLarge(x float64) float64 {
	if x >= 0x1p52 {
		return lgammaLargeDD(dd{x, 0}).float()
	}
	p := ddLogFast(dd{x, 0}).mulF(x - 0.5)
	s := twoSum(p.hi, -x)
	t := twoSum(halfLn2Pi.hi, stirlingSeries(x))
	u := twoSum(s.hi, t.hi)
	return u.hi + (u.lo + (s.lo + p.lo + t.lo + halfLn2Pi.lo))
}

// lgammaLargeDD returns ln Γ(z) for z ≥ 16 to about 2^-70 relative.
// Nothing cancels here: (z−½)·ln z is about the result, so ln z needs
// only ddLogFast, and the float64 series errs by less than 1e-18 where
// the result is at least 27. Beyond 2^52, where (z−½)·ln z could
// overflow before z is subtracted although the result does not, it is
// written z·(ln z − 1) − ½ln z.
func lgammaLargeDD(z dd) dd {
	l := ddLogFast(z)
	s := stirlingSeries(z.hi)
	if z.hi < 0x1p52 {
		return l.mul(z.addF(-0.5)).sub(z).add(halfLn2Pi).addF(s)
	}
	return z.mul(l.addF(-1)).sub(l.mulF(0.5)).add(halfLn2Pi).addF(s)
}

// lgammaCenter is the Taylor expansion of ln Γ about c (series_tables.go,
// generated with mpmath): ln Γ(c+t) = a[0] + a[1]t + a[2]t² + Σ f[k−3]tᵏ.
type lgammaCenter struct {
	c float64
	a [3]dd
	f [20]float64
}

// lgammaTable returns ln Γ(x) for 1/2 ≤ x < 16 rounded to float64, from
// the expansion about the nearest c = 1/2 + j/8 (|t| ≤ 1/16; the first
// omitted term is below 2^-70 of the result even at c = 1/2, whose
// radius of convergence is 1/2). t = x − c is exact (Sterbenz); the
// float64 part from t³ on is at most 2^-10 of the result, so its
// rounding stays near 2^-62; the expansions about 1 and 2 have a[0] = 0
// and keep the relative accuracy next to the zeros. This is the fast
// path of LogGamma; lgammaDD, which the ratio functions need for its
// absolute accuracy, is several times slower.
func lgammaTable(x float64) float64 {
	e := &lgammaCenters[int((x-0.5)*8+0.5)]
	return e.eval(x - e.c).float()
}

// eval sums the expansion at t, |t| ≤ 1/16.
func (e *lgammaCenter) eval(t float64) dd {
	s := e.f[len(e.f)-1]
	for i := len(e.f) - 2; i >= 0; i-- {
		s = s*t + e.f[i]
	}
	return e.a[2].addF(s * t).mulF(t).add(e.a[1]).mulF(t).add(e.a[0])
}

// lgamma1pDD returns ln Γ(1+y) for −1/2 ≤ y < 1/2 from the same table
// without forming 1+y: t = y − (c−1) is exact (Sterbenz, or t = y at
// c = 1).
func lgamma1pDD(y float64) dd {
	e := &lgammaCenters[int((y+0.5)*8+0.5)]
	return e.eval(y - (e.c - 1))
}

// lgammaSmall returns ln Γ(x) for 0 < x < 1/2 rounded to float64:
// ln Γ(x) = ln Γ(1+x) − ln x (DLMF 5.5.1), with ln Γ(1+x) from the
// table above (lgamma1pDD). −ln x ≥ 0.69 is the larger
// term, so the fast logarithm is enough.
func lgammaSmall(x float64) float64 {
	return lgamma1pDD(x).sub(ddLogFast(dd{x, 0})).float()
}

// nearRadius bounds |t| in the expansions about 1 and 2 that lgammaDD
// uses; nearTerms of them are summed, the first nearDD in double-double.
// At |t| = 1/64 the first omitted term is below 2^-106 of the result and
// the float64 part starts below 2^-47 of it, so the sum is accurate to
// about 2^-100 relative: the full double-double precision that the
// differences of log-gammas in the ratio functions need.
const (
	nearRadius = 1.0 / 64
	nearTerms  = 20
	nearDD     = 8
)

// lgammaNear returns Σ c[k−1]·tᵏ for |t| ≤ nearRadius.
func lgammaNear(t dd, c *[32]dd) dd {
	x := t.hi
	s := c[nearTerms-1].hi
	for i := nearTerms - 2; i >= nearDD; i-- {
		s = s*x + c[i].hi
	}
	r := dd{s, 0}
	for i := nearDD - 1; i >= 0; i-- {
		r = r.mul(t).add(c[i])
	}
	return r.mul(t)
}

// lgammaDD returns ln Γ(x) for a finite x > 0 in double-double.
func lgammaDD(x dd) dd {
	if x.lo == 0 && x.hi <= float64(len(lnFactTable)) && x.hi == math.Trunc(x.hi) {
		return lnFactTable[int(x.hi)-1]
	}
	if x.hi >= stirlingSeriesMin {
		return lgammaStirling(x)
	}
	if t := x.addF(-1); math.Abs(t.hi) <= nearRadius {
		return lgammaNear(t, &lgamma1Coef)
	}
	if t := x.addF(-2); math.Abs(t.hi) <= nearRadius {
		return lgammaNear(t, &lgamma2Coef)
	}
	if x.hi < nearRadius {
		return lgammaNear(x, &lgamma1Coef).sub(ddLog(x))
	}
	p := x
	z := x.addF(1)
	for z.hi < stirlingSeriesMin {
		p = p.mul(z)
		z = z.addF(1)
	}
	return lgammaStirling(z).sub(ddLog(p))
}

// lgammaNeg returns ln|Γ(x)| for finite x < 0 that is not a pole,
// rounded to float64. The fast forms below have an absolute error near
// 2^-62; where their result is below 1/4 in magnitude (next to the zeros
// of ln|Γ|) the accurate lnAbsGammaNegDD decides instead.
//
//   - −1/2 < x < 0: ln Γ(1+x) − ln|x| (DLMF 5.5.1), at least 0.69;
//   - −20 < x ≤ −1/2: y = x+n in (0, 1] with n = ⌈−x⌉ (exact: |y| < 1
//     and y is a multiple of x's ulp), ln|Γ(x)| = ln Γ(y) −
//     ln|x(x+1)…(x+n−1)|, ln Γ(y) from the table or as
//     ln Γ(1+y) − ln y for y < 1/2; every factor x+i is exact as well;
//   - x ≤ −20: the reflection formula with the fast Stirling form, where
//     |ln|Γ(x)|| > 9 and nothing cancels.
func lgammaNeg(x float64) float64 {
	switch {
	case x > -0.5:
		return lgamma1pDD(x).sub(ddLogFast(dd{-x, 0})).float()
	case x <= reflectMin:
		return lnPiDD.sub(ddLogFast(sinPiAbsDD(x))).sub(lgammaLargeDD(twoSum(1, -x))).float()
	}
	n := math.Ceil(-x)
	y := x + n
	p := dd{x, 0}
	for i := 1.0; i < n; i++ {
		p = p.mulF(x + i)
	}
	var g dd
	if y >= 0.5 {
		g = lgammaTableDD(y)
	} else {
		g = lgamma1pDD(y)
		p = p.mulF(y)
	}
	if p.hi < 0 {
		p = p.neg()
	}
	r := g.sub(ddLogFast(p))
	if math.Abs(r.hi) < 0.25 {
		return lnAbsGammaNegDD(x).float()
	}
	return r.float()
}

// lgammaTableDD is lgammaTable before the rounding.
func lgammaTableDD(x float64) dd {
	e := &lgammaCenters[int((x-0.5)*8+0.5)]
	return e.eval(x - e.c)
}

// reflectMin is where LogGamma changes from the upward recurrence to the
// reflection formula for negative x.
const reflectMin = -20

// lnAbsGammaNegDD returns ln|Γ(x)| for finite x < 0 that is not a pole.
func lnAbsGammaNegDD(x float64) dd {
	if x > -18 && x < -2 {
		for i := range negZeros {
			if r, ok := negZeros[i].eval(x); ok {
				return r
			}
		}
	}
	if x > reflectMin {
		// ln|Γ(x)| = ln Γ(z) − ln|x(x+1)…(z−1)| with z = x+m ≥ 16: one
		// product, every factor exact in double-double, and no expansion
		// whose own rounding would be magnified by the cancellation near
		// the zeros of ln|Γ|.
		p := dd{x, 0}
		m := 1.0
		for ; x+m < stirlingSeriesMin; m++ {
			p = p.mul(twoSum(x, m))
		}
		if p.hi < 0 {
			p = p.neg()
		}
		return lgammaStirling(twoSum(x, m)).sub(ddLog(p))
	}
	// ln|Γ(x)| = ln π − ln|sin πx| − ln Γ(1−x).
	return lnPiDD.sub(ddLog(sinPiAbsDD(x))).sub(lgammaDD(twoSum(1, -x)))
}

// negZero is a zero x₀ of ln|Γ| on the negative axis with the Taylor
// expansion about it (DLMF 5.15.1: the derivatives of ln|Γ| are ψ and
// the polygamma functions), generated with mpmath (series_tables.go).
// Within the radius the result is a1·h to double-double accuracy plus
// terms below 2^-20 of it, where h = x − x₀ is exact to 2^-150; the
// product path of lnAbsGammaNegDD, with an absolute error near 1e-30,
// would lose the relative accuracy of results this close to zero.
type negZero struct {
	x0         [3]float64 // x₀ as a triple-double
	radius     float64
	a1         dd // ψ(x₀)
	a2, a3, a4 float64
}

// eval returns ln|Γ(x)| and true if x is within the radius of x₀.
func (z *negZero) eval(x float64) (dd, bool) {
	if !(math.Abs(x-z.x0[0]) < 0.5) {
		return dd{}, false
	}
	h := twoSum(x-z.x0[0], -z.x0[1]).addF(-z.x0[2]) // x − x₀[0] is exact (Sterbenz)
	t := h.hi
	if !(math.Abs(t) < z.radius) {
		return dd{}, false
	}
	return z.a1.mul(h).addF(t * t * (z.a2 + t*(z.a3+t*z.a4))), true
}

// lnPiDD is ln π as a double-double (from mpmath, 50 digits:
// 1.1447298858494001741434273513530587116472948129153).
var lnPiDD = dd{1.1447298858494002, 1.0265951162707826e-17}

// isPole reports whether Γ has a pole at x (zero or a negative integer).
func isPole(x float64) bool { return x <= 0 && x == math.Trunc(x) }

// LogGamma returns ln|Γ(x)|. The sign of Γ(x) is not part of the result;
// GammaSign returns it, and the pair replaces math.Lgamma.
//
// Accuracy: within 1 ulp for every finite x, correctly rounded in all
// but rare cases: next to the zeros at 1 and 2, next to the poles and
// next to the zeros of ln|Γ| on the negative axis (a pair between each
// two negative integers down to −18) included. The mpmath sweep of
// docs/numerics.md measured at most 0.5 ulp in every input class.
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
	case x >= stirlingSeriesMin:
		return lgammaLarge(x)
	case x >= 0.5:
		return lgammaTable(x)
	case x > 0:
		return lgammaSmall(x)
	}
	return lgammaNeg(x)
}

// sinPiAbsDD returns |sin(πx)| for finite x that is not an integer, to
// about 2^-66 relative: the argument is reduced exactly to r in (0, ½]
// (sin π(n ± r) = ±sin πr), and sin πr, or cos π(½ − r) above ¼, is
// summed from its Taylor series (DLMF 4.19.1, 4.19.2) to the power 21
// or 20, where the next term is below 2^-70 for |πr| ≤ π/4; the terms
// up to the fourth power are in double-double.
func sinPiAbsDD(x float64) dd {
	r := math.Abs(x - 2*math.Round(x/2)) // exact: r in [0, 1]
	if r > 0.5 {
		r = 1 - r // exact
	}
	cos := r > 0.25
	if cos {
		r = 0.5 - r // exact for r in [¼, ½]
	}
	s := piDD.mulF(r)
	s2 := s.mul(s)
	h := s2.hi
	// Σ (−1)ᵏ s²ᵏ/(2k+j)! for k ≥ 3, j = 1 (sine) or 0 (cosine).
	j := 1
	if cos {
		j = 0
	}
	t := 0.0
	for k := 10; k >= 3; k-- {
		c := 1 / factTable[2*k+j]
		if k%2 == 1 {
			c = -c
		}
		t = t*h + c
	}
	t *= h * h * h
	if cos {
		// 1 − s²/2 + s⁴/24 + t
		return s2.mul(s2).mul(inv24).sub(s2.mulF(0.5)).addF(t).addF(1)
	}
	// s·(1 − s²/6 + s⁴/120 + t)
	return s.mul(s2.mul(s2).mul(inv120).sub(s2.mul(inv6)).addF(t).addF(1))
}

// recipDD returns 1/n as a double-double: the error of the float64
// quotient is (1 − n·hi)/n, whose numerator FMA forms exactly.
func recipDD(n float64) dd {
	hi := 1 / n
	return dd{hi, math.FMA(-n, hi, 1) / n}
}

var (
	inv6   = recipDD(6)
	inv24  = recipDD(24)
	inv120 = recipDD(120)
	// piDD is π as a double-double (common practice; the digits are
	// checked against math/big in the tests).
	piDD = dd{math.Pi, 1.2246467991473532e-16}
)

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
