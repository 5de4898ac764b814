package valuemodel

import (
	"fmt"
	"go/ast"
	"go/constant"
	"go/token"
	"go/types"
	"math/big"

	"golang.org/x/tools/go/types/typeutil"

	"github.com/overfact/overfact/internal/tokenop"
)

// Options configures Evaluate.
type Options struct {
	// Callee returns the value of a call the caller knows, such as a
	// function with a factorial fact, from the values of its arguments
	// (nil where unknown); nil when the call is not known.
	Callee func(call *ast.CallExpr, args []*Term) *Term
	// LogCallee returns t for a call the caller knows to return ln t,
	// such as a function that returns a sum of log-gamma values
	// (ln C(n, k) = lgamma(n+1) − lgamma(k+1) − lgamma(n−k+1)), so that
	// math.Exp of the call is t; nil where unknown.
	LogCallee func(call *ast.CallExpr, args []*Term) *Term
	// LogGamma reports whether a call of one argument returns ln|Γ| of
	// it, as a function that returns the first result of math.Lgamma
	// does; nil when no such function is known.
	LogGamma func(call *ast.CallExpr) bool
	// MaxNodes caps the syntax nodes evaluated in one function
	// (DefaultMaxNodes when 0); past it Result.Capped is set and the
	// rest of the function is unknown.
	MaxNodes int
}

// DefaultMaxNodes is the default cap of Options.MaxNodes.
const DefaultMaxNodes = 20000

// Result is what Evaluate learned about one function.
type Result struct {
	// Loops holds the summary of every counting loop, outer loops
	// after the loops they contain.
	Loops []*Loop
	// Values holds the value of each expression evaluated, in terms of
	// the function's variables; inside a loop, in terms of the loop's
	// trip index too.
	Values map[ast.Expr]*Term
	// Logs holds, for each expression evaluated whose value is the
	// logarithm of a term (ln Γ from math.Lgamma, math.Log, their sums
	// and multiples), that term.
	Logs map[ast.Expr]*Term
	// Exprs holds, for each variable met, an expression that reads it.
	Exprs map[Sym]ast.Expr
	// Reflections holds each variable the code moved to the other end
	// of a symmetric range (k = n − k under a condition, or
	// k = min(k, n−k)); the values that do not change under that move
	// are given in the variable as it was (Values, Logs), the others
	// keep the fresh variable Reflection.Sym.
	Reflections []Reflection
	// Capped reports that the evaluation stopped at Options.MaxNodes,
	// or failed (Failed).
	Capped bool
	// Failed, when not empty, is the internal failure that stopped the
	// evaluation: the result is empty and Capped is set.
	Failed string
}

// Reflection is a variable that holds either Of or Total − Of after
// Stmt, read as the fresh variable Sym: the code's reduction of C(n, k)
// to the smaller of k and n − k, whichever its condition picks.
type Reflection struct {
	Stmt      ast.Stmt
	Sym       Sym
	Of, Total Affine
	// Low reports that the move leaves the variable at most Total/2
	// (k = n − k where k > n − k, or k = min(k, n−k)).
	Low bool
}

// Reflected returns the reflection whose fresh variable is s.
func (r *Result) Reflected(s Sym) (Reflection, bool) {
	for _, x := range r.Reflections {
		if x.Sym == s {
			return x, true
		}
	}
	return Reflection{}, false
}

// Loop summarises a counting loop: trip t runs from 0 to Count−1 and
// the counter holds From + Step·t during trip t.
type Loop struct {
	Stmt    ast.Stmt
	Iter    Sym
	Counter types.Object
	From    Affine
	Step    *big.Rat
	Count   Affine
	// Bound is the expression the loop condition compares the counter
	// with, and BoundOff what the last counter value adds to it
	// (k <= c: 0, k < c: −1 for a unit step).
	Bound    ast.Expr
	BoundOff *big.Rat
	Accs     []*Acc
	Sums     []*SumAcc
	// Exits reports that the body can leave the loop early or skip the
	// rest of a trip (break, continue, return, goto, panic): the
	// summary then holds only for trips that run to the end, and the
	// trip count is an upper bound.
	Exits bool
}

// Acc is a variable the loop multiplies or divides, and nothing else.
type Acc struct {
	Obj  types.Object
	Init *Term // the value before the loop
	Ops  []Op  // in the order one trip performs them
	// After is the value after the loop (nil when unknown).
	After *Term
	// Guarded reports that some op runs only on some trips.
	Guarded bool
}

