// Package staffing estimates how many agents a support desk needs, with
// the Erlang B and C formulas and Poisson arrivals.
package staffing

import (
	"math"

	"mathkit"
)

// ErlangC returns the probability that a caller waits, for offered
// traffic a (in Erlangs) and c agents.
func ErlangC(a float64, c int) float64 { // want ErlangC:`wrong for some c`
	sum := 0.0
	for k := 0; k < c; k++ {
		sum += math.Pow(a, float64(k)) / mathkit.FactorialFloat(k) // want `power-over-factorial term a\^k/k! in float64: the divisor k! overflows to \+Inf for k ≥ 171`
	}
	top := math.Pow(a, float64(c)) / mathkit.FactorialFloat(c) * float64(c) / (float64(c) - a) // want `power-over-factorial term a\^c/c! in float64: the divisor c! overflows to \+Inf for c ≥ 171`
	return top / (sum + top)
}

// ErlangCSmallDesk is ErlangC for the eight-seat desk.
func ErlangCSmallDesk(a float64) float64 {
	sum := 0.0
	for k := 0; k < 8; k++ {
		sum += math.Pow(a, float64(k)) / mathkit.FactorialFloat(k)
	}
	top := math.Pow(a, 8) / mathkit.FactorialFloat(8) * 8 / (8 - a)
	return top / (sum + top)
}

// ErlangB returns the blocking probability for traffic a on c lines.
//
//overfact:assume c <= 150
func ErlangB(a float64, c int) float64 { // want ErlangB:`wrong for some c`
	num := math.Pow(a, float64(c)) / mathkit.FactorialFloat(c)
	den := 0.0
	for k := 0; k <= c; k++ {
		den += math.Pow(a, float64(k)) / mathkit.FactorialFloat(k) // want `sums the running term`
	}
	return num / den
}

// Arrivals returns the probability of exactly k calls in an interval in
// which lambda calls arrive on average.
func Arrivals(lambda float64, k int) float64 { // want Arrivals:`value \(p0\)\^\(p1\)·exp\(-p0\)/Γ\(p1 \+ 1\), wrong once p1 ≥ 171` Arrivals:`wrong for k ≥ 171`
	return math.Pow(lambda, float64(k)) * math.Exp(-lambda) / mathkit.FactorialFloat(k) // want `Poisson-style term lambda\^k·e\^\(−lambda\)/k! in float64: the divisor k! overflows to \+Inf for k ≥ 171`
}

// ArrivalsInt divides by an int64 factorial, which wraps much sooner.
func ArrivalsInt(lambda float64, k int) float64 { // want ArrivalsInt:`value \(p0\)\^\(p1\)·exp\(-p0\)/Γ\(p1 \+ 1\), wrong once p1 ≥ 21` ArrivalsInt:`wrong for k ≥ 21`
	return math.Pow(lambda, float64(k)) * math.Exp(-lambda) / float64(mathkit.Factorial(k)) // want `Poisson-style term lambda\^k·e\^\(−lambda\)/k! in int64: the divisor k! wraps for k ≥ 21`
}

// QuietHour is the chance of at most 3 calls in a quiet hour: every k is
// a small constant.
func QuietHour(lambda float64) float64 {
	p := 0.0
	for k := 0; k <= 3; k++ {
		p += math.Pow(lambda, float64(k)) * math.Exp(-lambda) / mathkit.FactorialFloat(k)
	}
	return p
}

// Doubling is a Taylor term 2^k/k! for the escalation model, where k is
// capped at 100 by the caller's menu.
func Doubling(k int) float64 {
	if k > 100 {
		k = 100
	}
	return math.Pow(2, float64(k)) / mathkit.FactorialFloat(k)
}

// Backlog is the same term with a cap far past both limits.
func Backlog(k int) float64 { // want Backlog:`value \(2\)\^\(p0\)/Γ\(p0 \+ 1\), wrong once p0 ≥ 171` Backlog:`wrong for k ≥ 171`
	if k < 0 || k > 1100 {
		return 0
	}
	return math.Pow(2, float64(k)) / mathkit.FactorialFloat(k) // want `the divisor k! overflows to \+Inf for k ≥ 171 .*; math.Pow\(2, float64\(k\)\) overflows to \+Inf for k ≥ 1024; k may reach 1100 here`
}

// Surge is the Poisson chance of k calls, with the power formed by a
// loop.
func Surge(lambda float64, k int) float64 { // want Surge:`value \(p0\)\^\(p1\)·exp\(-p0\)/Γ\(p1 \+ 1\), wrong once p1 ≥ 171` Surge:`wrong for k ≥ 171`
	p := 1.0
	for i := 0; i < k; i++ {
		p *= lambda
	}
	return p * math.Exp(-lambda) / mathkit.FactorialFloat(k) // want `Poisson-style term lambda\^k·e\^\(−lambda\)/k! in float64: the divisor k! overflows to \+Inf for k ≥ 171`
}

// SurgeCapped is Surge with a power loop of at most 40 steps.
func SurgeCapped(lambda float64, k int) float64 {
	k = min(k, 40)
	p := 1.0
	for i := 0; i < k; i++ {
		p *= lambda
	}
	return p * math.Exp(-lambda) / mathkit.FactorialFloat(k)
}

// ErlangCIncremental builds each term from the last, term *= a/k: no
// factorial is ever formed, but past a ≈ 709.78 the sum of a^k/k! is
// +Inf, and so is last, while their ratio is a probability.
func ErlangCIncremental(a float64, c int) float64 { // want ErlangCIncremental:`wrong for some c`
	term, sum := 1.0, 1.0
	for k := 1; k < c; k++ {
		term *= a / float64(k)
		sum += term // want `sums the running term`
	}
	last := term * a / float64(c) * float64(c) / (float64(c) - a)
	return last / (sum + last)
}
