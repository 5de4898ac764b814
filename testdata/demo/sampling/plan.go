// Package sampling evaluates the acceptance-sampling plan of the
// bottling line: from each lot of bottles a sample is drawn, and the lot
// is accepted when at most c bottles in it are under-filled.
package sampling

import "math"

// fact returns n!.
func fact(n int64) int64 {
	if n <= 1 {
		return 1
	}
	return n * fact(n-1)
}

// Choose returns the number of ways to pick k bottles out of n.
func Choose(n, k int64) int64 {
	return fact(n) / (fact(k) * fact(n-k))
}

// AcceptProbability is the chance that a lot whose defect rate is p
// passes a plan that samples n bottles and accepts up to c defects
// (the binomial model of an endless production run).
func AcceptProbability(n, c int, p float64) float64 {
	sum := 0.0
	for d := 0; d <= c; d++ {
		sum += float64(Choose(int64(n), int64(d))) * math.Pow(p, float64(d)) * math.Pow(1-p, float64(n-d))
	}
	return sum
}

// Ways counts the samples of k bottles from a pallet of n with the
// multiplicative formula, which keeps the numbers small for a while.
func Ways(n, k int) int {
	w := 1
	for i := 1; i <= k; i++ {
		w = w * (n - k + i) / i
	}
	return w
}

// LotAcceptance is the exact chance of accepting a finite lot of size
// lot holding bad under-filled bottles (the hypergeometric model).
func LotAcceptance(lot, bad, n, c int) float64 {
	sum := 0.0
	for d := 0; d <= c; d++ {
		sum += float64(Ways(bad, d)) * float64(Ways(lot-bad, n-d)) / float64(Ways(lot, n))
	}
	return sum
}
