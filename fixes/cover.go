package fixes

import (
	"fmt"
	"go/ast"
	"go/constant"
	"go/token"
	"go/types"
)

// covered checks that replacing the match's expression by a helper call
// on its operands loses nothing: the operands lie inside the expression,
// and every variable the expression reads is read by an operand. A match
// whose expression also holds another factor (x * n!/(k!(n-k)!)) would
// otherwise have that factor silently dropped.
func (b *builder) covered() error {
	node := b.m.Node
	operands := append(append([]ast.Expr(nil), b.m.Args...), b.m.Extra...)
	read := make(map[types.Object]bool)
	for _, a := range operands {
		if a.Pos() < node.Pos() || a.End() > node.End() {
			return fmt.Errorf("operand %s lies outside the rewritten expression", b.text(a))
		}
		for _, v := range b.vars(a) {
			read[v] = true
		}
	}
	for _, v := range b.vars(node) {
		if !read[v] {
			return fmt.Errorf("the rewrite would drop %s", v.Name())
		}
	}
	return nil
}

// vars lists the variables (not fields) n reads.
func (b *builder) vars(n ast.Node) []types.Object {
	var out []types.Object
	ast.Inspect(n, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok {
			if v, ok := b.pass.TypesInfo.Uses[id].(*types.Var); ok && !v.IsField() {
				out = append(out, v)
			}
		}
		return true
	})
	return out
}

// linear is an integer expression c + Σ coef·v over variables v.
type linear struct {
	c     int64
	terms map[types.Object]int64
}

// linearOf reads e as a linear form, for the multinomial check; it
// reports false for anything but sums, differences, negations, constant
// multiples, variables and constants.
func (b *builder) linearOf(e ast.Expr) (linear, bool) {
	l := linear{terms: make(map[types.Object]int64)}
	if tv, ok := b.pass.TypesInfo.Types[e]; ok && tv.Value != nil {
		v, exact := constant.Int64Val(constant.ToInt(tv.Value))
		l.c = v
		return l, exact
	}
	switch e := e.(type) {
	case *ast.ParenExpr:
		return b.linearOf(e.X)
	case *ast.Ident:
		v, ok := b.pass.TypesInfo.Uses[e].(*types.Var)
		l.terms[v] = 1
		return l, ok
	case *ast.UnaryExpr:
		x, ok := b.linearOf(e.X)
		return x.scale(-1), ok && e.Op == token.SUB
	case *ast.BinaryExpr:
		x, okx := b.linearOf(e.X)
		y, oky := b.linearOf(e.Y)
		if !okx || !oky {
			return l, false
		}
		switch {
		case e.Op == token.ADD:
			return x.add(y), true
		case e.Op == token.SUB:
			return x.add(y.scale(-1)), true
		case e.Op == token.MUL && len(x.terms) == 0:
			return y.scale(x.c), true
		case e.Op == token.MUL && len(y.terms) == 0:
			return x.scale(y.c), true
		}
	}
	return l, false
}

func (l linear) scale(k int64) linear {
	out := linear{c: l.c * k, terms: make(map[types.Object]int64)}
	for v, c := range l.terms {
		out.terms[v] = c * k
	}
	return out
}

func (l linear) add(m linear) linear {
	out := l.scale(1)
	out.c += m.c
	for v, c := range m.terms {
		out.terms[v] += c
	}
	return out
}

func (l linear) equal(m linear) bool {
	d := l.add(m.scale(-1))
	for _, c := range d.terms {
		if c != 0 {
			return false
		}
	}
	return d.c == 0
}

// sumIs reports whether the operands add up to n identically.
func (b *builder) sumIs(n ast.Expr, ks []ast.Expr) bool {
	want, ok := b.linearOf(n)
	if !ok {
		return false
	}
	sum := linear{terms: make(map[types.Object]int64)}
	for _, k := range ks {
		l, ok := b.linearOf(k)
		if !ok {
			return false
		}
		sum = sum.add(l)
	}
	return sum.equal(want)
}
