package thresholds

import (
	"math"
	"math/big"
	"testing"
)

func lgammaOf(x float64) float64 { v, _ := math.Lgamma(x); return v }

// TestLgammaMin checks the minimum of ln Γ on x > 0 against its value
// −0.12148629053584960… at x = 1.46163214496836… (DLMF 5.4.iii, from
// memory), and that no grid point goes below it.
func TestLgammaMin(t *testing.T) {
	got := LgammaMin()
	if math.Abs(got-(-0.1214862905358496)) > 1e-12 {
		t.Errorf("LgammaMin() = %.17g, want −0.1214862905358496 (from memory)", got)
	}
	for x := 0.01; x < 10; x += 0.001 {
		if lgammaOf(x) < got-1e-15 {
			t.Fatalf("ln Γ(%g) = %g is below LgammaMin() = %g", x, lgammaOf(x), got)
		}
	}
}

// bigLogFactorial returns ln n! from the exact n! of math/big.
func bigLogFactorial(n int64) float64 {
	f := new(big.Float).SetInt(factorial(n))
	mant := new(big.Float)
	exp := f.MantExp(mant)
	m, _ := mant.Float64()
	return math.Log(m) + float64(exp)*math.Ln2
}

// TestExpLogGammaErrorCovers runs C(n, k) = exp(ln Γ(n+1) − ln Γ(k+1) −
// ln Γ(n−k+1)) in float64 as programs write it and compares it with the
// exact C(n, k) of math/big: the error must never exceed the bound
// computed for that (n, k).
func TestExpLogGammaErrorCovers(t *testing.T) {
	type grid struct{ n, kMax, kStep int64 }
	worst := 0.0
	for _, g := range []grid{{60, 60, 1}, {300, 300, 7}, {1000, 500, 13}, {10000, 40, 3}, {100000, 30, 3}, {1000000, 25, 4}} {
		for k := int64(0); k <= g.kMax; k += g.kStep {
			n, fn, fk := g.n, float64(g.n), float64(k)
			got := math.Exp(lgammaOf(fn+1) - lgammaOf(fk+1) - lgammaOf(fn-fk+1))
			want := new(big.Float).SetPrec(200).SetInt(new(big.Int).Binomial(n, k))
			diff := new(big.Float).Sub(new(big.Float).SetPrec(200).SetFloat64(got), want)
			rel, _ := new(big.Float).Quo(diff.Abs(diff), want).Float64()
			terms := []LogGammaTerm{{P: 1, C: 1, K: []float64{1, 0}}, {P: -1, C: 1, K: []float64{0, 1}}, {P: -1, C: 1, K: []float64{1, -1}}}
			b, ok := ExpLogGammaError([][]LogGammaTerm{terms}, []float64{fn, fk}, []float64{fn, fk})
			if !ok {
				t.Fatalf("no bound at C(%d, %d)", n, k)
			}
			if rel > b {
				t.Errorf("C(%d, %d): relative error %.3g exceeds the bound %.3g", n, k, rel, b)
			}
			worst = math.Max(worst, rel/b)
		}
	}
	t.Logf("largest error/bound ratio on the grid: %.3g", worst)
}

// TestExpLogGammaFirstBinomial checks the first n at which the bound for
// C(n, k) over 0 ≤ k ≤ n passes 1e-12 against the bound written out by
// hand at its worst corner, k = 0 (or n): ln Γ(n+1) + ln Γ(1) +
// ln Γ(n+1), with ln n! from math/big, each term widened by 2·|min ln Γ|.
func TestExpLogGammaFirstBinomial(t *testing.T) {
	terms := []LogGammaTerm{{P: 1, C: 1, K: []float64{1, 0}}, {P: -1, C: 1, K: []float64{0, 1}}, {P: -1, C: 1, K: []float64{1, -1}}}
	bound := func(x float64) (float64, bool) {
		return ExpLogGammaError([][]LogGammaTerm{terms}, []float64{x, 0}, []float64{x, x})
	}
	got, ok := ExpLogGammaFirst(bound, 0, 1<<40, 1e-12)
	if !ok {
		t.Fatal("no first n")
	}
	u := math.Ldexp(1, -53)
	byHand := func(n int64) float64 {
		a := 2*bigLogFactorial(n) - 6*LgammaMin()
		gam2 := 2 * u / (1 - 2*u)
		return math.Expm1((2*u+gam2*(1+3*u))*a + math.Log1p(2*u))
	}
	if !(byHand(got) > 1e-12 && byHand(got-1) <= 1e-12) {
		t.Errorf("first n = %d; by hand the bound is %.6g there and %.6g at n−1", got, byHand(got), byHand(got-1))
	}
	// The bound at n = 10⁹ is about 4·2·ln(10⁹!)·2^-53 (about
	// 1.8e-5), the same order as the |ln Γ(n+1)|·2^-53 ≈ 2.2e-6 of a
	// single term: the rounding of each of the three terms and of
	// their sum is counted.
	if b, _ := bound(1e9); b < 1e-6 || b > 1e-4 {
		t.Errorf("bound at n = 1e9: %g", b)
	}
}

// TestExpLogGammaErrorPoles: a box whose every corner holds a
// non-positive argument has no bound; where only some corners do (C(n, k)
// over 0 ≤ k ≤ K with K < k at a corner, a case the code's guards
// return early for), the bound is the one at the corners where every
// argument is positive.
func TestExpLogGammaErrorPoles(t *testing.T) {
	terms := []LogGammaTerm{{P: 1, C: 0, K: []float64{1}}}
	if _, ok := ExpLogGammaError([][]LogGammaTerm{terms}, []float64{0}, []float64{0}); ok {
		t.Error("Γ(0) gave a bound")
	}
	// ln Γ(K+1) − ln Γ(k+1) − ln Γ(K−k+1) over K = 500, 0 ≤ k ≤ 1000:
	// the corner k = 1000 holds Γ(−499); the corners k = 0 are C(500, 0),
	// whose three terms sum, in absolute value, to
	// ln 500! + ln 0! + ln 500! (the largest A, with |ln Γ| taken as
	// ln Γ − 2·LgammaMin()).
	binom := []LogGammaTerm{
		{P: 1, C: 1, K: []float64{1, 0}},
		{P: -1, C: 1, K: []float64{0, 1}},
		{P: -1, C: 1, K: []float64{1, -1}},
	}
	got, ok := ExpLogGammaError([][]LogGammaTerm{binom}, []float64{500, 0}, []float64{500, 1000})
	want, wok := ExpLogGammaError([][]LogGammaTerm{binom}, []float64{500, 0}, []float64{500, 0})
	if !ok || !wok || got != want {
		t.Errorf("bound with a pole corner: %g, %v; at the corners without one: %g, %v", got, ok, want, wok)
	}
	if b, ok := ExpLogGammaError(nil, nil, nil); !ok || b != 0 {
		t.Errorf("empty product: %g, %v", b, ok)
	}
}
