package fixes

import (
	"errors"
	"fmt"
	"go/ast"
	"go/token"
)

// A ratio of two Gamma values among other factors,
//
//	return math.Gamma((v+1)/2) / (math.Sqrt(v*math.Pi) * math.Gamma(v/2))
//
// is NaN once both Gamma values are +Inf (ν ≥ 343), although the ratio
// is near √(ν/2). The numerator's call becomes the ratio from the
// helper, the denominator's call leaves its product, and the other
// factors stay where they are:
//
//	return lgamma.GammaRatio((v+1)/2, v/2) / (math.Sqrt(v*math.Pi))
//
// The fixer checks that the numerator's call is a factor of the whole
// expression (reached through products, the left of quotients and
// parentheses) and the denominator's a divisor of it (through exactly one
// right side of a quotient), so that removing the one and dividing the
// other by it is the same value.
func buildGammaRatioAmong(b *builder) error {
	m := b.m
	root, ok := m.Node.(ast.Expr)
	if !ok || len(m.Args) != 2 || len(m.Extra) != 2 {
		return errors.New("gamma ratio match lacks its expression, arguments or calls")
	}
	if classOf(m.Result) != classFloat {
		return fmt.Errorf("gamma ratio of non-float type %s", m.Result)
	}
	num, den := m.Extra[0], m.Extra[1]
	for i, c := range []ast.Expr{num, den} {
		call, ok := c.(*ast.CallExpr)
		if !ok || len(call.Args) != 1 || call.Args[0] != m.Args[i] {
			return errors.New("the match's calls do not take its arguments")
		}
	}
	if d, _, ok := divisions(root, num); !ok || d != 0 {
		return errors.New("the numerator's Gamma is not a factor of the expression")
	}
	d, par, ok := divisions(root, den)
	if !ok || d != 1 || par == nil {
		return errors.New("the denominator's Gamma is not a divisor of the expression")
	}
	if b.commentIn(root) {
		return errors.New("the expression holds a comment")
	}
	call, err := b.call("GammaRatio", m.Args, m.Result)
	if err != nil {
		return err
	}
	// The denominator's call goes with its operator: "* Γ(b)", "Γ(b) *"
	// or "/ Γ(b)".
	if ast.Unparen(par.Y) == den {
		b.replace(par.X.End(), par.Y.End(), "")
	} else {
		b.replace(par.X.Pos(), par.Y.Pos(), "")
	}
	b.replace(num.Pos(), num.End(), call)
	b.message = fmt.Sprintf("Rewrite the ratio of math.Gamma values as %s, keeping the other factors (imports %s)", b.shown, HelperPath)
	return nil
}

// divisions follows e down to target through parentheses, products and
// quotients, and returns how many times the path takes a quotient's
// divisor and the binary expression whose operand (under parentheses)
// target is; ok is false when target is not reached that way (a sum, a
// call, a conversion on the path).
func divisions(e, target ast.Expr) (n int, par *ast.BinaryExpr, ok bool) {
	for {
		if e == target {
			return n, par, true
		}
		switch x := e.(type) {
		case *ast.ParenExpr:
			e = x.X
			continue
		case *ast.BinaryExpr:
			if x.Op != token.MUL && x.Op != token.QUO {
				return 0, nil, false
			}
			var next ast.Expr
			switch {
			case x.X.Pos() <= target.Pos() && target.End() <= x.X.End():
				next = x.X
			case x.Y.Pos() <= target.Pos() && target.End() <= x.Y.End():
				next = x.Y
				if x.Op == token.QUO {
					n++
				}
			default:
				return 0, nil, false
			}
			if ast.Unparen(next) == target {
				par = x
			}
			e = next
			continue
		}
		return 0, nil, false
	}
}
