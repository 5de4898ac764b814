package analyzer

import (
	"go/ast"
	"go/token"
	"go/types"
	"go/version"
	"math"
	"sort"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/internal/assigned"
)

// ownEntry returns the parameter ranges a function declares for itself
// in //overfact:assume directives of its doc comment.
func (c *checker) ownEntry(n ast.Node) map[types.Object]ranges.Interval {
	entry := make(map[types.Object]ranges.Interval)
	decl, ok := n.(*ast.FuncDecl)
	if !ok {
		return entry
	}
	if fi := c.fileOf(decl.Pos()); fi != nil {
		for obj, iv := range fi.dirs.funcAssumes[decl] {
			entry[obj] = iv
		}
	}
	return entry
}

// entryOf returns the entry ranges of a function: its own annotations,
// and for an unexported factorial function that does not bound its
// parameter, the join of the argument ranges at its call sites in this
// package (all there can be). Call-site ranges are one level deep: each
// caller is analysed with its own annotations only.
func (c *checker) entryOf(n ast.Node) map[types.Object]ranges.Interval {
	entry := c.ownEntry(n)
	decl, ok := n.(*ast.FuncDecl)
	if !ok {
		if lit, ok := n.(*ast.FuncLit); ok {
			c.capturedEntry(lit, entry)
			c.closureSiteEntry(lit, entry)
		}
		return entry
	}
	obj, _ := c.pass.TypesInfo.Defs[decl.Name].(*types.Func)
	ff := c.funcs[obj]
	if ff == nil || ff.fact.Safe || obj.Exported() {
		return entry
	}
	iv, ok := c.callSiteRange(ff)
	if !ok {
		return entry
	}
	p := obj.Type().(*types.Signature).Params().At(ff.param)
	if old, ok := entry[p]; ok {
		iv = iv.Meet(old)
	}
	entry[p] = iv
	return entry
}

// sitesDecided holds the unexported factorial functions whose every call
// in the package is either always safe or always past the first bad
// value, with one past it: the calls are the findings, and the definition
// has nothing to add (see callSiteRange).
type sitesDecided struct{ set map[*types.Func]bool }

var sitesDecidedKey = &stateKey[sitesDecided]{"functions whose call sites decide"}

// sitesDecide reports whether ff's call sites decide (sitesDecided).
func (c *checker) sitesDecide(ff *facFunc) bool { return passStateOf(c, sitesDecidedKey).set[ff.obj] }

// callSiteRange joins the ranges of the argument n over every call of ff
// outside ff itself. It reports false when the function is also used as
// a value (then it may be called from anywhere) or never called.
//
// A recursive function is also entered from its own calls. Those that
// pass n − c (c ≥ 0) only go down from the outside calls, so the range
// keeps their top and loses its bottom (fact(25) runs fact(24), …); any
// other self-call gives up. It records in sitesDecided whether every
// outside call is either always safe or always past the first bad value
// (then reported at the call itself).
func (c *checker) callSiteRange(ff *facFunc) (ranges.Interval, bool) {
	calls := c.callsOf(ff.obj)
	if calls == nil {
		return ranges.Interval{}, false
	}
	join := ranges.Empty()
	any, self, decided, past := false, false, true, false
	param := ff.obj.Type().(*types.Signature).Params().At(ff.param)
	first := ff.fact.FirstBad
	for _, call := range calls {
		if ff.param >= len(call.Args) {
			return ranges.Interval{}, false
		}
		if ff.decl.Pos() <= call.Pos() && call.End() <= ff.decl.End() {
			if !c.goesDown(ff.decl, call.Args[ff.param], param) {
				return ranges.Interval{}, false
			}
			self = true
			continue
		}
		caller := c.enclosingFunc(call)
		if caller == nil {
			return ranges.Interval{}, false
		}
		own := c.ownCtx(caller)
		r := own.rangeOf(call.Args[ff.param])
		join = join.Join(r)
		any = true
		if !r.IsEmpty() {
			past = past || r.Lo >= first
			decided = decided && (r.Hi < first || r.Lo >= first)
		}
		if join.IsTop() {
			break
		}
	}
	if self && any && !join.IsEmpty() {
		join = ranges.Interval{Lo: math.MinInt64, Hi: join.Hi}
	}
	sd := passStateOf(c, sitesDecidedKey)
	if sd.set == nil {
		sd.set = make(map[*types.Func]bool)
	}
	sd.set[ff.obj] = any && decided && past
	return join, any
}

// goesDown reports whether arg, an argument of a call of decl inside
// decl, is its parameter p minus a constant c ≥ 0.
func (c *checker) goesDown(decl *ast.FuncDecl, arg ast.Expr, p types.Object) bool {
	lin, ok := c.ownCtx(decl).linear(arg)
	return ok && len(lin.Terms) == 1 && lin.Terms[0].Sym.Object == p && lin.Terms[0].K == 1 && lin.C <= 0
}

