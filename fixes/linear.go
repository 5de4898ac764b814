package fixes

import (
	"go/ast"
	"go/constant"
	"go/token"
	"go/types"
	"math"
	"math/big"

	"github.com/overfact/overfact/internal/linform"
)

// linear is an expression c + Σ coef·v over variables v, with exact
// rational coefficients (1.0/6 stays the rational 1/6). Comparing operands
// as linear forms lets the fixer see that n-k and -(k-n) are the same, or
// that a+b+c is the n of a multinomial. Its arithmetic is
// internal/linform's; the methods below convert.
type linear linform.Form[linform.Obj, *big.Rat, linform.Rat]

type lform = linform.Form[linform.Obj, *big.Rat, linform.Rat]

func newLinear() linear { return linear{C: linform.SharedInt(0)} }

// ratOf returns a numeric constant as an exact rational; false for
// anything else (a string, a complex number, an overflowing float).
func ratOf(v constant.Value) (*big.Rat, bool) {
	switch x := constant.Val(constant.ToFloat(v)).(type) {
	case *big.Rat:
		return x, true
	case *big.Float:
		r, _ := x.Rat(nil)
		return r, r != nil
	}
	return nil, false
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
		c, ok := ratOf(tv.Value)
		l.C = c
		return l, ok
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
		if !ok {
			return l, false
		}
		return varLinear(v), true
	case *ast.UnaryExpr:
		x, ok := b.linearOf(e.X)
		return x.neg(), ok && e.Op == token.SUB
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
		if len(y.Terms) == 0 {
			return x.scaleRat(y.C), true
		}
		if len(x.Terms) == 0 {
			return y.scaleRat(x.C), true
		}
	case token.QUO:
		// Only float division is exact; an integer (v+1)/2 truncates.
		if len(y.Terms) == 0 && ratDomain.Sign(y.C) != 0 && classOf(b.pass.TypesInfo.TypeOf(e)) == classFloat {
			return x.scaleRat(new(big.Rat).Inv(y.C)), true
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

var ratDomain linform.Rat

// scale returns k·l; k is a numeric constant.
func (l linear) scale(k constant.Value) linear {
	r, ok := ratOf(k)
	if !ok {
		panic("fixes: scaling a linear form by a non-numeric constant")
	}
	return l.scaleRat(r)
}

func (l linear) scaleRat(k *big.Rat) linear { return linear(lform(l).Scale(k)) }

func (l linear) neg() linear { return linear(lform(l).Neg()) }

func (l linear) add(m linear) linear { return linear(lform(l).Add(lform(m))) }

func (l linear) equal(m linear) bool {
	return lform(l).Sub(lform(m)).IsConst() && closeConst(l.C, m.C)
}

func constLinear(c int64) linear { return linear{C: linform.SharedInt(c)} }

func varLinear(v types.Object) linear {
	return linear(linform.Single[linform.Obj, *big.Rat, linform.Rat](linform.Obj{Object: v}))
}

// closeConst reports whether two constants are equal, or (for floats)
// within a few units in the last place of float64: go/types records an
// untyped 5.0/6 passed to math.Pow rounded to float64, which need not be
// exactly 1 − float64(1.0/6), yet the two differ far inside the 1e-12 the
// fixes promise.
func closeConst(a, b *big.Rat) bool {
	if ratDomain.Sign(ratDomain.Add(a, new(big.Rat).Neg(orZero(b)))) == 0 {
		return true
	}
	if orZero(a).IsInt() && orZero(b).IsInt() {
		return false
	}
	x, _ := orZero(a).Float64()
	y, _ := orZero(b).Float64()
	return math.Abs(x-y) <= 4e-16*math.Max(math.Abs(x), math.Abs(y))
}

func orZero(r *big.Rat) *big.Rat {
	if r == nil {
		return new(big.Rat)
	}
	return r
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
