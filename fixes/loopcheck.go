package fixes

import (
	"errors"
	"fmt"
	"go/ast"
	"go/token"
	"go/types"

	"github.com/overfact/overfact/internal/linform"
)

// checkLoop checks on its own that the loop computes what the match says,
// before one helper call replaces it. The loop must count an induction
// variable i through k values from lo, and update the accumulator by
//
//	acc = acc * F / G   (or acc *= F; acc /= G)    binomial loop
//	acc = acc * F       (or acc *= F)              falling-factorial loop
//
// (the numerator of ShapeLoopQuotient is the latter), where, with j = i − lo running over 0..k−1, F is n−j or n−k+1+j and G
// is j+1 (common practice: C(n,k) = Π (n−k+j+1)/(j+1), each partial
// product an integer, and n!/(n−k)! = Π (n−j)).
func (b *builder) checkLoop(loop ast.Stmt, acc types.Object) error {
	if len(b.m.Args) != 2 {
		return errors.New("loop match needs n and k")
	}
	n, okn := b.linearOf(b.m.Args[0])
	k, okk := b.linearOf(b.m.Args[1])
	if !okn || !okk {
		return errors.New("the loop's n or k is not a sum of variables and constants")
	}
	iv, lo, count, body, err := b.counter(loop)
	if err != nil {
		return err
	}
	if !count.equal(k) {
		return fmt.Errorf("the loop does not run %s times", b.text(b.m.Args[1]))
	}
	f, g, err := b.update(body, acc)
	if err != nil {
		return err
	}
	one := linearOne()
	// F and G as functions of j: substitute i = lo + j.
	jf, restF := split(f, iv, lo)
	fOK := jf == -1 && restF.equal(n) || jf == 1 && restF.equal(n.add(k.neg()).add(one))
	if b.m.Shape == ShapeFallingLoop || b.m.Shape == ShapeLoopQuotient {
		if g != nil || !fOK {
			return errors.New("the loop is not the falling factorial of its operands")
		}
		return nil
	}
	if g == nil {
		return errors.New("the loop does not divide")
	}
	jg, restG := split(*g, iv, lo)
	if !fOK || jg != 1 || !restG.equal(one) {
		return errors.New("the loop is not the multiplicative binomial of its operands")
	}
	return nil
}

// split writes l, a form in the induction variable iv, as c·j + rest with
// i = lo + j, and returns c (0 when not ±1 or 0) and rest.
func split(l linear, iv types.Object, lo linear) (int64, linear) {
	v := linform.Obj{Object: iv}
	coef, ok := lform(l).Coef(v)
	rest := linear(lform(l).Without(v))
	if !ok || !coef.IsInt() || !coef.Num().IsInt64() {
		return 0, rest
	}
	c := coef.Num().Int64()
	if c != 1 && c != -1 {
		return 0, rest
	}
	return c, rest.add(lo.scaleRat(coef))
}

// counter reads the loop's induction variable, its first value, its trip
// count and its body: for i := lo; i <= hi (or i < hi); i++, and
// for i := range k.
func (b *builder) counter(loop ast.Stmt) (types.Object, linear, linear, *ast.BlockStmt, error) {
	none := newLinear()
	switch l := loop.(type) {
	case *ast.RangeStmt:
		id, ok := l.Key.(*ast.Ident)
		count, okc := b.linearOf(l.X)
		if !ok || l.Value != nil || !okc || classOf(b.pass.TypesInfo.TypeOf(l.X)) == classOther {
			break
		}
		return b.pass.TypesInfo.Defs[id], none, count, l.Body, nil
	case *ast.ForStmt:
		init, ok1 := l.Init.(*ast.AssignStmt)
		cond, ok2 := l.Cond.(*ast.BinaryExpr)
		post, ok3 := l.Post.(*ast.IncDecStmt)
		if !ok1 || !ok2 || !ok3 || post.Tok != token.INC || len(init.Lhs) != 1 || len(init.Rhs) != 1 || init.Tok != token.DEFINE {
			break
		}
		id, ok := init.Lhs[0].(*ast.Ident)
		x, okx := cond.X.(*ast.Ident)
		p, okp := post.X.(*ast.Ident)
		if !ok || !okx || !okp || x.Name != id.Name || p.Name != id.Name {
			break
		}
		lo, oklo := b.linearOf(init.Rhs[0])
		hi, okhi := b.linearOf(cond.Y)
		if !oklo || !okhi || cond.Op != token.LEQ && cond.Op != token.LSS {
			break
		}
		count := hi.add(lo.neg())
		if cond.Op == token.LEQ {
			one := linearOne()
			count = count.add(one)
		}
		return b.pass.TypesInfo.Defs[id], lo, count, l.Body, nil
	}
	return nil, none, none, nil, errors.New("the loop does not count an induction variable up by one")
}

// update reads the accumulator's update: the factor F it multiplies by
// and the divisor G (nil when it only multiplies). The multiplication
// must come first, as the exact binomial loop needs.
func (b *builder) update(body *ast.BlockStmt, acc types.Object) (linear, *linear, error) {
	bad := errors.New("the loop's update is not acc = acc * F / G")
	is := func(e ast.Expr) bool {
		id, ok := ast.Unparen(e).(*ast.Ident)
		return ok && b.pass.TypesInfo.ObjectOf(id) == acc
	}
	lin := func(e ast.Expr) (linear, bool) { return b.linearOf(e) }
	var f ast.Expr
	var g ast.Expr
	switch len(body.List) {
	case 1:
		s, ok := body.List[0].(*ast.AssignStmt)
		if !ok || len(s.Lhs) != 1 || !is(s.Lhs[0]) {
			return linear{}, nil, bad
		}
		switch {
		case s.Tok == token.MUL_ASSIGN:
			f = s.Rhs[0]
		case s.Tok == token.ASSIGN:
			rhs := ast.Unparen(s.Rhs[0])
			if q, ok := rhs.(*ast.BinaryExpr); ok && q.Op == token.QUO {
				rhs, g = ast.Unparen(q.X), q.Y
			}
			m, ok := rhs.(*ast.BinaryExpr)
			if !ok || m.Op != token.MUL {
				return linear{}, nil, bad
			}
			switch {
			case is(m.X):
				f = m.Y
			case is(m.Y):
				f = m.X
			default:
				return linear{}, nil, bad
			}
		default:
			return linear{}, nil, bad
		}
	case 2:
		s1, ok1 := body.List[0].(*ast.AssignStmt)
		s2, ok2 := body.List[1].(*ast.AssignStmt)
		if !ok1 || !ok2 || s1.Tok != token.MUL_ASSIGN || s2.Tok != token.QUO_ASSIGN || !is(s1.Lhs[0]) || !is(s2.Lhs[0]) {
			return linear{}, nil, bad
		}
		f, g = s1.Rhs[0], s2.Rhs[0]
	default:
		return linear{}, nil, bad
	}
	lf, ok := lin(f)
	if !ok {
		return linear{}, nil, bad
	}
	if g == nil {
		return lf, nil, nil
	}
	lg, ok := lin(g)
	if !ok {
		return linear{}, nil, bad
	}
	return lf, &lg, nil
}
