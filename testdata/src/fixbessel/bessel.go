// Package fixbessel is a sonar array's beam model, whose Bessel series
// form each term as a power over a product of factorials, each
// computed on its own. Its .golden file shows the terms carried in log
// space by the helper's Product, each factorial the value its function
// returns with ln n! beside it.
package fixbessel

import "math"

// fact returns n! in float64, +Inf past 170!.
func fact(n int) float64 { // want fact:`factorial of parameter 0`
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

// Beam sums J_n(x) over terms terms of its series.
func Beam(n int, x float64, terms int) float64 { // want Beam:`wrong for some terms or some n`
	sum := 0.0
	for k := 0; k < terms; k++ {
		sum += math.Pow(-1, float64(k)) * math.Pow(x/2, float64(2*k+n)) / (fact(k) * fact(k+n)) // want `term with \(x / 2\)\^\(2\*k \+ n\) over k!·\(k \+ n\)! in float64`
	}
	return sum
}
