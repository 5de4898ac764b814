package annuity

import "math"

// ErlangSurvival is the probability that a life whose remaining
// lifetime is Erlang with k stages of rate mu survives past t:
// the sum of e^-x x^i / i! for i < k at x = mu*t.
func ErlangSurvival(k int, mu, t float64) float64 { // want ErlangSurvival:`wrong for some k \(ErlangSurvival, annuity/erlang\.go:12\)`
	x := mu * t
	term := math.Exp(-x)
	s := term
	for i := 1; i < k; i++ { // want `running product term computes the Poisson terms x\^k·e\^\(−x\)/k! from math\.Exp\(-x\) with x = \(mu\)·\(t\), which in float64 loses its digits for x > 708\.396`
		term *= x / float64(i)
		s += term
	}
	return s
}

// ErlangSurvivalLog is ErlangSurvival with each term taken from its
// logarithm.
func ErlangSurvivalLog(k int, mu, t float64) float64 {
	x := mu * t
	if x == 0 {
		return 1
	}
	lx := math.Log(x)
	s := 0.0
	for i := 0; i < k; i++ {
		lf, _ := math.Lgamma(float64(i) + 1)
		s += math.Exp(float64(i)*lx - x - lf)
	}
	return s
}

// GompertzSurvival is the survival of the Gompertz law of mortality
// with initial force b and ageing rate c over t years.
func GompertzSurvival(b, c, t float64) float64 {
	return math.Exp(-b / c * (math.Exp(c*t) - 1))
}

// JointLifeCount is the number of ordered ways to assign n annuitants
// to n distinct payment slots.
func JointLifeCount(n int) int64 { // want JointLifeCount:`wrong for some n \(JointLifeCount, annuity/erlang\.go:45\)` JointLifeCount:`factorial of parameter 0, breaks from 21`
	var p int64 = 1
	for i := int64(2); i <= int64(n); i++ { // want `factorial of int64\(n\) in int64 wraps for int64\(n\) ≥ 21`
		p *= i
	}
	return p
}

// ReversionaryPairs is the number of unordered (first death, second
// death) pairs among n lives, n!/(2!(n-2)!).
func ReversionaryPairs(n int) int64 { // want ReversionaryPairs:`value 1/2·Γ\(p0 \+ 1\)/Γ\(p0 - 1\), wrong once p0 ≥ 21 or p0 - 2 ≥ 21` ReversionaryPairs:`wrong for n ≥ 21 \(ReversionaryPairs, annuity/erlang\.go:57\)`
	if n < 2 {
		return 0
	}
	return JointLifeCount(n) / (2 * JointLifeCount(n-2)) // want `ratio of factorials in int64: the numerator n! wraps for n ≥ 21 before the division`
}

// MakehamPMF is the chance of exactly k accidental deaths in a group
// whose accident force is a, over t years, with the Poisson term
// evaluated as a ratio of a power and a Gamma value.
func MakehamPMF(k int, a, t float64) float64 {
	m := a * t
	return math.Pow(m, float64(k)) / math.Gamma(float64(k)+1) * math.Exp(-m) // want `math\.Gamma overflows: math\.Gamma\(float64\(k\) \+ 1\) is \+Inf for k ≥ 171`
}

// SelectPeriodWeights returns the weights (n choose j)/2^n that blend
// a select table into an ultimate one over n years.
func SelectPeriodWeights(n int) []float64 {
	w := make([]float64, n+1)
	row := []float64{1}
	for i := 0; i < n; i++ {
		next := make([]float64, len(row)+1)
		for j, v := range row {
			next[j] += v / 2
			next[j+1] += v / 2
		}
		row = next
	}
	copy(w, row)
	return w
}
