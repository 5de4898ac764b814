// Package bottling plans acceptance sampling on a bottling line: from a
// lot of N bottles, n are drawn and the lot is accepted when at most c of
// them are defective.
package bottling

import (
	"math"

	"mathkit"
)

// Ways returns C(n, k), the number of samples of k bottles from n.
func Ways(n, k int) int64 { // want Ways:`binomial of parameter 0, breaks from 21` Ways:`wrong for n ≥ 21`
	return mathkit.Factorial(n) / (mathkit.Factorial(k) * mathkit.Factorial(n-k)) // want `binomial coefficient as a ratio of factorials in int64: the numerator n! wraps for n ≥ 21, although C\(n, n/2\) itself fits up to n = 66; n is not bounded here`
}

// WaysStepwise is Ways written through local variables.
func WaysStepwise(n, k int) int64 { // want WaysStepwise:`binomial of parameter 0` WaysStepwise:`wrong for some n or some k`
	num := mathkit.Factorial(n)
	den := mathkit.Factorial(k) * mathkit.Factorial(n-k)
	return num / den // want `binomial coefficient as a ratio of factorials in int64: the numerator n! wraps for n ≥ 21`
}

// DrawProbability is the hypergeometric probability of d defectives in
// a sample of n from a lot of N bottles holding D defectives.
func DrawProbability(d, N, D, n int) float64 { // want DrawProbability:`wrong for N ≥ 21`
	return float64(Ways(D, d)*Ways(N-D, n-d)) / float64(Ways(N, n)) // want `hypergeometric probability from three binomial coefficients in int64: Ways\(N, …\) breaks for N ≥ 21 before the division; N is not bounded here`
}

// SmallLot is the number of samples of 5 from a crate of 12: constant
// arguments, far below the threshold.
func SmallLot() int64 {
	return mathkit.Factorial(12) / (mathkit.Factorial(5) * mathkit.Factorial(7))
}

// GuardedWays refuses lots the int64 factorials cannot hold, but not
// samples larger than the lot: k! wraps for k ≥ 21 (to 0 from 66!, a
// division by zero), where C(n, k) is 0.
func GuardedWays(n, k int) int64 { // want GuardedWays:`binomial of parameter 0, safe for \[-inf, 20\]` GuardedWays:`wrong for k ≥ 21`
	if n > 20 {
		return -1
	}
	return mathkit.Factorial(n) / (mathkit.Factorial(k) * mathkit.Factorial(n-k)) // want `binomial coefficient as a ratio of factorials in int64: the divisor k! wraps for k ≥ 21, where the numerator n! still fits; k is not bounded here`
}

// SafeWays uses the guarded factorial, whose values are always right.
func SafeWays(n, k int) int64 { // want SafeWays:`binomial of parameter 0, safe for`
	return mathkit.SmallFactorial(n) / (mathkit.SmallFactorial(k) * mathkit.SmallFactorial(n-k))
}

// Orderings counts the orders in which a sample of n bottles can be
// inspected, n!/(n-k)! for the first k.
func Orderings(n, k int) int64 { // want Orderings:`value Γ\(p0 \+ 1\)/Γ\(p0 - p1 \+ 1\), wrong once p0 ≥ 21` Orderings:`wrong for n ≥ 21`
	return mathkit.Factorial(n) / mathkit.Factorial(n-k) // want `permutation count n!/\(n - k\)! as a ratio of factorials in int64: the numerator n! wraps for n ≥ 21`
}

// CrateSplits counts the ways to split a crate into three sample
// groups of sizes a, b and c.
func CrateSplits(a, b, c int) int64 { // want CrateSplits:`value Γ\(p0 \+ p1 \+ p2 \+ 1\)/\(Γ\(p0 \+ 1\)·Γ\(p1 \+ 1\)·Γ\(p2 \+ 1\)\), wrong once p0 \+ p1 \+ p2 ≥ 21` CrateSplits:`wrong for a ≥ 21 or b ≥ 21 or c ≥ 21`
	return mathkit.Factorial(a+b+c) / (mathkit.Factorial(a) * mathkit.Factorial(b) * mathkit.Factorial(c)) // want `multinomial coefficient as a ratio of factorials in int64: the numerator \(a \+ b \+ c\)! wraps for a \+ b \+ c ≥ 21`
}

// ShiftFactorial is n! for a whole shift of n bottles, which is always
// more than 21 on this line.
func ShiftFactorial() int64 {
	return mathkit.Factorial(24) // want `Factorial\(24\): factorial of 24 in int64 wraps \(20! ≈ 2.43e18 is the largest that fits\)$`
}

