package analyzer

import (
	"bytes"
	"math"
	"math/big"
	"strings"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"
)

// TestModelScenarios runs the shapes the value model judges: a shift
// rota counted in float64, Erlang B and Poisson sums with a running
// factorial or a running product from e^(−λ), and dice-pool binomials
// multiplied before they are divided, in float64 or over struct fields.
func TestModelScenarios(t *testing.T) {
	analysistest.Run(t, testdata(t), Analyzer, "callcentre", "dicepool")
}

// The first bad inputs the scenario messages state, confirmed here by
// running the code's own arithmetic in float64 (or int64) beside
// math/big, not by asking the analyzer or the thresholds package.
func TestModelProbes(t *testing.T) {
	maxF, _ := new(big.Float).SetFloat64(math.MaxFloat64).Int(nil)
	binom := func(n, k int64) *big.Int { return new(big.Int).Binomial(n, k) }

	// dicepool.Ways: r *= m; r /= d; m-- in float64. At n = 1021,
	// k = 510 the product overflows although C(1021, 510) fits; at
	// n = 1020 every step is finite.
	ways := func(n, k int) float64 {
		r, m := 1.0, float64(n)
		for d := 1; d <= k; d++ {
			r *= m
			r /= float64(d)
			m--
		}
		return r
	}
	if v := ways(1021, 510); !math.IsInf(v, 1) || binom(1021, 510).Cmp(maxF) > 0 {
		t.Errorf("Ways(1021, 510) = %v; C(1021, 510) fits: %v", v, binom(1021, 510).Cmp(maxF) <= 0)
	}
	for n := 2; n <= 1020; n++ {
		if v := ways(n, n/2); math.IsInf(v, 0) {
			t.Fatalf("Ways(%d, %d) = %v, want finite", n, n/2, v)
		}
	}
	// C(1029, 514) fits and C(1030, 515) does not (the pmf's limit).
	if binom(1029, 514).Cmp(maxF) > 0 || binom(1030, 515).Cmp(maxF) <= 0 {
		t.Error("central binomial limit of float64 is not n = 1030")
	}
	// dicepool.MidHands: at n = k = 171 both loops overflow and the
	// ratio is NaN, while C(171, 171) = 1; C(200, k) fits for every k.
	hands := func(n, k float64) float64 {
		num, den := 1.0, 1.0
		for i := 0.0; i < k; i++ {
			num *= n - i
		}
		for i := 2.0; i <= k; i++ {
			den *= i
		}
		return num / den
	}
	if v := hands(171, 171); !math.IsNaN(v) {
		t.Errorf("MidHands(171, 171) = %v, want NaN", v)
	}
	for k := int64(0); k <= 200; k++ {
		if binom(200, k).Cmp(maxF) > 0 {
			t.Fatalf("C(200, %d) does not fit float64", k)
		}
	}
	// The numerator n!/(n−⌊n/2⌋)! at k = n/2: finite at n = 269,
	// +Inf at n = 270.
	if v := hands(269, 134); math.IsInf(v, 0) || math.IsNaN(v) {
		t.Errorf("Hands(269, 134) = %v, want finite", v)
	}
	num270 := 1.0
	for i := 0.0; i < 135; i++ {
		num270 *= 270 - i
	}
	if !math.IsInf(num270, 1) {
		t.Errorf("270!/135! = %v in float64, want +Inf", num270)
	}
	// callcentre.Squads: 40 factors down from n pass the largest
	// float64 first at n = 50859028 (exactly, in math/big), and the
	// float64 loop returns +Inf there and a finite value just below.
	squad := func(n float64) float64 {
		p := 1.0
		for i := 0.0; i < 40; i++ {
			p *= n - i
		}
		return p
	}
	fall := func(n int64) *big.Int { return new(big.Int).MulRange(n-39, n) }
	if fall(50859028).Cmp(maxF) <= 0 || fall(50859027).Cmp(maxF) > 0 {
		t.Error("40 factors down from n first exceed float64 elsewhere than n = 50859028")
	}
	if !math.IsInf(squad(50859028), 1) || math.IsInf(squad(50859027), 0) {
		t.Errorf("Squads at 50859028: %v, at 50859027: %v", squad(50859028), squad(50859027))
	}
	// dicepool.Pool.Combos in int64: at N = 62, K = 31 the product
	// r*(N−K+i) wraps although C(62, 31) fits; at N = 61 it does not.
	combos := func(n, k int64) (int64, bool) {
		r := big.NewInt(1)
		wrapped := false
		for i := int64(1); i <= k; i++ {
			r.Mul(r, big.NewInt(n-k+i))
			wrapped = wrapped || !r.IsInt64()
			r.Quo(r, big.NewInt(i))
		}
		return r.Int64(), wrapped
	}
	if _, w := combos(62, 31); !w || !binom(62, 31).IsInt64() {
		t.Error("Combos(62, 31) should wrap while C(62, 31) fits int64")
	}
	for n := int64(1); n <= 61; n++ {
		if _, w := combos(n, n/2); w {
			t.Fatalf("Combos(%d, %d) wraps, want it to fit", n, n/2)
		}
	}
	// callcentre.ErlangB, AtMost: k! in float64 is +Inf from k = 171.
	f := 1.0
	for k := 1.0; k <= 171; k++ {
		f *= k
		if k == 170 && math.IsInf(f, 0) {
			t.Error("170! overflowed float64")
		}
	}
	if !math.IsInf(f, 1) {
		t.Error("171! fits float64")
	}
	// Surge: (2k+1)! at k = 85 is 171!, +Inf; at k = 84 it is 169!.
	s := 1.0
	for k := 1; k <= 85; k++ {
		s *= float64(2*k) * float64(2*k+1)
		if k == 84 && math.IsInf(s, 0) {
			t.Error("169! overflowed float64")
		}
	}
	if !math.IsInf(s, 1) {
		t.Error("171! fits float64")
	}
	// Backlog: with lambda = 746 and n = 746 the computed CDF is 0,
	// while the true P(X ≤ λ) of a Poisson variable is near ½ (for
	// large λ the distribution is close to normal about λ; common
	// practice).
	backlog := func(lambda float64, n int) float64 {
		p := math.Exp(-lambda)
		sum := p
		for k := 1; k <= n; k++ {
			p *= lambda / float64(k)
			sum += p
		}
		return sum
	}
	if v := backlog(746, 746); v != 0 {
		t.Errorf("Backlog(746, 746) = %v, want the wrong 0", v)
	}
	if v := backlog(700, 700); math.Abs(v-0.5) > 0.05 {
		t.Errorf("Backlog(700, 700) = %v, want about 0.5", v)
	}
}

// TestModelCapLogged: a function past the value model's node cap is
// modelled only in part, and the -debug log says so.
func TestModelCapLogged(t *testing.T) {
	var b strings.Builder
	b.WriteString("package capped\n\nimport \"math\"\n\nfunc long(x float64) float64 {\n\tv := math.Exp(-x)\n")
	for i := 0; i < 4000; i++ {
		b.WriteString("\tv = v*x + 1\n")
	}
	b.WriteString("\treturn v\n}\n")
	var log bytes.Buffer
	oldOut, oldDebug := debugOut, debug
	debugOut, debug = &log, true
	defer func() { debugOut, debug = oldOut, oldDebug }()
	analysistest.Run(t, writePkg(t, "capped", b.String()), Analyzer, "capped")
	if !strings.Contains(log.String(), "value model stopped at") {
		t.Errorf("debug log = %q", log.String())
	}
}
