package analyzer

import (
	"bytes"
	"encoding/gob"
	"math"
	"math/big"
	"reflect"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"
)

// TestModelCallScenarios runs callers of counting helpers from another
// package: binomial, hypergeometric and negative binomial probabilities
// over a float64 binomial built from factorials, a multinomial summed
// over a loop's parts, and a Beta constant over a Γ helper; the helpers'
// ValueFacts cross the package boundary as go vet passes them.
func TestModelCallScenarios(t *testing.T) {
	analysistest.Run(t, testdata(t), Analyzer, "probkit", "inspection")
}

// TestValueFactRoundTrip encodes ValueFacts with encoding/gob, as the
// unitchecker driver of go vet -vettool does between packages, and
// decodes the same value and weak points, and a logarithm's fact with
// a table branch.
func TestValueFactRoundTrip(t *testing.T) {
	binom := []FactGamma{
		{Arg: FactAffine{C: "1", Param: []int{0}, K: []string{"1"}}, Pow: 1},
		{Arg: FactAffine{C: "1", Param: []int{1}, K: []string{"1"}}, Pow: -1},
		{Arg: FactAffine{C: "1", Param: []int{0, 1}, K: []string{"1", "-1"}}, Pow: -1},
	}
	for _, c := range []struct {
		f    ValueFact
		want string
	}{{
		f: ValueFact{
			Value: FactTerm{Coef: "1", Gamma: binom, Pows: []FactPow{{Base: FactAffine{C: "0", Param: []int{2}, K: []string{"1"}}, Exp: FactAffine{C: "1/2", Param: []int{1}, K: []string{"1"}}}}},
			Weak:  []WeakPoint{{Arg: FactAffine{C: "0", Param: []int{0}, K: []string{"1"}}, Bad: "171", What: "fact(n)"}},
		},
		want: "value Γ(p0 + 1)·(p2)^(p1 + 1/2)/(Γ(p1 + 1)·Γ(p0 - p1 + 1)), wrong once p0 ≥ 171",
	}, {
		f:    ValueFact{Value: FactTerm{Coef: "1", Gamma: binom}, Log: true, Table: &TableBranch{Param: 0, Max: 20}},
		want: "value ln Γ(p0 + 1)/(Γ(p1 + 1)·Γ(p0 - p1 + 1)), another return for p0 ≤ 20",
	}, {
		// A method's value over its receiver's fields and a parameter:
		// C(recv.N, p0) as a running product.
		f: ValueFact{Value: FactTerm{Coef: "1", Gamma: []FactGamma{
			{Arg: FactAffine{C: "1", Param: []int{recvParam}, K: []string{"1"}, Field: []string{"N"}}, Pow: 1},
			{Arg: FactAffine{C: "1", Param: []int{0}, K: []string{"1"}}, Pow: -1},
			{Arg: FactAffine{C: "1", Param: []int{recvParam, 0}, K: []string{"1", "-1"}, Field: []string{"N", ""}}, Pow: -1},
		}}, Running: true},
		want: "value Γ(recv.N + 1)/(Γ(p0 + 1)·Γ(-p0 + recv.N + 1)), a running product",
	}} {
		var buf bytes.Buffer
		if err := gob.NewEncoder(&buf).Encode(&c.f); err != nil {
			t.Fatal(err)
		}
		var got ValueFact
		if err := gob.NewDecoder(&buf).Decode(&got); err != nil {
			t.Fatal(err)
		}
		if !reflect.DeepEqual(got, c.f) {
			t.Errorf("round trip of %+v gave %+v", c.f, got)
		}
		if got.String() != c.want {
			t.Errorf("decoded fact reads %q, want %q", got.String(), c.want)
		}
	}
}

