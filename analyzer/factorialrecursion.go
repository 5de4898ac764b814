package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"math"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/fixes"
	"github.com/overfact/overfact/internal/tokenop"
)

// The factorial-recursion category: a function that returns n times
// itself at n-1, found in phase 1 (recursionOf) and reported where its
// parameter is not bounded below its first bad value.

// checkRecursion reports a recursive factorial whose parameter is not
// bounded below the first value that breaks its result type.
func (fc *fnCtx) checkRecursion(ff *facFunc) {
	if fc.decidedAtCalls(ff.rec) {
		return
	}
	if ff.kind == kindFalling {
		fc.checkFallingRecursion(ff)
		return
	}
	// The analysis of this pass has its own ranges; ff.recN is the same
	// node in both, so asking for its range here is sound.
	first := firstBadOf(ff.kind, ff.result)
	j := fc.judge(ff.recN, first)
	if j.silent {
		return
	}
	name, off := shownFactorial(ff.recN, 0)
	shape := fixes.ShapeFactorial
	if ff.kind != kindFactorial && ff.kind != kindDouble || ff.stored || !fc.recursionGuardExact(ff, first) {
		shape = fixes.ShapeNone
	}
	fc.report(finding{
		node:     ff.rec,
		cat:      catRecursion,
		definite: j.definite,
		msg:      "recursive " + factorialLimitText(ff.kind, name, off, ff.result) + j.clause,
		match: &fixes.Match{
			Shape:    shape,
			Node:     ff.rec,
			Args:     []ast.Expr{ff.recN},
			Result:   ff.obj.Type().(*types.Signature).Results().At(0).Type(),
			Func:     ff.decl,
			Param:    fc.c.objOf(ff.recN),
			FirstBad: first,
		},
	})
}

// recursionOf matches a return of n * f(n-1) (or n-2, a double
// factorial) anywhere in a returned expression.
func (fc *fnCtx) recursionOf(decl *ast.FuncDecl, self *types.Func) *facFunc {
	var ff *facFunc
	ast.Inspect(decl.Body, func(n ast.Node) bool {
		if ff != nil {
			return false
		}
		if _, ok := n.(*ast.FuncLit); ok {
			return false
		}
		ret, ok := n.(*ast.ReturnStmt)
		if !ok || len(ret.Results) == 0 {
			return true
		}
		ast.Inspect(ret.Results[0], func(m ast.Node) bool {
			if b, ok := m.(*ast.BinaryExpr); ok && b.Op == token.REM {
				// n * f(n-1) % m: every value is below m, and so the
				// product below n·m; no factorial.
				return false
			}
			if b, ok := m.(*ast.BinaryExpr); ok && b.Op == token.MUL && ff == nil {
				ff = fc.recursiveProduct(decl, self, b, fc.stripConv(ret.Results[0]) == b)
			}
			return ff == nil
		})
		return ff == nil
	})
	if ff == nil {
		ff = fc.storedRecursion(decl, self)
	}
	return ff
}

// storedRecursion matches the memoised form of the recursion: n * f(n-1)
// assigned to a local that the function returns, or to an element
// cache[n] of a cache indexed by the parameter that it returns as
// cache[n] (the lookup that returns an earlier element returns an
// earlier product, a factorial too).
func (fc *fnCtx) storedRecursion(decl *ast.FuncDecl, self *types.Func) *facFunc {
	var ff *facFunc
	ast.Inspect(decl.Body, func(n ast.Node) bool {
		if _, ok := n.(*ast.FuncLit); ok || ff != nil {
			return false
		}
		a, ok := n.(*ast.AssignStmt)
		if !ok || len(a.Lhs) != 1 || len(a.Rhs) != 1 || (a.Tok != token.ASSIGN && a.Tok != token.DEFINE) {
			return true
		}
		b, ok := ast.Unparen(a.Rhs[0]).(*ast.BinaryExpr)
		if !ok || b.Op != token.MUL {
			return true
		}
		cand := fc.recursiveProduct(decl, self, b, true)
		if cand != nil && fc.returnsStore(decl, a.Lhs[0], cand.recN) {
			cand.stored = true
			ff = cand
		}
		return ff == nil
	})
	return ff
}

