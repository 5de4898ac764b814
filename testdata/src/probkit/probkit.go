// Package probkit holds the counting helpers of a warehouse's inspection
// tools. Counts are whole numbers kept in float64, as the spreadsheet
// the tools replaced kept them.
package probkit

import "math"

// Fact returns n! for a whole number n held in a float64, as it is: +Inf
// past 170! is the IEEE value of a result beyond float64, not reported.
// Choose divides such values and is reported.
func Fact(n float64) float64 { // want Fact:`factorial of parameter 0, breaks from 171`
	v := 1.0
	for i := 2.0; i <= n; i++ {
		v *= i
	}
	return v
}

// Choose returns C(n, k), the number of ways to draw k of n items.
func Choose(n, k float64) float64 { // want Choose:`value Γ\(p0 \+ 1\)/\(Γ\(p1 \+ 1\)·Γ\(p0 - p1 \+ 1\)\), wrong once p0 ≥ 171` Choose:`wrong for n ≥ 171`
	return Fact(n) / (Fact(k) * Fact(n-k)) // want `ratio of factorials in float64: the numerator n! overflows to \+Inf for n ≥ 171`
}

// Gamma is the gamma function the dashboards call by this name.
func Gamma(x float64) float64 { // want Gamma:`value Γ\(p0\), wrong once p0 ≥ 171.62`
	return math.Gamma(x)
}

// SmallChoose is Choose for the panels of at most 60 items the
// inspection desk uses, where every factorial fits.
func SmallChoose(n, k float64) float64 {
	if n < 0 || n > 60 {
		return math.NaN()
	}
	return Fact(n) / (Fact(k) * Fact(n-k))
}
