package thresholds

import (
	"math"
	"math/big"
)

// PowerFirstBad returns the first k ≥ 0 for which |x|^k does not fit t,
// the numerator of a power-over-factorial term x^k/k!.
//
// Special cases are:
//
//	PowerFirstBad(t, x) = math.MaxInt64 if |x| ≤ 1 or x is NaN
//	PowerFirstBad(t, ±Inf) = 1
func PowerFirstBad(t Num, x float64) int64 {
	a := math.Abs(x)
	switch {
	case math.IsNaN(a) || a <= 1:
		return math.MaxInt64
	case math.IsInf(a, 1):
		return 1
	}
	return memo(cacheKey{shape: "power", t: t, a: int64(math.Float64bits(a))}, func() int64 {
		la := math.Log(a)
		s := shape{
			from: 0,
			bounds: func(k int64) (lo, hi float64) {
				v := float64(k) * la
				return widen(v, v, v)
			},
			fits: func(k int64, max *big.Int) bool { return powerFits(a, k, max) },
		}
		return firstBad(s, t.maxInt(), t.logMax())
	})
}

// powerFits reports exactly whether a^k ≤ max for a > 1. It brackets
// a^k between products rounded down and up in big.Float arithmetic,
// raising the precision until the bracket decides; at 53k+64 bits the
// products are exact.
func powerFits(a float64, k int64, max *big.Int) bool {
	m := new(big.Float).SetInt(max)
	exactPrec := uint64(53)*uint64(k) + 64
	for prec := uint64(128); ; prec *= 2 {
		p := uint(min(prec, exactPrec, big.MaxPrec))
		lo := powRounded(a, k, p, big.ToNegativeInf)
		if lo.Cmp(m) > 0 {
			return false
		}
		hi := powRounded(a, k, p, big.ToPositiveInf)
		if hi.Cmp(m) <= 0 || uint64(p) >= exactPrec || p == big.MaxPrec {
			return hi.Cmp(m) <= 0
		}
	}
}

// powRounded returns a^k by binary powering at precision prec, every
// product rounded in the direction mode; all operands are positive, so
// the result is a one-sided bound on the exact power.
func powRounded(a float64, k int64, prec uint, mode big.RoundingMode) *big.Float {
	z := new(big.Float).SetPrec(prec).SetMode(mode).SetInt64(1)
	b := new(big.Float).SetPrec(prec).SetMode(mode).SetFloat64(a)
	for ; k > 0; k >>= 1 {
		if k&1 == 1 {
			z.Mul(z, b)
		}
		if k > 1 {
			b.Mul(b, b)
		}
	}
	return z
}
