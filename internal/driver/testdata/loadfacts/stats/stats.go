// Package stats builds shipping estimates on combin: it carries facts
// only because it wraps a function that carries one.
package stats

import counting "example.com/loadfacts/combin"

// Ways is the number of orders of n crates.
func Ways(n int) int {
	return counting.Factorial(n)
}
