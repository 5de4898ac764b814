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
func Past(n int64) int64 { // want Past:`factorial of parameter 0, breaks from 21`
	if n < 30 {
		return 0
	}
	return fact(n) // want `fact\(n\): factorial of n in int64 wraps for n ≥ 21 .*; n is at least 30 here`
}

// Table asks for 25!, 30! and 5!: two findings, one silent call.
func Table() [3]int64 {
	return [3]int64{fact(25), fact(30), fact(5)} // want `fact\(25\)` `fact\(30\)`
}
