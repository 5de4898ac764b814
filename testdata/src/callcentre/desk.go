// Package callcentre sizes the agent pool of a support desk: Erlang B
// and C blocking, Poisson arrivals, and the orderings of a shift rota.
package callcentre

import "math"

// Rotas counts the orderings of n agents on a shift; the desk keeps
// head counts in float64. Rotas returns the product as it is (+Inf past
// 170!, the IEEE value of a count beyond float64): not reported; Teams,
// whose ratio turns +Inf into NaN, is.
func Rotas(n float64) float64 { // want Rotas:`factorial of parameter 0, breaks from 171`
	v := 1.0
	for i := 2.0; i <= n; i++ {
		v *= i
	}
	return v
}

// RotasDown counts the same orderings from the top down.
func RotasDown(n float64) float64 { // want RotasDown:`factorial of parameter 0, breaks from 171`
	v := 1.0
	for i := n; i > 1; i-- {
		v = v * i
	}
	return v
}

// Teams counts the ways to pick k of n agents for a callback team.
func Teams(n, k float64) float64 { // want Teams:`value Γ\(p0 \+ 1\)/\(Γ\(p1 \+ 1\)·Γ\(p0 - p1 \+ 1\)\), wrong once p0 ≥ 171` Teams:`wrong for n ≥ 171`
	return Rotas(n) / (Rotas(k) * Rotas(n-k)) // want `ratio of factorials in float64: the numerator n! overflows to \+Inf for n ≥ 171`
}

// RotasCapped refuses desks past the largest count float64 holds.
func RotasCapped(n float64) float64 { // want RotasCapped:`factorial of parameter 0, safe for`
	if n > 170 {
		return math.Inf(1)
	}
	v := 1.0
	for i := 2.0; i <= n; i++ {
		v *= i
	}
	return v
}

// DozenRotas is the rota count of the twelve-seat desk.
func DozenRotas() float64 {
	v := 1.0
	for i := 2.0; i <= 12; i++ {
		v *= i
	}
	return v
}

// Growth compounds a rate over n periods counted in float64: a power,
// not a factorial.
func Growth(rate, n float64) float64 {
	v := 1.0
	for i := 0.0; i < n; i++ {
		v *= rate
	}
	return v
}

// ErlangB is the blocking probability of traffic a on c lines, with the
// factorial kept beside the sum.
func ErlangB(a, c float64) float64 {
	fact, sum := 1.0, 1.0
	for k := 1.0; k <= c; k++ { // want `running factorial fact computes k! inside the sum that divides by it: in float64 it overflows to \+Inf from k = 171 .*; the loop reaches that trip for c ≥ 171; c is not bounded here`
		fact *= k
		sum += math.Pow(a, k) / fact
	}
	return math.Pow(a, c) / fact / sum
}

// AtMost is the chance of at most n calls in an interval with lambda
// calls on average.
func AtMost(lambda float64, n int) float64 { // want AtMost:`wrong for some n`
	f, sum := 1.0, 0.0
	for k := 0; k <= n; k++ { // want `running factorial f computes k! inside the sum .* from k = 171 .* for n ≥ 171; n is not bounded here`
		if k > 0 {
			f *= float64(k)
		}
		sum += math.Pow(lambda, float64(k)) / f
	}
	return math.Exp(-lambda) * sum
}

// Surge is the odd-power series sinh(x) = Σ x^(2k+1)/(2k+1)! of the
// surge model, with the factorial two factors a term.
func Surge(x float64, terms int) float64 { // want Surge:`wrong for some terms`
	fact, sum := 1.0, x
	for k := 1; k < terms; k++ { // want `running factorial fact computes \(2\*k \+ 1\)! inside the sum .* from k = 85 .* for terms ≥ 86; terms is not bounded here`
		fact *= float64(2*k) * float64(2*k+1)
		sum += math.Pow(x, float64(2*k+1)) / fact
	}
	return sum
}

// ErlangBSmall serves desks of at most 150 lines: 150! fits float64,
// but a^150 does not from a ≈ 113.5 Erlangs on, while the terms
// a^k/k! stay finite (200^150/150! ≈ 1e83).
func ErlangBSmall(a float64, c int) float64 { // want ErlangBSmall:`wrong for some c`
	if c > 150 {
		return 0
	}
	fact, sum := 1.0, 1.0
	for k := 1; k <= c; k++ {
		fact *= float64(k)
		sum += math.Pow(a, float64(k)) / fact // want `series term math.Pow\(a, float64\(k\)\) / fact computes \(a\)\^\(k\)/Γ\(k \+ 1\) on the trip of k, from parts formed apart that each grow with the trips: math.Pow\(a, float64\(k\)\) holds \(a\)\^\(k\), which overflows to \+Inf`
	}
	return math.Pow(a, float64(c)) / fact / sum
}

// ErlangBRatio builds each term from the last: no factorial is formed,
// but past a ≈ 709.78 the sum of a^k/k! is +Inf, and so is the last
// term, while their ratio is a probability.
func ErlangBRatio(a float64, c int) float64 { // want ErlangBRatio:`wrong for some c`
	term, sum := 1.0, 1.0
	for k := 1; k <= c; k++ {
		term *= a / float64(k)
		sum += term // want `sum sums the running term a\^k/k! in float64`
	}
	return term / sum
}

// ErlangBNight is the night desk's twenty lines: 20! fits, and a^20
// leaves float64 only for a traffic past 2.6e15 Erlangs, which the
// message names.
func ErlangBNight(a float64) float64 {
	fact, sum := 1.0, 1.0
	for k := 1; k <= 20; k++ {
		fact *= float64(k)
		sum += math.Pow(a, float64(k)) / fact // want `at a\^20, for \|a\| ≥ 2.58664e\+15`
	}
	return math.Pow(a, 20) / fact / sum
}

