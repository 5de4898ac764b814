// Package analyzer defines overfact, an analyzer that finds factorial
// arithmetic that overflows its fixed-size numeric type.
//
// # Analyzer overfact
//
// overfact: report factorial arithmetic that overflows its type
//
// Go wraps integers silently and float64 goes to +Inf and then NaN, so
// code that computes factorials, binomial coefficients, Poisson terms or
// Gamma ratios in int or float64 returns garbage past a small argument
// (n! wraps int64 from n = 21 and overflows float64 from n = 171) with no
// error. overfact finds such arithmetic and states the exact first input
// at which it breaks; the numbers come from the thresholds package,
// which computes them from Stirling's series with Robbins' bound and
// resolves them exactly with math/big.
//
// It reports factorial loops (an accumulator multiplied by its loop
// variable, counting up or down, while-style, over a range, with
// conversions; double, falling and rising factorials), recursive
// factorials, products and ratios of factorial values (binomial,
// permutation, multinomial, Catalan, hypergeometric), power-over-
// factorial terms (Poisson, Erlang, Taylor), multiplicative binomial
// loops whose intermediate wraps before the division, ratios of
// math.Gamma values, math.Gamma calls past its overflow point, and
// conversions that come after the factorial has already broken.
//
// It also reports the traps of hand-written log-gamma code: math.Exp of
// log-gamma differences whose error bound passes a tolerance over the
// arguments' range (flag -lgamma-tolerance, 1e-12 relative by default),
// integers read back from such exponentials or from math.Gamma that come
// out wrong (5! as 119), and exponentials of log-gamma values that are
// +Inf where the expression they feed is finite.
//
// In log space it reports math.Exp of math.Lgamma values whose sign
// was dropped where Γ can be negative, and hand-written Stirling
// approximations standing for n! (about 1/(12n) off; n^n overflows
// before n! does).
//
// Last, it reports the callers of a function found wrong: a function
// that returns that value, or sums, multiplies, divides, subtracts or
// converts it into its result, where nothing it does keeps the
// arguments out of the callee's wrong region. The message names the
// origin; the callee's fix makes the caller right, so there is none of
// its own.
//
// A function whose result is a factorial of a parameter carries a fact,
// so its calls are known factorial values in importing packages too. A
// factorial function that bounds its own parameter is safe, and neither
// it nor its callers are reported.
//
// One finding per root cause: a factorial loop or recursion is reported
// once, in the function that defines it, unless its parameter is
// bounded there (by a guard, an annotation or, for an unexported
// function, by the arguments of every call in the package). A call of a
// factorial function is reported only where its argument is certainly
// past the threshold, or where the value feeds a product or ratio; then
// the ratio is the finding, with a related position at the definition.
//
// A finding is "possible" when nothing bounds the input and "definite"
// when every input the code allows breaks the type; the definite form
// carries the category of the pattern with the suffix ".definite".
//
// Directives, in the Go directive style:
//
//	//overfact:allow <reason>
//
// silences findings on its line (as a trailing comment), on the next line
// (on a line of its own), or in a whole function (in its doc comment);
// the reason is mandatory.
//
//	//overfact:assume n <= 20
//
// declares a bound (<, <=, >, >=, ==, or A <= n <= B) that the analyzer
// cannot see: in a function's doc comment for a parameter at entry, or
// on the line before a statement for a variable within that statement.
//
//	//overfact:approx <reason>
//
// says, placed like allow, that a Stirling approximation is meant: its
// error is not reported there.
// Malformed directives and unknown verbs are reported.
//
// A factorial of a type parameter is judged by the type in its
// constraint whose factorial breaks first, named in the message.
// Generated files are never reported in.
package analyzer
