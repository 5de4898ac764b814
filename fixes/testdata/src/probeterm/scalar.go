package probeterm

import "math"

// Level is a float32 gamma ratio: the result is converted back.
func Level(a, b float32) float32 {
	// probe:gammaratio(a, b)
	return float32(math.Gamma(float64(a)) / math.Gamma(float64(b))) // want "probe gammaratio"
}
