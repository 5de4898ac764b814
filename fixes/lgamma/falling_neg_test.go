package lgamma

import (
	"math"
	"math/big"
	"testing"
)

// TestFallingNegative checks the falling factorial of a negative n, the
// product n(n−1)…(n−k+1) of k negative factors, against that product
// formed in math/big: exact in FallingInt64 where it fits int64 (and
// not ok where it does not), within 1e-15 relative in Falling, and the
// panic of MustFallingInt64 naming the caller's n and k.
func TestFallingNegative(t *testing.T) {
	for _, n := range []int64{-1, -2, -3, -7, -20, -100, -1000, math.MinInt64 + 1, math.MinInt64} {
		for _, k := range []int64{0, 1, 2, 3, 5, 17, 18, 25, 160, 200} {
			exact := big.NewInt(1)
			for i := int64(0); i < k; i++ {
				exact.Mul(exact, new(big.Int).Sub(big.NewInt(n), big.NewInt(i)))
			}
			got, ok := FallingInt64(n, k)
			if fits := exact.IsInt64(); ok != fits || fits && got != exact.Int64() {
				t.Errorf("FallingInt64(%d, %d) = %d, %v; exact %v (fits int64: %v)", n, k, got, ok, exact, fits)
			}
			want, _ := new(big.Float).SetInt(exact).Float64()
			f := Falling(int(n), int(k))
			if math.IsInf(want, 0) {
				if f != want {
					t.Errorf("Falling(%d, %d) = %v, want %v", n, k, f, want)
				}
				continue
			}
			if d := math.Abs(f-want) / math.Abs(want); d > 1e-15 {
				t.Errorf("Falling(%d, %d) = %v, want %v (relative error %.3g)", n, k, f, want, d)
			}
		}
	}
	// −2^63 is the one magnitude past MaxInt64 that fits: −2^63 itself.
	if v, ok := FallingInt64(math.MinInt64, 1); !ok || v != math.MinInt64 {
		t.Errorf("FallingInt64(MinInt64, 1) = %d, %v; want MinInt64, true", v, ok)
	}
	defer func() {
		if msg := recover(); msg != "lgamma: MustFallingInt64(-3, 25): result does not fit in int64" {
			t.Errorf("MustFallingInt64(-3, 25) panicked with %v", msg)
		}
	}()
	MustFallingInt64(-3, 25)
}
