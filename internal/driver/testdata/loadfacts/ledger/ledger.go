// Package ledger embeds tally's counter: the method it promotes carries a
// fact that flows through this package, which defines none itself.
package ledger

import "example.com/loadfacts/tally"

// Book is a shelf ledger.
type Book struct {
	tally.Counter
	Pages int
}

// Scaled multiplies a figure by a fixed rate in a loop: not a product
// that moves with the loop.
func Scaled(x float64, times int) float64 {
	for range times {
		x *= 1.5
	}
	return x
}
