// Package reference cross-checks the helper module
// github.com/overfact/overfact/fixes/lgamma against gonum
// (gonum.org/v1/gonum v0.17.0, a test-only dependency of the root module)
// and against exact values from math/big. Where gonum is accurate the two
// must agree; where it is not, the tests print how far each library is
// from the exact value (go test -v ./internal/reference).
package reference

import (
	"fmt"
	"math"
	"math/big"
	"strings"
	"testing"

	"github.com/overfact/overfact/fixes/lgamma"
	"gonum.org/v1/gonum/mathext"
	"gonum.org/v1/gonum/stat/combin"
	"gonum.org/v1/gonum/stat/distuv"
)

const prec = 512

// quo returns num/den at prec bits; big.Rat would reduce the fraction
// by a gcd of million-digit integers first, which is needlessly slow.
func quo(num, den *big.Int) *big.Float {
	q := new(big.Float).SetPrec(prec).SetInt(num)
	return q.Quo(q, new(big.Float).SetPrec(prec).SetInt(den))
}

// rel returns |got − want|/|want| computed in big.Float.
func rel(got float64, want *big.Float) float64 {
	if math.IsNaN(got) || math.IsInf(got, 0) {
		return math.Inf(1)
	}
	d := new(big.Float).SetPrec(prec).Sub(new(big.Float).SetPrec(prec).SetFloat64(got), want)
	d.Quo(d, want)
	f, _ := d.Float64()
	return math.Abs(f)
}

// expNeg returns e^(−λ) for integer λ ≥ 0: e^(−1) from its Taylor series
// Σ(−1)ⁿ/n! (DLMF 4.2.19), raised to the power λ by squaring.
func expNeg(lambda int64) *big.Float {
	e := new(big.Float).SetPrec(prec)
	term := new(big.Float).SetPrec(prec).SetInt64(1)
	for n := int64(1); n < 200; n++ {
		e.Add(e, term)
		term.Quo(term, new(big.Float).SetPrec(prec).SetInt64(-n))
	}
	r := new(big.Float).SetPrec(prec).SetInt64(1)
	for b := lambda; b > 0; b >>= 1 {
		if b&1 == 1 {
			r.Mul(r, e)
		}
		e.Mul(e, e)
	}
	return r
}

// poissonExact returns λᵏe^(−λ)/k! for integer λ.
func poissonExact(k, lambda int64) *big.Float {
	num := new(big.Int).Exp(big.NewInt(lambda), big.NewInt(k), nil)
	den := new(big.Int).MulRange(1, max(k, 1))
	r := quo(num, den)
	return r.Mul(r, expNeg(lambda))
}

// binomialExact returns C(n,k)·pᵏ(1−p)ⁿ⁻ᵏ for p = a/b exactly.
func binomialExact(k, n, a, b int64) *big.Float {
	num := new(big.Int).Binomial(n, k)
	num.Mul(num, new(big.Int).Exp(big.NewInt(a), big.NewInt(k), nil))
	num.Mul(num, new(big.Int).Exp(big.NewInt(b-a), big.NewInt(n-k), nil))
	den := new(big.Int).Exp(big.NewInt(b), big.NewInt(n), nil)
	return quo(num, den)
}

// betaExact returns B(a,b) = (a−1)!(b−1)!/(a+b−1)! for integers a, b ≥ 1.
func betaExact(a, b int64) *big.Float {
	num := new(big.Int).Mul(new(big.Int).MulRange(1, max(a-1, 1)), new(big.Int).MulRange(1, max(b-1, 1)))
	den := new(big.Int).MulRange(1, a+b-1)
	return quo(num, den)
}

// Where gonum computes exactly or with little rounding, lgamma agrees.
func TestAgreesWithGonum(t *testing.T) {
	// combin.Binomial is exact in int while no intermediate overflows.
	for n := 0; n <= 56; n++ {
		for k := 0; k <= n; k++ {
			if got, want := lgamma.MustChooseInt64(int64(n), int64(k)), combin.Binomial(n, k); got != int64(want) {
				t.Errorf("ChooseInt64(%d, %d) = %d, gonum %d", n, k, got, want)
			}
		}
	}
	const tol = 1e-12 // gonum's lgamma-based forms carry a few 1e-14 here
	for _, n := range []float64{5, 20, 52, 100, 300} {
		for _, k := range []float64{0, 1, 2, 5, 13, n / 2} {
			k = math.Floor(k)
			if k > n {
				continue
			}
			if got, want := lgamma.Choose(int(n), int(k)), combin.GeneralizedBinomial(n, k); math.Abs(got-want) > tol*want {
				t.Errorf("Choose(%g, %g) = %g, gonum GeneralizedBinomial %g", n, k, got, want)
			}
			if got, want := lgamma.LogChoose(int(n), int(k)), combin.LogGeneralizedBinomial(n, k); math.Abs(got-want) > tol*math.Max(1, want) {
				t.Errorf("LogChoose(%g, %g) = %g, gonum %g", n, k, got, want)
			}
		}
	}
	for _, ab := range [][2]float64{{0.5, 0.5}, {1, 1}, {2, 3}, {2.5, 7.25}, {10, 20}, {0.1, 30}, {50, 50}} {
		if got, want := lgamma.Beta(ab[0], ab[1]), mathext.Beta(ab[0], ab[1]); math.Abs(got-want) > tol*want {
			t.Errorf("Beta(%g, %g) = %g, gonum %g", ab[0], ab[1], got, want)
		}
		if got, want := lgamma.LogBeta(ab[0], ab[1]), mathext.Lbeta(ab[0], ab[1]); math.Abs(got-want) > tol*math.Max(1, math.Abs(want)) {
			t.Errorf("LogBeta(%g, %g) = %g, gonum %g", ab[0], ab[1], got, want)
		}
	}
	for _, lambda := range []float64{0.5, 3, 12.5, 40} {
		d := distuv.Poisson{Lambda: lambda}
		for k := 0; k <= 60; k++ {
			if got, want := lgamma.PoissonPMF(k, lambda), d.Prob(float64(k)); math.Abs(got-want) > tol*want {
				t.Errorf("PoissonPMF(%d, %g) = %g, gonum %g", k, lambda, got, want)
			}
			if got, want := lgamma.PoissonLogPMF(k, lambda), d.LogProb(float64(k)); math.Abs(got-want) > tol*math.Max(1, math.Abs(want)) {
				t.Errorf("PoissonLogPMF(%d, %g) = %g, gonum %g", k, lambda, got, want)
			}
		}
	}
	for _, np := range []struct{ n, p float64 }{{10, 0.3}, {40, 0.5}, {100, 0.05}} {
		d := distuv.Binomial{N: np.n, P: np.p}
		for k := 0; k <= int(np.n); k++ {
			want := d.Prob(float64(k))
			if want < 1e-200 {
				continue
			}
			if got := lgamma.BinomialPMF(k, int(np.n), np.p); math.Abs(got-want) > tol*want {
				t.Errorf("BinomialPMF(%d, %g, %g) = %g, gonum %g", k, np.n, np.p, got, want)
			}
		}
	}
}

