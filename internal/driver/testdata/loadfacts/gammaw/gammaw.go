// Package gammaw gives factorials through the gamma function.
package gammaw

import "math"

// Fact is n! as Γ(n+1).
func Fact(n int) float64 {
	return math.Gamma(float64(n + 1))
}
