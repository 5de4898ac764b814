// Package generic holds generic counting helpers for the scoreboard.
package generic

// Number is the set of types scores are kept in.
type Number interface {
	~int8 | ~int16 | ~int32 | ~int64 | ~float64
}

// Factorial returns n! in the caller's type.
func Factorial[T Number](n T) T { // want Factorial:`factorial of parameter 0, breaks from 6`
	f := T(1)
	for i := T(2); i <= n; i++ { // want `factorial of n in int8 \(the narrowest type in the constraint of T\) wraps for n ≥ 6 \(5! ≈ 120 is the largest that fits\)`
		f *= i
	}
	return f
}

// Float is the floating-point subset.
type Float interface{ ~float32 | ~float64 }

// Rising returns x(x+1)…(x+n-1).
func Rising[F Float](x F, n int) F { // want Rising:`rising-factorial of parameter 1, breaks from 35`
	p := F(1)
	for i := 0; i < n; i++ { // want `rising factorial of n factors from x in float32 \(the narrowest type in the constraint of F\) overflows to \+Inf for n ≥ 35 at x = 1; n is not bounded here`
		p *= x + F(i)
	}
	return p
}

// Podium uses the generic factorial with a small int16 value.
func Podium() int16 {
	return Factorial(int16(7))
}

// Tournament uses it in int64 with 25 players.
func Tournament() int64 {
	return Factorial[int64](25) // want `Factorial\(25\): factorial of 25 in int64 wraps \(20!`
}
