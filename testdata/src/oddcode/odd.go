// Package oddcode is code the analyzer must survive: type errors, goto,
// labels, closures over the accumulator, shadowing, named results and
// defer.
package oddcode

import "math"

// broken does not type-check.
func broken(n int) int {
	f := 1
	for i := 2; i <= n; i++ {
		f *= undefinedFactor(i)
	}
	return f + "x"
}

// withGoto counts with a goto instead of a loop.
func withGoto(n int) int64 {
	f := int64(1)
	i := int64(2)
again:
	if i <= int64(n) {
		f *= i
		i++
		goto again
	}
	return f
}

// labelled breaks out of a labelled loop early.
func labelled(n int) int64 { // want labelled:`factorial of parameter 0, breaks from 21`
	f := int64(1)
outer:
	for i := 2; i <= n; i++ { // want `factorial of n in int64 wraps`
		if i > 1000 {
			break outer
		}
		f *= int64(i)
	}
	return f
}

// closure changes the accumulator from a closure.
func closure(n int) int64 {
	f := int64(1)
	bump := func() { f += 1 }
	for i := 2; i <= n; i++ {
		f *= int64(i)
		bump()
	}
	return f
}

// shadowed multiplies a shadowed accumulator.
func shadowed(n int) int64 {
	f := int64(1)
	for i := 2; i <= n; i++ {
		f := f * int64(i)
		_ = f
	}
	return f
}

// named returns its factorial through a named result that a deferred
// closure also assigns; a closure that assigns the accumulator makes the
// analyzer leave the loop alone.
func named(n int) (f float64) {
	defer func() {
		if math.IsInf(f, 0) {
			f = math.MaxFloat64
		}
	}()
	f = 1
	for i := 2; i <= n; i++ {
		f *= float64(i)
	}
	return
}

// namedPlain has a named result and no closure.
func namedPlain(n int) (f float64) {
	f = 1
	for i := 2; i <= n; i++ { // want `factorial of n in float64 overflows`
		f *= float64(i)
	}
	return
}
