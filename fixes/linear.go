package fixes

import (
	"go/ast"
	"go/constant"
	"go/token"
	"go/types"
	"math"
)

// linear is an expression c + Σ coef·v over variables v, with exact
// constants (go/constant keeps 1.0/6 as the rational 1/6). Comparing operands as linear forms lets the fixer see that
// n-k and -(k-n) are the same, or that a+b+c is the n of a multinomial.
type linear struct {
	c     constant.Value
	terms map[types.Object]constant.Value
}

func newLinear() linear {
	return linear{c: constant.MakeInt64(0), terms: make(map[types.Object]constant.Value)}
}

// linearOf reads e as a linear form. It reports false for anything but
// sums, differences, negations, integer multiples, numeric conversions,
// variables and constants.
func (b *builder) linearOf(e ast.Expr) (linear, bool) {
	l := newLinear()
	if tv, ok := b.pass.TypesInfo.Types[e]; ok && tv.Value != nil {
		if k := tv.Value.Kind(); k != constant.Int && k != constant.Float {
			return l, false
		}
		l.c = tv.Value
		return l, true
	}
	switch e := e.(type) {
	case *ast.ParenExpr:
		return b.linearOf(e.X)
	case *ast.CallExpr:
		if b.isNumericConversion(e) {
			return b.linearOf(e.Args[0])
		}
	case *ast.Ident:
		v, ok := b.pass.TypesInfo.Uses[e].(*types.Var)
		l.terms[v] = constant.MakeInt64(1)
		return l, ok
	case *ast.SelectorExpr:
		// A field read v.F of a variable: one variable per v and F.
		if v := b.fieldVar(e); v != nil {
			l.terms[v] = constant.MakeInt64(1)
			return l, true
		}
	case *ast.UnaryExpr:
		x, ok := b.linearOf(e.X)
		return x.scale(constant.MakeInt64(-1)), ok && e.Op == token.SUB
	case *ast.BinaryExpr:
		return b.linearBinary(e)
	}
	return l, false
}

func (b *builder) linearBinary(e *ast.BinaryExpr) (linear, bool) {
	x, okx := b.linearOf(e.X)
	y, oky := b.linearOf(e.Y)
	if !okx || !oky {
		return x, false
	}
	switch e.Op {
	case token.ADD:
		return x.add(y), true
	case token.SUB:
		return x.add(y.neg()), true
	case token.MUL:
		if len(y.terms) == 0 {
			return x.scale(y.c), true
		}
		if len(x.terms) == 0 {
			return y.scale(x.c), true
		}
	case token.QUO:
		// Only float division is exact; an integer (v+1)/2 truncates.
		if len(y.terms) == 0 && constant.Sign(y.c) != 0 && classOf(b.pass.TypesInfo.TypeOf(e)) == classFloat {
			return x.scale(constant.BinaryOp(constant.MakeInt64(1), token.QUO, y.c)), true
		}
	}
	return x, false
}

// isNumericConversion reports whether e converts one number to another
// integer type (int64(n)), which keeps the value of every operand a
// factorial can take.
func (b *builder) isNumericConversion(e *ast.CallExpr) bool {
	tv, ok := b.pass.TypesInfo.Types[e.Fun]
	if !ok || !tv.IsType() || len(e.Args) != 1 {
		return false
	}
	to, from := classOf(tv.Type), classOf(b.pass.TypesInfo.TypeOf(e.Args[0]))
	return to != classOther && from != classOther && (to == classFloat || from != classFloat)
}

func (l linear) scale(k constant.Value) linear {
	out := linear{c: constant.BinaryOp(l.c, token.MUL, k), terms: make(map[types.Object]constant.Value)}
	for v, c := range l.terms {
		out.terms[v] = constant.BinaryOp(c, token.MUL, k)
	}
	return out
}

func (l linear) neg() linear { return l.scale(constant.MakeInt64(-1)) }

func (l linear) add(m linear) linear {
	out := l.scale(constant.MakeInt64(1))
	out.c = constant.BinaryOp(out.c, token.ADD, m.c)
	for v, c := range m.terms {
		if old, ok := out.terms[v]; ok {
			c = constant.BinaryOp(old, token.ADD, c)
		}
		out.terms[v] = c
	}
	return out
}

func (l linear) equal(m linear) bool {
	d := l.add(m.neg())
	for _, c := range d.terms {
		if constant.Sign(c) != 0 {
			return false
		}
	}
	return closeConst(l.c, m.c)
}

// closeConst reports whether two constants are equal, or (for floats)
// within a few units in the last place of float64: go/types records an
// untyped 5.0/6 passed to math.Pow rounded to float64, which need not be
// exactly 1 − float64(1.0/6), yet the two differ far inside the 1e-12 the
// fixes promise.
func closeConst(a, b constant.Value) bool {
	if constant.Compare(a, token.EQL, b) {
		return true
	}
	if a.Kind() != constant.Float && b.Kind() != constant.Float {
		return false
	}
	x, _ := constant.Float64Val(a)
	y, _ := constant.Float64Val(b)
	return math.Abs(x-y) <= 4e-16*math.Max(math.Abs(x), math.Abs(y))
}

// sumIs reports whether the operands add up to n identically.
func (b *builder) sumIs(n ast.Expr, ks []ast.Expr) bool {
	want, ok := b.linearOf(n)
	if !ok {
		return false
	}
	sum, ok := b.sum(ks)
	return ok && sum.equal(want)
}

func (b *builder) sum(es []ast.Expr) (linear, bool) {
	sum := newLinear()
	for _, e := range es {
		l, ok := b.linearOf(e)
		if !ok {
			return sum, false
		}
		sum = sum.add(l)
	}
	return sum, true
}

// fieldVar returns the variable that stands for the field read e = v.F
// of a variable v in linear forms, the same one for every read of v.F
// in the package, or nil when e is not such a read.
func (b *builder) fieldVar(e *ast.SelectorExpr) *types.Var {
	id, ok := ast.Unparen(e.X).(*ast.Ident)
	if !ok {
		return nil
	}
	base, ok := b.pass.TypesInfo.Uses[id].(*types.Var)
	sel, okSel := b.pass.TypesInfo.Selections[e]
	if !ok || !okSel || sel.Kind() != types.FieldVal {
		return nil
	}
	key := [2]types.Object{base, sel.Obj()}
	if v, ok := b.fx.fieldVars[key]; ok {
		return v
	}
	if b.fx.fieldVars == nil {
		b.fx.fieldVars = make(map[[2]types.Object]*types.Var)
	}
	v := types.NewVar(base.Pos(), base.Pkg(), base.Name()+"."+sel.Obj().Name(), sel.Obj().Type())
	b.fx.fieldVars[key] = v
	return v
}
