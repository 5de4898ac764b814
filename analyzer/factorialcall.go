package analyzer

import (
	"fmt"
	"go/ast"

	"github.com/overfact/overfact/fixes"
)

// The factorial-call category: a call of a factorial-valued function
// (of this package, or of another through its fact) whose argument is
// certainly past the function's first bad value. A call whose argument
// only may reach it is the definition's finding, not the call's.

// checkFactorialCall reports a factorial call, not part of a product,
// whose argument is certainly past its threshold.
func (fc *fnCtx) checkFactorialCall(call *ast.CallExpr) {
	c := fc.c
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
