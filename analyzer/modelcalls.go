package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"math"
	"math/big"
	"sort"

	"golang.org/x/tools/go/analysis"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/analyzer/thresholds"
	vm "github.com/overfact/overfact/analyzer/valuemodel"
	"github.com/overfact/overfact/internal/assigned"
	"github.com/overfact/overfact/internal/linform"
)

// callState is what the value model knows about the functions of the
// package as values of their parameters (ValueFact), found on demand
// once the factorial and binomial functions are known.
type callState struct {
	ready bool
	decls map[*types.Func]*ast.FuncDecl
	facts map[*types.Func]*ValueFact // nil value: looked at, no fact
	busy  map[*types.Func]bool
}

var callStateKey = &stateKey[callState]{"functions' values as values of their parameters"}

// findValueFacts exports a ValueFact for each function of decls whose
// result the value model names in terms of its parameters. It runs after
// the factorial and binomial functions are found, whose facts the model
// reads, and computes a callee's fact before its caller's, whatever
// their order in the source. Only functions whose scan saw a call the
// model may know (math.Gamma, Pow or Exp, a function with a fact, one of
// this package) or a product loop are evaluated.
func (c *checker) findValueFacts(decls []*ast.FuncDecl, scans map[ast.Node]*scan) {
	cs := passStateOf(c, callStateKey)
	*cs = callState{
		ready: true,
		decls: make(map[*types.Func]*ast.FuncDecl),
		facts: make(map[*types.Func]*ValueFact),
		busy:  make(map[*types.Func]bool),
	}
	for _, d := range decls {
		s := scans[d]
		if obj := c.declObj(d); obj != nil && s != nil && (s.knownCall || s.localCall || s.logCall || s.worthLoops()) {
			cs.decls[obj] = d
		}
	}
	for _, d := range decls {
		if obj := c.declObj(d); obj != nil && cs.decls[obj] != nil {
			c.guard(d, func() { c.valueFactOf(obj) })
		}
	}
}

// valueFactOf returns the ValueFact of fn, from this package (computed
// on first use) or an imported one; nil when there is none.
func (c *checker) valueFactOf(fn *types.Func) *ValueFact {
	if fn == nil {
		return nil
	}
	if fn.Pkg() != c.pass.Pkg {
		f := new(ValueFact)
		if fn.Pkg() != nil && fn.Pkg().Path() != "math" && c.pass.ImportObjectFact(fn, f) {
			return f
		}
		return nil
	}
	cs := passStateOf(c, callStateKey)
	if !cs.ready || cs.busy[fn] {
		return nil
	}
	if f, ok := cs.facts[fn]; ok {
		return f
	}
	d := cs.decls[fn]
	if d == nil {
		return nil
	}
	cs.busy[fn] = true
	var f *ValueFact
	func() {
		defer func() {
			// An internal failure costs this function its fact only.
			if r := recover(); r != nil {
				f = nil
				if debug {
					fmt.Fprintf(debugOut, "overfact: %s: no value fact after internal error: %v\n", c.pass.Fset.Position(d.Pos()), r)
				}
			}
		}()
		f = c.computeValueFact(d, fn)
	}()
	delete(cs.busy, fn)
	cs.facts[fn] = f
	if f != nil && fn.Exported() {
		// Only another package's code needs the fact encoded; this
		// package's callers read cs.facts.
		c.pass.ExportObjectFact(fn, f)
	}
	return f
}

// maxWeak caps the weak points one fact carries.
const maxWeak = 8

