// The build constraint sets the file's Go version: from Go 1.22 each
// iteration of a loop has its own loop variable (Go spec, "For
// statements with for clause"), which the closures below rely on.

//go:build go1.22

package cardshuffle

// UniformityChecks runs a check closure for deck sizes 3 to 6; each
// closure counts the n! orderings of its own deck size.
func UniformityChecks(run func(func() int)) {
	for n := 3; n <= 6; n++ {
		run(func() int {
			orderings := 1
			for i := 2; i <= n; i++ {
				orderings *= i
			}
			return orderings
		})
	}
}

// OpenChecks is UniformityChecks up to a size the caller picks.
func OpenChecks(run func(func() int), top int) {
	for n := 3; n <= top; n++ {
		run(func() int {
			orderings := 1
			for i := 2; i <= n; i++ { // want `factorial of n in int wraps for n ≥ 21`
				orderings *= i
			}
			return orderings
		})
	}
}

// LateDeck builds the counting closure before the deck size is final:
// the closure sees the size at the call, not at its creation.
func LateDeck() int {
	n := 3
	count := func() int {
		orderings := 1
		for i := 2; i <= n; i++ { // want `factorial of n in int wraps for n ≥ 21`
			orderings *= i
		}
		return orderings
	}
	n = 52
	return count()
}
