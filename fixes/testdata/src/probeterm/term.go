// Package probeterm holds probability terms for the fix builders: a
// support desk's arrival model and a bottling line's sampling plan.
package probeterm

import (
	"fmt"
	"math"
)

func factF(n int) float64 {
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

func choose(n, k int) float64 {
	return factF(n) / (factF(k) * factF(n-k))
}

// Arrivals is the chance of exactly k calls in an hour averaging lambda.
func Arrivals(k int, lambda float64) float64 {
	// probe:poisson(k, lambda)
	return math.Pow(lambda, float64(k)) * math.Exp(-lambda) / factF(k) // want "probe poisson"
}

// Load is the Erlang-style term a^k/k! of an offered load a.
func Load(a float64, k int) float64 {
	// probe:powfact(a, k)
	return math.Pow(a, float64(k)) / factF(k) // want "probe powfact"
}

// Defects is the chance of k faulty bottles in a sample of n at rate p.
func Defects(k, n int, p float64) float64 {
	// probe:binompmf(k, n, p)
	return choose(n, k) * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k)) // want "probe binompmf"
}

// Lot is the chance of k faulty bottles when n are drawn from a lot of
// total holding bad faulty ones.
func Lot(k, total, bad, n int) float64 {
	// probe:hypergeometric(k, total, bad, n)
	return choose(bad, k) * choose(total-bad, n-k) / choose(total, n) // want "probe hypergeometric"
}

// Spread is a gamma ratio from a toy gas model.
func Spread(a, b float64) float64 {
	// probe:gammaratio(a, b)
	return math.Gamma(a) / math.Gamma(b) // want "probe gammaratio"
}

// Mix is the beta function of a fill-level model.
func Mix(a, b float64) float64 {
	// probe:beta(a, b)
	return math.Gamma(a) * math.Gamma(b) / math.Gamma(a+b) // want "probe beta"
}

// Count truncates at each division; no helper preserves that.
func Count(x, k int) int {
	// probe:powfact(x, k)
	return x * x / int(factF(k)) // want "probe powfact: no fix: PowOverFactorial term with non-float result int"
}

// Volume has no rewrite: Γ(x) itself overflows past 171.6.
func Volume(x float64) float64 {
	// probe:gamma(x)
	return math.Gamma(x) // want "probe gamma: no fix: a bare math.Gamma: no float64 holds Γ\\(172\\)"
}

// Report keeps fmt in use.
func Report(k int) string { return fmt.Sprint(Arrivals(k, 2)) }

// Doubled decays twice as fast: not a Poisson term of lambda.
func Doubled(k int, lambda float64) float64 {
	// probe:poisson(k, lambda)
	return math.Pow(lambda, float64(k)) * math.Exp(-2*lambda) / factF(k) // want "probe poisson: no fix: the expression is not the Poisson term of its operands"
}

// Shifted has x^(k+1) over k!, which is not x^j/j! for any one j.
func Shifted(x float64, k int) float64 {
	// probe:powfact(x, k+1)
	return math.Pow(x, float64(k+1)) / factF(k) // want "probe powfact: no fix: the expression is not the power over factorial of its operands"
}

func weight(n int) float64 { return float64(n) }

// Weighted has a factor of its own, which the rewrite would drop.
func Weighted(n, k int) float64 {
	// probe:binomial(n, k)
	return weight(n) * factF(n) / (factF(k) * factF(n-k)) // want "probe binomial: no fix: the expression is not the binomial coefficient of its operands"
}

// Raised is Γ(a+1)/Γ(b), a gamma ratio of a+1 and b.
func Raised(a, b float64) float64 {
	// probe:gammaratio(a+1, b)
	return math.Gamma(a+1) / math.Gamma(b) // want "probe gammaratio"
}

// Halves is a gamma ratio of half-integers, read through float division.
func Halves(v float64) float64 {
	// probe:gammaratio((v+1)/2, v/2)
	return math.Gamma((v+1)/2) / math.Gamma(v/2) // want "probe gammaratio"
}

// Student has a square root beside its gamma ratio, which GammaRatio
// alone would drop.
func Student(v float64) float64 {
	// probe:gammaratio((v+1)/2, v/2)
	return math.Gamma((v+1)/2) / (math.Sqrt(v*math.Pi) * math.Gamma(v/2)) // want "probe gammaratio: no fix: the expression is not the gamma ratio of its operands"
}
