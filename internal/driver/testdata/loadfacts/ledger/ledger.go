// Package ledger embeds tally's counter: the method it promotes carries a
// fact that flows through this package, which defines none itself.
package ledger

import "example.com/loadfacts/tally"

// Book is a shelf ledger.
type Book struct {
	tally.Counter
	Pages int
}

// Scaled scales a figure by a rate, outside any loop.
func Scaled(x float64, times int) float64 {
	return x * 1.5 * float64(times)
}
