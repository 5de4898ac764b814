// Package factorialloop holds the factorial-loop category's cases: loops
// that multiply an accumulator by their induction variable. 20! is the
// largest factorial in int64 and 170! the largest in float64 (OEIS
// A000142, from memory).
package factorialloop

// Fact has no bound on n: possible, fixed by a range guard.
func Fact(n int64) int64 { // want Fact:`factorial of parameter 0, breaks from 21`
	r := int64(1)
	for i := int64(2); i <= n; i++ { // want `factorial of n in int64 wraps for n ≥ 21 \(20! ≈ 2.43e18 is the largest that fits\); n is not bounded here`
		r *= i
	}
	return r
}

// Table multiplies up to the constant 25: definite.
func Table() int64 {
	r := int64(1)
	for i := int64(1); i <= 25; i++ { // want `factorial of 25 in int64 wraps`
		r *= i
	}
	return r
}

// Bounded checks its argument first: silent.
func Bounded(n int64) int64 { // want Bounded:`factorial of parameter 0, safe for \[2, 20\]`
	if n > 20 {
		return -1
	}
	r := int64(1)
	for i := int64(2); i <= n; i++ {
		r *= i
	}
	return r
}

// FloatFact stays below 171: silent.
func FloatFact(n int) float64 { // want FloatFact:`factorial of parameter 0, safe for \[2, 170\]`
	if n > 170 {
		return 0
	}
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

// Reset is no product: a closure holds the accumulator's address and
// may change it between the factors (the analyzer asks which variables
// closures change, and &r is one way to change r).
func Reset(n int64, stop func(int64) bool) int64 {
	r := int64(1)
	clear := func() {
		p := &r
		*p = 1
	}
	for i := int64(2); i <= n; i++ {
		r *= i
		if stop(i) {
			clear()
		}
	}
	return r
}