// FloatWays converts too late: the int64 factorial has already wrapped.
func FloatWays(n int) float64 { // want FloatWays:`value Γ\(p0 \+ 1\), wrong once p0 ≥ 21` FloatWays:`wrong for n ≥ 21`
	return float64(mathkit.Factorial(n)) // want `n! is computed in int64, which wraps for n ≥ 21, before the conversion to float64 \(which holds it up to n = 170\)`
}

// TruncatedCount converts a float factorial back to an integer.
func TruncatedCount(n int) int64 { // want TruncatedCount:`value Γ\(p0 \+ 1\), wrong once p0 ≥ 171` TruncatedCount:`wrong for n ≥ 171`
	return int64(mathkit.FactorialFloat(n)) // want `int64\(mathkit.FactorialFloat\(n\)\) of a float64 factorial: n! is no longer exact in float64 for n ≥ 23 and exceeds int64 for n ≥ 21`
}

// AcceptProb is the probability of at most c defectives when each of n
// bottles is defective with probability p; the binomial pmf terms go
// through lgamma already and are not factorial arithmetic.
func AcceptProb(n, c int, p float64) float64 {
	sum := 0.0
	for i := 0; i <= c; i++ {
		ln, _ := math.Lgamma(float64(n + 1))
		li, _ := math.Lgamma(float64(i + 1))
		lr, _ := math.Lgamma(float64(n - i + 1))
		sum += math.Exp(ln - li - lr + float64(i)*math.Log(p) + float64(n-i)*math.Log1p(-p))
	}
	return sum
}

// PalletOrders is 200! in float64, always +Inf: returned as it is, the
// IEEE value of a count beyond float64, not a wrong one: not reported.
func PalletOrders() float64 {
	return mathkit.FactorialFloat(200)
}

// CrateOrders is the factorial of a 10-bottle crate.
func CrateOrders() int64 {
	return mathkit.Factorial(10)
}

// LineOrders is the factorial of the bottles on a line segment, which
// can be long enough to wrap but is not known to be.
func LineOrders(n int) int64 { // want LineOrders:`wrong for some n`
	if n > 30 {
		n = 30
	}
	return mathkit.Factorial(n) // want `Factorial\(n\): factorial of n in int64 wraps for n ≥ 21 .*; n may reach 30 here, after LineOrders reassigns it`
}

// FloatWays32 converts the wrapped int64 factorial to float32.
func FloatWays32(n int) float32 { // want FloatWays32:`value Γ\(p0 \+ 1\), wrong once p0 ≥ 21` FloatWays32:`wrong for n ≥ 21`
	return float32(mathkit.Factorial(n)) // want `n! is computed in int64, which wraps for n ≥ 21, before the conversion to float32 \(which holds it up to n = 34\)`
}

// SafeFloat converts a factorial that is always right.
func SafeFloat(n int) float64 {
	return float64(mathkit.SmallFactorial(n))
}

// CrateFloat converts the factorial of a constant crate size.
func CrateFloat() float64 {
	return float64(mathkit.Factorial(12))
}

// CrateCount converts a float factorial of 15 back: exact and in range.
func CrateCount() int64 {
	return int64(mathkit.FactorialFloat(15))
}

// BatchWays is C(n, 3) for a batch whose size the line controller caps
// at 20, a bound declared for the one statement that needs it.
func BatchWays(batch []int) int64 {
	n := len(batch)
	//overfact:assume n <= 20
	return mathkit.Factorial(n) / (mathkit.Factorial(3) * mathkit.Factorial(n-3))
}

// BatchWaysUnchecked is BatchWays without the declared bound.
func BatchWaysUnchecked(batch []int) int64 {
	n := len(batch)
	return mathkit.Factorial(n) / (mathkit.Factorial(3) * mathkit.Factorial(n-3)) // want `binomial coefficient as a ratio of factorials in int64: the numerator n! wraps for n ≥ 21`
}

// WaysByParts divides the numerator down step by step; the numerator
// has wrapped before the first division.
func WaysByParts(n, k int) int64 { // want WaysByParts:`wrong for some n or some k`
	r := mathkit.Factorial(n)
	r /= mathkit.Factorial(k)
	r /= mathkit.Factorial(n - k) // want `binomial coefficient as a ratio of factorials in int64: the numerator n! wraps for n ≥ 21`
	return r
}

// CrateByParts is WaysByParts for a crate of 12.
func CrateByParts(k int) int64 {
	if k < 0 || k > 12 {
		return 0
	}
	r := mathkit.Factorial(12)
	r /= mathkit.Factorial(k)
	r /= mathkit.Factorial(12 - k)
	return r
}
