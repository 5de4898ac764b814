package sparecheck

import "math"

// KOutOfN is the reliability of a system that works while at least k of
// its n identical units work, each with reliability p.
func KOutOfN(k, n int, p float64) float64 { // want KOutOfN:`wrong for some k or some n`
	r := 0.0
	for i := k; i <= n; i++ {
		c := floatFact(n) / (floatFact(i) * floatFact(n-i))            // want `KOutOfN computes C\(n, i\) in float64, which`
		r += c * math.Pow(p, float64(i)) * math.Pow(1-p, float64(n-i)) // want `ratio of factorials in float64: the numerator`
	}
	return r
}

// Array is a bank of identical units of which Need must work.
type Array struct {
	Units   int
	Need    int
	UnitRel float64
}

// Reliability sums the binomial tail in log space.
func (a *Array) Reliability() float64 {
	if a.Need <= 0 {
		return 1
	}
	if a.Need > a.Units {
		return 0
	}
	switch {
	case a.UnitRel <= 0:
		return 0
	case a.UnitRel >= 1:
		return 1
	}
	lp, lq := math.Log(a.UnitRel), math.Log1p(-a.UnitRel)
	sum := 0.0
	for i := a.Need; i <= a.Units; i++ {
		sum += math.Exp(logChoose(a.Units, i) + float64(i)*lp + float64(a.Units-i)*lq)
	}
	return math.Min(sum, 1)
}

// MeanTimeToFailure of a k-out-of-n system of units failing at rate lambda.
func MeanTimeToFailure(k, n int, lambda float64) float64 {
	t := 0.0
	for i := n; i >= k; i-- {
		t += 1 / float64(i)
	}
	return t / lambda
}

// StandbyReliability is the reliability at time t of one active unit
// with n cold spares, each failing at rate lambda.
func StandbyReliability(n int, lambda, t float64) float64 { // want StandbyReliability:`wrong for some n`
	lt := lambda * t
	term, sum := 1.0, 1.0
	for i := 1; i <= n; i++ {
		term *= lt / float64(i)
		sum += term // want `sums the running term`
	}
	return math.Exp(-lt) * sum
}

// StandbyReliabilityLog is StandbyReliability with every term in log space.
func StandbyReliabilityLog(n int, lambda, t float64) float64 {
	lt := lambda * t
	if lt <= 0 {
		return 1
	}
	l := math.Log(lt)
	sum := 0.0
	for i := 0; i <= n; i++ {
		g, _ := math.Lgamma(float64(i + 1))
		sum += math.Exp(float64(i)*l - lt - g)
	}
	return math.Min(sum, 1)
}

// SparesNeeded is the fewest cold spares that reach the target reliability.
func SparesNeeded(target, lambda, t float64) int {
	for n := 0; n < 10000; n++ {
		if StandbyReliabilityLog(n, lambda, t) >= target {
			return n
		}
	}
	return -1
}
