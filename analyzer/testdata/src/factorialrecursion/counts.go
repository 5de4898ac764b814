package factorialrecursion

// Recursions over two counts, as a relay team's planner writes them.

// Legs counts the orders of k runners picked from n for the relay's
// legs: n!/(n−k)!, the falling factorial of k factors from n down.
// Picks of 2 from 100 fit; when k reaches n it is n!.
func Legs(n, k int) int { // want Legs:`falling-factorial of parameter 0, breaks from 21` Legs:`wrong for some n or some k`
	if k == 0 {
		return 1
	}
	return n * Legs(n-1, k-1) // want `recursive falling factorial of k factors from n down in int wraps: when k = n it is n!, which wraps for n ≥ 21; n is not bounded here`
}

// Podium picks the three podium places from at most 2000 runners: at
// most 2000·1999·1998, which fits.
func Podium(n int) int {
	if n < 0 || n > 2000 {
		return 0
	}
	return podium(n, 3)
}

func podium(n, k int) int { // want podium:`falling-factorial of parameter 0, breaks from 21`
	if k <= 0 {
		return 1
	}
	return n * podium(n-1, k-1)
}

// Laps is n! with a modulus passed on unchanged: still n!.
func Laps(n, m int64) int64 { // want Laps:`factorial of parameter 0, breaks from 21` Laps:`wrong for n ≥ 21`
	if n < 2 {
		return 1
	}
	return n * Laps(n-1, m) // want `recursive factorial of n in int64 wraps for n ≥ 21`
}

// Crews is C(n, k) by the recursion C(n−1, k−1)·n/k: the product is
// formed before the division, as in a multiplicative binomial loop.
func Crews(n, k int64) int64 { // want Crews:`binomial of parameter 0, breaks from 62` Crews:`wrong for some n or some k`
	if k == 0 {
		return 1
	}
	return Crews(n-1, k-1) * n / k // want `multiplicative binomial recursion in int64: the product Crews\(n-1, k-1\) \* n wraps before the division by k for n ≥ 62 at k = n/2, although C\(n, n/2\) itself fits up to n = 66; n is not bounded here`
}

// Relays picks relay teams of at most 4 from at most 40 runners: the
// products stay small.
func Relays(n, k int64) int64 {
	if n < 0 || n > 40 || k < 0 || k > 4 {
		return 0
	}
	return relays(n, k)
}

func relays(n, k int64) int64 { // want relays:`binomial of parameter 0, breaks from 62`
	if k == 0 {
		return 1
	}
	return relays(n-1, k-1) * n / k
}
