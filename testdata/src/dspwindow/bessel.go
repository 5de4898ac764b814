// Package dspwindow builds FIR window functions and the series they
// need: Kaiser windows over the modified Bessel function I0, binomial
// smoothing kernels and hand-rolled Taylor series.
package dspwindow

import "math"

// fact returns k! as a float64.
func fact(k int) float64 { // want fact:`factorial of parameter 0, breaks from 171`
	if k < 2 {
		return 1
	}
	return float64(k) * fact(k-1)
}

// besselI0Series is I0(x) = sum (x/2)^(2k) / (k!)^2, summed until the
// terms no longer change the sum.
func besselI0Series(x float64) float64 {
	sum := 0.0
	for k := 0; k < 500; k++ {
		t := math.Pow(x/2, float64(2*k)) / (fact(k) * fact(k)) // want `term with \(x / 2\)\^\(2 \* k\) over k!·k! in float64: k! overflows to \+Inf for k ≥ 171 .*; where \|x / 2\| ≥ 8\.0655 the power \(x / 2\)\^\(2 \* k\) overflows to \+Inf first, before k reaches 171`
		sum += t
		if t < 1e-17*sum {
			break
		}
	}
	return sum
}

// besselI0 is I0(x) with each term obtained from the previous one.
func besselI0(x float64) float64 {
	sum, term := 1.0, 1.0
	h := x * x / 4
	for k := 1; term > 1e-17*sum; k++ {
		term *= h / float64(k*k)
		sum += term
	}
	return sum
}

// Kaiser returns the n-point Kaiser window of shape beta.
func Kaiser(n int, beta float64) []float64 {
	w := make([]float64, n)
	if n == 1 {
		w[0] = 1
		return w
	}
	den := besselI0(beta)
	for i := range w {
		r := 2*float64(i)/float64(n-1) - 1
		w[i] = besselI0(beta*math.Sqrt(1-r*r)) / den
	}
	return w
}

// KaiserReference is Kaiser evaluated with the textbook series, kept
// to compare against.
func KaiserReference(n int, beta float64) []float64 { // want KaiserReference:`wrong for some beta`
	w := make([]float64, n)
	den := besselI0Series(beta) // want `KaiserReference builds its result from besselI0Series\(beta\), which is wrong for some values of x \(reported at dspwindow/bessel\.go:21\); beta, passed as x, is not bounded here`
	for i := range w {
		r := 2*float64(i)/float64(n-1) - 1
		w[i] = besselI0Series(beta*math.Sqrt(1-r*r)) / den
	}
	return w
}

// KaiserBeta is Kaiser's empirical shape for a stop-band attenuation
// of att decibels.
func KaiserBeta(att float64) float64 {
	switch {
	case att > 50:
		return 0.1102 * (att - 8.7)
	case att >= 21:
		return 0.5842*math.Pow(att-21, 0.4) + 0.07886*(att-21)
	}
	return 0
}

// Hann returns the n-point Hann window.
func Hann(n int) []float64 {
	w := make([]float64, n)
	for i := range w {
		w[i] = 0.5 - 0.5*math.Cos(2*math.Pi*float64(i)/float64(n-1))
	}
	return w
}