// returnsStore reports whether the function returns what lhs holds: a
// local it returns, or cache[n] for the parameter n, returned as
// cache[n].
func (fc *fnCtx) returnsStore(decl *ast.FuncDecl, lhs, n ast.Expr) bool {
	if v, ok := fc.c.objOf(lhs).(*types.Var); ok && v.Parent() != v.Pkg().Scope() {
		return fc.returns(decl.Body, v)
	}
	ix, ok := ast.Unparen(lhs).(*ast.IndexExpr)
	p := fc.c.objOf(n)
	if !ok || p == nil || fc.c.objOf(ix.Index) != p || fc.c.objOf(ix.X) == nil {
		return false
	}
	found := false
	ast.Inspect(decl.Body, func(m ast.Node) bool {
		if _, ok := m.(*ast.FuncLit); ok || found {
			return false
		}
		if ret, ok := m.(*ast.ReturnStmt); ok && len(ret.Results) == 1 {
			r, ok := ast.Unparen(ret.Results[0]).(*ast.IndexExpr)
			found = ok && fc.c.objOf(r.X) == fc.c.objOf(ix.X) && fc.c.objOf(r.Index) == p
		}
		return !found
	})
	return found
}

// recursiveProduct matches b as n * f(n-1) (or n-2), f the function
// itself, with every other parameter passed on as it is: n!, or n!!.
// Where b is the whole value returned (whole), it also matches
// n * f(n-1, k-1) in a function that returns 1 when k reaches 0: the
// falling factorial of k factors from n down.
func (fc *fnCtx) recursiveProduct(decl *ast.FuncDecl, self *types.Func, b *ast.BinaryExpr, whole bool) *facFunc {
	for _, pair := range [2][2]ast.Expr{{b.X, b.Y}, {b.Y, b.X}} {
		nExpr, callExpr := pair[0], pair[1]
		v := fc.c.objOf(fc.stripConv(nExpr))
		idx := fc.c.paramIndex(decl, v)
		call, ok := fc.stripConv(callExpr).(*ast.CallExpr)
		if idx < 0 || !ok || fc.c.calleeOf(call) != self || idx >= len(call.Args) {
			continue
		}
		lin, ok := fc.linear(call.Args[idx])
		if !ok || len(lin.Terms) != 1 || lin.Terms[0].Sym.Object != v || lin.Terms[0].K != 1 {
			continue
		}
		if !fc.passesThrough(decl, call, idx, -1) {
			// f(n-1, k-1)·n is no n!: the other count steps too, and
			// the recursion stops on it (n!/(n−k)!, C(n, k)·k/n…).
			if j := fc.recursionCount(decl, call, idx); lin.C == -1 && whole && j >= 0 {
				return &facFunc{kind: kindFalling, param: idx, param2: j, rec: b, recN: fc.stripConv(nExpr), recCall: call}
			}
			continue
		}
		kind := kindNone
		switch lin.C {
		case -1:
			kind = kindFactorial
		case -2:
			kind = kindDouble
		}
		if kind == kindNone {
			continue
		}
		return &facFunc{kind: kind, param: idx, param2: -1, rec: b, recN: fc.stripConv(nExpr)}
	}
	return nil
}

// passesThrough reports whether the recursive call passes every
// parameter but those at idx and skip on unchanged, each to its own
// place (or the function has no other parameter).
func (fc *fnCtx) passesThrough(decl *ast.FuncDecl, call *ast.CallExpr, idx, skip int) bool {
	for j, a := range call.Args {
		if j == idx || j == skip {
			continue
		}
		if fc.c.paramIndex(decl, fc.c.objOf(ast.Unparen(a))) != j {
			return false
		}
	}
	return true
}

// recursionCount returns the index of the parameter k that the recursive
// call passes on as k-1, every other one but n (at idx) as it is, in a
// function whose first statements include if k == 0 (k <= 0, k < 1)
// { return 1 }: the count of a falling factorial's factors. It returns
// -1 where there is none.
func (fc *fnCtx) recursionCount(decl *ast.FuncDecl, call *ast.CallExpr, idx int) int {
	for j, a := range call.Args {
		if j == idx {
			continue
		}
		lin, ok := fc.linear(a)
		if !ok || len(lin.Terms) != 1 || lin.Terms[0].K != 1 || lin.C != -1 {
			continue
		}
		k := lin.Terms[0].Sym.Object
		if fc.c.paramIndex(decl, k) != j || !fc.passesThrough(decl, call, idx, j) || !fc.stopsAtZero(decl, k, fc.c.paramObj(decl, idx)) {
			continue
		}
		return j
	}
	return -1
}

