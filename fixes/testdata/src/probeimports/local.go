package probeimports

// Mixes has a local lgamma2, so its fix imports the helper as lgamma3.
func Mixes(n, k int) float64 {
	lgamma2 := 0.5
	// probe:binomial(n, k)
	c := fact(n) / fact(n-k) / fact(k) // want "probe binomial"
	return lgamma2 * c
}
