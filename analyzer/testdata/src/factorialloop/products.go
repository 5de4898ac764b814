package factorialloop

// Running products of several factors a trip, whose value is a product
// of factorials. The first wrapping counts are from exact products
// (Python's integers): 13!·12! ≈ 2.98e18 fits int64 and 14!·13! ≈ 5.43e20
// does not, while 14!·13!/2^13 ≈ 6.6e16 still fits; n!(n+1)! in uint64
// wraps from n = 13, where 13!·14! ≈ 5.43e20 exceeds 2^64 ≈ 1.84e19
// (OEIS A000142, A010790).

// rankedOrders counts the ranked merge orders of n parts, n!(n−1)!/2^(n−1):
// the shift comes after the product has wrapped.
func rankedOrders(n int) int64 {
	var h int64 = 1
	for i := 2; i <= n; i++ { // want `running product h computes Γ\(n \+ 1\)·Γ\(n\), which in int64 wraps for n ≥ 14 \(at n = 13 it is ≈ 2.98e18, the largest that fits\); n is not bounded here`
		h *= int64(i) * int64(i-1)
	}
	return h >> (n - 1)
}

// pairedSeatings multiplies two factors a trip in two statements:
// n!·(n+1)!.
func pairedSeatings(n int) uint64 {
	var p uint64 = 1
	for i := 1; i <= n; i++ { // want `running product p computes .* in uint64 wraps for n ≥ 13 \(at n = 12 it is ≈ 2.98e18, the largest that fits\)`
		p *= uint64(i)
		p *= uint64(i + 1)
	}
	return p
}

// smallRankedOrders is bounded below the first wrapping count: silent.
func smallRankedOrders(n int) int64 {
	if n > 13 {
		return -1
	}
	var h int64 = 1
	for i := 2; i <= n; i++ {
		h *= int64(i) * int64(i-1)
	}
	return h >> (n - 1)
}

// zeroProduct multiplies by i−1 from i = 1: the product is 0 at every
// count, as the code returns: silent.
func zeroProduct(n int) int64 {
	var h int64 = 1
	for i := 1; i <= n; i++ {
		h *= int64(i) * int64(i-1)
	}
	return h
}

// evenPowers multiplies by a constant twice a trip, 4^n: no factorial,
// no finding of this shape.
func evenPowers(n int) int64 {
	var h int64 = 1
	for i := 0; i < n && i < 31; i++ {
		h *= 2
		h *= 2
	}
	return h
}
