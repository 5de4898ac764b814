package thresholds

import (
	"math/big"
	"testing"
)

// derangementsByCount counts the permutations of n items that fix none
// by inclusion–exclusion, D(n) = Σ_{i=0}^{n} (−1)^i·n!/i! (DLMF 26.13.2
// gives the same count as a subfactorial; OEIS A000166), independent of
// the recurrence Derangement follows.
func derangementsByCount(n int64) *big.Int {
	sum := new(big.Int)
	for i := int64(0); i <= n; i++ {
		term := new(big.Int).MulRange(i+1, n) // n!/i!
		if n < i+1 {
			term.SetInt64(1)
		}
		if i%2 == 1 {
			term.Neg(term)
		}
		sum.Add(sum, term)
	}
	return sum
}

func TestDerangement(t *testing.T) {
	for _, name := range []string{"int32", "int64", "uint64", "float64"} {
		num, ok := Named(name, nil)
		if !ok {
			t.Fatalf("no type %s", name)
		}
		l := Derangement(num)
		max := num.maxInt()
		if derangementsByCount(l.FirstBad).CmpAbs(max) <= 0 || derangementsByCount(l.FirstBad-1).CmpAbs(max) > 0 {
			t.Errorf("%s: D(%d) should be the first past the type", name, l.FirstBad)
		}
		if l.LastGood.Cmp(derangementsByCount(l.FirstBad-1)) != 0 {
			t.Errorf("%s: LastGood %v, want D(%d) = %v", name, l.LastGood, l.FirstBad-1, derangementsByCount(l.FirstBad-1))
		}
	}
	// OEIS A000166, from memory: D(10) = 1334961.
	if got := derangementsByCount(10); got.Int64() != 1334961 {
		t.Errorf("D(10) = %v by counting, want 1334961", got)
	}
}