// Op is one multiplication or division of an accumulator.
type Op struct {
	Stmt ast.Stmt
	X    ast.Expr // the operand as written
	Mul  bool     // multiply (false: divide)
	By   *Term    // the operand on trip t
	// From and To bound the trips on which the op runs, [From, To).
	From, To Affine
	// Before and After are the accumulator's values on trip t just
	// before and just after the op, when the op runs on every trip up
	// to t (nil when unknown). After is the intermediate the code forms.
	Before, After *Term
}

// SumAcc is a variable to which every trip adds a term.
type SumAcc struct {
	Obj  types.Object
	Stmt ast.Stmt
	Sum  Sum
}

// Sum is Σ_{t=From}^{To−1} Term(t).
type Sum struct {
	Iter     Sym
	From, To Affine
	Term     *Term
}

// value is a term or the logarithm of one.
type value struct {
	t   *Term
	log bool // the value is ln t
}

type evaluator struct {
	info   *types.Info
	opts   Options
	res    *Result
	nodes  int
	opaque map[types.Object]bool // assigned by closures or through their address
	fields map[types.Object]bool // struct variables whose fields are assigned
	// once holds the locals defined outside every loop and assigned
	// nowhere else: one whose value the algebra cannot say is a
	// variable of its own (ki := int(math.Floor(k))), the same at every
	// read.
	once map[types.Object]bool
	// loops is the depth of loop bodies being walked: a value assigned
	// there changes from trip to trip.
	loops int
	// writes counts the assignments of each variable.
	writes map[types.Object]int
	sets   map[types.Object]int // assignments of each variable, 2 for one in a loop
	// makeLen holds, for a slice variable defined once by make, the
	// length it was made with: len of it is that value.
	makeLen map[types.Object]*value
}

// Evaluate assigns values to the expressions of fn, a *ast.FuncDecl or
// *ast.FuncLit, and summarises its loops. It never panics on partially
// typed code: what it cannot type is unknown.
func Evaluate(info *types.Info, fn ast.Node, opts Options) (res *Result) {
	res = &Result{Values: make(map[ast.Expr]*Term), Logs: make(map[ast.Expr]*Term), Exprs: make(map[Sym]ast.Expr)}
	defer func() {
		if r := recover(); r != nil {
			res = &Result{Values: map[ast.Expr]*Term{}, Logs: map[ast.Expr]*Term{}, Exprs: map[Sym]ast.Expr{}, Capped: true, Failed: fmt.Sprint(r)}
		}
	}()
	if opts.MaxNodes <= 0 {
		opts.MaxNodes = DefaultMaxNodes
	}
	var body *ast.BlockStmt
	switch fn := fn.(type) {
	case *ast.FuncDecl:
		body = fn.Body
	case *ast.FuncLit:
		body = fn.Body
	}
	if body == nil || info == nil {
		return res
	}
	e := &evaluator{info: info, opts: opts, res: res, opaque: make(map[types.Object]bool), fields: make(map[types.Object]bool), once: make(map[types.Object]bool), sets: make(map[types.Object]int), makeLen: make(map[types.Object]*value)}
	e.scanOpaque(body)
	e.block(body.List, env{})
	e.unreflect()
	return res
}

// reflection recognises st as the move of a variable to the other end
// of a symmetric range, whatever the condition that picks it:
//
//	if k > n-k { k = n - k }
//	k = min(k, n-k)
//
// and returns the variable and its value before st and the total n;
// after st the variable holds k or n − k.
func (e *evaluator) reflection(st ast.Stmt, en env) (obj types.Object, of, total Affine, low, ok bool) {
	obj, of, total, ok = e.reflectionOf(st, en)
	if !ok {
		return
	}
	switch s := st.(type) {
	case *ast.IfStmt:
		low = e.movesDown(s.Cond, of, total, en)
	case *ast.AssignStmt:
		call := ast.Unparen(s.Rhs[0]).(*ast.CallExpr)
		low = e.isBuiltin(call, "min")
	}
	return
}

// movesDown reports whether cond holds exactly where of > total/2 (or
// of ≥ total/2): a comparison whose sides differ by a positive multiple
// of 2·of − total (k > n−k, 2*k > n, k > n/2) under > or ≥, or by a
// negative one under < or ≤. Moving k to n − k there leaves it at most
// total/2.
func (e *evaluator) movesDown(cond ast.Expr, of, total Affine, en env) bool {
	b, ok := ast.Unparen(cond).(*ast.BinaryExpr)
	if !ok {
		return false
	}
	x, okX := affineOf(e.peek(b.X, en))
	y, okY := affineOf(e.peek(b.Y, en))
	if !okX || !okY {
		return false
	}
	d, w := x.Sub(y), of.Scale(big.NewRat(2, 1)).Sub(total)
	syms := w.Syms()
	if len(syms) == 0 || w.Coef(syms[0]).Sign() == 0 {
		return false
	}
	r := new(big.Rat).Quo(d.Coef(syms[0]), w.Coef(syms[0]))
	if r.Sign() == 0 || !d.Equal(w.Scale(r)) {
		return false
	}
	switch b.Op {
	case token.GTR, token.GEQ:
		return r.Sign() > 0
	case token.LSS, token.LEQ:
		return r.Sign() < 0
	}
	return false
}

