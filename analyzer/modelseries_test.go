package analyzer

import (
	"math"
	"math/big"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"
)

// TestModelSeries runs a radio-telescope signal model whose series
// keep the parts of each term in running products of their own.
func TestModelSeries(t *testing.T) {
	analysistest.Run(t, testdata(t), Analyzer, "skymodel")
}

// TestModelSeriesProbes shows with the scenario's own arithmetic and
// math/big that the parts the messages name leave float64 while the
// terms are finite.
func TestModelSeriesProbes(t *testing.T) {
	maxF := new(big.Float).SetFloat64(math.MaxFloat64)
	// LowerGamma's running power at x = 1300: 1300^99 > MaxFloat64,
	// 1299^99 < MaxFloat64 (math/big), and the 100th term
	// 1300^99/(1·2·…·100) at a = 1 is finite (≈ 1.9e150).
	pow := func(x, k int64) *big.Float {
		return new(big.Float).SetInt(new(big.Int).Exp(big.NewInt(x), big.NewInt(k), nil))
	}
	if pow(1300, 99).Cmp(maxF) <= 0 || pow(1299, 99).Cmp(maxF) > 0 {
		t.Error("1300^99 does not leave float64 or 1299^99 does")
	}
	term := new(big.Float).Quo(pow(1300, 99), new(big.Float).SetInt(new(big.Int).MulRange(1, 100)))
	if term.Cmp(maxF) > 0 {
		t.Errorf("the term 1300^99/100! = %v does not fit float64", term)
	}
	sum, num, den := 0.0, 1.0, 1.0
	for n := 0; n < 100; n++ {
		sum += num / den
		num *= 1300
		den *= 1 + float64(n) + 1
	}
	if !math.IsInf(sum, 1) {
		t.Errorf("LowerGamma's sum at a = 1, x = 1300 = %v, want +Inf", sum)
	}
	// BesselI(0, 200): its terms 100^(2k)/(k!)² peak near k = 100 at
	// about 1e85 (math/big below), but pw is +Inf from k = 155 and the
	// sum +Inf or NaN.
	peak := new(big.Float).Quo(pow(100, 200), new(big.Float).SetInt(new(big.Int).Mul(new(big.Int).MulRange(1, 100), new(big.Int).MulRange(1, 100))))
	if peak.Cmp(maxF) > 0 {
		t.Errorf("the peak term %v of I_0(200) does not fit", peak)
	}
	half, pw, f1, f2, s := 100.0, 1.0, 1.0, 1.0, 1.0
	for k := 1; k < 200; k++ {
		pw *= half * half
		f1 *= float64(k)
		f2 *= float64(k)
		s += pw / (f1 * f2)
	}
	if !math.IsInf(s, 0) && !math.IsNaN(s) {
		t.Errorf("BesselI(0, 200) by running products = %v, want +Inf or NaN", s)
	}
	// callcentre.ErlangBSmall(200, 150): 150! fits, 200^150 does not,
	// and the term 200^150/150! does (math/big); the code's sum is
	// +Inf and its result NaN.
	if pow(200, 150).Cmp(maxF) <= 0 {
		t.Error("200^150 fits float64")
	}
	if q := new(big.Float).Quo(pow(200, 150), new(big.Float).SetInt(new(big.Int).MulRange(1, 150))); q.Cmp(maxF) > 0 {
		t.Errorf("200^150/150! = %v does not fit", q)
	}
	fact, esum := 1.0, 1.0
	for k := 1; k <= 150; k++ {
		fact *= float64(k)
		esum += math.Pow(200, float64(k)) / fact
	}
	if b := math.Pow(200, 150) / fact / esum; !math.IsNaN(b) {
		t.Errorf("ErlangBSmall(200, 150) = %v, want NaN", b)
	}
	// skymodel.Coherence(200): the terms 200^k/k! peak near k = 200 at
	// about 1e85 and are still growing at k = 171 (math/big); pw is +Inf
	// from k = 134, the term +Inf, and the loop stops there with the sum
	// +Inf, although e^200 ≈ 7.2e86 fits.
	peak = new(big.Float).Quo(pow(200, 171), new(big.Float).SetInt(new(big.Int).MulRange(1, 171)))
	if peak.Cmp(maxF) > 0 {
		t.Errorf("200^171/171! = %v does not fit", peak)
	}
	csum, cpw, cfact, cterm, ck := 1.0, 1.0, 1.0, 1.0, 0
	for math.Abs(cterm) > 1e-16*math.Abs(csum) {
		ck++
		cpw *= 200
		cfact *= float64(ck)
		cterm = cpw / cfact
		csum += cterm
	}
	if !math.IsInf(csum, 0) && !math.IsNaN(csum) {
		t.Errorf("Coherence(200) = %v, want +Inf or NaN", csum)
	}
}
