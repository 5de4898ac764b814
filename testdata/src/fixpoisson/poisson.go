// Package fixpoisson is the arrivals model of a pharmacy counter:
// Poisson probabilities of the prescriptions that come in an hour,
// built one factor at a time from e^(−λ).
package fixpoisson

import "math"

// AtMostArrivals is the chance of at most n prescriptions in an hour
// with lambda on average.
func AtMostArrivals(lambda float64, n int) float64 { // want AtMostArrivals:`wrong for some n`
	p := math.Exp(-lambda)
	sum := p
	for k := 1; k <= n; k++ { // want `running product p computes the Poisson terms lambda\^k·e\^\(−lambda\)/k! from math.Exp\(-lambda\)`
		p *= lambda / float64(k)
		sum += p
	}
	return sum
}

// ExactArrivals is the chance of exactly n prescriptions, the count
// kept in float64 as the dashboard keeps it.
func ExactArrivals(mean, n float64) float64 {
	term := math.Exp(-mean)
	for k := 1.0; k <= n; k++ { // want `running product term computes the Poisson terms mean\^k`
		term *= mean / k
	}
	return term
}

// Refills is ExactArrivals for the refill queue, its update written
// out.
func Refills(rate float64, n int32) float64 { // want Refills:`wrong for some n`
	t := math.Exp(-rate)
	for i := int32(1); i <= n; i++ { // want `running product t computes the Poisson terms rate\^k`
		t = t * rate / float64(i)
	}
	return t
}

// The functions below are left as they are.

// QuietHours serves the night counter, at most 40 prescriptions an
// hour: e^(−λ) never underflows.
func QuietHours(lambda float64, n int) float64 {
	if lambda < 0 || lambda > 40 {
		return 0
	}
	p := math.Exp(-lambda)
	for k := 1; k <= n; k++ {
		p *= lambda / float64(k)
	}
	return p
}

// Weights grows a weight by lambda/k from 1: x^k/k!, with no start that
// underflows.
func Weights(lambda float64, n int) float64 {
	w := 1.0
	for k := 1; k <= n; k++ {
		w *= lambda / float64(k)
	}
	return w
}

// HalfSteps counts in halves: the counter is not a whole number, so the
// product is not a Poisson term of it.
func HalfSteps(lambda, n float64) float64 {
	p := math.Exp(-lambda)
	for k := 0.5; k <= n; k++ {
		p *= lambda / k
	}
	return p
}

// WalkIns is the chance of at most n walk-in customers in an hour with
// lambda on average, summed as e^(−λ)·Σ λ^k/k! over a running factorial
// (the k = 0 term divides by 0! = 1): the term folds e^(−λ) in, which
// holds for a negative lambda too.
func WalkIns(lambda float64, n int) float64 { // want WalkIns:`wrong for some n`
	f, sum := 1.0, 0.0
	for k := 0; k <= n; k++ { // want `running factorial f computes k! inside the sum`
		if k > 0 {
			f *= float64(k)
		}
		sum += math.Pow(lambda, float64(k)) / f
	}
	return math.Exp(-lambda) * sum
}

// Tickets is the chance of between 1 and n support tickets in an hour,
// the same sum from k = 1 over a factorial loop of its own.
func Tickets(lambda float64, n int) float64 { // want Tickets:`wrong for some n`
	f, sum := 1.0, 0.0
	for k := 1; k <= n; k++ { // want `factorial of n in float64 overflows to \+Inf for n ≥ 171`
		f *= float64(k)
		sum += math.Pow(lambda, float64(k)) / f
	}
	return math.Exp(-lambda) * sum
}
