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

// TestModelCountRatio runs an acceptance-sampling sheet: binomial
// coefficients from log-gamma scaled by powers or divided into counts.
func TestModelCountRatio(t *testing.T) {
	analysistest.Run(t, testdata(t), Analyzer, "sampling")
}

// TestModelCountRatioProbe shows the sampling sheet's wrong values
// beside math/big: at 3000 parts and p = 1/2 the chance of 1500
// defects is C(3000, 1500)/2^3000 ≈ 0.0146, but the coefficient from
// log-gamma is +Inf and 0.5^3000 is 0, so the product is NaN; and a
// count of C(600, 300)² orderings over C(1200, 600) (a ratio ≈ 0.046)
// is Inf/Inf.
func TestModelCountRatioProbe(t *testing.T) {
	lg := func(x float64) float64 { v, _ := math.Lgamma(x); return v }
	coef := math.Exp(lg(3001) - lg(1501) - lg(1501))
	if v := coef * math.Pow(0.5, 1500) * math.Pow(0.5, 1500); !math.IsNaN(v) {
		t.Errorf("Chance(1500) at 3000 parts = %v, want NaN", v)
	}
	exact := new(big.Float).SetInt(new(big.Int).Binomial(3000, 1500))
	exact.Quo(exact, new(big.Float).SetInt(new(big.Int).Lsh(big.NewInt(1), 3000)))
	if f, _ := exact.Float64(); f < 0.01 || f > 0.02 {
		t.Errorf("C(3000, 1500)/2^3000 = %v, want about 0.0146", f)
	}
	c := new(big.Int).Binomial(600, 300)
	count, _ := new(big.Float).SetInt(new(big.Int).Mul(c, c)).Float64()
	all := math.Exp(lg(1201) - lg(601) - lg(601))
	if v := count / all; !math.IsNaN(v) {
		t.Errorf("RankShare(C(600,300)², 600, 600) = %v, want NaN", v)
	}
	ratio := new(big.Float).Quo(new(big.Float).SetInt(new(big.Int).Mul(c, c)), new(big.Float).SetInt(new(big.Int).Binomial(1200, 600)))
	if f, _ := ratio.Float64(); f < 0.04 || f > 0.05 {
		t.Errorf("C(600,300)²/C(1200,600) = %v, want about 0.046", f)
	}
}

// TestPeeledWeights runs the Bézier outlines of a sign plotter, whose
// Bernstein weights are set under a switch on the loop counter: the
// first two outright, the rest one ratio at a time.
func TestPeeledWeights(t *testing.T) {
	analysistest.Run(t, testdata(t), Analyzer, "signcurve")
}

// TestPeeledWeightsProbe runs NewOutline's weights at the first bad
// length the message names, 1031 control points, against math/big: the
// last weight C(1030, 1030) = 1, the one before it 1030, yet the code's
// running weight is +Inf from the central step on; at 400 points
// (NewGlyph's bound) every weight is finite.
func TestPeeledWeightsProbe(t *testing.T) {
	weights := func(n int) []float64 {
		out := make([]float64, n)
		var w float64
		for i := range out {
			switch i {
			case 0:
				w = 1
			case 1:
				w = float64(n) - 1
			default:
				w *= float64(n-i) / float64(i)
			}
			out[i] = w
		}
		return out
	}
	w := weights(1031)
	for _, i := range []int{1029, 1030} {
		want, _ := new(big.Float).SetInt(new(big.Int).Binomial(1030, int64(i))).Float64()
		if !math.IsInf(w[i], 1) || math.IsInf(want, 0) {
			t.Errorf("weight %d of 1031 = %v, exact C(1030, %d) = %v: want +Inf where the exact value fits", i, w[i], i, want)
		}
	}
	for i, v := range weights(400) {
		if math.IsInf(v, 0) {
			t.Fatalf("weight %d of 400 = %v, want finite", i, v)
		}
	}
	// Outline.At at t = 1/2 over 1031 control points all at x = 1:
	// Σ C(1030, i)·2^−1030 = 1 (the binomial theorem, common practice;
	// summed here in math/big), but the code's terms are +Inf·t^i.
	at := func(w []float64, t float64) float64 {
		pts := make([]float64, len(w))
		pts[0] = w[0]
		u := t
		for i := 1; i < len(w); i++ {
			pts[i] = w[i] * u
			u *= t
		}
		t1 := 1 - t
		tt := t1
		p := pts[len(pts)-1]
		for i := len(pts) - 2; i >= 0; i-- {
			p += pts[i] * tt
			tt *= t1
		}
		return p
	}
	sum := new(big.Int)
	for i := int64(0); i <= 1030; i++ {
		sum.Add(sum, new(big.Int).Binomial(1030, i))
	}
	exact, _ := new(big.Rat).SetFrac(sum, new(big.Int).Lsh(big.NewInt(1), 1030)).Float64()
	if v := at(w, 0.5); !math.IsNaN(v) && !math.IsInf(v, 0) || exact != 1 {
		t.Errorf("Outline.At(1/2) over 1031 points = %v, exact %v: want +Inf or NaN where the exact value is 1", v, exact)
	}
	if v := at(weights(400), 0.5); math.Abs(v-1) > 1e-9 {
		t.Errorf("Glyph.At(1/2) over 400 points = %v, want 1", v)
	}
}

