package analyzer

import (
	"fmt"
	"math"
)

// FactorialFact marks a function whose result is a factorial-shaped
// value of its parameters, so that calls of it are known factorial values
// in every package that imports it, also when each package is analysed
// on its own (go vet -vettool). Its fields are of basic types only, as
// the fact encoding requires.
type FactorialFact struct {
	// Kind is "factorial", "double-factorial", "falling-factorial",
	// "rising-factorial" or "binomial".
	Kind string
	// Param is the index of the parameter n; the function returns
	// (n+Offset)! (or n!! and so on). Param2 is the index of k for
	// falling factorials n!/(n-k)! and binomials C(n, k), of x for rising
	// factorials x(x+1)…(x+n−1), and −1 otherwise.
	Param  int
	Param2 int
	Offset int64
	// Safe says that the function bounds its own parameter, by a guard
	// or an annotation, so that its result always fits: Lo and Hi are
	// the proven range of the parameter where the product is formed.
	Safe   bool
	Lo, Hi int64
	// FirstBad is the first n at which the result stops fitting the
	// result type; for a binomial function, the first n of C(n, n/2).
	FirstBad int64
	// EmptyBelow says that the function returns 1, the empty product,
	// for every negative n, and reaches its product by no other path: a
	// loop that runs no trip there, a recursion that stops there. Only a
	// factorial of Offset 0 carries it. Outside the helpers' domain (C(n,
	// k) with k > n) its callers' quotients are then numbers the fixer
	// can compute exactly (fixes.Match.EmptyBelow).
	EmptyBelow bool
	// Floor says that the function returns ⌊n⌋! for every n, fractions
	// included, and 1 below 2: EmptyBelow, with a loop that counts up by
	// one from the constant 1 or 2 while the counter is at most n itself
	// (for i := 2.0; i <= n; i++). A quotient of such functions in
	// float64 is then a number the fixer can compute in log space
	// wherever the code's factorials overflow (fixes.Match.Floor).
	Floor bool
	// Form, for a binomial of a signed integer type, says what the
	// function computes outside 0 ≤ k ≤ n too, with integers that do
	// not wrap: "loop" for a multiplicative loop from 1 over k trips
	// (the generalised C(n, k) for k ≥ 0, 1 for k < 0), "factorials"
	// for n!/(k!(n−k)!) over factorial functions with EmptyBelow,
	// "zero" for a function that first returns 0 wherever k < 0 or
	// k > n; "" where it is not known. A caller's float expression kept
	// as written outside a helper's domain, and a caller's float64(…) of
	// the call (late-conversion), take the call's value from the float
	// helper of that form (fixes.Match.IntBinomials) rather than calling
	// the function, whose own fix panics where C(n, k) leaves its type.
	Form string
}

// AFact marks FactorialFact as an analysis fact.
func (*FactorialFact) AFact() {}

func (f *FactorialFact) String() string {
	if f.Safe {
		return fmt.Sprintf("%s of parameter %d, safe for [%s, %s]", f.Kind, f.Param, bound(f.Lo), bound(f.Hi))
	}
	return fmt.Sprintf("%s of parameter %d, breaks from %d", f.Kind, f.Param, f.FirstBad)
}

// bound renders an end of a range, with the unbounded ends as -inf, +inf.
func bound(v int64) string {
	switch v {
	case math.MinInt64:
		return "-inf"
	case math.MaxInt64:
		return "+inf"
	}
	return fmt.Sprint(v)
}
