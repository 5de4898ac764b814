// Package gammaoverflow holds the gamma-overflow category's cases: a
// math.Gamma call whose argument may pass 171.62, where it returns +Inf
// (DLMF 5.4.1 with 170!, from memory), and whose value meets arithmetic.
package gammaoverflow

import "math"

// Scale multiplies by Γ(x) with nothing bounding x.
func Scale(x, w float64) float64 {
	return w * math.Gamma(x) // want `math.Gamma`
}

// Bounded keeps x below the overflow: silent.
func Bounded(x, w float64) float64 {
	if x > 170 {
		return 0
	}
	return w * math.Gamma(x)
}