// stopsAtZero reports whether a statement of the function's body is
// if k == 0 { return 1 } (or k <= 0, k < 1, 0 == k), with 1 a constant,
// or that test or'ed with k == n (n the recursion's other parameter,
// when known): C(n, 0) = C(n, n) = 1 (common practice), the textbook
// base cases of the binomial recursion.
func (fc *fnCtx) stopsAtZero(decl *ast.FuncDecl, k, n types.Object) bool {
	for _, st := range decl.Body.List {
		ifs, ok := st.(*ast.IfStmt)
		if !ok || ifs.Init != nil || len(ifs.Body.List) != 1 {
			continue
		}
		ret, ok := ifs.Body.List[0].(*ast.ReturnStmt)
		if !ok || len(ret.Results) != 1 {
			continue
		}
		if one, ok := fc.c.queries().intConst(fc.stripConv(ret.Results[0])); !ok || one != 1 {
			continue
		}
		zero, others := false, true
		for _, d := range disjunctsOf(ifs.Cond) {
			switch {
			case fc.zeroTest(d, k):
				zero = true
			case n == nil || !fc.equalTest(d, k, n):
				others = false
			}
		}
		if zero && others {
			return true
		}
	}
	return false
}

// disjunctsOf splits a || b || … into its parts.
func disjunctsOf(e ast.Expr) []ast.Expr {
	if b, ok := ast.Unparen(e).(*ast.BinaryExpr); ok && b.Op == token.LOR {
		return append(disjunctsOf(b.X), disjunctsOf(b.Y)...)
	}
	return []ast.Expr{e}
}

// zeroTest reports whether e is k == 0, k <= 0 or k < 1 (either side).
func (fc *fnCtx) zeroTest(e ast.Expr, k types.Object) bool {
	c, ok := ast.Unparen(e).(*ast.BinaryExpr)
	if !ok {
		return false
	}
	x, y, op := c.X, c.Y, c.Op
	if fc.c.objOf(ast.Unparen(y)) == k {
		x, y, op = y, x, tokenop.Flip(op)
	}
	v, ok := fc.c.queries().intConst(y)
	if !ok || fc.c.objOf(ast.Unparen(x)) != k {
		return false
	}
	return op == token.EQL && v == 0 || op == token.LEQ && v == 0 || op == token.LSS && v == 1
}

// equalTest reports whether e is k == n (either side).
func (fc *fnCtx) equalTest(e ast.Expr, k, n types.Object) bool {
	c, ok := ast.Unparen(e).(*ast.BinaryExpr)
	if !ok || c.Op != token.EQL {
		return false
	}
	x, y := fc.c.objOf(ast.Unparen(c.X)), fc.c.objOf(ast.Unparen(c.Y))
	return x == k && y == n || x == n && y == k
}

// checkFallingRecursion reports n * f(n-1, k-1), the falling factorial
// of k factors from n down, where the ranges of n and k let it leave
// its type: when k reaches n it is n! itself.
func (fc *fnCtx) checkFallingRecursion(ff *facFunc) {
	t := ff.result
	// k where the recursion multiplies: the parameter in f(n-1, k-1).
	lin, ok := fc.linear(ff.recCall.Args[ff.param2])
	if !ok || len(lin.Terms) != 1 {
		return
	}
	kID := identOf(fc.c.pass.TypesInfo, ff.recCall.Args[ff.param2], lin.Terms[0].Sym.Object)
	if kID == nil {
		return
	}
	n, k := fc.rangeOf(ff.recN), fc.rangeOf(kID)
	if n.IsEmpty() || k.IsEmpty() || bounded(n) && bounded(k) && thresholds.FallingFits(t.Num, n.Hi, min(k.Hi, n.Hi)) || fc.c.fallingCallsFit(ff) {
		return
	}
	nName, kName := src(ff.recN), kID.Name
	var msg string
	if finite(k) && k.Hi > 0 {
		msg = fmt.Sprintf("recursive falling factorial of %s factors from %s down in %s %s: with %s = %d, for %s ≥ %d", kName, nName, t.typeName(), verb(t), kName, k.Hi, nName, thresholds.FallingFirstBad(t.Num, k.Hi))
	} else {
		msg = fmt.Sprintf("recursive falling factorial of %s factors from %s down in %s %s: when %s = %s it is %s!, which %s for %s ≥ %d", kName, nName, t.typeName(), verb(t), kName, nName, nName, verb(t), nName, thresholds.Factorial(t.Num).FirstBad)
	}
	definite := n.Lo > 0 && k.Lo > 0 && n.Lo != math.MinInt64 && !thresholds.FallingFits(t.Num, n.Lo, min(k.Lo, n.Lo))
	switch {
	case definite:
		msg += fmt.Sprintf("; the product always exceeds %s here", t.Name)
	case !finite(n):
		msg += fmt.Sprintf("; %s is not bounded here", nName)
	case !finite(k):
		msg += fmt.Sprintf("; %s is not bounded here", kName)
	default:
		msg += fmt.Sprintf("; %s may reach %d and %s may reach %d here", nName, n.Hi, kName, k.Hi)
	}
	fc.report(finding{node: ff.rec, cat: catRecursion, definite: definite, msg: msg})
}

