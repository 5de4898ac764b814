package lgamma

import (
	"fmt"
	"math"
	"math/big"
	"testing"
)

// emptyFact is x! by its definition, with the empty product 1 for x < 2,
// in math/big.
func emptyFact(x int64) *big.Int {
	r := big.NewInt(1)
	for i := int64(2); i <= x; i++ {
		r.Mul(r, big.NewInt(i))
	}
	return r
}

// quotientRef is num!/(den₁!·…) rounded toward zero, in math/big.
func quotientRef(num int64, den ...int64) *big.Int {
	d := big.NewInt(1)
	for _, x := range den {
		d.Mul(d, emptyFact(x))
	}
	return new(big.Int).Quo(emptyFact(num), d)
}

func TestFactorialQuotientInt64AgainstBig(t *testing.T) {
	check := func(num int64, den ...int64) {
		t.Helper()
		want := quotientRef(num, den...)
		got, ok := FactorialQuotientInt64(num, den...)
		if ok != want.IsInt64() || ok && got != want.Int64() {
			t.Errorf("FactorialQuotientInt64(%d, %v) = %d, %v; math/big says %s", num, den, got, ok, want)
		}
	}
	vals := []int64{-30, -3, -1, 0, 1, 2, 3, 5, 10, 13, 20, 21, 25, 28, 34, 40, 62, 66, 67, 100}
	for _, n := range vals {
		check(n)
		for _, a := range vals {
			check(n, a)
			for _, b := range vals {
				check(n, a, b)
				check(n, a, b, 3)
			}
		}
	}
	// Near the int64 boundary and with long products.
	check(1000, 999)
	check(1000, 990)
	check(1000, 996, 2)
	check(1000, 995, 2)
	check(3000, 1500, 1500)
	check(68, 34, 34)
}

func TestMustFactorialQuotientInt64PanicNamesArguments(t *testing.T) {
	defer func() {
		r := recover()
		want := "lgamma: MustFactorialQuotientInt64(25, -5): result does not fit in int64"
		if fmt.Sprint(r) != want {
			t.Errorf("panic %q, want %q", r, want)
		}
	}()
	MustFactorialQuotientInt64(25, -5)
}

func TestFactorialQuotientInt64Binomial(t *testing.T) {
	// Inside 0 ≤ k ≤ n the quotient is C(n, k), which ChooseInt64 computes
	// by another formula.
	for n := int64(0); n <= 70; n++ {
		for k := int64(0); k <= n; k++ {
			q, qok := FactorialQuotientInt64(n, k, n-k)
			c, cok := ChooseInt64(n, k)
			if q != c || qok != cok {
				t.Fatalf("(%d, %d): quotient %d %v, ChooseInt64 %d %v", n, k, q, qok, c, cok)
			}
		}
	}
}

// TestChooseFactorialsAgainstBig compares ChooseFactorials with
// n!/(k!·(n−k)!) in math/big, the factorial of a number below 2 being
// the empty product 1 and the quotient rounded toward zero (quotientRef),
// rounded to float64 by math/big: within one ulp, as Choose is.
func TestChooseFactorialsAgainstBig(t *testing.T) {
	for _, n := range []int64{-40, -5, -2, -1, 0, 1, 2, 3, 20, 21, 34, 62, 67, 100, 171, 400} {
		for _, k := range []int64{-41, -6, -3, -2, -1, 0, 1, 2, 3, 10, 30, 67, 100, 200, 401} {
			want, _ := new(big.Float).SetInt(quotientRef(n, k, n-k)).Float64()
			got := ChooseFactorials(int(n), int(k))
			if got != want && !(math.Abs(got-want) <= math.Abs(want)*0x1p-52) {
				t.Errorf("ChooseFactorials(%d, %d) = %g; math/big gives %g", n, k, got, want)
			}
		}
	}
}

// TestFloorFactorialQuotientAgainstBig compares FloorFactorialQuotient
// with ⌊num⌋!/∏⌊den⌋! in math/big (emptyFact: the factorial below 2 is
// 1), rounded to float64 by math/big: within 4 ulps, 0 or +Inf where
// the quotient leaves float64.
func TestFloorFactorialQuotientAgainstBig(t *testing.T) {
	xs := []float64{-49.5, -3, -0.5, 0, 1, 1.5, 2, 2.5, 3, 12.25, 20, 34.5, 150.5, 170, 171, 200, 300.5, 700, 1030, 1500}
	floor := func(x float64) int64 {
		if x < 2 {
			return 0
		}
		return int64(x)
	}
	check := func(num float64, den ...float64) {
		t.Helper()
		q := new(big.Float).SetPrec(300).SetInt(emptyFact(floor(num)))
		for _, d := range den {
			q.Quo(q, new(big.Float).SetPrec(300).SetInt(emptyFact(floor(d))))
		}
		want, _ := q.Float64() // ±Inf past float64, 0 below it
		got := FloorFactorialQuotient(num, den...)
		if got != want && !(math.Abs(got-want) <= 4*math.Abs(want)*0x1p-52) {
			t.Errorf("FloorFactorialQuotient(%v, %v) = %g; math/big gives %g", num, den, got, want)
		}
	}
	for _, n := range xs {
		check(n)
		for _, k := range xs {
			check(n, k)
			check(n, k, n-k)
		}
	}
	if got := FloorFactorialQuotient(math.NaN(), 3); math.Abs(got-1.0/6) > 0x1p-54 {
		t.Errorf("FloorFactorialQuotient(NaN, 3) = %g, want 1/3! (the loop runs no trip for NaN)", got)
	}
}
