// Package seating is a banquet seating planner: it counts the ordered
// ways to seat k guests of honour at the head table from n invitees.
package seating

// Arrangements is n!/(n-k)!, the ordered seatings of k of n guests,
// multiplied up from the smallest factor n-k+1 to n.
func Arrangements(n, k int) int { // want Arrangements:`wrong for some n or some k`
	if k < 0 || k > n {
		return 0
	}
	p := 1
	for i := n - k + 1; i <= n; i++ { // want `falling factorial of k factors from n down in int wraps: when k = n it is n!, which wraps for n ≥ 21; n is not bounded here`
		p *= i
	}
	return p
}

// Arrangements64 is Arrangements in int64, counting down from n.
func Arrangements64(n, k int64) int64 { // want Arrangements64:`wrong for some n or some k`
	p := int64(1)
	for i := n; i > n-k; i-- { // want `falling factorial of k factors from n down in int64 wraps`
		p *= i
	}
	return p
}

// Prizes counts the ordered ways to hand k distinct prizes to n
// guests, with the factor written one above the loop variable.
func Prizes(n, k uint64) uint64 { // want Prizes:`wrong for some n or some k`
	p := uint64(1)
	for i := n - k; i < n; i++ { // want `falling factorial of k factors from n down in uint64 wraps`
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
func Podium(n int) int { // want Podium:`wrong for some n`
	p := 1
	for i := n - 2; i <= n; i++ { // want `falling factorial of 3 factors in int wraps for a largest factor ≥ 2097154; n is not bounded here`
		p *= i
	}
	return p
}

// The mirrored-hall loops below multiply a span whose both ends move with
// n, so the top and the number of factors grow together. First bad
// inputs, each found by an exact scan with arbitrary-precision integers
// (Python's int) and checked by the thresholds package's math/big tests:
// (n+1)…(2n) passes 2^63−1 first at n = 15 (at n = 14 it is
// 3497296636753920000); (n+1)…(3n) passes 2^64−1 first at n = 9; and
// 6·7·…·n passes 2^63−1 first at n = 22.

// MirroredHalls counts the ordered seatings of n guests at the n empty
// seats of a mirrored hall of 2n seats, (n+1)·…·(2n).
func MirroredHalls(n int64) int64 { // want MirroredHalls:`wrong for some n`
	p := int64(1)
	for k := n + 1; k < 2*n+1; k++ { // want `falling factorial of n factors down from 2\*n in int64 wraps for n ≥ 15; n is not bounded here`
		p *= k
	}
	return p
}

// MirroredHallsCapped is MirroredHalls for the planner's halls of at
// most 14 pairs, the largest that fits.
func MirroredHallsCapped(n int64) int64 {
	if n > 14 {
		return 0
	}
	p := int64(1)
	for k := n + 1; k < 2*n+1; k++ {
		p *= k
	}
	return p
}

// MirroredHallsOneTooMany allows one pair more than fits.
func MirroredHallsOneTooMany(n int64) int64 { // want MirroredHallsOneTooMany:`wrong for some n`
	if n < 1 || n > 15 {
		return 0
	}
	p := int64(1)
	for k := n + 1; k <= 2*n; k++ { // want `falling factorial of n factors down from 2\*n in int64 wraps for n ≥ 15; n may reach 15 here`
		p *= k
	}
	return p
}

// GrandHall is a hall of three wings: (n+1)·…·(3n), 2n factors.
func GrandHall(n uint64) uint64 {
	if n >= 9 {
		panic("grand hall too large")
	}
	p := uint64(1)
	for k := n + 1; k <= 3*n; k++ {
		p *= k
	}
	return p
}

// GrandHallUnchecked is GrandHall without its guard.
func GrandHallUnchecked(n uint64) uint64 { // want GrandHallUnchecked:`wrong for some n`
	p := uint64(1)
	for k := n + 1; k <= 3*n; k++ { // want `falling factorial of 2\*n factors down from 3\*n in uint64 wraps for n ≥ 9; n is not bounded here`
		p *= k
	}
	return p
}

// BanquetsPast counts the seatings once the five tables of honour are
// filled: 6·7·…·n.
func BanquetsPast(n int64) int64 { // want BanquetsPast:`wrong for some n`
	if n > 30 {
		return 0
	}
	p := int64(1)
	for i := int64(6); i <= n; i++ { // want `falling factorial of n-5 factors down from n in int64 wraps for n ≥ 22; n may reach 30 here`
		p *= i
	}
	return p
}

// BanquetsBig is BanquetsPast for halls of 22 or more seats, where the
// product can never fit.
func BanquetsBig(n int64) int64 { // want BanquetsBig:`wrong for some n`
	if n < 22 || n > 40 {
		return 0
	}
	p := int64(1)
	for i := int64(6); i <= n; i++ { // want `falling factorial of n-5 factors down from n in int64 wraps for n ≥ 22; n is at least 22 here`
		p *= i
	}
	return p
}
