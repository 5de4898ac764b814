package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"math"
	"math/big"
	"path"
	"path/filepath"
	"sort"
	"strings"

	"github.com/overfact/overfact/analyzer/ranges"
)

// wrong-callee: a function that returns the value of a call whose callee
// is reported wrong (it overflows, wraps or turns NaN inside while its
// true value fits) for inputs this caller does not rule out. The caller
// returns the same wrong value, so it is as wrong as the callee; the fix
// is the callee's, so the finding offers none.
//
// A function with a finding of its own whose wrong region is reached
// through its parameters (or its receiver) gets a WrongValueFact: which
// parameters, and from which value on where the finding states it. A
// caller reported here gets the fact too, with the region carried to its
// own parameters, so that callers of callers are reported in any
// package.

// WrongValueFact marks a function whose result is wrong for some inputs
// reached through its parameters, because of a finding in it or in a
// function whose value it returns. Its fields are of basic types and
// slices of structs of them, as the fact encoding requires.
type WrongValueFact struct {
	// Root names the function whose own finding makes the value wrong
	// (as messages name it), and At where that finding is reported,
	// "pkg/file.go:line".
	Root, At string
	// Inputs are the parameters through which the wrong region is
	// reached; a caller that rules out every one of them is right.
	Inputs []WrongInput
	// Leaves says that the value is wrong only where the true value
	// leaves the result type too (a factorial function): only a caller
	// that converts an integer result to a float type is wrong.
	Leaves bool
}

// WrongInput is one way into a function's wrong region.
type WrongInput struct {
	// Param is the index of the parameter, −1 for the receiver.
	Param int
	// Name is the parameter's name, for messages.
	Name string
	// Known says that From is the first value of the parameter at which
	// the result is wrong, exactly Bad (a rational as text) rounded up;
	// otherwise the value is wrong for some inputs of the parameter and
	// no threshold is known.
	Known bool
	From  int64
	Bad   string
}

// AFact marks WrongValueFact as an analysis fact.
func (*WrongValueFact) AFact() {}

func (f *WrongValueFact) String() string {
	out := "wrong"
	for i, in := range f.Inputs {
		sep := " for "
		if i > 0 {
			sep = " or "
		}
		if bad, ok := parseRat(in.Bad); ok && in.Known {
			out += fmt.Sprintf("%s%s ≥ %s", sep, in.Name, ratString(bad))
		} else {
			out += sep + "some " + in.Name
		}
	}
	return out + fmt.Sprintf(" (%s, %s)", f.Root, f.At)
}

// wrongPass is what the category keeps about a pass: the facts of this
// package's functions, from their own findings (noteWrongValue) and from
// the callers reported here.
type wrongPass struct {
	facts map[*types.Func]*WrongValueFact
}

var wrongPassKey = &stateKey[wrongPass]{"wrong values"}

// wrongJudged is what a function's judgements left for its next finding
// (noteJudged): each judged argument with its first bad value.
type wrongJudged struct {
	pending []judgedArg
}

type judgedArg struct {
	arg   ast.Expr
	first int64
}

var wrongJudgedKey = &stateKey[wrongJudged]{"judged arguments"}

// noteJudged keeps a judgement that was not silent, so that the finding
// it leads to knows the first bad value of its argument.
func (fc *fnCtx) noteJudged(arg ast.Expr, first int64, j judgement) {
	if j.silent || arg == nil {
		return
	}
	st := stateOf(fc, wrongJudgedKey)
	st.pending = append(st.pending, judgedArg{arg, first})
}

// rootCategory reports whether a finding of cat makes the function's
// value wrong: gamma-overflow reports a Γ value that does not fit float64
// itself, and lgamma-digits and stirling-approximation an error past a
// tolerance, which a caller's arithmetic need not make wrong.
func rootCategory(cat string) bool {
	switch cat {
	case catGamma, catLgammaDigits, catStirling, catWrongCallee, catDirective:
		return false
	}
	return true
}

// leavesType reports whether a finding of cat is a product that is wrong
// only where it leaves its type (a factorial loop or recursion): the
// function's value is then wrong only where the true value does not fit
// either, and a caller is wrong only where it converts the value to a
// float type that would hold it.
func leavesType(cat string) bool { return cat == catLoop || cat == catRecursion }

