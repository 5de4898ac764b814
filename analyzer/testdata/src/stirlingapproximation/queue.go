package stirlingapprox

import "math"

// ErlangWeight is the weight a^c/c! of the all-busy state of an M/M/c
// queue with c agents and offered load a, with c! by Stirling.
func ErlangWeight(a float64, agents int) float64 {
	c := float64(agents)
	fact := math.Pow(c, c) * math.Exp(-c) * math.Sqrt(2*math.Pi*c) // want `.*at agents = 1.*; and math.Pow\(c, c\) is \+Inf for agents ≥ 144, although agents! fits float64 up to agents = 170; agents is not bounded here`
	return math.Pow(a, c) / fact
}

// StaffingBound is the same weight where the planner has settled for
// the approximation; the overflow of c^c still stands.
func StaffingBound(a float64, agents int) float64 {
	c := float64(agents)
	//overfact:approx planning only needs the order of magnitude
	fact := math.Pow(c, c+0.5) * math.Exp(-c) * math.Sqrt(2*math.Pi) // want `hand-written Stirling approximation of agents!: math.Pow\(c, c\+0.5\) is \+Inf for agents ≥ 143.*agents is not bounded here`
	return math.Pow(a, c) / fact
}

// Corrected carries the first correction term of the series, 1/(12c):
// it is a different, closer formula and not reported.
func Corrected(agents int) float64 {
	c := float64(agents)
	return math.Sqrt(2*math.Pi*c) * math.Pow(c/math.E, c) * (1 + 1/(12*c))
}

// GammaForm is Stirling's formula for Γ(c) = (c-1)!, √(2π/c)(c/e)^c,
// which this category does not read.
func GammaForm(agents int) float64 {
	c := float64(agents)
	return math.Sqrt(2*math.Pi/c) * math.Pow(c/math.E, c)
}

// LargeQueue uses Stirling's formula only for call centres of more than
// 20 agents, exactly below: the error is chosen, but c^c still
// overflows from 144 agents.
func LargeQueue(a float64, agents int) float64 {
	if agents <= 20 {
		return math.Pow(a, float64(agents)) / exactFact[agents]
	}
	c := float64(agents)
	return math.Pow(a, c) / (math.Pow(c, c) * math.Exp(-c) * math.Sqrt(2*math.Pi*c)) // want `hand-written Stirling approximation of agents!: math.Pow\(c, c\) is \+Inf for agents ≥ 144.*agents is at least 21 here`
}

// exactFact holds 0! … 20!, all exact in float64.
var exactFact = func() (t [21]float64) {
	t[0] = 1
	for i := 1; i <= 20; i++ {
		t[i] = t[i-1] * float64(i)
	}
	return t
}()