// computeValueFact names the value decl returns in terms of its
// parameters. Every return must give that value, but for returns of a
// constant or of math.Inf or math.NaN (edge cases and error values);
// the value must hold a Γ factor or rest on an intermediate that breaks.
func (c *checker) computeValueFact(d *ast.FuncDecl, fn *types.Func) *ValueFact {
	if c.funcs[fn] != nil || d.Body == nil {
		return nil // a factorial or binomial function has its own fact
	}
	sig := fn.Type().(*types.Signature)
	if sig.Results().Len() != 1 || sig.Params().Len() > len(placeholders) {
		return nil
	}
	t, ok := c.numOf(sig.Results().At(0).Type())
	if !ok {
		return nil
	}
	fc := c.ownCtx(d)
	res := fc.evalModel()
	if res.Capped {
		return nil
	}
	ps := make(paramSyms)
	for i := 0; i < sig.Params().Len(); i++ {
		ps[sig.Params().At(i)] = i
	}
	if r := sig.Recv(); r != nil && fc.stableVar(r) {
		ps[r] = recvParam // its fields, as a caller's receiver has them
	}
	// The value of each return but the edge cases; a return whose
	// value differs from the others' is allowed only as a table for
	// small inputs (tableBranch), and any return may be the formula.
	var all []ast.Expr
	type cand struct {
		t   *vm.Term
		log bool
	}
	var cands []cand
	valueOf := func(r ast.Expr) (*vm.Term, bool) {
		if v := res.Values[r]; v != nil {
			return v, false
		}
		return res.Logs[r], res.Logs[r] != nil
	}
	for _, r := range fc.modelRoots(res) {
		if c.edgeValue(r) {
			continue
		}
		all = append(all, r)
		if v, lg := valueOf(r); v != nil {
			known := false
			for _, x := range cands {
				known = known || x.log == lg && x.t.String() == v.String()
			}
			if !known {
				cands = append(cands, cand{v, lg})
			}
		}
	}
	if len(cands) == 0 || len(fc.returnsOutsideClosures()) != len(fc.modelRoots(res)) {
		return nil
	}
	var value *vm.Term
	var roots []ast.Expr
	var isLog bool
	var table *TableBranch
	var tableSym vm.Sym
	for _, x := range cands {
		var others []ast.Expr
		roots = roots[:0]
		for _, r := range all {
			if v, lg := valueOf(r); v != nil && lg == x.log && v.String() == x.t.String() {
				roots = append(roots, r)
			} else {
				others = append(others, r)
			}
		}
		if len(others) == 0 {
			value, isLog = x.t, x.log
			break
		}
		if sym, tb, ok := fc.tableBranch(res, others, x.t, t, ps); ok {
			value, isLog, table, tableSym = x.t, x.log, tb, sym
			break
		}
	}
	if value == nil {
		return nil
	}
	enc, ok := ps.encodeTerm(value)
	if !ok {
		return nil
	}
	f := &ValueFact{Value: enc, Log: isLog, Table: table}
	for _, r := range roots {
		if isLog {
			break // a logarithm leaves no type
		}
		for _, w := range fc.weakPoints(res, r, t) {
			if table != nil && !pastTable(w, tableSym, table.Max) {
				// The table's inputs are not described by the fact:
				// only a weak point past them is certain.
				continue
			}
			// A weak point must be reachable inside the function's own
			// guards and the domain of its value (SmallChoose's n ≤ 60
			// rules out k ≥ 171): whether the caller's value still fits
			// there is the caller's question.
			if len(f.Weak) >= maxWeak || !fc.weakReachable(res, r, w) {
				continue
			}
			if _, ok := fc.witness(res, r, value, w, t, false); !ok {
				continue
			}
			arg, ok := ps.encodeAffine(w.arg)
			if !ok {
				continue
			}
			f.Weak = appendWeak(f.Weak, WeakPoint{Arg: arg, Bad: ratText(w.bad), What: w.what, Gamma: w.gamma, Wraps: w.wraps})
		}
	}
	// A value with no variable, or with no Γ factor and no intermediate
	// that breaks, tells a caller nothing the calls themselves do not.
	// Without a weak point the fact still tells what the function
	// returns, a logarithm or a value formed as one quantity in a float
	// type (exp of log-gamma differences), which is +Inf exactly where
	// it leaves the type: a caller that multiplies it by powers that
	// underflow, or divides a count by it, is judged by that value.
	if _, isConst := value.IsConst(); isConst || len(termSyms(value, vm.Int(0))) == 0 {
		return nil
	}
	// A logarithm of a product of Γ values (ln B(a, b) summed from
	// log-gamma values) is worth a fact too: the digits its sum loses
	// are judged where a caller exponentiates it (lgammadigits.go).
	if len(f.Weak) == 0 && !fc.formedValue(res, roots, value, isLog, t) && !(isLog && len(value.Gamma) >= 2) {
		if isLog || table != nil || !fc.runningValue(res, roots, value, t) {
			return nil
		}
		f.Running = true
	}
	return f
}

// formedValue reports whether a value without weak points is worth a
// fact: a binomial coefficient (the one form callers read from it,
// modelPMF and modelCountRatio), in a float type or as its logarithm,
// formed as one quantity at every root (exp of a log value, or the call
// of another such function), and returned where n reaches the first
// central coefficient that leaves the type, so that it breaks only
// there and the function's own guards and edge returns do not keep it
// below (an n ≤ 60 guard that returns NaN above).
func (fc *fnCtx) formedValue(res *vm.Result, roots []ast.Expr, value *vm.Term, isLog bool, t numType) bool {
	form := vm.Recognise(value)
	if form.Kind != vm.Binomial || !t.Float {
		return false
	}
	// A logarithm is judged where its callers exponentiate it, in its
	// own float type.
	first := thresholds.CentralBinomial(t.Num).FirstBad
	for _, r := range roots {
		if !fc.reaches(res, form.Args[0], r, first) {
			return false
		}
		if isLog {
			continue
		}
		call, ok := fc.stripConv(r).(*ast.CallExpr)
		if !ok {
			return false
		}
		if fc.c.isMathFunc(call, "Exp") && len(call.Args) == 1 && res.Logs[call.Args[0]] != nil {
			continue
		}
		if !fc.formedCall(call) {
			return false
		}
	}
	return true
}

// runningValue reports whether every root returns the accumulator of a
// loop, a running product, whose value is a binomial coefficient in a
// float type, and n can reach the first central coefficient that leaves
// the type there (ValueFact.Running).
func (fc *fnCtx) runningValue(res *vm.Result, roots []ast.Expr, value *vm.Term, t numType) bool {
	form := vm.Recognise(value)
	if form.Kind != vm.Binomial || !t.Float {
		return false
	}
	first := thresholds.CentralBinomial(t.Num).FirstBad
	for _, r := range roots {
		obj := fc.c.objOf(fc.stripConv(r))
		acc := false
		for _, l := range res.Loops {
			for _, a := range l.Accs {
				acc = acc || obj != nil && a.Obj == obj && len(a.Ops) > 0 && !l.Exits
			}
		}
		if !acc || !fc.reaches(res, form.Args[0], r, first) {
			return false
		}
	}
	return len(roots) > 0
}

