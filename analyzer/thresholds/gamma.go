package thresholds

import "math"

// GammaFirstBad returns, for a float type, the smallest positive x of
// that type at which Γ(x) overflows it: for float64 the smallest float64
// with math.Gamma(x) = +Inf (about 171.6243769563027), for float32 the
// smallest float32 whose Γ(x), evaluated in float64, exceeds
// math.MaxFloat32 (about 35.04).
//
// Special cases are:
//
//	GammaFirstBad(t) = 0 for integer types
func GammaFirstBad(t Num) float64 {
	if !t.Float {
		return 0
	}
	return memo(cacheKey{shape: "gamma", t: t}, func() float64 {
		// Γ(F) = (F−1)! fits and Γ(F+1) = F! does not, where F is the
		// factorial threshold, so the answer lies in (F, F+1].
		f := float64(Factorial(t).FirstBad)
		if t.Bits == 32 {
			return float64(bisect32(float32(f), float32(f+1), func(x float32) bool {
				return math.Gamma(float64(x)) > math.MaxFloat32
			}))
		}
		return bisect64(f, f+1, func(x float64) bool { return math.IsInf(math.Gamma(x), 1) })
	})
}

// bisect64 returns the smallest float64 in (lo, hi] with bad(x), given
// bad(hi) and !bad(lo); positive floats are ordered like their bits.
func bisect64(lo, hi float64, bad func(float64) bool) float64 {
	l, h := int64(math.Float64bits(lo)), int64(math.Float64bits(hi))
	n := firstTrue(l, h, func(b int64) bool { return bad(math.Float64frombits(uint64(b))) })
	return math.Float64frombits(uint64(n))
}

// bisect32 is bisect64 over float32 values.
func bisect32(lo, hi float32, bad func(float32) bool) float32 {
	l, h := int64(math.Float32bits(lo)), int64(math.Float32bits(hi))
	n := firstTrue(l, h, func(b int64) bool { return bad(math.Float32frombits(uint32(b))) })
	return math.Float32frombits(uint32(n))
}
