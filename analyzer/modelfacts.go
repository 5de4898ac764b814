package analyzer

import (
	"fmt"
	"go/token"
	"go/types"
	"math/big"
	"strconv"
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
	// Running reports a binomial coefficient in a float type returned
	// as the accumulator of a running product (w *= (n−1+i)/i), with no
	// weak point the model names: it is +Inf where the coefficient
	// leaves the type, if not before. A caller's logarithm of it is
	// judged (checkLogOfModelValue); the rules that take a value fact
	// without weak points as formed as one quantity (formedCall) do not
	// take this one.
	Running bool
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
	if f.Running {
		out += ", a running product"
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

// FactAffine is C + Σ K[i]·parameter Param[i], rationals as text. A
// method's value may read its receiver's fields (o.N, o.Quanta): such a
// variable has Param −1 and Field[i] the field's name; Field is empty
// when every variable is a parameter.
type FactAffine struct {
	C     string
	Param []int
	K     []string
	Field []string
}

// recvParam is the Param of a receiver's field in a FactAffine.
const recvParam = -1

// WeakPoint is an intermediate of the function that is wrong (±Inf,
// NaN, wrapped) once Arg ≥ Bad: a factorial-valued call or a math.Gamma
// value. What says how the function's code writes it.
type WeakPoint struct {
	Arg   FactAffine
	Bad   string
	What  string
	Gamma bool // a math.Gamma value (else a factorial)
	Wraps bool // an integer factorial, which wraps (else +Inf in a float type)
}

// paramSyms maps a function's parameter objects to their indices, and
// a method's receiver to recvParam.
type paramSyms map[types.Object]int

// encodeAffine writes a over the parameters and the receiver's fields;
// false when it has another variable.
func (ps paramSyms) encodeAffine(a vm.Affine) (FactAffine, bool) {
	out := FactAffine{C: ratText(a.C)}
	fields := false
	for _, l := range a.Terms {
		i, ok := ps[l.Sym.Obj]
		if !ok || l.Sym.Loop != nil || l.Sym.Def != nil || (i == recvParam) != (l.Sym.Field != nil) {
			return FactAffine{}, false
		}
		name := ""
		if l.Sym.Field != nil {
			name, fields = l.Sym.Field.Name(), true
		}
		out.Param = append(out.Param, i)
		out.K = append(out.K, ratText(l.K))
		out.Field = append(out.Field, name)
	}
	if !fields {
		out.Field = nil
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
	// Most numbers in facts are integers: read without SetString's
	// reader and GCD, the same value.
	if n, err := strconv.ParseInt(s, 10, 64); err == nil {
		return new(big.Rat).SetInt64(n), true
	}
	r, ok := new(big.Rat).SetString(s)
	return r, ok
}

// factArgs are what a fact's variables decode into at a call: params[i]
// for parameter i (the zero Affine where the argument is unknown), and
// the receiver's fields by name (recv, nil where the receiver is not
// known). A nil *factArgs decodes into placeholders.
type factArgs struct {
	params []vm.Affine
	recv   func(field string) (vm.Affine, bool)
	// reading marks a decoding into placeholders (String); fields holds
	// the placeholders of the receiver's fields of one such decoding,
	// one variable per name.
	reading bool
	fields  map[string]vm.Sym
}

// recvPlaceholder is the receiver whose fields' placeholders decode a
// fact for reading (String).
var recvPlaceholder = types.NewVar(token.Pos(len(placeholders)+1), nil, "recv", types.Typ[types.Float64])

// field returns the value of the receiver's field name: the caller's
// variable, or a placeholder of its own when args is nil.
func (args *factArgs) field(name string) (vm.Affine, bool) {
	if !args.reading {
		if args.recv == nil {
			return vm.Affine{}, false
		}
		return args.recv(name)
	}
	if args.fields == nil {
		args.fields = make(map[string]vm.Sym)
	}
	s, ok := args.fields[name]
	if !ok {
		// Distinct positions keep distinct fields apart in the
		// algebra's order of variables.
		s = vm.Sym{Obj: recvPlaceholder, Field: types.NewField(token.Pos(len(args.fields)+1), nil, name, types.Typ[types.Float64], false)}
		args.fields[name] = s
	}
	return vm.Var(s), true
}

// Affine decodes a over args (placeholders when args is nil); false
// when it is malformed or names a variable args does not know.
func (a FactAffine) Affine(args *factArgs) (vm.Affine, bool) {
	if a.C == "" && len(a.Param) == 0 {
		return vm.Int(0), true // the zero form, as gob leaves it
	}
	c, ok := parseRat(a.C)
	if !ok || len(a.Param) != len(a.K) || len(a.Field) != 0 && len(a.Field) != len(a.Param) {
		return vm.Affine{}, false
	}
	if args == nil {
		args = &factArgs{reading: true}
	}
	out := vm.Const(c)
	for i, p := range a.Param {
		k, ok := parseRat(a.K[i])
		if !ok {
			return vm.Affine{}, false
		}
		var x vm.Affine
		switch {
		case p == recvParam && len(a.Field) != 0 && a.Field[i] != "":
			if x, ok = args.field(a.Field[i]); !ok {
				return vm.Affine{}, false
			}
		case p < 0 || p >= len(placeholders) || len(a.Field) != 0 && a.Field[i] != "":
			return vm.Affine{}, false
		case args.reading:
			x = vm.Var(placeholders[p])
		case p >= len(args.params) || args.params[p].C == nil:
			return vm.Affine{}, false
		default:
			x = args.params[p]
		}
		out = out.Add(x.Scale(k))
	}
	return out, true
}

// Term decodes t with args (placeholders when nil); nil when it is
// malformed or an argument it needs is unknown.
func (t FactTerm) Term(args *factArgs) *vm.Term {
	if args == nil {
		args = &factArgs{reading: true} // one placeholder per field across the term
	}
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
