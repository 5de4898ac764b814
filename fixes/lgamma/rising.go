package lgamma

// Rising factorials (Pochhammer symbols) x(x+1)…(x+n−1) = Γ(x+n)/Γ(x)
// (DLMF 5.2.5). Short products are multiplied out in double-double; long
// ones use log-gamma differences, where the factors below zero are
// folded to |x|(|x|−1)… = Γ(1−x)/Γ(1−x−m) (DLMF 5.5.1 with reflection of
// the sign) so every log-gamma argument is positive.

import (
	"math"
	"math/big"
)

// risingDirectMax bounds the products done factor by factor: 32 factors
// of size up to 1e8 stay far from float64 overflow.
const (
	risingDirectMax  = 32
	risingDirectSize = 1e8
)

// risingDD returns ln|x(x+1)…(x+n−1)| and the sign of the product (0 if a
// factor is zero) for finite x and n ≥ 1.
func risingDD(x float64, n int) (dd, int) {
	if n <= risingDirectMax && math.Abs(x) <= risingDirectSize {
		p := dd{1, 0}
		for i := 0; i < n; i++ {
			p = p.mul(twoSum(x, float64(i)))
		}
		switch {
		case p.hi == 0:
			return dd{math.Inf(-1), 0}, 0
		case p.hi < 0:
			return ddLog(p.neg()), -1
		}
		return ddLog(p), 1
	}
	if x > 0 {
		return lnGammaRatioDD(twoSum(x, float64(n)), dd{x, 0}), 1
	}
	// m factors are negative: x, x+1, …, x+m−1.
	m := math.Min(float64(n), math.Ceil(-x))
	if x == math.Trunc(x) && -x < float64(n) {
		return dd{math.Inf(-1), 0}, 0 // the factor x+(−x) is zero
	}
	negX := twoSum(1, -x) // 1−x
	r := lnGammaRatioDD(negX, negX.addF(-m))
	if float64(n) > m {
		r = r.add(lnGammaRatioDD(twoSum(x, float64(n)), twoSum(x, m)))
	}
	if math.Mod(m, 2) == 1 {
		return r, -1
	}
	return r, 1
}

// risingSpecial handles n ≤ 0, NaN and infinite x.
func risingSpecial(x float64, n int) (float64, bool) {
	switch {
	case n < 0 || math.IsNaN(x):
		return math.NaN(), true
	case n == 0:
		return 1, true
	case math.IsInf(x, 0):
		return math.Pow(x, float64(n)), true
	}
	return 0, false
}

// LogRising returns ln|x(x+1)…(x+n−1)|, the log of the absolute value of
// the rising factorial.
//
// Accuracy: within 1 ulp for finite x and n up to MaxInt64 (where
// the product is within 2^-20 of ±1 the logarithm is taken in math/big);
// the mpmath sweep of docs/numerics.md measured at most 0.5 ulp.
//
// Special cases are:
//
//	LogRising(x, 0) = 0
//	LogRising(x, n) = -Inf if a factor is zero (x a non-positive integer
//	    with x+n > 0)
//	LogRising(±Inf, n > 0) = +Inf
//	LogRising(x, n < 0) = NaN
//	LogRising(NaN, n) = NaN
func LogRising(x float64, n int) float64 {
	if v, ok := risingSpecial(x, n); ok {
		return math.Log(math.Abs(v))
	}
	r, _ := risingDD(x, n)
	if math.Abs(r.hi) < 0x1p-20 && n <= risingDirectMax {
		// The product is next to ±1 and its double-double rounding
		// (about n·2^-105) could exceed the ulp of its logarithm: form
		// it in math/big, every factor x+i exactly (1200 bits cover any
		// float64 plus an integer below 2^64) and the product to 2^-500.
		p := new(big.Float).SetPrec(512).SetInt64(1)
		for i := 0; i < n; i++ {
			f := new(big.Float).SetPrec(1200).SetFloat64(x)
			p.Mul(p, f.Add(f, new(big.Float).SetInt64(int64(i))))
		}
		return bigFloat(bigLog(bigNew().Abs(p)))
	}
	if math.Abs(r.hi) < 0x1p-20 && x > 0 && x+float64(n) < bigMax {
		// The product is next to 1 and the log-gamma difference's
		// absolute error (about 1e-30) could exceed the ulp: math/big.
		return bigLnGammaSum([]*big.Float{bigNew().Add(bigNew().SetFloat64(x), bigNew().SetInt64(int64(n))), bigNew().SetFloat64(x)}, []int{1, -1})
	}
	return r.float()
}

// Rising returns the rising factorial x(x+1)…(x+n−1) = Γ(x+n)/Γ(x).
//
// Accuracy: within 1 ulp wherever the result is a normal float64;
// the mpmath sweep of docs/numerics.md measured at most 0.5 ulp.
//
// Special cases are:
//
//	Rising(x, 0) = 1
//	Rising(x, n) = 0 if a factor is zero (x a non-positive integer with
//	    x+n > 0)
//	Rising(±Inf, n > 0) = math.Pow(±Inf, n)
//	Rising(x, n < 0) = NaN
//	Rising(NaN, n) = NaN
func Rising(x float64, n int) float64 {
	if v, ok := risingSpecial(x, n); ok {
		return v
	}
	r, s := risingDD(x, n)
	return float64(s) * expOf(r)
}
