package analyzer

import (
	"fmt"
	"go/token"
	"go/types"
	"math/big"
	"strings"

	vm "github.com/overfact/overfact/analyzer/valuemodel"
)

// ValueFact records what a function returns as a value of its
// parameters, in the value model's algebra, and the intermediates inside
// it that leave the result type first, so that a caller in any package
// evaluates a call of it as that value (go vet -vettool passes it between
// packages gob-encoded: its fields are of basic types, slices and
// structs only).
//
// binomCoeff(n, k float64) float64 { return fact(n) / (fact(k) * fact(n-k)) }
// gets the value Γ(p0+1)/(Γ(p1+1)·Γ(p0−p1+1)) and the weak point
// p0 ≥ 171: fact(n) is +Inf from there.
type ValueFact struct {
	// Value is the result in terms of the parameters (Param i of an
	// affine form is parameter i).
	Value FactTerm
	// Weak lists the intermediates that break, each while the result
	// can still fit: the function returns a wrong value once Arg ≥ Bad.
	Weak []WeakPoint
	// Log reports that the function returns the natural logarithm of
	// Value (ln C(n, k) as a sum of log-gamma values): a caller's
	// math.Exp of the call is Value.
	Log bool
	// Table, when set, is a return for small inputs that the fact does
	// not describe (a table lookup, an exact integer product): it runs
	// only while parameter Table.Param is at most Table.Max, where Value
	// fits the result type, so Value is what the function returns
	// wherever Value leaves the type.
	Table *TableBranch
}

// TableBranch bounds the inputs of a function's other returns: they run
// only while parameter Param is at most Max.
type TableBranch struct {
	Param int
	Max   int64
}

// AFact marks ValueFact as an analysis fact.
func (*ValueFact) AFact() {}

func (f *ValueFact) String() string {
	var weak []string
	for _, w := range f.Weak {
		a, _ := w.Arg.Affine(nil)
		bad, _ := parseRat(w.Bad)
		weak = append(weak, fmt.Sprintf("%s ≥ %s", a, ratString(bad)))
	}
	v := f.Value.Term(nil).String()
	if f.Log {
		v = "ln " + v
	}
	out := fmt.Sprintf("value %s", v)
	if len(weak) > 0 {
		out += ", wrong once " + strings.Join(weak, " or ")
	}
	if f.Table != nil {
		out += fmt.Sprintf(", another return for p%d ≤ %d", f.Table.Param, f.Table.Max)
	}
	return out
}

// FactTerm is a vm.Term over parameter indices.
type FactTerm struct {
	Coef   string
	SqrtPi int
	Gamma  []FactGamma
	Pows   []FactPow
	Exp    FactAffine
}

// FactGamma is Γ(Arg)^Pow.
type FactGamma struct {
	Arg FactAffine
	Pow int
}

// FactPow is Base^Exp.
type FactPow struct {
	Base, Exp FactAffine
}

// FactAffine is C + Σ K[i]·parameter Param[i], rationals as text.
type FactAffine struct {
	C     string
	Param []int
	K     []string
}

// WeakPoint is an intermediate of the function that is wrong (±Inf,
// NaN, wrapped) once Arg ≥ Bad: a factorial-valued call or a math.Gamma
// value. What says how the function's code writes it.
type WeakPoint struct {
	Arg   FactAffine
	Bad   string
	What  string
	Gamma bool // a math.Gamma value (else a factorial)
}

// paramSyms maps a function's parameter objects to their indices.
type paramSyms map[types.Object]int

// encodeAffine writes a over the parameters; false when it has another
// variable.
func (ps paramSyms) encodeAffine(a vm.Affine) (FactAffine, bool) {
	out := FactAffine{C: ratText(a.C)}
	for _, l := range a.Terms {
		i, ok := ps[l.Sym.Obj]
		if !ok || l.Sym.Field != nil || l.Sym.Loop != nil {
			return FactAffine{}, false
		}
		out.Param = append(out.Param, i)
		out.K = append(out.K, ratText(l.K))
	}
	return out, true
}

