package factorialratio

import "math"

// A quotient by a binomial coefficient that a float helper forms from
// factorials: the helper's n! is +Inf from n = 171 (170! ≈ 7.26e306 is
// the largest that fits float64, math/big), so the divisor is +Inf or
// NaN there for every k, long before C(n, n/2) itself leaves float64 at
// n = 1030.

func loopFact(n int) float64 { // want loopFact:`factorial of parameter 0, breaks from 171`
	f := 1.0
	for i := 2; i <= n; i++ {
		f *= float64(i)
	}
	return f
}

func pick(n, k int) float64 { // want pick:`binomial of parameter 0, breaks from 171`
	if k < 0 || k > n {
		return 0
	}
	return loopFact(n) / (loopFact(k) * loopFact(n-k)) // want `binomial coefficient as a ratio of factorials in float64`
}

// ExpectedGroups is the expected number of groups, of sizes ts, that a
// draw of d tags from all n of them reaches: Σ 1 − C(n−t, d)/C(n, d)
// (rarefaction).
func ExpectedGroups(ts []int, n, d int) float64 { // want ExpectedGroups:`wrong for`
	all := pick(n, d)
	e := 0.0
	for _, t := range ts {
		e += 1 - pick(n-t, d)/all // want `divides by C\(n, d\) formed on its own in float64: pick\(n, d\) is \+Inf or NaN for n ≥ 171, long before C\(n, d\) leaves float64, after which the quotient is 0 or NaN although the ratio is finite; n is not bounded here`
	}
	return e
}

// SmallExpectedGroups refuses more than 170 tags, where every factorial
// fits: silent.
func SmallExpectedGroups(ts []int, n, d int) float64 {
	if n < 0 || n > 170 {
		return -1
	}
	all := pick(n, d)
	e := 0.0
	for _, t := range ts {
		e += 1 - pick(n-t, d)/all
	}
	return e
}

// gammaPick forms C(n, k) from math.Gamma values, +Inf from
// Γ(n+1) at n = 171 (Γ overflows float64 from 171.624…, DLMF 5.4.1 with
// 170!).
func gammaPick(n, k int) float64 {
	return math.Gamma(float64(n+1)) / (math.Gamma(float64(k+1)) * math.Gamma(float64(n-k+1))) // want `ratio of math\.Gamma values in float64`
}

// ExpectedGroupsGamma is ExpectedGroups over gammaPick.
func ExpectedGroupsGamma(ts []int, n, d int) float64 { // want ExpectedGroupsGamma:`wrong for`
	e := 0.0
	for _, t := range ts {
		e += 1 - gammaPick(n-t, d)/gammaPick(n, d) // want `divides by C\(n, d\) formed on its own in float64: gammaPick\(n, d\) is \+Inf or NaN for n ≥ 171 \(its math\.Gamma\(float64\(n \+ 1\)\) breaks first\)`
	}
	return e
}