// callsOf returns the calls of fn in this package, or nil when fn is
// also used other than by calling it.
func (c *checker) callsOf(fn *types.Func) []*ast.CallExpr {
	if c.callIndex == nil {
		c.indexCalls()
	}
	if c.escapes[fn] {
		return nil
	}
	return c.callIndex[fn]
}

// indexCalls records, once per pass, the calls of this package's
// factorial functions and which of them escape as values.
func (c *checker) indexCalls() {
	c.callIndex = make(map[*types.Func][]*ast.CallExpr)
	c.escapes = make(map[*types.Func]bool)
	called := make(map[*ast.Ident]bool)
	for _, f := range c.pass.Files {
		ast.Inspect(f, func(n ast.Node) bool {
			call, ok := n.(*ast.CallExpr)
			if !ok {
				return true
			}
			fn := c.calleeOf(call)
			if c.funcs[fn] == nil {
				return true
			}
			c.callIndex[fn] = append(c.callIndex[fn], call)
			switch fun := ast.Unparen(call.Fun).(type) {
			case *ast.Ident:
				called[fun] = true
			case *ast.SelectorExpr:
				called[fun.Sel] = true
			}
			return true
		})
	}
	for id, obj := range c.pass.TypesInfo.Uses {
		if fn, ok := obj.(*types.Func); ok && c.funcs[fn] != nil && !called[id] {
			c.escapes[fn] = true
		}
	}
}

// enclosingFunc returns the innermost function holding n.
//
// It searches the functions sorted by position backwards from the last
// that starts at or before n: the first that also ends at or after n is
// the innermost. A function declaration that does not hold n ends the
// search, since every function before it lies in earlier declarations.
// (A scan of every function per call made a package of many functions
// cost their number times its calls.)
func (c *checker) enclosingFunc(n ast.Node) ast.Node {
	if c.byPos == nil {
		c.byPos = append([]ast.Node{}, c.allFuncs...)
		sort.SliceStable(c.byPos, func(i, j int) bool { return c.byPos[i].Pos() < c.byPos[j].Pos() })
	}
	fs := c.byPos
	i := sort.Search(len(fs), func(i int) bool { return fs[i].Pos() > n.Pos() })
	for i--; i >= 0; i-- {
		if n.End() <= fs[i].End() {
			return fs[i]
		}
		if _, ok := fs[i].(*ast.FuncDecl); ok {
			break
		}
	}
	return nil
}

// capturedEntry adds to entry the ranges of the integer variables a
// closure captures that hold one value for the closure's whole life: a
// variable the enclosing function sets only where it declares it, or a
// per-iteration loop variable (Go 1.22 and later) that only its for
// statement sets. Their range where the closure is created then holds
// whenever it runs, as in
//
//	for n := 3; n <= 6; n++ { t.Run(…, func(t *testing.T) { … n … }) }
func (c *checker) capturedEntry(lit *ast.FuncLit, entry map[types.Object]ranges.Interval) {
	outer := c.enclosingFuncOutside(lit)
	if outer == nil || funcBody(outer) == nil {
		return
	}
	body := funcBody(outer)
	seen := make(map[types.Object]bool)
	ast.Inspect(lit.Body, func(n ast.Node) bool {
		id, ok := n.(*ast.Ident)
		if !ok {
			return true
		}
		v, ok := c.pass.TypesInfo.Uses[id].(*types.Var)
		if !ok || seen[v] || v.Pos() < body.Pos() || v.Pos() >= lit.Pos() {
			return true
		}
		seen[v] = true
		if t, ok := c.numOf(v.Type()); !ok || t.Float || !c.setOnce(body, v) {
			return true
		}
		entry[v] = c.ctx(outer).entryRange(v, lit)
		return true
	})
}

// closureSiteEntry adds to entry the ranges of a closure's integer
// parameters joined over its calls, where the closure is bound once to a
// local variable that is only ever called, directly in the function that
// binds it: those calls are all there can be, as for an unexported
// function (callSiteRange), so
//
//	f := func(n int) int { … n! … }
//	for n := 0; n < 10; n++ { t[n] = f(2*n) / (f(n+1) * f(n)) }
//
// enters f with n in [0, 18].
func (c *checker) closureSiteEntry(lit *ast.FuncLit, entry map[types.Object]ranges.Interval) {
	outer := c.enclosingFuncOutside(lit)
	sig, _ := c.pass.TypesInfo.TypeOf(lit).(*types.Signature)
	if outer == nil || funcBody(outer) == nil || sig == nil || sig.Variadic() {
		return
	}
	body := funcBody(outer)
	v := c.boundTo(body, lit)
	if v == nil || !c.setOnce(body, v) {
		return
	}
	var calls []*ast.CallExpr
	called := make(map[*ast.Ident]bool)
	ast.Inspect(body, func(n ast.Node) bool {
		if call, ok := n.(*ast.CallExpr); ok {
			if id, ok := ast.Unparen(call.Fun).(*ast.Ident); ok && c.pass.TypesInfo.Uses[id] == v {
				called[id] = true
				calls = append(calls, call)
			}
		}
		return true
	})
	escapes := false
	ast.Inspect(body, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok && c.pass.TypesInfo.Uses[id] == v && !called[id] {
			escapes = true
		}
		return !escapes
	})
	if escapes || len(calls) == 0 {
		return
	}
	fc := c.ctx(outer)
	for i := 0; i < sig.Params().Len(); i++ {
		p := sig.Params().At(i)
		if t, ok := c.numOf(p.Type()); !ok || t.Float {
			continue
		}
		join := ranges.Empty()
		for _, call := range calls {
			if c.enclosingFunc(call) != outer || i >= len(call.Args) {
				return
			}
			join = join.Join(fc.rangeOf(call.Args[i]))
		}
		if old, ok := entry[p]; ok {
			join = join.Meet(old)
		}
		entry[p] = join
	}
}

