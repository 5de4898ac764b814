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

// countsUpToParam reports whether ff's body is acc := 1, the loop
// for i := c; i <= n; i++ { acc *= i } with c the constant 1 or 2 and n
// the parameter itself, and return acc: the factors are the whole
// numbers from c to ⌊n⌋, so the product is ⌊n⌋! for a fraction n as
// well, and 1 below 2 (FactorialFact.Floor). A float counter's loop is
// read here from its syntax, as the value model reads it.
func (fc *fnCtx) countsUpToParam(ff *facFunc) bool {
	list := ff.decl.Body.List
	if len(list) != 3 {
		return false
	}
	acc := fc.c.objOf(assignedIdent(list[0]))
	if acc == nil || !fc.isOne(initOf(list[0])) || !fc.returnsObj(list[2], acc) {
		return false
	}
	loop, ok := list[1].(*ast.ForStmt)
	if !ok || len(loop.Body.List) != 1 {
		return false
	}
	init, ok := loop.Init.(*ast.AssignStmt)
	if !ok || len(init.Lhs) != 1 || len(init.Rhs) != 1 {
		return false
	}
	i := fc.c.objOf(init.Lhs[0])
	if c, ok := fc.floatConst(init.Rhs[0]); !ok || c != 1 && c != 2 || i == nil {
		return false
	}
	post, ok := loop.Post.(*ast.IncDecStmt)
	if !ok || post.Tok != token.INC || fc.c.objOf(post.X) != i {
		return false
	}
	cond, ok := ast.Unparen(loop.Cond).(*ast.BinaryExpr)
	if !ok || cond.Op != token.LEQ || fc.c.objOf(cond.X) != i || fc.c.paramIndex(ff.decl, fc.c.objOf(cond.Y)) != ff.param {
		return false
	}
	// acc *= i, or acc = acc * i
	up, ok := loop.Body.List[0].(*ast.AssignStmt)
	if !ok || len(up.Lhs) != 1 || len(up.Rhs) != 1 || fc.c.objOf(up.Lhs[0]) != acc {
		return false
	}
	switch up.Tok {
	case token.MUL_ASSIGN:
		return fc.c.objOf(fc.stripConv(up.Rhs[0])) == i
	case token.ASSIGN:
		m, ok := ast.Unparen(up.Rhs[0]).(*ast.BinaryExpr)
		return ok && m.Op == token.MUL && fc.c.objOf(m.X) == acc && fc.c.objOf(fc.stripConv(m.Y)) == i
	}
	return false
}

// assignedIdent returns the one variable a definition or assignment
// statement sets (acc := 1, var acc = 1.0), or nil.
func assignedIdent(s ast.Stmt) ast.Expr {
	switch s := s.(type) {
	case *ast.AssignStmt:
		if len(s.Lhs) == 1 {
			return s.Lhs[0]
		}
	case *ast.DeclStmt:
		if g, ok := s.Decl.(*ast.GenDecl); ok && len(g.Specs) == 1 {
			if v, ok := g.Specs[0].(*ast.ValueSpec); ok && len(v.Names) == 1 {
				return v.Names[0]
			}
		}
	}
	return nil
}
