package thresholds

import (
	"math"
	"math/big"
	"testing"
)

// TestSearchSurvivesWrongBounds feeds the search bounds that are off by
// a whole unit of ln: the exact confirmation must catch it and the
// fallback must still find 21 for n! in int64 (OEIS A000142: 20! <
// 2^63−1 < 21!).
func TestSearchSurvivesWrongBounds(t *testing.T) {
	i64 := mustNamed(t, "int64", nil)
	for _, off := range []float64{-1, +1} {
		s := factorialShape
		s.bounds = func(n int64) (lo, hi float64) {
			lo, hi = LogFactorialBounds(n)
			return lo + off, hi + off
		}
		if got := firstBad(s, i64.maxInt(), i64.logMax()); got != 21 {
			t.Errorf("bounds off by %v: first bad %d, want 21", off, got)
		}
	}
}

func TestSearchNoneBelowCap(t *testing.T) {
	// A constant sequence never breaks.
	s := shape{
		bounds: func(int64) (float64, float64) { return 0, 0 },
		fits:   func(int64, *big.Int) bool { return true },
	}
	if got := firstBad(s, big.NewInt(1), 0); got != math.MaxInt64 {
		t.Errorf("constant shape: %d, want MaxInt64", got)
	}
}

func TestLogBig(t *testing.T) {
	// ln(2^63 − 1) ≈ 63 ln 2 and ln(10^400) = 400 ln 10 (common practice).
	tests := []struct {
		x    *big.Int
		want float64
	}{
		{big.NewInt(math.MaxInt64), 63 * math.Ln2},
		{new(big.Int).Exp(big.NewInt(10), big.NewInt(400), nil), 400 * math.Ln10},
		{big.NewInt(120), math.Log(120)},
	}
	for _, tt := range tests {
		if got := logBig(tt.x); math.Abs(got-tt.want) > 1e-13*tt.want {
			t.Errorf("logBig(%v) = %v, want %v", tt.x, got, tt.want)
		}
	}
}
