package thresholds

import (
	"math"
	"math/big"
	"testing"
)

// The float64 exponent range: the smallest normal is 2^−1022 and the
// smallest subnormal 2^−1074 (IEEE 754 binary64, common practice), so
// e^(−x) is subnormal from x just above 1022·ln 2 ≈ 708.396 and rounds
// to 0 from about (1074+1)·ln 2 ≈ 745.13.
func TestExpUnderflow(t *testing.T) {
	f64, _ := Named("float64", nil)
	sub, zero := ExpUnderflow(f64)
	if d := sub - 1022*math.Ln2; math.Abs(d) > 1e-9 {
		t.Errorf("subnormal from %v, want 1022·ln 2 = %v", sub, 1022*math.Ln2)
	}
	if zero < 1074*math.Ln2 || zero > 1075*math.Ln2 {
		t.Errorf("zero from %v, want within [1074, 1075]·ln 2", zero)
	}
	if math.Exp(-zero) != 0 || math.Exp(-math.Nextafter(zero, 0)) == 0 {
		t.Errorf("zero point %v is not the first x with exp(-x) == 0", zero)
	}
	f32, _ := Named("float32", nil)
	if s, z := ExpUnderflow(f32); !math.IsInf(s, 1) || !math.IsInf(z, 1) {
		t.Errorf("float32: got %v, %v, want +Inf", s, z)
	}
}

// BinomialLoopDownFits against a plain math/big run of the loop, for
// every n, k up to 70 in int64 and a few float64 cases near its central
// limit.
func TestBinomialLoopDownFits(t *testing.T) {
	i64, _ := Named("int64", nil)
	max := new(big.Int).SetInt64(math.MaxInt64)
	run := func(n, k int64, max *big.Int) bool {
		r := big.NewInt(1)
		for d := int64(1); d <= k; d++ {
			r.Mul(r, big.NewInt(n-d+1))
			if r.CmpAbs(max) > 0 {
				return false
			}
			r.Quo(r, big.NewInt(d))
		}
		return true
	}
	for n := int64(-3); n <= 70; n++ {
		for k := int64(0); k <= 72; k++ {
			if got, want := BinomialLoopDownFits(i64, n, k), run(n, k, max); got != want {
				t.Fatalf("n=%d k=%d: got %v, want %v", n, k, got, want)
			}
		}
	}
	f64, _ := Named("float64", nil)
	fmax, _ := new(big.Float).SetFloat64(math.MaxFloat64).Int(nil)
	for n := int64(1015); n <= 1035; n++ {
		k := n / 2
		if got, want := BinomialLoopDownFits(f64, n, k), run(n, k, fmax); got != want {
			t.Errorf("float64 n=%d k=%d: got %v, want %v", n, k, got, want)
		}
	}
}
