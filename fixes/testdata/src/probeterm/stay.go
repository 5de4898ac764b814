package probeterm

import "math"

// Drift keeps math in use after its gamma ratio is rewritten.
func Drift(a, b float64) float64 {
	// probe:gammaratio(a, b)
	r := math.Gamma(a) / math.Gamma(b) // want "probe gammaratio"
	return math.Sqrt(r)
}
