package probeguard

import "fmt"

// Spread is n! in float64, +Inf from n = 171 on.
//
// probe:factorial(n)
func Spread(n int) float64 { // want "probe factorial"
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

// Label keeps fmt in use.
func Label(n int) string { return fmt.Sprint(Spread(n)) }
