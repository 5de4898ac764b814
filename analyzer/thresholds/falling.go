package thresholds

import (
	"fmt"
	"math"
	"math/big"
)

// FallingFirstBad returns, for a fixed k ≥ 1, the first n ≥ k for which
// the falling factorial n!/(n−k)! = n(n−1)…(n−k+1) does not fit t, or
// math.MaxInt64 if none below 2^62 breaks it.
//
// Special cases are:
//
//	FallingFirstBad(t, k ≤ 0) = math.MaxInt64 (the empty product 1)
func FallingFirstBad(t Num, k int64) int64 {
	if k <= 0 {
		return math.MaxInt64
	}
	return memo(cacheKey{shape: "falling", t: t, a: k}, func() int64 {
		if k >= Factorial(t).FirstBad {
			return k // already n = k gives k!, which does not fit
		}
		s := shape{
			from: k,
			// k·ln(n−k+1) ≤ ln(n(n−1)…(n−k+1)) ≤ k·ln n, which stays
			// accurate for n near 2^62 where differences of Robbins'
			// bounds would cancel.
			bounds: func(n int64) (lo, hi float64) {
				fk := float64(k)
				lo, hi = fk*math.Log(float64(n-k+1)), fk*math.Log(float64(n))
				return widen(lo, hi, hi)
			},
			fits: func(n int64, max *big.Int) bool {
				return fallingProduct(n, k).CmpAbs(max) <= 0
			},
		}
		return firstBad(s, t.maxInt(), t.logMax())
	})
}

// fallingProduct returns n(n−1)…(n−k+1) for 0 ≤ k ≤ n.
func fallingProduct(n, k int64) *big.Int {
	if k <= 0 {
		return big.NewInt(1)
	}
	return new(big.Int).MulRange(n-k+1, n)
}

// FallingFits reports whether n!/(n−k)! fits t. Arguments with k ≤ 0 or
// n < k give an empty or zero product and fit.
func FallingFits(t Num, n, k int64) bool {
	if k <= 0 || n < k {
		return true
	}
	first := FallingFirstBad(t, k)
	if first == math.MaxInt64 && n >= searchCap {
		// The search stops at 2^62; beyond it decide exactly. k is
		// below the factorial limit here, so the product is short.
		return fallingProduct(n, k).CmpAbs(t.maxInt()) <= 0
	}
	return n < first
}

// RisingFirstBad returns, for a fixed x, the first n ≥ 1 for which the
// rising factorial x(x+1)…(x+n−1) does not fit t, or math.MaxInt64 if
// none below 2^62 breaks it.
//
// Special cases are:
//
//	RisingFirstBad(t, 0) = math.MaxInt64 (every product is 0)
//	RisingFirstBad(t, x < 0): the products are ± falling factorials of
//	−x, which reach 0 at n = 1−x; the first n whose magnitude does not
//	fit, or math.MaxInt64 if none does
func RisingFirstBad(t Num, x int64) int64 {
	switch {
	case x == 0:
		return math.MaxInt64
	case x < 0:
		return memo(cacheKey{shape: "risingneg", t: t, a: x}, func() int64 {
			return risingNegative(t, -x)
		})
	}
	return memo(cacheKey{shape: "rising", t: t, a: x}, func() int64 {
		s := shape{
			from: 1,
			bounds: func(n int64) (lo, hi float64) {
				return risingBounds(x, n)
			},
			fits: func(n int64, max *big.Int) bool {
				return risingProduct(x, n).CmpAbs(max) <= 0
			},
		}
		return firstBad(s, t.maxInt(), t.logMax())
	})
}

// risingBounds bounds ln(x(x+1)…(x+n−1)) for x, n ≥ 1 by the better of
// n·ln x ≤ · ≤ n·ln(x+n−1) and Robbins' bounds on (x+n−1)!/(x−1)!; the
// first is tight for large x, the second for small x. The top factor is
// taken in float64, as x+n−1 may pass math.MaxInt64.
func risingBounds(x, n int64) (lo, hi float64) {
	top := float64(x) + float64(n-1)
	lo, hi = float64(n)*math.Log(float64(x)), float64(n)*math.Log(top)
	lo, hi = widen(lo, hi, hi)
	if x > math.MaxInt64-(n-1) {
		return lo, hi
	}
	tlo, thi := LogFactorialBounds(x + n - 1)
	blo, bhi := LogFactorialBounds(x - 1)
	rlo, rhi := widen(tlo-bhi, thi-blo, thi+bhi)
	return math.Max(lo, rlo), math.Min(hi, rhi)
}

