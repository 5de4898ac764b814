package fixes

import (
	"fmt"
	"go/ast"
	"go/constant"
	"go/token"
)

// Exponentials of log-gamma sums become the helper that computes the
// quantity they stand for: exp(ln Γ(n+1) − ln Γ(k+1) − ln Γ(n−k+1)) is
// C(n, k), exp(ln Γ(a) + ln Γ(b) − ln Γ(a+b)) is B(a, b), exp(ln Γ(a) −
// ln Γ(b)) is Γ(a)/Γ(b), exp(ln C(n, k) + k·ln p + (n−k)·ln(1−p)) is the
// binomial pmf, and exp(ln Γ(n+1)) or Γ(n+1) read back as an integer is
// n! (common practice; DLMF 5.12.1 for B). The helpers keep
// the digits the sum of large logarithms loses, stay finite where an
// exponential of one term alone overflows, and give integers exactly.
// logFormShape reports whether s is one of these shapes, which the fixer
// checks against the log-gamma sum itself (checkLogForm).
func logFormShape(s Shape) bool {
	switch s {
	case ShapeExpChoose, ShapeExpBeta, ShapeExpGammaRatio, ShapeExpFactorial, ShapeExpBinomialPMF:
		return true
	}
	return false
}

func buildExpLgamma(b *builder) error {
	name, err := b.pick(shapes[b.m.Shape].helpers, b.m.Result)
	if err != nil {
		return err
	}
	return b.rewrite(name, b.m.Args)
}

// wterm is w·ln Γ(x), or, with log set, c·ln x for a linear c.
type wterm struct {
	w   constant.Value
	x   linear
	log bool
	c   linear
}

// checkLogForm checks on its own that the match's expression is exp of
// the log-gamma sum of its shape, through a conversion and a rounding
// for the integer forms, and through products and quotients of
// exponentials. A log-gamma value is a call of a user function of one
// argument, which the analyzer vouches returns ln|Γ| of it.
func (b *builder) checkLogForm() error {
	e, ok := b.m.Node.(ast.Expr)
	if !ok {
		return fmt.Errorf("match is not an expression")
	}
	e = b.unround(e)
	var num, den []ast.Expr
	if !b.factors(e, false, &num, &den) {
		return fmt.Errorf("not a product of exponentials")
	}
	var got []wterm
	one := constant.MakeInt64(1)
	for i, side := range [][]ast.Expr{num, den} {
		sign := one
		if i == 1 {
			sign = constant.MakeInt64(-1)
		}
		for _, f := range side {
			c, fn := b.callOf(f)
			switch {
			case c != nil && isMath(fn, "Exp") && len(c.Args) == 1:
				if !b.logTerms(c.Args[0], sign, &got) {
					return fmt.Errorf("exponent %s is not a sum of log-gamma values", b.text(c.Args[0]))
				}
			case c != nil && isMath(fn, "Pow") && len(c.Args) == 2 && b.m.Shape == ShapeExpBinomialPMF:
				x, ok1 := b.linearOf(c.Args[0])
				e, ok2 := b.linearOf(c.Args[1])
				if !ok1 || !ok2 {
					return fmt.Errorf("power %s is not of linear forms", b.text(f))
				}
				got = append(got, wterm{log: true, x: x, c: e.scale(sign)})
			case c != nil && isMath(fn, "Gamma") && len(c.Args) == 1 && b.m.Shape == ShapeExpFactorial && len(num)+len(den) == 1 && i == 0:
				x, ok := b.linearOf(c.Args[0])
				if !ok {
					return fmt.Errorf("Γ argument %s is not linear", b.text(c.Args[0]))
				}
				got = append(got, wterm{w: one, x: x})
			default:
				return fmt.Errorf("factor %s is not an exponential of log-gamma values", b.text(f))
			}
		}
	}
	ops, err := b.operandForms()
	if err != nil {
		return err
	}
	want, err := b.logPattern(ops)
	if err != nil {
		return err
	}
	if !sameTerms(merge(got), merge(want)) {
		return fmt.Errorf("the exponent is not the log-gamma form of its operands")
	}
	return nil
}

// logPattern returns the log-gamma terms of the match's shape.
func (b *builder) logPattern(o []linear) ([]wterm, error) {
	one := linearOne()
	p, m := constant.MakeInt64(1), constant.MakeInt64(-1)
	switch {
	case b.m.Shape == ShapeExpChoose && len(o) == 2:
		return []wterm{{w: p, x: o[0].add(one)}, {w: m, x: o[1].add(one)}, {w: m, x: o[0].add(o[1].neg()).add(one)}}, nil
	case b.m.Shape == ShapeExpBeta && len(o) == 2:
		return []wterm{{w: p, x: o[0]}, {w: p, x: o[1]}, {w: m, x: o[0].add(o[1])}}, nil
	case b.m.Shape == ShapeExpGammaRatio && len(o) == 2:
		return []wterm{{w: p, x: o[0]}, {w: m, x: o[1]}}, nil
	case b.m.Shape == ShapeExpFactorial && len(o) == 1:
		return []wterm{{w: p, x: o[0].add(one)}}, nil
	case b.m.Shape == ShapeExpBinomialPMF && len(o) == 3: // k, n, p
		k, n, q := o[0], o[1], o[2]
		return []wterm{{w: p, x: n.add(one)}, {w: m, x: k.add(one)}, {w: m, x: n.add(k.neg()).add(one)},
			{log: true, x: q, c: k}, {log: true, x: one.add(q.neg()), c: n.add(k.neg())}}, nil
	}
	return nil, fmt.Errorf("shape %d with %d operands has no log-gamma form", b.m.Shape, len(o))
}

