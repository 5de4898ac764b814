package lgamma

// Binomial coefficients. The logarithm is ln(n!/(n−k)!) − ln k! with the
// smaller of k and n−k (see falling.go), all in double-double, so C(n,k)
// keeps full float64 accuracy where exp(lgamma(n+1)−lgamma(k+1)−
// lgamma(n−k+1)) loses digits to the rounding of ln n!. The exact forms
// use the multiplicative formula C(m+i, i) = C(m+i−1, i−1)·(m+i)/i
// (DLMF 26.3.5 rearranged; common practice). The usual way to keep
// C·(m+i) from overflowing is to divide gcd(C, i) out first; here the
// product is formed in 128 bits instead, which has the same effect (no
// intermediate overflow where the result fits) without the divisions of
// Euclid's algorithm.

import (
	"math"
	"math/bits"
)

// logChooseDD returns ln C(n,k) for 0 ≤ k ≤ n in double-double.
func logChooseDD(n, k uint64) dd {
	if k > n-k {
		k = n - k
	}
	if k == 0 {
		return dd{}
	}
	return lnFallingDD(n, k).sub(lnFactDD(k))
}

// generalised maps C(n,k) for k ≥ 0 to ±C(m,k) with m ≥ 0: m = n, or for
// n < 0 the generalised coefficient C(n,k) = (−1)ᵏ·C(k−n−1, k) (DLMF
// 1.2.6 with the falling-factorial definition C(n,k) = n(n−1)…(n−k+1)/k!,
// common practice). k−n−1 < 2^64 always, so m is exact in a uint64.
func generalised(n, k int64) (m uint64, neg bool) {
	if n >= 0 {
		return uint64(n), false
	}
	return uint64(k) + uint64(-(n + 1)), k%2 == 1
}

// LogChoose returns ln|C(n,k)|, the log of the magnitude of the binomial
// coefficient. For n < 0 it is the generalised coefficient of Choose,
// whose sign is (−1)ᵏ.
//
// Accuracy (mpmath sweep, docs/numerics.md): within 1 ulp for every n
// and k, correctly rounded in all but rare cases.
//
// Special cases are:
//
//	LogChoose(n, 0) = 0
//	LogChoose(n ≥ 0, n) = 0
//	LogChoose(n, k < 0) = -Inf
//	LogChoose(n ≥ 0, k > n) = -Inf
//	LogChoose(n < 0, k) = LogChoose(k−n−1, k)
func LogChoose(n, k int) float64 {
	if k < 0 || (n >= 0 && k > n) {
		return math.Inf(-1)
	}
	m, _ := generalised(int64(n), int64(k))
	return logChooseDD(m, uint64(k)).float()
}

// Choose returns the binomial coefficient C(n,k) as a float64:
// n!/(k!(n−k)!) for 0 ≤ k ≤ n, and for n < 0 the generalised
// coefficient n(n−1)…(n−k+1)/k! = (−1)ᵏ·C(k−n−1, k) (DLMF 1.2.6; common
// practice), the coefficient of xᵏ in (1+x)ⁿ.
//
// Accuracy (mpmath sweep, docs/numerics.md): within 1 ulp, and exact
// when the value is below 2^64.
//
// Special cases are:
//
//	Choose(n, 0) = 1
//	Choose(n, k < 0) = 0
//	Choose(n ≥ 0, k > n) = 0
//	Choose(n < 0, k) = (−1)ᵏ·Choose(k−n−1, k)
//	Choose(n, k) = ±Inf if the result overflows
func Choose(n, k int) float64 {
	if k < 0 || (n >= 0 && k > n) {
		return 0
	}
	m, neg := generalised(int64(n), int64(k))
	v := integerResult(logChooseDD(m, uint64(k)), func() (uint64, bool) {
		return chooseU(m, uint64(k), math.MaxUint64)
	})
	if neg {
		return -v
	}
	return v
}

// exactLogLimit is a little below ln 2^64: results under e^exactLogLimit
// are integers that a uint64 holds, and one that lies (nearly) halfway
// between two float64s needs the exact value to be rounded right.
const exactLogLimit = 44

// integerResult rounds an integer-valued result given by its logarithm.
// Below e^exactLogLimit the double-double e^l (relative error below
// 2^-62 with the logarithms of this package) decides the rounding when
// it is not within 2^-58 of a rounding boundary, by Ziv's test (Ziv,
// "Fast evaluation of elementary mathematical functions with correctly
// rounded last bit", ACM TOMS 17, 1991); below 2^52 it is simply the
// nearest integer. Only a near-tie computes the exact uint64 value,
// whose multiplications cost more than everything else.
func integerResult(l dd, exact func() (uint64, bool)) float64 {
	if l.hi >= exactLogLimit {
		return expOf(l)
	}
	v := ddExp(l)
	if v.hi < 0x1p52 {
		return math.Round(v.hi + v.lo)
	}
	err := v.hi * 0x1p-58
	if up, down := v.hi+(v.lo+err), v.hi+(v.lo-err); up == down {
		return up
	}
	if u, ok := exact(); ok {
		return float64(u)
	}
	return expOf(l)
}

// mulDiv returns r·a/d when d divides r·a and the quotient is at most
// limit. The product is formed in 128 bits (math/bits), so it cannot
// overflow; the quotient fits in 64 bits exactly when the high word of
// the product is below d.
func mulDiv(r, a, d, limit uint64) (uint64, bool) {
	hi, lo := bits.Mul64(r, a)
	if hi >= d {
		return 0, false
	}
	q, _ := bits.Div64(hi, lo, d)
	return q, q <= limit
}

