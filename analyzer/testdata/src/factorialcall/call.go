// Package factorialcall holds the factorial-call category's cases: calls
// of a factorial-valued function whose argument is certainly past its
// first bad value (21 for n! in int64, OEIS A000142, from memory).
package factorialcall

// fact is n! in int64; its calls decide its findings.
func fact(n int64) int64 { // want fact:`factorial of parameter 0`
	r := int64(1)
	for i := int64(2); i <= n; i++ {
		r *= i
	}
	return r
}

// Deck asks for 52!: definite.
func Deck() int64 {
	return fact(52) // want `fact\(52\): factorial of 52 in int64 wraps`
}

// Hand asks for 5!: silent.
func Hand() int64 {
	return fact(5)
}

// Past asks for n! with n at least 30: definite.
func Past(n int64) int64 { // want Past:`factorial of parameter 0, breaks from 21` Past:`wrong for n ≥ 21`
	if n < 30 {
		return 0
	}
	return fact(n) // want `fact\(n\): factorial of n in int64 wraps for n ≥ 21 .*; n is at least 30 here`
}

// Table asks for 25!, 30! and 5!: two findings, one silent call.
func Table() [3]int64 {
	return [3]int64{fact(25), fact(30), fact(5)} // want `fact\(25\)` `fact\(30\)`
}

// factF is n! in float64, returned as it is (+Inf from n = 171).
func factF(n int) float64 { // want factF:`factorial of parameter 0, breaks from 171`
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

// BigDeck returns 200! in float64 as it is: +Inf, the IEEE value of a
// number beyond float64, not a wrong one. Silent.
func BigDeck() float64 {
	return factF(200)
}

// BigTable keeps 200! in a table whose later use this function does not
// see: still reported, as before.
func BigTable() []float64 {
	return []float64{factF(200), factF(5)} // want `factF\(200\): factorial of 200 in float64 overflows to \+Inf`
}
