package analyzer

import (
	"fmt"
	"go/ast"

	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/fixes"
)

// checkCall judges a call that no product consumed: a factorial call
// whose argument is certainly past its threshold, a conversion that
// comes after the factorial has broken, and math.Gamma.
func (fc *fnCtx) checkCall(call *ast.CallExpr) {
	c := fc.c
	if c.consumed[call] {
		return
	}
	if len(call.Args) == 1 && fc.isConversion(call) {
		fc.checkConversion(call)
		return
	}
	if c.isMathFunc(call, "Gamma") && len(call.Args) == 1 {
		fc.checkGamma(call)
		return
	}
	f, ok := fc.factorOf(call)
	if !ok || f.kind != kindFactorial && f.kind != kindDouble || f.fact.Safe {
		return
	}
	first := firstBadOf(f.kind, f.t) - f.off
	j := fc.judge(f.arg, first)
	if !j.definite {
		return
	}
	name, off := shownFactorial(f.arg, f.off)
	fc.report(finding{
		node:     call,
		cat:      catCall,
		definite: true,
		msg:      fmt.Sprintf("%s(%s): %s%s", f.fn.Name(), src(f.arg), factorialLimitText(f.kind, name, off, f.t), j.clause),
		related:  c.relatedDef(f.fn.Name(), f.fn.Pos()),
		match: &fixes.Match{Shape: fixes.ShapeFactorial, Node: call, Args: []ast.Expr{f.arg},
			Result: c.pass.TypesInfo.TypeOf(call), FirstBad: first},
	})
}

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
	switch {
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
	// the target type; a call whose value is (n+off)! is left alone.
	m := &fixes.Match{Shape: fixes.ShapeNone, Node: conv, Result: c.pass.TypesInfo.TypeOf(conv)}
	if f.off == 0 {
		m.Shape, m.Args = fixes.ShapeFactorialValue, []ast.Expr{f.arg}
	}
	fc.report(finding{node: conv, cat: catLateConv, definite: j.definite, msg: msg + j.clause,
		related: c.relatedDef(f.fn.Name(), f.fn.Pos()), match: m})
}
