package analyzer

import (
	"go/ast"
	"go/token"
	"go/types"

	"github.com/overfact/overfact/fixes"
)

// The factorial-recursion category: a function that returns n times
// itself at n-1, found in phase 1 (recursionOf) and reported where its
// parameter is not bounded below its first bad value.

// checkRecursion reports a recursive factorial whose parameter is not
// bounded below the first value that breaks its result type.
func (fc *fnCtx) checkRecursion(ff *facFunc) {
	// The analysis of this pass has its own ranges; ff.recN is the same
	// node in both, so asking for its range here is sound.
	if fc.decidedAtCalls(ff.rec) {
		return
	}
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
			if b, ok := m.(*ast.BinaryExpr); ok && b.Op == token.MUL && ff == nil {
				ff = fc.recursiveProduct(decl, self, b)
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
		cand := fc.recursiveProduct(decl, self, b)
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

func (fc *fnCtx) recursiveProduct(decl *ast.FuncDecl, self *types.Func, b *ast.BinaryExpr) *facFunc {
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
