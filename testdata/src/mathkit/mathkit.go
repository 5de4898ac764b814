// Package mathkit holds the counting routines shared by the planning tools.
package mathkit

import (
	"errors"
	"math"
)

// ErrRange is returned for arguments whose factorial does not fit.
var ErrRange = errors.New("mathkit: argument out of range")

// Factorial returns n! in int64.
func Factorial(n int) int64 { // want Factorial:`factorial of parameter 0, breaks from 21` Factorial:`wrong for some n`
	f := int64(1)
	for i := 2; i <= n; i++ { // want `factorial of n in int64 wraps for n ≥ 21 \(20! ≈ 2.43e18 is the largest that fits\); n is not bounded here`
		f *= int64(i)
	}
	return f
}

// FactorialFloat returns n! in float64, counting down. Returned as it
// is, +Inf past 170! is the IEEE value of a result beyond float64: not
// reported; its callers' arithmetic is judged through the fact.
func FactorialFloat(n int) float64 { // want FactorialFloat:`factorial of parameter 0, breaks from 171`
	f := 1.0
	for i := n; i > 1; i-- {
		f *= float64(i)
	}
	return f
}

// CheckedFactorial returns n! for 0 ≤ n ≤ 20, and ErrRange beyond,
// where int64 would wrap.
func CheckedFactorial(n int) (int64, error) { // want CheckedFactorial:`factorial of parameter 0, safe for \[2, 20\]`
	if n < 0 || n > 20 {
		return 0, ErrRange
	}
	f := int64(1)
	for i := 2; i <= n; i++ {
		f *= int64(i)
	}
	return f, nil
}

// SmallFactorial returns n! and panics past 20!, the largest factorial
// an int64 holds.
func SmallFactorial(n int) int64 { // want SmallFactorial:`factorial of parameter 0, safe for \[2, 20\]`
	if n > 20 {
		panic("mathkit: factorial of more than 20")
	}
	if n <= 1 {
		return 1
	}
	return int64(n) * SmallFactorial(n-1)
}

// GammaFactorial returns n! as Γ(n+1). Returned as it is, +Inf past
// 170! is the honest float64 value, so the line is not reported; the
// fact lets its callers' arithmetic be judged.
func GammaFactorial(n int) float64 { // want GammaFactorial:`factorial of parameter 0, breaks from 171`
	return math.Gamma(float64(n) + 1)
}

// Factorial64 is Factorial under the name the reports use.
func Factorial64(n int) int64 { // want Factorial64:`factorial of parameter 0, breaks from 21`
	return Factorial(n)
}

// SmallFactorial64 wraps the guarded factorial.
func SmallFactorial64(n int) int64 { // want SmallFactorial64:`factorial of parameter 0, safe for \[2, 20\]`
	return SmallFactorial(n)
}
