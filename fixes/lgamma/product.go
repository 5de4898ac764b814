package lgamma

// Products carried in log space beside float64 arithmetic: the parts of
// a series term that code keeps in running products of their own,
//
//	pw *= half * half; f1 *= float64(n + k); f2 *= float64(k)
//	sum += pw / (f1 * f2)                      // Bessel I_n
//
// leave float64 one by one (pw reaches +Inf, f1 and f2 too), and the
// term becomes +Inf, 0 or NaN where it is finite. A Product forms the
// same float64 value the code forms, operation by operation, and beside
// it the logarithm of the magnitude in double-double and the sign; it
// answers the float64 value wherever every step of it stayed a normal
// float64 (or the zero, infinity or NaN the exact product is), and the
// exponential of the logarithm elsewhere.

import "math"

// A Product is a product of float64 factors: the float64 value formed
// as the code forms it, and the natural logarithm of its magnitude
// (double-double) with its sign. Make one with ProductOf, PowProduct,
// GammaProduct or ExpProduct; the zero Product holds 0 as if it had lost its range
// and is not a product of anything.
type Product struct {
	v    float64 // the product as float64 arithmetic forms it
	l    dd      // ln of its magnitude: −Inf for a zero factor, +Inf for an infinite one
	neg  bool    // the sign of the product (of a zero or infinity too)
	lost bool    // some step of v left the normal range where the product did not
}

// ProductOf returns the product of the one factor x.
//
// Special cases are:
//
//	ProductOf(±0) holds ±0 (log −Inf)
//	ProductOf(±Inf) holds ±Inf (log +Inf)
//	ProductOf(NaN) holds NaN
func ProductOf(x float64) Product {
	return Product{v: x, l: ddLog(dd{math.Abs(x), 0}), neg: math.Signbit(x)}
}

// PowProduct returns the product holding x^p: math.Pow(x, p) and
// p·ln|x|, so that a power past float64 keeps its value in a product
// whose other factors bring it back.
//
// Special cases are (as math.Pow's):
//
//	PowProduct(x, p) holds math.Pow(x, p) where x is ±0 or ±Inf, p is
//	    ±Inf, p is 0 or either is NaN
//	PowProduct(x, p) holds NaN for finite x < 0 and finite p not an integer
func PowProduct(x, p float64) Product {
	v := math.Pow(x, p)
	if p == 0 || x == 0 || math.IsInf(x, 0) || math.IsInf(p, 0) || math.IsNaN(v) {
		return ProductOf(v)
	}
	r := Product{v: v, l: ddLog(dd{math.Abs(x), 0}).mulF(p), neg: x < 0 && math.Mod(p, 2) != 0}
	r.lost = !settled(r.v, r.l)
	return r
}

// GammaProduct returns the product holding Γ(a): math.Gamma(a) and
// ln|Γ(a)|, so that a Gamma value past float64 keeps its value in a
// product whose other factors bring it back.
//
// Special cases are (as math.Gamma's):
//
//	GammaProduct(a) holds math.Gamma(a) where a is ±0, a negative
//	    integer, ±Inf or NaN
func GammaProduct(a float64) Product {
	v := math.Gamma(a)
	if a == 0 || isPole(a) || math.IsInf(a, 0) || math.IsNaN(a) {
		return ProductOf(v)
	}
	r := Product{v: v, l: lnAbsGammaDD(a), neg: GammaSign(a) < 0}
	r.lost = !settled(r.v, r.l)
	return r
}

// ExpProduct returns the product holding e^x: math.Exp(x) and x, so
// that an exponential below or above float64 (e^-800 before a factor of
// e^700) keeps its value in a product whose other factors bring it back.
//
// Special cases are (as math.Exp's):
//
//	ExpProduct(+Inf) holds +Inf
//	ExpProduct(-Inf) holds 0
//	ExpProduct(NaN) holds NaN
func ExpProduct(x float64) Product {
	v := math.Exp(x)
	if math.IsInf(x, 0) || math.IsNaN(x) {
		return ProductOf(v)
	}
	r := Product{v: v, l: dd{x, 0}}
	r.lost = !settled(r.v, r.l)
	return r
}

// Mul returns the product p·q; its float64 value is p's times q's, as
// the expression p * q forms it.
func (p Product) Mul(q Product) Product {
	r := Product{v: p.v * q.v, l: p.l.add(q.l), neg: p.neg != q.neg}
	r.lost = p.lost || q.lost || !settled(r.v, r.l)
	return r
}

// Quo returns the quotient p/q; its float64 value is p's over q's, as
// the expression p / q forms it.
func (p Product) Quo(q Product) Product {
	r := Product{v: p.v / q.v, l: p.l.sub(q.l), neg: p.neg != q.neg}
	r.lost = p.lost || q.lost || !settled(r.v, r.l)
	return r
}

// MulFloat returns p·x, p.Mul(ProductOf(x)).
func (p Product) MulFloat(x float64) Product { return p.Mul(ProductOf(x)) }

// QuoFloat returns p/x, p.Quo(ProductOf(x)).
func (p Product) QuoFloat(x float64) Product { return p.Quo(ProductOf(x)) }

// Neg returns −p.
func (p Product) Neg() Product {
	p.v, p.neg = -p.v, !p.neg
	return p
}

// Float64 returns the value of the product.
//
// Where every step that formed the product's float64 value stayed a
// normal float64, or was the zero, infinity or NaN the exact product
// is, Float64 returns that value, bit for bit what the same arithmetic
// on float64 gives; elsewhere it returns e^ln|p| with the product's
// sign, which is ±Inf or 0 only where the product itself leaves
// float64.
//
// Accuracy: where the float64 steps left their range, within a few
// ulps of the product of the factors as given (each factor's logarithm
// is carried to about 2^-104 relative).
func (p Product) Float64() float64 {
	if !p.lost {
		return p.v
	}
	if math.IsNaN(p.l.hi) {
		return math.NaN()
	}
	r := expOf(p.l)
	if p.neg {
		r = -r
	}
	return r
}

// settled reports whether v, formed by float64 arithmetic, is the
// product whose log-magnitude is l: a normal float64 for a finite l,
// the zero, infinity or NaN an infinite or NaN l says it is.
func settled(v float64, l dd) bool {
	a := math.Abs(v)
	switch {
	case math.IsNaN(l.hi):
		return math.IsNaN(v)
	case math.IsInf(l.hi, -1):
		return a == 0
	case math.IsInf(l.hi, 1):
		return math.IsInf(v, 0)
	}
	return a >= 0x1p-1022 && a <= math.MaxFloat64
}
