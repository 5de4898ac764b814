package analyzer

import (
	"math"
	"math/big"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"
)

// TestMemoRecursion runs a hotel exchange's line sizing: factorials
// kept in a map, an array and a growing slice, each filled by n·f(n−1)
// stored before it is returned (reported through their callers, or at
// the int recursion), and the same formulas bounded or by a recurrence
// without factorials (silent).
func TestMemoRecursion(t *testing.T) {
	analysistest.Run(t, testdata(t), Analyzer, "switchboard")
}

// TestMemoRecursionProbe shows switchboard.BusyShare's wrong value
// beside math/big: with 200 lines at 150 erlangs the float64 power
// 150^200 and 200! are both +Inf, so the loss formula is NaN, while the
// exact ratio of rationals (math/big) is a share between 0 and 1.
func TestMemoRecursionProbe(t *testing.T) {
	const load, lines = 150, 200
	fact := 1.0
	top := 0.0
	sum := 0.0
	for i := 0; i <= lines; i++ {
		if i > 1 {
			fact *= float64(i)
		}
		term := math.Pow(load, float64(i)) / fact
		sum += term
		if i == lines {
			top = term
		}
	}
	if got := top / sum; !math.IsNaN(got) {
		t.Fatalf("BusyShare(%d, %d) in float64 = %v, want NaN", load, lines, got)
	}
	exTop := new(big.Rat)
	exSum := new(big.Rat)
	for i := int64(0); i <= lines; i++ {
		term := new(big.Rat).SetFrac(new(big.Int).Exp(big.NewInt(load), big.NewInt(i), nil), new(big.Int).MulRange(1, i))
		exSum.Add(exSum, term)
		if i == lines {
			exTop = term
		}
	}
	share, _ := new(big.Rat).Quo(exTop, exSum).Float64()
	if !(share > 0 && share < 1) {
		t.Fatalf("exact BusyShare(%d, %d) = %v, want a share in (0, 1)", load, lines, share)
	}
}
