package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"slices"

	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/internal/assigned"
)

// A recurrence over the two values before it, kept in two rolling
// variables instead of a table (common practice for derangements,
// OEIS A000166):
//
//	a, b := int64(1), int64(0) // D(0), D(1)
//	for i := 2; i <= n; i++ {
//		a, b = b, int64(i-1)*(a+b)
//	}
//
// or with the new value named first (next := (i-1)*(a+b); a, b = b,
// next, or a = b; b = next). Each step's product x_i = (i+c)·(x_{i−1} + x_{i−2}) grows like
// a factorial whatever the starting values, so it leaves an integer type
// within a few dozen steps (thresholds.PairRecurrence simulates the
// sequence from the code's own constants) and the steps after carry the
// wrapped value on. Reported as factorial-loop, as the table form is
// (derangement.go). Only loops that count one by one from a constant,
// with the pair's starting values constants assigned before the loop,
// the pair changed by this statement alone, and no way out of the body
// (a return, break or panic may be a check before the step) are read;
// floats are left alone (their +Inf is IEEE's answer). No fix: no
// integer type holds the values past the first that wraps.

// checkPairRecurrences reports the rolling pair recurrences of body.
func (fc *fnCtx) checkPairRecurrences(body *ast.BlockStmt) {
	blockLoops(body, fc.judgePairLoop)
}

// blockLoops calls f with each for statement of body outside closures
// and the statements before it in its block, where the values it
// starts from are set.
func blockLoops(body *ast.BlockStmt, f func(before []ast.Stmt, loop *ast.ForStmt)) {
	ast.Inspect(body, func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.FuncLit:
			return false
		case *ast.BlockStmt:
			for k, st := range n.List {
				if loop, ok := st.(*ast.ForStmt); ok {
					f(n.List[:k], loop)
				}
			}
		}
		return true
	})
}

// pairStep is one step a, b = b, w·(a+b) of a loop: the variable that
// takes the old newer value, the one that takes the new value, the
// weight and the loop counter.
type pairStep struct {
	stmt          *ast.AssignStmt // the step as one parallel assignment
	writes        []ast.Node      // the statements that write the pair
	older, newer  types.Object
	mul           *ast.BinaryExpr
	weight        ast.Expr
	counterIdent  *ast.Ident
	start, offset int64
}

// judgePairLoop judges the steps of loop, before holding the statements
// that run before it in its block.
func (fc *fnCtx) judgePairLoop(before []ast.Stmt, loop *ast.ForStmt) {
	counter, start, ok := fc.unitCounter(loop)
	if !ok || loopMayLeave(loop.Body) {
		return
	}
	list := loop.Body.List
	for k, st := range list {
		var prev ast.Stmt
		if k > 0 {
			prev = list[k-1]
		}
		as, writes := asPairStep(st, list[k+1:])
		if as == nil {
			continue
		}
		ps, ok := fc.pairStepOf(as, prev, counter)
		if !ok {
			continue
		}
		ps.start, ps.writes = start, writes
		fc.judgePairStep(before, loop, ps)
	}
}

// asPairStep returns st as a parallel assignment a, b = b, x, and the
// statements that write the pair: st itself, or st and the statement
// after it when they roll the pair one after the other, a = b; b = x
// (x a variable, so that b's old value is not read after a changed).
func asPairStep(st ast.Stmt, after []ast.Stmt) (*ast.AssignStmt, []ast.Node) {
	as, ok := st.(*ast.AssignStmt)
	if !ok || as.Tok != token.ASSIGN {
		return nil, nil
	}
	if len(as.Lhs) == 2 && len(as.Rhs) == 2 {
		return as, []ast.Node{as}
	}
	if len(as.Lhs) != 1 || len(as.Rhs) != 1 || len(after) == 0 {
		return nil, nil
	}
	next, ok := after[0].(*ast.AssignStmt)
	if !ok || next.Tok != token.ASSIGN || len(next.Lhs) != 1 || len(next.Rhs) != 1 {
		return nil, nil
	}
	a, okA := as.Lhs[0].(*ast.Ident)
	b, okB := as.Rhs[0].(*ast.Ident)
	b2, okB2 := next.Lhs[0].(*ast.Ident)
	x, okX := next.Rhs[0].(*ast.Ident)
	if !okA || !okB || !okB2 || !okX || b.Name != b2.Name || a.Name == b.Name || x.Name == a.Name || x.Name == b.Name {
		return nil, nil
	}
	return &ast.AssignStmt{Lhs: []ast.Expr{a, b2}, TokPos: next.TokPos, Tok: token.ASSIGN, Rhs: []ast.Expr{b, x}}, []ast.Node{as, next}
}

