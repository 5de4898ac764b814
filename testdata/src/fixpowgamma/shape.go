// Package fixpowgamma is the shape library of a particle simulator:
// volumes of d-dimensional balls and gamma-density weights, powers
// divided by Gamma values.
package fixpowgamma

import "math"

// UnitBall is the volume π^(d/2)/Γ(d/2+1) of the unit d-ball (DLMF
// 5.19.4, from memory): +Inf/+Inf = NaN past d = 341 although the
// volume only shrinks towards 0.
func UnitBall(d float64) float64 { // want UnitBall:`value \(884279719003555/281474976710656\)\^`
	return math.Pow(math.Pi, d/2) / math.Gamma(d/2+1) // want `math.Gamma overflows`
}

// Weight is the gamma-density weight x^(k−1)/Γ(k) of a shape k.
func Weight(x, k float64) float64 { // want Weight:`value \(p0\)\^\(p1 - 1\)/Γ\(p1\)`
	return math.Pow(x, k-1) / (math.Gamma(k)) // want `math.Gamma overflows`
}

// Ball of radius r: two powers over the Gamma value, the product
// formed before the division: each factor is carried in log space.
func Ball(d, r float64) float64 { // want Ball:`value \(p1\)\^\(p0\)`
	return math.Pow(r, d) * math.Pow(math.Pi, d/2) / math.Gamma(d/2+1) // want `math.Gamma overflows`
}

// Radius divides by the power: the Gamma value is above the line, and
// the quotient is taken in log space too.
func Radius(d, r float64) float64 { // want Radius:`value Γ`
	return math.Gamma(d/2+1) / math.Pow(r, d) // want `math.Gamma overflows`
}
