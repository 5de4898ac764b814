package thresholds

import (
	"math"
	"math/big"
)

// Factorial returns the first n for which n! does not fit t: 21 for
// int64 and uint64 (20! = 2432902008176640000 fits), 171 for float64, 35
// for float32.
func Factorial(t Num) Limit {
	return shapeLimit("fact", t, factorialShape, factorial)
}

// factorialShape is n!, bracketed by Robbins' bound and started at the
// inverse of Stirling's leading term.
var factorialShape = shape{
	from:   0,
	guess:  invertStirling,
	bounds: LogFactorialBounds,
	fits: func(n int64, max *big.Int) bool {
		return factorial(n).CmpAbs(max) <= 0
	},
}

// factorial returns n! exactly; 1 for n ≤ 0.
func factorial(n int64) *big.Int {
	if n <= 1 {
		return big.NewInt(1)
	}
	return new(big.Int).MulRange(1, n)
}

// shapeLimit returns the cached Limit of s in t, named name in the
// cache, for a shape whose only intermediate is its result value(n).
func shapeLimit(name string, t Num, s shape, value func(int64) *big.Int) Limit {
	return memoLimit(cacheKey{shape: name, t: t}, func() Limit {
		return exactLimit(firstBad(s, t.maxInt(), t.logMax()), value)
	})
}

// exactLimit builds the Limit of a shape whose only intermediate is its
// result, value(n).
func exactLimit(firstBad int64, value func(int64) *big.Int) Limit {
	if firstBad == math.MaxInt64 {
		return Limit{FirstBad: firstBad}
	}
	v := value(firstBad - 1)
	return Limit{FirstBad: firstBad, LastGood: v, Peak: v}
}

// DoubleFactorial returns the first n for which n!! = n(n−2)(n−4)…
// does not fit t.
func DoubleFactorial(t Num) Limit {
	return shapeLimit("dfact", t, doubleFactorialShape, doubleFactorial)
}

// doubleFactorialShape bounds ln n!! through factorials:
// (2m)!! = 2^m m! and (2m+1)!! = (2m+1)! / (2^m m!).
var doubleFactorialShape = shape{
	from: 0,
	bounds: func(n int64) (lo, hi float64) {
		m := n / 2
		mlo, mhi := LogFactorialBounds(m)
		shift := float64(m) * math.Ln2
		if n%2 == 0 {
			return widen(shift+mlo, shift+mhi, shift+mhi)
		}
		flo, fhi := LogFactorialBounds(n)
		return widen(flo-shift-mhi, fhi-shift-mlo, fhi+shift+mhi)
	},
	fits: func(n int64, max *big.Int) bool {
		return doubleFactorial(n).CmpAbs(max) <= 0
	},
}

// doubleFactorial returns n!! exactly; 1 for n ≤ 0.
func doubleFactorial(n int64) *big.Int {
	z := big.NewInt(1)
	var f big.Int
	for ; n > 1; n -= 2 {
		z.Mul(z, f.SetInt64(n))
	}
	return z
}

// FloatExact returns, for a float type, the first n whose n! is not
// exactly representable in t (float64: 23, as 22! = 2^19 × an odd number
// of 51 bits); for integer types it is Factorial(t).
func FloatExact(t Num) Limit {
	if !t.Float {
		return Factorial(t)
	}
	return memoLimit(cacheKey{shape: "fexact", t: t}, func() Limit {
		// Exactness fails long before the range does, at n below 30, so
		// a direct exact scan is cheap; no closed bound is needed.
		max, p := t.maxInt(), mantBits(t)
		for n := int64(1); ; n++ {
			f := factorial(n)
			if f.CmpAbs(max) > 0 || oddBits(f) > p {
				return exactLimit(n, factorial)
			}
		}
	})
}

// oddBits returns the number of significant bits of x > 0 once its
// trailing zero bits are removed.
func oddBits(x *big.Int) int {
	return x.BitLen() - int(x.TrailingZeroBits())
}
