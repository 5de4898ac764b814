package lateconversion

import "math"

// An integer binomial function's value converted to float64: the
// coefficient wraps in its own type from the function's first bad n at
// k = n/2, long before float64 (which holds C(1029, 514) ≈ 1.43e308,
// math/big) would lose it.

// brackets is C(n, k) by the recursion C(n−1, k−1)·n/k, whose product
// wraps int from n = 62 at k = n/2 (C(61, 30)·62 ≈ 1.44e19, math/big).
func brackets(n, k int) int { // want brackets:`binomial of parameter 0, breaks from 62`
	if k == 0 || k == n {
		return 1
	}
	return brackets(n-1, k-1) * n / k // want `multiplicative binomial recursion in int`
}

// RematchWeight sums C(teams−1, i)·r^i, the coefficient formed in int.
func RematchWeight(teams, rounds int, r float64) float64 { // want RematchWeight:`wrong for teams ≥ 63`
	w := 0.0
	for i := 0; i <= rounds; i++ {
		w += float64(brackets(teams-1, i)) * math.Pow(r, float64(i)) // want `brackets\(teams-1, i\) computes C\(teams - 1, i\) in int, which wraps for teams - 1 ≥ 62 at i = \(teams - 1\)/2, before the conversion to float64 \(which holds C\(n, n/2\) up to n = 1029\); teams - 1 is not bounded here`
	}
	return w
}

// TieShare is C(2m, m)/4^m, the chance of a tie in 2m fair games, with
// the coefficient from brackets: wrong from m = 31 (2m = 62).
func TieShare(m int) float64 { // want TieShare:`wrong for m ≥ 31`
	return float64(brackets(2*m, m)) / math.Pow(4, float64(m)) // want `brackets\(2\*m, m\) computes C\(2 \* m, m\) in int, which wraps for 2 \* m ≥ 62 at m = \(2 \* m\)/2`
}

// SmallLeagueWeight is RematchWeight for at most 40 teams, whose
// coefficients fit int: silent.
func SmallLeagueWeight(teams, rounds int, r float64) float64 {
	if teams < 1 || teams > 40 {
		return 0
	}
	w := 0.0
	for i := 0; i <= rounds; i++ {
		w += float64(brackets(teams-1, i)) * math.Pow(r, float64(i))
	}
	return w
}

// SmallTieShare keeps 2m at most 60, where brackets is right: silent.
func SmallTieShare(m int) float64 {
	if m < 0 || m > 30 {
		return 0
	}
	return float64(brackets(2*m, m)) / math.Pow(4, float64(m))
}

// WholeBrackets keeps the coefficient in int: no conversion, so no
// late-conversion finding.
func WholeBrackets(n int) int {
	return brackets(n, n/2)
}