// reflectionOf matches the move itself, whatever picks it.
func (e *evaluator) reflectionOf(st ast.Stmt, en env) (types.Object, Affine, Affine, bool) {
	var as *ast.AssignStmt
	switch s := st.(type) {
	case *ast.IfStmt:
		if s.Init != nil || s.Else != nil || len(s.Body.List) != 1 {
			return nil, Affine{}, Affine{}, false
		}
		as, _ = s.Body.List[0].(*ast.AssignStmt)
	case *ast.AssignStmt:
		as = s
	}
	if as == nil || as.Tok != token.ASSIGN || len(as.Lhs) != 1 || len(as.Rhs) != 1 {
		return nil, Affine{}, Affine{}, false
	}
	obj := e.objOf(as.Lhs[0])
	if obj == nil || e.opaque[obj] || !e.numeric(as.Lhs[0]) {
		return nil, Affine{}, Affine{}, false
	}
	of, ok := affineOf(e.peek(as.Lhs[0], en))
	if !ok {
		return nil, Affine{}, Affine{}, false
	}
	rhs := ast.Unparen(as.Rhs[0])
	if _, isIf := st.(*ast.IfStmt); !isIf {
		// k = min(k, n-k) or max(k, n-k): the other argument is the
		// reflection, in either order.
		call, ok := rhs.(*ast.CallExpr)
		if !ok || len(call.Args) != 2 || !e.isBuiltin(call, "min", "max") {
			return nil, Affine{}, Affine{}, false
		}
		a, okA := affineOf(e.peek(call.Args[0], en))
		b, okB := affineOf(e.peek(call.Args[1], en))
		switch {
		case okA && okB && a.Equal(of):
			rhs = call.Args[1]
		case okA && okB && b.Equal(of):
			rhs = call.Args[0]
		default:
			return nil, Affine{}, Affine{}, false
		}
	}
	other, ok := affineOf(e.peek(rhs, en))
	if !ok {
		return nil, Affine{}, Affine{}, false
	}
	total := other.Add(of)
	if total.IsConst() {
		return nil, Affine{}, Affine{}, false // k = −k is a sign, not a range's other end
	}
	for _, v := range of.Syms() {
		if total.Has(v) {
			return nil, Affine{}, Affine{}, false // not n − k of the same k
		}
	}
	return obj, of, total, true
}

// peek evaluates x in a copy of en without recording its value.
func (e *evaluator) peek(x ast.Expr, en env) *value {
	saved := e.res.Values
	savedLogs := e.res.Logs
	e.res.Values, e.res.Logs = make(map[ast.Expr]*Term), make(map[ast.Expr]*Term)
	v := e.evalRaw(x, en)
	e.res.Values, e.res.Logs = saved, savedLogs
	return v
}

// isBuiltin reports whether call calls one of the builtins named.
func (e *evaluator) isBuiltin(call *ast.CallExpr, names ...string) bool {
	id, ok := ast.Unparen(call.Fun).(*ast.Ident)
	if !ok {
		return false
	}
	b, ok := e.info.Uses[id].(*types.Builtin)
	if !ok {
		return false
	}
	for _, n := range names {
		if b.Name() == n {
			return true
		}
	}
	return false
}

// reflect reads obj after st as a fresh variable that holds of or
// total − of, and records it.
func (e *evaluator) reflect(st ast.Stmt, obj types.Object, of, total Affine, low bool, en env) {
	s := Sym{Obj: obj, Def: st}
	en[obj] = &value{t: FromAffine(Var(s))}
	e.res.Reflections = append(e.res.Reflections, Reflection{Stmt: st, Sym: s, Of: of, Total: total, Low: low})
}

