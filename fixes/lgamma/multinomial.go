package lgamma

// Multinomial coefficients (k₁+…+kₘ)!/(k₁!…kₘ!) as the product of the
// binomials C(k₁+…+kᵢ, kᵢ) (DLMF 26.4.2), so both the log form and the
// exact form reuse the binomial code and no factorial of the total is
// ever formed.

import (
	"fmt"
	"math"
	"math/bits"
)

// logMultinomialDD returns ln of the multinomial coefficient, or false
// if an argument is negative. The partial sums are kept in a uint64, so
// two parts of up to MaxInt64 each still give a finite result; a sum
// beyond 2^64−1 gives +Inf.
func logMultinomialDD(ks []int) (dd, bool) {
	var r dd
	var s uint64
	for _, k := range ks {
		if k < 0 {
			return dd{}, false
		}
		if math.IsInf(r.hi, 1) {
			continue // the sum has overflowed; only the signs still matter
		}
		var carry uint64
		if s, carry = bits.Add64(s, uint64(k), 0); carry != 0 {
			r = dd{math.Inf(1), 0}
			continue
		}
		r = r.add(logChooseDD(s, uint64(k)))
	}
	return r, true
}

// LogMultinomial returns ln((k₁+…+kₘ)!/(k₁!…kₘ!)).
//
// Accuracy (mpmath sweep, docs/numerics.md): within 1 ulp.
//
// Special cases are:
//
//	LogMultinomial() = 0
//	LogMultinomial(ks) = NaN if any k is negative
//	LogMultinomial(ks) = +Inf if the sum of ks exceeds 2^64−1
func LogMultinomial(ks ...int) float64 {
	r, ok := logMultinomialDD(ks)
	if !ok {
		return math.NaN()
	}
	return r.float()
}

// Multinomial returns (k₁+…+kₘ)!/(k₁!…kₘ!) as a float64.
//
// Accuracy: within 1 ulp, exact below 2^64; the mpmath sweep of docs/numerics.md measured at
// most 0.5 ulp.
//
// Special cases are:
//
//	Multinomial() = 1
//	Multinomial(ks) = NaN if any k is negative
//	Multinomial(ks) = +Inf if the result overflows
func Multinomial(ks ...int) float64 {
	r, ok := logMultinomialDD(ks)
	if !ok {
		return math.NaN()
	}
	return integerResult(r, func() (uint64, bool) { return multinomialU(ks, math.MaxUint64) })
}

// MultinomialInt64 returns the multinomial coefficient and true when it
// fits in an int64, and 0 and false when it does not or any k is
// negative. Every factor C(k₁+…+kᵢ, kᵢ) is at least 1, so the first
// overflow decides.
//
// Accuracy: exact (checked against math/big in exact_test.go and in
// the mpmath sweep).
//
// Special cases are:
//
//	MultinomialInt64() = 1, true
//	MultinomialInt64(ks) = 0, false if any k is negative
func MultinomialInt64(ks ...int64) (int64, bool) {
	r, ok := multinomialU(ks, math.MaxInt64)
	return int64(r), ok
}

// multinomialU returns the multinomial coefficient if it is at most limit
// and no k is negative.
func multinomialU[T int | int64](ks []T, limit uint64) (uint64, bool) {
	r := uint64(1)
	var s uint64
	for _, k := range ks {
		if k < 0 {
			return 0, false
		}
		var carry uint64
		if s, carry = bits.Add64(s, uint64(k), 0); carry != 0 || s > limit {
			return 0, false
		}
		c, ok := chooseU(s, uint64(k), limit)
		if !ok {
			return 0, false
		}
		hi, lo := bits.Mul64(r, c)
		if hi != 0 || lo > limit {
			return 0, false
		}
		r = lo
	}
	return r, true
}

// MustMultinomialInt64 is like MultinomialInt64 but panics when an
// argument is negative or the result does not fit in an int64.
//
// Accuracy: exact (checked against math/big in exact_test.go and in
// the mpmath sweep).
//
// Special cases are:
//
//	MustMultinomialInt64(ks) panics if any k is negative
func MustMultinomialInt64(ks ...int64) int64 {
	r, ok := MultinomialInt64(ks...)
	if !ok {
		d := ""
		for i, k := range ks {
			if k < 0 {
				d = fmt.Sprintf("argument %d = %d is negative", i+1, k)
				break
			}
		}
		panic(mustError("MustMultinomialInt64", args(ks...), d, "int64"))
	}
	return r
}
