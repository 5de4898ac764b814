package lgamma

// Double-double arithmetic: a value is the unevaluated sum hi+lo of two
// float64s with |lo| ≤ ulp(hi)/2, which carries about 106 bits. The
// error-free transformations are Knuth's TwoSum and the FMA form of
// Dekker's TwoProduct; the add, mul and div recipes follow Hida, Li and
// Bailey, "Library for double-double and quad-double arithmetic" (2007).
// The package needs them because ln n! and bd0 are differences of large,
// nearly equal terms whose float64 rounding alone would exceed 1 ulp.

import "math"

type dd struct{ hi, lo float64 }

// twoSum returns a+b exactly as a normalized dd (Knuth).
func twoSum(a, b float64) dd {
	s := a + b
	bb := s - a
	return dd{s, (a - (s - bb)) + (b - bb)}
}

// quickTwoSum is twoSum for |a| ≥ |b| (Dekker).
func quickTwoSum(a, b float64) dd {
	s := a + b
	return dd{s, b - (s - a)}
}

// twoProd returns a*b exactly as a dd, using a fused multiply-add.
func twoProd(a, b float64) dd {
	p := a * b
	return dd{p, math.FMA(a, b, -p)}
}

// ddInt converts n exactly: float64 keeps 53 bits, the remainder goes to lo.
func ddInt(n int64) dd {
	h := float64(n)
	if h >= 0x1p63 {
		// float64(n) rounded up to 2^63, which int64 cannot hold.
		return dd{h, -float64(uint64(1<<63) - uint64(n))}
	}
	return dd{h, float64(n - int64(h))}
}

func (a dd) add(b dd) dd {
	s := twoSum(a.hi, b.hi)
	t := twoSum(a.lo, b.lo)
	s = quickTwoSum(s.hi, s.lo+t.hi)
	return quickTwoSum(s.hi, s.lo+t.lo)
}

func (a dd) addF(b float64) dd {
	s := twoSum(a.hi, b)
	return quickTwoSum(s.hi, s.lo+a.lo)
}

func (a dd) neg() dd { return dd{-a.hi, -a.lo} }

func (a dd) sub(b dd) dd { return a.add(b.neg()) }

func (a dd) mul(b dd) dd {
	p := twoProd(a.hi, b.hi)
	return quickTwoSum(p.hi, p.lo+(a.hi*b.lo+a.lo*b.hi))
}

func (a dd) mulF(b float64) dd {
	p := twoProd(a.hi, b)
	return quickTwoSum(p.hi, p.lo+a.lo*b)
}

// scale multiplies by 2^e exactly (barring underflow).
func (a dd) scale(e int) dd { return dd{math.Ldexp(a.hi, e), math.Ldexp(a.lo, e)} }

func (a dd) div(b dd) dd {
	q1 := a.hi / b.hi
	r := a.sub(b.mulF(q1))
	q2 := r.hi / b.hi
	r = r.sub(b.mulF(q2))
	q3 := r.hi / b.hi
	return quickTwoSum(q1, q2).addF(q3)
}

func (a dd) divF(b float64) dd {
	q1 := a.hi / b
	p := twoProd(q1, b)
	q2 := (a.hi - p.hi - p.lo + a.lo) / b
	return quickTwoSum(q1, q2)
}

// float rounds to the nearest float64; the pair is normalized, so hi is it.
func (a dd) float() float64 { return a.hi + a.lo }

// ddExpm1Small returns e^r − 1 for |r| ≤ 2^-10 by its Taylor series;
// 10 terms leave a truncation error below 2^-110 relative.
func ddExpm1Small(r dd) dd {
	s := dd{1, 0}
	for n := 10.0; n >= 2; n-- {
		s = s.mul(r).divF(n).addF(1)
	}
	return s.mul(r)
}

// ddExp returns e^a for a finite, |a.hi| < 709. The argument is reduced
// as a = k·ln2 + r, then r/2^9 goes to the series and the result is
// squared nine times in the e^x−1 form (2t + t²) so no bits are lost to
// the leading 1 (the reduction of Hida, Li and Bailey's exp).
func ddExp(a dd) dd {
	k := math.Round(a.hi / ln2.hi)
	r := a.sub(twoProd(k, ln2.hi)).sub(twoProd(k, ln2.lo))
	t := ddExpm1Small(r.scale(-9))
	for i := 0; i < 9; i++ {
		t = t.mulF(2).add(t.mul(t))
	}
	return t.addF(1).scale(int(k))
}

// expOf rounds e^a to float64; it handles the ranges ddExp does not.
func expOf(a dd) float64 {
	switch {
	case math.IsNaN(a.hi):
		return math.NaN()
	case a.hi > 709.8:
		return math.Inf(1)
	case a.hi < -745.2:
		return 0
	case a.hi < -708:
		// Result is subnormal: compute e^(a+64 ln2) and scale once,
		// so the only rounding is the final one.
		return math.Ldexp(ddExp(a.add(ln2.mulF(64))).float(), -64)
	case a.hi > 708:
		return math.Ldexp(ddExp(a.sub(ln2.mulF(64))).float(), 64)
	}
	return ddExp(a).float()
}

// ddLog returns ln a for a positive finite dd. After the binary exponent
// is split off, one Newton step y + a·e^(−y) − 1 from y = math.Log
// doubles the number of correct bits (the method of Hida, Li and Bailey).
func ddLog(a dd) dd {
	_, e := math.Frexp(a.hi)
	m := a.scale(-e)
	y := dd{math.Log(m.hi), 0}
	y = y.add(m.mul(ddExp(y.neg())).addF(-1))
	if e == 0 {
		return y
	}
	return y.add(twoProd(float64(e), ln2.hi)).add(dd{float64(e) * ln2.lo, 0})
}
