// Package fixmodel is a lottery desk whose binomial counts are built by
// multiplicative loops in the arrangements the value model reads; its
// .golden file shows each loop whose rewrite keeps every right answer
// replaced by one helper call, and the others left as they are.
package fixmodel

import "math"

// Draws counts the ways to draw k balls of n, stepping the top factor
// down in a float64 of its own.
func Draws(n, k int) float64 { // want Draws:"binomial of parameter 0, breaks from 1021"
	if n < 0 || k < 0 {
		return 0
	}
	r := 1.0
	m := float64(n)
	for d := 1; d <= k; d++ { // want `multiplicative binomial loop computes C\(n, k\) in float64`
		r *= m
		r /= float64(d)
		m--
	}
	return r
}

// DrawsUp counts the factors up, multiplying before it divides.
func DrawsUp(n, k int) float64 { // want DrawsUp:"binomial of parameter 0, breaks from 1021"
	if n < 0 || k < 0 {
		return 0
	}
	r := 1.0
	for d := 1; d <= k; d++ { // want `multiplicative binomial loop computes C\(n, k\) in float64`
		r = r * float64(n-k+d) / float64(d)
	}
	return r
}

// Desk is one lottery: N balls, K drawn.
type Desk struct {
	N, K int64
}

// Tickets counts the tickets of the desk in integers.
func (p Desk) Tickets() int64 { // want Tickets:`wrong for some p`
	if p.N < 0 || p.K < 0 {
		return 0
	}
	r := int64(1)
	for i := int64(1); i <= p.K; i++ { // want `multiplicative binomial loop computes C\(p.N, p.K\) in int64`
		r = r * (p.N - p.K + i) / i
	}
	return r
}

// Unchecked is Draws without the check of its operands: over a
// negative n the loop forms the generalised binomial, which the helper
// also returns, and over a negative k it runs no trip and returns 1, so
// the call runs only where the loop would.
func Unchecked(n, k int) float64 { // want Unchecked:"binomial of parameter 0, breaks from 1021"
	r := 1.0
	m := float64(n)
	for d := 1; d <= k; d++ { // want `multiplicative binomial loop computes C\(n, k\) in float64`
		r *= m
		r /= float64(d)
		m--
	}
	return r
}

// Remaining reads the stepped factor after the loop: it is n−k there,
// which the rewrite would lose.
func Remaining(n, k int) (float64, float64) { // want Remaining:`wrong for some n or some k`
	if n < 0 || k < 0 {
		return 0, 0
	}
	r := 1.0
	m := float64(n)
	for d := 1; d <= k; d++ { // want `multiplicative binomial loop computes C\(n, k\) in float64`
		r *= m
		r /= float64(d)
		m--
	}
	return r, m
}

var drawn []int

// Logged records every divisor it uses: the loop does more than
// compute the count.
func Logged(n, k int) float64 { // want Logged:"binomial of parameter 0, breaks from 1021"
	if n < 0 || k < 0 {
		return 0
	}
	r := 1.0
	for d := 1; d <= k; d++ { // want `multiplicative binomial loop computes C\(n, k\) in float64`
		r = r * float64(n-k+d) / float64(d)
		drawn = append(drawn, d)
	}
	return r
}

// Scaled counts in float64 operands, which may hold fractions: the
// integer helper serves the whole numbers of its domain, and the loop
// stays, as written, for the others.
func Scaled(n, k float64) float64 { // want Scaled:"binomial of parameter 0, breaks from 1021"
	if n < 0 || k < 0 {
		return 0
	}
	r := 1.0
	for d := 1.0; d <= k; d++ { // want `multiplicative binomial loop computes C\(n, k\) in float64`
		r = r * (n - k + d) / d
	}
	return r
}

// Folded steps the parameter n itself down; n is not read after the
// loop, so the count still comes from n's value on entry.
func Folded(n, k int) float64 { // want Folded:`binomial of parameter 0, breaks from 1021`
	if n < 0 || k < 0 {
		return 0
	}
	r := 1.0
	for d := 1; d <= k; d++ { // want `multiplicative binomial loop computes C\(n, k\) in float64`
		r *= float64(n)
		r /= float64(d)
		n--
	}
	return r
}

