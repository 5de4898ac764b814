package orbitals

import "math"

// maxDegree bounds the degrees the log-space normalisation accepts; the
// spectral grids this package serves stop far below it.
const maxDegree = 1 << 16

// factorial returns n! as a float64.
func factorial(n int) float64 { // want factorial:`factorial of parameter 0, breaks from 171`
	f := 1.0
	for i := 2; i <= n; i++ {
		f *= float64(i)
	}
	return f
}

// YlmNorm is the normalisation of the spherical harmonic Y_l^m,
// sqrt((2l+1)/(4π) · (l−m)!/(l+m)!).
func YlmNorm(l, m int) float64 { // want YlmNorm:`wrong for some l or some m`
	if m < 0 {
		m = -m
	}
	if m > l {
		return 0
	}
	return math.Sqrt(float64(2*l+1) / (4 * math.Pi) * factorial(l-m) / factorial(l+m)) // want `ratio of factorials in float64: the divisor \(l \+ m\)! overflows to \+Inf for l \+ m ≥ 171, no later than`
}

// YlmNormLog is YlmNorm with the factorial ratio taken in log space.
// It returns NaN above maxDegree.
func YlmNormLog(l, m int) float64 {
	if m < 0 {
		m = -m
	}
	if m > l {
		return 0
	}
	if l > maxDegree {
		return math.NaN()
	}
	a, _ := math.Lgamma(float64(l - m + 1))
	b, _ := math.Lgamma(float64(l + m + 1))
	return math.Sqrt(float64(2*l+1)/(4*math.Pi)) * math.Exp(0.5*(a-b))
}

// AssocLegendre evaluates the associated Legendre function P_l^m(x),
// Condon–Shortley phase included, for 0 <= m <= l and |x| <= 1.
func AssocLegendre(l, m int, x float64) float64 {
	pmm := 1.0
	if m > 0 {
		somx2 := math.Sqrt((1 - x) * (1 + x))
		fact := 1.0
		for i := 1; i <= m; i++ {
			pmm *= -fact * somx2
			fact += 2
		}
	}
	if l == m {
		return pmm
	}
	pmmp1 := x * float64(2*m+1) * pmm
	if l == m+1 {
		return pmmp1
	}
	var pll float64
	for ll := m + 2; ll <= l; ll++ {
		pll = (x*float64(2*ll-1)*pmmp1 - float64(ll+m-1)*pmm) / float64(ll-m)
		pmm, pmmp1 = pmmp1, pll
	}
	return pll
}

// Ylm is the real part of Y_l^m(θ, 0) for 0 <= m <= l.
func Ylm(l, m int, theta float64) float64 { // want Ylm:`wrong for some l`
	return YlmNorm(l, m) * AssocLegendre(l, m, math.Cos(theta)) // want `Ylm builds its result from YlmNorm\(l, m\), which is wrong for some values of l`
}

// LegendreP evaluates P_l(x) by Bonnet's recurrence.
func LegendreP(l int, x float64) float64 {
	if l == 0 {
		return 1
	}
	p0, p1 := 1.0, x
	for k := 1; k < l; k++ {
		p0, p1 = p1, (float64(2*k+1)*x*p1-float64(k)*p0)/float64(k+1)
	}
	return p1
}
