package factorialratio

import "math"

// Binomial coefficients reduced to the smaller of k and n − k before a
// running product, as most hand-written float helpers do; C(n, k) =
// C(n, n−k) makes the result C(n, k) whichever the condition picks.
// C(1029, 514) ≈ 1.43e308 is the largest central coefficient that fits
// float64 and C(1030, 515) does not (Python's exact math.comb against
// sys.float_info.max).

// chooseHalf reflects k with a condition.
func chooseHalf(n, k int) float64 { // want chooseHalf:`binomial of parameter 0, breaks from 1030`
	if k < 0 || k > n {
		return 0
	}
	if k > n-k {
		k = n - k
	}
	c := 1.0
	for i := 1; i <= k; i++ {
		c *= float64(n-k+i) / float64(i)
	}
	return c
}

// chooseMin reflects k with the min builtin; its product multiplies
// before it divides, and c·(n−i) passes float64 first, from n = 1021
// (C(1020, 510)·511 > MaxFloat64 > C(1019, 509)·510 by math.comb).
func chooseMin(n, k int) float64 { // want chooseMin:`binomial of parameter 0, breaks from 1021`
	k = min(k, n-k)
	c := 1.0
	for i := 0; i < k; i++ { // want `multiplicative binomial loop computes C\(n, k\) in float64: the product c\*\(float64\(n - i\)\) overflows to \+Inf before the division for n ≥ 1021 at k = n/2`
		c = c * float64(n-i) / float64(i+1)
	}
	return c
}

// Cohort is a group of lives, each dying within the year with
// probability Q.
type Cohort struct {
	Size int
	Q    float64
}

// Deaths is the chance that exactly d of the cohort die: the product is
// +Inf·0 = NaN from Size = 1030 at d = Size/2, where it is tiny but not 0.
func (c *Cohort) Deaths(d int) float64 { // want Deaths:`wrong for some c`
	return chooseHalf(c.Size, d) * math.Pow(c.Q, float64(d)) * math.Pow(1-c.Q, float64(c.Size-d)) // want `binomial probability C\(c.Size, d\)·c.Q\^d·\(1−c.Q\)\^\(c.Size−d\) in float64: chooseHalf\(c.Size, …\) breaks for c.Size ≥ 1030 although the probability itself is at most 1`
}

// Heads is the chance of h heads in n tosses of a coin with bias p.
func Heads(n, h int, p float64) float64 { // want Heads:`wrong for n ≥ 1021`
	return chooseMin(n, h) * math.Pow(p, float64(h)) * math.Pow(1-p, float64(n-h)) // want `binomial probability C\(n, h\)·p\^h·\(1−p\)\^\(n−h\) in float64: chooseMin\(n, …\) breaks for n ≥ 1021 although the probability itself is at most 1`
}

// SmallCohort serves at most 1000 lives, where every C(n, k) fits.
func SmallCohort(n, d int, q float64) float64 {
	if n < 0 || n > 1000 {
		return math.NaN()
	}
	return chooseHalf(n, d) * math.Pow(q, float64(d)) * math.Pow(1-q, float64(n-d))
}

// chooseOff moves k to n − k − 1, not to the other end: its result is
// no binomial coefficient of its arguments, and its callers are no
// binomial probabilities.
func chooseOff(n, k int) float64 {
	if k > n-k {
		k = n - k - 1
	}
	c := 1.0
	for i := 1; i <= k; i++ {
		c *= float64(n-k+i) / float64(i)
	}
	return c
}

// Skewed is chooseOff's caller, read as the unknown product it is.
func Skewed(n, h int, p float64) float64 {
	return chooseOff(n, h) * math.Pow(p, float64(h)) * math.Pow(1-p, float64(n-h))
}

// absHalf folds a sign, which changes the value: the product is not
// read as C(n, k).
func absHalf(n, k int) float64 {
	if k < 0 {
		k = -k
	}
	c := 1.0
	for i := 1; i <= k; i++ {
		c *= float64(n-k+i) / float64(i)
	}
	return c
}

// Folded is absHalf's caller.
func Folded(n, h int, p float64) float64 {
	return absHalf(n, h) * math.Pow(p, float64(h)) * math.Pow(1-p, float64(n-h))
}
