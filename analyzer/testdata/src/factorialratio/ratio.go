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
