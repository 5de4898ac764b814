package analyzer

import (
	"go/ast"
	"go/types"

	vm "github.com/overfact/overfact/analyzer/valuemodel"
	"github.com/overfact/overfact/fixes"
)

// loopQuotientLogMatch offers, for a float64 quotient of loop
// accumulators (num / den over a falling-factorial loop and a factorial
// loop, or n! over the factors a loop multiplies in under conditions),
// to carry every accumulator the quotient reads as the helper's Product
// (ShapeLogSpaceTerm): each loop keeps its trips and forms the same
// float64 value, with the logarithm of its magnitude and its sign
// beside it, so the quotient is the code's own value wherever both
// running products stayed in float64 and the ratio of the logarithms
// where one left it (+Inf/+Inf is NaN in float64). The rewrite is exact
// for any operands, counts that are fractions or negative included, so
// it needs no domain. nil for an integer quotient (its wrapped products
// are finite: another row rewrites those) or where the quotient reads
// no accumulator directly.
func (fc *fnCtx) loopQuotientLogMatch(res *vm.Result, quo *ast.BinaryExpr, loops []*vm.Loop) *fixes.Match {
	info := fc.c.pass.TypesInfo
	if t, ok := info.TypeOf(quo).Underlying().(*types.Basic); !ok || t.Kind() != types.Float64 {
		return nil
	}
	accs := make(map[types.Object]bool)
	for _, l := range loops {
		for _, a := range l.Accs {
			accs[a.Obj] = true
		}
	}
	var args []ast.Expr
	seen := make(map[types.Object]bool)
	ast.Inspect(quo, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok {
			if obj := info.Uses[id]; accs[obj] && !seen[obj] {
				seen[obj] = true
				args = append(args, id)
			}
		}
		return true
	})
	if len(args) == 0 {
		return nil
	}
	return &fixes.Match{Shape: fixes.ShapeLogSpaceTerm, Node: quo, Args: args, Result: info.TypeOf(quo), Func: fc.node}
}
