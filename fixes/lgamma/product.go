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
	// under: some step of v was below the normal range where the
	// product was too; v is the float64 value there, but with bits lost,
	// so a step that brings it back into the normal range loses it.
	under bool
	// zero: a factor is a count the code computes as an exact integer
	// and is 0 (CountProduct), so that the product is ±0 whatever the
	// other factors' float64 values, unless one of them is NaN (nan).
	zero, nan bool
}

// ProductOf returns the product of the one factor x.
//
// Special cases are:
//
//	ProductOf(±0) holds ±0 (log −Inf)
//	ProductOf(±Inf) holds ±Inf (log +Inf)
//	ProductOf(NaN) holds NaN
func ProductOf(x float64) Product {
	return Product{v: x, l: ddLog(dd{math.Abs(x), 0}), neg: math.Signbit(x), nan: math.IsNaN(x)}
}

// CountProduct returns the product of the one factor v, a count the
// code computes as an exact integer (a binomial function's value taken
// from the float helper of its form): where v is 0, every product it is
// a factor of is ±0, the sign of the other factors, whatever their
// float64 values. The code's other factors are float64 values of real
// numbers, ±Inf where such a number left float64 while it is finite
// (1 − q^i for q = −2.5, i = 1100), so 0·Inf, NaN in float64, is 0 in
// the product the code means: C(5, 100)·(1 − q^i)^100·(q^i)^−95 is 0.
// A NaN factor stays NaN.
//
// Special cases are:
//
//	CountProduct(0).Mul(p) holds ±0 for every p not holding NaN
//	CountProduct(v) is ProductOf(v) for v ≠ 0
func CountProduct(v float64) Product {
	p := ProductOf(v)
	p.zero = v == 0
	return p
}

// settleZero makes r ±0 where it has an exact zero count among its
// factors and no NaN factor (CountProduct).
func (r Product) settleZero() Product {
	if r.zero && !r.nan {
		r.v, r.l, r.lost, r.under = math.Copysign(0, boolSign(r.neg)), dd{math.Inf(-1), 0}, false, false
	}
	return r
}

// boolSign is −1 for neg, +1 otherwise.
func boolSign(neg bool) float64 {
	if neg {
		return -1
	}
	return 1
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
	return Product{v: v, l: ddLog(dd{math.Abs(x), 0}).mulF(p), neg: x < 0 && math.Mod(p, 2) != 0}.mark(false)
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
	return Product{v: v, l: lnAbsGammaDD(a), neg: GammaSign(a) < 0}.mark(false)
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
	return Product{v: v, l: dd{x, 0}}.mark(false)
}

// FactorialProduct returns the product holding n!, whose float64 value
// v the code formed itself (a factorial function's result, +Inf past
// 170!), with ln n! beside it, so that a factorial past float64 keeps
// its value in a product whose other factors bring it back. n is a
// count as a float64; where it is no integer ≥ 0 (a function that
// takes fractions or negative counts computes something else there) the
// product holds v alone, as ProductOf(v) does.
//
// Special cases are:
//
//	FactorialProduct(v, n) holds v alone for n < 0, a fraction, ±Inf or NaN
//	FactorialProduct(v, n) holds NaN for v NaN
func FactorialProduct(v, n float64) Product {
	if n < 0 || n != math.Trunc(n) || math.IsInf(n, 0) || math.IsNaN(v) {
		return ProductOf(v)
	}
	return Product{v: v, l: lnAbsGammaDD(n + 1)}.mark(false)
}

// ChooseProduct returns the product holding C(n, k), whose float64
// value v the code formed itself (a binomial function's result, +Inf
// where its running product left float64), with ln C(n, k) =
// ln n! − ln k! − ln (n−k)! beside it, so that a binomial past float64
// keeps its value in a product or a sum (Sum) that brings it back. n
// and k are counts as float64s; where they are not integers with
// 0 ≤ k ≤ n (a function that takes fractions or k > n computes
// something else there) the product holds v alone, as ProductOf(v) does.
//
// Special cases are:
//
//	ChooseProduct(v, n, k) holds v alone for k < 0, k > n, a fraction, ±Inf or NaN
//	ChooseProduct(v, n, k) holds NaN for v NaN
func ChooseProduct(v, n, k float64) Product {
	if k < 0 || k > n || n != math.Trunc(n) || k != math.Trunc(k) || math.IsInf(n, 0) || math.IsNaN(v) {
		return ProductOf(v)
	}
	return Product{v: v, l: lnAbsGammaDD(n + 1).sub(lnAbsGammaDD(k + 1)).sub(lnAbsGammaDD(n - k + 1))}.mark(false)
}

