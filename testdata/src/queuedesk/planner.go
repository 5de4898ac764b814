package queuedesk

import "math"

// Staffing describes one interval of a contact centre.
type Staffing struct {
	CallsPerHour float64
	HandleSecs   float64
	TargetSL     float64
	WithinSecs   float64
}

func (s Staffing) traffic() float64 { return s.CallsPerHour * s.HandleSecs / 3600 }

// ServiceLevel is the share of calls answered within WithinSecs with n agents.
func (s Staffing) ServiceLevel(n int) float64 { // want ServiceLevel:`wrong for some n`
	a := s.traffic()
	c := ErlangC(n, a) // want `ServiceLevel builds its result from ErlangC\(n, a\), which is wrong for some values of agents \(reported at queuedesk/erlang\.go:12\)`
	return 1 - c*math.Exp(-(float64(n)-a)*s.WithinSecs/s.HandleSecs)
}

// AgentsNeeded is the fewest agents meeting the target service level.
func (s Staffing) AgentsNeeded() int {
	a := s.traffic()
	for n := int(a) + 1; n < 100000; n++ {
		c := ErlangCStable(n, a)
		if 1-c*math.Exp(-(float64(n)-a)*s.WithinSecs/s.HandleSecs) >= s.TargetSL {
			return n
		}
	}
	return -1
}

type arrivals struct {
	memo map[int]float64
}

func (c *arrivals) fact(n int) float64 { // want fact:`factorial of parameter 0,`
	if n < 2 {
		return 1
	}
	if v, ok := c.memo[n]; ok {
		return v
	}
	v := float64(n) * c.fact(n-1)
	c.memo[n] = v
	return v
}

var arrivalCache = &arrivals{memo: map[int]float64{}}

// ArrivalProb is the chance of exactly k arrivals at Poisson rate rate.
func ArrivalProb(k int, rate float64) float64 { // want ArrivalProb:`value \(p1\)\^\(p0\)·exp\(-p1\)/Γ\(p0 \+ 1\),` ArrivalProb:`wrong for k ≥ 171`
	return math.Pow(rate, float64(k)) * math.Exp(-rate) / arrivalCache.fact(k) // want `Poisson-style term rate\^k·e\^\(−rate\)/k! in float64: the divisor`
}

// ArrivalProbSafe evaluates small cases directly and the rest in log space.
func ArrivalProbSafe(k int, rate float64) float64 {
	if k < 0 {
		return 0
	}
	if k <= 20 && rate >= 0 && rate <= 30 {
		return math.Pow(rate, float64(k)) * math.Exp(-rate) / factorial(k)
	}
	if rate <= 0 {
		if k == 0 {
			return 1
		}
		return 0
	}
	return math.Exp(float64(k)*math.Log(rate) - rate - lg(float64(k)+1))
}
