// Package probe32 is analysed for a 32-bit target (GOARCH=386), where int
// holds 32 bits: an int result then gets no exact-integer rewrite, since
// int(lgamma.MustChooseInt64(...)) could wrap silently again.
package probe32

func fact(n int) int {
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}

// Rotas is refused on a 32-bit target.
func Rotas(n, k int) int {
	// probe:binomial(n, k)
	return fact(n) / (fact(k) * fact(n-k)) // want "probe binomial: no fix: result type int is narrower than the exact helpers' 64 bits"
}

// Rotas64 has a 64-bit result on every target.
func Rotas64(n, k int) int64 {
	// probe:binomial(n, k)
	return int64(fact(n) / (fact(k) * fact(n-k))) // want "probe binomial"
}

// Guarded gets its guard from the 32-bit threshold: 13! overflows int32.
//
// probe:factorial(n; auto)
func Guarded(n int) int { // want "probe factorial"
	return fact(n)
}