// noteWrongValue records a finding reported in fc as a way into the
// function's wrong region.
func (fc *fnCtx) noteWrongValue(f finding) {
	var judged []judgedArg
	if st := peekState(fc, wrongJudgedKey); st != nil {
		judged, st.pending = st.pending, nil
	}
	c := fc.c
	d, ok := fc.node.(*ast.FuncDecl)
	if !ok || !rootCategory(f.cat) || !numericResult(fc.signature()) && !tableResult(fc.signature()) {
		return
	}
	fn := c.declObj(d)
	if fn == nil || c.funcs[fn] != nil && !intResult(fn) || c.neutralValue(fn) {
		return
	}
	// The value model's weak points name the intermediate that breaks
	// first; the judged arguments of a ratio name every factor's.
	inputs := fc.weakInputs(fn)
	if len(inputs) == 0 {
		inputs = fc.judgedInputs(f.node, judged)
	}
	if len(inputs) == 0 {
		inputs = fc.unknownInputs(fc.paramDeps(f.node))
	}
	if len(inputs) == 0 && f.floatWay != nil {
		inputs = fc.floatInputs(fc.paramDeps(f.floatWay))
	}
	if len(inputs) == 0 {
		return // not reached through the parameters
	}
	st := passStateOf(c, wrongPassKey)
	if st.facts == nil {
		st.facts = make(map[*types.Func]*WrongValueFact)
	}
	leaves := c.valueLeaves(fn, f.cat)
	if old := st.facts[fn]; old != nil {
		old.Inputs = mergeInputs(old.Inputs, inputs)
		old.Leaves = old.Leaves && leaves
		return
	}
	st.facts[fn] = &WrongValueFact{Root: fn.Name(), At: c.shortPos(f.node.Pos()), Inputs: inputs, Leaves: leaves}
}

// neutralValue reports whether fn's value, as the value model reads it,
// is wrong only where it leaves its type: a function with a ValueFact
// and no intermediate that breaks first.
func (c *checker) neutralValue(fn *types.Func) bool {
	vf := c.valueFactOf(fn)
	return vf != nil && len(vf.Weak) == 0
}

// judgedInputs maps the judged arguments inside node to the parameters
// they are affine forms of.
func (fc *fnCtx) judgedInputs(node ast.Node, judged []judgedArg) []WrongInput {
	var out []WrongInput
	for _, j := range judged {
		if j.arg.Pos() < node.Pos() || j.arg.End() > node.End() {
			continue
		}
		if in, ok := fc.paramInput(j.arg, big.NewRat(j.first, 1)); ok {
			out = mergeInputs(out, []WrongInput{in})
		} else {
			out = mergeInputs(out, fc.unknownInputs(fc.paramDeps(j.arg)))
		}
	}
	return out
}

// weakInputs reads the value model's weak points of fn over one
// parameter each.
func (fc *fnCtx) weakInputs(fn *types.Func) []WrongInput {
	vf := fc.c.valueFactOf(fn)
	sig := fc.signature()
	if vf == nil || sig == nil {
		return nil
	}
	var out []WrongInput
	for i, w := range vf.Weak {
		if dominated(vf.Weak, i) {
			continue
		}
		bad, ok1 := parseRat(w.Bad)
		c, ok2 := parseRat(w.Arg.C)
		if !ok1 || !ok2 || len(w.Arg.Param) != 1 {
			continue
		}
		k, ok := parseRat(w.Arg.K[0])
		p := w.Arg.Param[0]
		if !ok || k.Sign() <= 0 || p < 0 || p >= sig.Params().Len() {
			continue
		}
		// k·p + c ≥ bad from p = (bad − c)/k on.
		at := new(big.Rat).Quo(new(big.Rat).Sub(bad, c), k)
		out = mergeInputs(out, []WrongInput{knownInput(p, sig.Params().At(p).Name(), at)})
	}
	return out
}

// dominated reports whether weak point i breaks only after another
// does: its argument B is A − C − d for weak arguments A and C and a
// constant d ≥ 0, so that A ≥ B wherever C ≥ 0, as every factorial's
// argument is where the value is defined (n of C(n, k) before k and
// n − k). A caller that keeps A below its first bad value keeps B below
// it too.
func dominated(weak []WeakPoint, i int) bool {
	b, ok := weak[i].Arg.Affine(nil)
	if !ok {
		return false
	}
	for j := range weak {
		a, ok := weak[j].Arg.Affine(nil)
		if j == i || !ok || weak[j].Bad != weak[i].Bad {
			continue
		}
		for k := range weak {
			c, ok := weak[k].Arg.Affine(nil)
			if k == i || k == j || !ok {
				continue
			}
			d := a.Sub(b).Sub(c)
			if v, ok := d.At(nil); ok && d.IsConst() && v.Sign() >= 0 {
				return true
			}
		}
	}
	return false
}

