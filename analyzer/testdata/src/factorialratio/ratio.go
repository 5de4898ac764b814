// Package factorialratio holds the factorial-ratio category's cases:
// binomials and permutations computed as ratios of factorials whose
// numerator overflows first. 170! is the largest factorial in float64
// (OEIS A000142, from memory).
package factorialratio

func factF(n int) float64 { // want factF:`factorial of parameter 0`
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

// Rotas is C(n, k) as n!/(k!(n-k)!).
func Rotas(n, k int) float64 { // want Rotas:`binomial of parameter 0`
	return factF(n) / (factF(k) * factF(n-k)) // want `binomial coefficient as a ratio of factorials in float64: the numerator n! overflows to \+Inf for n ≥ 171`
}

// Orders is n!/(n-k)!.
func Orders(n, k int) float64 { // want Orders:`value Γ\(p0 \+ 1\)/Γ\(p0 - p1 \+ 1\), wrong once p0 ≥ 171 or p0 - p1 ≥ 171` Orders:`wrong for n ≥ 171`
	return factF(n) / factF(n-k) // want `permutation count n!/\(n - k\)! as a ratio of factorials in float64`
}

// Small keeps n below 171: silent.
func Small(n, k int) float64 { // want Small:`binomial of parameter 0, safe for \[-inf, 170\]`
	if n > 170 {
		return 0
	}
	return factF(n) / (factF(k) * factF(n-k))
}

// Rising is k!/(k+j)!, one over a rising factorial: the divisor passes
// 170! first, where the quotient 1/((k+1)⋯(k+j)) may still be a normal
// float64.
func Rising(k, j int) float64 { // want Rising:`value Γ\(p0 \+ 1\)/Γ\(p0 \+ p1 \+ 1\), wrong once p0 ≥ 171 or p0 \+ p1 ≥ 171` Rising:`wrong for k ≥ 171`
	return factF(k) / factF(k+j) // want `ratio of factorials in float64: the divisor \(k \+ j\)! overflows to \+Inf for k \+ j ≥ 171, no later than the numerator's k!`
}

// Next is n!/(n+1)! = 1/(n+1), 0 from n = 170.
func Next(n int) float64 { // want Next:`value Γ\(p0 \+ 1\)/Γ\(p0 \+ 2\), wrong once p0 ≥ 171 or p0 \+ 1 ≥ 171` Next:`wrong for n ≥ 170`
	return factF(n) / factF(n+1) // want `the divisor \(n \+ 1\)! overflows to \+Inf for n \+ 1 ≥ 171`
}

// Apart is k!/(n-k)!: neither argument exceeds the other as written, so
// the numerator's finding stands.
func Apart(n, k int) float64 { // want Apart:`value Γ\(p1 \+ 1\)/Γ\(p0 - p1 \+ 1\)` Apart:`wrong for k ≥ 171`
	return factF(k) / factF(n-k) // want `the numerator k! overflows to \+Inf for k ≥ 171`
}
