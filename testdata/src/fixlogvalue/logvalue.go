// Package fixlogvalue scores a seed bank's germination counts by their
// log-likelihood: the logarithm of how many ways the counts can come
// about, taken from float64 factorial and binomial helpers.
package fixlogvalue

import "math"

// arrangements is n!, one factor at a time in float64.
func arrangements(n int) float64 { // want arrangements:`factorial of parameter 0, breaks from 171`
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

// picks is C(n, k), multiplied up so that each step stays an integer.
func picks(n, k int) float64 { // want picks:`binomial of parameter 0`
	w := 1.0
	for i := 1; i <= k; i++ {
		w *= float64(n-k+i) / float64(i)
	}
	return w
}

// OrderNats is ln n!, the information in the order of n seeds.
func OrderNats(n int) float64 { // want OrderNats:`wrong for n ≥ 171`
	return math.Log(arrangements(n)) // want `math\.Log of arrangements\(n\), whose value is n!: the factorial of n in float64 overflows to \+Inf for n ≥ 171 \(170! ≈ 7\.26e306 is the largest that fits\), so the logarithm is \+Inf where ln n! is finite; n is not bounded here`
}

// SproutNats is ln C(n, k), the information in which k of n sprouted.
func SproutNats(n, k int) float64 { // want SproutNats:`value ln Γ\(p0 \+ 1\)/\(Γ\(p1 \+ 1\)·Γ\(p0 - p1 \+ 1\)\)`
	return math.Log(picks(n, k)) // want `math\.Log of picks\(n, k\), whose value is C\(n, k\): it overflows to \+Inf for n ≥ 1030 at k = n/2`
}

// SproutBits is the same in bits, the count converted first.
func SproutBits(n, k int) float64 { // want SproutBits:`wrong for n ≥ 1030`
	return math.Log2(float64(picks(n, k))) // want `math\.Log2 of picks\(n, k\), whose value is C\(n, k\)`
}

// TrayNats is bounded: a tray holds at most 96 seeds.
func TrayNats(n int) float64 {
	if n < 0 || n > 96 {
		return 0
	}
	return math.Log(arrangements(n))
}

// Orderings returns the count itself: +Inf past 170! is the IEEE value
// of a number that large.
func Orderings(n int) float64 { // want Orderings:`factorial of parameter 0, breaks from 171`
	return arrangements(n)
}