// reaches reports whether the affine form a can be at least first at
// r, as far as its variables' ranges there tell: a variable with a
// positive coefficient and no upper bound, or the largest value of a
// past first.
func (fc *fnCtx) reaches(res *vm.Result, a vm.Affine, r ast.Node, first int64) bool {
	top := new(big.Rat)
	if a.C != nil {
		top.Set(a.C)
	}
	for _, l := range a.Terms {
		rg := fc.symRange(res, l.Sym, r)
		if rg.IsEmpty() {
			return false
		}
		end := rg.Hi
		if l.K.Sign() < 0 {
			end = rg.Lo
		}
		if end == math.MaxInt64 && l.K.Sign() > 0 {
			return true
		}
		if end == math.MinInt64 || end == math.MaxInt64 {
			return l.K.Sign() < 0 && end == math.MinInt64
		}
		top.Add(top, new(big.Rat).Mul(l.K, big.NewRat(end, 1)))
	}
	return top.Cmp(big.NewRat(first, 1)) >= 0
}

// tableBranch accepts returns whose value the model does not know or
// that differ from value, where each runs only for small inputs: a
// parameter n of value's form (C(n, k), n!, a falling factorial) is at
// most a constant there at which the form still fits t, so the function
// returns value, the formula, wherever value leaves t. Sound for a
// caller because every judgment of a value fact is made where the value
// or one of its weak points breaks, which needs n past that constant,
// outside the table's branch; a weak point that does not put n past it
// is dropped. It returns n and the bound.
func (fc *fnCtx) tableBranch(res *vm.Result, others []ast.Expr, value *vm.Term, t numType, ps paramSyms) (vm.Sym, *TableBranch, bool) {
	form := vm.Recognise(value)
	var limit int64
	switch form.Kind {
	case vm.Binomial:
		limit = thresholds.CentralBinomial(t.Num).FirstBad
	case vm.Fact, vm.Falling:
		limit = thresholds.Factorial(t.Num).FirstBad
	default:
		return vm.Sym{}, nil, false
	}
	n, alpha, beta, ok := oneVar(form.Args[0])
	idx, isParam := ps[n.Obj]
	if !ok || !isParam || idx == recvParam || n.Field != nil || n.Loop != nil || alpha.Sign() <= 0 {
		return vm.Sym{}, nil, false
	}
	var hi int64 = math.MinInt64
	for _, r := range others {
		rg := fc.symRange(res, n, r)
		if rg.IsEmpty() {
			continue // a return that never runs
		}
		if rg.Hi == math.MaxInt64 {
			return vm.Sym{}, nil, false
		}
		hi = max(hi, rg.Hi)
	}
	// The largest argument of the form inside the table's branches.
	top := new(big.Rat).Add(new(big.Rat).Mul(alpha, big.NewRat(hi, 1)), beta)
	if hi == math.MinInt64 || top.Cmp(big.NewRat(limit, 1)) >= 0 {
		return vm.Sym{}, nil, false
	}
	return n, &TableBranch{Param: idx, Max: hi}, true
}

// pastTable reports whether w breaks only with n past the table's
// bound: its argument is n itself (plus a constant) with the first bad
// n above max.
func pastTable(w weak, n vm.Sym, max int64) bool {
	v, alpha, beta, ok := oneVar(w.arg)
	if !ok || v != n {
		return false
	}
	first, ok := firstAtRat(alpha, beta, w.bad)
	return ok && first > max
}

func appendWeak(ws []WeakPoint, w WeakPoint) []WeakPoint {
	for _, x := range ws {
		if fmt.Sprint(x) == fmt.Sprint(w) {
			return ws
		}
	}
	return append(ws, w)
}

// returnsOutsideClosures counts the return statements of the function
// itself.
func (fc *fnCtx) returnsOutsideClosures() []*ast.ReturnStmt {
	var out []*ast.ReturnStmt
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.FuncLit:
			return false
		case *ast.ReturnStmt:
			out = append(out, n)
		}
		return true
	})
	return out
}

// edgeValue reports whether e is a constant or math.Inf or math.NaN: a
// value for an edge case or an error, not the function's computation.
func (c *checker) edgeValue(e ast.Expr) bool {
	e = ast.Unparen(e)
	if tv, ok := c.pass.TypesInfo.Types[e]; ok && tv.Value != nil {
		return true
	}
	if call, ok := e.(*ast.CallExpr); ok {
		if tv, ok := c.pass.TypesInfo.Types[call.Fun]; ok && tv.IsType() && len(call.Args) == 1 {
			return c.edgeValue(call.Args[0])
		}
		return c.isMathFunc(call, "Inf") || c.isMathFunc(call, "NaN")
	}
	return false
}

// valueCallee gives the value of a call of a function with a ValueFact,
// its parameters replaced by the arguments' values.
func (fc *fnCtx) valueCallee(call *ast.CallExpr, args []*vm.Term) *vm.Term {
	f := fc.c.valueFactOf(fc.c.calleeOf(call))
	if f == nil || f.Log {
		return nil
	}
	return f.Value.Term(fc.factArgsOf(call, affineArgs(args)))
}

