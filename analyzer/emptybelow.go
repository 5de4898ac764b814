package analyzer

import (
	"go/ast"
	"go/token"
	"go/types"
)

// What a factorial function returns below its domain. A loop from 2 up
// to n, or down from n while above 1, runs no trip for a negative n, and
// a recursion that returns 1 for n ≤ 1 stops at once: the function
// returns the empty product 1 there (FactorialFact.EmptyBelow). Only
// the plainest bodies are read so: the accumulator set to 1, the loop,
// the return of the accumulator; or the base case and the recursive
// return; anything else (a guard, a second return) may answer otherwise.

// emptyBelow reports whether ff, a factorial of its parameter with no
// offset, returns 1 for every negative argument.
func (fc *fnCtx) emptyBelow(ff *facFunc) bool {
	if ff.kind != kindFactorial || ff.offset != 0 || ff.decl.Body == nil {
		return false
	}
	list := ff.decl.Body.List
	switch {
	case ff.loop != nil:
		return len(list) == 3 && list[0] == ff.loop.accInit && list[1] == ff.loop.shape.stmt &&
			fc.isOne(initOf(list[0])) && fc.returnsObj(list[2], ff.loop.acc) && fc.noTripBelowZero(ff)
	case ff.rec != nil:
		return len(list) == 2 && fc.recursionStopsBelowTwo(ff, list[0], list[1])
	}
	return false
}

// noTripBelowZero reports whether the product loop of ff runs no trip
// for a negative parameter: counting up from a constant c to n+L, c ≥ L;
// counting down from n+F to a constant c, c ≥ F.
func (fc *fnCtx) noTripBelowZero(ff *facFunc) bool {
	sh := ff.loop.shape
	isParam := func(e ast.Expr) bool {
		return e != nil && fc.c.paramIndex(ff.decl, fc.c.objOf(fc.stripConv(e))) == ff.param
	}
	switch {
	case sh.step > 0:
		return sh.first == nil && isParam(sh.last) && sh.firstOff >= sh.lastOff
	case sh.step < 0:
		return sh.last == nil && isParam(sh.first) && sh.lastOff >= sh.firstOff
	}
	return false
}

// recursionStopsBelowTwo reports whether the two statements are
// `if n <= c { return 1 }; return <the product>` with c ≥ 0 (n < c,
// c ≥ 1), or `if n > c { return <the product> }; return 1` (n >= c,
// c ≥ 1 for >=).
func (fc *fnCtx) recursionStopsBelowTwo(ff *facFunc, first, second ast.Stmt) bool {
	ifs, ok := first.(*ast.IfStmt)
	if !ok || ifs.Init != nil || ifs.Else != nil || len(ifs.Body.List) != 1 {
		return false
	}
	cond, ok := ast.Unparen(ifs.Cond).(*ast.BinaryExpr)
	if !ok || fc.c.paramIndex(ff.decl, fc.c.objOf(fc.stripConv(cond.X))) != ff.param {
		return false
	}
	c, ok := fc.intConst(cond.Y)
	if !ok {
		return false
	}
	inner := ifs.Body.List[0]
	switch cond.Op {
	case token.LEQ, token.LSS:
		if cond.Op == token.LSS {
			c--
		}
		return c >= 0 && fc.returnsOne(inner) && fc.returnsRecursion(second, ff)
	case token.GTR, token.GEQ:
		if cond.Op == token.GEQ {
			c--
		}
		return c >= 0 && fc.returnsRecursion(inner, ff) && fc.returnsOne(second)
	}
	return false
}

func (fc *fnCtx) returnsOne(s ast.Stmt) bool {
	ret, ok := s.(*ast.ReturnStmt)
	return ok && len(ret.Results) == 1 && fc.isOne(ret.Results[0])
}

func (fc *fnCtx) returnsRecursion(s ast.Stmt, ff *facFunc) bool {
	ret, ok := s.(*ast.ReturnStmt)
	return ok && len(ret.Results) == 1 && ast.Unparen(ret.Results[0]) == ff.rec
}

func (fc *fnCtx) returnsObj(s ast.Stmt, acc types.Object) bool {
	ret, ok := s.(*ast.ReturnStmt)
	return ok && len(ret.Results) == 1 && acc != nil && fc.c.objOf(ret.Results[0]) == acc
}

// isOne reports whether e is the constant 1.
func (fc *fnCtx) isOne(e ast.Expr) bool {
	if e == nil {
		return false
	}
	v, ok := fc.intConst(e)
	return ok && v == 1
}

// initOf returns the value a one-variable definition or assignment
// statement gives: acc := 1, var acc int64 = 1.
func initOf(s ast.Stmt) ast.Expr {
	switch s := s.(type) {
	case *ast.AssignStmt:
		if len(s.Lhs) == 1 && len(s.Rhs) == 1 && (s.Tok == token.DEFINE || s.Tok == token.ASSIGN) {
			return s.Rhs[0]
		}
	case *ast.DeclStmt:
		if gd, ok := s.Decl.(*ast.GenDecl); ok && len(gd.Specs) == 1 {
			if vs, ok := gd.Specs[0].(*ast.ValueSpec); ok && len(vs.Names) == 1 && len(vs.Values) == 1 {
				return vs.Values[0]
			}
		}
	}
	return nil
}