// knownInput is parameter p, wrong from at on.
func knownInput(p int, name string, at *big.Rat) WrongInput {
	return WrongInput{Param: p, Name: name, Known: true, From: ceilRat(at), Bad: at.RatString()}
}

// ceilRat returns ⌈r⌉, saturated to int64.
func ceilRat(r *big.Rat) int64 {
	q, m := new(big.Int).DivMod(r.Num(), r.Denom(), new(big.Int))
	if m.Sign() != 0 {
		q.Add(q, big.NewInt(1))
	}
	if !q.IsInt64() {
		if q.Sign() < 0 {
			return math.MinInt64
		}
		return math.MaxInt64
	}
	return q.Int64()
}

// paramInput maps arg ≥ bad to the parameter arg is an affine form of,
// k·p + c with k > 0, when the function never assigns p.
func (fc *fnCtx) paramInput(arg ast.Expr, bad *big.Rat) (WrongInput, bool) {
	lin, ok := fc.linear(arg)
	if !ok || len(lin.Terms) != 1 || lin.Terms[0].K <= 0 {
		return WrongInput{}, false
	}
	v := lin.Terms[0].Sym.Object
	i, isP := fc.paramIndex(v)
	if !isP || i < 0 || fc.assignsVar(v) {
		return WrongInput{}, false
	}
	at := new(big.Rat).Sub(bad, big.NewRat(lin.C, 1))
	at.Quo(at, big.NewRat(lin.Terms[0].K, 1))
	return knownInput(i, v.Name(), at), true
}

// unknownInputs are the parameters of deps with no threshold known.
func (fc *fnCtx) unknownInputs(deps map[types.Object]bool) []WrongInput {
	var out []WrongInput
	for v := range deps {
		i, ok := fc.paramIndex(v)
		if !ok {
			continue
		}
		// With no threshold, only a count (an integer) or the receiver
		// is a way in a caller's range can rule out: no range is known
		// of a float, and every float argument would be open.
		if t, num := fc.c.numOf(v.Type()); i >= 0 && (!num || t.Float) {
			continue
		}
		out = append(out, WrongInput{Param: i, Name: v.Name()})
	}
	sort.Slice(out, func(a, b int) bool { return out[a].Param < out[b].Param })
	return out
}

// floatInputs are the float parameters of deps with no threshold known,
// for a function that is wrong through their large magnitudes alone
// (finding.floatWay). A caller passes such a parameter a float whose
// range is not known; judgeWrongArg takes one the caller compares
// anywhere as bounded by it.
func (fc *fnCtx) floatInputs(deps map[types.Object]bool) []WrongInput {
	var out []WrongInput
	for v := range deps {
		i, ok := fc.paramIndex(v)
		if t, num := fc.c.numOf(v.Type()); ok && i >= 0 && num && t.Float {
			out = append(out, WrongInput{Param: i, Name: v.Name()})
		}
	}
	sort.Slice(out, func(a, b int) bool { return out[a].Param < out[b].Param })
	return out
}

// comparesAny reports whether the function compares a variable that e
// reads, anywhere in its body.
func (fc *fnCtx) comparesAny(e ast.Expr) bool {
	info := fc.c.pass.TypesInfo
	vars := make(map[types.Object]bool)
	ast.Inspect(e, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok {
			if v, ok := info.Uses[id].(*types.Var); ok {
				vars[v] = true
			}
		}
		return true
	})
	found := false
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		b, ok := n.(*ast.BinaryExpr)
		if !ok || found {
			return !found
		}
		switch b.Op {
		case token.EQL, token.NEQ, token.LSS, token.LEQ, token.GTR, token.GEQ:
			ast.Inspect(b, func(m ast.Node) bool {
				if id, ok := m.(*ast.Ident); ok && vars[info.Uses[id]] {
					found = true
				}
				return !found
			})
		}
		return !found
	})
	return found
}

// mergeInputs adds b to a: per parameter the lowest threshold, and no
// threshold where one way in has none.
func mergeInputs(a, b []WrongInput) []WrongInput {
	for _, in := range b {
		found := false
		for i := range a {
			if a[i].Param != in.Param {
				continue
			}
			found = true
			switch {
			case !a[i].Known:
			case !in.Known || in.From < a[i].From:
				a[i] = in
			}
		}
		if !found {
			a = append(a, in)
		}
	}
	return a
}

