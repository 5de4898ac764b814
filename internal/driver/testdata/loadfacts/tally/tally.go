// Package tally counts arrangements with a method.
package tally

// Counter arranges the items of one shelf.
type Counter struct{ Shelf string }

// Orders is the number of orders of n items, by recursion.
func (c Counter) Orders(n int) int {
	if n < 2 {
		return 1
	}
	return n * c.Orders(n-1)
}
