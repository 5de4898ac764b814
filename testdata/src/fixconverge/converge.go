// Package fixconverge is a boiler plant's heat-loss model: exponential
// series summed until the next term no longer matters, with the
// factorial kept beside the sum.
package fixconverge

import "math"

// Steady sums the load terms a^k/k! over k = 1…c, counted in float64
// as the plant's tables count them, and stops once a term is below
// rounding. For a load past 170 the terms still grow at k = 171, where
// the running factorial is +Inf, so the sum never converges.
func Steady(a, c float64) float64 {
	fact, sum := 1.0, 1.0
	for k := 1.0; k <= c; k++ {
		fact *= k
		t := math.Pow(a, k) / fact // want `series term math.Pow\(a, k\) / fact computes`
		sum += t
		if t < 1e-16*sum {
			break
		}
	}
	return sum
}

// Warmup is Steady over an integer count, returning from inside the
// loop.
func Warmup(x float64, n int) float64 { // want Warmup:`wrong for some n`
	fact, sum := 1.0, 1.0
	for k := 1; k <= n; k++ {
		fact *= float64(k)
		t := math.Pow(x, float64(k)) / fact // want `series term math.Pow\(x, float64\(k\)\) / fact computes`
		sum += t
		if t < 1e-16*sum {
			return sum
		}
	}
	return sum
}

// The functions below are not x^k/k! on every trip: they keep their
// loops and running products, carried in log space.

// Gusts skips the odd trips before it updates the factorial: on the
// next trip the factorial lags behind k, so the term is not x^k/k!.
func Gusts(x, c float64) float64 {
	fact, sum := 1.0, 1.0
	for k := 1.0; k <= c; k++ {
		if math.Mod(k, 2) == 1 {
			continue
		}
		fact *= k
		sum += math.Pow(x, k) / fact // want `series term math.Pow\(x, k\) / fact computes`
	}
	return sum
}

// HalfLoads counts in halves: the exponent is not a whole number.
func HalfLoads(a, c float64) float64 {
	fact, sum := 1.0, 1.0
	for k := 0.5; k <= c; k++ {
		fact *= k
		sum += math.Pow(a, k) / fact // want `series term math.Pow\(a, k\) / fact computes`
	}
	return sum
}
