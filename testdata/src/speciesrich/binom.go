package speciesrich

import "math"

func fact(n int) float64 { // want fact:`factorial of parameter 0, breaks from 171`
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

// choose returns the binomial coefficient C(n, k), or 0 outside 0 ≤ k ≤ n.
func choose(n, k int) float64 { // want choose:`binomial of parameter 0, breaks from 171`
	if k < 0 || k > n {
		return 0
	}
	return fact(n) / (fact(k) * fact(n-k)) // want `binomial coefficient as a ratio of factorials in float64: the numerator n! overflows to`
}

// lchoose returns log C(n, k).
func lchoose(n, k int) float64 {
	a, _ := math.Lgamma(float64(n + 1))
	b, _ := math.Lgamma(float64(k + 1))
	c, _ := math.Lgamma(float64(n - k + 1))
	return a - b - c
}
