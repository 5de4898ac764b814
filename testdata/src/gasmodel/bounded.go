package gasmodel

import "math"

// MixLogBeta is ln B(a, b) for the mixing model: for the larger shape
// parameters it takes an asymptotic form and returns early, so the Gamma
// form at the end sees 0 ≤ p ≤ q < 10.
func MixLogBeta(a, b float64) float64 {
	p, q := math.Min(a, b), math.Max(a, b)
	if p < 0 {
		return math.NaN()
	}
	if p >= 10 {
		return asymptoticLogBeta(p, q)
	}
	if q >= 10 {
		return asymptoticLogBeta(p, q)
	}
	return math.Log(math.Gamma(p) * (math.Gamma(q) / math.Gamma(p+q)))
}

func asymptoticLogBeta(p, q float64) float64 {
	lp, _ := math.Lgamma(p)
	lq, _ := math.Lgamma(q)
	lpq, _ := math.Lgamma(p + q)
	return lp + lq - lpq
}

// DensityScale divides by Γ(s) only under a condition that keeps the
// shape below 40.
func DensityScale(w, s float64) float64 {
	if s > 0 && s < 40 {
		return w / math.Gamma(s)
	}
	return 0
}

// PanicGuard stops on shapes past 100 before dividing.
func PanicGuard(w, s float64) float64 {
	if 100 <= s {
		panic("shape too large")
	}
	return w / math.Gamma(s)
}

// ScaledAfter bounds the shape and then scales it past the bound.
func ScaledAfter(w, s float64) float64 { // want ScaledAfter:`value \(p0\)/Γ\(100\*p1\), wrong once 100\*p1 ≥ 171\.624377`
	if s >= 10 {
		return 0
	}
	s *= 100
	return w / math.Gamma(s) // want `math.Gamma overflows: math.Gamma\(s\) is \+Inf for s ≥ 171.62`
}

// EitherSide keeps the shape outside [50, 60], which bounds nothing.
func EitherSide(w, s float64) float64 { // want EitherSide:`value \(p0\)/Γ\(p1\), wrong once p1 ≥ 171\.624377`
	if s < 50 || s > 60 {
		return w / math.Gamma(s) // want `math.Gamma overflows: math.Gamma\(s\) is \+Inf for s ≥ 171.62`
	}
	return 0
}

// NoExit checks the shape but goes on.
func NoExit(w, s float64) float64 {
	if s >= 10 {
		w = 0
	}
	return w / math.Gamma(s) // want `math.Gamma overflows: math.Gamma\(s\) is \+Inf for s ≥ 171.62`
}

// Captured bounds the shape, but a closure may change it later.
func Captured(w, s float64) float64 {
	grow := func() { s *= 10 }
	if s >= 10 {
		return 0
	}
	grow()
	return w / math.Gamma(s) // want `math.Gamma overflows: math.Gamma\(s\) is \+Inf for s ≥ 171.62`
}
