// Package app plans a warehouse: every figure here rests on a fact of a
// dependency.
package app

import (
	"example.com/loadfacts/dotted"
	"example.com/loadfacts/gammaw"
	"example.com/loadfacts/ledger"
	"example.com/loadfacts/plain"
	"example.com/loadfacts/shares"
	"example.com/loadfacts/stats"
)

// Plan returns the figures of a plan for a warehouse of the given size.
func Plan(name string, size int) []float64 {
	var b ledger.Book
	return []float64{
		float64(stats.Ways(25)),
		float64(b.Orders(30)),
		gammaw.Fact(200),
		float64(dotted.Teams(70, 35)),
		float64(plain.Hash(name)),
		float64(plain.Search([]int{1, 2, 3}, size)),
		ledger.Scaled(2, size),
	}
}

// MeanSplit is the expected number of crates at the first dock, n/2,
// summed from the shares of another package.
func MeanSplit(n int) float64 {
	m := 0.0
	for j, v := range shares.Split(n) {
		m += float64(j) * v
	}
	return m
}
