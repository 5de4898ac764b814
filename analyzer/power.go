package analyzer

import (
	"fmt"
	"go/ast"
	"math"

	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/fixes"
)

// checkPowOverFactorial judges x^k/k! (with or without e^(−λ)): Poisson
// probabilities, Erlang B and C terms, Taylor-series terms. The term is
// small, but k! and x^k are computed separately and each overflows on
// its own: past k! the term is 0, past both it is NaN.
func (fc *fnCtx) checkPowOverFactorial(root ast.Expr, p *product) {
	var pow, fac factor
	exp := false
	for _, f := range p.num {
		switch {
		case f.math == "Pow":
			pow = f
		case f.math == "Exp":
			exp = true
		}
	}
	for _, f := range p.den {
		if f.kind != kindNone {
			fac = f
		}
	}
	if fac.kind != kindFactorial && fac.kind != kindDouble {
		return
	}
	first := firstBadOf(fac.kind, fac.t) - fac.off
	r := fc.rangeOf(fac.arg)
	facSafe := (fac.fact != nil && fac.fact.Safe) || r.IsEmpty() || r.Hi < first
	powText, powSafe := fc.powerLimit(pow)
	if facSafe && powSafe {
		return
	}
	what := "power-over-factorial term x^k/k!"
	m := &fixes.Match{Shape: fixes.ShapePowOverFactorial, Node: root, Result: fc.c.pass.TypesInfo.TypeOf(root)}
	if exp {
		what = "Poisson-style term λ^k·e^(−λ)/k!"
		m.Shape, m.Args = fixes.ShapePoisson, []ast.Expr{pow.arg2, pow.arg}
	} else {
		m.Args = []ast.Expr{pow.arg, pow.arg2}
	}
	if fac.off != 0 || p.other != 0 && !exp {
		m.Shape, m.Args = fixes.ShapeNone, nil
	}
	var msg, clause string
	definite := false
	if !facSafe {
		clause, definite = verdict(src(fac.arg), r, first)
		msg = fmt.Sprintf("%s in %s: the divisor %s %s for %s ≥ %d (%s), after which the term is 0 or NaN although its true value is small",
			what, fac.t.typeName(), bang(fac.arg, fac.off), verb(fac.t), src(fac.arg), first, largestFits(fac.kind, fac.t))
		if powText != "" {
			msg += "; " + powText
		}
	} else {
		msg = fmt.Sprintf("%s in %s: %s", what, pow.t.typeName(), powText)
	}
	fc.report(finding{node: root, cat: catPowOverFac, definite: definite, msg: msg + clause,
		related: fc.c.relatedDef(fac.fn.Name(), fac.fn.Pos()), match: m})
}

// powerLimit describes where math.Pow(x, k) overflows when x is a
// constant; with x unknown nothing is claimed and the power counts as
// safe.
func (fc *fnCtx) powerLimit(pow factor) (string, bool) {
	x, ok := fc.floatConst(pow.arg)
	if !ok || math.Abs(x) <= 1 {
		return "", true
	}
	first := thresholds.PowerFirstBad(pow.t.Num, x)
	r := fc.rangeOf(fc.stripConv(pow.arg2))
	if r.IsEmpty() || r.Hi < first {
		return "", true
	}
	return fmt.Sprintf("math.Pow(%s, %s) %s for %s ≥ %d", src(pow.arg), src(pow.arg2), verb(pow.t), src(fc.stripConv(pow.arg2)), first), false
}
