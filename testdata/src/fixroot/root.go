// Package fixroot is a lens maker's table of mode shapes and draw odds:
// square roots of products and ratios of float factorials, and ratios
// whose factorials leave float64 while the value does not. Its .golden
// file shows them carried in log space by the helper's Product, the
// square root taken of the Product (Product.Sqrt) so that a quotient
// past float64 whose root is not keeps its value.
package fixroot

import "math"

// fact returns n! in float64, +Inf past 170!, 1 below 2.
func fact(n int) float64 { // want fact:`factorial of parameter 0, breaks from 171`
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

// ModeScale is 1/√(3^n·n!), the scale of the n-th mode of a lens's
// cylindrical basis: 3^n·n! leaves float64 at n = 141 (mpmath), its root only far later.
func ModeScale(n int) float64 { // want ModeScale:`wrong for n ≥ 141`
	return 1 / math.Sqrt(math.Pow(3, float64(n))*fact(n)) // want `product of factorials and powers under math\.Sqrt in float64: the intermediate 3\^n·n! overflows to \+Inf first, at n = 141 on that line of inputs`
}

// ModeOverlap is √(n!/(n+a)!), the overlap of modes n and n+a: the
// divisor leaves float64 first, then the numerator, and the quotient
// under the root may be below float64 where the root is not.
func ModeOverlap(n, a int) float64 { // want ModeOverlap:`wrong for some n or some a`
	return math.Sqrt(fact(n) / fact(n+a)) // want `ratio of factorials in float64: the divisor \(n \+ a\)! overflows to \+Inf for n \+ a ≥ 171, no later than the numerator's n!`
}

// Pairings is (2a)!·(2b)!/(a!·b!·(a+b)!), its numerator kept in a
// local of its own before the division.
func Pairings(a, b int) float64 { // want Pairings:`value Γ\(2\*p0 \+ 1\)` Pairings:`wrong for a ≥ 85\.5 or b ≥ 85\.5`
	top := fact(2*a) * fact(2*b)
	return top / (fact(a) * fact(b) * fact(a+b)) // want `ratio of factorials in float64: the intermediate \(2 \* a\)!·\(2 \* b\)! overflows to \+Inf first, at a = b = 50 \(all equal\)`
}

// AllDistinct is the chance that k draws with replacement from m
// lenses are all different, m!/((m−k)!·m^k).
func AllDistinct(k, m int) float64 { // want AllDistinct:`value Γ\(p1 \+ 1\)/\(Γ\(-p0 \+ p1 \+ 1\)·\(p1\)\^\(p0\)\)` AllDistinct:`wrong for m ≥ 171`
	if k > m {
		return 0
	}
	return fact(m) / (fact(m-k) * math.Pow(float64(m), float64(k))) // want `permutation count m!/\(m - k\)! as a ratio of factorials in float64: the numerator m! overflows to \+Inf for m ≥ 171`
}
