// Package fixloggamma scores the spread of a kiln's firing times with
// the log of a gamma value, as a sheet formula writes it.
package fixloggamma

import "math"

// Spread is ln Γ(x): +Inf from x = 171.62 on, where Γ(x) overflows
// although its logarithm is near 708.
func Spread(x float64) float64 {
	return math.Log(math.Gamma(x)) // want `math.Gamma overflows: math.Gamma\(x\) is \+Inf for x ≥ 171.624377`
}