// Mul returns the product p·q; its float64 value is p's times q's, as
// the expression p * q forms it.
func (p Product) Mul(q Product) Product {
	r := Product{v: p.v * q.v, l: p.l.add(q.l), neg: p.neg != q.neg, lost: p.lost || q.lost, zero: p.zero || q.zero, nan: p.nan || q.nan}
	return r.mark(p.under || q.under).settleZero()
}

// Quo returns the quotient p/q; its float64 value is p's over q's, as
// the expression p / q forms it.
func (p Product) Quo(q Product) Product {
	// An exact zero count in the divisor is a division by zero, which
	// float64 answers.
	r := Product{v: p.v / q.v, l: p.l.sub(q.l), neg: p.neg != q.neg, lost: p.lost || q.lost, zero: p.zero && !q.zero, nan: p.nan || q.nan}
	return r.mark(p.under || q.under).settleZero()
}

// MulFloat returns p·x, p.Mul(ProductOf(x)).
func (p Product) MulFloat(x float64) Product { return p.Mul(ProductOf(x)) }

// QuoFloat returns p/x, p.Quo(ProductOf(x)).
func (p Product) QuoFloat(x float64) Product { return p.Quo(ProductOf(x)) }

// Sqrt returns the square root of the product: math.Sqrt of its float64
// value, as math.Sqrt(p) forms it, and half its logarithm, so that a
// product past float64 whose root is not, 2^n·n! in 1/√(2^n·n!·√π),
// keeps its value.
//
// Special cases are (as math.Sqrt's):
//
//	Sqrt of a product holding ±0 holds ±0
//	Sqrt of a product holding +Inf holds +Inf where the product overflows
//	Sqrt of a negative product holds NaN, where its float64 value is −0
//	    because a step left float64 too (−1/(n+l)! for n+l ≥ 171): the
//	    product is negative, not −0
//	Sqrt of a product holding NaN holds NaN; one whose float64 value is
//	    NaN only because its steps left float64 (+Inf/+Inf for
//	    (l+m)!/(l+m)! past 170!) holds the root of its logarithm's value
func (p Product) Sqrt() Product {
	if p.neg && (p.v != 0 || p.lost || p.under) || p.nan || math.IsNaN(p.v) && !p.lost {
		return ProductOf(math.NaN())
	}
	r := Product{v: math.Sqrt(p.v), l: p.l.mulF(0.5), neg: p.neg, lost: p.lost, zero: p.zero, nan: p.nan}
	return r.mark(p.under)
}

// Neg returns −p.
func (p Product) Neg() Product {
	p.v, p.neg = -p.v, !p.neg
	return p
}

// Abs returns |p|: math.Abs of its float64 value, as math.Abs(p) forms
// it, and the same logarithm.
func (p Product) Abs() Product {
	p.v, p.neg = math.Abs(p.v), false
	return p
}

// Less reports whether p < q: where both products' float64 values are
// normal float64s, or zeros, that the steps forming them kept, the
// comparison p < q of those values, bit for bit the code's own (a NaN
// the product is included); elsewhere, where a value is ±Inf, 0 or
// subnormal as float64 while the product is not, or both products
// left float64 together (+Inf < +Inf is false, as 1e400 < 1e420 is
// not), the comparison of the products by their signs and logarithms.
// Code that stops a series once its term no longer changes the sum,
// term < sum*1e-16, so stops where the sum is past float64 as the
// exact arithmetic does, and not on the first trip that makes the
// float64 sum +Inf.
//
// Special cases are:
//
//	Less is false where either product is NaN
//	Less(p, q) is false for p and q both ±0, and for p and q both +Inf (−Inf) products that the logarithms do not tell apart
func (p Product) Less(q Product) bool {
	if p.plain() && q.plain() || !p.lost && !q.lost && (math.IsNaN(p.v) || math.IsNaN(q.v)) {
		return p.v < q.v
	}
	if p.nan || q.nan || math.IsNaN(p.l.hi) || math.IsNaN(q.l.hi) || math.IsNaN(p.v) && !p.lost || math.IsNaN(q.v) && !q.lost {
		return false
	}
	ps, qs := p.signum(), q.signum()
	if ps != qs {
		return ps < qs
	}
	c := cmpDD(p.l, q.l)
	if ps < 0 {
		return c > 0
	}
	return ps > 0 && c < 0
}

