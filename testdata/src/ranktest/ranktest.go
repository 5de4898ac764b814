// Package ranktest is the statistics sheet of a seed-testing
// laboratory: the chance of a number of sprouts in a tray, and an exact
// rank test of two seed lots' sprouting days, whose counts of orderings
// are divided by the number of all orderings. The binomial coefficients
// come from tallykit.
package ranktest

import (
	"math"

	"tallykit"
)

// Tray is one germination tray.
type Tray struct {
	Seeds int     // seeds sown
	Rate  float64 // the chance that one seed sprouts
}

// Sprouts is the probability that exactly k seeds of the tray sprout.
func (t Tray) Sprouts(k float64) float64 { // want Sprouts:`wrong for some t`
	ki := int(math.Floor(k))
	if ki < 0 || ki > t.Seeds {
		return 0
	}
	return tallykit.Choose(t.Seeds, ki) * math.Pow(t.Rate, float64(ki)) * math.Pow(1-t.Rate, float64(t.Seeds-ki)) // want `computes the binomial probability C\(t.Seeds, ki\)·t.Rate\^ki·\(1−t.Rate\)\^\(.*\) in float64 with C\(t.Seeds, ki\) formed on its own: it overflows to \+Inf for t.Seeds ≥ 1030`
}

// Germinated is the chance that k of n seeds sprout at the given rate.
func Germinated(k, n int, rate float64) float64 { // want Germinated:`wrong for some k or some n`
	if k < 0 || k > n {
		return 0
	}
	return tallykit.Choose(n, k) * math.Pow(rate, float64(k)) * math.Pow(1-rate, float64(n-k)) // want `computes the binomial probability C\(n, k\)·rate\^k·\(1−rate\)\^\(.*\) in float64 with C\(n, k\) formed on its own: it overflows to \+Inf for n ≥ 1030`
}

// SproutsFromLog takes the coefficient out of log space on its own
// before the powers scale it down.
func SproutsFromLog(n, k int, rate float64) float64 { // want SproutsFromLog:`wrong for some n or some k`
	if k < 0 || k > n {
		return 0
	}
	return math.Exp(tallykit.Lchoose(n, k)) * math.Pow(rate, float64(k)) * math.Pow(1-rate, float64(n-k)) // want `computes the binomial probability C\(n, k\)·rate\^k·\(1−rate\)\^\(n - k\) in float64 with C\(n, k\) formed on its own: it overflows to \+Inf for n ≥ 1029` `math.Exp of log-gamma values computes C\(n, k\)·rate\^k·\(1−rate\)\^\(n - k\) from 3 log-gamma values`
}

// SproutsLog keeps the whole probability in log space: it cannot
// overflow, but the log-gamma sum inside Lchoose loses digits as n grows
// (lgamma-digits reads it through Lchoose's fact).
func SproutsLog(n, k int, rate float64) float64 {
	if k < 0 || k > n {
		return 0
	}
	return math.Exp(tallykit.Lchoose(n, k) + float64(k)*math.Log(rate) + float64(n-k)*math.Log1p(-rate)) // want `math.Exp of log-gamma values computes a product of Γ values from 3 log-gamma values`
}

// SmallTray serves the trays of the bench, at most 500 seeds: C(500,
// 250) fits float64, so the product is right.
func SmallTray(n, k int, rate float64) float64 {
	if n < 0 || n > 500 || k < 0 || k > n {
		return 0
	}
	return tallykit.Choose(n, k) * math.Pow(rate, float64(k)) * math.Pow(1-rate, float64(n-k))
}

// TiedShare is the share of the orderings of two lots of n1 and n2
// seeds whose rank sum is at most the one observed, given their count.
func TiedShare(count float64, n1, n2 int) float64 { // want TiedShare:`wrong for some n1 or some n2`
	return count / tallykit.Choose(n1+n2, n1) // want `divides by C\(n1 \+ n2, n1\) formed on its own in float64: it overflows to \+Inf for n1 \+ n2 ≥ 1030 at n1 = \(n1 \+ n2\)/2 .*after which the quotient is 0, or NaN where count overflowed too`
}

// SplitShare counts the orderings with at most u seeds of the second
// lot among the first n1 ranks, a sum of products of binomials, and
// divides the count by all of them: Inf/Inf once the lots pass C(1030,
// 515), although the share is at most 1.
func SplitShare(a, b, n1, u int) float64 { // want SplitShare:`wrong for some a or some b or some n1 or some u`
	count := 0.0
	for r := 0; r <= u; r++ {
		count += tallykit.Choose(a, n1-r) * tallykit.Choose(b, r)
	}
	return count / tallykit.Choose(a+b, n1) // want `divides by C\(a \+ b, n1\) formed on its own in float64: it overflows to \+Inf for a \+ b ≥ 1030`
}

// OneOrdering is the chance of one given ordering: 1/+Inf = 0 is
// within rounding of the true value.
func OneOrdering(n1, n2 int) float64 {
	return 1 / tallykit.Choose(n1+n2, n1)
}

// WideShare divides by the planner's coefficient, which carries no
// value across the call: nothing is claimed.
func WideShare(count float64, n1, n2 int) float64 {
	return count / tallykit.WideChoose(n1+n2, n1)
}
