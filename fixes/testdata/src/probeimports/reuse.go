package probeimports

import (
	"math"

	lg "github.com/overfact/overfact/fixes/lgamma"
)

// Spread already uses the helper under the name lg, which fixes reuse.
func Spread(n, k int) float64 {
	if n > 1000 {
		return math.Exp(lg.LogChoose(n, k))
	}
	// probe:binomial(n, k)
	return fact(n) / (fact(k) * fact(n-k)) // want "probe binomial"
}