// unitCounter returns the counter of for i := C; …; i++ and C.
func (fc *fnCtx) unitCounter(loop *ast.ForStmt) (*ast.Ident, int64, bool) {
	init, ok := loop.Init.(*ast.AssignStmt)
	post, ok2 := loop.Post.(*ast.IncDecStmt)
	if !ok || !ok2 || post.Tok != token.INC || len(init.Lhs) != 1 || len(init.Rhs) != 1 {
		return nil, 0, false
	}
	id, ok := init.Lhs[0].(*ast.Ident)
	obj := fc.c.objOf(id)
	if !ok || obj == nil || fc.c.objOf(post.X) != obj {
		return nil, 0, false
	}
	start, ok := fc.c.queries().intConst(init.Rhs[0])
	if !ok || assigned.In(fc.c.pass.TypesInfo, loop.Body, obj, nil) {
		return nil, 0, false
	}
	return id, start, true
}

// loopMayLeave reports whether body holds a return, a break, a goto, a
// continue or a call of panic: a check before the step may keep it from
// wrapping, and a skipped step changes the sequence.
func loopMayLeave(body *ast.BlockStmt) bool {
	leaves := false
	ast.Inspect(body, func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.FuncLit:
			return false
		case *ast.ReturnStmt:
			leaves = true
		case *ast.BranchStmt:
			leaves = leaves || n.Tok != token.FALLTHROUGH
		case *ast.CallExpr:
			if id, ok := n.Fun.(*ast.Ident); ok && id.Name == "panic" {
				leaves = true
			}
		}
		return !leaves
	})
	return leaves
}

// pairStepOf reads as as a, b = b, w·(a+b) (or b, a = w·(a+b), b), the
// new value written in place or as a variable prev defines from it.
func (fc *fnCtx) pairStepOf(as *ast.AssignStmt, prev ast.Stmt, counter *ast.Ident) (pairStep, bool) {
	var ps pairStep
	o0, o1 := fc.c.objOf(as.Lhs[0]), fc.c.objOf(as.Lhs[1])
	if o0 == nil || o1 == nil || o0 == o1 {
		return ps, false
	}
	var next ast.Expr
	switch {
	case fc.c.objOf(as.Rhs[0]) == o1:
		ps.older, ps.newer, next = o0, o1, as.Rhs[1]
	case fc.c.objOf(as.Rhs[1]) == o0:
		ps.older, ps.newer, next = o1, o0, as.Rhs[0]
	default:
		return ps, false
	}
	if v := fc.c.objOf(next); v != nil {
		def, ok := prev.(*ast.AssignStmt)
		if !ok || def.Tok != token.DEFINE || len(def.Lhs) != 1 || len(def.Rhs) != 1 || fc.c.objOf(def.Lhs[0]) != v {
			return ps, false
		}
		next = def.Rhs[0]
	}
	mul, ok := ast.Unparen(next).(*ast.BinaryExpr)
	if !ok || mul.Op != token.MUL {
		return ps, false
	}
	for _, pair := range [2][2]ast.Expr{{mul.X, mul.Y}, {mul.Y, mul.X}} {
		sum, ok := ast.Unparen(pair[1]).(*ast.BinaryExpr)
		if !ok || sum.Op != token.ADD {
			continue
		}
		x, y := fc.c.objOf(sum.X), fc.c.objOf(sum.Y)
		if !(x == ps.older && y == ps.newer || x == ps.newer && y == ps.older) {
			continue
		}
		off, ok := fc.shiftOf(fc.stripConv(pair[0]), counter)
		if !ok {
			continue
		}
		ps.stmt, ps.mul, ps.weight, ps.counterIdent, ps.offset = as, mul, pair[0], counter, off
		return ps, true
	}
	return ps, false
}

