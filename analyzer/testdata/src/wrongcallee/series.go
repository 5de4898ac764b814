package wrongcallee

import "math"

// A function wrong through a float parameter alone, and its callers.
// expSeries sums x^k/k! for k < 300: from k = 171 the divisor k! is +Inf
// (170! ≈ 7.26e306 is the largest factorial below MaxFloat64), and where
// |x| ≥ 65.0524 the power x^k overflows first, before k reaches 171
// (MaxFloat64^(1/170) = 65.05236, mpmath), so at x = 100 a term is
// +Inf/+Inf = NaN while e^100 ≈ 2.69e43 fits.

func seriesFact(k int) float64 { // want seriesFact:`factorial of parameter 0, breaks from 171`
	r := 1.0
	for i := 2; i <= k; i++ {
		r *= float64(i)
	}
	return r
}

func expSeries(x float64) float64 {
	sum := 0.0
	for k := 0; k < 300; k++ {
		sum += math.Pow(x, float64(k)) / seriesFact(k) // want `power-over-factorial term x\^k/k! in float64: the divisor k! overflows to \+Inf for k ≥ 171 .*; where \|x\| ≥ 65\.0524 the power x\^k overflows to \+Inf first, before k reaches 171`
	}
	return sum
}

// Growth is e^(rate·t) from the series: NaN at rate·t = 100.
func Growth(rate, t float64) float64 { // want Growth:`wrong for some rate or some t`
	return expSeries(rate * t) // want `Growth returns expSeries\(rate \* t\)'s value, which is wrong for some values of x \(reported at wrongcallee/series\.go:23\)`
}

// Doubling is Growth's caller: wrong through it.
func Doubling(t float64) float64 { // want Doubling:`wrong for some t \(expSeries`
	return Growth(math.Ln2, t) // want `Doubling returns Growth\(math\.Ln2, t\)'s value, which is wrong for some values of t \(through expSeries`
}

// UnitGrowth passes a constant, which no threshold is known to reach:
// silent.
func UnitGrowth() float64 {
	return expSeries(1)
}

// CappedGrowth compares the rate before the call, which may bound it:
// silent.
func CappedGrowth(rate float64) float64 {
	if rate > 10 {
		return math.Inf(1)
	}
	return expSeries(rate)
}
