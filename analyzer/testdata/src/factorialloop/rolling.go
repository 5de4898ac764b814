package factorialloop

import "math"

// Rolling pairs: a recurrence over the two values before it kept in two
// variables. The first values that leave each type are from math/big
// (thresholds.PairRecurrence, checked against OEIS A000166 and A000142).

// HatCheck counts the ways n guests take back hats none of which is
// their own, naming the new value before rolling the pair.
func HatCheck(n int) uint32 { // want HatCheck:`wrong for some n`
	prev, cur := uint32(1), uint32(0)
	for k := 2; k <= n; k++ {
		next := uint32(k-1) * (cur + prev)
		prev, cur = cur, next // want `rolling pair prev, cur = cur, next computes the derangement numbers D\(k\) = \(k-1\)·\(D\(k-1\) \+ D\(k-2\)\) in uint32: the step at k = 14 wraps \(D\(13\) ≈ 2.29e9 is the largest that fits\), and the steps after it carry the wrapped value on; k is not bounded here`
	}
	return cur
}

// Orders rolls the pair the other way round, from 1! and 2!: the values
// are the factorials.
func Orders(n int) int64 { // want Orders:`wrong for some n`
	lo, hi := int64(1), int64(2)
	for m := 3; m <= n; m++ {
		hi, lo = int64(m-1)*(lo+hi), hi // want `rolling pair hi, lo = int64\(m-1\) \* \(lo \+ hi\), hi computes the factorials m! = \(m-1\)·\(\(m-1\)! \+ \(m-2\)!\) in int64: the step at m = 21 wraps \(20! ≈ 2.43e18 is the largest that fits\)`
	}
	return hi
}

// Weighted runs the rule from other starting values, x(j) = (j+1)·(x(j-1)
// + x(j-2)), over a fixed 40 steps: it always reaches the step that
// wraps.
func Weighted() int64 {
	var a int64 = 2
	b := int64(3)
	for j := 1; j < 40; j++ {
		a, b = b, int64(j+1)*(a+b) // want `rolling pair a, b = b, int64\(j\+1\) \* \(a \+ b\) computes the sequence x\(j\) = int64\(j\+1\) \* \(a \+ b\) in int64: the step at j = \d+ wraps`
	}
	return b
}

// SmallHatCheck stops at 14 guests: silent.
func SmallHatCheck() int64 {
	a, b := int64(1), int64(0)
	for i := 2; i <= 14; i++ {
		a, b = b, int64(i-1)*(a+b)
	}
	return b
}

// HatCheckMod reduces every value: silent.
func HatCheckMod(n int) int64 {
	a, b := int64(1), int64(0)
	for i := 2; i <= n; i++ {
		a, b = b, int64(i-1)*(a+b)
		b %= 1_000_000_007
	}
	return b
}

// HatCheckChecked stops before a step that would not fit: silent.
func HatCheckChecked(n int) (int64, bool) {
	a, b := int64(1), int64(0)
	for i := 2; i <= n; i++ {
		if a+b > math.MaxInt64/int64(i-1) {
			return 0, false
		}
		a, b = b, int64(i-1)*(a+b)
	}
	return b, true
}

// HatCheckFloat counts in float64, whose +Inf is the answer past it:
// silent.
func HatCheckFloat(n int) float64 {
	a, b := 1.0, 0.0
	for i := 2; i <= n; i++ {
		a, b = b, float64(i-1)*(a+b)
	}
	return b
}

// Fibonacci adds without a weight: silent.
func Fibonacci(n int) int64 {
	a, b := int64(0), int64(1)
	for i := 2; i <= n; i++ {
		a, b = b, a+b
	}
	return b
}

// FromSeed starts from values the caller gives: silent (the sequence is
// not known).
func FromSeed(a, b int64, n int) int64 {
	for i := 2; i <= n; i++ {
		a, b = b, int64(i-1)*(a+b)
	}
	return b
}

// Seating rolls the pair one variable at a time through a named value.
func Seating(n int) int64 { // want Seating:`wrong for some n`
	older, newer := int64(1), int64(0)
	for k := 2; k <= n; k++ {
		next := int64(k-1) * (older + newer)
		older = newer
		newer = next // want `rolling pair older, newer = newer, next computes the derangement numbers D\(k\) .* in int64: the step at k = 21 wraps`
	}
	return newer
}

// SeatingWrongOrder overwrites b before a reads it: another sequence
// (a copy of the new value twice), silent.
func SeatingWrongOrder(n int) int64 {
	a, b := int64(1), int64(0)
	for k := 2; k <= n; k++ {
		b = int64(k-1) * (a + b)
		a = b
	}
	return b
}
