// Package fixgammaamong holds the normalising constants of a survey
// tool's fitted distributions: ratios of Gamma values with other
// factors beside them.
package fixgammaamong

import "math"

// StudentConst is the constant Γ((ν+1)/2)/(√(νπ)·Γ(ν/2)) of Student's
// t density with nu degrees of freedom (common practice).
func StudentConst(nu int) float64 { // want StudentConst:`value Γ\(1/2\*p0 \+ 1/2\)/` StudentConst:`wrong for nu ≥ 342\.248754`
	v := float64(nu)
	return math.Gamma((v+1)/2) / (math.Sqrt(v*math.Pi) * math.Gamma(v/2)) // want `ratio of math.Gamma values in float64`
}

// ChiMean is the mean √2·Γ((k+1)/2)/Γ(k/2) of the chi distribution
// with k degrees of freedom (common practice).
func ChiMean(k float64) float64 { // want ChiMean:`value 6369051672525773/4503599627370496·Γ` ChiMean:`wrong for k ≥ 342\.248754`
	return math.Sqrt2 * math.Gamma((k+1)/2) / math.Gamma(k/2) // want `ratio of math.Gamma values in float64`
}

// The function below has two Gamma values above the line and no one
// partner below it for each: it is taken as a product in log space.

// Continuation is Gauss's Γ(c)Γ(c−a−b)/(Γ(c−a)Γ(c−b)).
func Continuation(a, b, c float64) float64 { // want Continuation:`value Γ\(p2\)·Γ` Continuation:`wrong for c ≥ 171\.624377`
	return math.Gamma(c) * math.Gamma(c-a-b) / (math.Gamma(c-a) * math.Gamma(c-b)) // want `ratio of math.Gamma values in float64`
}

// ChiSquareDensity is the density of the chi-square distribution with k
// degrees of freedom at x, x^(k/2−1)·e^(−x/2)/(2^(k/2)·Γ(k/2)) (common
// practice), its numerator and its normaliser formed apart: each leaves
// float64 for large k where their quotient does not.
func ChiSquareDensity(k, x float64) float64 { // want ChiSquareDensity:`value \(p1\)\^\(1/2\*p0 - 1\)·exp`
	if x < 0 {
		return 0
	}
	num := math.Pow(x, k/2-1) * math.Exp(-x/2)
	norm := math.Pow(2, k/2) * math.Gamma(k/2) // want `math.Gamma overflows: math.Gamma\(k / 2\) is \+Inf for k ≥ 343.2487539`
	return num / norm
}