// risingProduct returns x(x+1)…(x+n−1) exactly for x, n ≥ 1, also when
// the top factor passes math.MaxInt64.
func risingProduct(x, n int64) *big.Int {
	if x <= math.MaxInt64-(n-1) {
		return new(big.Int).MulRange(x, x+n-1)
	}
	p, f, one := big.NewInt(1), big.NewInt(x), big.NewInt(1)
	for range n {
		p.Mul(p, f)
		f.Add(f, one)
	}
	return p
}

// risingNegative handles x(x+1)…(x+n−1) for x = −m < 0: its magnitude
// is m(m−1)…(m−n+1), which grows with n until the factor 1 and then
// becomes 0. Each factor but the last is at least 2, so an exact scan
// ends within Bits+1 steps or at n = m.
func risingNegative(t Num, m int64) int64 {
	max := t.maxInt()
	p, f := big.NewInt(1), new(big.Int)
	for n := int64(1); n <= m; n++ {
		p.Mul(p, f.SetInt64(m-n+1))
		if p.CmpAbs(max) > 0 {
			return n
		}
	}
	return math.MaxInt64
}

// FallingAffineFirstBad returns the first v for which the falling
// factorial whose largest factor is a·v+b and whose number of factors is
// c·v+d, (a·v+b)!/((a−c)·v+b−d)!, does not fit t: the loop
// for i := n+1; i <= 2*n; i++ { p *= i } is a = 2, b = 0, c = 1, d = 0.
// The scan starts at the first v with at least one factor, all of them
// positive, and is exact: with a ≥ c ≥ 1 the product grows by at least
// one factor per step, so it passes t within a few hundred steps.
//
// Special cases are:
//
//	FallingAffineFirstBad(t, a, b, c, d) = math.MaxInt64 unless a ≥ c ≥ 1
//	(the count or the lowest factor does not grow with v)
func FallingAffineFirstBad(t Num, a, b, c, d int64) int64 {
	if c < 1 || a < c || a > 1<<20 || b < -1<<40 || b > 1<<40 || d < -1<<40 || d > 1<<40 {
		return math.MaxInt64
	}
	return memo(cacheKey{shape: fmt.Sprintf("fallingaffine %d %d", c, d), t: t, a: a, b: b}, func() int64 {
		return fallingAffineScan(t, a, b, c, d)
	})
}

// FallingAffineStart returns the first v at which the falling factorial
// of FallingAffineFirstBad has at least one factor and all its factors
// are positive; from there on the product grows with v, so every v from
// the start up to the first bad value fits.
//
// Special cases are:
//
//	FallingAffineStart(a, b, c, d) = math.MaxInt64 unless a ≥ c ≥ 1,
//	and when a = c with a lowest factor b−d+1 ≤ 0
func FallingAffineStart(a, b, c, d int64) int64 {
	if c < 1 || a < c {
		return math.MaxInt64
	}
	v := ceilDiv(1-d, c)
	if a > c {
		return max(v, ceilDiv(d-b, a-c)) // lowest factor (a−c)v+b−d+1 ≥ 1
	}
	if b-d+1 < 1 {
		return math.MaxInt64 // a constant lowest factor ≤ 0: zero or sign-alternating
	}
	return v
}

// fallingAffineScan walks v upward from FallingAffineStart.
func fallingAffineScan(t Num, a, b, c, d int64) int64 {
	limit := t.maxInt()
	v := FallingAffineStart(a, b, c, d)
	if v == math.MaxInt64 {
		return math.MaxInt64
	}
	for i := 0; i < maxAffineSteps; i++ {
		top, k := a*v+b, c*v+d
		if fallingProduct(top, k).CmpAbs(limit) > 0 {
			return v
		}
		v++
	}
	return math.MaxInt64
}

// maxAffineSteps bounds the scan of FallingAffineFirstBad; the product
// of at least i factors, each at least 1 and all but one at least 2,
// passes every supported type (at most 2^1024) well before.
const maxAffineSteps = 4096

func ceilDiv(x, y int64) int64 {
	q := x / y
	if x%y != 0 && (x < 0) == (y < 0) {
		q++
	}
	return q
}
