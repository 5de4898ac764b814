// Package gammaoverflow holds the gamma-overflow category's cases: a
// math.Gamma call whose argument may pass 171.62, where it returns +Inf
// (DLMF 5.4.1 with 170!, from memory), and whose value meets arithmetic.
package gammaoverflow

import "math"

// Scale multiplies by Γ(x) with nothing bounding x.
func Scale(x, w float64) float64 { // want Scale:`value Γ\(p0\)·\(p1\), wrong once p0 ≥ 171\.624377`
	return w * math.Gamma(x) // want `math.Gamma`
}

// Bounded keeps x below the overflow: silent.
func Bounded(x, w float64) float64 {
	if x > 170 {
		return 0
	}
	return w * math.Gamma(x)
}

// Count is Γ(n+1) = n! for an integer n with nothing bounding it.
func Count(n int, w float64) float64 { // want Count:`value \(p1\)/Γ\(p0 \+ 1\), wrong once p0 \+ 1 ≥ 171\.624377`
	return w / math.Gamma(float64(n)+1) // want `math.Gamma`
}

// Small asks for Γ(5): silent.
func Small(w float64) float64 {
	return w * math.Gamma(5)
}

// Bare hands Γ(x) back untouched, where +Inf is the right answer for a
// value past the range: silent.
func Bare(x float64) float64 { // want Bare:`value Γ\(p0\), wrong once p0 ≥ 171\.624377`
	return math.Gamma(x)
}

// ClosureRanges bounds x, but a closure made before the bound sets x by
// ranging over xs and runs after it: the bound no longer holds.
func ClosureRanges(x, w float64, xs []float64) {
	next := func() {
		for _, x = range xs {
		}
	}
	if x > 170 {
		return
	}
	next()
	weighted = w * math.Gamma(x) // want `math.Gamma`
}

var weighted float64
