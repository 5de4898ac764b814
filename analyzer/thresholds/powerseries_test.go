package thresholds

import (
	"math"
	"math/big"
	"testing"
)

// TestPowerSeriesFirstBad: the partial sums 1 + x (n = 1) and
// 1 + x + x²/2 (n = 2) pass float64 where their closed forms say
// (never, and x = √(2·MaxFloat64) − 1 up to a few ulps);
// for many terms the point is ln MaxFloat64 ≈ 709.7827 (e^x itself,
// DLMF 4.2.19), and in between it falls with n. Each answer is checked
// against the series summed with math/big at it and one float64 below.
func TestPowerSeriesFirstBad(t *testing.T) {
	f64, _ := Named("float64", nil)
	if got := PowerSeriesFirstBad(f64, 1); !math.IsInf(got, 1) {
		// 1 + MaxFloat64 rounds to MaxFloat64: no finite x makes 1 + x
		// overflow.
		t.Errorf("n = 1: %v, want +Inf", got)
	}
	if got, want := PowerSeriesFirstBad(f64, 2), math.Sqrt2*math.Sqrt(math.MaxFloat64)-1; math.Abs(got-want) > 1e-14*want {
		t.Errorf("n = 2: %v, want about %v", got, want)
	}
	if got := PowerSeriesFirstBad(f64, 100000); math.Abs(got-math.Log(math.MaxFloat64)) > 1e-9 {
		t.Errorf("n = 100000: %v, want ln MaxFloat64 = %v", got, math.Log(math.MaxFloat64))
	}
	prev := math.Inf(1)
	// The least real that rounds to +Inf: 2^1024 − 2^970 (IEEE 754
	// binary64, from memory), built here from its two powers of two.
	over := new(big.Float).SetPrec(256).SetMantExp(big.NewFloat(1), 1024)
	over.Sub(over, new(big.Float).SetMantExp(big.NewFloat(1), 970))
	for _, n := range []int64{2, 10, 100, 150, 700, 1000, 4000} {
		x := PowerSeriesFirstBad(f64, n)
		if x > prev || x == prev && n < 1000 {
			t.Errorf("n = %d: %v, not below n's before (%v)", n, x, prev)
		}
		prev = x
		if partialExp(x, n).Cmp(over) < 0 || partialExp(math.Nextafter(x, 0), n).Cmp(over) >= 0 {
			t.Errorf("n = %d: %v is not the first float64 whose sum rounds to +Inf", n, x)
		}
		// float64 arithmetic agrees where it is exact enough to: the
		// sum formed term by term is +Inf at 1.01·x and finite at 0.99·x.
		if s := floatSeries(1.01*x, n); !math.IsInf(s, 1) {
			t.Errorf("n = %d: float64 sum at 1.01·%v is %v, want +Inf", n, x, s)
		}
		if s := floatSeries(0.99*x, n); math.IsInf(s, 0) {
			t.Errorf("n = %d: float64 sum at 0.99·%v is +Inf", n, x)
		}
	}
	if got := PowerSeriesFirstBad(Num{Name: "int", Bits: 64, Signed: true}, 10); !math.IsInf(got, 1) {
		t.Errorf("integer type: %v, want +Inf", got)
	}
}

// floatSeries sums x^k/k! for k ≤ n in float64, each term from the one
// before, as code does.
func floatSeries(x float64, n int64) float64 {
	term, sum := 1.0, 1.0
	for k := int64(1); k <= n; k++ {
		term *= x / float64(k)
		sum += term
	}
	return sum
}