// paramIndex returns the index of v among the function's parameters, −1
// for its receiver.
func (fc *fnCtx) paramIndex(v types.Object) (int, bool) {
	sig := fc.signature()
	if sig == nil || v == nil {
		return 0, false
	}
	if r := sig.Recv(); r != nil && r == v {
		return -1, true
	}
	for i := 0; i < sig.Params().Len(); i++ {
		if sig.Params().At(i) == v {
			return i, true
		}
	}
	return 0, false
}

// assignsVar reports whether the function changes v anywhere.
func (fc *fnCtx) assignsVar(v types.Object) bool { return len(fc.defsOf(v)) > 0 }

// paramDeps returns the parameters (and receiver) whose values reach e,
// through the locals it reads and every value they are given.
func (fc *fnCtx) paramDeps(e ast.Node) map[types.Object]bool {
	flows := peekState(fc, wrongFlowKey)
	if flows == nil {
		flows = stateOf(fc, wrongFlowKey)
		flows.from = localFlows(fc.c.pass.TypesInfo, funcBody(fc.node))
	}
	out := make(map[types.Object]bool)
	seen := make(map[types.Object]bool)
	var visit func(n ast.Node)
	visit = func(n ast.Node) {
		ast.Inspect(n, func(n ast.Node) bool {
			id, ok := n.(*ast.Ident)
			if !ok {
				return true
			}
			v, ok := fc.c.pass.TypesInfo.Uses[id].(*types.Var)
			if !ok || seen[v] {
				return true
			}
			seen[v] = true
			if _, isP := fc.paramIndex(v); isP {
				out[v] = true
			}
			for _, src := range flows.from[v] {
				visit(src)
			}
			return true
		})
	}
	visit(e)
	return out
}

// wrongFlow holds, per local variable of a function, every expression
// whose value flows into it (assignments, operator assignments, the
// collection a range statement ranges over).
type wrongFlow struct {
	from map[types.Object][]ast.Node
}

var wrongFlowKey = &stateKey[wrongFlow]{"value flows"}

func localFlows(info *types.Info, body *ast.BlockStmt) map[types.Object][]ast.Node {
	out := make(map[types.Object][]ast.Node)
	add := func(lhs ast.Expr, rhs ast.Node) {
		if id, ok := ast.Unparen(lhs).(*ast.Ident); ok {
			if v := info.ObjectOf(id); v != nil {
				out[v] = append(out[v], rhs)
			}
		}
	}
	if body == nil {
		return out
	}
	ast.Inspect(body, func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.AssignStmt:
			for i, l := range n.Lhs {
				if len(n.Rhs) == len(n.Lhs) {
					add(l, n.Rhs[i])
				} else if len(n.Rhs) == 1 {
					add(l, n.Rhs[0])
				}
			}
		case *ast.ValueSpec:
			for i, name := range n.Names {
				if len(n.Values) == len(n.Names) {
					add(name, n.Values[i])
				}
			}
		case *ast.RangeStmt:
			for _, kv := range []ast.Expr{n.Key, n.Value} {
				if kv != nil {
					add(kv, n.X)
				}
			}
		case *ast.ForStmt:
			// A counter takes the values its condition lets through.
			if init, ok := n.Init.(*ast.AssignStmt); ok && n.Cond != nil {
				for _, l := range init.Lhs {
					add(l, n.Cond)
				}
			}
		}
		return true
	})
	return out
}

// shortPos renders pos as "pkg/file.go:line".
func (c *checker) shortPos(pos token.Pos) string {
	p := c.pass.Fset.Position(pos)
	return fmt.Sprintf("%s/%s:%d", path.Base(c.pass.Pkg.Path()), filepath.Base(p.Filename), p.Line)
}

// numericResult reports whether sig's first result is numeric, as a
// fact's function must be (MayCarryFacts).
func numericResult(sig *types.Signature) bool {
	if sig == nil || sig.Results().Len() == 0 || sig.Results().Len() > 2 {
		return false
	}
	b, ok := sig.Results().At(0).Type().Underlying().(*types.Basic)
	return ok && b.Info()&types.IsNumeric != 0
}