// Past small arguments gonum's exp(Lgamma − Lgamma − Lgamma) forms lose
// digits to the rounding of the large logarithms. The table shows both
// libraries against exact math/big values; only lgamma's error is
// bounded by the test.
func TestPrecisionAgainstExact(t *testing.T) {
	type row struct {
		what         string
		mine, theirs float64
	}
	var rows []row
	check := func(what string, mine, theirs float64, want *big.Float, bound float64) {
		rm, rt := rel(mine, want), rel(theirs, want)
		rows = append(rows, row{what, rm, rt})
		if rm > bound {
			t.Errorf("%s: lgamma relative error %g > %g", what, rm, bound)
		}
	}
	for _, nk := range [][2]int64{{1000, 10}, {100000, 7}, {1e7, 5}, {1e9, 3}, {1e9, 12}, {600, 300}} {
		n, k := nk[0], nk[1]
		want := new(big.Float).SetPrec(prec).SetInt(new(big.Int).Binomial(n, k))
		check(fmt.Sprintf("C(%d,%d)", n, k), lgamma.Choose(int(n), int(k)), combin.GeneralizedBinomial(float64(n), float64(k)), want, 1e-13)
	}
	for _, kl := range [][2]int64{{10, 10}, {1000, 1000}, {100000, 100000}, {250, 300}} {
		k, lambda := kl[0], kl[1]
		want := poissonExact(k, lambda)
		check(fmt.Sprintf("Poisson k=%d λ=%d", k, lambda), lgamma.PoissonPMF(int(k), float64(lambda)),
			distuv.Poisson{Lambda: float64(lambda)}.Prob(float64(k)), want, 1e-13)
	}
	for _, c := range [][4]int64{{50, 100, 1, 2}, {5000, 10000, 1, 2}, {25000, 100000, 1, 4}, {37500, 100000, 3, 8}, {3, 1000, 1, 1024}} {
		k, n, a, b := c[0], c[1], c[2], c[3]
		p := float64(a) / float64(b)
		want := binomialExact(k, n, a, b)
		check(fmt.Sprintf("Binomial k=%d n=%d p=%g", k, n, p), lgamma.BinomialPMF(int(k), int(n), p),
			distuv.Binomial{N: float64(n), P: p}.Prob(float64(k)), want, 1e-13)
	}
	for _, ab := range [][2]int64{{3, 4}, {200, 300}, {300, 700}, {1, 100000}} {
		want := betaExact(ab[0], ab[1])
		a, b := float64(ab[0]), float64(ab[1])
		check(fmt.Sprintf("Beta(%d,%d)", ab[0], ab[1]), lgamma.Beta(a, b), mathext.Beta(a, b), want, 1e-13)
	}
	var sb strings.Builder
	fmt.Fprintf(&sb, "\n%-34s %14s %14s\n", "exact value (math/big)", "lgamma rel", "gonum rel")
	for _, r := range rows {
		fmt.Fprintf(&sb, "%-34s %14.3g %14.3g\n", r.what, r.mine, r.theirs)
	}
	t.Log(sb.String())
}

// gonum has no hypergeometric distribution; lgamma is checked against
// the exact ratio C(K,k)C(N−K,n−k)/C(N,n).
func TestHypergeometricExact(t *testing.T) {
	for _, c := range [][4]int64{{2, 20, 7, 5}, {30, 1000, 300, 100}, {500, 10000, 2000, 2500}, {0, 50, 10, 5}} {
		k, N, K, n := c[0], c[1], c[2], c[3]
		num := new(big.Int).Mul(new(big.Int).Binomial(K, k), new(big.Int).Binomial(N-K, n-k))
		want := quo(num, new(big.Int).Binomial(N, n))
		if r := rel(lgamma.HypergeometricPMF(int(k), int(N), int(K), int(n)), want); r > 1e-14 {
			t.Errorf("HypergeometricPMF%v: relative error %g", c, r)
		}
	}
}
