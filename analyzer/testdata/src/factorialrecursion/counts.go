package factorialrecursion

// Recursions over two counts, as a relay team's planner writes them.

// Legs counts the orders of k runners picked from n for the relay's
// legs: n!/(n−k)!, the falling factorial of k factors from n down.
// Picks of 2 from 100 fit; when k reaches n it is n!.
func Legs(n, k int) int { // want Legs:`falling-factorial of parameter 0, breaks from 21`
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

// Squads is C(n, k) by the recursion C(n−1, k−1)·n/k: no factorial of n
// (C(100, 1) = 100 is formed as C(99, 0)·100/1), so no factorial
// finding; the threshold of its intermediate is not n!'s.
func Squads(n, k int64) int64 {
	if k == 0 {
		return 1
	}
	return Squads(n-1, k-1) * n / k
}

// Laps is n! with a modulus passed on unchanged: still n!.
func Laps(n, m int64) int64 { // want Laps:`factorial of parameter 0, breaks from 21`
	if n < 2 {
		return 1
	}
	return n * Laps(n-1, m) // want `recursive factorial of n in int64 wraps for n ≥ 21`
}
