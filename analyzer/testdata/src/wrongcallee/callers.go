// Package wrongcallee holds callers of functions whose values are
// wrong for some inputs: a caller that returns such a value, or builds
// its result from it, is as wrong as the callee where its arguments
// reach the callee's wrong region. The callee's fix makes both right,
// so the callers' findings offer none.
package wrongcallee

import (
	"math"

	"wrongcallee/kit"
)

// fact is a float n! helper: wrong only where n! leaves float64 itself.
func fact(n int) float64 { // want fact:`factorial of parameter 0, breaks from 171`
	f := 1.0
	for i := 2; i <= n; i++ {
		f *= float64(i)
	}
	return f
}

// Poisson is λ^k e^−λ/k! with λ^k and k! formed apart: 0 or NaN once k!
// is +Inf, where the term itself is a small number.
func Poisson(k int, lambda float64) float64 { // want Poisson:`value \(p1\)\^\(p0\)·exp\(-p1\)/Γ\(p0 \+ 1\), wrong once p0 ≥ 171` Poisson:`wrong for k ≥ 171`
	return math.Pow(lambda, float64(k)) * math.Exp(-lambda) / fact(k) // want `Poisson-style term`
}

// CDF sums Poisson's terms up to k: the value model reports the sum.
func CDF(k int, lambda float64) float64 { // want CDF:`wrong for some k`
	sum := 0.0
	for i := 0; i <= k; i++ {
		sum += Poisson(i, lambda) // want `CDF computes`
	}
	return sum
}

// Tail returns CDF's value as it is.
func Tail(k int, lambda float64) float64 { // want Tail:`wrong for some k`
	return CDF(k, lambda) // want `Tail returns CDF\(k, lambda\)'s value, which is wrong for some values of k \(reported at wrongcallee/callers\.go:33\); k is not bounded here`
}

// Upper is the chance of more than k events: a difference.
func Upper(k int, lambda float64) float64 { // want Upper:`wrong for some k`
	return 1 - CDF(k, lambda) // want `Upper builds its result from CDF\(k, lambda\), which is wrong for some values of k \(reported at wrongcallee/callers\.go:33\); k is not bounded here`
}

// Percent is the third link of the chain CDF, Upper, Percent.
func Percent(k int, lambda float64) float64 { // want Percent:`wrong for some k`
	return 100 * Upper(k, lambda) // want `Percent builds its result from Upper\(k, lambda\), which is wrong for some values of k \(through CDF, reported at wrongcallee/callers\.go:33\); k is not bounded here`
}

// Odds is a ratio of two of CDF's values.
func Odds(k int, lambda float64) float64 { // want Odds:`wrong for some k`
	return CDF(k, lambda) / CDF(2*k, lambda) // want `Odds builds its result from CDF\(k, lambda\), which is wrong for some values of k`
}

// Scaled is a product with another factor.
func Scaled(k int, lambda, w float64) float64 { // want Scaled:`wrong for some k`
	return w * CDF(k, lambda) // want `Scaled builds its result from CDF\(k, lambda\), which is wrong for some values of k`
}

// Mean sums CDF's values over the counts a desk logged.
func Mean(counts []int, lambda float64) float64 {
	s := 0.0
	for _, c := range counts {
		s += CDF(c, lambda) // want `Mean builds its result from CDF\(c, lambda\), which is wrong for some values of k \(reported at wrongcallee/callers\.go:33\); c, passed as k, is not bounded here`
	}
	return s / float64(len(counts))
}

// doubled is 2·C(n, k) by the multiplicative loop in int64: its product
// wraps before C(n, k) leaves int64.
func doubled(n, k int64) int64 {
	r := int64(1)
	for i := int64(1); i <= k; i++ { // want `multiplicative binomial loop`
		r = r * (n - k + i) / i
	}
	return 2 * r
}

// Share converts doubled's wrapped count to float64, which would have
// held the true count.
func Share(n, k int64) float64 { // want Share:`wrong for some n`
	return float64(doubled(n, k)) / math.Exp2(float64(n)) // want `Share builds its result from doubled\(n, k\), which is wrong for some values of n`
}

// Reading is a meter whose fields feed the distribution.
type Reading struct {
	Count int
	Rate  float64
}

// Chance is a method that returns CDF's value at its fields.
func (r Reading) Chance() float64 { // want Chance:`wrong for some r`
	return CDF(r.Count, r.Rate) // want `Chance returns CDF\(r\.Count, r\.Rate\)'s value, which is wrong for some values of k \(reported at wrongcallee/callers\.go:33\); r\.Count, passed as k, is not bounded here`
}

// Small bounds k: with no threshold known for CDF, a bound of the
// caller's own is taken as its choice: silent.
func Small(k int, lambda float64) float64 {
	if k < 0 || k > 150 {
		return 0
	}
	return CDF(k, lambda)
}

// Checked falls back where the sum is not finite: silent.
func Checked(k int, lambda float64) float64 {
	p := CDF(k, lambda)
	if math.IsInf(p, 0) || math.IsNaN(p) {
		return 1
	}
	return p
}

// Fixed passes constants: silent.
func Fixed() float64 {
	return CDF(12, 3.5)
}

// Allowed's sum is accepted as it is by a directive, so its callers are
// silent too.
func Allowed(k int, lambda float64) float64 {
	sum := 0.0
	for i := 0; i <= k; i++ {
		//overfact:allow the desk's counts stay below a hundred
		sum += Poisson(i, lambda)
	}
	return sum
}

// AllowedTail returns Allowed's value: silent.
func AllowedTail(k int, lambda float64) float64 {
	return Allowed(k, lambda)
}

// Factorial returns fact's value, which is wrong only where n! leaves
// float64 too: silent.
func Factorial(n int) float64 { // want Factorial:`value 2·Γ\(p0 \+ 1\), wrong once p0 ≥ 171`
	return 2 * fact(n)
}

// Seats returns kit.Total's value from another package.
func Seats(n int) float64 { // want Seats:`wrong for some n`
	return kit.Total(n) // want `Seats returns kit\.Total\(n\)'s value, which is wrong`
}

// FewSeats bounds the guests: silent.
func FewSeats(n int) float64 {
	if n > 100 {
		n = 100
	}
	return kit.Total(n)
}
