// Package speciesrich estimates the species richness of a community from
// the abundances counted in field plots: rarefaction curves, Chao's
// estimator, abundance models and quadrat counts.
package speciesrich

import "math"

// Sample holds the number of individuals of each species seen in a plot.
type Sample struct {
	Counts []int
}

// Total returns the number of individuals in the sample.
func (s Sample) Total() int {
	n := 0
	for _, c := range s.Counts {
		n += c
	}
	return n
}

// Observed returns the number of species with at least one individual.
func (s Sample) Observed() int {
	k := 0
	for _, c := range s.Counts {
		if c > 0 {
			k++
		}
	}
	return k
}

// Chao1 returns the bias-corrected Chao1 lower bound on the number of
// species, from the singletons and doubletons of the sample.
func (s Sample) Chao1() float64 {
	var f1, f2 float64
	for _, c := range s.Counts {
		switch c {
		case 1:
			f1++
		case 2:
			f2++
		}
	}
	return float64(s.Observed()) + f1*(f1-1)/(2*(f2+1))
}

// Rarefy returns Hurlbert's expected number of species in a random
// subsample of m individuals drawn without replacement.
func (s Sample) Rarefy(m int) float64 { // want Rarefy:`wrong for some s or some m \(Rarefy, speciesrich/sample\.go:58\)`
	n := s.Total()
	denom := choose(n, m)
	e := 0.0
	for _, c := range s.Counts {
		if c == 0 {
			continue
		}
		e += 1 - choose(n-c, m)/denom // want `divides by C\(n, m\) formed on its own in float64: choose\(n, m\) is \+Inf or NaN for n ≥ 171, long before C\(n, m\) leaves float64`
	}
	return e
}

// RarefyLog is Rarefy with the binomial ratio taken in log space, for
// samples of many thousands of individuals.
func (s Sample) RarefyLog(m int) float64 {
	n := s.Total()
	e := 0.0
	for _, c := range s.Counts {
		if c == 0 {
			continue
		}
		if n-c < m {
			e++
			continue
		}
		e += 1 - math.Exp(lchoose(n-c, m)-lchoose(n, m))
	}
	return e
}

// RarefyRunning is Rarefy with C(n−c, m)/C(n, m) built as a product of m
// ratios, each below one.
func (s Sample) RarefyRunning(m int) float64 {
	n := s.Total()
	e := 0.0
	for _, c := range s.Counts {
		if c == 0 {
			continue
		}
		if n-c < m {
			e++
			continue
		}
		r := 1.0
		for i := 0; i < m; i++ {
			r *= float64(n-c-i) / float64(n-i)
		}
		e += 1 - r
	}
	return e
}