// unreflect gives each value that is the same whichever end a reflected
// variable holds (C(n, k') for k' ∈ {k, n − k}) in the variable as it
// was before the reflection.
func (e *evaluator) unreflect() {
	if len(e.res.Reflections) == 0 {
		return
	}
	for i := len(e.res.Reflections) - 1; i >= 0; i-- {
		r := e.res.Reflections[i]
		other := r.Total.Sub(r.Of)
		for _, m := range []map[ast.Expr]*Term{e.res.Values, e.res.Logs} {
			for x, t := range m {
				if !termHas(t, r.Sym) {
					continue
				}
				if a, b := t.Subst(r.Sym, r.Of), t.Subst(r.Sym, other); sameTerm(a, b) {
					m[x] = a
				}
			}
		}
	}
}

// sameTerm reports whether a and b are one value: their quotient is the
// constant 1 (the factors of a product in any order).
func sameTerm(a, b *Term) bool {
	if a == nil || b == nil {
		return false
	}
	c, ok := a.Div(b).IsConst()
	return ok && c.Cmp(ratOne) == 0
}

// termHas reports whether t reads s.
func termHas(t *Term, s Sym) bool {
	if t.Exp.Has(s) {
		return true
	}
	for _, g := range t.Gamma {
		if g.Arg.Has(s) {
			return true
		}
	}
	for _, p := range t.Pows {
		if p.Base.Has(s) || p.Exp.Has(s) {
			return true
		}
	}
	return false
}

// env maps each local to its current value; a missing entry is the
// variable itself, a nil entry unknown.
type env map[types.Object]*value

// copyEnv copies en, counting its entries against the node budget: in
// a long function the copies, not the nodes, would dominate the work.
func (e *evaluator) copyEnv(en env) env {
	e.nodes += len(en)
	if e.nodes > e.opts.MaxNodes {
		e.res.Capped = true
	}
	out := make(env, len(en))
	for k, v := range en {
		out[k] = v
	}
	return out
}

// scanOpaque finds the variables whose value the walk cannot follow:
// those a closure assigns or whose address is taken, and the struct
// variables whose fields are assigned.
func (e *evaluator) scanOpaque(body *ast.BlockStmt) {
	inLit, inLoop := 0, 0
	writes := make(map[types.Object]int)
	e.writes = writes
	var visit func(n ast.Node) bool
	visit = func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.FuncLit:
			inLit++
			ast.Inspect(n.Body, visit)
			inLit--
			return false
		case *ast.ForStmt, *ast.RangeStmt:
			inLoop++
			ast.Inspect(n, func(m ast.Node) bool { return m == n || visit(m) })
			inLoop--
			return false
		case *ast.AssignStmt:
			for _, l := range n.Lhs {
				e.noteAssign(l, inLit > 0)
				if id, ok := ast.Unparen(l).(*ast.Ident); ok {
					if obj := e.info.ObjectOf(id); obj != nil {
						writes[obj]++
						if n.Tok == token.DEFINE && inLit == 0 && inLoop == 0 && e.info.Defs[id] != nil {
							e.once[obj] = true
						}
					}
				}
				if obj := e.objOf(l); obj != nil {
					e.sets[obj] += 1 + 2*min(inLoop+inLit, 1)
				}
			}
		case *ast.IncDecStmt:
			e.noteAssign(n.X, inLit > 0)
			if obj := e.objOf(n.X); obj != nil {
				writes[obj]++
				e.sets[obj] += 2
			}
		case *ast.UnaryExpr:
			if n.Op == token.AND {
				e.noteAssign(n.X, true)
			}
		}
		return true
	}
	ast.Inspect(body, visit)
	for obj := range e.once {
		if writes[obj] != 1 || e.opaque[obj] {
			delete(e.once, obj)
		}
	}
}

func (e *evaluator) noteAssign(l ast.Expr, opaque bool) {
	l = ast.Unparen(l)
	for {
		sel, ok := l.(*ast.SelectorExpr)
		if !ok {
			break
		}
		if id, ok := ast.Unparen(sel.X).(*ast.Ident); ok {
			if obj := e.info.ObjectOf(id); obj != nil {
				e.fields[obj] = true
			}
		}
		l = ast.Unparen(sel.X)
	}
	if id, ok := l.(*ast.Ident); ok && opaque {
		if obj := e.info.ObjectOf(id); obj != nil {
			e.opaque[obj] = true
		}
	}
}

// tick counts one evaluated node and reports whether the budget holds.
func (e *evaluator) tick() bool {
	e.nodes++
	if e.nodes > e.opts.MaxNodes {
		e.res.Capped = true
		return false
	}
	return true
}

func (e *evaluator) objOf(x ast.Expr) types.Object {
	id, ok := ast.Unparen(x).(*ast.Ident)
	if !ok {
		return nil
	}
	obj, _ := e.info.ObjectOf(id).(*types.Var)
	if obj == nil {
		return nil
	}
	return obj
}

