package matchgoals

import "math"

// Sequences returns the number of distinct orders of a season's results
// with w wins, d draws and l losses.
func Sequences(w, d, l int) int { // want Sequences:`value Γ\(p0 \+ p1 \+ p2 \+ 1\)/\(Γ\(p0 \+ 1\)·Γ\(p1 \+ 1\)·Γ\(p2 \+ 1\)\), wrong once p0 \+ p1 \+ p2 ≥ 21` Sequences:`wrong for w ≥ 21 or d ≥ 21 or l ≥ 21 \(Sequences, matchgoals/season\.go:8\)`
	return factorial(w+d+l) / (factorial(w) * factorial(d) * factorial(l)) // want `multinomial coefficient as a ratio of factorials in int: the numerator \(w \+ d \+ l\)! wraps`
}

func binom(n, k int) int { // want binom:`binomial of parameter 0, breaks from 62`
	r := 1
	for i := 0; i < k; i++ { // want `multiplicative binomial loop in int: the product r \* \(n - i\) wraps before the division`
		r = r * (n - i) / (i + 1)
	}
	return r
}

// SequencesBinom is Sequences as a product of two binomial coefficients.
func SequencesBinom(w, d, l int) int { // want SequencesBinom:`wrong for some w or some d or some l \(SequencesBinom, matchgoals/season\.go:21\)`
	return binom(w+d+l, w) * binom(d+l, d) // want `product of binomial coefficients binom\(w\+d\+l, w\) \* binom\(d\+l, d\) in int wraps where it`
}

// Combos returns the number of k-leg accumulators that can be built from
// n fixtures.
func Combos(n, k int) int64 { // want Combos:`wrong for some n or some k \(Combos, matchgoals/season\.go:30\)`
	a, _ := math.Lgamma(float64(n + 1))
	b, _ := math.Lgamma(float64(k + 1))
	c, _ := math.Lgamma(float64(n - k + 1))
	return int64(math.Round(math.Exp(a - b - c))) // want `int64\(math\.Round\(math\.Exp\(a - b - c\)\)\) reads the integer C\(n, k\) back from math\.Exp of`
}
