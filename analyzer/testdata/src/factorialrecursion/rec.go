// Package factorialrecursion holds the factorial-recursion category's
// cases: functions that return n times themselves at n-1. 20! is the
// largest factorial in int64, 12! in int32 (OEIS A000142, from memory).
package factorialrecursion

// Rec has no bound on n: possible, fixed by a range guard.
func Rec(n int64) int64 { // want Rec:`factorial of parameter 0, breaks from 21`
	if n < 2 {
		return 1
	}
	return n * Rec(n-1) // want `recursive factorial of n in int64 wraps for n ≥ 21 \(20! ≈ 2.43e18 is the largest that fits\); n is not bounded here`
}

// Rec32 breaks earlier, in int32.
func Rec32(n int32) int32 { // want Rec32:`factorial of parameter 0, breaks from 13`
	if n < 2 {
		return 1
	}
	return n * Rec32(n-1) // want `recursive factorial of n in int32 wraps for n ≥ 13`
}

// Bounded refuses what does not fit: silent.
func Bounded(n int64) int64 { // want Bounded:`factorial of parameter 0, safe for`
	if n > 20 {
		return -1
	}
	if n < 2 {
		return 1
	}
	return n * Bounded(n-1)
}

// Sum recurses but adds: no factorial.
func Sum(n int64) int64 {
	if n < 1 {
		return 0
	}
	return n + Sum(n-1)
}