// logCallee gives t for a call of a function whose ValueFact says it
// returns ln t, its parameters replaced by the arguments' values.
func (fc *fnCtx) logCallee(call *ast.CallExpr, args []*vm.Term) *vm.Term {
	f := fc.c.valueFactOf(fc.c.calleeOf(call))
	if f == nil || !f.Log {
		return nil
	}
	return f.Value.Term(fc.factArgsOf(call, affineArgs(args)))
}

// formedCall reports whether call calls a function whose ValueFact is a
// binomial formed as one quantity, with no weak point of its own (exp
// of log-gamma differences in another function), or its logarithm.
func (fc *fnCtx) formedCall(call *ast.CallExpr) bool {
	f := fc.c.valueFactOf(fc.c.calleeOf(call))
	return f != nil && len(f.Weak) == 0 && !f.Running
}

// affineArgs returns the arguments that are affine forms; the others
// are the zero Affine, which a fact refuses to substitute.
func affineArgs(args []*vm.Term) []vm.Affine {
	out := make([]vm.Affine, len(args))
	for i, a := range args {
		if x, ok := a.Affine(); ok {
			out[i] = x
		}
	}
	return out
}

// factArgsOf returns what a fact's variables are at call: the
// arguments' values, and the fields of the receiver where call is a
// method call on a variable that keeps its value in the caller (a
// parameter or receiver never assigned), read as the caller's own
// model reads them (vm.Sym{Obj: receiver, Field: field}).
func (fc *fnCtx) factArgsOf(call *ast.CallExpr, params []vm.Affine) *factArgs {
	out := &factArgs{params: params}
	c := fc.c
	sel, ok := ast.Unparen(call.Fun).(*ast.SelectorExpr)
	if !ok {
		return out
	}
	s := c.pass.TypesInfo.Selections[sel]
	fn := c.calleeOf(call)
	id, isIdent := ast.Unparen(sel.X).(*ast.Ident)
	if s == nil || s.Kind() != types.MethodVal || fn == nil || !isIdent {
		return out
	}
	base := c.pass.TypesInfo.Uses[id]
	if base == nil || !fc.stableVar(base) {
		return out
	}
	typ := c.pass.TypesInfo.TypeOf(sel.X)
	out.recv = func(name string) (vm.Affine, bool) {
		obj, index, _ := types.LookupFieldOrMethod(typ, true, fn.Pkg(), name)
		f, ok := obj.(*types.Var)
		if !ok || !f.IsField() || len(index) != 1 {
			return vm.Affine{}, false
		}
		return vm.Var(vm.Sym{Obj: base, Field: f}), true
	}
	return out
}

// stableVar reports whether v is a parameter or the receiver of the
// function (not a closure's) that no statement of it assigns, whose
// fields it assigns to nowhere and whose address it never takes: its
// fields hold at every call what they held at entry.
func (fc *fnCtx) stableVar(v types.Object) bool {
	d, ok := fc.node.(*ast.FuncDecl)
	if !ok || d.Body == nil {
		return false
	}
	declared := false
	for _, fl := range []*ast.FieldList{d.Recv, d.Type.Params} {
		if fl != nil && fl.Pos() <= v.Pos() && v.Pos() < fl.End() {
			declared = true
		}
	}
	if !declared {
		return false
	}
	changed := false
	assigned.EachTarget(d.Body, nil, func(e ast.Expr, _ ast.Node) bool {
		if id := assigned.Root(e); id != nil {
			changed = fc.c.pass.TypesInfo.Uses[id] == v
		}
		return !changed
	})
	return !changed
}

// weak is an intermediate of a root in the caller's variables: it is
// wrong once arg ≥ bad.
type weak struct {
	arg   vm.Affine
	bad   *big.Rat
	what  string   // the intermediate as the code writes it (a call)
	via   string   // the callee's own weak intermediate, when it is one
	call  ast.Expr // the call that holds it
	gamma bool
	wraps bool // an integer intermediate, which wraps
}

// weakPoints returns the intermediates of root that can break, in the
// order the code evaluates them: math.Gamma values, factorial calls, and
// the weak points of calls with a ValueFact, looking through locals
// defined once.
func (fc *fnCtx) weakPoints(res *vm.Result, root ast.Expr, t numType) []weak {
	var out []weak
	seen := make(map[ast.Node]bool)
	var walk func(e ast.Node, depth int)
	walk = func(e ast.Node, depth int) {
		if depth > maxDepth || seen[e] {
			return
		}
		seen[e] = true
		ast.Inspect(e, func(n ast.Node) bool {
			switch n := n.(type) {
			case *ast.FuncLit:
				return false
			case *ast.Ident:
				if def := fc.singleDef(n); def != nil {
					walk(def, depth+1)
				}
			case *ast.CallExpr:
				for _, a := range n.Args {
					walk(a, depth+1)
				}
				out = append(out, fc.callWeak(res, n)...)
				return false
			}
			return true
		})
	}
	walk(root, 0)
	return out
}

