package thresholds

import (
	"math"
	"math/big"
)

// The hand-written Stirling approximation √(2πn)·(n/e)^n of n! has two
// failures of its own: its relative error, about 1/(12n), and, in the
// arrangements that form n^n (or n^(n+½)) before multiplying by e^(−n),
// an overflow well before n! itself leaves the type.

// StirlingRelError returns the relative error 1 − e^(−δ(n)) of Stirling's
// leading term √(2πn)(n/e)^n as an approximation of n!, where
// δ(n) = ln n! − [(n+½)ln n − n + ½ln 2π] is the remainder of Stirling's
// series (DLMF 5.11.1). The leading term is always below n! (δ > 0,
// Robbins 1955), so this is how far it falls short, as a fraction of n!.
//
// δ(n) is summed from the series' coefficients (StirlingCoefficient) at
// m ≥ 32, where eight terms leave an error below 1e-20, and carried down
// to n by the exact recurrence δ(m) = δ(m+1) + (m+½)·ln(1+1/m) − 1, which
// follows from ln (m+1)! = ln m! + ln(m+1).
//
// Special cases are:
//
//	StirlingRelError(n < 1) = NaN
func StirlingRelError(n int64) float64 {
	if n < 1 {
		return math.NaN()
	}
	return -math.Expm1(-stirlingDelta(n))
}

// stirlingSeriesFrom is where stirlingDelta sums the series instead of
// recurring down to it.
const stirlingSeriesFrom = 32

// stirlingDelta returns δ(n) for n ≥ 1.
func stirlingDelta(n int64) float64 {
	m := max(n, stirlingSeriesFrom)
	x := float64(m)
	d := 0.0
	p := 1 / x
	for k := 1; k <= 8; k++ {
		c, _ := StirlingCoefficient(k).Float64()
		d += c * p
		p /= x * x
	}
	for ; m > n; m-- {
		y := float64(m - 1)
		d += (y+0.5)*math.Log1p(1/y) - 1
	}
	return d
}

// StirlingRelErrorBelow returns the first n ≥ 1 at which the relative
// error of Stirling's leading term, StirlingRelError(n), is at most tol.
// The error decreases with n, so every larger n stays below tol too.
//
// Special cases are:
//
//	StirlingRelErrorBelow(tol ≥ StirlingRelError(1)) = 1
//	StirlingRelErrorBelow(tol ≤ 0 or NaN) = math.MaxInt64
func StirlingRelErrorBelow(tol float64) int64 {
	if !(tol > 0) {
		return math.MaxInt64
	}
	// 1/(12n+1) < δ(n) < 1/(12n) brackets the answer; bisect between.
	lo, hi := int64(1), int64(math.Min(math.Ceil(1/(12*-math.Log1p(-math.Min(tol, 0.5)))), 1<<62))+1
	if StirlingRelError(lo) <= tol {
		return lo
	}
	for hi-lo > 1 {
		mid := lo + (hi-lo)/2
		if StirlingRelError(mid) <= tol {
			hi = mid
		} else {
			lo = mid
		}
	}
	return hi
}

// SelfPower returns the first n ≥ 1 at which n^(n+h/2) does not fit t,
// h being −1, 0 or 1: n^n (h = 0) and n^(n+½) (h = 1) are what
// math.Pow(n, n) and math.Pow(n, n+0.5) form in a hand-written Stirling
// approximation. 144 for float64 and h = 0 (143^143 ≈ 1.6e308 fits),
// although 170! still fits. The comparison n^(2n+h) with the square of
// the type's maximum is exact, in big.Int.
//
// Special cases are:
//
//	SelfPower(t, h) = math.MaxInt64 for h outside {−1, 0, 1}
func SelfPower(t Num, h int64) int64 {
	if h < -1 || h > 1 {
		return math.MaxInt64
	}
	return memo(cacheKey{shape: "selfpow", t: t, a: h}, func() int64 {
		s := shape{
			from: 1,
			bounds: func(n int64) (lo, hi float64) {
				x := float64(n)
				v := (x + float64(h)/2) * math.Log(x)
				return widen(v, v, v)
			},
			fits: func(n int64, m *big.Int) bool {
				if n > 1<<20 {
					return false // far past every type's maximum
				}
				p := new(big.Int).Exp(big.NewInt(n), big.NewInt(2*n+h), nil)
				return p.Cmp(new(big.Int).Mul(m, m)) <= 0
			},
		}
		return firstBad(s, t.maxInt(), t.logMax())
	})
}

// GammaNegativeIn returns a point of [lo, hi] at which Γ is negative,
// and whether there is one. Γ(x) < 0 exactly on the intervals (−1, 0),
// (−3, −2), (−5, −4), … (DLMF 5.2.1 with the reflection formula 5.5.3:
// Γ(x)Γ(1−x) = π/sin(πx), and Γ(1−x) > 0 for x < 1). The point is the
// midpoint of the part of the highest such interval that [lo, hi]
// meets, −½ when [lo, hi] holds all of (−1, 0).
//
// Special cases are:
//
//	GammaNegativeIn(lo ≥ 0, hi) = NaN, false
//	GammaNegativeIn(NaN, hi) = GammaNegativeIn(lo, NaN) = NaN, false
func GammaNegativeIn(lo, hi float64) (float64, bool) {
	if math.IsNaN(lo) || math.IsNaN(hi) || lo >= 0 || hi <= lo && !(lo == hi) {
		return math.NaN(), false
	}
	top := math.Min(hi, 0)
	// The interval (−2k−1, −2k) holding top or the first one below it.
	k := math.Max(0, math.Floor(-top/2))
	for range 3 {
		a, b := -2*k-1, -2*k
		if b <= lo {
			break
		}
		l, h := math.Max(a, lo), math.Min(b, top)
		switch {
		case l < h:
			if x := l + (h-l)/2; x > a && x < b {
				return x, true
			}
		case l == h && l > a && l < b:
			return l, true
		}
		k++
	}
	return math.NaN(), false
}
