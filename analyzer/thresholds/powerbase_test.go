package thresholds

import (
	"math"
	"math/big"
	"testing"
)

// TestPowerBaseFirstBad checks each answer against an exact power in
// math/big: x^k exceeds the type's largest value and the float64 just
// below x does not. 2^1024 > MaxFloat64 ≥ 2^1023 and 10^308 fits while
// 10^309 does not (IEEE 754 binary64, common practice), which pins the
// answers for k = 1024 and k = 1 and k = 308.
func TestPowerBaseFirstBad(t *testing.T) {
	exceeds := func(x float64, k int64, max *big.Int) bool {
		p := new(big.Float).SetPrec(uint(53*k + 64)).SetFloat64(1)
		b := new(big.Float).SetPrec(uint(53*k + 64)).SetFloat64(x)
		for i := int64(0); i < k; i++ {
			p.Mul(p, b)
		}
		return p.Cmp(new(big.Float).SetInt(max)) > 0
	}
	for _, name := range []string{"float64", "float32", "int64"} {
		typ := mustNamed(t, name, nil)
		max := typ.MaxInt()
		for _, k := range []int64{1, 2, 3, 32, 99, 308, 1023, 1024} {
			x := PowerBaseFirstBad(typ, k)
			below := math.Nextafter(x, 0)
			if !exceeds(x, k, max) || exceeds(below, k, max) {
				t.Errorf("PowerBaseFirstBad(%s, %d) = %v: %v^k exceeds max: %v, %v^k exceeds: %v", name, k, x, x, exceeds(x, k, max), below, exceeds(below, k, max))
			}
		}
	}
	f64 := mustNamed(t, "float64", nil)
	if x := PowerBaseFirstBad(f64, 1024); x <= 1.9999 || x > 2 {
		t.Errorf("PowerBaseFirstBad(float64, 1024) = %v, want just below or at 2", x)
	}
	if x := PowerBaseFirstBad(f64, 308); x <= 10 || x > 10.1 {
		t.Errorf("PowerBaseFirstBad(float64, 308) = %v, want just above 10", x)
	}
	if x := PowerBaseFirstBad(f64, 0); !math.IsInf(x, 1) {
		t.Errorf("PowerBaseFirstBad(float64, 0) = %v, want +Inf", x)
	}
}