func ratText(r *big.Rat) string {
	if r == nil {
		return "0"
	}
	return r.RatString()
}

// encodeTerm writes t over the parameters; false when it has another
// variable.
func (ps paramSyms) encodeTerm(t *vm.Term) (FactTerm, bool) {
	out := FactTerm{Coef: ratText(t.Coef), SqrtPi: t.SqrtPi}
	var ok bool
	if out.Exp, ok = ps.encodeAffine(t.Exp); !ok {
		return FactTerm{}, false
	}
	for _, g := range t.Gamma {
		a, ok := ps.encodeAffine(g.Arg)
		if !ok {
			return FactTerm{}, false
		}
		out.Gamma = append(out.Gamma, FactGamma{a, g.Pow})
	}
	for _, p := range t.Pows {
		b, ok1 := ps.encodeAffine(p.Base)
		e, ok2 := ps.encodeAffine(p.Exp)
		if !ok1 || !ok2 {
			return FactTerm{}, false
		}
		out.Pows = append(out.Pows, FactPow{b, e})
	}
	return out, true
}

// placeholders are the variables a fact's parameters decode into:
// distinct objects at distinct positions (the algebra orders variables
// by position), which no code declares, so that substituting a caller's
// arguments for them cannot capture a variable of the caller.
var placeholders = func() []vm.Sym {
	out := make([]vm.Sym, 32)
	for i := range out {
		out[i] = vm.Sym{Obj: types.NewVar(token.Pos(i+1), nil, fmt.Sprintf("p%d", i), types.Typ[types.Float64])}
	}
	return out
}()

func parseRat(s string) (*big.Rat, bool) {
	r, ok := new(big.Rat).SetString(s)
	return r, ok
}

// Affine decodes a over the placeholders, or over args when given
// (args[i] for parameter i); false when it is malformed or names a
// parameter past them.
func (a FactAffine) Affine(args []vm.Affine) (vm.Affine, bool) {
	if a.C == "" && len(a.Param) == 0 {
		return vm.Int(0), true // the zero form, as gob leaves it
	}
	c, ok := parseRat(a.C)
	if !ok || len(a.Param) != len(a.K) {
		return vm.Affine{}, false
	}
	out := vm.Const(c)
	for i, p := range a.Param {
		k, ok := parseRat(a.K[i])
		if !ok || p < 0 || p >= len(placeholders) {
			return vm.Affine{}, false
		}
		x := vm.Var(placeholders[p])
		if args != nil {
			if p >= len(args) || args[p].C == nil {
				return vm.Affine{}, false
			}
			x = args[p]
		}
		out = out.Add(x.Scale(k))
	}
	return out, true
}

// Term decodes t with args for the parameters (placeholders when nil);
// nil when it is malformed or an argument it needs is unknown.
func (t FactTerm) Term(args []vm.Affine) *vm.Term {
	c, ok := parseRat(t.Coef)
	if !ok {
		return nil
	}
	out := vm.Num(c)
	if t.SqrtPi != 0 {
		// √π^s is Γ(1/2)^s.
		out = out.Mul(vm.GammaOf(vm.Const(big.NewRat(1, 2))).PowInt(int64(t.SqrtPi)))
	}
	for _, g := range t.Gamma {
		a, ok := g.Arg.Affine(args)
		if !ok {
			return nil
		}
		out = out.Mul(vm.GammaOf(a).PowInt(int64(g.Pow)))
	}
	for _, p := range t.Pows {
		b, ok1 := p.Base.Affine(args)
		e, ok2 := p.Exp.Affine(args)
		if !ok1 || !ok2 {
			return nil
		}
		out = out.Mul(vm.PowOf(b, e))
	}
	x, ok := t.Exp.Affine(args)
	if !ok {
		return nil
	}
	return out.Mul(vm.ExpOf(x))
}
