package analyzer

import (
	"math"
	"math/big"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"
)

// TestWrongCallee runs the wrong-callee cases: callers of a function
// whose value is wrong, directly, through sums, products, ratios,
// differences, conversions, methods, a chain of three and another
// package's fact, and the silent callers (bounded, tested, constant,
// allowed, a factorial's own overflow). The category offers no fix.
func TestWrongCallee(t *testing.T) {
	analysistest.Run(t, analysistest.TestData(), Analyzer, "wrongcallee", "wrongcallee/kit")
}

// The callers of testdata/src/wrongcallee are wrong where the findings
// say, checked against math/big: the float64 arithmetic below is the
// callee's and the callers' as the package writes it, and the exact
// values are big.Float sums of big.Int factorials (MulRange) and
// big.Int.Binomial.

// poissonF64 is wrongcallee.Poisson's arithmetic in float64.
func poissonF64(k int, lambda float64) float64 {
	f := 1.0
	for i := 2; i <= k; i++ {
		f *= float64(i)
	}
	return math.Pow(lambda, float64(k)) * math.Exp(-lambda) / f
}

// poissonBig is λ^k e^−λ/k! at 512 bits, e^−λ from math.Exp (within an
// ulp, and normal for the λ used here).
func poissonBig(k int, lambda float64) *big.Float {
	const prec = 512
	p := new(big.Float).SetPrec(prec).SetFloat64(math.Exp(-lambda))
	l := new(big.Float).SetPrec(prec).SetFloat64(lambda)
	for i := 0; i < k; i++ {
		p.Mul(p, l)
	}
	fact := new(big.Float).SetPrec(prec).SetInt(new(big.Int).MulRange(1, int64(k)))
	if k == 0 {
		fact.SetInt64(1)
	}
	return p.Quo(p, fact)
}

func TestWrongCallersAgainstBig(t *testing.T) {
	// Poisson(k, λ), the root under CDF and its callers: right at
	// k = 170, the last k below the stated 171, and 0 at 171 where the
	// true term is a normal float64 (λ = 1.5: about 1e-277 and 1e-280).
	for _, tc := range []struct {
		k     int
		wrong bool
	}{{170, false}, {171, true}} {
		got := poissonF64(tc.k, 1.5)
		want, _ := poissonBig(tc.k, 1.5).Float64()
		rel := math.Abs(got-want) / want
		if isWrong := math.IsNaN(got) || rel > 1e-9; isWrong != tc.wrong || want < 0x1p-1022 {
			t.Errorf("Poisson(%d, 1.5) = %g, exact %g: wrong %v, want %v", tc.k, got, want, isWrong, tc.wrong)
		}
	}
	// CDF(200, 180) sums Poisson's terms: NaN, where the exact sum is
	// about 0.93 (the value math/big gives, checked to lie in (0, 1)):
	// Tail, Upper, Percent, Odds, Scaled, Mean and Chance return it or
	// build their results from it by arithmetic that keeps a NaN.
	sum, exact := 0.0, new(big.Float).SetPrec(512)
	for i := 0; i <= 200; i++ {
		sum += poissonF64(i, 180)
		exact.Add(exact, poissonBig(i, 180))
	}
	if e, _ := exact.Float64(); !math.IsNaN(sum) || e <= 0.5 || e >= 1 {
		t.Errorf("CDF(200, 180) = %g, exact %g: want NaN against a probability in (0.5, 1)", sum, e)
	}
	// Share(62, 31) converts doubled(62, 31) = 2·r, whose r*(n−k+i)
	// wraps int64 before the division: r differs from
	// big.Int.Binomial(62, 31), which fits int64 (and twice it float64).
	r := int64(1)
	for i := int64(1); i <= 31; i++ {
		r = r * (62 - 31 + i) / i
	}
	want := new(big.Int).Binomial(62, 31)
	if !want.IsInt64() || r == want.Int64() {
		t.Errorf("doubled's r at (62, 31) = %d, exact %s: want a wrapped value against a count that fits int64", r, want)
	}
}
