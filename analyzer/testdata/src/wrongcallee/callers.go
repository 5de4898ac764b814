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

// Poisson is λ^k e^−λ/k! with λ^k and k! formed apart: NaN once k! is
// +Inf, where the term itself is a small number.
func Poisson(k int, lambda float64) float64 { // want Poisson:`value \(p1\)\^\(p0\)·exp\(-p1\)/Γ\(p0 \+ 1\), wrong once p0 ≥ 171` Poisson:`wrong for k ≥ 171`
	return math.Pow(lambda, float64(k)) * math.Exp(-lambda) / fact(k) // want `Poisson-style term`
}

// Tail returns Poisson's value as it is.
func Tail(k int, lambda float64) float64 { // want Tail:`value \(p1\)\^\(p0\)·exp\(-p1\)/Γ\(p0 \+ 1\), wrong once p0 ≥ 171` Tail:`wrong for k ≥ 171`
	return Poisson(k, lambda) // want `Tail returns Poisson\(k, lambda\)'s value, which is wrong from k = 171 \(reported at wrongcallee/callers\.go:26\); k is not bounded here`
}

// CDF sums Poisson's terms up to k.
func CDF(k int, lambda float64) float64 { // want CDF:`wrong for some k`
	sum := 0.0
	for i := 0; i <= k; i++ {
		sum += Poisson(i, lambda) // want `CDF builds its result from Poisson\(i, lambda\), which is wrong from k = 171 \(reported at wrongcallee/callers\.go:26\); i, passed as k, is not bounded here`
	}
	return sum
}

// Upper is the chance of more than k events: a difference, and the third
// link of the chain Poisson, CDF, Upper.
func Upper(k int, lambda float64) float64 { // want Upper:`wrong for some k`
	return 1 - CDF(k, lambda) // want `Upper builds its result from CDF\(k, lambda\), which is wrong for some values of k \(through Poisson, reported at wrongcallee/callers\.go:26\); k is not bounded here`
}

// Odds is a ratio of two of CDF's values.
func Odds(k int, lambda float64) float64 { // want Odds:`wrong for some k`
	return CDF(k, lambda) / CDF(2*k, lambda) // want `Odds builds its result from CDF\(k, lambda\), which is wrong for some values of k \(through Poisson, reported at wrongcallee/callers\.go:26\); k is not bounded here`
}

// Scaled is a product with another factor.
func Scaled(k int, lambda, w float64) float64 { // want Scaled:`wrong for some k`
	return w * CDF(k, lambda) // want `Scaled builds its result from CDF\(k, lambda\), which is wrong for some values of k`
}

// pairs is C(n, 2)·… by the multiplicative loop in int64: its product
// wraps before C(n, k) leaves int64.
func pairs(n, k int64) int64 { // want pairs:`binomial of parameter 0, breaks from 62`
	r := int64(1)
	for i := int64(1); i <= k; i++ { // want `multiplicative binomial loop`
		r = r * (n - k + i) / i
	}
	return r
}

// Share converts pairs' wrapped count to float64, which would have
// held the true count.
func Share(n, k int64) float64 { // want Share:`wrong for some n`
	return float64(pairs(n, k)) / math.Exp2(float64(n)) // want `Share builds its result from pairs\(n, k\), which is wrong for some values of n`
}

// Within keeps pairs in int64, where its value is as wrong as pairs'
// own, and is left to pairs' finding only when it converts: here it
// returns the count itself, which a reader of int64 cannot hold.
func Within(n int64) int64 {
	return pairs(n, 2)
}

// Reading is a meter whose fields feed the pmf.
type Reading struct {
	Count int
	Rate  float64
}

// Chance is a method that returns Poisson's value at its fields.
func (r Reading) Chance() float64 { // want Chance:`wrong for some r`
	return Poisson(r.Count, r.Rate) // want `Chance returns Poisson\(r\.Count, r\.Rate\)'s value, which is wrong from k = 171 \(reported at wrongcallee/callers\.go:26\); r\.Count, passed as k, is not bounded here`
}

// Small bounds k below the point where Poisson breaks: silent.
func Small(k int, lambda float64) float64 {
	if k < 0 || k > 150 {
		return 0
	}
	return Poisson(k, lambda)
}

// Checked falls back to the log form where the term is not finite:
// silent.
func Checked(k int, lambda float64) float64 { // want Checked:`value \(p1\)\^\(p0\)·exp\(-p1\)/Γ\(p0 \+ 1\), wrong once p0 ≥ 171`
	p := Poisson(k, lambda)
	if math.IsInf(p, 0) || math.IsNaN(p) {
		lg, _ := math.Lgamma(float64(k + 1))
		return math.Exp(float64(k)*math.Log(lambda) - lambda - lg)
	}
	return p
}

// Fixed passes constants below the point where Poisson breaks: silent.
func Fixed() float64 {
	return Poisson(12, 3.5)
}

// Allowed's term is accepted as it is by a directive, so its callers are
// silent too.
func Allowed(k int, lambda float64) float64 { // want Allowed:`value \(p1\)\^\(p0\)·exp\(-p1\)/Γ\(p0 \+ 1\), wrong once p0 ≥ 171`
	//overfact:allow the desk's counts stay below a hundred
	return math.Pow(lambda, float64(k)) * math.Exp(-lambda) / fact(k)
}

// AllowedTail returns Allowed's value: silent.
func AllowedTail(k int, lambda float64) float64 { // want AllowedTail:`value \(p1\)\^\(p0\)·exp\(-p1\)/Γ\(p0 \+ 1\), wrong once p0 ≥ 171`
	return Allowed(k, lambda)
}

// Factorial returns fact's value, which is wrong only where n! leaves
// float64 too: silent.
func Factorial(n int) float64 { // want Factorial:`value 2·Γ\(p0 \+ 1\), wrong once p0 ≥ 171`
	return 2 * fact(n)
}

// Seats returns kit.Arrangements' value from another package.
func Seats(n int) float64 { // want Seats:`value Γ\(p0 \+ 1\)/Γ\(p0 - 2\), wrong once p0 ≥ 171 or p0 - 3 ≥ 171` Seats:`wrong for n ≥ 171`
	return kit.Arrangements(n, 3) // want `Seats returns kit\.Arrangements\(n, 3\)'s value, which is wrong`
}

// FewSeats bounds the guests: silent.
func FewSeats(n int) float64 {
	if n > 100 {
		n = 100
	}
	return kit.Arrangements(n, 3)
}
