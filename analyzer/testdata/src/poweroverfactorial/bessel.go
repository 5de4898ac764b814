package poweroverfactorial

import "math"

// A sonar array's beam model sums Bessel series, each term a power over
// a product of two factorials computed on their own.

// Beam sums J_n(x) over 300 terms: from k = 171 on, k! is +Inf, so is
// the divisor, and the term is 0, or NaN where the power overflowed
// too (x = 10: (x/2)^(2k+n) passes float64 at k ≈ 220), although the
// series converges to a finite value.
func Beam(n int, x float64) float64 { // want Beam:`wrong for some n`
	sum := 0.0
	for k := 0; k < 300; k++ {
		sum += math.Pow(-1, float64(k)) * math.Pow(x/2, float64(2*k+n)) / (factF(k) * factF(k+n)) // want `term with \(x / 2\)\^\(2\*k \+ n\) over k!·\(k \+ n\)! in float64: k! overflows to \+Inf for k ≥ 171 \(170! ≈ 7\.26e306 is the largest that fits\), and the divisor with it, after which the term is 0 or NaN although its true value is finite; k may reach 299 here`
	}
	return sum
}

// Lobe stops at 20 terms of low order: both factorials fit.
func Lobe(x float64) float64 {
	sum := 0.0
	for k := 0; k < 20; k++ {
		sum += math.Pow(-1, float64(k)) * math.Pow(x/2, float64(2*k+1)) / (factF(k) * factF(k+1))
	}
	return sum
}
