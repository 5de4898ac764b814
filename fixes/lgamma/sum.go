package lgamma

// Sums whose logarithm is the value wanted: the number of ways to
// capitalise up to k of n letters, in bits,
//
//	for i := 0.0; i <= k; i++ { s += choose(n, i) }
//	bits := math.Log2(s)
//
// are +Inf once a term or the running sum passes float64 (from
// C(1030, 515) on), although log2 of the sum is at most n. A Sum forms
// the same float64 sum the code forms, term by term, and beside it the
// logarithm of the sum of the terms' magnitudes, each term's logarithm
// taken from its Product (ln(e^a + e^b) = a + ln(1 + e^(b−a)) for
// a ≥ b, common practice); its Log, Log2 and Log10 answer the float64
// sum's logarithm wherever that sum is a normal positive float64, and
// the carried logarithm elsewhere.

import "math"

// A Sum is a sum of terms: the float64 sum the code forms, and the
// natural logarithm of the sum of the terms when no term is negative.
// Make one with SumOf; the zero Sum is the empty sum 0.
type Sum struct {
	v float64 // the sum as float64 arithmetic forms it
	l dd      // ln of the sum of the terms: −Inf for 0
	// set reports that l holds a value (the zero Sum holds 0).
	set bool
	// bad: a term was negative or NaN, so l says nothing.
	bad bool
}

// SumOf returns the sum holding the one term x, the sum's start value.
//
// Special cases are:
//
//	SumOf(x) carries no logarithm for x < 0 or NaN (Log is math.Log of the float64 sum)
func SumOf(x float64) Sum {
	return Sum{}.Add(ProductOf(x))
}

// Add returns s + p: its float64 value is s's plus p's (p.Float64(),
// the code's own value wherever p's steps stayed in range), and its
// logarithm carries p's.
func (s Sum) Add(p Product) Sum {
	r := Sum{v: s.v + p.Float64(), l: s.l, set: true, bad: s.bad}
	if !s.set {
		r.l = dd{math.Inf(-1), 0}
	}
	switch {
	case r.bad:
	case p.neg && !math.IsInf(p.l.hi, -1), math.IsNaN(p.l.hi):
		r.bad = true // a negative or NaN term: no logarithm of the sum
	default:
		r.l = logAddExp(r.l, p.l)
	}
	return r
}

// AddFloat returns s + x, s.Add(ProductOf(x)).
func (s Sum) AddFloat(x float64) Sum { return s.Add(ProductOf(x)) }

// Product returns the sum as a Product, for a prefactor or a ratio that
// brings a sum past float64 back into range,
//
//	math.Exp(-lt) * sum        →  ExpProduct(-lt).Mul(sumLog.Product()).Float64()
//	last / (sum + last)        →  lastLog.Quo(sumLog.Add(lastLog).Product()).Float64()
//
// Its float64 value is the float64 sum, and its logarithm the one the
// Sum carries: Product.Float64 of the product, or of products formed
// from it, is the float64 arithmetic's own wherever the sum and the
// other factors stayed normal float64s.
//
// Special cases are:
//
//	Product of the empty sum holds 0
//	Product of a sum with a negative or NaN term holds the float64 sum alone, as ProductOf
func (s Sum) Product() Product {
	if !s.set || s.bad || math.IsNaN(s.l.hi) {
		return ProductOf(s.v)
	}
	return Product{v: s.v, l: s.l}.mark(false)
}

// logAddExp returns ln(e^a + e^b).
func logAddExp(a, b dd) dd {
	if a.hi < b.hi {
		a, b = b, a
	}
	if math.IsInf(b.hi, -1) || math.IsInf(a.hi, 1) {
		return a
	}
	return a.add(ddLog1p(ddExp(b.sub(a))))
}

// Float64 returns the sum as the code's float64 arithmetic forms it,
// each term's value as Product.Float64 gives it.
func (s Sum) Float64() float64 { return s.v }

// Log returns the natural logarithm of the sum.
//
// Where the float64 sum is a normal positive float64, or no logarithm
// is carried (a negative or NaN term), Log returns math.Log of the
// float64 sum, bit for bit; elsewhere (the sum or a term passed
// float64, or every term was below its range) it returns the carried
// logarithm, within a few ulps of the logarithm of the sum of the terms
// as given.
//
// Special cases are:
//
//	Log of the empty or zero sum is −Inf
func (s Sum) Log() float64 {
	if s.logOfFloat() {
		return math.Log(s.v)
	}
	return s.l.float()
}

// Log2 returns the base-2 logarithm of the sum, as Log does
// (math.Log2 of the float64 sum where Log takes math.Log).
func (s Sum) Log2() float64 {
	if s.logOfFloat() {
		return math.Log2(s.v)
	}
	return logIn(s.l, lnTwo)
}

// Log10 returns the base-10 logarithm of the sum, as Log does
// (math.Log10 of the float64 sum where Log takes math.Log).
func (s Sum) Log10() float64 {
	if s.logOfFloat() {
		return math.Log10(s.v)
	}
	return logIn(s.l, lnTen)
}

// logIn returns the logarithm l (a natural one) in the base whose
// natural logarithm is lnb; ±Inf stays as it is.
func logIn(l, lnb dd) float64 {
	if math.IsInf(l.hi, 0) {
		return l.hi
	}
	return l.div(lnb).float()
}

// lnTwo and lnTen are ln 2 and ln 10 in double-double.
var (
	lnTwo = dd{math.Ln2, lnTwoLo}
	lnTen = dd{math.Ln10, lnTenLo}
)

// logOfFloat reports whether the logarithm is the float64 sum's own.
func (s Sum) logOfFloat() bool {
	return !s.set || s.bad || s.v >= 0x1p-1022 && s.v <= math.MaxFloat64 || math.IsNaN(s.l.hi)
}

// lnTwoLo and lnTenLo are the low parts of ln 2 and ln 10 in
// double-double: ln 2 − float64(ln 2) and ln 10 − float64(ln 10)
// (computed with math/big in TestLnConstants).
const (
	lnTwoLo = 2.3190468138462996e-17
	lnTenLo = -2.1707562233822494e-16
)
