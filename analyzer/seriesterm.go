package analyzer

import (
	"go/ast"
	"go/token"
	"go/types"

	"github.com/overfact/overfact/fixes"
)

// seriesTermMatch describes a float factorial loop whose product is read
// once, as the divisor of math.Pow(x, k) on the same trip after its
// update: the term x^k/k! of a series summed in the loop (e^x, Poisson
// and Erlang sums). The loop is reported as a factorial loop; its fix
// keeps the loop and takes the term from the helper, dropping the
// running factorial. The fixes package checks the whole shape again.
func (fc *fnCtx) seriesTermMatch(al *accLoop) *fixes.Match {
	if al.kind != kindFactorial || al.accInit == nil || al.shape.iv == nil {
		return nil
	}
	info := fc.c.pass.TypesInfo
	t, ok := info.TypeOf(al.update.(*ast.AssignStmt).Lhs[0]).Underlying().(*types.Basic)
	if !ok || t.Kind() != types.Float64 {
		return nil
	}
	var term *ast.BinaryExpr
	reads := 0
	ast.Inspect(al.shape.body, func(n ast.Node) bool {
		if n == al.update {
			return false
		}
		q, ok := n.(*ast.BinaryExpr)
		if ok && q.Op == token.QUO && fc.c.objOf(ast.Unparen(q.Y)) == al.acc && q.Pos() > al.update.End() {
			term = q
		}
		if id, ok := n.(*ast.Ident); ok && info.Uses[id] == al.acc {
			reads++
		}
		return true
	})
	// Past its update, the loop reads the accumulator in the term alone.
	if term == nil || reads != 1 {
		return nil
	}
	// The fixes package knows the numerators it can rewrite (a power of
	// the counter, a Poisson term, a running power); asking it to build
	// a fix costs a type-check, so only those that can be one are passed.
	if !fc.powOfCounter(term.X, al.shape.iv) {
		if _, ok := ast.Unparen(term.X).(*ast.Ident); !ok {
			return nil
		}
	}
	return &fixes.Match{
		Shape:   fixes.ShapeSeriesTerm,
		Node:    term,
		Result:  info.TypeOf(term),
		Acc:     al.acc,
		AccInit: al.accInit,
		Loop:    al.shape.stmt,
		Func:    fc.node,
	}
}

// powOfCounter reports whether e holds math.Pow(·, iv) among the
// factors it multiplies.
func (fc *fnCtx) powOfCounter(e ast.Expr, iv types.Object) bool {
	switch e := ast.Unparen(e).(type) {
	case *ast.BinaryExpr:
		return e.Op == token.MUL && (fc.powOfCounter(e.X, iv) || fc.powOfCounter(e.Y, iv))
	case *ast.CallExpr:
		return fc.c.isMathFunc(e, "Pow") && len(e.Args) == 2 && fc.c.objOf(fc.stripConv(e.Args[1])) == iv
	}
	return false
}
