package analyzer

import (
	"math"
	"math/big"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"
)

// TestModelBinomialPeak runs the running binomials of a glyph
// rasteriser: ratios whose running value passes C(n, n/2).
func TestModelBinomialPeak(t *testing.T) {
	analysistest.Run(t, testdata(t), Analyzer, "fixbinompeak")
}

// TestModelBinomialPeakProbe confirms the messages' claims with the
// code's own arithmetic beside math/big: one ratio per step in float64
// is +Inf past C(n, n/2) for n ≥ 1030 although C(n, k) fits, and stays
// finite for every k up to n = 1029.
func TestModelBinomialPeakProbe(t *testing.T) {
	maxF, _ := new(big.Float).SetFloat64(math.MaxFloat64).Int(nil)
	ways := func(n, k int) float64 {
		v := 1.0
		for c := 1; c <= k; c++ {
			v *= float64(n+1-c) / float64(c)
		}
		return v
	}
	// math/big: C(1030, 1020) fits float64.
	if c := new(big.Int).Binomial(1030, 1020); c.Cmp(maxF) > 0 {
		t.Fatal("C(1030, 1020) does not fit float64")
	}
	if v := ways(1030, 1020); !math.IsInf(v, 1) {
		t.Errorf("ways(1030, 1020) = %v, want +Inf (the running value passed C(1030, 515))", v)
	}
	for k := 0; k <= 1029; k++ {
		if v := ways(1029, k); math.IsInf(v, 0) {
			t.Fatalf("ways(1029, %d) = %v, want finite", k, v)
		}
	}
	// Weights' running value at n = 1031 (C(1030, i)) is +Inf at its
	// last step, where C(1030, 1030) = 1.
	w := 1.0
	for i := 1; i < 1031; i++ {
		w *= float64(1031-i) / float64(i)
	}
	if !math.IsInf(w, 1) {
		t.Errorf("the weight C(1030, 1030) formed by ratios = %v, want +Inf", w)
	}
}
