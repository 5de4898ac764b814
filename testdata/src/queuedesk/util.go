package queuedesk

import "math"

func factorial(n int) float64 {
	if n <= 1 {
		return 1
	}
	return float64(n) * factorial(n-1)
}

func factInt(n int) int {
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}

func binom(n, k int) int {
	return factInt(n) / (factInt(k) * factInt(n-k))
}

func lg(x float64) float64 {
	v, _ := math.Lgamma(x)
	return v
}
