// Package inspection decides whether a delivered lot is accepted, from
// the defects a sample shows: hypergeometric, binomial and negative
// binomial probabilities over probkit's counting helpers.
package inspection

import (
	"math"

	"probkit"
)

// Defective is the chance of exactly k defective items among n drawn
// when each is defective with probability p.
func Defective(k, n int, p float64) float64 { // want Defective:`value Γ\(p1 \+ 1\)·\(p2\)\^\(p0\)/\(Γ\(p0 \+ 1\)·Γ\(-p0 \+ p1 \+ 1\)·\(-p2 \+ 1\)\^\(p0 - p1\)\), wrong once p1 ≥ 171` Defective:`wrong for n ≥ 171`
	return probkit.Choose(float64(n), float64(k)) * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k)) // want `Defective computes C\(n, k\)·p\^k·\(1−p\)\^\(-k \+ n\) in float64, which fits where probkit.Choose\(float64\(n\), float64\(k\)\) already is \+Inf or NaN from n = 171 \(its Fact\(n\) breaks first\); n is not bounded here`
}

// LotDraw is the chance that a sample of n items from a lot of size
// total with bad defective items shows exactly k of them.
func LotDraw(k, total, bad, n int) float64 { // want LotDraw:`value Γ\(p2 \+ 1\)·Γ\(p1 - p2 \+ 1\)·Γ\(p3 \+ 1\)·Γ\(p1 - p3 \+ 1\)/\(Γ\(p0 \+ 1\)·Γ\(-p0 \+ p2 \+ 1\)·Γ\(-p0 \+ p3 \+ 1\)·Γ\(p0 \+ p1 - p2 - p3 \+ 1\)·Γ\(p1 \+ 1\)\), wrong once p2 ≥ 171` LotDraw:`wrong for total ≥ 171 or n ≥ 171`
	hit := probkit.Choose(float64(bad), float64(k))
	miss := probkit.Choose(float64(total-bad), float64(n-k))
	return hit * miss / probkit.Choose(float64(total), float64(n)) // want `LotDraw computes C\(bad, k\)·C\(.*\)/C\(total, n\) in float64, which fits where probkit.Choose\(float64\(bad\), float64\(k\)\) already is \+Inf or NaN from bad = 171`
}

// RejectsBefore is the chance of f good items before the s-th
// defective one when each is defective with probability p.
func RejectsBefore(f, s, p float64) float64 { // want RejectsBefore:`value Γ\(p0 \+ p1\)·\(p2\)\^\(p1\)·\(-p2 \+ 1\)\^\(p0\)/\(Γ\(p1\)·Γ\(p0 \+ 1\)\), wrong once p0 \+ p1 - 1 ≥ 171`
	return probkit.Choose(f+s-1, s-1) * math.Pow(p, s) * math.Pow(1-p, f) // want `RejectsBefore computes C\(f \+ s - 1, f\)·p\^s·\(1−p\)\^f in float64, which fits where probkit.Choose\(f\+s-1, s-1\) already is \+Inf or NaN from f \+ s - 1 = 171 \(its Fact\(n\) breaks first\)`
}

// ShelfOrders counts the orders of the bins of each size on a shelf:
// the multinomial (Σ bins)!/Π bin!.
func ShelfOrders(bins []float64) float64 {
	total, den := 0.0, 1.0
	for _, b := range bins {
		total += b
		den *= probkit.Fact(b)
	}
	return probkit.Fact(total) / den // want `ShelfOrders computes the multinomial coefficient \(Σ parts\)!/Π part! as probkit.Fact\(total\) / den over the loop's parts in float64, which fits where probkit.Fact\(total\) already overflows to \+Inf from total = 171; total is not bounded here`
}