// tableResult reports whether sig's first result is a slice or array of
// numbers, or of such slices (a two-dimensional table: Stirling numbers
// by row, a matrix of score probabilities), a table of counts or of
// probabilities its callers read entry by entry or row by row. Only a
// one-dimensional table of float64 or float32 carries its fact out of
// the package (floatTable): MayCarryFacts, which decides what the driver
// analyses of a dependency, looks for numeric results and those.
func tableResult(sig *types.Signature) bool {
	if sig == nil || sig.Results().Len() == 0 || sig.Results().Len() > 2 {
		return false
	}
	elem := elemOf(sig.Results().At(0).Type().Underlying())
	if elem == nil {
		return false
	}
	if row := elemOf(elem.Underlying()); row != nil {
		elem = row // an entry t[i][j] of a table of rows
	}
	b, ok := elem.Underlying().(*types.Basic)
	return ok && b.Info()&types.IsNumeric != 0 && b.Info()&types.IsComplex == 0
}

// elemOf returns the element type of a slice or array type t, nil for
// any other type.
func elemOf(t types.Type) types.Type {
	switch t := t.(type) {
	case *types.Slice:
		return t.Elem()
	case *types.Array:
		return t.Elem()
	}
	return nil
}

// floatTable reports whether sig's first result is a slice or array of
// float64 or float32 themselves (no named type), a distribution: the
// one kind of table whose fact leaves the package, as MayCarryFacts
// predicts from the result's syntax.
func floatTable(sig *types.Signature) bool {
	if !tableResult(sig) {
		return false
	}
	// The result's own type, not its underlying one: a named slice type
	// is no []float64 written out.
	b, ok := elemOf(sig.Results().At(0).Type()).(*types.Basic)
	return ok && (b.Kind() == types.Float64 || b.Kind() == types.Float32)
}

// intResult reports whether fn's first result is an integer.
func intResult(fn *types.Func) bool {
	sig, _ := fn.Type().(*types.Signature)
	if sig == nil || sig.Results().Len() == 0 {
		return false
	}
	b, ok := sig.Results().At(0).Type().Underlying().(*types.Basic)
	return ok && b.Info()&types.IsInteger != 0
}

// wrongFactOf returns the WrongValueFact of fn, from this package or an
// imported one.
func (c *checker) wrongFactOf(fn *types.Func) *WrongValueFact {
	if fn == nil {
		return nil
	}
	if fn.Pkg() != c.pass.Pkg {
		f := new(WrongValueFact)
		if fn.Pkg() != nil && c.pass.ImportObjectFact(fn, f) {
			return f
		}
		return nil
	}
	return passStateOf(c, wrongPassKey).facts[fn]
}

// checkWrongCallers reports, after every other finding of the pass, the
// functions that return a wrong callee's value, until no new one is
// found (a caller reported here may be another's wrong callee), and
// exports the facts.
func (c *checker) checkWrongCallers() {
	st := passStateOf(c, wrongPassKey)
	done := make(map[*ast.FuncDecl]bool)
	for changed := true; changed; {
		changed = false
		for _, n := range c.allFuncs {
			d, ok := n.(*ast.FuncDecl)
			if !ok || d.Body == nil || done[d] {
				continue
			}
			fn := c.declObj(d)
			if fn == nil || c.wrongFactOf(fn) != nil || c.funcs[fn] != nil || c.reportedWithin(d) {
				done[d] = true
				continue
			}
			c.guard(d, func() {
				if c.ctx(d).checkWrongCalls(fn) {
					done[d], changed = true, true
				}
			})
		}
	}
	// Only another package's callers need the fact, and they can call
	// only the exported functions.
	for fn, f := range st.facts {
		if sig, _ := fn.Type().(*types.Signature); fn.Exported() && (numericResult(sig) || floatTable(sig)) {
			c.pass.ExportObjectFact(fn, f)
		}
	}
}

// checkWrongCalls reports the first call in fn's body whose wrong value
// reaches fn's result for arguments the function does not rule out.
func (fc *fnCtx) checkWrongCalls(fn *types.Func) bool {
	c := fc.c
	if sig := fc.signature(); sig == nil || sig.Results().Len() == 0 {
		return false
	}
	var calls []*ast.CallExpr
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.FuncLit:
			return false
		case *ast.CallExpr:
			if callee := c.calleeOf(n); callee != nil && callee != fn && c.wrongFactOf(callee) != nil {
				calls = append(calls, n)
			}
		}
		return true
	})
	if len(calls) == 0 {
		return false
	}
	var flow *resultFlow
	for _, call := range calls {
		if c.consumed[call] {
			continue
		}
		callee := c.calleeOf(call)
		if c.neutralValue(callee) {
			continue
		}
		if flow == nil {
			flow = fc.resultFlow()
		}
		// A factorial function's callers are the factorial categories',
		// but for an integer one converted to float: the float result
		// holds the true value where the integer has wrapped.
		fact := c.wrongFactOf(callee)
		if fact.Leaves && !(intResult(callee) && flow.toFloat[call]) {
			continue
		}
		direct, reaches := flow.reaches(call)
		if !reaches || flow.tested(call) {
			continue
		}
		in, j, r, open := fc.openInput(call, fact)
		if !open {
			continue
		}
		fc.reportWrongCall(fn, call, callee, fact, in, j, r, direct)
		return true
	}
	return false
}

