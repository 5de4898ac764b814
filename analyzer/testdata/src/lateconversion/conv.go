// Package lateconversion holds the late-conversion category's cases: a
// factorial converted to another type after it broke in its own. n!
// wraps int64 from 21 on; float64 holds it up to 170 (OEIS A000142, from
// memory).
package lateconversion

func count(n int64) int64 { // want count:`factorial of parameter 0`
	if n > 40 {
		return 0
	}
	r := int64(1)
	for i := int64(2); i <= n; i++ { // want `factorial of n in int64 wraps for n ≥ 21`
		r *= i
	}
	return r
}

// Odds converts too late: the int64 count has wrapped from 21 on.
func Odds(n int64) float64 { // want Odds:`value Γ\(p0 \+ 1\), wrong once p0 ≥ 21` Odds:`wrong for n ≥ 21`
	return float64(count(n)) // want `n! is computed in int64, which wraps for n ≥ 21, before the conversion to float64`
}

// Small converts what fits: silent.
func Small(n int64) float64 {
	if n > 20 {
		return 0
	}
	return float64(count(n))
}