// judgePairStep reports ps where the counter may reach the first step
// that leaves the type.
func (fc *fnCtx) judgePairStep(before []ast.Stmt, loop *ast.ForStmt, ps pairStep) {
	t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(ps.mul))
	if !ok || t.Float {
		return
	}
	info := fc.c.pass.TypesInfo
	// The pair changes in the loop only at this step (and its counter
	// condition does not read it: a bound on the values may stop the
	// loop before it wraps).
	for _, v := range []types.Object{ps.older, ps.newer} {
		writes := func(n ast.Node) bool { return slices.Contains(ps.writes, n) }
		if assigned.In(info, loop.Body, v, writes) || loop.Cond != nil && mentions(info, loop.Cond, v) {
			return
		}
	}
	older, ok1 := fc.valueBefore(before, ps.older)
	newer, ok2 := fc.valueBefore(before, ps.newer)
	if !ok1 || !ok2 {
		return
	}
	first := thresholds.PairRecurrence(t.Num, older, newer, ps.start, ps.offset)
	if first.None() {
		return
	}
	iv := fc.rangeOf(counterUse(info, ps.weight, ps.counterIdent))
	if iv.IsEmpty() || iv.Hi < first.FirstBad {
		return
	}
	name := ps.counterIdent.Name
	clause, definite := verdict(name, iv, first.FirstBad)
	what := fmt.Sprintf("the sequence x(%s) = %s", name, src(ps.mul))
	last := fmt.Sprintf("x(%d)", first.FirstBad-1)
	switch thresholds.NamePair(older, newer, ps.start, ps.offset) {
	case thresholds.PairDerangements:
		what = fmt.Sprintf("the derangement numbers D(%s) = (%s-1)·(D(%s-1) + D(%s-2))", name, name, name, name)
		last = fmt.Sprintf("D(%d)", first.FirstBad-1)
	case thresholds.PairFactorials:
		what = fmt.Sprintf("the factorials %s! = (%s-1)·((%s-1)! + (%s-2)!)", name, name, name, name)
		last = fmt.Sprintf("%d!", first.FirstBad-1)
	}
	step := fmt.Sprintf("%s, %s = %s, %s", src(ps.stmt.Lhs[0]), src(ps.stmt.Lhs[1]), src(ps.stmt.Rhs[0]), src(ps.stmt.Rhs[1]))
	msg := fmt.Sprintf("rolling pair %s computes %s in %s: the step at %s = %d %s (%s ≈ %s is the largest that fits), and the steps after it carry the wrapped value on",
		step, what, t.typeName(), name, first.FirstBad, verb(t), last, first.LastGoodApprox())
	fc.report(finding{node: ps.writes[len(ps.writes)-1], cat: catLoop, definite: definite, msg: msg + clause})
}

// counterUse returns the first use of the counter in e (its range there
// is the counter's in the loop body), or the counter's declaration.
func counterUse(info *types.Info, e ast.Expr, counter *ast.Ident) ast.Expr {
	obj := info.ObjectOf(counter)
	var use ast.Expr = counter
	ast.Inspect(e, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok && info.ObjectOf(id) == obj && use == counter {
			use = id
		}
		return use == counter
	})
	return use
}

// valueBefore returns the constant v holds after stmts, when the last of
// them to change v assigns it a constant (a, b := 1, 0; var a int64 = 1;
// var b int64) and v is declared among them.
func (fc *fnCtx) valueBefore(stmts []ast.Stmt, v types.Object) (int64, bool) {
	info := fc.c.pass.TypesInfo
	for k := len(stmts) - 1; k >= 0; k-- {
		switch st := stmts[k].(type) {
		case *ast.AssignStmt:
			if st.Tok != token.ASSIGN && st.Tok != token.DEFINE {
				break
			}
			for i, l := range st.Lhs {
				if fc.c.objOf(l) == v {
					if len(st.Lhs) != len(st.Rhs) {
						return 0, false
					}
					return fc.c.queries().intConst(st.Rhs[i])
				}
			}
		case *ast.DeclStmt:
			gd, ok := st.Decl.(*ast.GenDecl)
			if !ok || gd.Tok != token.VAR {
				break
			}
			for _, sp := range gd.Specs {
				vs := sp.(*ast.ValueSpec)
				for i, id := range vs.Names {
					if info.Defs[id] != v {
						continue
					}
					switch len(vs.Values) {
					case 0:
						return 0, true
					case len(vs.Names):
						return fc.c.queries().intConst(vs.Values[i])
					}
					return 0, false
				}
			}
		}
		if assigned.In(info, stmts[k], v, nil) {
			return 0, false
		}
	}
	return 0, false
}
