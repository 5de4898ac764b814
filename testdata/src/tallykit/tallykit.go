// Package tallykit is the counting library of a seed-testing
// laboratory: binomial coefficients for its germination trials, exact
// from a table of small factorials and from log-gamma above it, and
// their logarithms for the likelihoods.
package tallykit

import "math"

// tableLimit is the largest n whose factorials the table holds: 20! is
// the largest factorial in int64.
const tableLimit = 20

var smallFact [tableLimit + 1]int64

func init() {
	smallFact[0] = 1
	f := int64(1)
	for n := int64(1); n <= tableLimit; n++ {
		f *= n
		smallFact[n] = f
	}
}

// Choose returns C(n, k): an exact falling product over the table for
// n ≤ 20, exp of log-gamma differences above. The formula's value is
// the function's value wherever it can leave float64, so callers are
// judged by C(n, k).
func Choose(n, k int) float64 { // want Choose:`value Γ\(p0 \+ 1\)/\(Γ\(p1 \+ 1\)·Γ\(p0 - p1 \+ 1\)\), another return for p0 ≤ 20`
	if k == 0 || k == n {
		return 1
	}
	if k < 0 || n < k {
		return 0
	}
	if n <= tableLimit {
		num := int64(1)
		for m := int64(n - k + 1); m <= int64(n); m++ {
			num *= m
		}
		return float64(num / smallFact[k])
	}
	return math.Exp(lchoose(n, k)) // want `math.Exp of log-gamma values computes C\(n, k\) from 3 log-gamma values .* from n = 249`
}

// Lchoose returns ln C(n, k).
func Lchoose(n, k int) float64 { // want Lchoose:`value ln Γ\(p0 \+ 1\)/\(Γ\(p1 \+ 1\)·Γ\(p0 - p1 \+ 1\)\)`
	if k == 0 || k == n {
		return 0
	}
	if k < 0 || n < k {
		return math.NaN()
	}
	return lchoose(n, k)
}

func lchoose(n, k int) float64 {
	a, _ := math.Lgamma(float64(n + 1))
	b, _ := math.Lgamma(float64(k + 1))
	c, _ := math.Lgamma(float64(n - k + 1))
	return a - b - c
}

// WideChoose serves the trial planner from Pascal's triangle for every
// n below 2048, whose rows reach past C(1030, 515), the first central
// coefficient beyond float64: the table is no small-input branch, so
// the function carries no value for its callers.
func WideChoose(n, k int) float64 {
	if k < 0 || n < k {
		return 0
	}
	if n < 2048 {
		return pascal(n, k)
	}
	return math.Exp(lchoose(n, k)) // want `math.Exp of log-gamma values computes C\(n, k\) from 3 log-gamma values .* from n = 2048 .*n is at least 2048 here`
}

// pascal is row n of Pascal's triangle, entry k, built in float64.
func pascal(n, k int) float64 {
	row := []float64{1}
	for i := 0; i < n; i++ {
		next := make([]float64, len(row)+1)
		next[0], next[len(row)] = 1, 1
		for j := 1; j < len(row); j++ {
			next[j] = row[j-1] + row[j]
		}
		row = next
	}
	return row[k]
}