// callWeak returns the weak points of one call.
func (fc *fnCtx) callWeak(res *vm.Result, call *ast.CallExpr) []weak {
	c := fc.c
	argAffine := func(i int) (vm.Affine, bool) {
		if i < 0 || i >= len(call.Args) {
			return vm.Affine{}, false
		}
		return res.Values[call.Args[i]].Affine()
	}
	if c.isMathFunc(call, "Gamma") {
		t, ok := c.numOf(c.pass.TypesInfo.TypeOf(call))
		a, ok2 := argAffine(0)
		if !ok || !ok2 || !t.Float {
			return nil
		}
		bad, _ := new(big.Rat).SetString(fmt.Sprint(thresholds.GammaFirstBad(t.Num)))
		if bad == nil {
			return nil
		}
		return []weak{{arg: a, bad: bad, what: src(call), call: call, gamma: true}}
	}
	fn := c.calleeOf(call)
	if ff := c.factOf(fn); ff != nil {
		t, _ := c.numOf(c.pass.TypesInfo.TypeOf(call))
		if !ff.Safe && kindOfName(ff.Kind) == kindBinomial && t.Float && ff.FirstBad <= thresholds.Factorial(t.Num).FirstBad {
			// A float binomial function whose n! overflows is +Inf or
			// NaN from there on, whatever k.
			if a, ok := argAffine(ff.Param); ok {
				return []weak{{arg: a, bad: big.NewRat(ff.FirstBad, 1), what: src(call), via: src(call), call: call}}
			}
		}
		if ff.Safe || kindOfName(ff.Kind) != kindFactorial {
			return nil
		}
		a, ok := argAffine(ff.Param)
		if !ok {
			return nil
		}
		return []weak{{arg: a, bad: big.NewRat(ff.FirstBad, 1), what: src(call), call: call, wraps: !t.Float}}
	}
	vf := c.valueFactOf(fn)
	if vf == nil {
		return nil
	}
	args := make([]vm.Affine, len(call.Args))
	for i := range call.Args {
		args[i], _ = argAffine(i)
	}
	var out []weak
	fa := fc.factArgsOf(call, args)
	for _, w := range vf.Weak {
		a, ok := w.Arg.Affine(fa)
		bad, ok2 := parseRat(w.Bad)
		if !ok || !ok2 {
			continue
		}
		out = append(out, weak{arg: a, bad: bad, what: src(call), via: w.What, call: call, gamma: w.Gamma, wraps: w.Wraps})
	}
	return out
}

// weakReachable reports whether the variables of w can reach its bad
// value at root, as far as their ranges there tell.
func (fc *fnCtx) weakReachable(res *vm.Result, root ast.Expr, w weak) bool {
	v, alpha, beta, ok := oneVar(w.arg)
	if !ok {
		return !w.arg.IsConst() || w.arg.C.Cmp(w.bad) >= 0
	}
	first, ok := firstAtRat(alpha, beta, w.bad)
	if !ok {
		return true
	}
	r := fc.symRange(res, v, root)
	return !r.IsEmpty() && r.Hi >= first
}

// firstAtRat returns the smallest integer v with α·v + β ≥ bad, α > 0.
func firstAtRat(alpha, beta, bad *big.Rat) (int64, bool) {
	if alpha.Sign() <= 0 {
		return 0, false
	}
	// Integers of at most 2^40, the usual case (the witness search asks
	// this for every candidate point): ⌈(bad − β)/α⌉ in int64, exact,
	// without the rationals below.
	a, okA := smallWhole(alpha)
	b, okB := smallWhole(beta)
	c, okC := smallWhole(bad)
	if okA && okB && okC {
		num := c - b
		q := num / a
		if num%a != 0 && num > 0 {
			q++
		}
		return q, true
	}
	x := new(big.Rat).Sub(bad, beta)
	x.Quo(x, alpha)
	q := new(big.Int).Quo(x.Num(), x.Denom())
	if x.Sign() > 0 && !x.IsInt() {
		q.Add(q, big.NewInt(1))
	}
	if !q.IsInt64() {
		return 0, false
	}
	return q.Int64(), true
}

// smallWhole returns r as an int64 when it is an integer of at most
// 2^40 in size.
func smallWhole(r *big.Rat) (int64, bool) {
	if !r.IsInt() || !r.Num().IsInt64() {
		return 0, false
	}
	v := r.Num().Int64()
	return v, v >= -1<<40 && v <= 1<<40
}

// checkModelCalls reports, at each place where a function's whole value
// is known, a value that fits its type for some input at which an
// intermediate it relies on (a factorial or Γ value, or one inside a
// helper it calls) already breaks: binomial, hypergeometric and
// negative binomial probabilities over a binomial helper built from
// float factorials, ratios of factorial and Γ helpers.
func (fc *fnCtx) checkModelCalls(model func() *vm.Result) {
	fc.checkBinomialPartsLoops()
	fc.checkDividedOut()
	var res *vm.Result
	for _, root := range fc.callRoots() {
		fc.checkLoopMultinomial(root)
		fc.checkBinomialProduct(root)
		if res == nil {
			res = model()
		}
		fc.checkCallRoot(res, root)
	}
}

