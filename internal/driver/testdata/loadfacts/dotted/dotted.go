// Package dotted imports combin with a dot.
package dotted

import . "example.com/loadfacts/combin"

// Teams is the number of teams of k among n workers.
func Teams(n, k int) int {
	return Binomial(n, k)
}
