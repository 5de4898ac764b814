// Package coalesce holds the sampling formulas of neutral population
// genetics: Ewens' allele configurations, the number of alleles in a
// sample, segregating sites under the coalescent, and Hardy–Weinberg
// exact tests.
package coalesce

import "math"

// EwensProb returns the probability of the allele configuration a under
// the Ewens sampling formula with scaled mutation rate theta; a[j-1] is
// the number of alleles carried by exactly j genes of the sample.
func EwensProb(a []int, theta float64) float64 {
	n := 0
	for j, aj := range a {
		n += (j + 1) * aj
	}
	num := 1.0
	for i := 2; i <= n; i++ { // want `factorial of n in float64 overflows to \+Inf for n ≥ 171 \(170! ≈ 7\.26e306 is the largest`
		num *= float64(i)
	}
	den := 1.0
	for i := 0; i < n; i++ { // want `rising factorial of n factors from theta in float64 overflows to \+Inf for n ≥ 171 at`
		den *= theta + float64(i)
	}
	p := num / den
	for j, aj := range a {
		jj := float64(j + 1)
		p *= math.Pow(theta/jj, float64(aj)) / math.Gamma(float64(aj+1)) // want `math\.Gamma overflows: math\.Gamma\(float64\(aj \+ 1\)\) is \+Inf for aj ≥ 171 \(Γ\(x\) overflows`
	}
	return p
}

// EwensLogProb returns the logarithm of EwensProb.
func EwensLogProb(a []int, theta float64) float64 {
	n := 0
	for j, aj := range a {
		n += (j + 1) * aj
	}
	ln, _ := math.Lgamma(float64(n + 1))
	lr1, _ := math.Lgamma(theta + float64(n))
	lr0, _ := math.Lgamma(theta)
	lp := ln - (lr1 - lr0)
	for j, aj := range a {
		if aj == 0 {
			continue
		}
		la, _ := math.Lgamma(float64(aj + 1))
		lp += float64(aj)*math.Log(theta/float64(j+1)) - la
	}
	return lp
}

// ExpectedAlleles returns the expected number of distinct alleles in a
// sample of n genes.
func ExpectedAlleles(n int, theta float64) float64 {
	e := 0.0
	for i := 0; i < n; i++ {
		e += theta / (theta + float64(i))
	}
	return e
}

// WattersonTheta returns Watterson's estimator of theta from s
// segregating sites in a sample of n sequences.
func WattersonTheta(s, n int) float64 {
	h := 0.0
	for i := 1; i < n; i++ {
		h += 1 / float64(i)
	}
	return float64(s) / h
}