// numeric reports whether x has an integer or float type.
func (e *evaluator) numeric(x ast.Expr) bool {
	t := e.info.TypeOf(x)
	if t == nil {
		return false
	}
	b, ok := t.Underlying().(*types.Basic)
	return ok && b.Info()&(types.IsInteger|types.IsFloat) != 0
}

// block walks a list of statements, updating en.
func (e *evaluator) block(list []ast.Stmt, en env) {
	for _, st := range list {
		if !e.tick() {
			return
		}
		e.stmt(st, en)
	}
}

func (e *evaluator) stmt(st ast.Stmt, en env) {
	switch s := st.(type) {
	case *ast.LabeledStmt:
		e.stmt(s.Stmt, en)
	case *ast.AssignStmt:
		e.assign(s, en)
	case *ast.DeclStmt:
		gd, ok := s.Decl.(*ast.GenDecl)
		if !ok || gd.Tok != token.VAR {
			return
		}
		for _, spec := range gd.Specs {
			vs := spec.(*ast.ValueSpec)
			for i, name := range vs.Names {
				obj := e.info.Defs[name]
				if obj == nil {
					continue
				}
				switch {
				case len(vs.Values) == len(vs.Names):
					en[obj] = e.eval(vs.Values[i], en)
				case len(vs.Values) == 0:
					en[obj] = &value{t: Num(new(big.Rat))}
				default:
					en[obj] = nil
				}
			}
		}
	case *ast.IncDecStmt:
		if obj := e.objOf(s.X); obj != nil {
			d := int64(1)
			if s.Tok == token.DEC {
				d = -1
			}
			en[obj] = e.addAffine(e.eval(s.X, en), Int(d))
		}
	case *ast.ReturnStmt:
		for _, r := range s.Results {
			e.eval(r, en)
		}
	case *ast.ExprStmt:
		e.eval(s.X, en)
	case *ast.BlockStmt:
		e.block(s.List, en)
	case *ast.ForStmt, *ast.RangeStmt:
		e.loop(s, en)
	case *ast.IfStmt:
		if s.Init != nil {
			e.stmt(s.Init, en)
		}
		e.eval(s.Cond, en)
		obj, of, total, low, refl := e.reflection(s, en)
		e.branch([]ast.Stmt{s.Body}, en)
		if s.Else != nil {
			e.branch([]ast.Stmt{s.Else}, en)
		}
		if refl && e.loops == 0 {
			e.reflect(s, obj, of, total, low, en)
		}
	default:
		// switch, select, go, defer, goto …: walk for the values inside,
		// then forget what they assign.
		e.branch([]ast.Stmt{st}, en)
	}
}

// branch walks statements that may or may not run: values inside are
// recorded, and what they assign is unknown afterwards.
func (e *evaluator) branch(list []ast.Stmt, en env) {
	inner := e.copyEnv(en)
	for _, st := range list {
		switch s := st.(type) {
		case *ast.BlockStmt:
			e.block(s.List, inner)
		case *ast.IfStmt:
			e.stmt(s, inner)
		case *ast.SwitchStmt, *ast.TypeSwitchStmt, *ast.SelectStmt:
			ast.Inspect(s, func(n ast.Node) bool {
				if cl, ok := n.(*ast.CaseClause); ok {
					e.block(cl.Body, e.copyEnv(inner))
					return false
				}
				if _, ok := n.(*ast.FuncLit); ok {
					return false
				}
				return true
			})
		case *ast.ForStmt, *ast.RangeStmt, *ast.LabeledStmt, *ast.AssignStmt, *ast.ExprStmt, *ast.ReturnStmt, *ast.DeclStmt, *ast.IncDecStmt:
			e.stmt(s, inner)
		}
	}
	e.forgetAssigned(list, en)
}

// forgetAssigned makes unknown every variable list assigns.
func (e *evaluator) forgetAssigned(list []ast.Stmt, en env) {
	for _, st := range list {
		ast.Inspect(st, func(n ast.Node) bool {
			switch n := n.(type) {
			case *ast.AssignStmt:
				for _, l := range n.Lhs {
					if obj := e.objOf(l); obj != nil {
						en[obj] = nil
					}
				}
			case *ast.IncDecStmt:
				if obj := e.objOf(n.X); obj != nil {
					en[obj] = nil
				}
			case *ast.RangeStmt:
				for _, x := range []ast.Expr{n.Key, n.Value} {
					if obj := e.objOf(x); obj != nil {
						en[obj] = nil
					}
				}
			}
			return true
		})
	}
}

