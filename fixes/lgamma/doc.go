// Package lgamma computes factorials, binomial and multinomial
// coefficients, falling and rising factorials, power-over-factorial
// terms, gamma ratios, the beta function and the Poisson, binomial,
// negative binomial and hypergeometric probabilities without the
// overflow of the textbook formulas.
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
// The log and float forms evaluate Stirling's series, Loader's
// saddle-point expansion and Taylor expansions of ln Γ in double-double
// arithmetic, so every one is within 1 ulp of the true value over its
// whole domain (int64 arguments up to MaxInt64 included), and in all but
// rare cases correctly rounded: an mpmath sweep of random and
// adversarial inputs (scripts/lgamma-mpmath.sh, figures in
// docs/numerics.md) measured at most 0.54 ulp. The naive
// exp(lgamma(n+1) − lgamma(k+1) − lgamma(n−k+1)) loses digits to the
// rounding of the large logarithms (about 4e-6 relative error at
// n = 10⁹). Where a result is a cancellation to nearly zero (ln B(a,b)
// on B = 1, ln Γ(a)/Γ(b) on Γ(a) = Γ(b), a rising factorial next to
// ±1) the package finishes in math/big.
//
// C(n,k) for n < 0 is the generalised binomial coefficient
// n(n−1)…(n−k+1)/k! = (−1)ᵏ·C(k−n−1, k), the coefficient of xᵏ in
// (1+x)ⁿ, in every Choose form.
//
// To add it to a module:
//
//	go get github.com/overfact/overfact/fixes/lgamma
//
// It needs Go 1.21 or later and nothing but the standard library.
package lgamma