// callRoots returns the expressions whose value is whole: returned,
// assigned or passed to a function the model does not know, when the
// function's own arithmetic combines them (a product or a quotient) and
// one of their operands is a call the model knows through a fact. A
// call on its own is a root too where its function's value fact has
// intermediates that break (a pmf over a factorial helper summed or
// returned by its caller): the caller's value is wrong where its
// arguments reach them. Such a call assigned to a local is left to the
// product that reads the local, or to the code that tests the local
// for +Inf or NaN.
func (fc *fnCtx) callRoots() []ast.Expr {
	var out, calls []ast.Expr
	var lhsOf = make(map[ast.Expr]types.Object)
	c := fc.c
	add := func(e ast.Expr) {
		if call, ok := fc.stripConv(e).(*ast.CallExpr); ok {
			if f := c.valueFactOf(c.calleeOf(call)); f != nil && len(f.Weak) > 0 && !f.Log {
				calls = append(calls, e)
			}
			return
		}
		b, ok := fc.stripConv(e).(*ast.BinaryExpr)
		if !ok || b.Op != token.MUL && b.Op != token.QUO {
			return
		}
		known := false
		ast.Inspect(b, func(n ast.Node) bool {
			if call, ok := n.(*ast.CallExpr); ok && !known {
				fn := c.calleeOf(call)
				known = c.factOf(fn) != nil || c.valueFactOf(fn) != nil
			}
			_, lit := n.(*ast.FuncLit)
			return !known && !lit
		})
		if known {
			out = append(out, e)
		}
	}
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.FuncLit:
			return false
		case *ast.ReturnStmt:
			for _, r := range n.Results {
				add(r)
			}
		case *ast.AssignStmt:
			for i, r := range n.Rhs {
				if len(n.Lhs) == len(n.Rhs) {
					lhsOf[r] = c.objOf(n.Lhs[i])
				}
				add(r)
			}
		case *ast.ValueSpec:
			for i, r := range n.Values {
				if len(n.Names) == len(n.Values) {
					lhsOf[r] = c.pass.TypesInfo.Defs[n.Names[i]]
				}
				add(r)
			}
		case *ast.CallExpr:
			if tv, ok := c.pass.TypesInfo.Types[n.Fun]; ok && tv.IsType() {
				return true
			}
			fn := c.calleeOf(n)
			if fn != nil && fn.Pkg() != nil && fn.Pkg().Path() == "math" || c.factOf(fn) != nil || c.valueFactOf(fn) != nil {
				return true
			}
			for _, a := range n.Args {
				add(a)
			}
		}
		return true
	})
	for _, e := range calls {
		if v := lhsOf[e]; v != nil && (fc.readInRoots(v, out) || fc.testedNonFinite(v)) {
			continue
		}
		out = append(out, e)
	}
	return out
}

// readInRoots reports whether one of roots reads v.
func (fc *fnCtx) readInRoots(v types.Object, roots []ast.Expr) bool {
	for _, r := range roots {
		if mentions(fc.c.pass.TypesInfo, r, v) {
			return true
		}
	}
	return false
}

// reportedWithin reports whether a finding starts inside n.
func (c *checker) reportedWithin(n ast.Node) bool {
	return c.reportedIn(n.Pos(), n.End())
}

// reportedIn reports whether a finding starts in [pos, end).
func (c *checker) reportedIn(pos, end token.Pos) bool {
	at := c.reportedPos
	i := sort.Search(len(at), func(i int) bool { return at[i] >= pos })
	return i < len(at) && at[i] < end
}

// checkCallRoot judges one root.
func (fc *fnCtx) checkCallRoot(res *vm.Result, root ast.Expr) {
	c := fc.c
	val := res.Values[root]
	if val == nil || c.reportedWithin(root) || fc.checksNonFinite(root) {
		return
	}
	t, ok := c.numOf(c.pass.TypesInfo.TypeOf(root))
	if !ok {
		return
	}
	// Inside a loop, values are in the trip index: judge them in the
	// counter, whose range the range analysis knows.
	val = fc.tripsAsCountersTerm(res, val)
	for _, w := range fc.weakPoints(res, root, t) {
		w.arg = fc.tripsAsCounters(res, w.arg)
		if !fc.weakReachable(res, root, w) {
			continue
		}
		if _, ok := fc.witness(res, root, val, w, t, true); !ok {
			continue
		}
		fc.reportCallRoot(res, root, val, w, t)
		return
	}
}

// witnessHalf is the candidate ½ of a float variable in witness, never
// modified.
var witnessHalf = big.NewRat(1, 2)

// witnessBudget caps the points the witness search tries for one weak
// point.
const witnessBudget = 4096

