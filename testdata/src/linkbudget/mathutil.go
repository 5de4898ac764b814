package linkbudget

import "math"

func fact(n int) float64 { // want fact:`factorial of parameter 0`
	f := 1.0
	for k := 2; k <= n; k++ {
		f *= float64(k)
	}
	return f
}

func choose(n, k int) float64 { // want choose:`binomial of parameter 0`
	return fact(n) / (fact(k) * fact(n-k)) // want `binomial coefficient as a ratio of factorials in float64: the numerato`
}

func factInt(n int) int { // want factInt:`factorial of parameter 0`
	if n < 2 {
		return 1
	}
	return n * factInt(n-1) // want `recursive factorial of n in int wraps for n ≥ 21 \(20! ≈ 2\.43e18 is the`
}

func logChoose(n, k int) float64 {
	a, _ := math.Lgamma(float64(n + 1))
	b, _ := math.Lgamma(float64(k + 1))
	c, _ := math.Lgamma(float64(n - k + 1))
	return a - b - c
}
