package lgamma

// Catalan numbers Cₙ = C(2n,n)/(n+1) (OEIS A000108). The exact form runs
// the recurrence Cᵢ₊₁ = Cᵢ·(4i+2)/(i+2) (DLMF 26.5.6 rearranged) with the
// gcd step of choose.go, so it is exact up to C₃₅, the last that fits in
// an int64.

import "math"

// CatalanInt64 returns the nth Catalan number and true when it fits in an
// int64 (0 ≤ n ≤ 35), and 0 and false otherwise.
//
// Accuracy: exact (checked against math/big in exact_test.go and in
// the mpmath sweep).
//
// Special cases are:
//
//	CatalanInt64(n < 0) = 0, false
//	CatalanInt64(n > 35) = 0, false
func CatalanInt64(n int64) (int64, bool) {
	if n < 0 {
		return 0, false
	}
	r := uint64(1)
	for i := uint64(0); i < uint64(n); i++ {
		var ok bool
		if r, ok = mulDiv(r, 4*i+2, i+2, math.MaxInt64); !ok {
			return 0, false
		}
	}
	return int64(r), true
}

// MustCatalanInt64 is like CatalanInt64 but panics when n is negative or
// the result does not fit in an int64.
//
// Accuracy: exact (checked against math/big in exact_test.go and in
// the mpmath sweep).
//
// Special cases are:
//
//	MustCatalanInt64(n < 0) panics
//	MustCatalanInt64(n > 35) panics
func MustCatalanInt64(n int64) int64 {
	r, ok := CatalanInt64(n)
	if !ok {
		panic(mustError("MustCatalanInt64", args(n), nonNegative("n", n), "int64"))
	}
	return r
}

// maxCatalanFloat bounds the n for which Cₙ can be finite: Cₙ grows like
// 4ⁿ, so it overflows float64 long before n reaches it.
const maxCatalanFloat = 1 << 20

// Catalan returns the nth Catalan number C(2n,n)/(n+1) as a float64.
//
// Accuracy: within 1 ulp, exact below 2^63; the mpmath sweep of docs/numerics.md measured
// at most 0.5 ulp.
//
// Special cases are:
//
//	Catalan(n < 0) = NaN
//	Catalan(n) = +Inf if the result overflows (n > 519)
func Catalan(n int) float64 {
	switch {
	case n < 0:
		return math.NaN()
	case n > maxCatalanFloat:
		return math.Inf(1)
	}
	m := int64(n)
	return integerResult(logChooseDD(uint64(2*m), uint64(m)).sub(ddLog(ddInt(m+1))), func() (uint64, bool) {
		r, ok := CatalanInt64(m)
		return uint64(r), ok
	})
}
