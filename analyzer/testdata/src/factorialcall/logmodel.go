package factorialcall

import "math"

// Logarithms of a float binomial coefficient a method forms as a running
// product over its receiver's fields: the product is +Inf once the
// coefficient passes float64, from C(1030, 515) on (C(1029, 514) ≈
// 1.43e308 is the last central one below 2^1024, math/big), while its
// logarithm is about 710.

// Standings is a season's standings: Teams teams sharing Points points.
type Standings struct {
	Teams  int
	Points int
}

// Orders counts the ways to share the points, C(Points+Teams−1,
// Teams−1); each partial product is a smaller count.
func (t Standings) Orders() float64 { // want Orders:`value Γ\(recv\.Teams \+ recv\.Points\)/\(Γ\(recv\.Teams\)·Γ\(recv\.Points \+ 1\)\), a running product`
	w := 1.0
	for i := 1; i <= t.Points; i++ {
		w *= float64(t.Teams-1+i) / float64(i)
	}
	return w
}

// Surprise is log2 of Orders: +Inf where Orders is.
func (t Standings) Surprise() float64 { // want Surprise:`wrong for some t`
	return math.Log2(t.Orders()) // want `math\.Log2 of t\.Orders\(\), whose value is C\(t\.Teams \+ t\.Points - 1, t\.Teams - 1\): it overflows to \+Inf for t\.Teams \+ t\.Points - 1 ≥ 1030 at t\.Teams - 1 = \(t\.Teams \+ t\.Points - 1\)/2`
}

// Entropy is the natural logarithm of Orders.
func (t Standings) Entropy() float64 { // want Entropy:`value ln`
	return math.Log(t.Orders()) // want `math\.Log of t\.Orders\(\), whose value is C`
}

// SmallSurprise caps teams and points at 500: silent.
func (t Standings) SmallSurprise() float64 {
	if t.Teams > 500 || t.Points > 500 || t.Teams < 1 || t.Points < 0 {
		return 0
	}
	return math.Log2(t.Orders())
}

// FewPoints caps the points at 3, so the coefficient C(n, 3) stays far
// below float64's limit for any int n: silent.
func (t Standings) FewPoints() float64 { // want FewPoints:`value ln`
	if t.Points > 3 {
		return 0
	}
	return math.Log(t.Orders())
}

// TieShare is C(2n, n)/4^n as a running product of ratios below 1, no
// binomial coefficient: its logarithm is silent.
func TieShare(n int) float64 { // want TieShare:`value ln Γ\(p0 \+ 1/2\)/\(√π·Γ\(p0 \+ 1\)\)`
	r := 1.0
	for i := 1; i <= n; i++ {
		r *= float64(2*i-1) / float64(2*i)
	}
	return math.Log(r)
}
