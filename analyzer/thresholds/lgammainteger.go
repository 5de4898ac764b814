package thresholds

import (
	"math"
	"math/big"
)

// Integers read back from a log-gamma or Gamma value.
//
// int(math.Exp(lgamma(float64(n)+1))) is n! only while the float64
// computation lands on n! exactly (or, after a truncating conversion,
// above it by less than one): ln n! is rounded, and exp of it is n!·(1+ε)
// with ε of either sign, so a truncation can give n!−1 from small n on.
// The first wrong value is found by running the code's own float64
// computation (the caller passes it, built from Go's math functions, so
// it is the computation the program does on the same platform) and
// comparing its result exactly, with math/big, against the true integer.

// FirstWrongInteger returns the smallest v in [from, to] at which the
// float64 value eval(v), converted as the code converts it, differs from
// exact(v): for an integer result type t the conversion truncates toward
// zero (the Go spec's float-to-integer conversion) and must equal
// exact(v) and fit t; for a float type the value must be exact(v)
// correctly rounded to t (round to nearest even). ok is false when every
// v in the interval is right, or eval reports that it cannot evaluate.
//
// Special cases are:
//
//	FirstWrongInteger(t, f, e, from, to) = 0, false for from > to
func FirstWrongInteger(t Num, eval func(v int64) (float64, bool), exact func(v int64) *big.Int, from, to int64) (int64, bool) {
	for v := from; v <= to; v++ {
		got, ok := eval(v)
		if !ok {
			return 0, false
		}
		if !integerRight(t, got, exact(v)) {
			return v, true
		}
	}
	return 0, false
}

// integerRight reports whether got, converted to t, is want.
func integerRight(t Num, got float64, want *big.Int) bool {
	if math.IsNaN(got) || math.IsInf(got, 0) {
		return false
	}
	if t.Float {
		r, _ := new(big.Float).SetPrec(uint(mantBits(t))).SetInt(want).Float64()
		if t.Bits == 32 {
			r = float64(float32(r))
		}
		return got == r
	}
	tr := math.Trunc(got)
	bi, _ := new(big.Float).SetFloat64(tr).Int(nil)
	return bi.Cmp(want) == 0 && bi.CmpAbs(t.maxInt()) <= 0 && (t.Signed || bi.Sign() >= 0)
}

// Factorial64 returns n! exactly, for n ≥ 0 (1 for n < 0, the empty
// product, which callers never ask for).
func Factorial64(n int64) *big.Int { return factorial(n) }

// ChooseExact returns C(n, k) exactly for 0 ≤ k ≤ n.
func ChooseExact(n, k int64) *big.Int { return new(big.Int).Binomial(n, k) }
