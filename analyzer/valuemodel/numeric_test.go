package valuemodel

import (
	"math/big"
	"testing"
)

// TestRatAtCatalan evaluates the model's value of the Catalan numbers'
// running product, Γ(n + 1/2)·4^n/(√π·Γ(n + 2)) with its half-integer
// Γ, exactly, and compares it with C(2n, n)/(n + 1) from math/big (OEIS
// A000108); a value whose √π does not cancel has none.
func TestRatAtCatalan(t *testing.T) {
	info, fd := load(t, `
func catalanStep(n int) uint64 {
	c := uint64(1)
	for k := 0; k < n; k++ {
		c = c * uint64(2*(2*k+1)) / uint64(k+2)
	}
	return c
}`, "catalanStep")
	res := Evaluate(info, fd, Options{})
	v := returned(res, fd)
	var n Sym
	for _, l := range res.Loops {
		n, _ = plainVarOf(l.Count)
	}
	for i := int64(0); i <= 40; i++ {
		got, ok := v.RatAt(map[Sym]*big.Rat{n: big.NewRat(i, 1)})
		want := new(big.Int).Binomial(2*i, i)
		want.Quo(want, big.NewInt(i+1))
		if !ok || !got.IsInt() || got.Num().Cmp(want) != 0 {
			t.Errorf("%v at n = %d is %v (ok %v), math/big's C(2n, n)/(n+1) is %v", v, i, got, ok, want)
		}
	}
	half := GammaOf(Const(big.NewRat(1, 2)))
	if _, ok := half.RatAt(nil); ok {
		t.Error("Γ(1/2) = √π has an exact rational value")
	}
}

// plainVarOf returns the variable a is, when it is one.
func plainVarOf(a Affine) (Sym, bool) {
	if len(a.Terms) != 1 || a.C != nil && a.C.Sign() != 0 {
		return Sym{}, false
	}
	return a.Terms[0].Sym, true
}
