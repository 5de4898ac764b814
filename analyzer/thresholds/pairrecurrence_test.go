package thresholds

import (
	"math/big"
	"testing"
)

// TestPairRecurrence checks the rolling form of two recurrences against
// counts computed without it: the derangement numbers by
// inclusion–exclusion (derangementsByCount, DLMF 26.13.2, OEIS A000166)
// and the factorials by math/big's MulRange (OEIS A000142).
func TestPairRecurrence(t *testing.T) {
	fact := func(n int64) *big.Int { return new(big.Int).MulRange(1, n) }
	for _, name := range []string{"int16", "int32", "uint32", "int64", "uint64"} {
		num, ok := Named(name, nil)
		if !ok {
			t.Fatalf("no type %s", name)
		}
		max := num.maxInt()
		for _, c := range []struct {
			what         string
			older, newer int64
			exact        func(int64) *big.Int
		}{
			{"derangements", 1, 0, derangementsByCount},
			{"factorials", 1, 1, fact},
		} {
			l := PairRecurrence(num, c.older, c.newer, 2, -1)
			if l.None() {
				t.Fatalf("%s %s: no first bad step", name, c.what)
			}
			if c.exact(l.FirstBad).Cmp(max) <= 0 || c.exact(l.FirstBad-1).Cmp(max) > 0 {
				t.Errorf("%s %s: step %d should be the first past the type", name, c.what, l.FirstBad)
			}
			if l.LastGood.Cmp(c.exact(l.FirstBad-1)) != 0 {
				t.Errorf("%s %s: LastGood %v, want %v", name, c.what, l.LastGood, c.exact(l.FirstBad-1))
			}
		}
	}
	// From memory: 20! ≈ 2.43e18 is the last factorial in int64 and
	// D(20) ≈ 8.95e17 the last derangement number (OEIS A000142, A000166).
	i64, _ := Named("int64", nil)
	if got := PairRecurrence(i64, 1, 1, 2, -1).FirstBad; got != 21 {
		t.Errorf("int64 factorials: first bad %d, want 21", got)
	}
	if got := PairRecurrence(i64, 1, 0, 2, -1).FirstBad; got != Derangement(i64).FirstBad {
		t.Errorf("int64 derangements: first bad %d, want Derangement's %d", got, Derangement(i64).FirstBad)
	}
	// A weight that stays 0 never leaves the type.
	if l := PairRecurrence(i64, 1, 1, 2, -2); !l.None() && l.FirstBad < 3 {
		t.Errorf("weight 0 at the start: first bad %d", l.FirstBad)
	}
	if l := PairRecurrence(i64, 0, 0, 2, -1); !l.None() {
		t.Errorf("zero sequence: first bad %d, want none", l.FirstBad)
	}
}

// TestNamePair checks the names against the sequences' first values
// (OEIS A000166: 1, 0, 1, 2, 9, 44, 265; A000142: 1, 1, 2, 6, 24, 120;
// from memory).
func TestNamePair(t *testing.T) {
	der := []int64{1, 0, 1, 2, 9, 44, 265}
	fac := []int64{1, 1, 2, 6, 24, 120, 720}
	for s := int64(2); s < int64(len(der)); s++ {
		if got := NamePair(der[s-2], der[s-1], s, -1); got != PairDerangements {
			t.Errorf("start %d from D: %v", s, got)
		}
		if got := NamePair(fac[s-2], fac[s-1], s, -1); got != PairFactorials {
			t.Errorf("start %d from factorials: %v", s, got)
		}
	}
	if got := NamePair(1, 0, 2, 0); got != PairOther {
		t.Errorf("weight i: %v, want PairOther", got)
	}
	if got := NamePair(2, 3, 4, -1); got != PairOther {
		t.Errorf("(2, 3) at 4: %v, want PairOther", got)
	}
}