// fallingCallsFit reports whether every call of an unexported falling
// recursion, all of them in this package and none through a value of
// it, passes an n and a k whose ranges keep the product within its
// type: the recursion only steps both down from there.
func (c *checker) fallingCallsFit(ff *facFunc) bool {
	return c.callsFit(ff.obj, ff.decl, ff.param, ff.param2, func(n, k ranges.Interval) bool {
		return n.Lo >= 0 && thresholds.FallingFits(ff.result.Num, n.Hi, min(k.Hi, n.Hi))
	})
}

// callsFit reports whether fn is unexported, never used as a value, and
// called from outside its own body at least once, each call passing
// bounded ranges of its parameters ni and ki that fit accepts.
func (c *checker) callsFit(fn *types.Func, decl *ast.FuncDecl, ni, ki int, fit func(n, k ranges.Interval) bool) bool {
	if fn == nil || fn.Exported() {
		return false
	}
	calls := c.callsOf(fn)
	if c.funcs[fn] == nil {
		// Not a factorial function: the pass's index of calls does not
		// hold it (a binomial recursion, asked about rarely).
		calls = c.callsOfOther(fn)
	}
	if calls == nil {
		return false
	}
	outside := 0
	for _, call := range calls {
		if decl.Pos() <= call.Pos() && call.End() <= decl.End() {
			continue
		}
		outer := c.enclosingFunc(call)
		if outer == nil || max(ni, ki) >= len(call.Args) {
			return false
		}
		at := c.ctx(outer)
		n, k := at.rangeOf(call.Args[ni]), at.rangeOf(call.Args[ki])
		if !bounded(n) || !bounded(k) || !fit(n, k) {
			return false
		}
		outside++
	}
	return outside > 0
}

// checkBinomialRecursion reports the multiplicative binomial written as
// a recursion, return f(n-1, k-1) * n / k in a function that returns 1
// at k == 0, in an integer type: C(n−1, k−1)·n is formed before the
// division, as in the binomial loop's b*(n−k+i) (the same products, one
// per level), so it wraps while C(n, k) still fits. A recursion with no
// such return is left alone.
func (fc *fnCtx) checkBinomialRecursion(decl *ast.FuncDecl) {
	self, _ := fc.c.pass.TypesInfo.Defs[decl.Name].(*types.Func)
	if self == nil || decl.Body == nil {
		return
	}
	ast.Inspect(decl.Body, func(n ast.Node) bool {
		if _, ok := n.(*ast.FuncLit); ok {
			return false
		}
		ret, ok := n.(*ast.ReturnStmt)
		if !ok || len(ret.Results) != 1 {
			return true
		}
		quo, ok := fc.stripConv(ret.Results[0]).(*ast.BinaryExpr)
		if !ok || quo.Op != token.QUO {
			return true
		}
		mul, ok := ast.Unparen(quo.X).(*ast.BinaryExpr)
		if !ok || mul.Op != token.MUL {
			return true
		}
		fc.judgeBinomialRecursion(decl, self, mul, quo)
		return false
	})
}

