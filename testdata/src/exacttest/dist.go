package exacttest

import "math"

func factF(n int) float64 { // want factF:`factorial of parameter 0,`
	f := 1.0
	for i := 2; i <= n; i++ {
		f *= float64(i)
	}
	return f
}

func binomInt(n, k int) int { // want binomInt:`binomial of parameter 0, breaks from 62`
	if k == 0 || k == n {
		return 1
	}
	return binomInt(n-1, k-1) * n / k // want `multiplicative binomial recursion in int: the product binomInt\(n-1, k-1\) \* n wraps before the division by k for n ≥ 62 at k = n/2`
}

func lchoose(n, k int) float64 {
	a, _ := math.Lgamma(float64(n + 1))
	b, _ := math.Lgamma(float64(k + 1))
	c, _ := math.Lgamma(float64(n - k + 1))
	return a - b - c
}

// HypergeomCDF is P(X <= k) for X the number of marked items in a draw
// of n from N items of which K are marked.
func HypergeomCDF(k, N, K, n int) float64 {
	lo := max(0, n-(N-K))
	p := math.Exp(lchoose(K, lo) + lchoose(N-K, n-lo) - lchoose(N, n)) // want `math\.Exp of log-gamma values computes Γ ratio`
	sum := 0.0
	for x := lo; x <= k; x++ {
		sum += p
		p *= float64(K-x) * float64(n-x) / (float64(x+1) * float64(N-K-n+x+1))
	}
	return math.Min(sum, 1)
}

// NegBinomCDF is P(failures <= k) before the r-th success, success chance p.
func NegBinomCDF(k, r int, p float64) float64 { // want NegBinomCDF:`wrong for some k or some r`
	sum := 0.0
	for i := 0; i <= k; i++ {
		sum += float64(binomInt(i+r-1, i)) * math.Pow(p, float64(r)) * math.Pow(1-p, float64(i)) // want `binomial probability C\(i \+ r - 1, i\)·math\.Pow\(p, float64\(r\)\)·math\.Pow\(1-p, float64\(i\)\) in int: binomInt\(i \+ r - 1, …\) breaks for i \+ r - 1 ≥ 62 although the product with the powers may still fit`
	}
	return sum
}
