// Package probemany puts many findings in one file, so that their fixes
// must merge: a dice-odds table for a board-game night.
package probemany

import (
	"math"
	"strings"
)

func fact(n int) int {
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}

func factF(n int) float64 {
	return math.Gamma(float64(n) + 1)
}

// Odds is the chance of k sixes in n rolls.
func Odds(n, k int) float64 {
	// probe:binompmf(k, n, 1.0/6)
	return factF(n) / (factF(k) * factF(n-k)) * math.Pow(1.0/6, float64(k)) * math.Pow(5.0/6, float64(n-k)) // want "probe binompmf"
}

// Hands counts hands of k cards from n.
func Hands(n, k int) int {
	// probe:binomial(n, k)
	return fact(n) / (fact(k) * fact(n-k)) // want "probe binomial"
}

// Seatings counts seatings of n players.
//
// probe:factorial(n)
func Seatings(n int) int { // want "probe factorial"
	return fact(n)
}

// Deals counts ordered deals of k cards from n.
func Deals(n, k int) int {
	// probe:permutation(n, k)
	return fact(n) / fact(n-k) // want "probe permutation"
}

// Ladder is a gamma ratio.
func Ladder(a, b float64) float64 {
	// probe:gammaratio(a, b)
	return math.Gamma(a) / math.Gamma(b) // want "probe gammaratio"
}

// Name keeps strings in use.
func Name(s string) string { return strings.ToUpper(s) }
