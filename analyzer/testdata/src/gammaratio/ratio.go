// Package gammaratio holds the gamma-ratio category's cases: ratios and
// products of math.Gamma values that overflow in a Gamma call although
// the result is finite. Γ(x) overflows float64 just above x = 171.62
// (DLMF 5.4.1 with 170!, from memory).
package gammaratio

import "math"

// Spread is Γ(a)/Γ(b) with nothing bounding a or b.
func Spread(a, b float64) float64 { // want Spread:`value Γ\(p0\)/Γ\(p1\), wrong once p0 ≥ 171\.624377 or p1 ≥ 171\.624377` Spread:`wrong for a ≥ 171\.624377 or b ≥ 171\.624377`
	return math.Gamma(a) / math.Gamma(b) // want `ratio of math.Gamma`
}

// Mix is the Beta function Γ(a)Γ(b)/Γ(a+b).
func Mix(a, b float64) float64 { // want Mix:`value Γ\(p0\)·Γ\(p1\)/Γ\(p0 \+ p1\), wrong once p0 ≥ 171\.624377 or p1 ≥ 171\.624377 or p0 \+ p1 ≥ 171\.624377`
	return math.Gamma(a) * math.Gamma(b) / math.Gamma(a+b) // want `Beta function`
}

// Small bounds both arguments: silent.
func Small(a, b float64) float64 {
	if a > 100 || b > 100 || a < 1 || b < 1 {
		return 0
	}
	return math.Gamma(a) / math.Gamma(b)
}