// assign evaluates an assignment and updates en.
func (e *evaluator) assign(s *ast.AssignStmt, en env) {
	if obj, of, total, low, ok := e.reflection(s, en); ok && e.loops == 0 {
		for _, r := range s.Rhs {
			e.eval(r, en)
		}
		e.reflect(s, obj, of, total, low, en)
		return
	}
	if len(s.Lhs) == 2 && len(s.Rhs) == 1 {
		// lg, sign := math.Lgamma(x)
		if call, ok := ast.Unparen(s.Rhs[0]).(*ast.CallExpr); ok && e.isMath(call, "Lgamma") && len(call.Args) == 1 {
			x := e.eval(call.Args[0], en)
			if obj := e.objOf(s.Lhs[0]); obj != nil {
				en[obj] = nil
				if a, ok := affineOf(x); ok {
					en[obj] = &value{t: GammaOf(a), log: true}
				}
			}
			if obj := e.objOf(s.Lhs[1]); obj != nil {
				en[obj] = nil
			}
			return
		}
	}
	if len(s.Lhs) != len(s.Rhs) {
		for _, l := range s.Lhs {
			if obj := e.objOf(l); obj != nil {
				en[obj] = nil
			}
		}
		for _, r := range s.Rhs {
			e.eval(r, en)
		}
		return
	}
	if len(s.Lhs) == 1 && len(s.Rhs) == 1 {
		e.noteMake(s.Lhs[0], s.Rhs[0], en)
	}
	vals := make([]*value, len(s.Rhs))
	for i, r := range s.Rhs {
		v := e.eval(r, en)
		if s.Tok != token.ASSIGN && s.Tok != token.DEFINE {
			cur := e.eval(s.Lhs[i], en)
			v = e.binary(tokenop.OfAssign(s.Tok), cur, v)
		}
		vals[i] = v
	}
	for i, l := range s.Lhs {
		if obj := e.objOf(l); obj != nil {
			if !e.opaque[obj] && e.sets[obj] == 1 && (!e.numeric(l) || vals[i] == nil && s.Tok == token.DEFINE) {
				// A struct variable set once, outside loops: its
				// fields hold one value each, read as variables. A
				// number defined once from a value the model does not
				// know (ki := int(math.Floor(k))) is a variable of its
				// own, as a parameter is.
				delete(en, obj)
				continue
			}
			if e.opaque[obj] || !e.numeric(l) {
				en[obj] = nil
				if e.once[obj] && e.loops == 0 {
					// A struct defined once: its fields read as
					// variables of their own.
					delete(en, obj)
				}
				continue
			}
			switch {
			case vals[i] != nil || e.loops > 0:
			case e.once[obj]:
				// Read from here on as the variable itself.
				delete(en, obj)
				continue
			default:
				// The value this statement gave it, a variable of
				// its own until the next assignment.
				vals[i] = &value{t: FromAffine(Var(Sym{Obj: obj, Def: s}))}
			}
			en[obj] = vals[i]
		}
	}
}

func affineOf(v *value) (Affine, bool) {
	if v == nil || v.log {
		return Affine{}, false
	}
	return v.t.Affine()
}

func (e *evaluator) addAffine(v *value, d Affine) *value {
	a, ok := affineOf(v)
	if !ok {
		return nil
	}
	return &value{t: FromAffine(a.Add(d))}
}

func (e *evaluator) isMath(call *ast.CallExpr, name string) bool {
	fn := typeutil.StaticCallee(e.info, call)
	return fn != nil && fn.Name() == name && fn.Pkg() != nil && fn.Pkg().Path() == "math"
}

// eval returns the value of x in en, recording it.
func (e *evaluator) eval(x ast.Expr, en env) *value {
	if x == nil || !e.tick() {
		return nil
	}
	v := e.evalRaw(x, en)
	if v != nil && v.t != nil {
		if v.log {
			e.res.Logs[x] = v.t
		} else {
			e.res.Values[x] = v.t
		}
	}
	return v
}

