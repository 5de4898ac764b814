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
		if ok && q.Op == token.QUO && fc.c.objOf(unparen(q.Y)) == al.acc && q.Pos() > al.update.End() {
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
	pow, ok := unparen(term.X).(*ast.CallExpr)
	if !ok || !fc.c.isMathFunc(pow, "Pow") || len(pow.Args) != 2 || fc.c.objOf(fc.stripConv(pow.Args[1])) != al.shape.iv {
		return nil
	}
	return &fixes.Match{
		Shape:   fixes.ShapeSeriesTerm,
		Node:    term,
		Args:    []ast.Expr{pow.Args[0], fc.stripConv(pow.Args[1])},
		Result:  info.TypeOf(term),
		Acc:     al.acc,
		AccInit: al.accInit,
		Loop:    al.shape.stmt,
		Func:    fc.node,
	}
}