// The scenarios' messages against the code's own arithmetic in float64
// and math/big: each caller is wrong at the first bad input named while
// its true value fits, and right just below it.
func TestModelCallProbes(t *testing.T) {
	fact := func(n float64) float64 { // probkit.Fact
		v := 1.0
		for i := 2.0; i <= n; i++ {
			v *= i
		}
		return v
	}
	choose := func(n, k float64) float64 { return fact(n) / (fact(k) * fact(n-k)) }
	bigChoose := func(n, k int64) *big.Float { return new(big.Float).SetInt(new(big.Int).Binomial(n, k)) }
	fits := func(x *big.Float) bool {
		f, _ := x.Float64()
		return f != 0 && !math.IsInf(f, 0) && math.Abs(f) >= 0x1p-1022
	}
	bad := func(v float64) bool { return math.IsInf(v, 0) || math.IsNaN(v) }
	powBig := func(x float64, n int64) *big.Float {
		out := big.NewFloat(1).SetPrec(2000)
		b := new(big.Float).SetPrec(2000).SetFloat64(x)
		for i := int64(0); i < n; i++ {
			out.Mul(out, b)
		}
		return out
	}

	// inspection.Defective(1, n, 1/2): from n = 171 (message), exact
	// C(171, 1)/2^171 fits.
	defective := func(k, n int, p float64) float64 {
		return choose(float64(n), float64(k)) * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k))
	}
	exact := new(big.Float).SetPrec(2000).Quo(bigChoose(171, 1), powBig(2, 171))
	if v := defective(1, 171, 0.5); !bad(v) || !fits(exact) {
		t.Errorf("Defective(1, 171, 0.5) = %v, exact %v", v, exact)
	}
	if v := defective(1, 170, 0.5); bad(v) {
		t.Errorf("Defective(1, 170, 0.5) = %v, want finite", v)
	}

	// inspection.LotDraw(1, 344, 171, 10): bad = 171 breaks the first
	// Choose; the exact probability C(171,1)C(173,9)/C(344,10) fits.
	lot := func(k, total, bad, n int) float64 {
		return choose(float64(bad), float64(k)) * choose(float64(total-bad), float64(n-k)) / choose(float64(total), float64(n))
	}
	exact = new(big.Float).SetPrec(2000).Quo(new(big.Float).SetPrec(2000).Mul(bigChoose(171, 1), bigChoose(173, 9)), bigChoose(344, 10))
	if v := lot(1, 344, 171, 10); !bad(v) || !fits(exact) {
		t.Errorf("LotDraw(1, 344, 171, 10) = %v, exact %v", v, exact)
	}

	// inspection.RejectsBefore(170, 2, 0.01): f+s−1 = 171, exact
	// C(171, 170)·0.01²·0.99^170 fits.
	rejects := func(f, s, p float64) float64 { return choose(f+s-1, s-1) * math.Pow(p, s) * math.Pow(1-p, f) }
	exact = new(big.Float).SetPrec(2000).Mul(bigChoose(171, 170), new(big.Float).SetPrec(2000).Mul(powBig(0.01, 2), powBig(0.99, 170)))
	if v := rejects(170, 2, 0.01); !bad(v) || !fits(exact) {
		t.Errorf("RejectsBefore(170, 2, 0.01) = %v, exact %v", v, exact)
	}
	if v := rejects(169, 2, 0.01); bad(v) {
		t.Errorf("RejectsBefore(169, 2, 0.01) = %v, want finite", v)
	}

	// inspection.ShelfOrders([170, 1]): total = 171, the multinomial
	// 171!/(170!·1!) = 171.
	shelf := func(bins []float64) float64 {
		total, den := 0.0, 1.0
		for _, b := range bins {
			total += b
			den *= fact(b)
		}
		return fact(total) / den
	}
	if v := shelf([]float64{170, 1}); !bad(v) {
		t.Errorf("ShelfOrders([170 1]) = %v, want +Inf or NaN (exact 171)", v)
	}
	if v := shelf([]float64{169, 1}); v != 170 {
		t.Errorf("ShelfOrders([169 1]) = %v, want 170", v)
	}

	// inspection.SpreadRatio(171.7, 1): Γ(a+b) is +Inf while 1/B(a, 1)
	// = a (DLMF 5.12.1 with Γ(a+1) = aΓ(a), from memory).
	spread := func(a, b float64) float64 { return math.Gamma(a+b) / (math.Gamma(a) * math.Gamma(b)) }
	if v := spread(170.7, 1); !bad(v) {
		t.Errorf("SpreadRatio(170.7, 1) = %v, want +Inf or NaN (exact 170.7)", v)
	}
	if v := spread(169.7, 1); math.Abs(v-169.7) > 1e-9*169.7 {
		t.Errorf("SpreadRatio(169.7, 1) = %v, want 169.7", v)
	}
}

// TestTableAndLogFacts runs a seed laboratory's rank test and tray
// probabilities over another package's binomial: a table of exact
// values for n ≤ 20 beside exp of log-gamma differences (the formula is
// the function's value wherever it leaves float64), and ln C(n, k)
// from log-gamma sums, which math.Exp takes back.
func TestTableAndLogFacts(t *testing.T) {
	analysistest.Run(t, testdata(t), Analyzer, "tallykit", "ranktest")
}