// enclosingFuncOutside returns the innermost function holding lit other
// than lit itself.
func (c *checker) enclosingFuncOutside(lit *ast.FuncLit) ast.Node {
	var outer ast.Node
	for _, f := range c.allFuncs {
		if f != ast.Node(lit) && f.Pos() <= lit.Pos() && lit.End() <= f.End() && (outer == nil || outer.Pos() <= f.Pos()) {
			outer = f
		}
	}
	return outer
}

// boundTo returns the local variable that body binds lit to where it
// declares it (f := func…, var f = func…), or nil.
func (c *checker) boundTo(body *ast.BlockStmt, lit *ast.FuncLit) *types.Var {
	var v *types.Var
	ast.Inspect(body, func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.AssignStmt:
			if n.Tok == token.DEFINE && len(n.Lhs) == len(n.Rhs) {
				for i, r := range n.Rhs {
					if ast.Unparen(r) == ast.Expr(lit) {
						if id, ok := n.Lhs[i].(*ast.Ident); ok {
							v, _ = c.pass.TypesInfo.Defs[id].(*types.Var)
						}
					}
				}
			}
		case *ast.ValueSpec:
			if len(n.Names) == len(n.Values) {
				for i, r := range n.Values {
					if ast.Unparen(r) == ast.Expr(lit) {
						v, _ = c.pass.TypesInfo.Defs[n.Names[i]].(*types.Var)
					}
				}
			}
		}
		return v == nil
	})
	return v
}

// setOnce reports whether v is set only by its declaration, or, for a
// per-iteration variable of a three-clause loop, by that loop's init
// and post statements; it must also never have its address taken.
func (c *checker) setOnce(body *ast.BlockStmt, v *types.Var) bool {
	var post ast.Stmt
	skip := func(n ast.Node) bool {
		if fs, ok := n.(*ast.ForStmt); ok && c.declaresLoopVar(fs, v) {
			post = fs.Post
		}
		// The post statement sets the next iteration's copy.
		return post != nil && n == ast.Node(post)
	}
	once := true
	assigned.Each(c.pass.TypesInfo, body, skip, func(w types.Object, at ast.Node) bool {
		if w != v {
			return true
		}
		switch at := at.(type) {
		case *ast.AssignStmt:
			once = c.declares(at, v) // its definition is no change
		case *ast.RangeStmt:
			// A range variable is one per iteration only from Go 1.22.
			once = at.Tok == token.DEFINE && c.perIteration(at)
		default:
			once = false
		}
		return once
	})
	return once
}

// declares reports whether as defines v (v := …).
func (c *checker) declares(as *ast.AssignStmt, v types.Object) bool {
	if as.Tok != token.DEFINE {
		return false
	}
	for _, l := range as.Lhs {
		if id, ok := l.(*ast.Ident); ok && c.pass.TypesInfo.Defs[id] == v {
			return true
		}
	}
	return false
}

// declaresLoopVar reports whether fs declares v in its init statement
// with per-iteration semantics (the file is Go 1.22 or later).
func (c *checker) declaresLoopVar(fs *ast.ForStmt, v *types.Var) bool {
	as, ok := fs.Init.(*ast.AssignStmt)
	if !ok || as.Tok != token.DEFINE {
		return false
	}
	declared := false
	for _, l := range as.Lhs {
		declared = declared || c.defines(l, v)
	}
	return declared && c.perIteration(fs)
}

func (c *checker) defines(e ast.Expr, v *types.Var) bool {
	id, ok := e.(*ast.Ident)
	return ok && c.pass.TypesInfo.Defs[id] == v
}

// perIteration reports whether loop variables declared at n are one per
// iteration: the file is Go 1.22 or later.
func (c *checker) perIteration(n ast.Node) bool {
	ver := c.goVersionOf(n)
	return ver != "" && version.Compare(ver, "go1.22") >= 0
}
