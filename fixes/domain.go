package fixes

import (
	"fmt"
	"go/ast"
	"go/types"
	"strings"

	"github.com/overfact/overfact/internal/astpath"
)

// A helper computes its quantity on the quantity's domain: C(n, k) for
// 0 ≤ k ≤ n, a probability for p in [0, 1], Γ(a)/Γ(b) away from the
// poles. The code it replaces computed something outside it too, and
// often the right thing for what it is: a factorial loop is an empty
// product, 1, below 2, so fact(n)/(fact(k)·fact(n−k)) is 0 for k > n
// where lgamma.Choose is 0 as well but lgamma.MustFallingInt64 panics,
// and fact(−3)/fact(−28) is 1 where the helper panics; math.Gamma(−2.5)
// is finite where lgamma.Beta(−2.5, b) is NaN (lgamma.GammaRatio follows
// math.Gamma below zero: no test). A fix must not change a
// value the code got right, so where the operands leave the domain the
// rewritten code runs the expression as written:
//
//	if k < 0 || k > n {
//		//overfact:allow outside 0 ≤ k ≤ n the expression as written
//		return fact(n) / (fact(k) * fact(n-k))
//	}
//	return lgamma.MustChooseInt64(int64(n), int64(k))
//
// where the expression is what a return statement returns, and the same
// test inside a function literal called in place elsewhere.
//
// Inside the domain the helper and the expression are the same quantity
// (the row's identity), so the expression as written runs only where
// the helper would have differed from it; whatever it computes there is
// what the code always computed.

// A domainRule is the test, over the match's operands in the order
// match.go documents, that the operands are outside the domain: its
// disjuncts (%[1]s is the first operand), the operands that are
// compared with each other (which must have one type), and the domain
// in words for the directive's reason.
type domainRule struct {
	outside []string
	same    []int
	domain  string
}

var domainRules = map[Shape]domainRule{
	ShapeBinomial:       {[]string{"%[2]s < 0", "%[2]s > %[1]s"}, []int{0, 1}, "0 ≤ k ≤ n"},
	ShapePermutation:    {[]string{"%[2]s < 0", "%[2]s > %[1]s"}, []int{0, 1}, "0 ≤ k ≤ n"},
	ShapeCatalan:        {[]string{"%[1]s < 0"}, nil, "n ≥ 0"},
	ShapeFactorialValue: {[]string{"%[1]s < 0"}, nil, "n ≥ 0"},
	// Outside its support the hypergeometric probability is 0, as the
	// helper says; only a lot that cannot exist has no value there.
	ShapeHypergeometric:   {[]string{"%[2]s < 0", "%[3]s < 0", "%[3]s > %[2]s", "%[4]s < 0", "%[4]s > %[2]s"}, []int{1, 2, 3}, "0 ≤ successes, draws ≤ total"},
	ShapePowOverFactorial: {[]string{"%[2]s < 0"}, nil, "k ≥ 0"},
	ShapePoisson:          {[]string{"%[1]s < 0", "%[2]s < 0"}, nil, "k ≥ 0, λ ≥ 0"},
	ShapeBinomialPMF:      {[]string{"%[1]s < 0", "%[1]s > %[2]s", "%[3]s < 0", "%[3]s > 1"}, []int{0, 1}, "0 ≤ k ≤ n, 0 ≤ p ≤ 1"},
	ShapeNegBinomialPMF:   {[]string{"%[1]s < 0", "%[2]s < 1", "%[3]s < 0", "%[3]s > 1"}, nil, "f ≥ 0, s ≥ 1, 0 ≤ p ≤ 1"},
	ShapeBeta:             {[]string{"%[1]s <= 0", "%[2]s <= 0"}, nil, "positive arguments"},
	ShapeInverseBeta:      {[]string{"%[1]s <= 0", "%[2]s <= 0"}, nil, "positive arguments"},
}

// domainRuleOf returns the rule of the match's shape; a multinomial's
// has one disjunct per part.
func (b *builder) domainRuleOf() (domainRule, bool) {
	if b.m.Shape == ShapeMultinomial {
		var r domainRule
		for i := range b.m.Args {
			r.outside = append(r.outside, fmt.Sprintf("%%[%d]s < 0", i+1))
		}
		r.domain = "parts ≥ 0"
		return r, len(r.outside) > 0
	}
	r, ok := domainRules[b.m.Shape]
	return r, ok
}

