// Package seating is a banquet seating planner: it counts the ordered
// ways to seat k guests of honour at the head table from n invitees.
package seating

// Arrangements is n!/(n-k)!, the ordered seatings of k of n guests,
// multiplied up from the smallest factor n-k+1 to n.
func Arrangements(n, k int) int {
	if k < 0 || k > n {
		return 0
	}
	p := 1
	for i := n - k + 1; i <= n; i++ { // want `falling factorial of k factors in int wraps: run down to 1 it is a factorial, which wraps from 21!; the largest factor is not bounded here`
		p *= i
	}
	return p
}

// Arrangements64 is Arrangements in int64, counting down from n.
func Arrangements64(n, k int64) int64 {
	p := int64(1)
	for i := n; i > n-k; i-- { // want `falling factorial of k factors in int64 wraps`
		p *= i
	}
	return p
}

// Prizes counts the ordered ways to hand k distinct prizes to n
// guests, with the factor written one above the loop variable.
func Prizes(n, k uint64) uint64 {
	p := uint64(1)
	for i := n - k; i < n; i++ { // want `falling factorial of k factors in uint64 wraps`
		p *= i + 1
	}
	return p
}

// TableOfSix is Arrangements for the six seats of the head table, from
// a guest list the planner caps at 20.
func TableOfSix(n int) int {
	if n < 6 || n > 20 {
		return 0
	}
	p := 1
	for i := n - 6 + 1; i <= n; i++ {
		p *= i
	}
	return p
}

// SmallParty is Arrangements for parties of at most 20 invitees.
func SmallParty(n, k int) int {
	if n > 20 || k < 0 || k > n {
		return 0
	}
	p := 1
	for i := n - k + 1; i <= n; i++ {
		p *= i
	}
	return p
}

// Judges counts the ordered panels of three judges (at most) from a
// pool the planner caps at 1000 people: 1000·999·998 fits an int.
func Judges(n, k int) int {
	if n > 1000 || k < 0 || k > 3 || k > n {
		return 0
	}
	p := 1
	for i := n - k + 1; i <= n; i++ {
		p *= i
	}
	return p
}

// Podium counts the ordered podiums of three from n contestants; the
// loop runs from n-2 up to n. The first n past int64, 2097154, is the
// smallest n with n(n-1)(n-2) > 2^63-1, found by bisection with exact
// integers (Python's arbitrary-precision int).
func Podium(n int) int {
	p := 1
	for i := n - 2; i <= n; i++ { // want `falling factorial of 3 factors in int wraps for a largest factor ≥ 2097154; the largest factor is not bounded here`
		p *= i
	}
	return p
}