// chooseU returns C(n,k) if it is at most limit. Along i the partial
// values C(n−k+i, i) only grow, so the first overflow decides.
func chooseU(n, k, limit uint64) (uint64, bool) {
	if k > n {
		return 0, true
	}
	if k > n-k {
		k = n - k
	}
	r := uint64(1)
	for i := uint64(1); i <= k; i++ {
		var ok bool
		if r, ok = mulDiv(r, n-k+i, i, limit); !ok {
			return 0, false
		}
	}
	return r, true
}

// ChooseInt64 returns C(n,k) and true when it fits in an int64, and 0
// and false when it does not. For k < 0, and for k > n ≥ 0, the result
// is 0 and true; for n < 0 it is the generalised coefficient
// (−1)ᵏ·C(k−n−1, k) of Choose.
//
// Accuracy: exact (checked against math/big in exact_test.go and in
// the mpmath sweep).
//
// Special cases are:
//
//	ChooseInt64(n, 0) = 1, true
//	ChooseInt64(n, k < 0) = 0, true
//	ChooseInt64(n ≥ 0, k > n) = 0, true
//	ChooseInt64(n < 0, k) = (−1)ᵏ·C(k−n−1, k) if it fits
func ChooseInt64(n, k int64) (int64, bool) {
	if k < 0 {
		return 0, true
	}
	m, neg := generalised(n, k)
	return signedInt64(m, uint64(k), neg, chooseU)
}

// signedInt64 returns f(m, k), or −f(m, k) where neg, in int64 with ok
// where it fits: −2^63 fits although 2^63 does not. f computes its
// value in uint64 and reports whether it is at most limit.
func signedInt64(m, k uint64, neg bool, f func(m, k, limit uint64) (uint64, bool)) (int64, bool) {
	if !neg {
		r, ok := f(m, k, math.MaxInt64)
		return int64(r), ok
	}
	r, ok := f(m, k, 1<<63)
	if !ok {
		return 0, false
	}
	return int64(-r), true
}

// MustChooseInt64 is like ChooseInt64 but panics when the result does
// not fit in an int64.
//
// Accuracy: exact (checked against math/big in exact_test.go and in
// the mpmath sweep).
//
// Special cases are:
//
//	MustChooseInt64(n, k < 0) = 0
//	MustChooseInt64(-3, 2) = 6 (the generalised coefficient)
func MustChooseInt64(n, k int64) int64 {
	r, ok := ChooseInt64(n, k)
	if !ok {
		panic(mustError("MustChooseInt64", args(n, k), "", "int64"))
	}
	return r
}

// ChooseUint64 returns C(n,k) and true when it fits in a uint64, and 0
// and false otherwise. For k > n the result is 0 and true.
//
// Accuracy: exact (checked against math/big in exact_test.go and in
// the mpmath sweep).
//
// Special cases are:
//
//	ChooseUint64(n, 0) = 1, true
//	ChooseUint64(n, k > n) = 0, true
func ChooseUint64(n, k uint64) (uint64, bool) {
	return chooseU(n, k, math.MaxUint64)
}

// MustChooseUint64 is like ChooseUint64 but panics when the result does
// not fit in a uint64.
//
// Accuracy: exact (checked against math/big in exact_test.go and in
// the mpmath sweep).
//
// Special cases are:
//
//	MustChooseUint64(n, k > n) = 0
func MustChooseUint64(n, k uint64) uint64 {
	r, ok := ChooseUint64(n, k)
	if !ok {
		panic(mustError("MustChooseUint64", args(n, k), "", "uint64"))
	}
	return r
}

// ChooseLoop returns, as a float64, what the multiplicative loop
//
//	c := 1
//	for i := 1; i <= k; i++ {
//		c = c * (n - k + i) / i
//	}
//
// computes in integers that do not wrap: every division is exact, c is
// C(n−k+i, i) after step i, so the loop ends at the generalised C(n, k)
// of Choose for every n and k ≥ 0 (0 for 0 ≤ n < k, where a factor is
// 0), and at its start, 1, for k < 0, where it runs no trip. It is the
// value such a binomial function computes without wrapping, where
// MustChooseInt64 panics because it leaves int64.
//
// Accuracy: as Choose's (checked against math/big in exact_test.go).
//
// Special cases are:
//
//	ChooseLoop(n, k < 0) = 1
//	ChooseLoop(n, k ≥ 0) = Choose(n, k)
func ChooseLoop(n, k int) float64 {
	if k < 0 {
		return 1
	}
	return Choose(n, k)
}

// ChooseOrZero returns, as a float64, what a binomial function that
// returns 0 wherever k < 0 or k > n, and C(n, k) elsewhere, computes in
// integers that do not wrap:
//
//	if k < 0 || k > n {
//		return 0
//	}
//	… C(n, k) by any formula …
//
// It is Choose for 0 ≤ k ≤ n and 0 everywhere else, negative n
// included (where Choose gives the generalised coefficient). It is the
// value such a function computes without wrapping, where
// MustChooseInt64 panics because it leaves int64.
//
// Accuracy: as Choose's (checked against math/big in exact_test.go).
//
// Special cases are:
//
//	ChooseOrZero(n, k < 0) = 0
//	ChooseOrZero(n, k > n) = 0
//	ChooseOrZero(n, k) = +Inf if the result overflows
func ChooseOrZero(n, k int) float64 {
	if k < 0 || k > n {
		return 0
	}
	return Choose(n, k)
}
