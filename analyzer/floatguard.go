package analyzer

import (
	"go/ast"
	"go/token"
	"go/types"
	"math"

	"github.com/overfact/overfact/internal/assigned"
	"github.com/overfact/overfact/internal/astpath"
	"github.com/overfact/overfact/internal/tokenop"
)

// floatBounds returns the bounds that the code around id puts on the
// float variable id names there: an early exit before it (if p >= 10 {
// return … }, so p < 10 after it) or a condition it lies under (if q <
// 10 { … use … }), each against a constant. The integer ranges package
// does not follow floats; Gamma arguments often are floats bounded this
// way (a log-Beta that switches to an asymptotic form for p ≥ 10).
//
// A bound counts only where the variable cannot change after the
// statement that gives it: no assignment to it lies after that point in
// the function, none lies in a function literal, and its address is
// never taken. A NaN passes every such test, but Γ(NaN) is NaN, never an
// overflow, so the bounds serve the Gamma checks all the same.
//
// Special cases are:
//
//	no guard or condition, or a variable that may change: [−Inf, +Inf]
func (fc *fnCtx) floatBounds(id *ast.Ident) (lo, hi float64) {
	lo, hi = math.Inf(-1), math.Inf(1)
	v, ok := fc.c.objOf(id).(*types.Var)
	if !ok || fc.file == nil {
		return lo, hi
	}
	last, ok := fc.lastWrite(v)
	if !ok {
		return lo, hi
	}
	apply := func(cond ast.Expr, holds bool, from token.Pos) {
		if last > from {
			return
		}
		for _, c := range fc.comparisons(cond, holds, v) {
			lo, hi = math.Max(lo, c.lo), math.Min(hi, c.hi)
		}
	}
	path, _ := astpath.Enclosing(fc.file.file, id.Pos(), id.End())
	for i := 1; i < len(path); i++ {
		child := path[i-1]
		switch p := path[i].(type) {
		case *ast.FuncDecl, *ast.FuncLit:
			return lo, hi
		case *ast.IfStmt:
			switch child {
			case p.Body:
				apply(p.Cond, true, p.Cond.End())
			case p.Else:
				apply(p.Cond, false, p.Cond.End())
			}
		case *ast.BlockStmt:
			for _, st := range p.List {
				if st.Pos() >= child.Pos() {
					break
				}
				if s, ok := st.(*ast.IfStmt); ok && s.Else == nil && fc.exits(s.Body) {
					apply(s.Cond, false, s.End())
				}
			}
		}
	}
	return lo, hi
}

// lastWrite returns the position of the last assignment to v in the
// function, or false when v is written in a function literal or has its
// address taken, so that no position bounds its changes.
func (fc *fnCtx) lastWrite(v *types.Var) (token.Pos, bool) {
	var last token.Pos
	ok := true
	var closures []*ast.FuncLit
	ast.Inspect(fc.node, func(n ast.Node) bool {
		if lit, isLit := n.(*ast.FuncLit); isLit && n != fc.node {
			closures = append(closures, lit)
		}
		return true
	})
	inClosure := func(n ast.Node) bool {
		for _, lit := range closures {
			if lit.Pos() <= n.Pos() && n.End() <= lit.End() {
				return true
			}
		}
		return false
	}
	assigned.Each(fc.c.pass.TypesInfo, fc.node, nil, func(w types.Object, at ast.Node) bool {
		if w != v {
			return true
		}
		switch as, isAs := at.(*ast.AssignStmt); {
		case inClosure(at):
			ok = false
		case isAs && fc.c.declares(as, v):
			// its definition, not a change
		default:
			if _, isAddr := at.(*ast.UnaryExpr); isAddr {
				ok = false
			} else if at.Pos() > last {
				last = at.Pos()
			}
		}
		return ok
	})
	return last, ok
}

type floatRange struct{ lo, hi float64 }

// comparisons returns the bounds on v that cond (or, with holds false,
// its negation) implies: v against a constant, joined by && (or by ||
// under a negation).
func (fc *fnCtx) comparisons(cond ast.Expr, holds bool, v *types.Var) []floatRange {
	switch c := ast.Unparen(cond).(type) {
	case *ast.UnaryExpr:
		if c.Op == token.NOT {
			return fc.comparisons(c.X, !holds, v)
		}
	case *ast.BinaryExpr:
		switch {
		case c.Op == token.LAND && holds, c.Op == token.LOR && !holds:
			return append(fc.comparisons(c.X, holds, v), fc.comparisons(c.Y, holds, v)...)
		case c.Op == token.LAND, c.Op == token.LOR:
			return nil
		}
		op, x, k := c.Op, c.X, c.Y
		if fc.c.objOf(fc.stripConv(ast.Unparen(x))) != v {
			op, x, k = tokenop.Flip(op), c.Y, c.X
		}
		if fc.c.objOf(fc.stripConv(ast.Unparen(x))) != v {
			return nil
		}
		bound, ok := fc.floatConst(k)
		if !ok {
			return nil
		}
		if !holds {
			op = tokenop.Negate(op)
		}
		switch op {
		case token.LSS, token.LEQ:
			return []floatRange{{math.Inf(-1), bound}}
		case token.GTR, token.GEQ:
			return []floatRange{{bound, math.Inf(1)}}
		case token.EQL:
			return []floatRange{{bound, bound}}
		}
	}
	return nil
}

// exits reports whether a block always leaves the function: it ends in a
// return or a call of panic.
func (fc *fnCtx) exits(b *ast.BlockStmt) bool {
	if len(b.List) == 0 {
		return false
	}
	switch s := b.List[len(b.List)-1].(type) {
	case *ast.ReturnStmt:
		return true
	case *ast.ExprStmt:
		call, ok := ast.Unparen(s.X).(*ast.CallExpr)
		if !ok {
			return false
		}
		id, ok := ast.Unparen(call.Fun).(*ast.Ident)
		if !ok {
			return false
		}
		b, ok := fc.c.pass.TypesInfo.Uses[id].(*types.Builtin)
		return ok && b.Name() == "panic"
	}
	return false
}
