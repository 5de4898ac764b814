package thresholds

import (
	"math"
	"math/big"
	"testing"
)

// TestFirstWrongInteger runs the conversions programs write over
// exp(ln Γ(n+1)) and Γ(n+1) and compares each FirstWrongInteger with a
// plain scan against n! from math/big, and with the facts: 5! comes out
// as 119 through a truncation (the example of the project's issue 16,
// reproduced here), and 20! is the largest factorial in int64 (OEIS
// A000142), where math.Gamma, exact up to there, first fails.
func TestFirstWrongInteger(t *testing.T) {
	i64 := mustNamed(t, "int64", nil)
	f64 := mustNamed(t, "float64", nil)
	expLg := func(n int64) float64 { return math.Exp(lgammaOf(float64(n) + 1)) }
	cases := []struct {
		name string
		t    Num
		eval func(int64) float64
		want int64 // 0: checked by the scan alone
	}{
		{"int64(exp(lgamma))", i64, expLg, 5},
		{"int64(Round(exp(lgamma)))", i64, func(n int64) float64 { return math.Round(expLg(n)) }, 0},
		{"int64(Gamma)", i64, func(n int64) float64 { return math.Gamma(float64(n) + 1) }, 21},
		{"Floor(exp(lgamma))", f64, func(n int64) float64 { return math.Floor(expLg(n)) }, 5},
	}
	for _, c := range cases {
		got, ok := FirstWrongInteger(c.t, func(n int64) (float64, bool) { return c.eval(n), true }, Factorial64, 0, 170)
		if !ok {
			t.Errorf("%s: never wrong", c.name)
			continue
		}
		// The plain scan: the converted value against n!.
		scan := int64(-1)
		for n := int64(0); n <= 170 && scan < 0; n++ {
			v := c.eval(n)
			var right bool
			if c.t.Float {
				want, _ := new(big.Float).SetInt(factorial(n)).Float64()
				right = v == want
			} else {
				bi, _ := new(big.Float).SetFloat64(math.Trunc(v)).Int(nil)
				right = !math.IsInf(v, 0) && bi.Cmp(factorial(n)) == 0 && bi.IsInt64()
			}
			if !right {
				scan = n
			}
		}
		if got != scan || c.want != 0 && got != c.want {
			t.Errorf("%s: first wrong n = %d, scan %d, want %d", c.name, got, scan, c.want)
		}
	}
}
