package lgamma

// Quotients of factorials as code computes them with a factorial
// function of its own: a loop from 2 up to n, or a recursion that stops
// at n ≤ 1, returns the empty product 1 for every n below 2, negative n
// included. Outside the domain of Choose, Falling and Multinomial (k > n,
// a negative part) such code still computes a number, fact(5)/fact(7)·
// fact(−2) = 0 or fact(28)/(fact(21)·fact(−3)·fact(10)) = 1644, and a fix
// must keep it: these functions compute it exactly, rounded toward zero
// as Go's integer division is.

import (
	"math"
	"math/big"
	"sort"
)

// FactorialQuotientInt64 returns num!/(den₁!·den₂!·…) rounded toward
// zero, where the factorial of a negative number is 1 (the empty
// product), and true when the quotient fits in an int64; 0 and false
// when it does not.
//
// Accuracy: exact (checked against math/big in quotient_test.go).
//
// Special cases are:
//
//	FactorialQuotientInt64(n) = n!, n! ≤ MaxInt64
//	FactorialQuotientInt64(n, k, n−k) = C(n, k) for 0 ≤ k ≤ n
//	FactorialQuotientInt64(n, d…) = 0 when some d > max(n, 0)
func FactorialQuotientInt64(num int64, den ...int64) (int64, bool) {
	n := uint64(max(num, 0))
	ds := make([]uint64, 0, len(den))
	for _, d := range den {
		if d > 1 { // 0!, 1! and the empty product are 1
			ds = append(ds, uint64(d))
		}
	}
	sort.Slice(ds, func(i, j int) bool { return ds[i] > ds[j] })
	if len(ds) > 0 && ds[0] > n {
		// The largest divisor alone exceeds the numerator; the others
		// are at least 1.
		return 0, true
	}
	// The logarithm rules out the quotients far from int64 before any
	// big arithmetic: below 1 (zero) and beyond 2^63 (no fit). The margin
	// covers the rounding of LogFactorial, within a few ulps of values up
	// to ln n!.
	l, scale := LogFactorial(int(n)), LogFactorial(int(n))
	for _, d := range ds {
		ld := LogFactorial(int(d))
		l -= ld
		scale += ld
	}
	margin := 1 + scale*0x1p-40
	switch {
	case l < -margin:
		return 0, true
	case l > 63*math.Ln2+margin:
		return 0, false
	}
	// n!/ds[0]! is the product of the factors above the largest divisor.
	lo := int64(2)
	if len(ds) > 0 {
		lo = int64(ds[0]) + 1
	}
	q := new(big.Int).MulRange(lo, int64(n)) // 1 when lo > n
	d := big.NewInt(1)
	for _, x := range ds[min(1, len(ds)):] {
		d.Mul(d, new(big.Int).MulRange(2, int64(x)))
	}
	q.Quo(q, d)
	if !q.IsInt64() {
		return 0, false
	}
	return q.Int64(), true
}

// MustFactorialQuotientInt64 is like FactorialQuotientInt64 but panics
// when the quotient does not fit in an int64.
//
// Accuracy: exact (checked against math/big in quotient_test.go).
func MustFactorialQuotientInt64(num int64, den ...int64) int64 {
	r, ok := FactorialQuotientInt64(num, den...)
	if !ok {
		panic(mustError("MustFactorialQuotientInt64", args(append([]int64{num}, den...)...), "", "int64"))
	}
	return r
}

// ChooseFactorials returns, as a float64, what n!/(k!·(n−k)!) computes
// with a factorial function whose value below 2 is the empty product 1,
// the quotient rounded toward zero as Go's integer division rounds it:
// C(n, k) for 0 ≤ k ≤ n; elsewhere one of k and n−k is below 0 (its
// factorial is 1) and the quotient is 1 where every factorial in it is
// 1 (k ≤ 1 and n−k ≤ 1: 0!/(1!·(−1)!), or n < 0), and 0 where the
// other divisor exceeds the numerator. It is the value such a binomial
// function computes without wrapping, where MustFactorialQuotientInt64
// panics because it leaves int64.
//
// Accuracy: as Choose's (checked against math/big in quotient_test.go).
//
// Special cases are:
//
//	ChooseFactorials(n, k) = Choose(n, k) for 0 ≤ k ≤ n
//	ChooseFactorials(n, k) = 1 for k ≤ 1, n−k ≤ 1 and k or n−k below 0
//	ChooseFactorials(n, k) = 0 otherwise
func ChooseFactorials(n, k int) float64 {
	switch {
	case 0 <= k && k <= n:
		return Choose(n, k)
	case k <= 1 && n-k <= 1:
		return 1
	}
	return 0
}

// FloorFactorialQuotient returns ⌊num⌋!/(⌊den₁⌋!·⌊den₂⌋!·…) as a
// float64, where the factorial of a number below 2 (or NaN) is 1, the
// empty product: what a quotient of float64 factorial functions
// computes whose loops multiply the whole numbers from 2 up to their
// argument, for any argument, fractions included, without the overflow
// of each factorial on its own (+Inf/+Inf = NaN where the quotient is
// finite). The logarithms are taken in double-double, so the result is
// within a few ulps of the quotient, and ±Inf or 0 only where the
// quotient itself leaves float64.
//
// Accuracy: within 4 ulps (checked against math/big in quotient_test.go).
//
// Special cases are:
//
//	FloorFactorialQuotient(n, k, n−k) = Choose(n, k) for integers 0 ≤ k ≤ n
//	FloorFactorialQuotient(x) = 1 for x < 2 or NaN
//	FloorFactorialQuotient(+Inf, …) = +Inf unless a divisor is +Inf too
func FloorFactorialQuotient(num float64, den ...float64) float64 {
	l := lnFloorFactorial(num)
	for _, d := range den {
		l = l.sub(lnFloorFactorial(d))
	}
	return expOf(l)
}

// lnFloorFactorial is ln ⌊x⌋!, 0 below 2 and for NaN.
func lnFloorFactorial(x float64) dd {
	switch {
	case !(x >= 2):
		return dd{}
	case x >= 0x1p63:
		return dd{math.Inf(1), 0}
	}
	return lnFactDD(uint64(x))
}
