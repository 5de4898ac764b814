// Package dicepool computes the odds of a tabletop dice pool: how many
// ways k of n dice show a success, and the chance of exactly k.
package dicepool

import "math"

// Ways counts the ways k of n dice succeed, stepping the top factor
// down.
func Ways(n, k int) float64 { // want Ways:`binomial of parameter 0, breaks from 1021`
	r := 1.0
	m := float64(n)
	for d := 1; d <= k; d++ { // want `multiplicative binomial loop computes C\(n, k\) in float64: the product r\*\(m\) overflows to \+Inf before the division for n ≥ 1021 at k = n/2, although C\(n, n/2\) itself fits up to n = 1029; n is not bounded here`
		r *= m
		r /= float64(d)
		m--
	}
	return r
}

// WaysUp is Ways with the factors counted up.
func WaysUp(n, k int) float64 { // want WaysUp:`binomial of parameter 0, breaks from 1021`
	r := 1.0
	for d := 1; d <= k; d++ { // want `multiplicative binomial loop computes C\(n, k\) in float64: the product r\*\(float64\(n - k \+ d\)\)`
		r = r * float64(n-k+d) / float64(d)
	}
	return r
}

// Pool is a dice pool: N dice, K of them must succeed.
type Pool struct {
	N, K int64
}

// Combos counts the winning faces of the pool in integers.
func (p Pool) Combos() int64 { // want Combos:`wrong for some p`
	r := int64(1)
	for i := int64(1); i <= p.K; i++ { // want `multiplicative binomial loop computes C\(p.N, p.K\) in int64: the product r\*\(p.N - p.K \+ i\) wraps before the division for p.N ≥ 62 at p.K = p.N/2, although C\(p.N, p.N/2\) itself fits up to p.N = 66; p.N is not bounded here`
		r = r * (p.N - p.K + i) / i
	}
	return r
}

// Split divides at every step, so each intermediate is C(n, c); but
// for k > n/2 they pass C(n, n/2), which is +Inf from n = 1030 on,
// and stay +Inf where C(n, k) fits again.
func Split(n, k int) float64 { // want Split:`binomial of parameter 0, breaks from 1030`
	v := 1.0
	for c := 1; c <= k; c++ { // want `multiplicative binomial loop computes C\(n, k\) in float64 one ratio at a time: the running v is C\(n, c\) after each step and passes C\(n, ⌊n/2⌋\) when k > n/2`
		v *= float64(n+1-c) / float64(c)
	}
	return v
}

// TableCombos serves tables of at most 60 dice.
func (p Pool) TableCombos() int64 {
	if p.N > 60 || p.K < 0 || p.K > p.N {
		return 0
	}
	r := int64(1)
	for i := int64(1); i <= p.K; i++ {
		r = r * (p.N - p.K + i) / i
	}
	return r
}

// BucketWays serves buckets of at most 1000 dice.
func BucketWays(n, k int) float64 { // want BucketWays:`binomial of parameter 0, safe for \[0, 1000\]`
	if n < 0 || n > 1000 || k < 0 {
		return 0
	}
	r := 1.0
	m := float64(n)
	for d := 1; d <= k; d++ {
		r *= m
		r /= float64(d)
		m--
	}
	return r
}

// Exactly is the chance that exactly k of n dice succeed, each with
// probability p.
func Exactly(n, k int, p float64) float64 { // want Exactly:`wrong for some n or some k`
	c := 1.0
	for j := 1; j <= k; j++ {
		c *= float64(n+1-j) / float64(j)
	}
	return c * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k)) // want `computes the binomial probability C\(n, k\)·p\^k·\(1−p\)\^\(n - k\) in float64 with C\(n, k\) formed on its own: it overflows to \+Inf for n ≥ 1030 at k = n/2 \(C\(1029, 514\) ≈ 1.43e308 is the largest central one that fits\).*; n is not bounded here`
}

// ExactlyLog forms the coefficient from log-gamma, then leaves log
// space.
func ExactlyLog(n, k, p float64) float64 {
	a, _ := math.Lgamma(n + 1)
	b, _ := math.Lgamma(k + 1)
	c, _ := math.Lgamma(n - k + 1)
	coef := math.Exp(a - b - c) // want `math.Exp of log-gamma values computes C\(n, k\) from 3 log-gamma values .* from n = 200 with k between 1 and n`
	return coef * math.Pow(p, k) * math.Pow(1-p, n-k) // want `binomial probability .* overflows to \+Inf for n ≥ 1029`
}

// ExactlyInline writes the same in one expression.
func ExactlyInline(n, k, p float64) float64 {
	a, _ := math.Lgamma(n + 1)
	b, _ := math.Lgamma(k + 1)
	c, _ := math.Lgamma(n - k + 1)
	return math.Exp(a-b-c) * math.Pow(p, k) * math.Pow(1-p, n-k) // want `binomial probability .* overflows to \+Inf for n ≥ 1029` `computes C\(n, k\)·p\^k·\(1−p\)\^\(n - k\) from 3 log-gamma values`
}

