package analyzer

import (
	"go/ast"
	"go/token"
	"go/types"
	"math"
	"strconv"

	"github.com/overfact/overfact/internal/linform"
)

// A linear form is Σ coef·var + c over integer-valued variables. The
// analyzer compares factorial arguments with it: k and n-k sum to n, and
// 2n is twice the n of (n+1)!. Its arithmetic is internal/linform's, in
// machine integers (the constants meet analyzer/ranges' int64
// intervals); the methods below convert.
type linear linform.Form[linform.Obj, int64, linform.Int64]

type lform = linform.Form[linform.Obj, int64, linform.Int64]

// term is one term coef·var of a linear form.
type term = linform.Term[linform.Obj, int64]

// single returns the form 1·v.
func single(v types.Object) linear {
	return linear(linform.Single[linform.Obj, int64, linform.Int64](linform.Obj{Object: v}))
}

// maxDepth bounds the recursion over an expression; deeper forms are
// treated as opaque, which can only lose findings, never invent them.
const maxDepth = 16

// linear returns the linear form of e, looking through parentheses and
// numeric conversions, or false when e is not linear in variables.
func (q typeQueries) linear(e ast.Expr) (linear, bool) {
	return q.linearDepth(e, 0)
}

func (q typeQueries) linearDepth(e ast.Expr, depth int) (linear, bool) {
	return q.linearOf(e, depth, nil)
}

// linearOf is the one recursion over the sums, differences, negations
// and constant multiples that make a linear form. With counts nil it
// reads integer expressions: terms are integer variables, and numeric
// conversions are looked through. With counts set it reads float counts
// (linearCount, floatcount.go): counts reads the terms, and no
// conversion is looked through, since int(x) of a float x is not x; nor
// are products read, which no float-count shape has.
func (q typeQueries) linearOf(e ast.Expr, depth int, counts func(ast.Expr) (linear, bool)) (linear, bool) {
	if depth > maxDepth {
		return linear{}, false
	}
	if counts != nil {
		e = ast.Unparen(e)
	} else {
		e = q.stripConv(e)
	}
	if v, ok := q.intConst(e); ok {
		return linear{C: v}, true
	}
	switch e := e.(type) {
	case *ast.UnaryExpr:
		if e.Op == token.SUB {
			x, ok := q.linearOf(e.X, depth+1, counts)
			return x.scale(-1), ok
		}
		if e.Op == token.ADD && counts == nil {
			return q.linearOf(e.X, depth+1, counts)
		}
		return linear{}, false
	case *ast.BinaryExpr:
		x, okx := q.linearOf(e.X, depth+1, counts)
		y, oky := q.linearOf(e.Y, depth+1, counts)
		if !okx || !oky {
			return linear{}, false
		}
		switch e.Op {
		case token.ADD:
			return x.add(y), true
		case token.SUB:
			return x.add(y.scale(-1)), true
		case token.MUL:
			if counts != nil {
				break
			}
			if len(x.Terms) == 0 {
				return y.scale(x.C), true
			}
			if len(y.Terms) == 0 {
				return x.scale(y.C), true
			}
		}
		return linear{}, false
	}
	if counts != nil {
		return counts(e)
	}
	// Only integer variables: x + float64(i) is a rising factorial, not a
	// falling one.
	if id, ok := e.(*ast.Ident); ok {
		if obj := q.objOf(id); obj != nil {
			if t, ok := q.numOf(obj.Type()); ok && !t.Float {
				return single(obj), true
			}
		}
	}
	return linear{}, false
}

func (l linear) scale(k int64) linear { return linear(lform(l).Scale(k)) }

func (l linear) add(m linear) linear { return linear(lform(l).Add(lform(m))) }

func (l linear) equal(m linear) bool { return lform(l).Equal(lform(m)) }

// coefOf returns the coefficient of v in l.
func (l linear) coefOf(v types.Object) int64 {
	k, _ := lform(l).Coef(linform.Obj{Object: v})
	return k
}

// without returns l with the term of v removed.
func (l linear) without(v types.Object) linear {
	return linear(lform(l).Without(linform.Obj{Object: v}))
}

// expr returns an expression whose value is l, its terms in their
// order and the constant last (n + q - 1), for a message to name a
// quantity the code never writes as one expression; nil for a form
// with no terms.
func (l linear) expr() ast.Expr {
	var e ast.Expr
	add := func(k int64, x ast.Expr) {
		op := token.ADD
		if k < 0 {
			op, k = token.SUB, -k
		}
		if k != 1 {
			x = &ast.BinaryExpr{X: &ast.BasicLit{Kind: token.INT, Value: strconv.FormatInt(k, 10)}, Op: token.MUL, Y: x}
		}
		switch {
		case e != nil:
			e = &ast.BinaryExpr{X: e, Op: op, Y: x}
		case op == token.SUB:
			e = &ast.UnaryExpr{Op: token.SUB, X: x}
		default:
			e = x
		}
	}
	for _, t := range l.Terms {
		add(t.K, ast.NewIdent(t.Sym.Object.Name()))
	}
	if e != nil && l.C != 0 {
		c := l.C
		if c < 0 && c != math.MinInt64 {
			e = &ast.BinaryExpr{X: e, Op: token.SUB, Y: &ast.BasicLit{Kind: token.INT, Value: strconv.FormatInt(-c, 10)}}
		} else {
			e = &ast.BinaryExpr{X: e, Op: token.ADD, Y: &ast.BasicLit{Kind: token.INT, Value: strconv.FormatInt(c, 10)}}
		}
	}
	return e
}
