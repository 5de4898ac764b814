package matchgoals

import "math"

// Sequences returns the number of distinct orders of a season's results
// with w wins, d draws and l losses.
func Sequences(w, d, l int) int {
	return factorial(w+d+l) / (factorial(w) * factorial(d) * factorial(l))
}

func binom(n, k int) int {
	r := 1
	for i := 0; i < k; i++ {
		r = r * (n - i) / (i + 1)
	}
	return r
}

// SequencesBinom is Sequences as a product of two binomial coefficients.
func SequencesBinom(w, d, l int) int {
	return binom(w+d+l, w) * binom(d+l, d)
}

// Combos returns the number of k-leg accumulators that can be built from
// n fixtures.
func Combos(n, k int) int64 {
	a, _ := math.Lgamma(float64(n + 1))
	b, _ := math.Lgamma(float64(k + 1))
	c, _ := math.Lgamma(float64(n - k + 1))
	return int64(math.Round(math.Exp(a - b - c)))
}