// SpreadRatio is 1/B(a, b), the normalising constant of the Beta prior
// the desk fits to defect rates.
func SpreadRatio(a, b float64) float64 { // want SpreadRatio:`value Γ\(p0 \+ p1\)/\(Γ\(p0\)·Γ\(p1\)\), wrong once p0 \+ p1 ≥ 171\.624377`
	return probkit.Gamma(a+b) / (probkit.Gamma(a) * probkit.Gamma(b)) // want `SpreadRatio computes 1/B\(a, b\) in float64, which fits where probkit.Gamma\(a \+ b\) already is \+Inf or NaN from a \+ b = 171.624377`
}

// DefectiveSmall is Defective for the small panels, bounded first.
func DefectiveSmall(k, n int, p float64) float64 {
	if n < 0 || n > 150 {
		return 0
	}
	return probkit.Choose(float64(n), float64(k)) * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k))
}

// Orientations counts the ways to place n distinct crates in a row,
// each facing either way round the aisle: the count itself leaves
// float64 where Fact(n) does, so nothing is lost before that.
func Orientations(n float64) float64 { // want Orientations:`value 4·Γ\(p0 \+ 1\), wrong once p0 ≥ 171`
	return 2 * probkit.Fact(n) * 2
}

// PanelDefective uses SmallChoose, which guards itself.
func PanelDefective(k, n int, p float64) float64 {
	return probkit.SmallChoose(float64(n), float64(k)) * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k))
}

// ChanceOf passes Defective's value on: wrong where Defective is, from
// n = 171 (Fact(171) = +Inf), while C(n, 1)·p·(1−p)^(n−1) is small;
// Defective is the one to fix.
func ChanceOf(k, n int, p float64) float64 { // want ChanceOf:`value Γ\(p1 \+ 1\)·\(p2\)\^\(p0\)/\(Γ\(p0 \+ 1\)·Γ\(-p0 \+ p1 \+ 1\)·\(-p2 \+ 1\)\^\(p0 - p1\)\), wrong once p1 ≥ 171` ChanceOf:`wrong for n ≥ 171`
	return Defective(k, n, p) // want `ChanceOf computes C\(n, k\)·p\^k·\(1−p\)\^\(-k \+ n\) in float64, which fits where Defective\(k, n, p\) already is \+Inf or NaN from n = 171 \(its probkit\.Choose\(float64\(n\), float64\(k\)\) breaks first\)`
}

// Cumulative sums Defective's terms: each is NaN from n = 171, and so
// is the sum, a probability.
func Cumulative(k, n int, p float64) float64 { // want Cumulative:`wrong for some k or some n`
	sum := 0.0
	for i := 0; i <= k; i++ {
		sum += Defective(i, n, p) // want `Cumulative computes C\(n, i\)·p\^i·\(1−p\)\^\(n - i\) in float64, which fits where Defective\(i, n, p\) already is \+Inf or NaN from n = 171`
	}
	return sum
}

// DefectiveChecked falls back to the helper's log form itself when the
// coefficient is not finite.
func DefectiveChecked(k, n int, p float64) float64 {
	c := probkit.Choose(float64(n), float64(k))
	if math.IsInf(c, 0) || math.IsNaN(c) {
		return math.Exp(logDefective(k, n, p))
	}
	return c * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k))
}

func logDefective(k, n int, p float64) float64 {
	a, _ := math.Lgamma(float64(n + 1))
	b, _ := math.Lgamma(float64(k + 1))
	d, _ := math.Lgamma(float64(n - k + 1))
	return a - b - d + float64(k)*math.Log(p) + float64(n-k)*math.Log1p(-p)
}

// DefectiveAt takes the count of defects as a reading that the desk
// rounds down: k is defined once, from a value the model does not know,
// and read as a variable of its own.
func DefectiveAt(reading float64, n int, p float64) float64 { // want DefectiveAt:`wrong for some n`
	k := int(math.Floor(reading))
	return probkit.Choose(float64(n), float64(k)) * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k)) // want `DefectiveAt computes C\(n, k\)·p\^k·\(1−p\)\^\(n - k\) in float64, which fits where probkit.Choose\(float64\(n\), float64\(k\)\) already is \+Inf or NaN from n = 171`
}