// unround strips an integer or float conversion and one rounding
// (math.Floor, Ceil, Trunc, Round, RoundToEven) from e, where the
// analyzer matched an integer read: the helper's value is the integer
// they aim at.
func (b *builder) unround(e ast.Expr) ast.Expr {
	for i := 0; i < 2; i++ {
		c, ok := ast.Unparen(e).(*ast.CallExpr)
		if !ok || len(c.Args) != 1 {
			return e
		}
		if tv, ok := b.pass.TypesInfo.Types[c.Fun]; ok && tv.IsType() {
			e = c.Args[0]
			continue
		}
		_, fn := b.callOf(c)
		for _, r := range []string{"Floor", "Ceil", "Trunc", "Round", "RoundToEven"} {
			if isMath(fn, r) {
				e = c.Args[0]
			}
		}
	}
	return ast.Unparen(e)
}

// logTerms adds the log-gamma terms of the exponent e, times w, to out:
// sums, differences, negations and integer multiples of calls of a user
// function of one argument.
func (b *builder) logTerms(e ast.Expr, w constant.Value, out *[]wterm) bool {
	e = ast.Unparen(e)
	switch x := e.(type) {
	case *ast.BinaryExpr:
		switch x.Op {
		case token.ADD, token.SUB:
			wy := w
			if x.Op == token.SUB {
				wy = constant.UnaryOp(token.SUB, w, 0)
			}
			return b.logTerms(x.X, w, out) && b.logTerms(x.Y, wy, out)
		case token.MUL:
			for _, lr := range [][2]ast.Expr{{x.X, x.Y}, {x.Y, x.X}} {
				if tv, ok := b.pass.TypesInfo.Types[lr[0]]; ok && tv.Value != nil && tv.Value.Kind() == constant.Int {
					return b.logTerms(lr[1], constant.BinaryOp(w, token.MUL, tv.Value), out)
				}
			}
			// c·ln x, for the powers of a pmf written in log space.
			for _, lr := range [][2]ast.Expr{{x.X, x.Y}, {x.Y, x.X}} {
				lc, fn := b.callOf(lr[1])
				if lc == nil || !isMath(fn, "Log") || len(lc.Args) != 1 || b.m.Shape != ShapeExpBinomialPMF {
					continue
				}
				c, ok1 := b.linearOf(lr[0])
				l, ok2 := b.linearOf(lc.Args[0])
				if !ok1 || !ok2 {
					return false
				}
				*out = append(*out, wterm{log: true, x: l, c: c.scale(w)})
				return true
			}
		}
	case *ast.UnaryExpr:
		if x.Op == token.SUB {
			return b.logTerms(x.X, constant.UnaryOp(token.SUB, w, 0), out)
		}
	case *ast.CallExpr:
		if b.isNumericConversion(x) {
			return b.logTerms(x.Args[0], w, out)
		}
		c, fn := b.callOf(x)
		if c == nil || len(c.Args) != 1 || fn == nil || fn.Pkg() == nil || fn.Pkg().Path() == "math" {
			return false
		}
		l, ok := b.linearOf(c.Args[0])
		if !ok {
			return false
		}
		*out = append(*out, wterm{w: w, x: l})
		return true
	}
	return false
}

// merge adds the weights of equal arguments and drops zero weights.
func merge(ts []wterm) []wterm {
	var out []wterm
	for _, t := range ts {
		found := false
		for i := range out {
			if out[i].log == t.log && out[i].x.equal(t.x) {
				if t.log {
					out[i].c = out[i].c.add(t.c)
				} else {
					out[i].w = constant.BinaryOp(out[i].w, token.ADD, t.w)
				}
				found = true
				break
			}
		}
		if !found {
			out = append(out, t)
		}
	}
	kept := out[:0]
	for _, t := range out {
		if t.log && !t.c.equal(newLinear()) || !t.log && constant.Sign(t.w) != 0 {
			kept = append(kept, t)
		}
	}
	return kept
}

// sameTerms reports whether two merged term lists hold the same terms.
func sameTerms(a, b []wterm) bool {
	if len(a) != len(b) {
		return false
	}
	for _, t := range a {
		found := false
		for _, u := range b {
			if t.log == u.log && t.x.equal(u.x) && (t.log && t.c.equal(u.c) || !t.log && constant.Compare(t.w, token.EQL, u.w)) {
				found = true
				break
			}
		}
		if !found {
			return false
		}
	}
	return true
}
