package fixes

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"

	"golang.org/x/tools/go/types/typeutil"
)

// The analyzer finds the shapes; before replacing an expression, the
// fixer checks on its own that the expression is that shape of the match's
// operands, factor by factor. A helper call replaces the whole
// expression, so a mismatch (an e^(−2λ) in a Poisson term, an x^(k+1)
// over k!, an extra factor g(n)) would otherwise change the value.

// A factorPattern accepts one factor of a product or quotient.
type factorPattern func(ast.Expr) bool

// shapeMatches reports whether the match's expression multiplies exactly
// the num patterns and divides by exactly the den patterns, in any order.
func (b *builder) shapeMatches(num, den []factorPattern) bool {
	var gotNum, gotDen []ast.Expr
	if !b.nodeFactors(&gotNum, &gotDen) {
		return false
	}
	return assign(gotNum, num) && assign(gotDen, den)
}

// nodeFactors splits the match's value into the factors it multiplies
// and divides by: its expression's, then its chain's (Match.Chain).
func (b *builder) nodeFactors(num, den *[]ast.Expr) bool {
	e, ok := b.m.Node.(ast.Expr)
	if !ok || !b.factors(e, false, num, den) {
		return false
	}
	for _, s := range b.m.Chain {
		as, ok := s.(*ast.AssignStmt)
		if !ok || len(as.Rhs) != 1 || !b.factors(as.Rhs[0], as.Tok == token.QUO_ASSIGN, num, den) {
			return false
		}
	}
	return true
}

// factors splits e into the factors it multiplies (num) and divides by
// (den), through parentheses, numeric conversions and the locals the
// rewrite absorbs.
func (b *builder) factors(e ast.Expr, inv bool, num, den *[]ast.Expr) bool {
	e = ast.Unparen(e)
	switch x := e.(type) {
	case *ast.BinaryExpr:
		switch x.Op {
		case token.MUL:
			return b.factors(x.X, inv, num, den) && b.factors(x.Y, inv, num, den)
		case token.QUO:
			return b.factors(x.X, inv, num, den) && b.factors(x.Y, !inv, num, den)
		}
	case *ast.CallExpr:
		if b.isNumericConversion(x) {
			return b.factors(x.Args[0], inv, num, den)
		}
	case *ast.Ident:
		if rhs := b.absorbedValue(x); rhs != nil {
			return b.factors(rhs, inv, num, den)
		}
	}
	if inv {
		*den = append(*den, e)
	} else {
		*num = append(*num, e)
	}
	return true
}

// absorbedValue returns the value of the absorbed local id names, or nil.
func (b *builder) absorbedValue(id *ast.Ident) ast.Expr {
	obj := b.pass.TypesInfo.Uses[id]
	for _, d := range b.absorbed {
		if b.definedVar(d) == obj && obj != nil {
			return initValue(b.pass.TypesInfo, d, obj)
		}
	}
	return nil
}

// assign reports whether each factor matches a distinct pattern and no
// pattern is left over.
func assign(factors []ast.Expr, patterns []factorPattern) bool {
	if len(factors) != len(patterns) {
		return false
	}
	if len(factors) == 0 {
		return true
	}
	for i, p := range patterns {
		if !p(factors[0]) {
			continue
		}
		rest := append(append([]factorPattern(nil), patterns[:i]...), patterns[i+1:]...)
		if assign(factors[1:], rest) {
			return true
		}
	}
	return false
}

// callOf returns e as a call that is not a conversion, with its static
// callee (nil for a call of a function value).
func (b *builder) callOf(e ast.Expr) (*ast.CallExpr, *types.Func) {
	c, ok := ast.Unparen(e).(*ast.CallExpr)
	if !ok {
		return nil, nil
	}
	if tv, ok := b.pass.TypesInfo.Types[c.Fun]; ok && tv.IsType() {
		return nil, nil
	}
	return c, typeutil.StaticCallee(b.pass.TypesInfo, c)
}

func isMath(fn *types.Func, name string) bool {
	return fn != nil && fn.Pkg() != nil && fn.Pkg().Path() == "math" && fn.Name() == name
}

// argsAre reports whether the call's arguments equal the forms.
func (b *builder) argsAre(c *ast.CallExpr, forms ...linear) bool {
	if len(c.Args) != len(forms) {
		return false
	}
	for i, a := range c.Args {
		l, ok := b.linearOf(a)
		if !ok || !l.equal(forms[i]) {
			return false
		}
	}
	return true
}

// userCall accepts a call of a function of the user's (the analyzer
// vouches that it computes a factorial or a binomial) on the forms.
func (b *builder) userCall(forms ...linear) factorPattern {
	return func(e ast.Expr) bool {
		c, fn := b.callOf(e)
		return c != nil && (fn == nil || fn.Pkg() == nil || fn.Pkg().Path() != "math") && b.argsAre(c, forms...)
	}
}

// vouched accepts what p accepts, or the variable the analyzer vouches
// holds p's factor (Match.Vouched).
func (b *builder) vouched(p factorPattern) factorPattern {
	return func(e ast.Expr) bool {
		return b.m.Vouched != nil && ast.Unparen(e) == b.m.Vouched || p(e)
	}
}

// converted accepts what p accepts, or a conversion of it: factors keeps
// a float-to-integer conversion, which drops a fraction, as one factor.
func (b *builder) converted(p factorPattern) factorPattern {
	return func(e ast.Expr) bool {
		if c, ok := ast.Unparen(e).(*ast.CallExpr); ok && len(c.Args) == 1 {
			if tv, ok := b.pass.TypesInfo.Types[c.Fun]; ok && tv.IsType() {
				return p(c.Args[0])
			}
		}
		return p(e)
	}
}

// mathCall accepts math.name on the forms.
func (b *builder) mathCall(name string, forms ...linear) factorPattern {
	return func(e ast.Expr) bool {
		c, fn := b.callOf(e)
		return c != nil && isMath(fn, name) && b.argsAre(c, forms...)
	}
}

// checkShape checks the expression of a ratio or term match against its
// shape, with the operands read as linear forms.
func (b *builder) checkShape() error {
	if logFormShape(b.m.Shape) {
		return b.checkLogForm()
	}
	row, ok := shapes[b.m.Shape]
	if !ok || row.factors == nil || row.operands != anyOperands && len(b.m.Args) != row.operands || len(b.m.Args) == 0 {
		return fmt.Errorf("shape %d with %d operands has no check", b.m.Shape, len(b.m.Args))
	}
	ops, err := b.operandForms()
	if err != nil {
		return err
	}
	num, den, alt := row.factors(b, ops)
	if b.shapeMatches(num, den) || alt != nil && b.shapeMatches(alt[0], alt[1]) {
		return nil
	}
	return fmt.Errorf("the expression is not the %s of its operands", row.name)
}

// operandForms reads the match's operands as linear forms.
func (b *builder) operandForms() ([]linear, error) {
	ops := make([]linear, len(b.m.Args))
	for i, a := range b.m.Args {
		l, ok := b.linearOf(a)
		if !ok {
			return nil, fmt.Errorf("operand %s is not a sum of variables and constants", b.text(a))
		}
		ops[i] = l
	}
	return ops, nil
}
