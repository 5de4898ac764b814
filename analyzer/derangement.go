package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/analyzer/thresholds"
)

// Derangement numbers, the permutations of n items that fix none, are
// counted by the recurrence D(n) = (n−1)·(D(n−1) + D(n−2)) (OEIS
// A000166; common practice), written as a recursion
//
//	func derangements(n int) int64 {
//		if n < 2 {
//			return 1 - int64(n)
//		}
//		return int64(n-1) * (derangements(n-1) + derangements(n-2))
//	}
//
// or as a table, d[i] = (i-1) * (d[i-1] + d[i-2]). D(n) is about n!/e,
// and each step's product is D(n) itself: it wraps silently where D(n)
// leaves an integer type (thresholds.Derangement: n = 21 for int64) and
// the later steps carry the wrapped value on. The recursion is reported
// as factorial-recursion, the table as factorial-loop; floats are left
// alone (their +Inf is IEEE's answer past float64), and so is a step
// reduced modulo something. No fix: no integer type holds D(21).

// judgeDerangementRecursion judges mul = (n−1)·(f(n−1) + f(n−2)), either
// order, every other argument of the two calls passed through.
func (fc *fnCtx) judgeDerangementRecursion(decl *ast.FuncDecl, self *types.Func, mul *ast.BinaryExpr) bool {
	t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(mul))
	if !ok || t.Float {
		return false
	}
	for _, pair := range [2][2]ast.Expr{{mul.X, mul.Y}, {mul.Y, mul.X}} {
		sum, ok := ast.Unparen(pair[1]).(*ast.BinaryExpr)
		if !ok || sum.Op != token.ADD {
			continue
		}
		a, okA := fc.stripConv(sum.X).(*ast.CallExpr)
		b, okB := fc.stripConv(sum.Y).(*ast.CallExpr)
		if !okA || !okB || fc.c.calleeOf(a) != self || fc.c.calleeOf(b) != self || len(a.Args) != len(b.Args) {
			continue
		}
		ni := -1
		for i := range a.Args {
			da, okA := fc.paramShift(decl, a.Args[i], i)
			db, okB := fc.paramShift(decl, b.Args[i], i)
			switch {
			case !okA || !okB:
				ni = -2
			case da+db == -3 && da*db == 2 && ni == -1:
				ni = i
			case da != 0 || db != 0:
				ni = -2
			}
			if ni == -2 {
				break
			}
		}
		if ni < 0 {
			continue
		}
		if d, ok := fc.paramShift(decl, pair[0], ni); !ok || d != -1 {
			continue
		}
		nObj := self.Type().(*types.Signature).Params().At(ni)
		if nObj.Name() == "" || nObj.Name() == "_" {
			return false
		}
		first := thresholds.Derangement(t.Num)
		n := fc.entryRange(nObj, mul)
		if n.IsEmpty() || n.Hi < first.FirstBad || fc.c.callsFit(self, decl, ni, ni, func(n, _ ranges.Interval) bool { return !n.IsEmpty() && n.Hi < first.FirstBad }) {
			return true
		}
		clause, definite := verdict(nObj.Name(), n, first.FirstBad)
		msg := fmt.Sprintf("recursion computes the derangement number D(%s) = (%s-1)·(D(%s-1) + D(%s-2)) in %s: it %s for %s ≥ %d (D(%d) ≈ %s is the largest that fits), and every call above it carries the wrapped value on",
			nObj.Name(), nObj.Name(), nObj.Name(), nObj.Name(), t.typeName(), verb(t), nObj.Name(), first.FirstBad, first.FirstBad-1, first.LastGoodApprox())
		fc.report(finding{node: mul, cat: catRecursion, definite: definite, msg: msg + clause})
		return true
	}
	return false
}

// judgeDerangementTable judges one table step (tableStep) d[I] = (I−1)·(d[I−1] + d[I−2]).
func (fc *fnCtx) judgeDerangementTable(as *ast.AssignStmt) {
	mul, ok := ast.Unparen(as.Rhs[0]).(*ast.BinaryExpr)
	if !ok || mul.Op != token.MUL {
		return
	}
	t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(mul))
	if !ok || t.Float {
		return
	}
	lhs, ok := as.Lhs[0].(*ast.IndexExpr)
	if !ok {
		return
	}
	for _, pair := range [2][2]ast.Expr{{mul.X, mul.Y}, {mul.Y, mul.X}} {
		sum, ok := ast.Unparen(pair[1]).(*ast.BinaryExpr)
		if !ok || sum.Op != token.ADD {
			continue
		}
		x, okX := ast.Unparen(sum.X).(*ast.IndexExpr)
		y, okY := ast.Unparen(sum.Y).(*ast.IndexExpr)
		if !okX || !okY || src(x.X) != src(lhs.X) || src(y.X) != src(lhs.X) {
			continue
		}
		dx, ok1 := fc.shiftOf(x.Index, lhs.Index)
		dy, ok2 := fc.shiftOf(y.Index, lhs.Index)
		dm, ok3 := fc.shiftOf(fc.stripConv(pair[0]), lhs.Index)
		if !ok1 || !ok2 || !ok3 || dx+dy != -3 || dx*dy != 2 || dm != -1 {
			continue
		}
		first := thresholds.Derangement(t.Num)
		iv := fc.rangeOf(lhs.Index)
		if iv.IsEmpty() || iv.Hi < first.FirstBad {
			return
		}
		name := src(lhs.Index)
		clause, definite := verdict(name, iv, first.FirstBad)
		msg := fmt.Sprintf("table %s is filled with derangement numbers, %s = %s, in %s: the entry %s wraps for %s ≥ %d (D(%d) ≈ %s is the largest that fits), and the entries after it carry the wrapped value on",
			src(lhs.X), src(lhs), src(mul), t.typeName(), src(lhs), name, first.FirstBad, first.FirstBad-1, first.LastGoodApprox())
		fc.report(finding{node: as, cat: catLoop, definite: definite, msg: msg + clause})
		return
	}
}
