package analyzer

import (
	"go/ast"
	"go/constant"
	"go/token"
	"go/types"
	"math"

	"github.com/overfact/overfact/internal/tokenop"
)

// loopShape describes how a loop's induction variable runs: from first to
// last in steps of step. An end is expr+off, or the constant off when expr
// is nil. For a while-style loop the first value is the variable's value
// on entry, written as the variable itself.
type loopShape struct {
	stmt      ast.Stmt // *ast.ForStmt or *ast.RangeStmt
	body      *ast.BlockStmt
	iv        types.Object
	step      int64
	first     ast.Expr
	firstOff  int64
	last      ast.Expr
	lastOff   int64
	whileLike bool // the variable is counted down in the body
	// bigEnd is an end that is a constant beyond int64 (math.MaxUint64-1),
	// held as the nearest int64 in its offset: messages show it as written.
	bigEnd ast.Expr
}

// shapeOf recognises the counting forms of a loop, or returns nil.
func (fc *fnCtx) shapeOf(s ast.Stmt) *loopShape {
	switch s := s.(type) {
	case *ast.ForStmt:
		if s.Init == nil {
			return fc.whileShape(s)
		}
		return fc.forShape(s)
	case *ast.RangeStmt:
		return fc.rangeShape(s)
	}
	return nil
}

// forShape handles `for i := a; i <op> b; i++` and its downward twin.
func (fc *fnCtx) forShape(s *ast.ForStmt) *loopShape {
	init, ok := s.Init.(*ast.AssignStmt)
	if !ok || len(init.Lhs) != 1 || len(init.Rhs) != 1 {
		return nil
	}
	iv := fc.c.objOf(init.Lhs[0])
	if iv == nil {
		return nil
	}
	step := fc.stepOf(s.Post, iv)
	if step == 0 {
		return nil
	}
	sh := &loopShape{stmt: s, body: s.Body, iv: iv, step: step}
	sh.first, sh.firstOff = fc.end(init.Rhs[0])
	cond, ok := ast.Unparen(s.Cond).(*ast.BinaryExpr)
	if !ok {
		return nil
	}
	op, bound := cond.Op, cond.Y
	if fc.c.objOf(cond.X) != iv {
		if fc.c.objOf(cond.Y) != iv {
			return nil
		}
		op, bound = tokenop.Flip(op), cond.X
	}
	var adj int64
	switch {
	case step > 0 && op == token.LEQ:
	case step > 0 && (op == token.LSS || op == token.NEQ):
		adj = -1
	case step < 0 && op == token.GEQ:
	case step < 0 && (op == token.GTR || op == token.NEQ):
		adj = 1
	default:
		return nil
	}
	sh.last, sh.lastOff = fc.end(bound)
	fc.noteBigEnd(sh, init.Rhs[0], bound)
	sh.lastOff += adj
	return sh
}

// whileShape handles `for n > b { ...; n-- }` and `for ; n > b; n-- {`,
// both counting down the variable the loop found.
func (fc *fnCtx) whileShape(s *ast.ForStmt) *loopShape {
	cond, ok := ast.Unparen(s.Cond).(*ast.BinaryExpr)
	if !ok {
		return nil
	}
	iv := fc.c.objOf(cond.X)
	if iv == nil || (cond.Op != token.GTR && cond.Op != token.GEQ) {
		return nil
	}
	var step int64
	steps := s.Body.List
	if s.Post != nil {
		steps = []ast.Stmt{s.Post}
	}
	for _, st := range steps {
		if d := fc.stepOf(st, iv); d != 0 {
			step = d
		}
	}
	if step >= 0 {
		return nil
	}
	sh := &loopShape{stmt: s, body: s.Body, iv: iv, step: step, first: cond.X, whileLike: true}
	sh.last, sh.lastOff = fc.end(cond.Y)
	fc.noteBigEnd(sh, cond.Y)
	if cond.Op == token.GTR {
		sh.lastOff++
	}
	return sh
}

// rangeShape handles `for i := range n` over an integer.
func (fc *fnCtx) rangeShape(s *ast.RangeStmt) *loopShape {
	if s.Key == nil || s.Value != nil {
		return nil
	}
	iv := fc.c.objOf(s.Key)
	if iv == nil {
		return nil
	}
	if _, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(s.X)); !ok {
		return nil
	}
	sh := &loopShape{stmt: s, body: s.Body, iv: iv, step: 1}
	sh.last, sh.lastOff = fc.end(s.X)
	fc.noteBigEnd(sh, s.X)
	sh.lastOff--
	return sh
}