func (e *evaluator) evalRaw(x ast.Expr, en env) *value {
	if tv, ok := e.info.Types[x]; ok && tv.Value != nil {
		if r, ok := ratOf(tv.Value); ok {
			return &value{t: Num(r)}
		}
		return nil
	}
	switch x := x.(type) {
	case *ast.ParenExpr:
		return e.eval(x.X, en)
	case *ast.Ident:
		obj := e.objOf(x)
		if obj == nil || !e.numeric(x) || e.opaque[obj] {
			return nil
		}
		if v, ok := en[obj]; ok {
			return v
		}
		s := Sym{Obj: obj}
		if _, ok := e.res.Exprs[s]; !ok {
			e.res.Exprs[s] = x
		}
		return &value{t: FromAffine(Var(s))}
	case *ast.SelectorExpr:
		base := e.objOf(x.X)
		sel := e.info.Selections[x]
		if base == nil || sel == nil || sel.Kind() != types.FieldVal || len(sel.Index()) != 1 || !e.numeric(x) || e.fields[base] || e.opaque[base] {
			return nil
		}
		if v, ok := en[base]; ok && v == nil {
			return nil
		}
		s := Sym{Obj: base, Field: sel.Obj()}
		if _, ok := e.res.Exprs[s]; !ok {
			e.res.Exprs[s] = x
		}
		return &value{t: FromAffine(Var(s))}
	case *ast.UnaryExpr:
		v := e.eval(x.X, en)
		switch x.Op {
		case token.ADD:
			return v
		case token.SUB:
			if v == nil {
				return nil
			}
			if v.log {
				return &value{t: v.t.Inv(), log: true}
			}
			return &value{t: v.t.Neg()}
		}
		return nil
	case *ast.BinaryExpr:
		a := e.eval(x.X, en)
		b := e.eval(x.Y, en)
		if !e.numeric(x) {
			return nil
		}
		return e.binary(x.Op, a, b)
	case *ast.CallExpr:
		return e.call(x, en)
	case *ast.CompositeLit:
		// Point{X: a * u, …}: the elements' values, for what reads
		// them; the literal itself has none.
		for _, el := range x.Elts {
			if kv, ok := el.(*ast.KeyValueExpr); ok {
				el = kv.Value
			}
			e.eval(el, en)
		}
	}
	return nil
}

func ratOf(v constant.Value) (*big.Rat, bool) {
	switch v.Kind() {
	case constant.Int, constant.Float:
		switch r := constant.Val(constant.ToFloat(v)).(type) {
		case *big.Rat:
			return r, true
		case *big.Float:
			out, acc := r.Rat(nil)
			return out, acc == big.Exact && out != nil
		case int64:
			return rat(r), true
		}
	}
	return nil, false
}

// binary combines two values by op.
func (e *evaluator) binary(op token.Token, a, b *value) *value {
	if a == nil || b == nil {
		return nil
	}
	switch {
	case a.log && b.log:
		switch op {
		case token.ADD:
			return &value{t: a.t.Mul(b.t), log: true}
		case token.SUB:
			return &value{t: a.t.Div(b.t), log: true}
		}
		return nil
	case a.log || b.log:
		l, o := a, b
		if b.log {
			l, o = b, a
		}
		oa, ok := affineOf(o)
		if !ok {
			return nil
		}
		switch {
		case op == token.ADD || op == token.SUB && a.log:
			if op == token.SUB {
				oa = oa.Scale(shared(-1))
			}
			return &value{t: l.t.Mul(ExpOf(oa)), log: true}
		case op == token.SUB:
			return &value{t: ExpOf(oa).Div(l.t), log: true}
		case op == token.MUL:
			return &value{t: logScale(l.t, oa), log: true}
		case op == token.QUO && a.log && oa.IsConst() && oa.c().Sign() != 0:
			return &value{t: l.t.PowRat(new(big.Rat).Inv(oa.c())), log: true}
		}
		return nil
	}
	switch op {
	case token.MUL:
		return &value{t: a.t.Mul(b.t)}
	case token.QUO:
		return &value{t: a.t.Div(b.t)}
	case token.ADD, token.SUB:
		x, ok1 := a.t.Affine()
		y, ok2 := b.t.Affine()
		if !ok1 || !ok2 {
			return nil
		}
		if op == token.SUB {
			y = y.Scale(shared(-1))
		}
		return &value{t: FromAffine(x.Add(y))}
	}
	return nil
}

// logScale returns t^k for ln t scaled by k.
func logScale(t *Term, k Affine) *Term {
	if t == nil {
		return nil
	}
	if k.IsConst() && k.c().IsInt() {
		return t.PowInt(k.c().Num().Int64())
	}
	if isOne(t.Coef) && len(t.Gamma) == 0 && t.SqrtPi == 0 && len(t.Pows) == 1 && t.Pows[0].Exp.IsConst() && t.Exp.IsConst() && t.Exp.c().Sign() == 0 {
		p := t.Pows[0]
		return PowOf(p.Base, k.Scale(p.Exp.c()))
	}
	return t.PowAffine(k)
}

