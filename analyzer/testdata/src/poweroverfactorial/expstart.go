package poweroverfactorial

import "math"

// A Poisson running term whose rate is a product formed before the
// loop (rate times duration): its start math.Exp(-m) is 0 from
// m ≈ 745, and every term with it. Exact value from mpmath at 40 digits
// (the terms summed one by one).

// arrivalsBelow is P(N < k) for N ~ Poisson(rate·dur).
// (900, 5, 160): exact 0.99977…; the loop gives 0.
func arrivalsBelow(k int, rate, dur float64) float64 {
	m := rate * dur
	w := math.Exp(-m)
	acc := w
	for j := 1; j < k; j++ { // want `running product w computes the Poisson terms m\^k·e\^\(−m\)/k! from math\.Exp\(-m\) with m = \(rate\)·\(dur\), which in float64 loses its digits for m > 708\.396`
		w = w * m / float64(j)
		acc += w
	}
	return acc
}

// arrivalsBelowFew runs a fixed number of trips: the terms it reaches
// are all as small as the start.
func arrivalsBelowFew(rate, dur float64) float64 {
	m := rate * dur
	w := math.Exp(-m)
	acc := w
	for j := 1; j < 4; j++ {
		w = w * m / float64(j)
		acc += w
	}
	return acc
}

// arrivalsBelowScaled multiplies by something other than the rate: not
// a Poisson term.
func arrivalsBelowScaled(k int, rate, dur float64) float64 {
	m := rate * dur
	w := math.Exp(-m)
	acc := w
	for j := 1; j < k; j++ {
		w = w * dur / float64(j)
		acc += w
	}
	return acc
}