// plain reports whether the product's float64 value is the value the
// code forms and a normal float64 or a zero the product is.
func (p Product) plain() bool {
	a := math.Abs(p.v)
	return !p.lost && (a >= 0x1p-1022 && a <= math.MaxFloat64 || a == 0 && math.IsInf(p.l.hi, -1))
}

// signum is −1, 0 or +1 as the product is negative, zero or positive.
func (p Product) signum() int {
	switch {
	case math.IsInf(p.l.hi, -1) || p.zero:
		return 0
	case p.neg:
		return -1
	}
	return 1
}

// cmpDD compares two double-double numbers: −1, 0 or +1.
func cmpDD(a, b dd) int {
	switch {
	case a.hi < b.hi || a.hi == b.hi && a.lo < b.lo:
		return -1
	case a.hi > b.hi || a.hi == b.hi && a.lo > b.lo:
		return 1
	}
	return 0
}

// Float64 returns the value of the product.
//
// Where every step that formed the product's float64 value stayed a
// normal float64, or was the zero, infinity or NaN the exact product
// is, or was below (above) the normal range where the exact product was
// too and stayed there, Float64 returns that value, bit for bit what the
// same arithmetic on float64 gives; elsewhere it returns e^ln|p| with the product's
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

// Log returns the natural logarithm of the product.
//
// Where the product's float64 value is a normal positive float64, Log
// returns math.Log of it, bit for bit what the code's math.Log gives;
// where that value left float64 (+Inf for 171! or C(1100, 550), 0 below
// the range) while the product is positive, the carried logarithm,
// within a few ulps of the logarithm of the product of the factors as
// given; elsewhere (a negative or NaN product) math.Log of the value.
//
// Special cases are:
//
//	Log of a product holding 0 is −Inf
//	Log of a negative product is NaN
func (p Product) Log() float64 {
	if p.logOfFloat() {
		return math.Log(p.Float64())
	}
	return p.l.float()
}

// Log2 returns the base-2 logarithm of the product, as Log does
// (math.Log2 of its float64 value where Log takes math.Log).
func (p Product) Log2() float64 {
	if p.logOfFloat() {
		return math.Log2(p.Float64())
	}
	return logIn(p.l, lnTwo)
}

// Log10 returns the base-10 logarithm of the product, as Log does
// (math.Log10 of its float64 value where Log takes math.Log).
func (p Product) Log10() float64 {
	if p.logOfFloat() {
		return math.Log10(p.Float64())
	}
	return logIn(p.l, lnTen)
}

// logOfFloat reports whether the product's logarithm is its float64
// value's own: a normal positive value, or no positive finite
// logarithm carried.
func (p Product) logOfFloat() bool {
	v := p.Float64()
	return v >= 0x1p-1022 && v <= math.MaxFloat64 || p.neg || math.IsNaN(p.l.hi) || math.IsInf(p.l.hi, 0)
}

// lnMinNormal and lnMax bound ln|x| over the normal float64 range:
// ln 2^-1022 and ln MaxFloat64 (rounded outward).
const (
	lnMinNormal = -708.3964185322641
	lnMax       = 709.782712893384
)

// mark sets r.lost where r's float64 value is not the product's (see
// settled), and r.under where it is below the normal range with the
// product; under says whether a factor was, so that a value brought
// back into the normal range from there counts as lost.
func (r Product) mark(under bool) Product {
	a := math.Abs(r.v)
	normal := a >= 0x1p-1022 && a <= math.MaxFloat64
	switch {
	case settled(r.v, r.l):
		r.lost = r.lost || under && normal
	case a < 0x1p-1022 && r.l.hi < lnMinNormal:
		r.under = true // 0 or subnormal where the product is too
	case math.IsInf(r.v, 0) && r.l.hi > lnMax:
		// ±Inf where the product overflows too: the value to return.
	default:
		r.lost = true
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