// witness looks for a point, within the ranges the code allows at root,
// where w's intermediate has broken while the true value val lies inside
// t's range and every Γ argument and power base of val is positive: an
// input at which the code returns a wrong value although the right one
// fits. The variable of w's argument is solved for its first bad value;
// the others take small values (0, 1, 2, 3, 10, ½ for floats, and the
// ends of their ranges).
func (fc *fnCtx) witness(res *vm.Result, root ast.Expr, val *vm.Term, w weak, t numType, fit bool) (map[vm.Sym]*big.Rat, bool) {
	syms := termSyms(val, w.arg)
	if len(syms) > 7 {
		return nil, false
	}
	// The variable to solve for: the first of w's argument with a
	// positive coefficient.
	var solve *vm.Sym
	for _, l := range w.arg.Terms {
		if l.K.Sign() > 0 {
			s := l.Sym
			solve = &s
			break
		}
	}
	if solve == nil {
		return nil, false
	}
	rangeOf := make(map[vm.Sym]ranges.Interval)
	var others []vm.Sym
	cands := make(map[vm.Sym][]*big.Rat)
	for _, s := range syms {
		r := fc.symRange(res, s, root)
		if r.IsEmpty() {
			return nil, false
		}
		rangeOf[s] = r
		if s == *solve {
			continue
		}
		others = append(others, s)
		var cs []*big.Rat
		// Small values, and values past the bad one, for variables
		// that must exceed the one solved for (a population beside
		// its part).
		// The candidates are only read (the point's values are
		// evaluated, never changed): shared constants where they are
		// small, since the search runs for every weak point.
		try := []*big.Rat{linform.SharedInt(1), linform.SharedInt(2), linform.SharedInt(0), linform.SharedInt(3), linform.SharedInt(10)}
		if b := new(big.Int).Quo(w.bad.Num(), w.bad.Denom()); b.IsInt64() && b.Int64() < 1<<40 {
			try = append(try, linform.SharedInt(2*b.Int64()+2), linform.SharedInt(b.Int64()+1))
		}
		if symFloat(s) {
			try = append(try, witnessHalf)
		}
		if bounded(r) {
			try = append(try, linform.SharedInt(r.Lo), linform.SharedInt(r.Hi))
		}
		for _, x := range try {
			if inRange(r, x) {
				cs = append(cs, x)
			}
		}
		if len(cs) == 0 {
			return nil, false
		}
		cands[s] = cs
	}
	lo, hi := thresholds.LogRange(t.Num)
	margin := 1e-6 * math.Max(1, hi)
	if !fit {
		lo, hi, margin = math.Inf(-1), math.Inf(1), 0
	}
	point := make(map[vm.Sym]*big.Rat)
	idx := make([]int, len(others))
	for budget := 0; budget < witnessBudget; budget++ {
		for i, s := range others {
			point[s] = cands[s][idx[i]]
		}
		if fc.tryWitness(point, *solve, rangeOf[*solve], val, w, lo+margin, hi-margin) {
			return point, true
		}
		// The next combination.
		i := 0
		for ; i < len(idx); i++ {
			idx[i]++
			if idx[i] < len(cands[others[i]]) {
				break
			}
			idx[i] = 0
		}
		if i == len(idx) {
			break
		}
	}
	return nil, false
}

// tryWitness solves w's argument for the variable solve at the other
// variables' values in point and checks the point.
func (fc *fnCtx) tryWitness(point map[vm.Sym]*big.Rat, solve vm.Sym, r ranges.Interval, val *vm.Term, w weak, lo, hi float64) bool {
	rest := vm.Affine{C: w.arg.C, Terms: nil}
	var k *big.Rat
	for _, l := range w.arg.Terms {
		if l.Sym == solve {
			k = l.K
			continue
		}
		rest.Terms = append(rest.Terms, l)
	}
	rv, ok := rest.At(point)
	if !ok || k == nil {
		return false
	}
	first, ok := firstAtRat(k, rv, w.bad)
	if !ok || first > 1<<40 {
		return false
	}
	x := new(big.Rat).SetInt64(first)
	if !inRange(r, x) {
		return false
	}
	point[solve] = x
	defer delete(point, solve)
	if !positiveAt(val, point) {
		return false
	}
	fl := make(map[vm.Sym]float64, len(point))
	for s, v := range point {
		fl[s], _ = v.Float64()
	}
	l, ok := val.LogAbs(fl)
	return ok && l >= lo && l <= hi
}

// positiveAt reports whether every Γ argument and power base of t is
// positive at point, where the formula is the value the code computes
// (a count, a probability).
func positiveAt(t *vm.Term, point map[vm.Sym]*big.Rat) bool {
	for _, g := range t.Gamma {
		if v, ok := g.Arg.At(point); !ok || v.Sign() <= 0 {
			return false
		}
	}
	for _, p := range t.Pows {
		if v, ok := p.Base.At(point); !ok || v.Sign() <= 0 {
			return false
		}
	}
	return true
}

func inRange(r ranges.Interval, x *big.Rat) bool {
	if r.Lo != math.MinInt64 && x.Cmp(linform.SharedInt(r.Lo)) < 0 {
		return false
	}
	return r.Hi == math.MaxInt64 || x.Cmp(linform.SharedInt(r.Hi)) <= 0
}

// symFloat reports whether a variable has a float type.
func symFloat(s vm.Sym) bool {
	var t types.Type
	switch {
	case s.Field != nil:
		t = s.Field.Type()
	case s.Obj != nil:
		t = s.Obj.Type()
	default:
		return false
	}
	b, ok := t.Underlying().(*types.Basic)
	return ok && b.Info()&types.IsFloat != 0
}

// termSyms returns the variables of t and of a, each once, in order.
func termSyms(t *vm.Term, a vm.Affine) []vm.Sym {
	var out []vm.Sym
	seen := make(map[vm.Sym]bool)
	add := func(a vm.Affine) {
		for _, s := range a.Syms() {
			if !seen[s] {
				seen[s] = true
				out = append(out, s)
			}
		}
	}
	add(a)
	add(t.Exp)
	for _, g := range t.Gamma {
		add(g.Arg)
	}
	for _, p := range t.Pows {
		add(p.Base)
		add(p.Exp)
	}
	return out
}

