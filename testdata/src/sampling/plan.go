// Package sampling is the acceptance-sampling sheet of a parts
// warehouse: the chance of finding k defects in a lot, with the
// binomial coefficient taken from log-gamma, and an exact rank test of
// two suppliers' delivery times, whose counts of orderings are divided
// by the number of all orderings.
package sampling

import "math"

// Lot is one delivery under inspection.
type Lot struct {
	Size   int     // parts in the lot
	Defect float64 // the chance that one part is defective
}

// Chance is the probability of exactly k defects in the lot: the
// coefficient leaves log space before the powers scale it down.
func (l Lot) Chance(k float64) float64 { // want Chance:`wrong for some l`
	ki := int(math.Floor(k))
	if ki < 0 || ki > l.Size {
		return 0
	}
	a, _ := math.Lgamma(float64(l.Size + 1))
	b, _ := math.Lgamma(float64(ki + 1))
	c, _ := math.Lgamma(float64(l.Size - ki + 1))
	return math.Exp(a-b-c) * math.Pow(l.Defect, float64(ki)) * math.Pow(1-l.Defect, float64(l.Size-ki)) // want `computes the binomial probability C\(l.Size, ki\)·l.Defect\^ki·\(1−l.Defect\)\^\(.*\) in float64 with C\(l.Size, ki\) formed on its own: it overflows to \+Inf for l.Size ≥ 1029` `math\.Exp of log-gamma values computes C\(l\.Size, ki\)·l\.Defect\^ki·\(1−l\.Defect\)\^\(-ki \+ l\.Size`
}

// Orderings is the number of ways the two suppliers' n1 and n2
// deliveries interleave, from log-gamma.
func Orderings(n1, n2 int) float64 { // want Orderings:`value Γ\(p0 \+ p1 \+ 1\)/\(Γ\(p0 \+ 1\)·Γ\(p1 \+ 1\)\)`
	a, _ := math.Lgamma(float64(n1 + n2 + 1))
	b, _ := math.Lgamma(float64(n1 + 1))
	c, _ := math.Lgamma(float64(n2 + 1))
	return math.Exp(a - b - c) // want `math\.Exp of log-gamma values computes C\(n1 \+ n2, n1\) from 3 log-gamma values whose roundin`
}

// RankShare is the share of orderings whose rank sum is at most u,
// given the count of them.
func RankShare(count float64, n1, n2 int) float64 { // want RankShare:`wrong for some n1 or some n2`
	a, _ := math.Lgamma(float64(n1 + n2 + 1))
	b, _ := math.Lgamma(float64(n1 + 1))
	c, _ := math.Lgamma(float64(n2 + 1))
	all := math.Exp(a - b - c) // want `math\.Exp of log-gamma values computes C\(n1 \+ n2, n1\) from 3 log-gamma values whose roundin`
	return count / all // want `divides by C\(n1 \+ n2, n1\) formed on its own in float64: it overflows to \+Inf for n1 \+ n2 ≥ 1029 at n1 = \(n1 \+ n2\)/2 .*after which the quotient is 0, or NaN where count overflowed too`
}

// Sample is the chance that a sample of m parts of a lot of n holds
// exactly the d defects of the lot, one over C(n, d) of the lot's
// arrangements: 1/+Inf = 0 is within rounding of the true value.
func Sample(n, d int) float64 {
	a, _ := math.Lgamma(float64(n + 1))
	b, _ := math.Lgamma(float64(d + 1))
	c, _ := math.Lgamma(float64(n - d + 1))
	return 1 / math.Exp(a-b-c) // want `math\.Exp of log-gamma values computes 1/C\(n, d\) from 3 log-gamma values whose rounding err`
}

// SmallShare serves lots of at most 500 parts: C(500, 250) fits.
func SmallShare(count float64, n, k int) float64 {
	if n < 0 || n > 500 || k < 0 || k > n {
		return 0
	}
	a, _ := math.Lgamma(float64(n + 1))
	b, _ := math.Lgamma(float64(k + 1))
	c, _ := math.Lgamma(float64(n - k + 1))
	return count / math.Exp(a-b-c) // want `math\.Exp of log-gamma values computes a product of Γ values from 3 log-gamma values whose `
}

// LogChance stays in log space until the end.
func (l Lot) LogChance(k int) float64 {
	a, _ := math.Lgamma(float64(l.Size + 1))
	b, _ := math.Lgamma(float64(k + 1))
	c, _ := math.Lgamma(float64(l.Size - k + 1))
	return math.Exp(a - b - c + float64(k)*math.Log(l.Defect) + float64(l.Size-k)*math.Log1p(-l.Defect)) // want `math\.Exp of log-gamma values computes a product of Γ values from 3 log-gamma values whose `
}
