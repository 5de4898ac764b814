// Package poweroverfactorial holds the power-over-factorial category's
// cases: x^k/k! terms whose power and factorial overflow apart. 170! is
// the largest factorial in float64 (OEIS A000142, from memory).
package poweroverfactorial

import "math"

func factF(n int) float64 { // want factF:`factorial of parameter 0`
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

// Load is an Erlang term a^k/k!.
func Load(a float64, k int) float64 { // want Load:`value \(p0\)\^\(p1\)/Γ\(p1 \+ 1\), wrong once p1 ≥ 171` Load:`wrong for k ≥ 171`
	return math.Pow(a, float64(k)) / factF(k) // want `power-over-factorial term a\^k/k! in float64: the divisor k! overflows to \+Inf for k ≥ 171`
}

// Arrivals is a Poisson probability.
func Arrivals(k int, lambda float64) float64 { // want Arrivals:`value \(p1\)\^\(p0\)·exp\(-p1\)/Γ\(p0 \+ 1\), wrong once p0 ≥ 171` Arrivals:`wrong for k ≥ 171`
	return math.Pow(lambda, float64(k)) * math.Exp(-lambda) / factF(k) // want `Poisson-style term lambda\^k·e\^\(−lambda\)/k!`
}

// Few stays below 171 terms: silent.
func Few(a float64, k int) float64 {
	if k > 100 {
		return 0
	}
	return math.Pow(a, float64(k)) / factF(k)
}