// reportCallRoot words the finding: what the function computes, which
// intermediate breaks and from which input.
func (fc *fnCtx) reportCallRoot(res *vm.Result, root ast.Expr, val *vm.Term, w weak, t numType) {
	name := "the function literal"
	if d, ok := fc.node.(*ast.FuncDecl); ok {
		name = d.Name.Name
	}
	form := vm.RecogniseAny(val)
	what := val.String()
	if form.Kind != vm.Unknown && form.Kind != vm.GammaRatio {
		what = form.String()
	}
	breaks := "overflows to +Inf"
	switch {
	case !t.Float, w.wraps && w.via == "":
		breaks = "wraps"
	case w.wraps:
		breaks = "is wrong" // a float value over a wrapped integer
	case w.via != "":
		breaks = "is +Inf or NaN"
	}
	clause, definite := "", false
	arg := w.arg
	from := fmt.Sprintf("once %s ≥ %s", arg, ratString(w.bad))
	if v, alpha, beta, ok := oneVar(arg); ok {
		if first, ok := firstAtRat(alpha, beta, w.bad); ok {
			from = fmt.Sprintf("from %s = %d", v.Name(), first)
			clause, definite = verdict(v.Name(), fc.symRange(res, v, root), first)
		}
	} else if text, at, ok := fc.argText(res, w); ok {
		from = fmt.Sprintf("from %s = %s", text, ratString(at))
	}
	via := ""
	if w.via != "" && w.via != w.what {
		via = fmt.Sprintf(" (its %s breaks first)", w.via)
	}
	msg := fmt.Sprintf("%s computes %s in %s, which fits where %s already %s %s%s%s",
		name, what, t.typeName(), w.what, breaks, from, via, clause)
	cat := catRatio
	switch {
	case form.Kind == vm.PowOverFact || form.Kind == vm.Poisson:
		cat = catPowOverFac
	case w.gamma:
		cat = catGammaRatio
	}
	var related []analysis.RelatedInformation
	if w.call != nil {
		related = fc.coefDef(w.call) // the package function whose call breaks first
	}
	fc.report(finding{node: root, cat: cat, definite: definite, msg: msg, related: related, match: fc.callRootMatch(res, root, form)})
}

func ratString(r *big.Rat) string {
	if r.IsInt() {
		return r.Num().String()
	}
	f, _ := r.Float64()
	return fmt.Sprintf("%.9g", f)
}

// found reports whether the package has a function with a ValueFact.
func (cs *callState) found() bool {
	for _, f := range cs.facts {
		if f != nil {
			return true
		}
	}
	return false
}

// tripsAsCounters rewrites a form in loops' trip indices as one in
// their counters, as the code names them.
func (fc *fnCtx) tripsAsCounters(res *vm.Result, a vm.Affine) vm.Affine {
	for _, l := range res.Loops {
		if l.Counter != nil && l.Step != nil && l.Step.Sign() != 0 {
			a = a.Subst(l.Iter, vm.Var(vm.Sym{Obj: l.Counter}).Sub(l.From).Scale(new(big.Rat).Inv(l.Step)))
		}
	}
	return a
}

// tripsAsCountersTerm is tripsAsCounters over a term.
func (fc *fnCtx) tripsAsCountersTerm(res *vm.Result, t *vm.Term) *vm.Term {
	for _, l := range res.Loops {
		if l.Counter != nil && l.Step != nil && l.Step.Sign() != 0 {
			t = t.Subst(l.Iter, vm.Var(vm.Sym{Obj: l.Counter}).Sub(l.From).Scale(new(big.Rat).Inv(l.Step)))
		}
	}
	return t
}

// argText names w's argument by the call argument it is, plus a
// constant: binomCoeff(N-K, n-k) breaks from N-K = 171. It returns the
// argument's text and the value at which w breaks.
func (fc *fnCtx) argText(res *vm.Result, w weak) (string, *big.Rat, bool) {
	call, ok := w.call.(*ast.CallExpr)
	if !ok {
		return "", nil, false
	}
	for _, a := range call.Args {
		x, ok := res.Values[a].Affine()
		if !ok {
			continue
		}
		if d := w.arg.Sub(fc.tripsAsCounters(res, x)); d.IsConst() {
			return src(fc.stripConv(a)), new(big.Rat).Sub(w.bad, d.C), true
		}
	}
	return "", nil, false
}

// checksNonFinite reports whether the function tests a variable that
// root reads with math.IsInf or math.IsNaN: code that handles the
// helper's +Inf or NaN itself (falling back to a log form, say) is not
// judged on the value alone.
func (fc *fnCtx) checksNonFinite(root ast.Expr) bool {
	tested := fc.nonFiniteTested()
	if len(tested) == 0 {
		return false
	}
	found := false
	ast.Inspect(root, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok && tested[fc.c.pass.TypesInfo.Uses[id]] {
			found = true
		}
		return !found
	})
	return found
}

// testedNonFinite reports whether the function tests v with math.IsInf
// or math.IsNaN.
func (fc *fnCtx) testedNonFinite(v types.Object) bool {
	return fc.nonFiniteTested()[v]
}

// nonFiniteTested returns the variables the function tests with
// math.IsInf or math.IsNaN.
func (fc *fnCtx) nonFiniteTested() map[types.Object]bool {
	c := fc.c
	tested := make(map[types.Object]bool)
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		if call, ok := n.(*ast.CallExpr); ok && (c.isMathFunc(call, "IsInf") || c.isMathFunc(call, "IsNaN")) && len(call.Args) > 0 {
			if obj := c.objOf(fc.stripConv(call.Args[0])); obj != nil {
				tested[obj] = true
			}
		}
		return true
	})
	return tested
}
