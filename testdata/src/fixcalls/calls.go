// Package fixcalls prices the quality checks of a seed bank: sprouting
// and contamination probabilities over a float64 binomial helper built
// from factorials. Its .golden file has each probability from the helper
// module in one call.
package fixcalls

import "math"

func fact(n float64) float64 { // want fact:"factorial of parameter 0, breaks from 171"
	v := 1.0
	for i := 2.0; i <= n; i++ {
		v *= i
	}
	return v
}

func choose(n, k float64) float64 {
	return fact(n) / (fact(k) * fact(n-k)) // want "ratio of factorials in float64"
}

// Sprouted is the chance that k of n seeds sprout, each with
// probability p.
func Sprouted(k, n int, p float64) float64 { // want Sprouted:`value Γ\(p1 \+ 1\)` Sprouted:`wrong for n ≥ 171`
	return choose(float64(n), float64(k)) * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k)) // want `Sprouted computes C\(n, k\)·p\^k·\(1−p\)\^\(-k \+ n\) in float64, which fits where choose\(float64\(n\), float64\(k\)\) already is \+Inf or NaN from n = 171`
}

// Tainted is the chance that a sample of n packets from a batch of total
// holding bad tainted ones shows exactly k of them.
func Tainted(k, total, bad, n int) float64 { // want Tainted:`value Γ\(p2 \+ 1\)` Tainted:`wrong for total ≥ 171 or n ≥ 171`
	return choose(float64(bad), float64(k)) * choose(float64(total-bad), float64(n-k)) / choose(float64(total), float64(n)) // want `Tainted computes C\(bad, k\)·C\(total - bad, -k \+ n\)/C\(total, n\) in float64, which fits where choose\(float64\(bad\), float64\(k\)\) already is \+Inf or NaN from bad = 171`
}

// Misses is the chance of f failed germination tests before the s-th
// passing one, each passing with probability p.
func Misses(f, s int, p float64) float64 { // want Misses:`value Γ\(p0 \+ p1\)` Misses:`wrong for some f or some s`
	return choose(float64(f+s-1), float64(f)) * math.Pow(p, float64(s)) * math.Pow(1-p, float64(f)) // want `Misses computes C\(f \+ s - 1, f\)·p\^s·\(1−p\)\^f in float64, which fits where choose\(float64\(f\+s-1\), float64\(f\)\) already is \+Inf or NaN from f \+ s - 1 = 171`
}

// SproutedF keeps its counts in float64: the helper takes whole numbers,
// so the fix runs it where both counts hold whole numbers and keeps the
// original product for the other inputs.
func SproutedF(k, n, p float64) float64 { // want SproutedF:`value Γ\(p1 \+ 1\)` SproutedF:`wrong for n ≥ 171`
	return choose(n, k) * math.Pow(p, k) * math.Pow(1-p, n-k) // want `SproutedF computes C\(n, k\)·p\^k·\(1−p\)\^\(-k \+ n\) in float64, which fits where choose\(n, k\) already is \+Inf or NaN from n = 171`
}

// Trays is the tray count of a bank of n shelves: no factorial.
func Trays(n int) float64 {
	return float64(n) * 2.5
}

// Gamma is the Gamma function under the name the germination sheets use.
func Gamma(x float64) float64 { // want Gamma:`value Γ\(p0\), wrong once p0 ≥ 171.62`
	return math.Gamma(x)
}

// Spread is the normalising constant 1/B(a, b) of the Beta model of the
// sprouting rate, over Gamma: below zero the expression as written stays.
func Spread(a, b float64) float64 { // want Spread:`value Γ\(p0 \+ p1\)/\(Γ\(p0\)·Γ\(p1\)\)`
	return Gamma(a+b) / (Gamma(a) * Gamma(b)) // want `Spread computes 1/B\(a, b\) in float64, which fits where Gamma\(a \+ b\) already is \+Inf or NaN from a \+ b = 171.624377`
}
