// Package factorialloop holds the factorial-loop category's cases: loops
// that multiply an accumulator by their induction variable. 20! is the
// largest factorial in int64 and 170! the largest in float64 (OEIS
// A000142, from memory).
package factorialloop

// Fact has no bound on n: possible, fixed by a range guard.
func Fact(n int64) int64 { // want Fact:`factorial of parameter 0, breaks from 21` Fact:`wrong for some n`
	r := int64(1)
	for i := int64(2); i <= n; i++ { // want `factorial of n in int64 wraps for n ≥ 21 \(20! ≈ 2.43e18 is the largest that fits\); n is not bounded here`
		r *= i
	}
	return r
}

// Table multiplies up to the constant 25: definite.
func Table() int64 {
	r := int64(1)
	for i := int64(1); i <= 25; i++ { // want `factorial of 25 in int64 wraps`
		r *= i
	}
	return r
}

// Bounded checks its argument first: silent.
func Bounded(n int64) int64 { // want Bounded:`factorial of parameter 0, safe for \[2, 20\]`
	if n > 20 {
		return -1
	}
	r := int64(1)
	for i := int64(2); i <= n; i++ {
		r *= i
	}
	return r
}

// FloatFact stays below 171: silent.
func FloatFact(n int) float64 { // want FloatFact:`factorial of parameter 0, safe for \[2, 170\]`
	if n > 170 {
		return 0
	}
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

// Reset is no product: a closure holds the accumulator's address and
// may change it between the factors (the analyzer asks which variables
// closures change, and &r is one way to change r).
func Reset(n int64, stop func(int64) bool) int64 {
	r := int64(1)
	clear := func() {
		p := &r
		*p = 1
	}
	for i := int64(2); i <= n; i++ {
		r *= i
		if stop(i) {
			clear()
		}
	}
	return r
}

// FloatLoop returns its float64 product as it is: past 170 it is +Inf,
// the IEEE value of a result beyond float64, not a wrong one, and a
// guard would make the function panic there. Silent; the fact stays
// for the callers' arithmetic.
func FloatLoop(n float64) float64 { // want FloatLoop:`factorial of parameter 0, breaks from 171`
	v := 1.0
	for i := 2.0; i <= n; i++ {
		v *= i
	}
	return v
}

// FloatIntCounter multiplies by float64(i) and returns the product:
// silent, as FloatLoop.
func FloatIntCounter(n int) float64 { // want FloatIntCounter:`factorial of parameter 0, breaks from 171`
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

// Real is a named float type.
type Real float64

// NamedFloat returns a product of a named float type as it is: silent.
func NamedFloat(n int) Real { // want NamedFloat:`factorial of parameter 0, breaks from 171`
	r := Real(1)
	for i := 2; i <= n; i++ {
		r *= Real(i)
	}
	return r
}

// FloatRatio divides by its float product in the same function: the
// product is +Inf from 171 while x^n/n! is finite, so the loop is
// reported, and fixed by carrying both products in log space.
func FloatRatio(x float64, n int) float64 { // want FloatRatio:`wrong for some n`
	f := 1.0
	for i := 2; i <= n; i++ { // want `factorial of n in float64 overflows to \+Inf for n ≥ 171`
		f *= float64(i)
	}
	p := 1.0
	for i := 0; i < n; i++ {
		p *= x
	}
	return p / f
}

// FloatBinom divides two results of the silent FloatLoop: the caller's
// ratio is reported, n! is +Inf from 171 although C(n, k) fits.
func FloatBinom(n, k float64) float64 { // want FloatBinom:`value Γ\(p0 \+ 1\)/\(Γ\(p1 \+ 1\)·Γ\(p0 - p1 \+ 1\)\), wrong once p0 ≥ 171` FloatBinom:`wrong for n ≥ 171`
	return FloatLoop(n) / (FloatLoop(k) * FloatLoop(n-k)) // want `ratio of factorials in float64: the numerator n! overflows to \+Inf for n ≥ 171`
}

// FloatToCount converts its float product to an integer: past 170 the
// +Inf becomes a wrong count, so the loop is reported.
func FloatToCount(n int) (float64, int64) { // want FloatToCount:`factorial of parameter 0, breaks from 171`
	r := 1.0
	for i := 2; i <= n; i++ { // want `factorial of n in float64 overflows to \+Inf for n ≥ 171`
		r *= float64(i)
	}
	return r, int64(r)
}

// Tripled returns three times its product: 3·20! still fits uint64,
// 21! alone does not, so a guard before the loop is exact.
func Tripled(n uint64) uint64 { // want Tripled:`wrong for some n`
	r := uint64(1)
	for i := uint64(1); i <= n; i++ { // want `factorial of n in uint64 wraps for n ≥ 21`
		r *= i
	}
	return 3 * r
}

// Share divides by its product instead of returning it: no guard.
func Share(n int64) int64 { // want Share:`wrong for some n`
	r := int64(1)
	for i := int64(2); i <= n; i++ { // want `factorial of n in int64 wraps for n ≥ 21`
		r *= i
	}
	return 1000 / r
}

// Staged multiplies in its product only for an even count: the guard
// goes before the loop, where the count is known to be even, and an odd
// count keeps its answer 1.
func Staged(n int) int { // want Staged:`factorial of parameter 0, breaks from 21` Staged:`wrong for some n`
	r := 1
	if n%2 == 0 {
		for i := 2; i <= n; i++ { // want `factorial of n in int wraps for n ≥ 21`
			r *= i
		}
	}
	return r
}

// Rounds runs its loop once per round: a guard before the loop would
// test the argument on every round, and none is offered.
func Rounds(n, rounds int64) int64 { // want Rounds:`factorial of parameter 0, breaks from 21` Rounds:`wrong for some n`
	var r int64
	for j := int64(0); j < rounds; j++ {
		r = 1
		for i := int64(2); i <= n; i++ { // want `factorial of n in int64 wraps for n ≥ 21`
			r *= i
		}
	}
	return r
}

// LastDigits returns n!, or on request its last three digits, which fit
// whatever n is: a guard would make that call panic, so none is offered
// although the function returns its product elsewhere.
func LastDigits(n int64, short bool) int64 { // want LastDigits:`factorial of parameter 0, breaks from 21` LastDigits:`wrong for some n`
	r := int64(1)
	for i := int64(2); i <= n; i++ { // want `factorial of n in int64 wraps for n ≥ 21`
		r *= i
	}
	if short {
		return r % 1000
	}
	return r
}

// CountDown counts its parameter down in the loop's post statement, with
// no init statement: the loop still starts from the argument, which a
// guard at the entry tests.
func CountDown(n int64) int64 { // want CountDown:`factorial of parameter 0, breaks from 21` CountDown:`wrong for some n`
	f := int64(1)
	for ; n > 1; n-- { // want `factorial of n in int64 wraps for n ≥ 21`
		f *= n
	}
	return f
}

// SmallTable's closure is called only with arguments below 19, by the
// function that binds it (Catalan numbers, (2n)!/((n+1)!·n!), OEIS A000108).
func SmallTable() [10]int64 {
	var t [10]int64
	fact := func(n int64) int64 {
		v := int64(1)
		for i := int64(2); i <= n; i++ {
			v *= i
		}
		return v
	}
	for n := int64(0); n < 10; n++ {
		t[n] = fact(2*n) / (fact(n+1) * fact(n))
	}
	return t
}

// LooseTable's closure escapes as a value: its calls are not all there
// can be, and its parameter is not bounded.
func LooseTable(apply func(func(int64) int64)) {
	fact := func(n int64) int64 {
		v := int64(1)
		for i := int64(2); i <= n; i++ { // want `factorial of n in int64 wraps for n ≥ 21`
			v *= i
		}
		return v
	}
	apply(fact)
}

// Span multiplies the integers from lo to hi, ends of their own: with lo
// at 1 it is hi!, possible.
func Span(lo, hi int64) int64 { // want Span:`wrong for some lo or some hi`
	p := int64(1)
	for v := lo; v <= hi; v++ { // want `product of the factors from lo up to hi in int64 wraps: with lo at 1 or 2 it is hi!, which wraps for hi ≥ 21; hi is not bounded here`
		p *= v
	}
	return p
}

// SpanSmall bounds its top: silent.
func SpanSmall(lo, hi int64) int64 {
	if hi > 20 {
		return 0
	}
	p := int64(1)
	for v := lo; v <= hi; v++ {
		p *= v
	}
	return p
}

// SpanAbove starts above 2: a product of hi-lo+1 factors with no bound
// on their number, not a factorial; left alone.
func SpanAbove(lo, hi int64) int64 {
	if lo < 3 {
		return 0
	}
	p := int64(1)
	for v := lo; v <= hi; v++ {
		p *= v
	}
	return p
}