// Backlog is the chance of at most n calls waiting, the Poisson terms
// built one factor at a time from e^(−lambda).
func Backlog(lambda float64, n int) float64 { // want Backlog:`wrong for some n`
	p := math.Exp(-lambda)
	sum := p
	for k := 1; k <= n; k++ { // want `running product p computes the Poisson terms lambda\^k·e\^\(−lambda\)/k! from math.Exp\(-lambda\), which in float64 loses its digits for lambda > 708.396 and is 0 for lambda ≥ 745.133.*; lambda is not bounded here`
		p *= lambda / float64(k)
		sum += p
	}
	return sum
}

// Arrivals is the chance of exactly n arrivals, counted in float64.
func Arrivals(mean, n float64) float64 {
	term := math.Exp(-mean)
	for k := 1.0; k <= n; k++ { // want `running product term computes the Poisson terms mean\^k`
		term *= mean / k
	}
	return term
}

// Bursts is Arrivals with the update written out.
func Bursts(rate float64, n int) float64 { // want Bursts:`wrong for some n`
	t := math.Exp(-rate)
	for i := 1; i <= n; i++ { // want `running product t computes the Poisson terms rate\^k`
		t = t * rate / float64(i)
	}
	return t
}

// BacklogCapped hands heavy traffic to a normal approximation.
func BacklogCapped(lambda float64, n int) float64 {
	if lambda > 700 {
		return 0.5
	}
	p := math.Exp(-lambda)
	sum := p
	for k := 1; k <= n; k++ {
		p *= lambda / float64(k)
		sum += p
	}
	return sum
}

// QuietBacklog serves the quiet desk, at most 40 calls an hour.
func QuietBacklog(lambda float64, n int) float64 {
	if lambda < 0 || lambda > 40 {
		return 0
	}
	p := math.Exp(-lambda)
	for k := 1; k <= n; k++ {
		p *= lambda / float64(k)
	}
	return p
}

// Ramp grows a weight by lambda/k from 1: x^k/k!, small for small
// lambda, with no start that underflows.
func Ramp(lambda float64, n int) float64 {
	w := 1.0
	for k := 1; k <= n; k++ {
		w *= lambda / float64(k)
	}
	return w
}

// ErlangBConverged stops adding once the terms no longer matter; but
// for a traffic of 171 Erlangs or more the terms are still growing at
// k = 171, where fact is +Inf and the term NaN, so the loop never
// stops early and the sum is NaN.
func ErlangBConverged(a, c float64) float64 {
	fact, sum := 1.0, 1.0
	for k := 1.0; k <= c; k++ {
		fact *= k
		t := math.Pow(a, k) / fact // want `series term math.Pow\(a, k\) / fact computes .*fact holds k!, which overflows to \+Inf once k ≥ 171.*the loop may stop early`
		sum += t
		if t < 1e-16*sum {
			break
		}
	}
	return sum
}

// Reduce brings a float argument below 3 by dividing out factors, as a
// Gamma routine does after it has checked q := math.Abs(x) ≤ 33, which
// the range analysis does not carry back to x: a while-style loop is
// not judged by the value model.
func Reduce(x float64) float64 {
	q := math.Abs(x)
	if q > 33 {
		return math.Inf(1)
	}
	z := 1.0
	for x >= 3 {
		x = x - 1
		z = z * x
	}
	return z
}

// Lineups counts ordered lineups of k agents out of n, in float64.
func Lineups(n, k float64) float64 {
	p := 1.0
	for i := 0.0; i < k; i++ { // want `falling factorial n!/\(n - k\)! of k factors in float64 overflows to \+Inf for n ≥ 171 at k = n; n is not bounded here`
		p *= n - i
	}
	return p
}

// Podium counts the ordered top three of n agents.
func Podium(n float64) float64 {
	p := 1.0
	for i := 0.0; i < 3; i++ {
		p *= n - i
	}
	return p
}

// TopTen counts ordered top-ten lists from a floor of any size.
func TopTen(n float64) float64 {
	p := 1.0
	for i := 0.0; i < 10; i++ {
		p *= n - i
	}
	return p
}

// PodiumSmall counts podiums of a desk of at most 500 agents.
func PodiumSmall(n float64) float64 {
	if n > 500 {
		return 0
	}
	p := 1.0
	for i := 0.0; i < 3; i++ {
		p *= n - i
	}
	return p
}

// LineupsCapped counts lineups of at most 170 agents.
func LineupsCapped(n, k float64) float64 {
	if n < 0 || n > 170 || k < 0 || k > n {
		return 0
	}
	p := 1.0
	for i := 0.0; i < k; i++ {
		p *= n - i
	}
	return p
}

// Squads counts ordered squads of at most 40 agents from a floor of
// any size.
func Squads(n, k float64) float64 {
	if k < 0 || k > 40 {
		return 0
	}
	p := 1.0
	for i := 0.0; i < k; i++ { // want `falling factorial n!/\(n - k\)! of k factors in float64 overflows to \+Inf for n ≥ 50859028 with k up to 40; n is not bounded here`
		p *= n - i
	}
	return p
}

// LineupsDown counts the same lineups from the top down.
func LineupsDown(n, k float64) float64 {
	p := 1.0
	for i := n; i > n-k; i-- { // want `falling factorial n!/\(n - k\)! of k factors in float64 overflows to \+Inf for n ≥ 171 at k = n`
		p *= i
	}
	return p
}

// EveryOther multiplies every other agent count: its body moves the
// counter too, so the product is not n!.
func EveryOther(n float64) float64 {
	v := 1.0
	for i := 2.0; i <= n; i++ {
		v *= i
		i++
	}
	return v
}
