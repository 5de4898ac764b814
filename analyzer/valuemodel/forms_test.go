package valuemodel

import (
	"go/types"
	"math"
	"math/big"
	"testing"
)

var (
	symBig = Sym{Obj: types.NewVar(50, nil, "N", types.Typ[types.Float64])}
	symP   = Sym{Obj: types.NewVar(60, nil, "p", types.Typ[types.Float64])}
)

// binom is C(n, k) as Γ(n+1)/(Γ(k+1)Γ(n−k+1)).
func binom(n, k Affine) *Term {
	return Factorial(n).Div(Factorial(k).Mul(Factorial(n.Sub(k))))
}

// The hypergeometric probability C(K,k)·C(N−K,n−k)/C(N,n) (common
// practice) is named whatever the order its binomials are multiplied
// and divided in, and its value is the one math/big gives.
func TestRecogniseHypergeometric(t *testing.T) {
	N, K, n, k := Var(symBig), Var(symX), Var(symN), Var(symK)
	forms := []*Term{
		binom(K, k).Mul(binom(N.Sub(K), n.Sub(k))).Div(binom(N, n)),
		binom(N.Sub(K), n.Sub(k)).Div(binom(N, n)).Mul(binom(K, k)),
		// the roles of K and n swapped: the same probability
		binom(n, k).Mul(binom(N.Sub(n), K.Sub(k))).Div(binom(N, K)),
	}
	for i, f := range forms {
		got := RecogniseAny(f)
		if got.Kind != Hypergeometric {
			t.Errorf("form %d, %v: kind %v, want Hypergeometric", i, f, got.Kind)
			continue
		}
		// k, N, K, n at N = 200, K = 60, n = 30, k = 9 against
		// math/big's exact binomials.
		val := map[Sym]float64{symBig: 200, symX: 60, symN: 30, symK: 9}
		at := map[Sym]*big.Rat{symBig: big.NewRat(200, 1), symX: big.NewRat(60, 1), symN: big.NewRat(30, 1), symK: big.NewRat(9, 1)}
		args := make([]int64, 4)
		for j, a := range got.Args {
			v, ok := a.At(at)
			if !ok || !v.IsInt() {
				t.Fatalf("form %d: argument %v has no integer value", i, a)
			}
			args[j] = v.Num().Int64()
		}
		kk, NN, KK, nn := args[0], args[1], args[2], args[3]
		exact := new(big.Rat).SetFrac(new(big.Int).Mul(new(big.Int).Binomial(KK, kk), new(big.Int).Binomial(NN-KK, nn-kk)), new(big.Int).Binomial(NN, nn))
		want, _ := exact.Float64()
		closeLog(t, "hypergeometric", f, val, math.Log(want))
	}
	// A binomial too many is no hypergeometric probability.
	if got := RecogniseAny(forms[0].Mul(binom(n, k))); got.Kind == Hypergeometric {
		t.Errorf("extra binomial recognised as %v", got)
	}
	// Nor one whose lower arguments do not add up.
	if got := RecogniseAny(binom(K, k).Mul(binom(N.Sub(K), n)).Div(binom(N, n))); got.Kind == Hypergeometric {
		t.Errorf("C(K,k)C(N−K,n)/C(N,n) recognised as %v", got)
	}
}

// The negative binomial probability C(f+s−1, f)·p^s·(1−p)^f (common
// practice), with the binomial's k written either way.
func TestRecogniseNegBinomial(t *testing.T) {
	f, s, p := Var(symN), Var(symK), Var(symP)
	pow := PowOf(p, s).Mul(PowOf(Int(1).Sub(p), f))
	for i, c := range []*Term{
		binom(f.Add(s).Shift(-1), f).Mul(pow),
		binom(f.Add(s).Shift(-1), s.Shift(-1)).Mul(pow),
	} {
		got := RecogniseAny(c)
		if got.Kind != NegBinomialPMF || !got.Args[0].Equal(f) || !got.Args[1].Equal(s) || !got.Args[2].Equal(p) {
			t.Errorf("case %d, %v: got %v %v", i, c, got.Kind, got.Args)
		}
		if s := got.String(); s != "C(n + k - 1, n)·p^k·(1−p)^n" {
			t.Errorf("case %d: named %q", i, s)
		}
	}
	// p^f·(1−p)^s is the other distribution's order: not this form
	// unless f and s are the same.
	swapped := binom(f.Add(s).Shift(-1), f).Mul(PowOf(p, f)).Mul(PowOf(Int(1).Sub(p), s))
	if got := RecogniseAny(swapped); got.Kind == NegBinomialPMF && !got.Args[1].Equal(s) {
		t.Errorf("swapped powers recognised with s = %v", got.Args[1])
	}
	// The binomial pmf stays a binomial pmf.
	if got := RecogniseAny(binom(f, s).Mul(PowOf(p, s)).Mul(PowOf(Int(1).Sub(p), f.Sub(s)))); got.Kind != BinomialPMF {
		t.Errorf("binomial pmf named %v", got.Kind)
	}
}
