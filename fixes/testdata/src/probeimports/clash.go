package probeimports

func fact(n int) float64 {
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

// Plans counts sampling plans.
func Plans(n, k int) float64 {
	// probe:binomial(n, k)
	return fact(n) / (fact(k) * fact(n-k)) // want "probe binomial"
}
