package valuemodel

import (
	"go/ast"
	"math"
	"math/big"
	"testing"
)

// TestLogSpaceForms evaluates the ways Stirling's formula and its log
// are written, and compares the value the model gives each with the
// same expression computed by package math at a few points (the
// reference is the Go expression itself).
func TestLogSpaceForms(t *testing.T) {
	tests := []struct {
		name, expr string
		log        bool
		ref        func(x float64) float64 // ln of the value
	}{
		{"sqrt and pow over e", "math.Sqrt(2*math.Pi*x) * math.Pow(x/math.E, x)", false,
			func(x float64) float64 { return math.Log(math.Sqrt(2*math.Pi*x) * math.Pow(x/math.E, x)) }},
		{"pow, exp, sqrt", "math.Pow(x, x) * math.Exp(-x) * math.Sqrt(2*math.Pi*x)", false,
			func(x float64) float64 { return math.Log(math.Pow(x, x) * math.Exp(-x) * math.Sqrt(2*math.Pi*x)) }},
		{"half power", "math.Pow(x, x+0.5) * math.Exp(-x) * math.Sqrt(2*math.Pi)", false,
			func(x float64) float64 { return math.Log(math.Pow(x, x+0.5) * math.Exp(-x) * math.Sqrt(2*math.Pi)) }},
		{"log form", "x*math.Log(x) - x + 0.5*math.Log(2*math.Pi*x)", true,
			func(x float64) float64 { return x*math.Log(x) - x + 0.5*math.Log(2*math.Pi*x) }},
		{"log form halved by division", "(x+0.5)*math.Log(x) - x + math.Log(2*math.Pi)/2", true,
			func(x float64) float64 { return (x+0.5)*math.Log(x) - x + math.Log(2*math.Pi)/2 }},
		{"log of a ratio to a power", "x * math.Log(x/math.E)", true,
			func(x float64) float64 { return x * math.Log(x/math.E) }},
	}
	for _, tc := range tests {
		src := "func f(x float64) float64 {\n\treturn " + tc.expr + "\n}"
		info, fd := load(t, src, "f")
		res := Evaluate(info, fd, Options{})
		ret := fd.Body.List[0].(*ast.ReturnStmt).Results[0]
		term := res.Values[ret]
		if tc.log {
			term = res.Logs[ret]
		}
		if term == nil {
			t.Errorf("%s: %s has no value", tc.name, tc.expr)
			continue
		}
		var x Sym
		for s := range res.Exprs {
			x = s
		}
		for _, v := range []float64{1, 2.5, 7, 40, 120} {
			got, ok := term.LogAbs(map[Sym]float64{x: v})
			want := tc.ref(v)
			if !ok || math.Abs(got-want) > 1e-12*math.Max(1, math.Abs(want)) {
				t.Errorf("%s at %g: ln of %s = %v (ok %v), want %v", tc.name, v, term, got, ok, want)
			}
		}
	}
}

// TestPowRatLimits: powers that would leave the algebra are unknown.
func TestPowRatLimits(t *testing.T) {
	half := Const(big.NewRat(1, 2))
	n := Var(Sym{Loop: &ast.BlockStmt{}})
	if GammaOf(n).PowAffine(half) != nil {
		t.Error("√Γ(n) has a value")
	}
	if Num(rat(-2)).PowAffine(half) != nil {
		t.Error("√−2 has a value")
	}
	if FromAffine(n).PowAffine(n).PowAffine(n) != nil {
		t.Error("(n^n)^n has a value")
	}
	if got := Num(rat(4)).PowRat(big.NewRat(1, 2)); got == nil || got.String() != "2" {
		t.Errorf("√4 = %v, want 2", got)
	}
}

// TestIsOneAgreesWithCmp checks the allocation-free tests of 1 and ±1
// against math/big's own comparison, on integers and fractions around
// them, values beyond int64 and the zero Rat.
func TestIsOneAgreesWithCmp(t *testing.T) {
	huge, _ := new(big.Rat).SetString("18446744073709551617") // 2^64 + 1
	cases := []*big.Rat{new(big.Rat), huge, new(big.Rat).Neg(huge)}
	for _, n := range []int64{-3, -2, -1, 0, 1, 2, 3} {
		for _, d := range []int64{1, 2, 3, -1, -2} {
			cases = append(cases, big.NewRat(n, d))
		}
	}
	for _, r := range cases {
		if got, want := isOne(r), r.Cmp(big.NewRat(1, 1)) == 0; got != want {
			t.Errorf("isOne(%v) = %v, want %v", r, got, want)
		}
		abs := new(big.Rat).Abs(r)
		if got, want := isUnit(r), abs.Cmp(big.NewRat(1, 1)) == 0; got != want {
			t.Errorf("isUnit(%v) = %v, want %v", r, got, want)
		}
	}
}