// openInput returns the first of fact's inputs that the call's
// arguments do not rule out, with the judgement of its argument.
func (fc *fnCtx) openInput(call *ast.CallExpr, fact *WrongValueFact) (WrongInput, judgement, ast.Expr, bool) {
	for _, in := range fact.Inputs {
		arg := wrongArg(call, in.Param)
		if arg == nil {
			return in, judgement{}, nil, true // a receiver or argument not read: nothing rules it out
		}
		if j, ok := fc.judgeWrongArg(arg, in); ok {
			return in, j, arg, true
		}
	}
	return WrongInput{}, judgement{}, nil, false
}

// wrongArg returns the expression a call passes for parameter p (the
// receiver for −1), or nil when it has none of its own.
func wrongArg(call *ast.CallExpr, p int) ast.Expr {
	if p < 0 {
		if sel, ok := ast.Unparen(call.Fun).(*ast.SelectorExpr); ok {
			return sel.X
		}
		return nil
	}
	if call.Ellipsis.IsValid() || p >= len(call.Args) {
		return nil
	}
	return call.Args[p]
}

// judgeWrongArg judges arg against in; false when the argument rules the
// input out.
func (fc *fnCtx) judgeWrongArg(arg ast.Expr, in WrongInput) (judgement, bool) {
	if v, ok := fc.floatConst(arg); ok {
		if !in.Known {
			return judgement{}, false // a constant: no threshold to hold it against
		}
		bad, _ := parseRat(in.Bad)
		if bad == nil || new(big.Rat).SetFloat64(v) == nil || new(big.Rat).SetFloat64(v).Cmp(bad) < 0 {
			return judgement{}, false
		}
		return judgement{definite: true}, true
	}
	r := ranges.Top()
	inner := fc.stripConv(arg)
	t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(inner))
	if ok && !t.Float {
		r = fc.rangeOf(inner)
	}
	if ok && t.Float && !in.Known && fc.comparesAny(arg) {
		return judgement{}, false // no float ranges: a guard on it may bound it
	}
	if !in.Known {
		if r.IsEmpty() || !typeLimit(r.Hi) {
			return judgement{}, false // bounded by the caller: no threshold says it is wrong there
		}
		clause, _ := verdict(shownName(arg), r, math.MaxInt64)
		return judgement{clause: clause}, true
	}
	j := decide(arg, r, in.From)
	return j, !j.silent
}

// reportWrongCall reports fn at call and gives fn its fact.
func (fc *fnCtx) reportWrongCall(fn *types.Func, call *ast.CallExpr, callee *types.Func, fact *WrongValueFact, in WrongInput, j judgement, arg ast.Expr, direct bool) {
	c := fc.c
	where := "for some inputs"
	if in.Known {
		where = fmt.Sprintf("from %s = %d", in.Name, in.From)
	} else if in.Param >= 0 {
		where = fmt.Sprintf("for some values of %s", in.Name)
	}
	origin := "reported at " + fact.At
	if fact.Root != callee.Name() {
		origin = fmt.Sprintf("through %s, reported at %s", fact.Root, fact.At)
	}
	verbPart := fmt.Sprintf("%s returns %s's value", fn.Name(), src(call))
	if !direct {
		verbPart = fmt.Sprintf("%s builds its result from %s", fn.Name(), src(call))
	}
	clause := j.clause
	if name := shownName(arg); name != "" && name != in.Name && clause != "" {
		// "; total is not bounded here" names the caller's argument:
		// say which of the callee's parameters it is.
		clause = strings.Replace(clause, name, fmt.Sprintf("%s, passed as %s,", name, in.Name), 1)
	}
	if arg == nil && in.Param < 0 {
		clause = "; the receiver's fields are not bounded here"
	}
	fc.report(finding{
		node:     call,
		cat:      catWrongCallee,
		definite: j.definite && in.Known,
		msg:      fmt.Sprintf("%s, which is wrong %s (%s)%s", verbPart, where, origin, clause),
		related:  c.relatedDef(callee.Name(), callee.Pos()),
	})
	if !c.reported[reportKey{call.Pos(), catWrongCallee}] && !c.reported[reportKey{call.Pos(), catWrongCallee + definiteSuffix}] {
		return // silenced by a directive: its callers are silent too
	}
	inputs := fc.carriedInputs(call, in, arg)
	if len(inputs) == 0 || !numericResult(fc.signature()) && !tableResult(fc.signature()) {
		return
	}
	st := passStateOf(c, wrongPassKey)
	if st.facts == nil {
		st.facts = make(map[*types.Func]*WrongValueFact)
	}
	st.facts[fn] = &WrongValueFact{Root: fact.Root, At: fact.At, Inputs: inputs}
}