// Mirrored takes the shorter side first, as C(n, k) = C(n, n−k) allows:
// k then holds k or n − k, and the loop computes C(n, k) either way; its
// product r·(n−k+d), formed before the division, passes float64 from
// n = 1021 at k = n/2.
func Mirrored(n, k int) float64 { // want Mirrored:`binomial of parameter 0, breaks from 1021`
	if n < 0 || k < 0 || k > n {
		return 0
	}
	if k > n-k {
		k = n - k
	}
	r := 1.0
	for d := 1; d <= k; d++ { // want `multiplicative binomial loop computes C\(n, k\) in float64: the product r\*\(float64\(n - k \+ d\)\) overflows to \+Inf before the division for n ≥ 1021 at k = n/2`
		r = r * float64(n-k+d) / float64(d)
	}
	return r
}

// Reload refreshes the desk after checking it: the call may change p.N
// and p.K through the pointer, so the count is left to the loop.
func (p *Desk) Reload() int64 { // want Reload:`wrong for some p`
	if p.N < 0 || p.K < 0 {
		return 0
	}
	p.refresh()
	r := int64(1)
	for i := int64(1); i <= p.K; i++ { // want `multiplicative binomial loop computes C\(p.N, p.K\) in int64`
		r = r * (p.N - p.K + i) / i
	}
	return r
}

func (p *Desk) refresh() {
	if p.K > p.N {
		p.K = p.N
	}
}

// Odds rules out k outside 0..n, the usual check, which bounds n below
// by 0 as well.
func Odds(n, k int) float64 { // want Odds:"binomial of parameter 0, breaks from 1021"
	if k < 0 || k > n {
		return 0
	}
	r := 1.0
	for d := 1; d <= k; d++ { // want `multiplicative binomial loop computes C\(n, k\) in float64`
		r = r * float64(n-k+d) / float64(d)
	}
	return r
}

// Stepped counts down in its float64 operands themselves, the top
// factor in the parameter n, which nothing reads after the loop.
func Stepped(n, k float64) float64 { // want Stepped:"binomial of parameter 0, breaks from 1021"
	if k > n {
		return 0
	} else if k == 0 {
		return 1
	}
	var r float64 = 1
	for d := float64(1); d <= k; d++ { // want `multiplicative binomial loop computes C\(n, k\) in float64`
		r *= n
		r /= d
		n--
	}
	return r
}

// Ways reads the ticket's counts, cut to whole numbers in locals that
// are assigned again before the loop.
func (t Ticket) Ways() float64 { // want Ways:`wrong for some t`
	n, k, r := 0.0, 0.0, 1.0
	n, k = t.Pool, t.Picks
	n, k = math.Trunc(n), math.Trunc(k)
	if k < 0 || k > n {
		return 0
	}
	for d := 1.0; d <= k; d++ { // want `multiplicative binomial loop computes C\(n, k\) in float64`
		r = r * (n - k + d) / d
	}
	return r
}

// Ticket is a lottery ticket's pool size and number of picks.
type Ticket struct{ Pool, Picks float64 }

// Queues counts the ordered queues of k of n ticket holders, in float64
// counts: a falling factorial of k factors, which past the last holder
// multiplies by 0 (after +Inf from 171 holders on, so NaN as written).
func Queues(n, k float64) float64 {
	q := 1.0
	for i := 0.0; i < k; i++ { // want `falling factorial n!/\(n - k\)! of k factors in float64 overflows to \+Inf for n ≥ 171 at k = n`
		q *= n - i
	}
	return q
}

// QueuesDown counts the same queues from the top factor down.
func QueuesDown(n, k float64) float64 {
	q := 1.0
	for i := n; i > n-k; i-- { // want `falling factorial n!/\(n - k\)! of k factors in float64 overflows to \+Inf for n ≥ 171 at k = n`
		q *= i
	}
	return q
}

// Winners is the chance that exactly k of n tickets win, each with
// probability p, over a coefficient its loop builds one ratio at a time.
func Winners(n, k int, p float64) float64 { // want Winners:`wrong for some n or some k`
	ways := 1.0
	for j := 0; j < k; j++ {
		ways *= float64(n-j) / float64(j+1)
	}
	return ways * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k)) // want `computes the binomial probability C\(n, k\)·p\^k·\(1−p\)\^\(n - k\) in float64 with C\(n, k\) formed on its own`
}

// Prizes is Winners over a coefficient that multiplies before it
// divides: the loop breaks first and is the finding, and its fix takes
// the probability with it.
func Prizes(n, k int, p float64) float64 { // want Prizes:`wrong for some n or some k`
	ways := 1.0
	top := float64(n)
	for j := 1; j <= k; j++ { // want `multiplicative binomial loop computes C\(n, k\) in float64: the product ways\*\(top\)`
		ways *= top
		ways /= float64(j)
		top--
	}
	return ways * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k))
}
