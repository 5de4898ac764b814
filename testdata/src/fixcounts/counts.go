// Package fixcounts keeps its counts in float64, as a sheet formula
// engine does: the factorial loop runs over a float counter, and the
// binomials and probabilities built on it take float operands.
package fixcounts

import "math"

// tally is n! with a float counter: +Inf from 171 on, the IEEE value
// there, so it is not reported itself.
func tally(n float64) float64 { // want tally:"factorial of parameter 0, breaks from 171"
	v := 1.0
	for i := 2.0; i <= n; i++ {
		v *= i
	}
	return v
}

// Stalls is the number of ways to rent k of n market stalls.
func Stalls(n, k float64) float64 { // want Stalls:`value Γ\(p0 \+ 1\)/\(Γ\(p1 \+ 1\)·Γ\(p0 - p1 \+ 1\)\)` Stalls:`wrong for n ≥ 171`
	return tally(n) / (tally(k) * tally(n-k)) // want `binomial coefficient as a ratio of factorials in float64: the numerator n! overflows to \+Inf for n ≥ 171`
}

// Rentals is the chance that k of n stalls are rented when each is
// rented with probability p.
func Rentals(k, n, p float64) float64 { // want Rentals:`value Γ\(p1 \+ 1\)` Rentals:`wrong for n ≥ 171`
	return Stalls(n, k) * math.Pow(p, k) * math.Pow(1-p, n-k) // want `Rentals computes C\(n, k\)·p\^k·\(1−p\)\^\(-k \+ n\) in float64, which fits where Stalls\(n, k\) already is \+Inf or NaN from n = 171`
}

// Queue is the chance that at most n customers come to the market when
// l are expected: e^−l times the sum of l^k/k!.
func Queue(l float64, n int) float64 { // want Queue:`wrong for some n`
	sum := 0.0
	for k := 0; k <= n; k++ {
		sum += math.Pow(l, float64(k)) / tally(float64(k)) // want `power-over-factorial term l\^k/\(float64\(k\)\)! in float64: the divisor \(float64\(k\)\)! overflows to \+Inf for float64\(k\) ≥ 171`
	}
	return math.Exp(-l) * sum
}

// Arrivals is the chance that exactly x customers come when l are
// expected, with the count kept in float64.
func Arrivals(x, l float64) float64 { // want Arrivals:`value \(p1\)\^\(p0\)·exp\(-p1\)/Γ\(p0 \+ 1\)` Arrivals:`wrong for x ≥ 171`
	return math.Exp(0-l) * math.Pow(l, x) / tally(x) // want `Poisson-style term l\^x·e\^\(−l\)/x! in float64: the divisor x! overflows to \+Inf for x ≥ 171`
}
