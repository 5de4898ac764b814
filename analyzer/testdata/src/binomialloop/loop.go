// Package binomialloop holds the binomial-loop category's cases:
// multiplicative binomial loops b = b*(n-k+i)/i whose intermediate
// product overflows before the division.
package binomialloop

// Ways refuses a negative k first, so the rewrite needs no condition of
// its own.
func Ways(n, k int) int { // want Ways:`binomial of parameter 0` Ways:`wrong for some n or some k`
	if k < 0 {
		return 0
	}
	b := 1
	for i := 1; i <= k; i++ { // want `multiplicative binomial loop`
		b = b * (n - k + i) / i
	}
	return b
}

// Small keeps 0 ≤ k ≤ n ≤ 20, where every product fits: silent.
func Small(n, k int) int { // want Small:`binomial of parameter 0, safe for`
	if n < 0 || n > 20 || k < 0 || k > n {
		return 0
	}
	b := 1
	for i := 1; i <= k; i++ {
		b = b * (n - k + i) / i
	}
	return b
}

// WaysU counts in unsigned arithmetic, which needs no test of k.
func WaysU(n, k uint64) uint64 { // want WaysU:`binomial of parameter 0` WaysU:`wrong for some n or some k`
	b := uint64(1)
	for i := uint64(1); i <= k; i++ { // want `multiplicative binomial loop in uint64`
		b = b * (n - k + i) / i
	}
	return b
}

// Thirty fixes n = 30, where every intermediate product fits: silent.
func Thirty(k int) int {
	if k < 0 || k > 30 {
		return 0
	}
	b := 1
	for i := 1; i <= k; i++ {
		b = b * (30 - k + i) / i
	}
	return b
}
