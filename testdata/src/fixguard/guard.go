// Package fixguard is a reliability test plan counting orderings of units
// under test; no rewrite makes 25! fit an int64, so its .golden file shows
// range guards that fail loudly at the first value that overflows.
package fixguard

import "fmt"

// Orderings is n! in int64, wrong from n = 21 on.
func Orderings(n int64) int64 { // want Orderings:"factorial of parameter 0"
	r := int64(1)
	for i := int64(2); i <= n; i++ { // want "factorial of n in int64"
		r *= i
	}
	return r
}

// Rec is n! by recursion, in int32: wrong from n = 13 on.
func Rec(n int32) int32 { // want Rec:"factorial of parameter 0"
	if n < 2 {
		return 1
	}
	return n * Rec(n-1) // want "recursive factorial of n in int32"
}

// Spread is n! in float64, +Inf from n = 171 on: the IEEE value of an
// n! beyond float64, returned as it is, so no guard.
func Spread(n int) float64 { // want Spread:"factorial of parameter 0"
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

// Label keeps fmt in use.
func Label(n int) string { return fmt.Sprint(Spread(n)) }

// Pairings is the double factorial n!! = n(n−2)(n−4)…; for odd n, the
// number of ways to pair up n+1 units on a test rig. Wrong in int64 from
// n = 34 on.
func Pairings(n int64) int64 { // want Pairings:"double-factorial of parameter 0"
	r := int64(1)
	for i := n; i > 1; i -= 2 { // want `double factorial of n in int64 wraps for n ≥ 34`
		r *= i
	}
	return r
}

// PairingsRec is Pairings by recursion, in int32: wrong from n = 20 on.
func PairingsRec(n int32) int32 { // want PairingsRec:"double-factorial of parameter 0"
	if n < 2 {
		return 1
	}
	return n * PairingsRec(n-2) // want `recursive double factorial of n in int32 wraps for n ≥ \d+`
}

// WearFrom is the rising factorial x(x+1)…(x+n−1) of a rig's wear
// model. Its limit is measured at x = 1 and is not exact for other
// starts (too late for a larger x, too early for a smaller one), so no
// guard is offered.
func WearFrom(x float64, n int) float64 { // want WearFrom:"rising-factorial of parameter 1"
	p := 1.0
	for i := 0; i < n; i++ { // want `rising factorial of n factors from x in float64 overflows to \+Inf for n ≥ 171 at x = 1`
		p *= x + float64(i)
	}
	return p
}
