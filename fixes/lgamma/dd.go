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

// The three error-free transformations pass an overflow on as {±Inf, 0}
// rather than the NaN their error terms would compute, so that a result
// too large for float64 comes out as ±Inf.

// twoSum returns a+b exactly as a normalized dd (Knuth).
func twoSum(a, b float64) dd {
	s := a + b
	if math.IsInf(s, 0) {
		return dd{s, 0}
	}
	bb := s - a
	return dd{s, (a - (s - bb)) + (b - bb)}
}

// quickTwoSum is twoSum for |a| ≥ |b| (Dekker).
func quickTwoSum(a, b float64) dd {
	s := a + b
	if math.IsInf(s, 0) {
		return dd{s, 0}
	}
	return dd{s, b - (s - a)}
}

// twoProd returns a*b exactly as a dd, using a fused multiply-add.
func twoProd(a, b float64) dd {
	p := a * b
	if math.IsInf(p, 0) {
		return dd{p, 0}
	}
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

// ddUint converts n exactly, as ddInt does.
func ddUint(n uint64) dd {
	h := float64(n)
	if h >= 0x1p64 {
		// float64(n) rounded up to 2^64, which uint64 cannot hold.
		return dd{h, -float64(-n)}
	}
	if u := uint64(h); u >= n {
		return dd{h, -float64(u - n)}
	} else {
		return dd{h, float64(n - u)}
	}
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
	if math.Abs(a.hi) > 0x1p1000 && !math.IsInf(a.hi, 0) {
		// b·q1 ≈ a could round up to Inf. Scale both when b is large too,
		// so that a quotient near 1 keeps its low part; otherwise the
		// quotient is at least 2^936/|b| and scaling a alone is safe.
		if math.Abs(b.hi) > 0x1p900 {
			return a.scale(-128).div(b.scale(-128))
		}
		return a.scale(-64).div(b).scale(64)
	}
	// Two quotient digits leave an error near 2^-104 relative, far below
	// what any caller needs (Hida, Li and Bailey's "sloppy" division).
	q1 := a.hi / b.hi
	r := a.sub(b.mulF(q1))
	return quickTwoSum(q1, r.hi/b.hi)
}

func (a dd) divF(b float64) dd {
	if math.Abs(a.hi) > 0x1p1000 && !math.IsInf(a.hi, 0) {
		if math.Abs(b) > 0x1p900 {
			return a.scale(-128).divF(b * 0x1p-128)
		}
		return a.scale(-64).divF(b).scale(64)
	}
	q1 := a.hi / b
	p := twoProd(q1, b)
	q2 := (a.hi - p.hi - p.lo + a.lo) / b
	return quickTwoSum(q1, q2)
}

// float rounds to the nearest float64; the pair is normalized, so hi is it.
func (a dd) float() float64 { return a.hi + a.lo }

// ddExp returns e^a for finite a with |a.hi| < 709, to about 1e-20
// relative. Table-driven reduction (Tang, "Table-driven implementation
// of the exponential function in IEEE floating-point arithmetic", ACM
// TOMS 15, 1989): a = (64q + j)·ln2/64 + r with |r| ≤ ln2/128, so
// e^a = 2^q · 2^(j/64) · e^r, where 2^(j/64) comes from a generated
// double-double table and e^r − 1 = r + p needs only r in double-double;
// p = r²/2 + … is below 1.5e-5 and float64 suffices for it.
func ddExp(a dd) dd {
	if !(math.Abs(a.hi) < 709) {
		return dd{math.Exp(a.hi), 0} // out of range or NaN: callers go through expOf
	}
	k := math.Round(a.hi * (64 / ln2.hi))
	r := a.sub(twoProd(k, ln2.hi/64)).sub(twoProd(k, ln2.lo/64))
	x := r.hi
	p := x * x * (1.0/2 + x*(1.0/6+x*(1.0/24+x*(1.0/120+x*(1.0/720+x*(1.0/5040+x/40320))))))
	t := exp2Table[int(k)&63]
	return t.add(t.mul(r.addF(p))).scale(int(k) >> 6)
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
	case a.hi < -670:
		// Below e^-670 ≈ 2^-967 the low part of the double-double
		// would be subnormal and lose bits before the final rounding:
		// compute e^(a+64 ln2) and scale once. Where the result is
		// normal the scaling is exact; where it is subnormal it rounds
		// a second time, by at most half a float64 ulp of the scaled
		// value, far below the subnormal spacing.
		return math.Ldexp(ddExp(a.add(ln2.mulF(64))).float(), -64)
	case a.hi > 708:
		return math.Ldexp(ddExp(a.sub(ln2.mulF(64))).float(), 64)
	}
	return ddExp(a).float()
}

