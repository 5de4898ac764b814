package queuedesk

import "math"

// ErlangC is the probability that a call waits, with agents agents and
// traffic erlangs offered.
func ErlangC(agents int, traffic float64) float64 { // want ErlangC:`wrong for some agents`
	n := float64(agents)
	top := math.Pow(traffic, n) / factorial(agents) * n / (n - traffic) // want `term with traffic\^n over agents! in float64:`
	sum := 0.0
	for k := 0; k < agents; k++ {
		sum += math.Pow(traffic, float64(k)) / factorial(k) // want `power-over-factorial term traffic\^k/k! in float64: the divisor`
	}
	return top / (sum + top)
}

// ErlangCStable is ErlangC from the Erlang B recurrence.
func ErlangCStable(agents int, traffic float64) float64 {
	n := float64(agents)
	if traffic >= n {
		return 1
	}
	b := 1.0
	for k := 1; k <= agents; k++ {
		b = traffic * b / (float64(k) + traffic*b)
	}
	return n * b / (n - traffic*(1-b))
}

// MMcWaitingTime is the mean wait in queue of an M/M/c system.
func MMcWaitingTime(c int, lambda, mu float64) float64 { // want MMcWaitingTime:`wrong for some c`
	a := lambda / mu
	rho := a / float64(c)
	if rho >= 1 {
		return math.Inf(1)
	}
	term, sum := 1.0, 0.0
	for k := 0; k < c; k++ {
		sum += term // want `sums the running term`
		term *= a / float64(k+1)
	}
	last := term / (1 - rho)
	pw := last / (sum + last)
	return pw / (float64(c)*mu - lambda)
}

// TrunkGroup is a group of lines offered traffic in erlangs.
type TrunkGroup struct {
	Lines   int
	Offered float64
}

// Blocking is the Erlang B loss probability.
func (g *TrunkGroup) Blocking() float64 { // want Blocking:`wrong for some g`
	den := 0.0
	for i := 0; i <= g.Lines; i++ {
		den += math.Pow(g.Offered, float64(i)) / math.Gamma(float64(i+1)) // want `math\.Gamma overflows: math\.Gamma\(float64\(i \+ 1\)\) is \+Inf` `series term math\.Pow\(g\.Offered, float64\(i\)\) / math\.Gamma\(float64\(i\+1\)\) computes`
	}
	return math.Pow(g.Offered, float64(g.Lines)) / math.Gamma(float64(g.Lines+1)) / den // want `math\.Gamma overflows: math\.Gamma\(float64\(g\.Lines \+ 1\)\) is \+Inf`
}

// OverflowCalls is the traffic lost by the group, from the recurrence.
func OverflowCalls(lines int, offered float64) float64 {
	b := 1.0
	for k := 1; k <= lines; k++ {
		b = offered * b / (float64(k) + offered*b)
	}
	return offered * b
}