// TestModelLogSum runs a depot's door-code ratings: logarithms of float
// sums of binomial coefficients (reported), the same sums bounded, cut
// at three terms, kept in log space or returned as they are (silent).
func TestModelLogSum(t *testing.T) {
	analysistest.Run(t, testdata(t), Analyzer, "keybits")
}

// TestModelLogSumProbe shows keybits.ShiftBits's wrong value beside
// math/big: with 600 shifted and 600 plain keys the float64 sum of
// C(1200, i), i ≤ 600, is +Inf, so its log2 is +Inf, while the exact
// sum (math/big) has a log2 just below 1200.
func TestModelLogSumProbe(t *testing.T) {
	// The scenario's ways: multiply, divide, step n.
	ways := func(n, k float64) float64 {
		r := 1.0
		for d := 1.0; d <= k; d++ {
			r *= n
			r /= d
			n--
		}
		return r
	}
	var count float64
	exact := new(big.Int)
	for i := int64(0); i <= 600; i++ {
		count += ways(1200, float64(i))
		exact.Add(exact, new(big.Int).Binomial(1200, i))
	}
	if got := math.Log2(count); !math.IsInf(got, 1) {
		t.Fatalf("ShiftBits(600, 600) in float64 = %v, want +Inf", got)
	}
	bits := exact.BitLen() // ⌈log2⌉ of the exact sum
	if bits < 1190 || bits > 1200 {
		t.Fatalf("exact sum has %d bits, want just below 1200 (Σ_{i≤600} C(1200, i) > 2^1199)", bits)
	}
	if f, _ := new(big.Float).SetInt(exact).Float64(); !math.IsInf(f, 1) {
		t.Fatalf("the exact sum %v fits float64: past float64 is where its log2 alone is finite", f)
	}
}

// TestModelZeroTimesSumProbe shows keybits.PadGuesses's wrong value:
// with no turns the swipe count is 0, and with 600 of 1200 keys
// shifted the float64 sum of C(1200, i), i ≤ 600, is +Inf, so the
// product is NaN where the exact product is 0 (0 times the finite
// math/big sum).
func TestModelZeroTimesSumProbe(t *testing.T) {
	guesses := 0.0 // turns = 0: the inner loop runs no trip
	var shifts float64
	exact := new(big.Int)
	for i := int64(1); i <= 600; i++ {
		w := 1.0
		n := 1200.0
		for d := 1.0; d <= float64(i); d++ {
			w *= n
			w /= d
			n--
		}
		shifts += w
		exact.Add(exact, new(big.Int).Binomial(1200, i))
	}
	if got := guesses * shifts; !math.IsNaN(got) {
		t.Fatalf("PadGuesses(1200, 0, 600, s) in float64 = %v, want NaN", got)
	}
	// The +Inf is the sum's own, not only the helper's: the exact sum
	// is past float64 too (so only a guard on guesses, or log space,
	// keeps the product right).
	if f, _ := new(big.Float).SetInt(exact).Float64(); !math.IsInf(f, 1) {
		t.Fatalf("the exact sum %v fits float64", f)
	}
}
