package coalesce

import (
	"errors"
	"math"
)

// SegregatingSitesPMF returns Tavaré's probability of seeing exactly k
// segregating sites in a sample of n sequences under the infinite-sites
// model.
func SegregatingSitesPMF(n, k int, theta float64) float64 {
	sum := 0.0
	c := 1.0 // C(n−2, i−1)
	for i := 1; i <= n-1; i++ {
		if i > 1 {
			c = c * float64(n-i) / float64(i-1)
		}
		t := c * math.Pow(theta/(theta+float64(i)), float64(k+1))
		if i%2 == 0 {
			sum -= t
		} else {
			sum += t
		}
	}
	return float64(n-1) / theta * sum
}

// HWEProb returns the probability of observing nAB heterozygotes among n
// diploid individuals carrying nA copies of allele A, conditional on the
// allele counts (the Hardy–Weinberg exact test).
func HWEProb(n, nA, nAB int) float64 { // want HWEProb:`wrong for some n or some nA or some nAB \(HWEProb, coalesce/sites\.go:36\)`
	nB := 2*n - nA
	nAA := (nA - nAB) / 2
	nBB := (nB - nAB) / 2
	g := math.Gamma
	num := math.Pow(2, float64(nAB)) * g(float64(n+1)) * g(float64(nA+1)) * g(float64(nB+1)) // want `ratio of math\.Gamma values in float64: math\.Gamma\(float64\(n \+ 1\)\) is \+Inf for n ≥ 171`
	den := g(float64(nAA+1)) * g(float64(nAB+1)) * g(float64(nBB+1)) * g(float64(2*n+1))
	return num / den
}

func lfact(n int) float64 {
	v, _ := math.Lgamma(float64(n) + 1)
	return v
}

// HWELogProb is HWEProb computed from log-factorials.
func HWELogProb(n, nA, nAB int) float64 {
	nB := 2*n - nA
	nAA := (nA - nAB) / 2
	nBB := (nB - nAB) / 2
	l := float64(nAB)*math.Ln2 + lfact(n) + lfact(nA) + lfact(nB) -
		lfact(nAA) - lfact(nAB) - lfact(nBB) - lfact(2*n)
	return math.Exp(l)
}

// RankedHistories returns the number of ranked labelled genealogies of n
// sampled genes: n!(n−1)!/2^(n−1).
func RankedHistories(n int) int64 { // want RankedHistories:`wrong for n ≥ 14`
	var h int64 = 1
	for i := 2; i <= n; i++ { // want `running product h computes Γ\(n \+ 1\)·Γ\(n\), which in int64 wraps for n ≥ 14`
		h *= int64(i) * int64(i-1)
	}
	return h >> (n - 1)
}

// ErrTooMany is returned when a count does not fit in an int64.
var ErrTooMany = errors.New("coalesce: count exceeds int64")

// RankedHistoriesChecked is RankedHistories as a product of the C(i, 2)
// coalescence choices, refusing samples whose count does not fit.
func RankedHistoriesChecked(n int) (int64, error) {
	if n > 15 {
		return 0, ErrTooMany
	}
	var h int64 = 1
	for i := 2; i <= n; i++ {
		h *= int64(i * (i - 1) / 2)
	}
	return h, nil
}
