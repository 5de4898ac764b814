package probebinom

import "time"

// Odds is a named float type of this package.
type Odds float64

// Named keeps its result type through the rewrite.
func Named(n, k int) Odds {
	// probe:binomial(n, k)
	return Odds(factF(n) / (factF(k) * factF(n-k))) // want "probe binomial"
}

// Wait is a result of another package's named type.
func Wait(n, k int) time.Duration {
	// probe:binomial(n, k)
	return time.Duration(fact(n) / (fact(k) * fact(n-k))) // want "probe binomial"
}
