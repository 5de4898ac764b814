// Package lgammaoverflow is a reliability lab's sheet: orderings of
// failures, k-out-of-n redundancy counts and wear ratios computed from
// exponentials of log-gamma values.
package lgammaoverflow

import "math"

// lgamma returns ln|Γ(x)|.
func lgamma(x float64) float64 {
	v, _ := math.Lgamma(x)
	return v
}

// FailureOrders is the share of failure orders n!/x^n of n units.
func FailureOrders(n int, x float64) float64 { // want FailureOrders:`wrong for some n`
	return math.Exp(lgamma(float64(n)+1)) / math.Pow(x, float64(n)) // want `math.Exp\(lgamma\(float64\(n\) \+ 1\)\) is \+Inf for n ≥ 171: .*; n is not bounded here`
}

// Redundancy counts the k-out-of-n subsets of working units.
func Redundancy(n, k int) float64 { // want Redundancy:`wrong for some n or some k`
	return math.Exp(lgamma(float64(n)+1)) / (math.Exp(lgamma(float64(k)+1)) * math.Exp(lgamma(float64(n-k)+1))) // want `is \+Inf for n ≥ 171`
}

// WearRatio is Γ(a)/Γ(b) for the lab's wear model.
func WearRatio(a, b float64) float64 {
	return math.Exp(lgamma(a)) / math.Exp(lgamma(b)) // want `math.Exp\(lgamma\(a\)\) is \+Inf for a ≥ 171\.[56]`
}

// BenchOrders is bounded by the 170 slots of the test bench.
func BenchOrders(n int, x float64) float64 {
	if n < 0 || n > 170 {
		return 0
	}
	return math.Exp(lgamma(float64(n)+1)) / math.Pow(x, float64(n))
}

// AllOrders returns n! as a float; past 170 units its +Inf is the
// honest float answer.
func AllOrders(n int) float64 {
	return math.Exp(lgamma(float64(n) + 1))
}

// OverBudget reports whether the orderings of n units pass a budget.
func OverBudget(n int, budget float64) bool {
	orders := math.Exp(lgamma(float64(n) + 1))
	return orders > budget
}
