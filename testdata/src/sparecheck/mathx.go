package sparecheck

import "math"

// floatFact returns n! as a float64.
func floatFact(n int) float64 { // want floatFact:`factorial of parameter 0,`
	f := 1.0
	for i := n; i > 1; i-- {
		f *= float64(i)
	}
	return f
}

// factU returns n! in uint64.
func factU(n uint64) uint64 { // want factU:`factorial of parameter 0,`
	r := uint64(1)
	for n > 1 { // want `factorial of n in uint64 wraps for`
		r *= n
		n--
	}
	return r
}

// chooseU is the multiplicative binomial, exact at every step.
func chooseU(n, k uint64) uint64 { // want chooseU:`binomial of parameter 0,`
	if k > n {
		return 0
	}
	if k > n-k {
		k = n - k
	}
	r := uint64(1)
	for i := uint64(1); i <= k; i++ { // want `multiplicative binomial loop in uint64: the product`
		r = r * (n - k + i) / i
	}
	return r
}

// chooseGamma is the binomial coefficient from the Gamma function.
func chooseGamma(n, k int) float64 {
	return math.Gamma(float64(n+1)) / (math.Gamma(float64(k+1)) * math.Gamma(float64(n-k+1))) // want `ratio of math\.Gamma values in float64: math\.Gamma\(float64\(n`
}

func logChoose(n, k int) float64 {
	a, _ := math.Lgamma(float64(n + 1))
	b, _ := math.Lgamma(float64(k + 1))
	c, _ := math.Lgamma(float64(n - k + 1))
	return a - b - c
}