// judgeBinomialRecursion judges mul = f(n-1, k-1) * n (either order)
// divided by k in quo.
func (fc *fnCtx) judgeBinomialRecursion(decl *ast.FuncDecl, self *types.Func, mul, quo *ast.BinaryExpr) {
	t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(quo))
	if !ok || t.Float {
		return // a float recursion: the value model's judgment
	}
	nExpr, idx, j, ok := fc.binomialRecursion(decl, self, mul, quo)
	if !ok {
		return
	}
	n, k := fc.rangeOf(nExpr), fc.rangeOf(fc.stripConv(quo.Y))
	if n.IsEmpty() || k.IsEmpty() || fc.binomialLoopSafe(t, n, k) ||
		fc.c.callsFit(self, decl, idx, j, func(n, k ranges.Interval) bool { return fc.binomialLoopSafe(t, n, k) }) {
		return
	}
	msg, definite := binomialProductText("recursion", t, src(mul), "the division by "+src(quo.Y), nExpr, n, k)
	fc.report(finding{node: mul, cat: catRecursion, definite: definite, msg: msg})
}

// binomialRecursion matches mul = f(n-1, k-1) * n (either order), with
// f the function itself, divided by k in quo, in a function that
// returns 1 at k == 0: C(n, k) = C(n−1, k−1)·n/k. It returns n's
// operand and the indices of n and k.
func (fc *fnCtx) binomialRecursion(decl *ast.FuncDecl, self *types.Func, mul, quo *ast.BinaryExpr) (ast.Expr, int, int, bool) {
	for _, pair := range [2][2]ast.Expr{{mul.X, mul.Y}, {mul.Y, mul.X}} {
		nExpr := fc.stripConv(pair[0])
		idx := fc.c.paramIndex(decl, fc.c.objOf(nExpr))
		call, ok := fc.stripConv(pair[1]).(*ast.CallExpr)
		if idx < 0 || !ok || fc.c.calleeOf(call) != self || idx >= len(call.Args) {
			continue
		}
		if d, ok := fc.paramShift(decl, call.Args[idx], idx); !ok || d != -1 {
			continue
		}
		j := fc.recursionCount(decl, call, idx)
		if j < 0 || fc.c.paramIndex(decl, fc.c.objOf(fc.stripConv(quo.Y))) != j {
			continue
		}
		return nExpr, idx, j, true
	}
	return nil, -1, -1, false
}

// recursionGuardExact reports whether a guard at the function's entry,
// n ≥ first, fires exactly where the recursion's result leaves its type:
// the recursive return gives the product itself (times a positive
// constant, not n*f(n-1) % m), and every other return is a base case, a
// constant of 1 or more reached only for n ≤ 1, so that the value at n is
// n! (or n!!) times that constant. A return for large n (if n > 100 {
// return 0 }) keeps the guard out: it would fire where 0 was returned.
func (fc *fnCtx) recursionGuardExact(ff *facFunc, first int64) bool {
	p := fc.c.objOf(ff.recN)
	ok, found := p != nil, false
	ast.Inspect(ff.decl.Body, func(n ast.Node) bool {
		ret, isRet := n.(*ast.ReturnStmt)
		switch {
		case !ok:
			return false
		case !isRet:
			_, lit := n.(*ast.FuncLit)
			return !lit
		case len(ret.Results) != 1:
			ok = false
		case fc.timesConst(ret.Results[0], func(e ast.Expr) bool { return e == ff.rec }):
			found = true
		default:
			c, isConst := fc.intConst(ret.Results[0])
			iv := fc.entryRange(p, ret)
			ok = iv.IsEmpty() || isConst && c >= 1 && iv.Hi <= 1
		}
		return false
	})
	return ok && found
}

// callsOfOther returns the calls of fn in the package, or nil when fn
// is also used as a value (then it may be called from anywhere).
func (c *checker) callsOfOther(fn *types.Func) []*ast.CallExpr {
	var calls []*ast.CallExpr
	called := make(map[*ast.Ident]bool)
	for _, f := range c.pass.Files {
		ast.Inspect(f, func(n ast.Node) bool {
			if call, ok := n.(*ast.CallExpr); ok && c.calleeOf(call) == fn {
				calls = append(calls, call)
				if id, ok := ast.Unparen(call.Fun).(*ast.Ident); ok {
					called[id] = true
				}
			}
			return true
		})
	}
	for id, obj := range c.pass.TypesInfo.Uses {
		if obj == fn && !called[id] {
			return nil
		}
	}
	return calls
}
