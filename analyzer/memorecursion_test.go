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

// TestFallingRecursionProbe shows the falling-factorial recursion of
// testdata/src/factorialrecursion/counts.go (Legs: n·f(n−1, k−1), 1 at
// k = 0) beside math/big: Legs(100, 2) = 9900 fits, so no guard on n
// alone may refuse it, and Legs(n, n) = n! first wraps int64 at n = 21,
// the n the message names.
func TestFallingRecursionProbe(t *testing.T) {
	var legs func(n, k int64) int64
	legs = func(n, k int64) int64 {
		if k == 0 {
			return 1
		}
		return n * legs(n-1, k-1)
	}
	if got, want := legs(100, 2), new(big.Int).MulRange(99, 100); !want.IsInt64() || got != want.Int64() {
		t.Errorf("Legs(100, 2) = %d, exact %v", got, want)
	}
	first := int64(-1)
	for n := int64(1); n <= 25 && first < 0; n++ {
		if exact := new(big.Int).MulRange(1, n); !exact.IsInt64() || exact.Int64() != legs(n, n) {
			first = n
		}
	}
	if first != 21 {
		t.Errorf("Legs(n, n) first wraps at n = %d, want 21 (the message's n ≥ 21)", first)
	}
}

// TestBinomialRecursionProbe shows Crews (C(n, k) as C(n−1, k−1)·n/k,
// testdata/src/factorialrecursion/counts.go) beside math/big: at k = n/2
// some product C(m−1, j−1)·m it forms first leaves int64 at n = 62, the
// n the message names, while C(n, n/2) itself fits up to n = 66
// (central binomials, OEIS A001405, from memory: C(66, 33) ≈ 7.2e18).
func TestBinomialRecursionProbe(t *testing.T) {
	maxInt64 := new(big.Int).SetInt64(math.MaxInt64)
	first := int64(-1)
	for n := int64(2); n <= 70 && first < 0; n++ {
		k := n / 2
		for j := int64(1); j <= k; j++ {
			m := n - k + j
			p := new(big.Int).Mul(new(big.Int).Binomial(m-1, j-1), big.NewInt(m))
			if p.Cmp(maxInt64) > 0 {
				first = n
				break
			}
		}
	}
	if first != 62 {
		t.Errorf("first n whose recursion products at k = n/2 leave int64: %d, want 62", first)
	}
	if c := new(big.Int).Binomial(66, 33); !c.IsInt64() {
		t.Errorf("C(66, 33) = %v does not fit int64", c)
	}
	if c := new(big.Int).Binomial(67, 33); c.IsInt64() {
		t.Errorf("C(67, 33) = %v fits int64", c)
	}
}