// end splits a loop end into an expression and a constant offset. A
// constant beyond int64 (a uint64 bound) is the nearest int64, so that it
// is never taken for a variable.
func (fc *fnCtx) end(e ast.Expr) (ast.Expr, int64) {
	if v, ok := fc.intConst(fc.stripConv(e)); ok {
		return nil, v
	}
	if tv, ok := fc.c.pass.TypesInfo.Types[e]; ok && tv.Value != nil {
		if v := constant.ToInt(tv.Value); v.Kind() == constant.Int {
			if constant.Sign(v) > 0 {
				return nil, math.MaxInt64
			}
			return nil, math.MinInt64
		}
	}
	if b, ok := ast.Unparen(e).(*ast.BinaryExpr); ok && (b.Op == token.ADD || b.Op == token.SUB) {
		if v, ok := fc.intConst(ast.Unparen(b.Y)); ok {
			if b.Op == token.SUB {
				v = -v
			}
			return b.X, v
		}
	}
	return e, 0
}

// noteBigEnd records an end of sh that is a constant beyond int64.
func (fc *fnCtx) noteBigEnd(sh *loopShape, ends ...ast.Expr) {
	for _, e := range ends {
		if _, ok := fc.intConst(fc.stripConv(e)); ok {
			continue
		}
		if tv, ok := fc.c.pass.TypesInfo.Types[e]; ok && tv.Value != nil {
			sh.bigEnd = e
		}
	}
}

// stepOf returns the constant by which s changes v (i++, i -= 2,
// i = i + 1), or 0.
func (fc *fnCtx) stepOf(s ast.Stmt, v types.Object) int64 {
	switch s := s.(type) {
	case *ast.IncDecStmt:
		if fc.c.objOf(s.X) != v {
			return 0
		}
		if s.Tok == token.INC {
			return 1
		}
		return -1
	case *ast.AssignStmt:
		if len(s.Lhs) != 1 || len(s.Rhs) != 1 || fc.c.objOf(s.Lhs[0]) != v {
			return 0
		}
		switch s.Tok {
		case token.ADD_ASSIGN, token.SUB_ASSIGN:
			d, ok := fc.intConst(ast.Unparen(s.Rhs[0]))
			if !ok {
				return 0
			}
			if s.Tok == token.SUB_ASSIGN {
				d = -d
			}
			return d
		case token.ASSIGN:
			lin, ok := fc.linear(s.Rhs[0])
			if ok && len(lin.Terms) == 1 && lin.Terms[0].Sym.Object == v && lin.Terms[0].K == 1 {
				return lin.C
			}
		}
	}
	return 0
}

// eachLoop calls f for each product loop in body, outside closures.
func (fc *fnCtx) eachLoop(body *ast.BlockStmt, f func(*accLoop)) {
	fc.walkBlock(body.List, nil, 0, f)
}

// walkBlock visits the statements of a block. before holds, innermost
// last, the statements that precede the current one in each enclosing
// block up to the nearest enclosing loop, where the search for an
// accumulator's start stops: a start outside a loop would make the
// product span its iterations.
func (fc *fnCtx) walkBlock(list []ast.Stmt, outer [][]ast.Stmt, depth int, f func(*accLoop)) {
	if depth > maxNesting {
		return
	}
	for i, st := range list {
		before := append(outer[:len(outer):len(outer)], list[:i])
		for {
			l, ok := st.(*ast.LabeledStmt)
			if !ok {
				break
			}
			st = l.Stmt
		}
		if al := fc.accLoopOf(st, before); al != nil {
			f(al)
		}
		switch s := st.(type) {
		case *ast.BlockStmt:
			fc.walkBlock(s.List, before, depth+1, f)
		case *ast.IfStmt:
			fc.walkBlock(s.Body.List, before, depth+1, f)
			if s.Else != nil {
				fc.walkBlock([]ast.Stmt{s.Else}, before, depth+1, f)
			}
		case *ast.ForStmt:
			fc.walkBlock(s.Body.List, nil, depth+1, f)
		case *ast.RangeStmt:
			fc.walkBlock(s.Body.List, nil, depth+1, f)
		case *ast.SwitchStmt:
			fc.walkClauses(s.Body, before, depth, f)
		case *ast.TypeSwitchStmt:
			fc.walkClauses(s.Body, before, depth, f)
		case *ast.SelectStmt:
			fc.walkClauses(s.Body, before, depth, f)
		}
	}
}

func (fc *fnCtx) walkClauses(body *ast.BlockStmt, before [][]ast.Stmt, depth int, f func(*accLoop)) {
	for _, cl := range body.List {
		switch cl := cl.(type) {
		case *ast.CaseClause:
			fc.walkBlock(cl.Body, before, depth+1, f)
		case *ast.CommClause:
			fc.walkBlock(cl.Body, before, depth+1, f)
		}
	}
}

// maxNesting bounds the statement nesting the loop search descends into.
const maxNesting = 1000

// loopBody returns the body of a for or range statement, nil for any
// other node.
func loopBody(n ast.Node) *ast.BlockStmt {
	switch l := n.(type) {
	case *ast.ForStmt:
		return l.Body
	case *ast.RangeStmt:
		return l.Body
	}
	return nil
}
