package factorialratio

import "math"

// Germinate is the chance that exactly g of s sown seeds sprout,
// each with probability rate: the coefficient taken from log-gamma
// values in the product itself.
func Germinate(s, g, rate float64) float64 {
	all, _ := math.Lgamma(s + 1)
	up, _ := math.Lgamma(g + 1)
	down, _ := math.Lgamma(s - g + 1)
	return math.Pow(rate, g) * math.Exp(all-up-down) * math.Pow(1-rate, s-g) // want `computes the binomial probability C\(s, g\)·rate\^g·\(1−rate\)\^\(s - g\) in float64 with C\(s, g\) formed on its own: it overflows to \+Inf for s ≥ 1029` `math.Exp of log-gamma values computes C\(s, g\)`
}

// Retries is the chance of f failed calls before the w-th success,
// each call succeeding with probability q: the coefficient
// C(f+w−1, f) kept in a local.
func Retries(f, w, q float64) float64 {
	lg1, _ := math.Lgamma(f + w)
	lg2, _ := math.Lgamma(f + 1)
	lg3, _ := math.Lgamma(w)
	coef := math.Exp(lg1 - lg2 - lg3)               // want `math.Exp of log-gamma values computes C\(f \+ w - 1, w - 1\)`
	return coef * math.Pow(q, w) * math.Pow(1-q, f) // want `computes the negative binomial probability C\(f \+ w - 1, f\)·q\^w·\(1−q\)\^f in float64 with C\(f \+ w - 1, w - 1\) formed on its own: it overflows to \+Inf for f \+ w - 1 ≥ 1029`
}

// Tray serves trays of at most 100 seeds, where the coefficient fits.
func Tray(s, g, rate float64) float64 {
	if s < 0 || s > 100 {
		return 0
	}
	all, _ := math.Lgamma(s + 1)
	up, _ := math.Lgamma(g + 1)
	down, _ := math.Lgamma(s - g + 1)
	return math.Pow(rate, g) * math.Exp(all-up-down) * math.Pow(1-rate, s-g)
}