// call evaluates conversions, the functions of package math the
// algebra knows, and calls Options.Callee knows.
func (e *evaluator) call(x *ast.CallExpr, en env) *value {
	if tv, ok := e.info.Types[x.Fun]; ok && tv.IsType() {
		if len(x.Args) != 1 {
			return nil
		}
		v := e.eval(x.Args[0], en)
		if !e.numeric(x) || !e.numeric(x.Args[0]) {
			return nil
		}
		return v
	}
	if v := e.length(x); v != nil {
		return v
	}
	args := make([]*value, len(x.Args))
	for i, a := range x.Args {
		args[i] = e.eval(a, en)
	}
	one := len(args) == 1 && args[0] != nil
	switch {
	case e.isMath(x, "Gamma") && one:
		if a, ok := affineOf(args[0]); ok {
			return &value{t: GammaOf(a)}
		}
	case e.isMath(x, "Exp") && one:
		if args[0].log {
			return &value{t: args[0].t}
		}
		if a, ok := affineOf(args[0]); ok {
			return &value{t: ExpOf(a)}
		}
	case e.isMath(x, "Sqrt") && one && !args[0].log:
		return &value{t: args[0].t.PowRat(big.NewRat(1, 2))}
	case e.isMath(x, "Log") && one:
		if !args[0].log {
			return &value{t: args[0].t, log: true}
		}
	case e.isMath(x, "Pow") && len(args) == 2 && args[0] != nil && args[1] != nil:
		k, ok := affineOf(args[1])
		if !ok {
			return nil
		}
		if b, ok := affineOf(args[0]); ok {
			return &value{t: PowOf(b, k)}
		}
		if !args[0].log {
			return &value{t: logScale(args[0].t, k)}
		}
	case e.opts.LogGamma != nil && one && e.opts.LogGamma(x):
		if a, ok := affineOf(args[0]); ok {
			return &value{t: GammaOf(a), log: true}
		}
	case e.opts.Callee != nil:
		ts := make([]*Term, len(args))
		for i, a := range args {
			if a != nil && !a.log {
				ts[i] = a.t
			}
		}
		if t := e.opts.Callee(x, ts); t != nil {
			return &value{t: t}
		}
		if e.opts.LogCallee != nil {
			if t := e.opts.LogCallee(x, ts); t != nil {
				return &value{t: t, log: true}
			}
		}
	}
	return nil
}

// length gives len(x) of a slice variable that keeps one length in the
// function (a parameter never assigned, or a local defined once, and
// its address never taken) a variable of its own, Sym{Obj: len, Field:
// x}; nil for any other call.
func (e *evaluator) length(call *ast.CallExpr) *value {
	id, ok := ast.Unparen(call.Fun).(*ast.Ident)
	if !ok || len(call.Args) != 1 {
		return nil
	}
	b, ok := e.info.Uses[id].(*types.Builtin)
	if !ok || b.Name() != "len" {
		return nil
	}
	x := e.objOf(call.Args[0])
	s, ok := e.lenSym(x)
	if !ok {
		return nil
	}
	if v := e.makeLen[x]; v != nil {
		return v
	}
	if _, ok := e.res.Exprs[s]; !ok {
		e.res.Exprs[s] = call
	}
	return &value{t: FromAffine(Var(s))}
}

// noteMake records the length of a slice variable defined by
// make(T, n) outside loops: len of it is n's value there, as long as the
// variable keeps one length (lenSym).
func (e *evaluator) noteMake(lhs, rhs ast.Expr, en env) {
	x := e.objOf(lhs)
	call, ok := ast.Unparen(rhs).(*ast.CallExpr)
	if x == nil || !ok || len(call.Args) < 2 || e.loops > 0 {
		return
	}
	id, ok := ast.Unparen(call.Fun).(*ast.Ident)
	if !ok {
		return
	}
	if b, ok := e.info.Uses[id].(*types.Builtin); !ok || b.Name() != "make" {
		return
	}
	if _, ok := e.lenSym(x); !ok {
		return
	}
	if v := e.eval(call.Args[1], en); v != nil && !v.log {
		if _, ok := v.t.Affine(); ok {
			e.makeLen[x] = v
		}
	}
}

// lenSym returns the variable len(x) for a slice variable x that keeps
// one length in the function.
func (e *evaluator) lenSym(x types.Object) (Sym, bool) {
	if x == nil || e.opaque[x] {
		return Sym{}, false
	}
	if _, ok := x.Type().Underlying().(*types.Slice); !ok {
		return Sym{}, false
	}
	if n := e.writes[x]; n > 1 || n == 1 && !e.once[x] {
		return Sym{}, false
	}
	b, ok := types.Universe.Lookup("len").(*types.Builtin)
	return Sym{Obj: b, Field: x}, ok
}
