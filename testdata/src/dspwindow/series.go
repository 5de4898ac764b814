package dspwindow

import "math"

// ExpTaylor sums the Taylor series of e^x term by term as x^k/k!.
func ExpTaylor(x float64) float64 { // want ExpTaylor:`wrong for some x`
	s := 0.0
	for k := 0; k < 1000; k++ {
		t := math.Pow(x, float64(k)) / fact(k) // want `power-over-factorial term x\^k/k! in float64: the divisor k! overflows to \+Inf for k ≥ 171 .*; where \|x\| ≥ 65\.0524 the power x\^k overflows to \+Inf first, before k reaches 171`
		s += t
		if math.Abs(t) < 1e-16*math.Abs(s) {
			break
		}
	}
	return s
}

// ExpRunning sums the Taylor series of e^x with a running term; a
// negative argument is taken as the reciprocal.
func ExpRunning(x float64) float64 {
	if x < 0 {
		return 1 / ExpRunning(-x)
	}
	s, t := 1.0, 1.0
	for k := 1.0; t > 1e-17*s; k++ {
		t *= x / k
		s += t
	}
	return s
}

// CosTaylor evaluates cos x by reducing x to [-pi, pi] and summing
// twenty terms of its series.
func CosTaylor(x float64) float64 {
	x = math.Remainder(x, 2*math.Pi)
	s := 0.0
	for k := 0; k < 20; k++ {
		t := math.Pow(x, float64(2*k)) / fact(2*k)
		if k%2 == 1 {
			t = -t
		}
		s += t
	}
	return s
}

// Kernel is a binomial smoothing kernel of order N: the taps
// C(N, k) / 2^N.
type Kernel struct {
	N int
}

// factFloat is n! with the counter kept in float64.
func factFloat(n float64) float64 { // want factFloat:`factorial of parameter 0, breaks from 171`
	f := 1.0
	for i := 1.0; i <= n; i++ {
		f *= i
	}
	return f
}

// Taps returns the kernel's N+1 taps.
func (k Kernel) Taps() []float64 { // want Taps:`wrong for some k`
	n := float64(k.N)
	taps := make([]float64, k.N+1)
	for i := range taps {
		j := float64(i)
		taps[i] = factFloat(n) / (factFloat(j) * factFloat(n-j)) / math.Pow(2, n) // want `binomial coefficient as a ratio of factorials in float64: the numerator n! overflows to \+Inf for n ≥ 171, alth`
	}
	return taps
}

// TapsPascal returns the kernel's taps by halving Pascal's rule row by
// row.
func (k Kernel) TapsPascal() []float64 {
	row := []float64{1}
	for r := 0; r < k.N; r++ {
		next := make([]float64, r+2)
		for j, v := range row {
			next[j] += v / 2
			next[j+1] += v / 2
		}
		row = next
	}
	return row
}

// Apply convolves x with the kernel's taps, clamping at the edges.
func (k Kernel) Apply(x []float64) []float64 {
	taps := k.TapsPascal()
	h := k.N / 2
	y := make([]float64, len(x))
	for i := range x {
		for j, w := range taps {
			idx := i + j - h
			if idx < 0 {
				idx = 0
			} else if idx >= len(x) {
				idx = len(x) - 1
			}
			y[i] += w * x[idx]
		}
	}
	return y
}

// GaussianDerivative returns the n-th Hermite-weighted derivative
// scale 1/sqrt(2^n n!) used to normalise derivative-of-Gaussian
// filters.
func GaussianDerivative(n int) float64 { // want GaussianDerivative:`wrong for n ≥ 151`
	return 1 / math.Sqrt(math.Pow(2, float64(n))*fact(n)) // want `product of factorials and powers under math\.Sqrt in float64: the intermediate 2\^n·n! overflows to \+Inf first, at n = 151 on that line of inputs, while the square root the code keeps still fits`
}

// Sinc is the normalised sinc function.
func Sinc(x float64) float64 {
	if x == 0 {
		return 1
	}
	return math.Sin(math.Pi*x) / (math.Pi * x)
}

// Lanczos returns the n-lobe Lanczos kernel at x.
func Lanczos(x float64, n int) float64 {
	a := float64(n)
	if math.Abs(x) >= a {
		return 0
	}
	return Sinc(x) * Sinc(x/a)
}
