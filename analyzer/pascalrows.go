package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"

	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/internal/assigned"
)

// Pascal's triangle built one row from the last, in two one-dimensional
// tables (common practice):
//
//	row := []uint64{1}
//	for i := 1; i <= n; i++ {
//		next := make([]uint64, i+1)
//		next[0], next[i] = 1, 1
//		for j := 1; j < i; j++ {
//			next[j] = row[j-1] + row[j]
//		}
//		row = next
//	}
//
// Row i holds C(i, j); its central entry leaves an integer type first
// (thresholds.CentralBinomial: row 67 for int64) and the rows after add
// the wrapped entries on. Read only as written here: the first row the
// one entry 1, the rows counted one by one from 1, both edges set to 1
// and every inner entry from the row before, nothing else in the inner
// loop, and the new row taking the old one's place at the end of the
// body. Reported as pascal-rule; no fix.

// checkPascalRows reports the Pascal rows body builds.
func (fc *fnCtx) checkPascalRows(body *ast.BlockStmt) {
	blockLoops(body, fc.judgePascalRows)
}

// judgePascalRows judges outer as the rows of Pascal's triangle.
func (fc *fnCtx) judgePascalRows(before []ast.Stmt, outer *ast.ForStmt) {
	counter, start, ok := fc.unitCounter(outer)
	if !ok || start != 1 || len(outer.Body.List) < 2 {
		return
	}
	rowEnd, rowAdj, ok := fc.upperEnd(outer.Cond, counter)
	if !ok {
		return
	}
	list := outer.Body.List
	// The new row takes the old one's place last: row = next.
	last, ok := list[len(list)-1].(*ast.AssignStmt)
	if !ok || last.Tok != token.ASSIGN || len(last.Lhs) != 1 || len(last.Rhs) != 1 {
		return
	}
	prev, next := fc.c.objOf(last.Lhs[0]), fc.c.objOf(last.Rhs[0])
	if prev == nil || next == nil || prev == next {
		return
	}
	var step *ast.AssignStmt
	for _, st := range list[:len(list)-1] {
		inner, ok := st.(*ast.ForStmt)
		if !ok {
			continue
		}
		if s, ok := fc.pascalRowStep(inner, counter, prev, next); ok {
			step = s
		}
	}
	if step == nil || !fc.onesOnEdges(list, counter, next) || !fc.startsWithOne(before, prev) {
		return
	}
	// Only these statements write the rows.
	info := fc.c.pass.TypesInfo
	for _, v := range []types.Object{prev, next} {
		clean := true
		assigned.EachTarget(outer.Body, nil, func(target ast.Expr, at ast.Node) bool {
			root := assigned.Root(target)
			if root == nil || info.ObjectOf(root) != v || at == step || at == last {
				return true
			}
			ix, isIndex := ast.Unparen(target).(*ast.IndexExpr)
			switch {
			case v == next && isIndex && fc.c.objOf(ix.X) == next:
				// An edge, checked by onesOnEdges.
			case v == next && ast.Unparen(target) == root:
				as, ok := at.(*ast.AssignStmt)
				clean = ok && len(as.Rhs) == 1 && isMake(info, as.Rhs[0])
			default:
				clean = false
			}
			return clean
		})
		if !clean {
			return
		}
	}
	t, ok := fc.c.numOf(info.TypeOf(step.Lhs[0]))
	if !ok || t.Float {
		return
	}
	first := thresholds.CentralBinomial(t.Num)
	bad := first.FirstBad - rowAdj
	j := fc.judge(rowEnd, bad)
	if j.silent {
		return
	}
	r := counter.Name
	msg := fmt.Sprintf("rows %s and %s are built by Pascal's rule (%s) in %s: with ones on the edges row %s holds C(%s, ·), whose central entry %s from row %d (C(%d, %d) ≈ %s is the largest central one that fits), so once %s reaches %d, and the rows after add the wrapped entries on",
		prev.Name(), next.Name(), stepText(step), t.typeName(), r, r, verb(t), first.FirstBad, first.FirstBad-1, (first.FirstBad-1)/2, first.LastGoodApprox(), src(rowEnd), bad)
	fc.report(finding{node: outer, cat: catPascal, definite: j.definite, msg: msg + j.clause})
}

