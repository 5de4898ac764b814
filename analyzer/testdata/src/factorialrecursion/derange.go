package factorialrecursion

// Derangements counts the orders of n gifts in which nobody gets their
// own, D(n) = (n−1)·(D(n−1) + D(n−2)) (OEIS A000166).
func Derangements(n int) int64 { // want Derangements:`wrong for some n`
	if n < 2 {
		return 1 - int64(n)
	}
	return int64(n-1) * (Derangements(n-1) + Derangements(n-2)) // want `recursion computes the derangement number D\(n\) = \(n-1\)·\(D\(n-1\) \+ D\(n-2\)\) in int64: it wraps for n ≥ 21 \(D\(20\) ≈ 8\.95e17 is the largest that fits\)`
}

var swaps = map[int]uint32{0: 1, 1: 0}

// Swaps keeps the counts in a memo, the sum's calls the other way round.
func Swaps(n int) uint32 { // want Swaps:`wrong for some n`
	if v, ok := swaps[n]; ok {
		return v
	}
	v := (Swaps(n-2) + Swaps(n-1)) * uint32(n-1) // want `recursion computes the derangement number D\(n\) .* in uint32: it wraps for n ≥ 14`
	swaps[n] = v
	return v
}

// FewSwaps stops at 12 items: silent.
func FewSwaps(n int) int32 {
	if n > 12 || n < 0 {
		return -1
	}
	if n < 2 {
		return 1 - int32(n)
	}
	return int32(n-1) * (FewSwaps(n-1) + FewSwaps(n-2))
}

// Shuffles is no derangement count: the two calls are at n−1 and n−3.
// Silent.
func Shuffles(n int) int64 {
	if n < 3 {
		return 1
	}
	return int64(n-1) * (Shuffles(n-1) + Shuffles(n-3))
}

// Squads is the same recursion with both textbook base cases,
// C(n, 0) = C(n, n) = 1: the product still wraps first.
func Squads(n, k int) int { // want Squads:`binomial of parameter 0, breaks from 62` Squads:`wrong for some n or some k`
	if k == 0 || k == n {
		return 1
	}
	return Squads(n-1, k-1) * n / k // want `multiplicative binomial recursion in int: the product Squads\(n-1, k-1\) \* n wraps before the division by k for n ≥ 62 at k = n/2`
}

// Pairs returns 1 for k == 2 as well, which is not C(n, 2): not the
// binomial recursion, so no claim about C(n, k) is made.
func Pairs(n, k int) int {
	if k == 0 || k == 2 {
		return 1
	}
	return Pairs(n-1, k-1) * n / k
}
