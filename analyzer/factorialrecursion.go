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
	if ff.kind != kindFactorial && ff.kind != kindDouble {
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
	return ff
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
