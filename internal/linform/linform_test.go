package linform

import (
	"go/token"
	"go/types"
	"math"
	"math/big"
	"math/rand"
	"testing"
)

// The forms are checked against plain math/big evaluation: a form's value
// at a point is C + Σ K·x, so (f+g)(x) = f(x)+g(x), (k·f)(x) = k·f(x) and
// f.Subst(v, g)(x) = f(x with v = g(x)), computed with big.Rat apart from
// the package.

type sym int

func (s sym) Before(t sym) bool { return s < t }

type ratForm = Form[sym, *big.Rat, Rat]

func eval(f ratForm, x map[sym]*big.Rat) *big.Rat {
	out := new(big.Rat).Set(orZero(f.C))
	for _, t := range f.Terms {
		out.Add(out, new(big.Rat).Mul(t.K, x[t.Sym]))
	}
	return out
}

func randRat(r *rand.Rand) *big.Rat {
	return big.NewRat(r.Int63n(2001)-1000, r.Int63n(9)+1)
}

func randForm(r *rand.Rand) ratForm {
	f := ratForm{C: randRat(r)}
	for i := r.Intn(4); i > 0; i-- {
		f = f.Add(Single[sym, *big.Rat, Rat](sym(r.Intn(5))).Scale(randRat(r)))
	}
	return f
}

func TestRatAgainstBig(t *testing.T) {
	r := rand.New(rand.NewSource(1))
	for i := 0; i < 2000; i++ {
		f, g := randForm(r), randForm(r)
		x := map[sym]*big.Rat{}
		for s := sym(0); s < 5; s++ {
			x[s] = randRat(r)
		}
		k := randRat(r)
		if got, want := eval(f.Add(g), x), new(big.Rat).Add(eval(f, x), eval(g, x)); got.Cmp(want) != 0 {
			t.Fatalf("(f+g)(x) = %v, want %v", got, want)
		}
		if got, want := eval(f.Sub(g), x), new(big.Rat).Sub(eval(f, x), eval(g, x)); got.Cmp(want) != 0 {
			t.Fatalf("(f-g)(x) = %v, want %v", got, want)
		}
		if got, want := eval(f.Scale(k), x), new(big.Rat).Mul(k, eval(f, x)); got.Cmp(want) != 0 {
			t.Fatalf("(k·f)(x) = %v, want %v", got, want)
		}
		v := sym(r.Intn(5))
		y := map[sym]*big.Rat{}
		for s, val := range x {
			y[s] = val
		}
		y[v] = eval(g, x)
		if got, want := eval(f.Subst(v, g), x), eval(f, y); got.Cmp(want) != 0 {
			t.Fatalf("f[%d := g](x) = %v, want %v", v, got, want)
		}
		if w := eval(f.Without(v), x); new(big.Rat).Sub(eval(f, x), w).Cmp(new(big.Rat).Mul(coefOr0(f, v), x[v])) != 0 {
			t.Fatalf("f - f.Without(%d) is not its term", v)
		}
		// The invariants every reader relies on: sorted, no zero
		// coefficient, and f−f the zero form.
		for j, term := range f.Add(g).Terms {
			if term.K.Sign() == 0 || j > 0 && !f.Add(g).Terms[j-1].Sym.Before(term.Sym) {
				t.Fatalf("terms of %v not sorted with nonzero coefficients", f.Add(g))
			}
		}
		if !f.Sub(f).IsConst() || !f.Equal(f.Add(g).Sub(g)) {
			t.Fatalf("f - f is not zero for %v", f)
		}
	}
}

func coefOr0(f ratForm, v sym) *big.Rat {
	k, _ := f.Coef(v)
	return k
}

// Small integers are shared (common practice for immutable constants):
// sums and products of them must not allocate a new rational.
func TestRatSharesSmallIntegers(t *testing.T) {
	var d Rat
	if d.Add(SharedInt(3), SharedInt(4)) != SharedInt(7) || d.Mul(SharedInt(-8), SharedInt(8)) != SharedInt(-64) {
		t.Error("small integer results are not the shared values")
	}
	if got := d.Add(nil, SharedInt(2)); got.Cmp(big.NewRat(2, 1)) != 0 {
		t.Errorf("nil + 2 = %v, want 2 (nil is zero)", got)
	}
}

// Float64 follows IEEE arithmetic as Go does: NaN is not zero, so a NaN
// coefficient stays a term.
func TestFloatKeepsNaN(t *testing.T) {
	type ff = Form[sym, float64, Float64]
	f := Single[sym, float64, Float64](0).Scale(math.NaN())
	if len(f.Terms) != 1 {
		t.Fatalf("NaN·x lost its term: %v", f)
	}
	g := (ff{C: math.Inf(1)}).Add(ff{C: 1})
	if !math.IsInf(g.C, 1) {
		t.Fatalf("+Inf + 1 = %v", g.C)
	}
}

// Objects at one position (as export data may give them) still order.
func TestObjOrder(t *testing.T) {
	pkg := types.NewPackage("example.com/p", "p")
	a := types.NewVar(token.NoPos, pkg, "a", types.Typ[types.Int])
	b := types.NewVar(token.NoPos, pkg, "b", types.Typ[types.Int])
	x, y := Obj{a}, Obj{b}
	if x.Before(y) == y.Before(x) {
		t.Fatal("two objects at one position are not ordered")
	}
	f := Single[Obj, int64, Int64](x).Add(Single[Obj, int64, Int64](y))
	if len(f.Terms) != 2 {
		t.Fatalf("a + b has %d terms, want 2", len(f.Terms))
	}
}
