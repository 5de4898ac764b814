package thresholds

import (
	"math"
	"math/big"
	"testing"
)

// PowUnderflow against the exact power b^k in math/big: IEEE 754
// binary64's smallest normal is 2^−1022 and a value at or below half
// its smallest subnormal, 2^−1075, rounds to 0 (round half to even;
// common practice). At b = 1/2 the points are exactly 1023 and 1075.
func TestPowUnderflow(t *testing.T) {
	f64, _ := Named("float64", nil)
	normal := new(big.Float).SetMantExp(big.NewFloat(1), -1022)
	half := new(big.Float).SetMantExp(big.NewFloat(1), -1075)
	// The product b^k one factor at a time, at a precision that keeps
	// it within one part in 2^4000 over these k.
	first := func(b float64, bad func(*big.Float) bool) int64 {
		p := new(big.Float).SetPrec(4096).SetInt64(1)
		x := new(big.Float).SetPrec(4096).SetFloat64(b)
		for k := int64(0); ; k++ {
			if bad(p) {
				return k
			}
			p.Mul(p, x)
		}
	}
	for _, b := range []float64{0.5, 0.1, 0.9, 0.75, 1e-10} {
		sub, zero := PowUnderflow(f64, b)
		wantSub := first(b, func(p *big.Float) bool { return p.Cmp(normal) < 0 })
		wantZero := first(b, func(p *big.Float) bool { return p.Cmp(half) <= 0 })
		if sub != wantSub || zero != wantZero {
			t.Errorf("PowUnderflow(%v) = %d, %d; math/big: %d, %d", b, sub, zero, wantSub, wantZero)
		}
	}
	if sub, zero := PowUnderflow(f64, 0.5); sub != 1023 || zero != 1075 {
		t.Errorf("PowUnderflow(1/2) = %d, %d, want 1023, 1075 (2^−1022 is the smallest normal)", sub, zero)
	}
	f32, _ := Named("float32", nil)
	for _, c := range []struct {
		t Num
		b float64
	}{{f32, 0.5}, {f64, 1}, {f64, 0}, {f64, 1.5}, {f64, math.NaN()}} {
		if s, z := PowUnderflow(c.t, c.b); s != math.MaxInt64 || z != math.MaxInt64 {
			t.Errorf("PowUnderflow(%v, %v) = %d, %d, want MaxInt64", c.t, c.b, s, z)
		}
	}
}
