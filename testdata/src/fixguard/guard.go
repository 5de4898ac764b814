// Package fixguard is a reliability test plan counting orderings of units
// under test; no rewrite makes 25! fit an int64, so its .golden file shows
// range guards that fail loudly at the first value that overflows.
package fixguard

import "fmt"

// Orderings is n! in int64, wrong from n = 21 on.
func Orderings(n int64) int64 { // want Orderings:"factorial of parameter 0" Orderings:`wrong for some n`
	r := int64(1)
	for i := int64(2); i <= n; i++ { // want "factorial of n in int64"
		r *= i
	}
	return r
}

// Rec is n! by recursion, in int32: wrong from n = 13 on.
func Rec(n int32) int32 { // want Rec:"factorial of parameter 0" Rec:`wrong for n ≥ 13`
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
func Pairings(n int64) int64 { // want Pairings:"double-factorial of parameter 0" Pairings:`wrong for some n`
	r := int64(1)
	for i := n; i > 1; i -= 2 { // want `double factorial of n in int64 wraps for n ≥ 34`
		r *= i
	}
	return r
}

// PairingsRec is Pairings by recursion, in int32: wrong from n = 20 on.
func PairingsRec(n int32) int32 { // want PairingsRec:"double-factorial of parameter 0" PairingsRec:`wrong for n ≥ 20`
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

// The guards below go right before a product loop whose product, times
// a positive constant, the function returns: there they test the value
// the caller passed (nothing assigns it before the loop) and fire only
// where the loop runs, after the function's own early returns.

// Swaps counts the orders in which n worn units of two twin rigs can be
// swapped out, counting n down in place: 2·n!, wrong in int64 from
// n = 21 on (2·20! still fits).
func Swaps(n int64) int64 { // want Swaps:`wrong for some n`
	s := int64(1)
	for n > 1 { // want `factorial of n in int64 wraps for n ≥ 21`
		s *= n
		n--
	}
	return 2 * s
}

// OddBays counts the orders of the odd-numbered bays of a rig of n
// bays, n!! in int64, wrong from n = 34 on; a negative count is refused
// before the loop.
func OddBays(n int64) int64 { // want OddBays:`wrong for some n`
	if n < 0 {
		return 0
	}
	r := int64(1)
	// Every second bay, from the top.
	for i := n; i > 1; i -= 2 { // want `double factorial of n in int64 wraps for n ≥ 34`
		r *= i
	}
	return r * 1
}

// LateSlots counts the orders of the slots after the first three of a
// plan of n slots, 4·5·…·n = n!/3!, in int64: it first passes int64 at
// n = 22 (21!/6 ≈ 8.5e18 still fits). Plans past 40 slots are refused
// with −1, which the guard must keep.
func LateSlots(n int64) int64 { // want LateSlots:`wrong for some n`
	if n > 40 {
		return -1
	}
	p := int64(1)
	for i := int64(4); i <= n; i++ { // want `falling factorial of n-3 factors down from n in int64 wraps for n ≥ 22`
		p *= i
	}
	return p
}

// Wear is the rising factorial 5·6·…·(n+4) = (n+4)!/4! of a wear model
// in int32: it first passes int32 at n = 10 (13!/24 ≈ 2.6e8 fits, 14!/24
// ≈ 3.6e9 does not).
func Wear(n int32) int32 { // want Wear:`wrong for some n`
	w := int32(1)
	for i := int32(0); i < n; i++ { // want `rising factorial of n factors from 5 in int32 wraps for n ≥ 10`
		w *= 5 + i
	}
	return w
}

// Capped clamps its argument before the loop: a guard there would name
// the clamped value, not the caller's, so the guard goes at the entry,
// where it tests the caller's n; the range analysis shows that n ≥ 21
// there is exactly where the clamped n is 21 or more.
func Capped(n int64) int64 { // want Capped:`wrong for some n`
	if n > 25 {
		n = 25
	}
	r := int64(1)
	for i := int64(2); i <= n; i++ { // want `factorial of n in int64 wraps for n ≥ 21`
		r *= i
	}
	return r
}

// Halved returns half the product, not the product times a constant:
// no guard.
func Halved(n int64) int64 { // want Halved:`wrong for some n`
	r := int64(1)
	for i := int64(2); i <= n; i++ { // want `factorial of n in int64 wraps for n ≥ 21`
		r *= i
	}
	return r / 2
}

// Line is the orders of a segment of at most 30 units, by Orderings:
// Orderings' own guard would name 30 for any longer segment, so the call
// gets a guard on the caller's n.
func Line(n int64) int64 { // want Line:`wrong for some n`
	if n > 30 {
		n = 30
	}
	return Orderings(n) // want `Orderings\(n\): factorial of n in int64 wraps for n ≥ 21 .*; n may reach 30 here, after Line reassigns it`
}

// Floored counts at least 30 units: every call wraps, whatever its
// argument, and no guard can tell a right call from a wrong one, so none
// is offered.
func Floored(n int64) int64 { // want Floored:`wrong for some n`
	if n < 30 {
		n = 30
	}
	r := int64(1)
	for i := int64(2); i <= n; i++ { // want `factorial of n in int64 wraps for n ≥ 21 .*; n is at least 30 here`
		r *= i
	}
	return r
}
