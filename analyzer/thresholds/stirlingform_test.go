package thresholds

import (
	"math"
	"math/big"
	"testing"
)

// TestStirlingRelError compares the relative error of √(2πn)(n/e)^n
// against n! with values computed by mpmath 1.2.1 at 40 digits:
// 1 - sqrt(2*pi*n)*(n/e)**n/factorial(n). n = 31, 32 and 33 lie on both
// sides of where the series takes over from the recurrence.
func TestStirlingRelError(t *testing.T) {
	for _, c := range []struct {
		n    int64
		want float64
	}{
		{1, 0.077862991104210883121},
		{2, 0.040497824255508421056},
		{5, 0.016506933686749333456},
		{10, 0.008295960443938513662},
		{31, 0.0026844691797015268802},
		{32, 0.0026006942391674074721},
		{33, 0.0025219896766767087901},
		{100, 0.00083298343215699983188},
		{1000, 0.00008332985843001420668},
		{1000000, 8.3333329861108429784e-8},
	} {
		got := StirlingRelError(c.n)
		if math.Abs(got-c.want) > 1e-13*c.want {
			t.Errorf("StirlingRelError(%d) = %.17g, want %.17g (mpmath)", c.n, got, c.want)
		}
	}
	if !math.IsNaN(StirlingRelError(0)) {
		t.Error("StirlingRelError(0) is not NaN")
	}
}

// TestStirlingRelErrorBelow checks the first n below a tolerance against
// a scan of StirlingRelError and against Robbins' bracket
// 1/(12n+1) < δ(n) < 1/(12n).
func TestStirlingRelErrorBelow(t *testing.T) {
	for _, tol := range []float64{0.1, 0.05, 0.01, 1e-3, 1e-5, 1e-8, 1e-12} {
		n := StirlingRelErrorBelow(tol)
		if StirlingRelError(n) > tol || n > 1 && StirlingRelError(n-1) <= tol {
			t.Errorf("StirlingRelErrorBelow(%g) = %d: error there %g, one below %g", tol, n, StirlingRelError(n), StirlingRelError(n-1))
		}
		d := -math.Log1p(-tol)
		if lo, hi := 1/(12*d)-1, 1/(12*d)+1; float64(n) < lo-1/12.0 || float64(n) > hi {
			t.Errorf("StirlingRelErrorBelow(%g) = %d outside Robbins' bracket [%g, %g]", tol, n, lo, hi)
		}
	}
	if StirlingRelErrorBelow(0.5) != 1 || StirlingRelErrorBelow(0) != math.MaxInt64 {
		t.Error("special cases")
	}
}

// TestSelfPower checks n^n and n^(n±½) against a plain math/big scan and,
// for float64, against math.Pow itself: 143^143 is finite, 144^144 +Inf.
func TestSelfPower(t *testing.T) {
	f64, _ := Named("float64", nil)
	if got := SelfPower(f64, 0); got != 144 || math.IsInf(math.Pow(143, 143), 0) || !math.IsInf(math.Pow(144, 144), 1) {
		t.Errorf("SelfPower(float64, 0) = %d; math.Pow(143, 143) = %g, math.Pow(144, 144) = %g", got, math.Pow(143, 143), math.Pow(144, 144))
	}
	for _, name := range []string{"float32", "float64", "int64", "uint32"} {
		num, _ := Named(name, nil)
		max := new(big.Float).SetInt(num.MaxInt())
		for h := int64(-1); h <= 1; h++ {
			want := int64(1)
			for ; ; want++ {
				// n^(n+h/2) as the square root of the exact integer
				// n^(2n+h), at 256 bits: far more than the digits that
				// separate neighbours here.
				p := new(big.Float).SetPrec(256).SetInt(new(big.Int).Exp(big.NewInt(want), big.NewInt(2*want+h), nil))
				p.Sqrt(p)
				if p.Cmp(max) > 0 {
					break
				}
			}
			if got := SelfPower(num, h); got != want {
				t.Errorf("SelfPower(%s, %d) = %d, want %d", name, h, got, want)
			}
		}
	}
}

// TestGammaNegativeIn checks every witness with math.Gamma and, where
// none is given, that Γ is not negative at 2000 points of the interval.
func TestGammaNegativeIn(t *testing.T) {
	inf := math.Inf(1)
	cases := []struct{ lo, hi float64 }{
		{-inf, inf}, {-0.3, 5}, {-1.8, -1.2}, {-0.5, -0.5}, {-2, -1}, {-2.5, -1.5},
		{-7.9, -6.1}, {-7.9, -5.5}, {0, 3}, {-inf, -10.2}, {-3, -2}, {1, 2},
	}
	for _, c := range cases {
		x, ok := GammaNegativeIn(c.lo, c.hi)
		if ok {
			if x < c.lo || x > c.hi || !(math.Gamma(x) < 0) {
				t.Errorf("GammaNegativeIn(%g, %g) = %g: outside, or Γ = %g", c.lo, c.hi, x, math.Gamma(x))
			}
			continue
		}
		lo, hi := math.Max(c.lo, -1e3), math.Min(c.hi, 1e3)
		for i := 0; i <= 2000; i++ {
			y := lo + (hi-lo)*float64(i)/2000
			if g := math.Gamma(y); g < 0 {
				t.Errorf("GammaNegativeIn(%g, %g) found nothing, but Γ(%g) = %g", c.lo, c.hi, y, g)
				break
			}
		}
	}
}
