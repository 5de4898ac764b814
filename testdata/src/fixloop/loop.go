// Package fixloop is a dice-odds table whose counts are built by
// multiplicative loops; its .golden file shows each loop replaced by one
// exact helper call.
package fixloop

// Ways counts the ways k dice of n show a six.
func Ways(n, k int) int { // want Ways:"binomial of parameter 0"
	b := 1
	for i := 1; i <= k; i++ { // want "multiplicative binomial loop"
		b = b * (n - k + i) / i
	}
	return b
}

// WaysU counts in unsigned arithmetic.
func WaysU(n, k uint64) uint64 { // want WaysU:"binomial of parameter 0"
	b := uint64(1)
	for i := uint64(1); i <= k; i++ { // want "multiplicative binomial loop"
		b = b * (n - k + i) / i
	}
	return b
}