// ddLog returns ln a for a positive finite dd, to about 2^-104
// relative. Table-driven reduction (Tang, "Table-driven implementation
// of the logarithm function in IEEE floating-point arithmetic", ACM TOMS
// 16, 1990): a = 2^e·m with m in [1, 2), m = c·(1+u) with c = 1 + i/512
// and |u| ≤ 1/1024, ln(1+u) = 2·atanh(s) = 2s + 2s³/3 + 2s⁵/5 + … with
// s = u/(2+u) = (m−c)/(m+c), |s| < 2^-11. 2s and 2s³/3 are carried in
// double-double; the rest is below 2^-53·|s| and float64 suffices.
// Subnormal arguments are scaled by Frexp first, never passed to
// math.Log, whose result is inaccurate for them on some platforms.
func ddLog(a dd) dd {
	if !(a.hi > 0 && a.hi <= math.MaxFloat64) {
		return dd{math.Log(a.hi), 0} // ±Inf, NaN: the math package's answer
	}
	_, e := math.Frexp(a.hi)
	e--
	m := a.scale(-e)
	i := int(math.Round((m.hi - 1) * 512))
	c := 1 + float64(i)/512
	s := m.addF(-c).div(m.addF(c)) // u/(2+u) with u = m/c − 1
	x2 := s.hi * s.hi
	w := s.hi * x2 * x2 * (2.0/5 + x2*(2.0/7+x2*(2.0/9+x2*(2.0/11))))
	s3 := s.mul(s).mul(s).mul(twoThirds)
	r := logTable[i].add(s.mulF(2).add(s3).addF(w))
	if e == 0 {
		return r
	}
	return r.add(twoProd(float64(e), ln2.hi)).add(twoProd(float64(e), ln2.lo))
}

// twoThirds is 2/3 as a double-double: the error of the float64 2/3 is
// exactly (2 − 3·hi)/3, which FMA forms without rounding in the numerator.
var twoThirds = dd{2.0 / 3, math.FMA(-3, 2.0/3, 2) / 3}

// ddLog1p returns ln(1+x) for a dd x > −1. Where x is too small for
// 1+x to hold it without loss, the series x − x²/2 + x³/3 − … is
// summed instead (DLMF 4.6.1); it is used for the logarithm of a ratio
// near 1 whose deviation is known exactly.
func ddLog1p(x dd) dd {
	if math.Abs(x.hi) > 0x1p-20 {
		return ddLog(x.addF(1))
	}
	return log1pSeries(x)
}

// ddLog1pFast is ddLog1p with ddLogFast: about 2^-74 relative to the
// result (near 1, ddLogFast's reduction is exact and its error is
// relative to ln(1+x)).
func ddLog1pFast(x dd) dd {
	if math.Abs(x.hi) > 0x1p-20 {
		return ddLogFast(x.addF(1))
	}
	return log1pSeries(x)
}

// log1pSeries returns ln(1+x) for |x| ≤ 2^-20.
func log1pSeries(x dd) dd {
	// |x| ≤ 2^-20: x⁵/5 is below 2^-80·|x|, x⁶ below 2^-100·|x|.
	t := x.hi
	tail := t * t * t * (1.0/3 - t*(1.0/4-t*(1.0/5-t/6)))
	return x.sub(x.mul(x).mulF(0.5)).addF(tail)
}

// ddLogFast returns ln a for a positive finite dd to about 2^-74
// relative, about three times faster than ddLog. It is for the terms
// whose error the caller's result does not magnify: ln n in Stirling's
// formula for ln n! and ln Γ(z) at z ≥ 16, where n·ln n is about the
// size of the result. The reduction is exact instead of a division:
// a = 2^e·m, m in [1, 2], r an 11-bit approximation of 1/m from a table,
// u = m·r − 1 formed exactly by one FMA (|u| ≤ 2^-10 and u is a multiple
// of 2^-63, so it fits in 53 bits), and ln a = e·ln 2 − ln r + ln(1+u)
// with ln(1+u) = u − u²/2 + u³/3 − … (DLMF 4.6.1), u and u²/2 in
// double-double, the rest in float64 (the method of the exact reduction:
// Tang 1990 with the reciprocal table of, e.g., the CORE-MATH logarithms).
func ddLogFast(a dd) dd {
	hi, lo := a.hi, a.lo
	if !(hi >= 0x1p-1022 && hi <= math.MaxFloat64) {
		return ddLog(a) // subnormal, zero, negative, Inf or NaN
	}
	b := math.Float64bits(hi)
	e := int(b>>52) - 1023
	m := math.Float64frombits(b&(1<<52-1) | 1023<<52)
	i := int((b>>41)&0x7ff+1) >> 1
	r := logFastR[i]
	us := dd{math.FMA(m, r, -1), 0}
	if lo != 0 {
		us = twoSum(us.hi, lo*(m/hi)*r) // m/hi = 2^-e exactly
	}
	x := us.hi
	// ln(1+u) − u + u²/2 = u³/3 − u⁴/4 + … to u⁸/8 (u⁹/9 < 2^-93).
	tail := x * x * x * (1.0/3 - x*(1.0/4-x*(1.0/5-x*(1.0/6-x*(1.0/7-x/8)))))
	sq := twoProd(x, x)
	sq.lo += 2 * x * us.lo
	res := us.sub(dd{sq.hi * 0.5, sq.lo * 0.5}).addF(tail)
	res = logFastT[i].add(res)
	if e == 0 {
		return res
	}
	return res.add(twoProd(float64(e), ln2.hi)).addF(float64(e) * ln2.lo)
}