// TestTableFactsProbe runs the arithmetic of the seed laboratory
// (testdata/src/tallykit, ranktest) against math/big at the first bad
// input the messages name, n = 1030: Sprouts at 515 of n seeds with
// rate 1/2 is +Inf at 1030 (C(1030, 515)/2^1030 ≈ 0.025 by math/big),
// and SplitShare over two lots of 515 with u = n1 = 515 sums to
// C(1030, 515) orderings of C(1030, 515), a share of exactly 1, and
// returns NaN. Below the limit the value is right at n = 1028; at 1029
// math.Exp of ln C(1029, 514) ≈ 709.55 is +Inf already on amd64, whose
// math.Exp overflows from about 709.44 rather than ln(MaxFloat64) ≈
// 709.78 (measured with go1.26), so that n is not used as the good one.
func TestTableFactsProbe(t *testing.T) {
	lg := func(x float64) float64 { v, _ := math.Lgamma(x); return v }
	choose := func(n, k int) float64 { // tallykit.Choose past its table
		return math.Exp(lg(float64(n+1)) - lg(float64(k+1)) - lg(float64(n-k+1)))
	}
	exactPMF := func(n, k int) float64 {
		x := new(big.Float).SetInt(new(big.Int).Binomial(int64(n), int64(k)))
		x.Quo(x, new(big.Float).SetInt(new(big.Int).Lsh(big.NewInt(1), uint(n))))
		f, _ := x.Float64()
		return f
	}
	sprouts := func(n, k int) float64 {
		return choose(n, k) * math.Pow(0.5, float64(k)) * math.Pow(0.5, float64(n-k))
	}
	if v, want := sprouts(1030, 515), exactPMF(1030, 515); !math.IsInf(v, 1) && !math.IsNaN(v) || want < 0.02 || want > 0.03 {
		t.Errorf("Sprouts(515) of 1030 = %v, exact %v: want +Inf or NaN where the exact value fits", v, want)
	}
	if v, want := sprouts(1028, 514), exactPMF(1028, 514); math.Abs(v-want) > 1e-9*want {
		t.Errorf("Sprouts(514) of 1028 = %v, exact %v: want the right value below the limit", v, want)
	}
	count := 0.0
	for r := 0; r <= 515; r++ {
		count += choose(515, 515-r) * choose(515, r)
	}
	if v := count / choose(1030, 515); !math.IsNaN(v) {
		t.Errorf("SplitShare(515, 515, 515, 515) = %v, want NaN (the true share is 1)", v)
	}
}

// TestFirstAtRatByDefinition checks firstAtRat, on integer operands (its
// int64 path) and on fractions (its rational path), against its
// definition evaluated with math/big: the result v satisfies
// α·v + β ≥ bad and v − 1 does not.
func TestFirstAtRatByDefinition(t *testing.T) {
	vals := []*big.Rat{big.NewRat(0, 1), big.NewRat(1, 1), big.NewRat(-1, 1), big.NewRat(7, 1), big.NewRat(-7, 1),
		big.NewRat(171, 1), big.NewRat(1<<40, 1), big.NewRat(-(1 << 40), 1), big.NewRat(1<<41, 1), big.NewRat(1, 2), big.NewRat(-5, 3)}
	holds := func(alpha, beta, bad *big.Rat, v int64) bool {
		x := new(big.Rat).Mul(alpha, new(big.Rat).SetInt64(v))
		return x.Add(x, beta).Cmp(bad) >= 0
	}
	for _, alpha := range vals {
		for _, beta := range vals {
			for _, bad := range vals {
				v, ok := firstAtRat(alpha, beta, bad)
				if alpha.Sign() <= 0 {
					if ok {
						t.Errorf("firstAtRat(%v, %v, %v) = %d for α ≤ 0", alpha, beta, bad, v)
					}
					continue
				}
				if !ok {
					t.Errorf("firstAtRat(%v, %v, %v) declined", alpha, beta, bad)
					continue
				}
				if !holds(alpha, beta, bad, v) || holds(alpha, beta, bad, v-1) {
					t.Errorf("firstAtRat(%v, %v, %v) = %d, not the first v with α·v + β ≥ bad", alpha, beta, bad, v)
				}
			}
		}
	}
}
