package ranges

import (
	"go/token"
	"math"
	"math/bits"
)

// arith applies a Go binary operator to operands of kind k. Integer
// operations follow Go's wrapping semantics: when any value of the exact
// result may fall outside the type, the result is the whole type. With
// noWrap, the extreme int64 bounds are read as unbounded rather than as
// the values MinInt64 and MaxInt64, so an unbounded operand does not by
// itself force a wrap.
func arith(op token.Token, x, y Interval, k numKind, noWrap bool) Interval {
	if x.IsEmpty() || y.IsEmpty() {
		return Empty()
	}
	if !k.ok {
		return Top()
	}
	if k.float {
		return floatArith(op, x, y, k)
	}
	inf := noWrap || k.u64
	if k.u64 && (x.Hi == posInf || y.Hi == posInf) {
		switch op {
		case token.ADD, token.MUL, token.SHL, token.SUB, token.XOR, token.OR:
			// Values past MaxInt64 are folded into +inf, so a wrap
			// cannot be ruled out.
			return k.top
		}
	}
	r, ok := intArith(op, x, y, inf)
	if !ok || r.Lo < k.safe.Lo || r.Hi > k.safe.Hi {
		return k.top
	}
	return r
}

func intArith(op token.Token, x, y Interval, inf bool) (Interval, bool) {
	switch op {
	case token.ADD:
		lo, ok1 := addB(x.Lo, y.Lo, inf, negInf)
		hi, ok2 := addB(x.Hi, y.Hi, inf, posInf)
		return Interval{lo, hi}, ok1 && ok2
	case token.SUB:
		lo, ok1 := subB(x.Lo, y.Hi, inf, negInf)
		hi, ok2 := subB(x.Hi, y.Lo, inf, posInf)
		return Interval{lo, hi}, ok1 && ok2
	case token.MUL:
		return cornersOK(x, y, func(a, b int64) (int64, bool) { return mulB(a, b, inf) })
	case token.QUO:
		return divideOK(x, y, inf)
	case token.REM:
		return remainder(x, y), true
	case token.SHL:
		return shiftLeft(x, y, inf)
	case token.SHR:
		return shiftRight(x, y), true
	case token.AND:
		return bitAnd(x, y)
	case token.OR, token.XOR:
		return bitOr(op, x, y)
	case token.AND_NOT:
		if x.Lo >= 0 {
			return Interval{0, x.Hi}, true
		}
	}
	return Top(), false
}

// cornersOK is the hull of op over the corners of x×y; it fails when
// any corner does.
func cornersOK(x, y Interval, op func(a, b int64) (int64, bool)) (Interval, bool) {
	out := Empty()
	for _, a := range [2]int64{x.Lo, x.Hi} {
		for _, b := range [2]int64{y.Lo, y.Hi} {
			v, ok := op(a, b)
			if !ok {
				return Top(), false
			}
			out = out.Join(Point(v))
		}
	}
	return out, true
}

// shiftLeft multiplies by 2^c; x<<c is monotone in x, and in c for a
// fixed sign of x, so corners bound it. Negative counts panic.
func shiftLeft(x, y Interval, inf bool) (Interval, bool) {
	c := y.Meet(Interval{0, posInf})
	if c.IsEmpty() {
		return Empty(), true
	}
	if c.Hi > 62 {
		return Top(), false
	}
	return cornersOK(x, c, func(a, b int64) (int64, bool) { return mulB(a, int64(1)<<b, inf) })
}

// shiftRight is floor division by 2^c; counts of 63 or more give 0 or
// −1. An infinite end stays infinite: for 64-bit unsigned values +inf
// stands for more than MaxInt64.
func shiftRight(x, y Interval) Interval {
	c := y.Meet(Interval{0, posInf})
	if c.IsEmpty() {
		return Empty()
	}
	c = Interval{min(c.Lo, 63), min(c.Hi, 63)}
	r, _ := cornersOK(x, c, func(a, b int64) (int64, bool) { return a >> b, true })
	if x.Lo == negInf {
		r.Lo = negInf
	}
	if x.Hi == posInf {
		r.Hi = posInf
	}
	return r
}

func bitAnd(x, y Interval) (Interval, bool) {
	switch {
	case x.Lo >= 0 && y.Lo >= 0:
		return Interval{0, min(x.Hi, y.Hi)}, true
	case x.Lo >= 0:
		return Interval{0, x.Hi}, true
	case y.Lo >= 0:
		return Interval{0, y.Hi}, true
	}
	return Top(), false
}

// bitOr bounds | and ^ of non-negative operands by the next power of two.
func bitOr(op token.Token, x, y Interval) (Interval, bool) {
	if x.Lo < 0 || y.Lo < 0 {
		return Top(), false
	}
	m := max(x.Hi, y.Hi)
	hi := int64(posInf)
	if m != posInf {
		hi = int64(uint64(1)<<bits.Len64(uint64(m)) - 1)
	}
	lo := int64(0)
	if op == token.OR {
		lo = max(x.Lo, y.Lo)
	}
	return Interval{lo, hi}, true
}

// floatArith bounds float arithmetic; operand bounds are integers and
// results are rounded outwards. Bounds past 2^mant, where floats stop
// holding every integer, are treated as infinite.
func floatArith(op token.Token, x, y Interval, k numKind) Interval {
	var r Interval
	switch op {
	case token.ADD:
		r = x.Add(y)
	case token.SUB:
		r = x.Sub(y)
	case token.MUL:
		r = x.Mul(y)
	case token.QUO:
		if y.Contains(0) {
			return Top()
		}
		r = floatQuo(x, y)
	default:
		return Top()
	}
	return clampFloat(r, k)
}

func floatQuo(x, y Interval) Interval {
	lo, hi := math.Inf(1), math.Inf(-1)
	for _, a := range [2]int64{x.Lo, x.Hi} {
		for _, b := range [2]int64{y.Lo, y.Hi} {
			q := toFloat(a) / toFloat(b)
			if math.IsNaN(q) { // ∞/∞ lies between the other corners
				continue
			}
			lo, hi = min(lo, q), max(hi, q)
		}
	}
	if lo > hi {
		return Top()
	}
	return Interval{floorB(lo), ceilB(hi)}
}

// clampFloat widens float bounds beyond the exactly representable
// integers to infinity, so rounding can never step past a bound.
func clampFloat(r Interval, k numKind) Interval {
	if r.IsEmpty() {
		return r
	}
	lim := int64(1) << k.mant
	if r.Lo < -lim {
		r.Lo = negInf
	}
	if r.Hi > lim {
		r.Hi = posInf
	}
	return r
}

// convert returns the range of a conversion of x from kind from to kind to.
func convert(x Interval, from, to numKind) Interval {
	if x.IsEmpty() {
		return x
	}
	if !to.ok || !from.ok {
		return Top()
	}
	if from.u64 && x.Hi == posInf && !to.u64 {
		return to.top
	}
	if to.float {
		return clampFloat(x, to)
	}
	if from.float && !x.Bounded() {
		// Out-of-range float to integer conversions are implementation-defined.
		return to.top
	}
	// Truncation toward zero keeps integer bounds.
	if x.Lo < to.safe.Lo || x.Hi > to.safe.Hi {
		return to.top
	}
	return x
}