// pascalRowStep reads inner as for j := 1; j < i; j++ (or j <= i-1) {
// next[j] = prev[j-1] + prev[j] }, either order.
func (fc *fnCtx) pascalRowStep(inner *ast.ForStmt, counter *ast.Ident, prev, next types.Object) (*ast.AssignStmt, bool) {
	jv, from, ok := fc.unitCounter(inner)
	if !ok || from != 1 || len(inner.Body.List) != 1 {
		return nil, false
	}
	end, adj, ok := fc.upperEnd(inner.Cond, jv)
	if !ok {
		return nil, false
	}
	if d, ok := fc.shiftOf(end, counter); !ok || d+adj != -1 {
		return nil, false
	}
	as, ok := inner.Body.List[0].(*ast.AssignStmt)
	if !ok || as.Tok != token.ASSIGN || len(as.Lhs) != 1 || len(as.Rhs) != 1 {
		return nil, false
	}
	lhs, ok := as.Lhs[0].(*ast.IndexExpr)
	sum, ok2 := ast.Unparen(as.Rhs[0]).(*ast.BinaryExpr)
	if !ok || !ok2 || sum.Op != token.ADD || fc.c.objOf(lhs.X) != next || fc.c.objOf(lhs.Index) != fc.c.objOf(jv) {
		return nil, false
	}
	x, okX := ast.Unparen(sum.X).(*ast.IndexExpr)
	y, okY := ast.Unparen(sum.Y).(*ast.IndexExpr)
	if !okX || !okY || fc.c.objOf(x.X) != prev || fc.c.objOf(y.X) != prev {
		return nil, false
	}
	dx, ok1 := fc.shiftOf(x.Index, jv)
	dy, ok2 := fc.shiftOf(y.Index, jv)
	if !ok1 || !ok2 || dx+dy != -1 || dx*dy != 0 {
		return nil, false
	}
	return as, true
}

// onesOnEdges reports whether list sets next[0] and next[i] to 1.
func (fc *fnCtx) onesOnEdges(list []ast.Stmt, counter *ast.Ident, next types.Object) bool {
	low, high := false, false
	for _, st := range list {
		as, ok := st.(*ast.AssignStmt)
		if !ok || as.Tok != token.ASSIGN || len(as.Lhs) != len(as.Rhs) {
			continue
		}
		for i, l := range as.Lhs {
			ix, ok := l.(*ast.IndexExpr)
			if v, isConst := fc.c.queries().intConst(as.Rhs[i]); !ok || fc.c.objOf(ix.X) != next || !isConst || v != 1 {
				continue
			}
			if at, ok := fc.c.queries().intConst(ix.Index); ok && at == 0 {
				low = true
			}
			if d, ok := fc.shiftOf(ix.Index, counter); ok && d == 0 {
				high = true
			}
		}
	}
	return low && high
}

// startsWithOne reports whether the last statement of before that
// writes prev makes it the one entry 1: prev := []T{1}.
func (fc *fnCtx) startsWithOne(before []ast.Stmt, prev types.Object) bool {
	info := fc.c.pass.TypesInfo
	for k := len(before) - 1; k >= 0; k-- {
		if !assigned.In(info, before[k], prev, nil) {
			continue
		}
		as, ok := before[k].(*ast.AssignStmt)
		if !ok || len(as.Lhs) != 1 || len(as.Rhs) != 1 || fc.c.objOf(as.Lhs[0]) != prev {
			return false
		}
		lit, ok := ast.Unparen(as.Rhs[0]).(*ast.CompositeLit)
		if !ok || len(lit.Elts) != 1 {
			return false
		}
		v, ok := fc.c.queries().intConst(lit.Elts[0])
		return ok && v == 1
	}
	return false
}
