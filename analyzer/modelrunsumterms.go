package analyzer

import (
	"go/ast"
	"go/types"

	vm "github.com/overfact/overfact/analyzer/valuemodel"
	"github.com/overfact/overfact/fixes"
)

// runSumTermsMatch describes for the fixer (ShapeRunSum) a sum whose
// term the code writes out on each trip from powers and factorial
// calls, with no running term (Erlang B's den += a^k/k!, read as
// num / den after the loop): the factorial calls of the term and of the
// locals the read multiplies beside the sum, each a value its function
// returns with ln n! beside it in the fix (lgamma.FactorialProduct). nil
// where the term reads a float64 local (a running term: runSumMatch's
// own case) or holds no factorial call.
func (fc *fnCtx) runSumTermsMatch(s *vm.SumAcc, scaled, term ast.Expr) *fixes.Match {
	c := fc.c
	info := c.pass.TypesInfo
	running := false
	ast.Inspect(term, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok {
			if v, ok := info.Uses[id].(*types.Var); ok && !v.IsField() && v.Parent() != c.pass.Pkg.Scope() && !isParam(fc.signature(), v) {
				if b, ok := v.Type().Underlying().(*types.Basic); ok && b.Info()&types.IsFloat != 0 {
					running = true
				}
			}
		}
		return !running
	})
	if running {
		return nil
	}
	facs := fc.factorialCallsIn(term)
	if len(facs) == 0 {
		return nil
	}
	// The locals the read multiplies beside the sum: their factorial
	// calls too, from their one definition.
	ast.Inspect(scaled, func(n ast.Node) bool {
		id, ok := n.(*ast.Ident)
		if !ok || info.Uses[id] == s.Obj {
			return true
		}
		if d := fc.singleDef(id); d != nil {
			facs = append(facs, fc.factorialCallsIn(d)...)
		}
		return true
	})
	return &fixes.Match{Shape: fixes.ShapeRunSum, Node: scaled, Acc: s.Obj, Result: info.TypeOf(scaled), Func: fc.node, Factorials: facs}
}

// factorialCallsIn returns the calls in e of float factorial functions
// whose fact says they return n! of a parameter (no offset).
func (fc *fnCtx) factorialCallsIn(e ast.Expr) []fixes.FactorialCall {
	c := fc.c
	var out []fixes.FactorialCall
	ast.Inspect(e, func(n ast.Node) bool {
		call, ok := n.(*ast.CallExpr)
		if !ok {
			return true
		}
		if ff := c.factOf(c.calleeOf(call)); ff != nil && kindOfName(ff.Kind) == kindFactorial && ff.Offset == 0 && ff.Param < len(call.Args) {
			if t, ok := c.pass.TypesInfo.TypeOf(call).Underlying().(*types.Basic); ok && t.Kind() == types.Float64 {
				out = append(out, fixes.FactorialCall{Call: call, Arg: call.Args[ff.Param]})
			}
		}
		return true
	})
	return out
}
