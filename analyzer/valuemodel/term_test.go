package valuemodel

import (
	"go/ast"
	"go/types"
	"math"
	"math/big"
	"strings"
	"testing"
)

var (
	symN = Sym{Obj: types.NewVar(10, nil, "n", types.Typ[types.Float64])}
	symK = Sym{Obj: types.NewVar(20, nil, "k", types.Typ[types.Float64])}
	symX = Sym{Obj: types.NewVar(30, nil, "x", types.Typ[types.Float64])}
	symT = Sym{Loop: &ast.Ident{Name: "t", NamePos: 40}}
)

func aff(c int64, terms ...any) Affine {
	a := Int(c)
	for i := 0; i < len(terms); i += 2 {
		a = a.Add(Var(terms[i].(Sym)).Scale(big.NewRat(int64(terms[i+1].(int)), 1)))
	}
	return a
}

// closeLog compares ln|t| at val with want (a logarithm computed
// directly, in math/big or by a plain product).
func closeLog(t *testing.T, what string, term *Term, val map[Sym]float64, want float64) {
	t.Helper()
	got, ok := term.LogAbs(val)
	if !ok || math.Abs(got-want) > 1e-9*math.Max(1, math.Abs(want)) {
		t.Errorf("%s: ln|%v| = %v (ok %v), want %v", what, term, got, ok, want)
	}
}

// ProductOver against the plain product it closes, for factors of
// either direction, steps other than one and rational starts.
func TestProductOver(t *testing.T) {
	cases := []struct {
		name  string
		f     *Term
		count int
		x     float64
		trip  func(t, x float64) float64
	}{
		{"t+1", FromAffine(aff(1, symT, 1)), 30, 0, func(t, _ float64) float64 { return t + 1 }},
		{"2t+1", FromAffine(aff(1, symT, 2)), 40, 0, func(t, _ float64) float64 { return 2*t + 1 }},
		{"x-t", FromAffine(aff(0, symX, 1, symT, -1)), 20, 60, func(t, x float64) float64 { return x - t }},
		{"x/(t+1)", FromAffine(Var(symX)).Div(FromAffine(aff(1, symT, 1))), 25, 7.5, func(t, x float64) float64 { return x / (t + 1) }},
		{"(2t+2)(2t+3)", FromAffine(aff(2, symT, 2)).Mul(FromAffine(aff(3, symT, 2))), 30, 0, func(t, _ float64) float64 { return (2*t + 2) * (2*t + 3) }},
		{"3(x+t)/(t+1)", Num(big.NewRat(3, 1)).Mul(FromAffine(aff(0, symX, 1, symT, 1))).Div(FromAffine(aff(1, symT, 1))), 15, 2.5, func(t, x float64) float64 { return 3 * (x + t) / (t + 1) }},
	}
	for _, c := range cases {
		p := ProductOver(c.f, symT, Int(int64(c.count)))
		want := 0.0
		for i := 0; i < c.count; i++ {
			want += math.Log(math.Abs(c.trip(float64(i), c.x)))
		}
		closeLog(t, c.name, p, map[Sym]float64{symX: c.x}, want)
	}
	// A symbolic count: ∏_{t<n} (t+1) = n!, the form itself.
	if got := Recognise(ProductOver(FromAffine(aff(1, symT, 1)), symT, Var(symN))); got.Kind != Fact || !got.Args[0].Equal(Var(symN)) {
		t.Errorf("∏(t+1) over n trips = %v, want n!", got)
	}
	// A factor whose Γ depends on the trip has no closed form here.
	if p := ProductOver(GammaOf(Var(symT)), symT, Var(symN)); p != nil {
		t.Errorf("∏Γ(t) = %v, want nil", p)
	}
}

// Legendre's duplication formula and the shift identity, checked at
// points against math.Gamma (DLMF 5.5.5 and 5.5.1).
func TestNormalForm(t *testing.T) {
	z := Var(symX)
	dup := GammaOf(z).Mul(GammaOf(z.Add(Const(big.NewRat(1, 2)))))
	if len(dup.Gamma) != 1 || dup.SqrtPi != 1 || !dup.Gamma[0].Arg.Equal(z.Scale(big.NewRat(2, 1))) {
		t.Errorf("Γ(x)Γ(x+½) = %v, want 2^(1−2x)·√π·Γ(2x)", dup)
	}
	for _, x := range []float64{0.75, 3, 10.25, 40} {
		want := math.Log(math.Gamma(x)) + math.Log(math.Gamma(x+0.5))
		closeLog(t, "duplication", dup, map[Sym]float64{symX: x}, want)
	}
	shift := FromAffine(z).Mul(GammaOf(z))
	if f := Recognise(shift); f.Kind != Fact || !f.Args[0].Equal(z) {
		t.Errorf("x·Γ(x) = %v, want x!", shift)
	}
	back := FromAffine(z).Div(GammaOf(z.Shift(1)))
	if len(back.Gamma) != 1 || back.Gamma[0].Pow != -1 || !back.Gamma[0].Arg.Equal(z) || len(back.Pows) != 0 {
		t.Errorf("x/Γ(x+1) = %v, want 1/Γ(x)", back)
	}
	// Γ of small constants folds: Γ(5) = 24, Γ(5/2) = 3√π/4.
	if c, ok := GammaOf(Int(5)).IsConst(); !ok || c.Cmp(big.NewRat(24, 1)) != 0 {
		t.Errorf("Γ(5) = %v", GammaOf(Int(5)))
	}
	if g := GammaOf(Const(big.NewRat(5, 2))); g.SqrtPi != 1 || g.Coef.Cmp(big.NewRat(3, 4)) != 0 {
		t.Errorf("Γ(5/2) = %v, want 3/4·√π", g)
	}
}

// Recognise names a form whatever order its factors come in.
func TestRecogniseOrder(t *testing.T) {
	n, k := Var(symN), Var(symK)
	parts := []*Term{Factorial(n), Factorial(k).Inv(), Factorial(n.Sub(k)).Inv()}
	perms := [][3]int{{0, 1, 2}, {0, 2, 1}, {1, 0, 2}, {1, 2, 0}, {2, 0, 1}, {2, 1, 0}}
	for _, p := range perms {
		v := parts[p[0]].Mul(parts[p[1]]).Mul(parts[p[2]])
		if f := Recognise(v); f.String() != "C(n, k)" && f.String() != "C(n, n - k)" {
			t.Errorf("order %v: %v", p, f)
		}
		if f := Recognise(v.Inv()); f.Kind != InvBinomial {
			t.Errorf("order %v inverted: %v", p, f)
		}
	}
	pois := PowOf(Var(symX), k).Mul(ExpOf(Var(symX).Scale(big.NewRat(-1, 1)))).Div(Factorial(k))
	if f := Recognise(pois); f.Kind != Poisson {
		t.Errorf("Poisson: %v", f)
	}
	if f := Recognise(Factorial(n.Scale(big.NewRat(2, 1))).Div(Factorial(n.Shift(1)).Mul(Factorial(n)))); f.Kind != Catalan {
		t.Errorf("Catalan: %v", f)
	}
	if f := Recognise(PowOf(Var(symX), k).Div(Factorial(k))); !strings.HasPrefix(f.String(), "x^k/k!") {
		t.Errorf("x^k/k!: %v", f)
	}
}
