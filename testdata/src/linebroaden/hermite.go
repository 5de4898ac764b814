package linebroaden

import "math"

func fact64(n int) int64 { // want fact64:`factorial of parameter 0`
	var f int64 = 1
	for ; n > 1; n-- { // want `factorial of n in int64 wraps for n ≥ 21 \(20! ≈ 2\.43e18 is the largest`
		f *= int64(n)
	}
	return f
}

// hermiteNormConst is 1/sqrt(2^n n! sqrt(pi)), the normaliser of the n-th Hermite function.
func hermiteNormConst(n int) float64 {
	f := 1.0
	for i := 1; i <= n; i++ { // want `factorial of n in float64 overflows to \+Inf for n ≥ 171 \(170! ≈ 7\.26e3`
		f *= float64(i)
	}
	return 1 / math.Sqrt(math.Pow(2, float64(n))*f*math.Sqrt(math.Pi))
}

// hermiteWeight10 is the normaliser for the ten-point profile quadrature.
func hermiteWeight10() float64 {
	return hermiteNormConst(10)
}

// profileKernel returns the binomial smoothing kernel of the given order.
func profileKernel(order int) []int64 {
	choose := func(n, k int) int64 {
		return fact64(n) / (fact64(k) * fact64(n-k)) // want `binomial coefficient as a ratio of factorials in int64: the numerator`
	}
	out := make([]int64, order+1)
	for k := 0; k <= order; k++ {
		out[k] = choose(order, k)
	}
	return out
}

// pascalRow builds the same kernel additively; orders above 60 are refused.
func pascalRow(order int) []int64 {
	if order > 60 {
		panic("linebroaden: kernel order above 60")
	}
	row := []int64{1}
	for i := 0; i < order; i++ {
		next := make([]int64, len(row)+1)
		next[0], next[len(row)] = 1, 1
		for j := 1; j < len(row); j++ {
			next[j] = row[j-1] + row[j]
		}
		row = next
	}
	return row
}
