// Package probe32 is analysed for a 32-bit target (GOARCH=386), where int
// holds 32 bits: an int result then gets the exact-integer rewrite with a
// check that it fits, since int(lgamma.MustChooseInt64(...)) alone could
// wrap silently again.
package probe32

func fact(n int) int {
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}

// Rotas has a 32-bit result on this target, so the helper's result is
// checked to fit.
func Rotas(n, k int) int {
	// probe:binomial(n, k)
	return fact(n) / (fact(k) * fact(n-k)) // want "probe binomial"
}

// Rotas64 has a 64-bit result on every target.
func Rotas64(n, k int) int64 {
	// probe:binomial(n, k)
	return int64(fact(n) / (fact(k) * fact(n-k))) // want "probe binomial"
}

// Guarded gets its guard from the 32-bit threshold: 13! overflows int32.
//
// probe:factorial(n)
func Guarded(n int) int { // want "probe factorial"
	return fact(n)
}
