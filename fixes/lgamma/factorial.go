package lgamma

// Factorials. ln n! is a table lookup below 1024 (values generated with
// math/big, see gen_tables.go) and Stirling's formula with the remainder
// series δ(n) of DLMF §5.11.1 above, evaluated in double-double so the
// result is correctly rounded in all but rare ties. The exact forms
// multiply with overflow checks from math/bits.

import (
	"fmt"
	"math"
	"math/bits"
)

// lnFactDD returns ln n! in double-double.
func lnFactDD(n uint64) dd {
	if n < uint64(len(lnFactTable)) {
		return lnFactTable[n]
	}
	// ln n! = (n+½)ln n − n + ½ln 2π + δ(n); n·ln n is about the size of
	// the result, so ddLogFast's 2^-74 is enough.
	x := ddUint(n)
	return x.addF(0.5).mul(ddLogFast(x)).sub(x).add(halfLn2Pi).addF(stirlingInt(n))
}

// LogFactorial returns ln n!: correctly rounded for n < 1024 (a table)
// and within 1 ulp above, where every n ≤ 10⁵ and every sampled n up to
// 2^62 came out correctly rounded as well (see docs/numerics.md).
//
// Accuracy: correctly rounded for n < 1024 (a table) and within 1 ulp
// above, up to MaxInt64; the mpmath sweep of docs/numerics.md measured at most 0.5 ulp.
//
// Special cases are:
//
//	LogFactorial(0) = LogFactorial(1) = 0
//	LogFactorial(n < 0) = NaN
func LogFactorial(n int) float64 {
	// Kept small enough to inline: the table case is the common one.
	if uint(n) < uint(len(lnFactTable)) {
		return lnFactTable[n].hi
	}
	return logFactorialLarge(n)
}

// logFactorialLarge is LogFactorial outside the table. Below 2^52,
// x+½ is exact, and the double-double sum of lnFactDD reduces to two
// error-free additions, (x+½)·ln x − x and then ½ln 2π + δ(n), with all
// low parts added last (as in lgammaLarge).
func logFactorialLarge(n int) float64 {
	if n < 0 {
		return math.NaN()
	}
	if n >= 1<<52 {
		return lnFactDD(uint64(n)).float()
	}
	x := float64(n)
	p := ddLogFast(dd{x, 0}).mulF(x + 0.5)
	s := twoSum(p.hi, -x)
	t := twoSum(halfLn2Pi.hi, stirlingSeries(x))
	u := twoSum(s.hi, t.hi)
	return u.hi + (u.lo + (s.lo + p.lo + t.lo + halfLn2Pi.lo))
}

// maxFactorialFloat is the largest n with n! < MaxFloat64.
const maxFactorialFloat = 170

// Factorial returns n! rounded to the nearest float64.
//
// Accuracy: correctly rounded (a table built with math/big).
//
// Special cases are:
//
//	Factorial(n > 170) = +Inf
//	Factorial(n < 0) = NaN
func Factorial(n int) float64 {
	switch {
	case n < 0:
		return math.NaN()
	case n > maxFactorialFloat:
		return math.Inf(1)
	}
	return factTable[n]
}

// factorialU returns n! if it is at most limit.
func factorialU(n, limit uint64) (uint64, bool) {
	r := uint64(1)
	for i := uint64(2); i <= n; i++ {
		hi, lo := bits.Mul64(r, i)
		if hi != 0 || lo > limit {
			return 0, false
		}
		r = lo
	}
	return r, true
}

// FactorialInt64 returns n! and true when n! fits in an int64
// (0 ≤ n ≤ 20), and 0 and false otherwise.
//
// Accuracy: exact (checked against math/big in exact_test.go and in
// the mpmath sweep).
//
// Special cases are:
//
//	FactorialInt64(n < 0) = 0, false
//	FactorialInt64(n > 20) = 0, false
func FactorialInt64(n int64) (int64, bool) {
	if n < 0 {
		return 0, false
	}
	r, ok := factorialU(uint64(n), math.MaxInt64)
	return int64(r), ok
}

// MustFactorialInt64 is like FactorialInt64 but panics when n is negative
// or n! does not fit in an int64.
//
// Accuracy: exact (checked against math/big in exact_test.go and in
// the mpmath sweep).
//
// Special cases are:
//
//	MustFactorialInt64(n < 0) panics
//	MustFactorialInt64(n > 20) panics
func MustFactorialInt64(n int64) int64 {
	r, ok := FactorialInt64(n)
	if !ok {
		panic(mustError("MustFactorialInt64", args(n), nonNegative("n", n), "int64"))
	}
	return r
}

// FactorialUint64 returns n! and true when n! fits in a uint64
// (n ≤ 20), and 0 and false otherwise.
//
// Accuracy: exact (checked against math/big in exact_test.go and in
// the mpmath sweep).
//
// Special cases are:
//
//	FactorialUint64(n > 20) = 0, false
func FactorialUint64(n uint64) (uint64, bool) {
	return factorialU(n, math.MaxUint64)
}

// MustFactorialUint64 is like FactorialUint64 but panics when n! does not
// fit in a uint64.
//
// Accuracy: exact (checked against math/big in exact_test.go and in
// the mpmath sweep).
//
// Special cases are:
//
//	MustFactorialUint64(n > 20) panics
func MustFactorialUint64(n uint64) uint64 {
	r, ok := FactorialUint64(n)
	if !ok {
		panic(mustError("MustFactorialUint64", args(n), "", "uint64"))
	}
	return r
}

// mustError builds the panic message of the Must functions, naming the
// function and its arguments: a domain problem if there is one, else the
// overflow.
func mustError(fn, args, domain, typ string) string {
	if domain != "" {
		return fmt.Sprintf("lgamma: %s(%s): %s", fn, args, domain)
	}
	return fmt.Sprintf("lgamma: %s(%s): result does not fit in %s", fn, args, typ)
}

// nonNegative returns a domain complaint if v is negative.
func nonNegative(name string, v int64) string {
	if v < 0 {
		return fmt.Sprintf("%s = %d is negative", name, v)
	}
	return ""
}

// args formats the arguments of a call for a panic message.
func args[T int64 | uint64](vs ...T) string {
	s := ""
	for i, v := range vs {
		if i > 0 {
			s += ", "
		}
		s += fmt.Sprint(v)
	}
	return s
}
