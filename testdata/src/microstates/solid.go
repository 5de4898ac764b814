// Package microstates counts the microstates of small statistical-mechanics
// models (Einstein solids, ideal gases, Bose and Fermi occupations) and
// evaluates their partition functions.
package microstates

import "math"

// Multiplicity returns the number of ways to share q energy quanta among
// n oscillators of an Einstein solid, C(q+n−1, q).
func Multiplicity(n, q int) uint64 { // want Multiplicity:`wrong for some n or some q \(Multiplicity, microstates/solid\.go:12\)`
	var w uint64 = 1
	for i := 1; i <= q; i++ { // want `multiplicative binomial loop in uint64: the product w \* \(uint64\(n - 1 \+ i\)\) wraps before the division for n \+ q - 1 ≥ 63 at k = \(n \+ q - 1\)/2`
		w = w * uint64(n-1+i) / uint64(i)
	}
	return w
}

// MultiplicityFloat is Multiplicity in floating point, for solids whose
// counts exceed 64 bits.
func MultiplicityFloat(n, q int) float64 { // want MultiplicityFloat:`value Γ\(p0 \+ p1\)/\(Γ\(p0\)·Γ\(p1 \+ 1\)\), a running product`
	w := 1.0
	for i := 1; i <= q; i++ {
		w = w * float64(n-1+i) / float64(i)
	}
	return w
}

// Entropy returns S/k_B = ln Ω of an Einstein solid.
func Entropy(n, q int) float64 { // want Entropy:`wrong for some n \(Multiplicity, microstates/solid\.go:12\)`
	return math.Log(float64(Multiplicity(n, q))) // want `Entropy builds its result from Multiplicity\(n, q\), which is wrong for some values of n`
}

// EntropyLog returns S/k_B from log-gamma values.
func EntropyLog(n, q int) float64 { // want EntropyLog:`value ln Γ\(p0 \+ p1\)/\(Γ\(p1 \+ 1\)·Γ\(p0\)\)`
	a, _ := math.Lgamma(float64(q + n))
	b, _ := math.Lgamma(float64(q + 1))
	c, _ := math.Lgamma(float64(n))
	return a - b - c
}

func fact(n int) float64 { // want fact:`factorial of parameter 0, breaks from 171`
	f := 1.0
	for ; n > 1; n-- {
		f *= float64(n)
	}
	return f
}

func omega(n, q int) float64 {
	return fact(q+n-1) / (fact(q) * fact(n-1)) // want `binomial coefficient as a ratio of factorials in float64: the numerator \(q \+ n - 1\)!`
}

// Pair is two Einstein solids in thermal contact sharing Q quanta.
type Pair struct {
	NA, NB int
	Q      int
}

// Prob returns the probability that solid A holds qa of the quanta.
func (p Pair) Prob(qa int) float64 { // want Prob:`wrong for some p or some qa \(Prob, microstates/solid\.go:61\)` Prob:`value Γ\(p0 \+ recv\.NA\)·Γ\(-p0 \+ recv\.NB \+ recv\.Q\)·Γ\(recv\.Q \+ 1\)·Γ\(recv\.NA \+ recv\.NB\)/\(Γ\(p0`
	return omega(p.NA, qa) * omega(p.NB, p.Q-qa) / omega(p.NA+p.NB, p.Q) // want `Prob computes Γ\(qa \+ p\.NA\)·Γ\(-qa \+ p\.NB \+ p\.Q\)·Γ\(p\.Q \+ 1\)·Γ\(p\.NA \+ p\.NB\)/\(Γ\(qa \+`
}

// MostProbable returns the macrostate qa of highest probability.
func (p Pair) MostProbable() int { // want MostProbable:`wrong for some p \(MostProbable, microstates/solid\.go:68\)`
	best, arg := -1.0, 0
	for qa := 0; qa <= p.Q; qa++ {
		if pr := p.Prob(qa); pr > best { // want `MostProbable computes Γ\(qa \+ p\.NA\)·Γ\(-qa \+ p\.NB \+ p\.Q\)·Γ\(p\.Q \+ 1\)·Γ\(p\.NA \+ p\.NB\)/\(Γ\(qa \+`
			best, arg = pr, qa
		}
	}
	return arg
}
