package analyzer

import (
	"go/ast"
	"go/token"
	"go/types"
	"sort"
)

// A linear form is Σ coef·var + c over integer-valued variables. The
// analyzer compares factorial arguments with it: k and n-k sum to n, and
// 2n is twice the n of (n+1)!.
type linear struct {
	terms []term // sorted by the variable's position, no zero coefficients
	c     int64
}

type term struct {
	obj  types.Object
	coef int64
}

// maxDepth bounds the recursion over an expression; deeper forms are
// treated as opaque, which can only lose findings, never invent them.
const maxDepth = 16

// linear returns the linear form of e, looking through parentheses and
// numeric conversions, or false when e is not linear in variables.
func (fc *fnCtx) linear(e ast.Expr) (linear, bool) {
	return fc.linearDepth(e, 0)
}

func (fc *fnCtx) linearDepth(e ast.Expr, depth int) (linear, bool) {
	if depth > maxDepth {
		return linear{}, false
	}
	e = fc.stripConv(e)
	if v, ok := fc.intConst(e); ok {
		return linear{c: v}, true
	}
	switch e := e.(type) {
	case *ast.Ident:
		// Only integer variables: x + float64(i) is a rising factorial,
		// not a falling one.
		if obj := fc.c.objOf(e); obj != nil {
			if t, ok := fc.c.numOf(obj.Type()); ok && !t.Float {
				return linear{terms: []term{{obj, 1}}}, true
			}
		}
	case *ast.UnaryExpr:
		if e.Op == token.SUB {
			x, ok := fc.linearDepth(e.X, depth+1)
			return x.scale(-1), ok
		}
		if e.Op == token.ADD {
			return fc.linearDepth(e.X, depth+1)
		}
	case *ast.BinaryExpr:
		x, okx := fc.linearDepth(e.X, depth+1)
		y, oky := fc.linearDepth(e.Y, depth+1)
		if !okx || !oky {
			return linear{}, false
		}
		switch e.Op {
		case token.ADD:
			return x.add(y), true
		case token.SUB:
			return x.add(y.scale(-1)), true
		case token.MUL:
			if len(x.terms) == 0 {
				return y.scale(x.c), true
			}
			if len(y.terms) == 0 {
				return x.scale(y.c), true
			}
		}
	}
	return linear{}, false
}

func (l linear) scale(k int64) linear {
	if k == 0 {
		return linear{}
	}
	out := linear{c: l.c * k}
	for _, t := range l.terms {
		out.terms = append(out.terms, term{t.obj, t.coef * k})
	}
	return out
}

func (l linear) add(m linear) linear {
	out := linear{c: l.c + m.c}
	out.terms = append(out.terms, l.terms...)
	for _, t := range m.terms {
		found := false
		for i := range out.terms {
			if out.terms[i].obj == t.obj {
				out.terms[i].coef += t.coef
				found = true
				break
			}
		}
		if !found {
			out.terms = append(out.terms, t)
		}
	}
	kept := out.terms[:0]
	for _, t := range out.terms {
		if t.coef != 0 {
			kept = append(kept, t)
		}
	}
	out.terms = kept
	sort.Slice(out.terms, func(i, j int) bool { return out.terms[i].obj.Pos() < out.terms[j].obj.Pos() })
	return out
}

func (l linear) equal(m linear) bool {
	d := l.add(m.scale(-1))
	return d.c == 0 && len(d.terms) == 0
}

// coefOf returns the coefficient of v in l.
func (l linear) coefOf(v types.Object) int64 {
	for _, t := range l.terms {
		if t.obj == v {
			return t.coef
		}
	}
	return 0
}

// without returns l with the term of v removed.
func (l linear) without(v types.Object) linear {
	return l.add(linear{terms: []term{{v, -l.coefOf(v)}}})
}
