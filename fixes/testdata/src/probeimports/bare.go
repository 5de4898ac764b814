package probeimports

// Tail has no import declaration at all (and lgamma is taken).
func Tail(n, k int) float64 {
	// probe:permutation(n, k)
	return fact(n) / fact(n-k) // want "probe permutation"
}
