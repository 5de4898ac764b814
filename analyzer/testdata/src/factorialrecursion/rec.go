// Package factorialrecursion holds the factorial-recursion category's
// cases: functions that return n times themselves at n-1. 20! is the
// largest factorial in int64, 12! in int32 (OEIS A000142, from memory).
package factorialrecursion

// Rec has no bound on n: possible, fixed by a range guard.
func Rec(n int64) int64 { // want Rec:`factorial of parameter 0, breaks from 21` Rec:`wrong for n ≥ 21`
	if n < 2 {
		return 1
	}
	return n * Rec(n-1) // want `recursive factorial of n in int64 wraps for n ≥ 21 \(20! ≈ 2.43e18 is the largest that fits\); n is not bounded here`
}

// Rec32 breaks earlier, in int32.
func Rec32(n int32) int32 { // want Rec32:`factorial of parameter 0, breaks from 13` Rec32:`wrong for n ≥ 13`
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

// FloatRec returns n·(n−1)! in float64 as it is: +Inf past 170 is the
// IEEE value of a result beyond float64, not a wrong one. Silent; the
// fact stays for the callers' arithmetic.
func FloatRec(n int) float64 { // want FloatRec:`factorial of parameter 0, breaks from 171`
	if n < 2 {
		return 1
	}
	return float64(n) * FloatRec(n-1)
}

// Real32 is a named float type.
type Real32 float32

// NamedRec returns its named float32 product as it is: silent.
func NamedRec(n int) Real32 { // want NamedRec:`factorial of parameter 0, breaks from 35`
	if n < 2 {
		return 1
	}
	return Real32(n) * NamedRec(n-1)
}

// FloatRecHalf uses the product in the function's own arithmetic: the
// halved value is wrong (+Inf) where n!/2 fits, so it is reported.
func FloatRecHalf(n int) float64 { // want FloatRecHalf:`factorial of parameter 0, breaks from 171`
	if n < 2 {
		return 1
	}
	return float64(n) * FloatRecHalf(n-1) / 2 // want `recursive factorial of n in float64 overflows to \+Inf for n ≥ 171`
}

// FloatChoose divides results of the silent FloatRec: reported at the
// ratio.
func FloatChoose(n, k int) float64 { // want FloatChoose:`binomial of parameter 0, breaks from 171`
	return FloatRec(n) / (FloatRec(k) * FloatRec(n-k)) // want `binomial coefficient as a ratio of factorials in float64: the numerator n! overflows to \+Inf for n ≥ 171`
}

// Thousandths keeps n! modulo 1000 at every step: every value is below
// 1000 and the product below 1000·n, so it is no factorial and has no
// finding (a guard would make a right answer panic).
func Thousandths(n int64) int64 {
	if n < 2 {
		return 1
	}
	return n * Thousandths(n-1) % 1000
}

// Refusing returns 0 past 100: a guard at its start would fire where it
// returned 0, so none is offered.
func Refusing(n int64) int64 { // want Refusing:`factorial of parameter 0, breaks from 21` Refusing:`wrong for n ≥ 21`
	if n > 100 {
		return 0
	}
	if n < 2 {
		return 1
	}
	return n * Refusing(n-1) // want `recursive factorial of n in int64 wraps for n ≥ 21 .*; n may reach 100 here`
}

// Doubled is twice n!, with its base case first: the guard is exact.
func Doubled(n int64) int64 { // want Doubled:`factorial of parameter 0, breaks from 21` Doubled:`wrong for n ≥ 21`
	if n <= 1 {
		return 2
	}
	return n * Doubled(n-1) // want `recursive factorial of n in int64 wraps for n ≥ 21`
}
