package thresholds

import (
	"math/big"
	"testing"
)

// a000108 holds the Catalan numbers C0 … C20, OEIS A000108 (from memory).
var a000108 = []int64{1, 1, 2, 5, 14, 42, 132, 429, 1430, 4862, 16796, 58786, 208012, 742900, 2674440, 9694845, 35357670, 129644790, 477638700, 1767263190, 6564120420}

func TestCatalanValues(t *testing.T) {
	for n, want := range a000108 {
		if got := catalan(int64(n)); got.Int64() != want {
			t.Errorf("C%d = %v, want %d (OEIS A000108)", n, got, want)
		}
	}
}

func TestCatalanThresholds(t *testing.T) {
	i64 := mustNamed(t, "int64", nil)
	// C35 = 3116285494907301262 fits int64, C36 = 11959798385860453492
	// does not (OEIS A000108 b-file, from memory; math/big below).
	c35, _ := new(big.Int).SetString("3116285494907301262", 10)
	c36, _ := new(big.Int).SetString("11959798385860453492", 10)
	if catalan(35).Cmp(c35) != 0 || catalan(36).Cmp(c36) != 0 {
		t.Fatal("C35 or C36 differs from OEIS A000108")
	}
	if l := CatalanValue(i64); l.FirstBad != 36 || l.LastGood.Cmp(c35) != 0 {
		t.Errorf("CatalanValue(int64) = %d (%v), want 36 (C35)", l.FirstBad, l.LastGood)
	}
	// (2n)!/((n+1)! n!): 20! fits int64, 22! does not, so n = 11 is the
	// first to break.
	if l := Catalan(i64); l.FirstBad != 11 || l.Peak.Cmp(new(big.Int).MulRange(1, 20)) != 0 {
		t.Errorf("Catalan(int64) = %d, peak %v; want 11, 20!", l.FirstBad, l.Peak)
	}
	// uint64 (max ≈ 1.84e19) holds C36 but not C37 ≈ 4.60e19; the
	// comparison below is exact, with math/big.
	u64 := mustNamed(t, "uint64", nil)
	if got := CatalanValue(u64).FirstBad; got != 37 || catalan(36).Cmp(u64.MaxInt()) > 0 || catalan(37).Cmp(u64.MaxInt()) <= 0 {
		t.Errorf("CatalanValue(uint64) = %d, want 37", got)
	}
}