// keepOutsideDomain makes the node's own expression run where the
// operands leave the helper's domain: before the return statement that
// returns the node, or by wrapping text, the helper call replacing it,
// which it returns. It changes nothing where that cannot be written
// faithfully (operands with effects evaluated twice, locals the rewrite
// deletes) or is never needed (constant operands).
func (b *builder) keepOutsideDomain(text string, args []ast.Expr) (string, error) {
	r, ok := b.domainRuleOf()
	if !ok || len(b.absorbed) > 0 {
		return text, nil
	}
	if b.countGuarded {
		// countCall already keeps the expression as written outside
		// whole-numbered counts in the helper's domain.
		return text, nil
	}
	ops := make([]any, len(args))
	exprs := make([]ast.Expr, len(args))
	allConst := true
	for i, a := range args {
		if !b.plain(a) { // evaluated twice: in the test and in the call
			return text, nil
		}
		// float64(k) < 0 is k < 0: test the count itself.
		e := b.floatOfInt(a)
		tv, ok := b.pass.TypesInfo.Types[e]
		if !ok {
			return text, nil
		}
		if tv.Value == nil {
			allConst = false
		}
		exprs[i] = e
		ops[i] = operandText(b.text(e), e)
	}
	if allConst {
		return text, nil
	}
	for _, i := range r.same {
		if i >= len(args) || !types.Identical(b.pass.TypesInfo.TypeOf(exprs[i]), b.pass.TypesInfo.TypeOf(exprs[r.same[0]])) {
			return text, nil
		}
	}
	var conds []string
	for _, c := range r.outside {
		// An unsigned count is never below zero.
		var i int
		if n, _ := fmt.Sscanf(c, "%%[%d]s < 0", &i); n == 1 && i-1 < len(exprs) && c == fmt.Sprintf("%%[%d]s < 0", i) {
			if t, ok := b.pass.TypesInfo.TypeOf(exprs[i-1]).Underlying().(*types.Basic); ok && t.Info()&types.IsUnsigned != 0 {
				continue
			}
		}
		conds = append(conds, fmt.Sprintf(c, ops...))
	}
	if len(conds) == 0 {
		return text, nil
	}
	orig := b.copyText(b.m.Node)
	if ret := b.returning(); ret != nil {
		ind := b.indentOf(ret.Pos())
		b.replace(ret.Pos(), ret.Pos(), fmt.Sprintf("if %[2]s {\n%[1]s\t//overfact:allow outside %[3]s the expression as written\n%[1]s\treturn %[4]s\n%[1]s}\n%[1]s",
			ind, strings.Join(conds, " || "), r.domain, orig))
		return text, nil
	}
	name, err := b.typeName(b.m.Result)
	if err != nil {
		return "", err
	}
	ind := b.indentOf(b.m.Node.Pos())
	return fmt.Sprintf("func() %[1]s {\n%[2]s\tif %[3]s {\n%[2]s\t\t//overfact:allow outside %[4]s the expression as written\n%[2]s\t\treturn %[5]s\n%[2]s\t}\n%[2]s\treturn %[6]s\n%[2]s}()",
		name, ind, strings.Join(conds, " || "), r.domain, orig, text), nil
}

// returning returns the return statement whose only result is the
// match's node, if it is one that starts its line.
func (b *builder) returning() *ast.ReturnStmt {
	path, _ := astpath.Enclosing(b.file, b.m.Node.Pos(), b.m.Node.End())
	for i, n := range path {
		if n == b.m.Node {
			if i+1 < len(path) {
				if ret, ok := path[i+1].(*ast.ReturnStmt); ok && len(ret.Results) == 1 && ret.Results[0] == b.m.Node &&
					b.offset(ret.Pos()) == b.offset(b.tok.LineStart(b.line(ret.Pos())))+len(b.indentOf(ret.Pos())) {
					return ret
				}
			}
			break
		}
	}
	return nil
}

// operandText is an operand's source, parenthesised unless it is an
// operand in Go's grammar already.
func operandText(text string, e ast.Expr) string {
	switch ast.Unparen(e).(type) {
	case *ast.Ident, *ast.BasicLit, *ast.SelectorExpr, *ast.CallExpr, *ast.IndexExpr:
		return text
	}
	if _, ok := e.(*ast.ParenExpr); ok {
		return text
	}
	return "(" + text + ")"
}