// ExactlyStable stays in log space to the end.
func ExactlyStable(n, k, p float64) float64 {
	a, _ := math.Lgamma(n + 1)
	b, _ := math.Lgamma(k + 1)
	c, _ := math.Lgamma(n - k + 1)
	return math.Exp(a - b - c + k*math.Log(p) + (n-k)*math.Log(1-p)) // want `computes C\(n, k\)·p\^k·\(1−p\)\^\(n - k\) from 3 log-gamma values .* from n = 200`
}

// ExactlyTable serves tables of at most 1000 dice.
func ExactlyTable(n, k int, p float64) float64 {
	if n > 1000 {
		return 0
	}
	c := 1.0
	for j := 1; j <= k; j++ {
		c *= float64(n+1-j) / float64(j)
	}
	return c * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k))
}

// ExactlyHandful serves a handful of dice, counted in a byte.
func ExactlyHandful(n, k uint8, p float64) float64 {
	c := 1.0
	for j := uint8(1); j <= k; j++ {
		c *= float64(n+1-j) / float64(j)
	}
	return c * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k))
}

// Hands counts the hands of k dice out of n, numerator and divisor in
// two loops counted in float64.
func Hands(n, k float64) float64 {
	num := 1.0
	for i := 0.0; i < k; i++ {
		num *= n - i
	}
	den := 1.0
	for i := 2.0; i <= k; i++ {
		den *= i
	}
	return num / den // want `computes C\(n, k\) as n!/\(n - k\)! divided by k! in float64: the numerator overflows to \+Inf for n ≥ 171 at k = n and for n ≥ 270 at k = n/2, although C\(n, n/2\) itself fits up to n = 1029; n is not bounded here`
}

// HandsOneLoop keeps n!, k! and (n−k)! in one loop.
func HandsOneLoop(n, k float64) float64 {
	num, den := 1.0, 1.0
	for i := 1.0; i <= n; i++ {
		num *= i
		if i <= k {
			den *= i
		}
		if i <= n-k {
			den *= i
		}
	}
	return num / den // want `computes C\(n, k\) as n! divided by its divisor in float64: the numerator overflows to \+Inf for n ≥ 171, although C\(n, n/2\) itself fits up to n = 1029; n is not bounded here`
}

// SmallHands serves cups of at most 170 dice: numerator and divisor
// fit float64 for every k there.
func SmallHands(n, k float64) float64 {
	if n > 170 || k < 0 || k > n {
		return 0
	}
	num := 1.0
	for i := 0.0; i < k; i++ {
		num *= n - i
	}
	den := 1.0
	for i := 2.0; i <= k; i++ {
		den *= i
	}
	return num / den
}

// MidHands serves cups of at most 200 dice: C(200, k) fits float64, but
// from k = 171 both loops overflow and the ratio is NaN.
func MidHands(n, k float64) float64 {
	if n > 200 || k < 0 || k > n {
		return 0
	}
	num := 1.0
	for i := 0.0; i < k; i++ {
		num *= n - i
	}
	den := 1.0
	for i := 2.0; i <= k; i++ {
		den *= i
	}
	return num / den // want `computes C\(n, k\) as n!/\(n - k\)! divided by k! .*; n may reach 200 here`
}

// Chance is the chance that exactly k of n dice succeed, over Ways.
func Chance(n, k int, p float64) float64 { // want Chance:`wrong for n ≥ 1021`
	return Ways(n, k) * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k)) // want `binomial probability C\(n, k\)·p\^k·\(1−p\)\^\(n−k\) in float64: Ways\(n, …\) breaks for n ≥ 1021 although the probability itself is at most 1; n is not bounded here`
}

// ChanceSplit is Chance over Split, which divides at every step.
func ChanceSplit(n, k int, p float64) float64 { // want ChanceSplit:`wrong for n ≥ 1030`
	return Split(n, k) * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k)) // want `binomial probability .* in float64: Split\(n, …\) breaks for n ≥ 1030`
}

// ChanceBucket is Chance over BucketWays, bounded to 1000 dice.
func ChanceBucket(n, k int, p float64) float64 {
	return BucketWays(n, k) * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k))
}

// ExactlyStepped forms the coefficient by multiplying first: the loop
// is the one finding, from n = 1021, before C(n, k) itself breaks.
func ExactlyStepped(n, k int, p float64) float64 { // want ExactlyStepped:`wrong for some n or some k`
	c := 1.0
	m := float64(n)
	for d := 1; d <= k; d++ { // want `multiplicative binomial loop computes C\(n, k\) in float64: the product c\*\(m\)`
		c *= m
		c /= float64(d)
		m--
	}
	return c * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k))
}
