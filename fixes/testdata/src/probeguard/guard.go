// Package probeguard holds standalone factorials for the range guards: a
// reliability test plan that counts orderings of units under test.
package probeguard

// Orderings is n! in int64, wrong from n = 21 on.
//
// probe:factorial(n)
func Orderings(n int64) int64 { // want "probe factorial"
	r := int64(1)
	for i := int64(2); i <= n; i++ {
		r *= i
	}
	return r
}

// Rec is n! by recursion, in int32: wrong from n = 13 on.
//
// probe:factorial(n)
func Rec(n int32) int32 { // want "probe factorial"
	if n < 2 {
		return 1
	}
	return n * Rec(n-1)
}

// Short has its statement on the line of its brace.
//
// probe:factorial(n)
func Short(n uint) uint { return uint(Orderings(int64(n))) } // want "probe factorial"

// Tiny takes an int8, which never reaches 171.
//
// probe:factorial(n)
func Tiny(n int8) float64 { // want "probe factorial: no fix: n of type int8 never reaches 171"
	r := 1.0
	for i := int8(2); i <= n; i++ {
		r *= float64(i)
	}
	return r
}

// Count overflows uint64 from 21 on (OEIS A000142).
//
// probe:factorial(n)
func Count(n uint64) uint64 { // want "probe factorial"
	r := uint64(1)
	for i := uint64(2); i <= n; i++ {
		r *= i
	}
	return r
}

// Small is n! in float32, +Inf from n = 35 on.
//
// probe:factorial(n)
func Small(n int) float32 { // want "probe factorial"
	r := float32(1)
	for i := 2; i <= n; i++ {
		r *= float32(i)
	}
	return r
}

// Halve reassigns n before its loop, so a guard on the incoming n would
// test the wrong value.
//
// probe:factorial(n)
func Halve(n int) int { // want "probe factorial: no fix: n is assigned in the function"
	n /= 2
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}

// Tally counts n down as it multiplies, so the incoming n is not the
// value the loop ends on either.
//
// probe:factorial(n)
func Tally(n int) int { // want "probe factorial: no fix: n is assigned in the function"
	r := 1
	for n > 1 {
		r *= n
		n--
	}
	return r
}

// Shared hands n's address to a helper that may change it.
//
// probe:factorial(n)
func Shared(n int) int { // want "probe factorial: no fix: n is assigned in the function"
	clamp(&n)
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}

func clamp(p *int) {
	if *p > 20 {
		*p = 20
	}
}
