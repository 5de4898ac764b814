package queuedesk

import "math"

func factorial(n int) float64 { // want factorial:`factorial of parameter 0,`
	if n <= 1 {
		return 1
	}
	return float64(n) * factorial(n-1)
}

func factInt(n int) int { // want factInt:`factorial of parameter 0,`
	r := 1
	for i := 2; i <= n; i++ { // want `factorial of n in int wraps for`
		r *= i
	}
	return r
}

func binom(n, k int) int { // want binom:`binomial of parameter 0,`
	return factInt(n) / (factInt(k) * factInt(n-k)) // want `binomial coefficient as a ratio of factorials`
}

func lg(x float64) float64 {
	v, _ := math.Lgamma(x)
	return v
}
