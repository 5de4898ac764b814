package lgamma

// Falling factorials n!/(n−k)! = n(n−1)…(n−k+1). The logarithm is the
// difference of two Stirling forms rewritten as
// k·ln n + (m+½)·ln(n/m) − k + δ(n) − δ(m), m = n−k (DLMF 5.11.1), so
// that no two large terms cancel even for n near 2^63 and small k.

import (
	"math"
	"math/bits"
)

// lnFallingDD returns ln(n!/(n−k)!) for 0 ≤ k ≤ n in double-double.
// ln(n/m) is taken as ln(1 + k/m) with k/m formed directly: the rounding
// of n/m itself would be magnified by the factor m+½.
func lnFallingDD(n, k uint64) dd {
	m := n - k
	if m < uint64(len(lnFactTable)) {
		return lnFactDD(n).sub(lnFactTable[m])
	}
	x, y := ddUint(n), ddUint(m)
	kd := ddUint(k)
	// Neither logarithm's error is magnified by more than ln n/ln(n/m)
	// against the result, so ddLogFast's 2^-74 is enough.
	r := kd.mul(ddLogFast(x)).add(y.addF(0.5).mul(ddLog1pFast(kd.div(y)))).sub(kd)
	return r.addF(stirlingInt(n) - stirlingInt(m))
}

// LogFalling returns ln(n!/(n−k)!), the log of the falling factorial
// n(n−1)…(n−k+1).
//
// Accuracy: within 1 ulp for all n and k up to MaxInt64; the mpmath sweep of docs/numerics.md
// measured at most 0.5 ulp.
//
// Special cases are:
//
//	LogFalling(n, 0) = 0
//	LogFalling(n, k > n) = -Inf (a factor is zero)
//	LogFalling(n < 0, k) = NaN
//	LogFalling(n, k < 0) = NaN
func LogFalling(n, k int) float64 {
	switch {
	case n < 0 || k < 0:
		return math.NaN()
	case k > n:
		return math.Inf(-1)
	}
	return lnFallingDD(uint64(n), uint64(k)).float()
}

// Falling returns the falling factorial n(n−1)…(n−k+1), which is
// n!/(n−k)! for n ≥ 0; for a negative n it is the product of the k
// negative factors, (−1)^k·m(m−1)…(m−k+1) with m = k−1−n.
//
// Accuracy: within 1 ulp for all n and k up to MaxInt64, exact below
// 2^64; the mpmath sweep of docs/numerics.md measured at most 0.5 ulp
// (n ≥ 0; a negative n takes the same computation for m).
//
// Special cases are:
//
//	Falling(n, 0) = 1
//	Falling(n, k > n) = 0 for n ≥ 0
//	Falling(n, k < 0) = NaN
//	Falling(n, k) = ±Inf if the result overflows
func Falling(n, k int) float64 {
	switch {
	case k < 0:
		return math.NaN()
	case n < 0:
		// The k factors −|n|, −(|n|+1), …: (−1)^k·m(m−1)…(m−k+1) for
		// m = k−1−n, the m of the generalised binomial (generalised).
		m, neg := generalised(int64(n), int64(k))
		r := integerResult(lnFallingDD(m, uint64(k)), func() (uint64, bool) {
			return fallingU(m, uint64(k), math.MaxUint64)
		})
		if neg {
			r = -r
		}
		return r
	case k > n:
		return 0
	}
	return integerResult(lnFallingDD(uint64(n), uint64(k)), func() (uint64, bool) {
		return fallingU(uint64(n), uint64(k), math.MaxUint64)
	})
}

// fallingU returns n(n−1)…(n−k+1) if it is at most limit. The partial
// products only grow, so the first overflow decides.
func fallingU(n, k, limit uint64) (uint64, bool) {
	if k > n {
		return 0, true
	}
	r := uint64(1)
	for i := uint64(0); i < k; i++ {
		hi, lo := bits.Mul64(r, n-i)
		if hi != 0 || lo > limit {
			return 0, false
		}
		r = lo
	}
	return r, true
}

// FallingInt64 returns the falling factorial n(n−1)…(n−k+1) (n!/(n−k)!
// for n ≥ 0, the product of k negative factors for n < 0, see Falling)
// and true when it fits in an int64, and 0 and false when it does not
// or k is negative. For k > n ≥ 0 the result is 0 and true.
//
// Accuracy: exact (checked against math/big in exact_test.go and in
// the mpmath sweep; negative n in falling_neg_test.go).
//
// Special cases are:
//
//	FallingInt64(n, 0) = 1, true
//	FallingInt64(n, k > n) = 0, true for n ≥ 0
//	FallingInt64(n, k) = 0, false if k is negative
func FallingInt64(n, k int64) (int64, bool) {
	if k < 0 {
		return 0, false
	}
	// For n < 0, (−1)^k·m(m−1)…(m−k+1) with m = k−1−n (see Falling).
	m, neg := generalised(n, k)
	return signedInt64(m, uint64(k), neg, fallingU)
}

// MustFallingInt64 is like FallingInt64 but panics when k is negative
// or the result does not fit in an int64; the message names n and k.
//
// Accuracy: exact (checked against math/big in exact_test.go and in
// the mpmath sweep).
//
// Special cases are:
//
//	MustFallingInt64(n, k) panics if k is negative
func MustFallingInt64(n, k int64) int64 {
	r, ok := FallingInt64(n, k)
	if !ok {
		panic(mustError("MustFallingInt64", args(n, k), nonNegative("k", k), "int64"))
	}
	return r
}

// FallingUint64 returns n!/(n−k)! and true when it fits in a uint64, and
// 0 and false otherwise. For k > n the result is 0 and true.
//
// Accuracy: exact (checked against math/big in exact_test.go and in
// the mpmath sweep).
//
// Special cases are:
//
//	FallingUint64(n, 0) = 1, true
//	FallingUint64(n, k > n) = 0, true
func FallingUint64(n, k uint64) (uint64, bool) {
	return fallingU(n, k, math.MaxUint64)
}

// MustFallingUint64 is like FallingUint64 but panics when the result does
// not fit in a uint64.
//
// Accuracy: exact (checked against math/big in exact_test.go and in
// the mpmath sweep).
//
// Special cases are:
//
//	MustFallingUint64(n, k > n) = 0
func MustFallingUint64(n, k uint64) uint64 {
	r, ok := FallingUint64(n, k)
	if !ok {
		panic(mustError("MustFallingUint64", args(n, k), "", "uint64"))
	}
	return r
}
