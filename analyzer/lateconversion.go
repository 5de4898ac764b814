package analyzer

import (
	"fmt"
	"go/ast"

	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/fixes"
)

// The late-conversion category: a factorial or binomial coefficient
// converted to another type after it has already wrapped or lost
// exactness in its own.

// checkConversion judges T(v) where v is a factorial value that has
// already broken in its own type: an integer factorial converted to
// float (wrapped before the conversion), or a float factorial converted
// to an integer (no longer exact, or too large for the integer).
func (fc *fnCtx) checkConversion(conv *ast.CallExpr) {
	c := fc.c
	to, ok := c.numOf(c.pass.TypesInfo.TypeOf(conv))
	if !ok {
		return
	}
	inner, ok := ast.Unparen(conv.Args[0]).(*ast.CallExpr)
	if !ok {
		return
	}
	f, ok := fc.factorOf(inner)
	if !ok || c.consumed[inner] {
		return
	}
	var first int64
	var msg string
	definite := true
	switch {
	case f.kind == kindBinomial && !f.t.Float && to.Float && !f.fact.Safe && f.arg2 != nil:
		// The integer function's own first bad n at k = n/2 (where its
		// product or its n! wraps; C(n, n/2) itself at the latest),
		// while the float type holds the coefficient much further: a
		// caller converting it means to compute in the float type.
		first = f.fact.FirstBad
		definite = false // the range of k decides too
		msg = fmt.Sprintf("%s computes C(%s, %s) in %s, which wraps for %s ≥ %d at %s = %s/2, before the conversion to %s (which holds C(n, n/2) up to n = %d)",
			src(inner), src(f.arg), src(f.arg2), f.t.typeName(), src(f.arg), first, src(f.arg2), parenText(src(f.arg)), to.Name, thresholds.CentralBinomial(to.Num).FirstBad-1)
	case f.kind == kindFactorial && !f.t.Float && to.Float && !f.fact.Safe:
		first = thresholds.Factorial(f.t.Num).FirstBad - f.off
		msg = fmt.Sprintf("%s is computed in %s, which wraps for %s ≥ %d, before the conversion to %s (which holds it up to %s = %d)",
			bang(f.arg, f.off), f.t.typeName(), src(f.arg), first, to.Name, src(f.arg), thresholds.Factorial(to.Num).FirstBad-1-f.off)
	case f.kind == kindFactorial && f.t.Float && !to.Float:
		exact := thresholds.FloatExact(f.t.Num).FirstBad - f.off
		fits := thresholds.Factorial(to.Num).FirstBad - f.off
		first = min(exact, fits)
		msg = fmt.Sprintf("%s(%s) of a %s factorial: %s is no longer exact in %s for %s ≥ %d and exceeds %s for %s ≥ %d",
			to.Name, src(conv.Args[0]), f.t.Name, bang(f.arg, f.off), f.t.Name, src(f.arg), exact, to.Name, src(f.arg), fits)
	default:
		return
	}
	c.consumed[inner] = true
	j := fc.judge(f.arg, first)
	if j.silent {
		return
	}
	// The conversion and the call become one helper call computing n! in
	// the target type, or C(n, k) in float64; a call whose value is
	// (n+off)! is left alone.
	m := &fixes.Match{Shape: fixes.ShapeNone, Node: conv, Result: c.pass.TypesInfo.TypeOf(conv)}
	switch {
	case f.off == 0 && f.kind == kindFactorial:
		m.Shape, m.Args = fixes.ShapeFactorialValue, []ast.Expr{f.arg}
	case f.kind == kindBinomial:
		// The conversion and the call become the float helper of the
		// function's form, where the form is known (report fills
		// Match.IntBinomials); no fix otherwise.
		m.Shape = fixes.ShapeBinomialValue
	}
	fc.report(finding{node: conv, cat: catLateConv, definite: definite && j.definite, msg: msg + j.clause,
		related: c.relatedDef(f.fn.Name(), f.fn.Pos()), match: m})
}
