// Package thresholds computes, for every fixed-size Go numeric type, the
// first argument at which a factorial-shaped expression stops fitting the
// type. It is the only place in overfact where such thresholds are
// computed; the analyzer and the command ask this package and never type a
// number into a message.
//
// # Method
//
// For n! the threshold is found by inverting Stirling's series against
// ln(max) of the type and bracketing with Robbins' two-sided bound
// (H. Robbins, "A remark on Stirling's formula", Amer. Math. Monthly 62
// (1955) 26-29):
//
//	√(2π) n^(n+½) e^(−n) e^(1/(12n+1)) < n! < √(2π) n^(n+½) e^(−n) e^(1/(12n))
//
// The logarithm of each side is a float64 expression. A search on the
// logarithm of the lower bound finds an n that surely does not fit, a
// search on the upper bound finds an n that surely fits, and the few n in
// between, where the two bounds straddle ln(max), are resolved exactly
// with math/big (big.Int.MulRange compared with the type's maximum). The
// answer therefore never rests on floating-point rounding: every reported
// FirstBad has been checked exactly on both sides.
//
// The other shapes (double factorials, central binomials, Catalan numbers,
// the multiplicative binomial loop, falling and rising factorials, powers)
// follow the same plan: closed logarithmic bounds to bracket, math/big to
// resolve. Γ(x) is located by bisection over the floats of the type,
// starting from the bracket [F, F+1] given by the factorial threshold F,
// since Γ(n+1) = n!.
//
// Every result is computed once per type (and per argument, for the
// parameterized shapes) and cached, so repeated calls from the analyzer
// cost a map lookup.
//
// A value "fits" a type when its magnitude is at most Num.MaxInt: the
// largest value of an integer type, or the largest finite value of a
// floating-point type.
package thresholds
