package gammaratio

import "math"

// math.Gamma called through a variable that names it for good: set once
// to math.Gamma, or to a literal that only passes its argument on. Γ(x)
// is +Inf from x = 171.624… (DLMF 5.4.1 with 170!, from memory).

// BetaByAlias is B(a, b) = Γ(a)Γ(b)/Γ(a+b) through g := math.Gamma.
func BetaByAlias(a, b float64) float64 {
	g := math.Gamma
	return g(a) * g(b) / g(a+b) // want `Beta function as Γ\(a\)Γ\(b\)/Γ\(a\+b\) in float64: math\.Gamma\(a\) is \+Inf for a ≥ 171\.624377`
}

// BetaByClosure is B(a, b) through a literal wrapping math.Gamma.
func BetaByClosure(a, b float64) float64 {
	g := func(x float64) float64 { return math.Gamma(x) }
	return g(a) * g(b) / g(a+b) // want `Beta function as Γ\(a\)Γ\(b\)/Γ\(a\+b\) in float64: math\.Gamma\(a\) is \+Inf for a ≥ 171\.624377`
}

// BetaSwapped may call another function through g: silent.
func BetaSwapped(a, b float64, fast bool) float64 {
	g := math.Gamma
	if fast {
		g = func(x float64) float64 { return x }
	}
	return g(a) * g(b) / g(a+b)
}

// BetaScaled's literal does more than pass its argument on: silent.
func BetaScaled(a, b float64) float64 {
	g := func(x float64) float64 { return math.Gamma(x / 2) }
	return g(a) * g(b) / g(a+b)
}

// BetaSmall keeps a and b below 80, where every Γ value fits: silent.
func BetaSmall(a, b float64) float64 {
	if a < 0 || a > 80 || b < 0 || b > 80 {
		return 0
	}
	g := math.Gamma
	return g(a) * g(b) / g(a+b)
}
