// Package lgamma computes factorials, binomial and multinomial
// coefficients, falling and rising factorials, power-over-factorial
// terms, gamma ratios, the beta function and the Poisson, binomial and
// hypergeometric probabilities without the overflow of the textbook
// formulas.
//
// It is the library that code rewritten by overfact imports: where
// overfact finds n! or a ratio of factorials that wraps int64 or
// overflows float64 for realistic inputs, its suggested fix replaces the
// arithmetic with a call of this package. The package is also usable on
// its own.
//
// Each quantity comes in up to three forms:
//
//   - a log form (LogFactorial, LogChoose, PoissonLogPMF, …) that never
//     overflows;
//   - a float64 form (Factorial, Choose, PoissonPMF, …) that returns the
//     value, +Inf only when the value itself exceeds math.MaxFloat64;
//   - exact integer forms (FactorialInt64, ChooseUint64, …) that return
//     the value and true when it fits, and false instead of a wrapped
//     result when it does not, with Must variants that panic naming the
//     function and the arguments.
//
// Invalid arguments to the float forms give NaN, following the math
// package; the exact forms report them with ok = false and the Must
// forms panic. Nothing else panics.
//
// The log and float forms evaluate Stirling's series and Loader's
// saddle-point expansion in double-double arithmetic, so they are
// accurate to about 1 ulp where the naive
// exp(lgamma(n+1) − lgamma(k+1) − lgamma(n−k+1)) loses digits to the
// rounding of the large logarithms (about 4e-6 relative error at
// n = 10⁹).
//
// To add it to a module:
//
//	go get github.com/overfact/overfact/fixes/lgamma
//
// It needs Go 1.21 or later and nothing but the standard library.
package lgamma
