package thresholds

import (
	"math"
	"math/big"
)

// searchCap is the largest argument the search considers; Limits report
// math.MaxInt64 when no argument up to it breaks the shape.
const searchCap = int64(1) << 62

// shape is a nondecreasing integer sequence a(n), n ≥ from, described by
// rigorous bounds on ln a(n) and an exact test of a(n) against a maximum.
type shape struct {
	from int64
	// guess, if set, estimates the real n at which ln a(n) reaches L; it
	// only decides where the search starts.
	guess func(L float64) float64
	// bounds returns lo ≤ ln a(n) ≤ hi, with float rounding already
	// allowed for.
	bounds func(n int64) (lo, hi float64)
	// fits reports exactly whether a(n) ≤ max.
	fits func(n int64, max *big.Int) bool
}

// firstBad returns the smallest n ≥ s.from with a(n) > max, or
// math.MaxInt64 if there is none up to searchCap.
//
// The bounds bracket the answer between an n that surely fits and an n
// that surely does not; exact tests decide the rest. Only the
// monotonicity of a(n) is assumed, not that of the bounds.
func firstBad(s shape, max *big.Int, L float64) int64 {
	tol := 0x1p-40 * math.Max(1, math.Abs(L)) // ln(max) itself is rounded
	sureBad := func(n int64) bool { lo, _ := s.bounds(n); return lo > L+tol }
	sureGood := func(n int64) bool { _, hi := s.bounds(n); return hi < L-tol }

	start := s.from
	if s.guess != nil {
		if g := s.guess(L); g > float64(start) && g < float64(searchCap) {
			start = int64(g)
		}
	}
	bad, ok := expandUp(start, sureBad)
	if !ok {
		if s.fits(searchCap, max) {
			return math.MaxInt64
		}
		bad = searchCap
	}
	good := expandDown(min(start, bad-1), s.from, sureGood)
	// Narrow both ends on the bounds alone, then resolve exactly.
	good = lastTrue(good, bad, sureGood)
	bad = firstTrue(good, bad, sureBad)
	breaks := func(n int64) bool { return !s.fits(n, max) }
	n := firstTrue(good, bad, breaks)
	// Confirm both sides exactly, so that no answer rests on rounding;
	// should a bound ever be wrong, fall back to exact bisection.
	if breaks(n) && (n == s.from || !breaks(n-1)) {
		return n
	}
	return exactSearch(s.from, breaks)
}

// exactSearch finds the first n ≥ from with breaks(n) by exact tests
// alone: doubling strides, then bisection.
func exactSearch(from int64, breaks func(int64) bool) int64 {
	bad, ok := expandUp(from, breaks)
	if !ok {
		return math.MaxInt64
	}
	return firstTrue(from-1, bad, breaks)
}

// expandUp returns some n ≥ start with p(n), stepping by doubling
// strides; it reports false if none is found up to searchCap.
func expandUp(start int64, p func(int64) bool) (int64, bool) {
	for step := int64(1); ; step *= 2 {
		n := start + step - 1
		if n >= searchCap {
			return 0, false
		}
		if p(n) {
			return n, true
		}
	}
}

// expandDown returns some n in [from, start] with p(n), or from−1.
func expandDown(start, from int64, p func(int64) bool) int64 {
	for step := int64(1); ; step *= 2 {
		n := start - step + 1
		if n < from {
			return from - 1
		}
		if p(n) {
			return n
		}
	}
}

// firstTrue returns the smallest n in (lo, hi] with p(n), given p(hi);
// it bisects, so p need only change once from false to true.
func firstTrue(lo, hi int64, p func(int64) bool) int64 {
	for hi-lo > 1 {
		mid := lo + (hi-lo)/2
		if p(mid) {
			hi = mid
		} else {
			lo = mid
		}
	}
	return hi
}

// lastTrue returns the largest n in [lo, hi) with p(n), given p(lo) or
// lo below the domain.
func lastTrue(lo, hi int64, p func(int64) bool) int64 {
	return firstTrue(lo, hi, func(n int64) bool { return !p(n) }) - 1
}

// logBig returns ln x for x > 0, from the top 64 bits of x.
func logBig(x *big.Int) float64 {
	if x.Sign() <= 0 {
		return math.Inf(-1)
	}
	shift := max(x.BitLen()-64, 0)
	top := new(big.Int).Rsh(x, uint(shift)).Uint64()
	return math.Log(float64(top)) + float64(shift)*math.Ln2
}

// widen moves lo down and hi up by a few units in the last place of
// mag, the magnitude of the terms that were summed, so that float
// rounding cannot make a bound false.
func widen(lo, hi, mag float64) (float64, float64) {
	e := 0x1p-46 * math.Abs(mag)
	return lo - e, hi + e
}
