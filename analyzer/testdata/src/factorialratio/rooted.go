package factorialratio

import "math"

// Square roots of products and ratios of float factorials: the code
// keeps the root, which fits long after the product under it leaves
// float64. The first inputs in the messages are from mpmath (4^n·n!
// first exceeds math.MaxFloat64 at n = 134; its square root only at
// n = 242).

// CoherentNorm is 1/√(4^n·n!), a coherent state's normaliser in a
// scaled basis: 4^n·n! leaves float64 at n = 134, its root fits.
func CoherentNorm(n int) float64 { // want CoherentNorm:`wrong for n ≥ 134`
	return 1 / math.Sqrt(math.Pow(4, float64(n))*factF(n)) // want `product of factorials and powers under math\.Sqrt in float64: the intermediate 4\^n·n! overflows to \+Inf first, at n = 134 on that line of inputs, while the square root the code keeps still fits \(n! alone only for n ≥ 171\)`
}

// LaguerreNorm is √(n!/(n+a)!), the generalised Laguerre functions'
// normaliser: the divisor leaves float64 first, the ratio never does.
func LaguerreNorm(n, a int) float64 { // want LaguerreNorm:`wrong for some n or some a`
	return math.Sqrt(factF(n) / factF(n+a)) // want `ratio of factorials in float64: the divisor \(n \+ a\)! overflows to \+Inf for n \+ a ≥ 171, no later than the numerator's n!`
}

// The functions below stay silent.

// CoherentNormSmall bounds n where 4^n·n! fits.
func CoherentNormSmall(n int) float64 {
	if n < 0 || n > 100 {
		return math.NaN()
	}
	return 1 / math.Sqrt(math.Pow(4, float64(n))*factF(n))
}

// CoherentWeight is 4^n·n! itself: +Inf where it leaves float64 is
// the value.
func CoherentWeight(n int) float64 { // want CoherentWeight:`value Γ\(p0 \+ 1\)·\(2\)\^\(2\*p0\), wrong once p0 ≥ 171`
	return math.Pow(4, float64(n)) * factF(n)
}

// CoherentNormLog takes the root in log space.
func CoherentNormLog(n int) float64 {
	lf, _ := math.Lgamma(float64(n + 1))
	return math.Exp(-0.5 * (float64(n)*math.Log(4) + lf))
}
