// Package annuity holds the mortality arithmetic of a small pension
// valuation: life tables, cohort death counts and annuity factors.
package annuity

import (
	"errors"
	"math"
	"math/big"
)

// LifeTable is a period life table: Lx[x] lives at exact age x out of
// a radix of Lx[0].
type LifeTable struct {
	Lx   []float64
	Rate float64 // valuation interest rate
}

// Qx is the probability that a life aged x dies within a year.
func (t LifeTable) Qx(x int) float64 {
	if x+1 >= len(t.Lx) || t.Lx[x] == 0 {
		return 1
	}
	return 1 - t.Lx[x+1]/t.Lx[x]
}

// AnnuityDue is the present value of 1 paid at the start of each year
// while a life aged x survives.
func (t LifeTable) AnnuityDue(x int) float64 {
	v := 1 / (1 + t.Rate)
	disc := 1.0
	pv := 0.0
	for k := x; k < len(t.Lx); k++ {
		pv += disc * t.Lx[k] / t.Lx[x]
		disc *= v
	}
	return pv
}

// factorial returns n! as a float64.
func factorial(n int) float64 { // want factorial:`factorial of parameter 0, breaks from 171`
	f := 1.0
	for i := 2; i <= n; i++ {
		f *= float64(i)
	}
	return f
}

// DeathsPMF is the probability of exactly k deaths in a year when the
// cohort's deaths are Poisson with mean lambda.
func DeathsPMF(k int, lambda float64) float64 { // want DeathsPMF:`wrong for k ≥ 171 \(DeathsPMF, annuity/cohort\.go:54\)` DeathsPMF:`value \(p1\)\^\(p0\)·exp\(-p1\)/Γ\(p0 \+ 1\), wrong once p0 ≥ 171`
	if k < 0 {
		return 0
	}
	return math.Pow(lambda, float64(k)) * math.Exp(-lambda) / factorial(k) // want `Poisson-style term lambda\^k·e\^\(−lambda\)/k! in float64: the divisor k! overflows to \+Inf for k ≥ 171`
}

// DeathsCDF is the probability of at most k deaths.
func DeathsCDF(k int, lambda float64) float64 { // want DeathsCDF:`wrong for some k \(DeathsCDF, annuity/cohort\.go:61\)`
	s := 0.0
	for i := 0; i <= k; i++ {
		s += DeathsPMF(i, lambda) // want `DeathsCDF computes lambda\^i·e\^\(−lambda\)/i! in float64, which fits where DeathsPMF\(i, lambda\) already is \+Inf o`
	}
	return s
}

// Cohort is a closed group of lives of one age.
type Cohort struct {
	Size int
	Q    float64 // one-year death probability
}

// choose is C(n, k) as a float64, built one factor at a time.
func choose(n, k int) float64 { // want choose:"binomial of parameter 0, breaks from 1030"
	if k < 0 || k > n {
		return 0
	}
	if k > n-k {
		k = n - k
	}
	c := 1.0
	for i := 1; i <= k; i++ {
		c *= float64(n-k+i) / float64(i)
	}
	return c
}

// ProbDeaths is the binomial probability that exactly d of the cohort
// die within the year.
func (c *Cohort) ProbDeaths(d int) float64 { // want ProbDeaths:"wrong for some c"
	return choose(c.Size, d) * math.Pow(c.Q, float64(d)) * math.Pow(1-c.Q, float64(c.Size-d)) // want `binomial probability C\(c.Size, d\)·c.Q\^d·\(1−c.Q\)\^\(c.Size−d\) in float64: choose\(c.Size, …\) breaks for c.Size ≥ 1030 although the probability itself is at most 1`
}

// ProbDeathsLog is ProbDeaths computed through logarithms.
func (c *Cohort) ProbDeathsLog(d int) float64 {
	if d < 0 || d > c.Size {
		return 0
	}
	n := float64(c.Size)
	k := float64(d)
	ln, _ := math.Lgamma(n + 1)
	lk, _ := math.Lgamma(k + 1)
	lnk, _ := math.Lgamma(n - k + 1)
	lp := ln - lk - lnk
	if d > 0 {
		lp += k * math.Log(c.Q)
	}
	if d < c.Size {
		lp += (n - k) * math.Log1p(-c.Q)
	}
	return math.Exp(lp)
}

// SurvivorCombos counts the ways s survivors can be picked from a
// cohort of n lives, exactly.
func SurvivorCombos(n, s int64) *big.Int {
	return new(big.Int).Binomial(n, s)
}

// ErrTooOld is returned for ages past the table.
var ErrTooOld = errors.New("annuity: age beyond table")