// checkWrongCallers marks a reported caller done whether or not it gets
// a fact; only a numeric result carries one (MayCarryFacts).

// carriedInputs carries the callee's input in, reached through arg, to
// the caller's parameters.
func (fc *fnCtx) carriedInputs(call *ast.CallExpr, in WrongInput, arg ast.Expr) []WrongInput {
	if arg == nil {
		return fc.unknownInputs(fc.paramDeps(call))
	}
	if in.Known {
		if bad, ok := parseRat(in.Bad); ok {
			if out, ok := fc.paramInput(arg, bad); ok {
				return []WrongInput{out}
			}
		}
	}
	if out := fc.unknownInputs(fc.paramDeps(arg)); len(out) > 0 {
		return out
	}
	if t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(fc.stripConv(arg))); ok && t.Float && !in.Known {
		// A float way in stays one: the caller is wrong through the
		// float parameters the argument reads.
		return fc.floatInputs(fc.paramDeps(arg))
	}
	return nil
}

// resultFlow answers whether a value reaches a function's result: the
// locals that carry a call's value (assigned, summed, multiplied into),
// found once per function.
type resultFlow struct {
	fc   *fnCtx
	body *ast.BlockStmt
	// rets are the returned expressions; named are the named results
	// that a bare return returns.
	rets  []ast.Expr
	named map[types.Object]bool
	// toFloat holds the calls converted to a float type as they are.
	toFloat map[*ast.CallExpr]bool
}

func (fc *fnCtx) resultFlow() *resultFlow {
	f := &resultFlow{fc: fc, body: funcBody(fc.node), named: make(map[types.Object]bool), toFloat: make(map[*ast.CallExpr]bool)}
	bare := false
	ast.Inspect(f.body, func(n ast.Node) bool {
		if _, ok := n.(*ast.FuncLit); ok {
			return false
		}
		if conv, ok := n.(*ast.CallExpr); ok && len(conv.Args) == 1 && fc.isConversion(conv) {
			t, num := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(conv))
			if inner, ok := ast.Unparen(conv.Args[0]).(*ast.CallExpr); ok && num && t.Float {
				f.toFloat[inner] = true
			}
		}
		if r, ok := n.(*ast.ReturnStmt); ok {
			f.rets = append(f.rets, r.Results...)
			bare = bare || len(r.Results) == 0
		}
		return true
	})
	if sig := fc.signature(); bare && sig != nil {
		for i := 0; i < sig.Results().Len(); i++ {
			f.named[sig.Results().At(i)] = true
		}
	}
	return f
}

// carriers returns the locals that carry call's value: assigned from an
// expression that carries it, or updated by one (s += v, s *= v).
func (f *resultFlow) carriers(call *ast.CallExpr) map[types.Object]bool {
	info := f.fc.c.pass.TypesInfo
	vars := make(map[types.Object]bool)
	for changed := true; changed; {
		changed = false
		ast.Inspect(f.body, func(n ast.Node) bool {
			if _, ok := n.(*ast.FuncLit); ok {
				return false
			}
			// A field's or an element's store, out.X += v or p[n] = v,
			// carries the value into out or p.
			lhs, rhs := assignedPairs(n)
			if len(rhs) == 1 && len(lhs) == 2 {
				// p, err := s.Distribution(): the value is the first.
				if _, ok := ast.Unparen(rhs[0]).(*ast.CallExpr); ok {
					lhs = lhs[:1]
				}
			}
			if len(lhs) != len(rhs) {
				return true
			}
			for i, l := range lhs {
				id, ok := storedRoot(l)
				if !ok {
					continue
				}
				v := info.ObjectOf(id)
				if v != nil && !vars[v] && f.carries(rhs[i], call, vars) {
					vars[v], changed = true, true
				}
			}
			return true
		})
	}
	return vars
}

