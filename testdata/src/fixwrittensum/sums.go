// Package fixwrittensum holds a harbour's queueing sums whose terms are
// written out on each trip, a power over a factorial function's value:
// the factorials fit (the counts are bounded), but the powers pass
// float64 for a large load while the value read after the loop does not.
package fixwrittensum

import "math"

// berthFact is n! in float64.
func berthFact(n int) float64 { // want berthFact:`factorial of parameter 0`
	f := 1.0
	for i := 2; i <= n; i++ {
		f *= float64(i)
	}
	return f
}

// Turnaway is the chance that a ship finds every berth taken (Erlang B
// at offered load a over c berths, at most 150).
func Turnaway(a float64, c int) float64 { // want Turnaway:`wrong for some c`
	if c < 0 || c > 150 {
		return 1
	}
	head := math.Pow(a, float64(c)) / berthFact(c)
	sum := 0.0
	for k := 0; k <= c; k++ {
		sum += math.Pow(a, float64(k)) / berthFact(k) // want `sum sums the running term a\^k/k! in float64: the sum of its first 151 terms is \+Inf for a ≥ 6407\.31, while head / sum`
	}
	return head / sum
}

// Arrivals is the chance of at most n ships in a day with mean lam
// ships (a Poisson CDF, at most 120 terms).
func Arrivals(lam float64, n int) float64 { // want Arrivals:`wrong for some n`
	if n < 0 || n > 120 {
		return 0
	}
	sum := 0.0
	for k := 0; k <= n; k++ {
		sum += math.Pow(lam, float64(k)) / berthFact(k) // want `sum sums the running term lam\^k/k! in float64: the sum of its first 121 terms is \+Inf for lam ≥ 16812\.9, while sum \* math.Exp\(-lam\)`
	}
	return sum * math.Exp(-lam)
}