// assignedPairs returns the left and right sides of an assignment or a
// variable declaration, and the value of a range statement with the
// collection it ranges over (an entry of a carried table carries it);
// nil for any other node.
func assignedPairs(n ast.Node) (lhs, rhs []ast.Expr) {
	switch n := n.(type) {
	case *ast.RangeStmt:
		if n.Value != nil {
			return []ast.Expr{n.Value}, []ast.Expr{&ast.IndexExpr{X: n.X}}
		}
	case *ast.AssignStmt:
		return n.Lhs, n.Rhs
	case *ast.ValueSpec:
		for _, name := range n.Names {
			lhs = append(lhs, name)
		}
		return lhs, n.Values
	}
	return nil, nil
}

// carries reports whether e's value is call's, or built from it (or
// from a carrier) by arithmetic that keeps a wrong value wrong: sums,
// differences, products, quotients, negation, conversions, square roots,
// absolute values, logarithms (one to one, so a wrong value stays
// wrong) and entries of a carried table.
func (f *resultFlow) carries(e ast.Expr, call *ast.CallExpr, vars map[types.Object]bool) bool {
	c := f.fc.c
	switch e := ast.Unparen(e).(type) {
	case *ast.CallExpr:
		if e == call {
			return true
		}
		if f.fc.isConversion(e) || c.isMathFunc(e, "Sqrt") || c.isMathFunc(e, "Abs") ||
			c.isMathFunc(e, "Log") || c.isMathFunc(e, "Log2") || c.isMathFunc(e, "Log10") {
			return len(e.Args) == 1 && f.carries(e.Args[0], call, vars)
		}
		return f.carriesFormatted(e, call, vars)
	case *ast.Ident:
		return vars[c.pass.TypesInfo.ObjectOf(e)]
	case *ast.IndexExpr:
		// An entry of a table of counts a call returned (tableResult).
		return f.carries(e.X, call, vars)
	case *ast.UnaryExpr:
		return (e.Op == token.SUB || e.Op == token.ADD) && f.carries(e.X, call, vars)
	case *ast.BinaryExpr:
		switch e.Op {
		case token.ADD, token.SUB, token.MUL, token.QUO:
			return f.carries(e.X, call, vars) || f.carries(e.Y, call, vars)
		}
	}
	return false
}

// selects reports whether body only stores values that carry call's.
func (f *resultFlow) selects(body *ast.BlockStmt, call *ast.CallExpr, vars map[types.Object]bool) bool {
	for _, s := range body.List {
		a, ok := s.(*ast.AssignStmt)
		if !ok || a.Tok != token.ASSIGN || len(a.Lhs) != len(a.Rhs) {
			return false
		}
		for _, r := range a.Rhs {
			if !f.carries(r, call, vars) {
				return false
			}
		}
	}
	return len(body.List) > 0
}

// reaches reports whether call's value reaches the result, and whether
// it is returned as it is.
func (f *resultFlow) reaches(call *ast.CallExpr) (direct, ok bool) {
	vars := f.carriers(call)
	for _, r := range f.rets {
		if ast.Unparen(r) == call {
			return true, true
		}
		if f.carries(r, call, vars) {
			ok = true
		}
	}
	for v := range f.named {
		ok = ok || vars[v]
	}
	return false, ok
}

// tested reports whether the function looks at call's value, or at a
// local that carries it, in a comparison or with math.IsInf or IsNaN:
// it may fall back where the value is wrong.
func (f *resultFlow) tested(call *ast.CallExpr) bool {
	c := f.fc.c
	vars := f.carriers(call)
	found := false
	ast.Inspect(f.body, func(n ast.Node) bool {
		if found {
			return false
		}
		switch n := n.(type) {
		case *ast.FuncLit:
			return false
		case *ast.IfStmt:
			if n.Else == nil && n.Init == nil && f.selects(n.Body, call, vars) {
				// if v < best { best = v }: a selection, which keeps a
				// wrong value as readily as a right one.
				return false
			}
		case *ast.BinaryExpr:
			switch n.Op {
			case token.EQL, token.NEQ, token.LSS, token.LEQ, token.GTR, token.GEQ:
				found = f.carries(n.X, call, vars) || f.carries(n.Y, call, vars)
			}
		case *ast.CallExpr:
			if (c.isMathFunc(n, "IsInf") || c.isMathFunc(n, "IsNaN")) && len(n.Args) > 0 {
				found = f.carries(n.Args[0], call, vars)
			}
		}
		return !found
	})
	return found
}
