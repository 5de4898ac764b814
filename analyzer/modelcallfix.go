package analyzer

import (
	"go/ast"

	vm "github.com/overfact/overfact/analyzer/valuemodel"
	"github.com/overfact/overfact/fixes"
)

// callRootMatch describes, for the fixer, a root whose whole value is a
// canonical form the helper computes in one call, or returns nil. The
// form's arguments must each be one variable of the function, which the
// model read at Exprs; the fixer then checks the expression factor by
// factor against the shape on its own (checkShape), refuses a float
// count where the helper takes an integer, and type-checks the result.
//
//	return probkit.Choose(float64(n), float64(k)) * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k))
//
// becomes return lgamma.BinomialPMF(k, n, p), which is right wherever
// the original was and stays right past n = 171.
func (fc *fnCtx) callRootMatch(res *vm.Result, root ast.Expr, form vm.Form) *fixes.Match {
	var shape fixes.Shape
	switch form.Kind {
	case vm.BinomialPMF: // form: n, k, p; shape: k, n, p
		shape = fixes.ShapeBinomialPMF
		form.Args = []vm.Affine{form.Args[1], form.Args[0], form.Args[2]}
	case vm.Hypergeometric: // form and shape: k, N, K, n
		shape = fixes.ShapeHypergeometric
	case vm.NegBinomialPMF: // form and shape: f, s, p
		shape = fixes.ShapeNegBinomialPMF
	case vm.InvBeta: // form and shape: a, b
		shape = fixes.ShapeInverseBeta
	default:
		return nil
	}
	args := make([]ast.Expr, len(form.Args))
	for i, a := range form.Args {
		v, ok := plainVar(a)
		if !ok || v.Loop != nil {
			return nil
		}
		if args[i] = res.Exprs[v]; args[i] == nil {
			return nil
		}
	}
	return &fixes.Match{Shape: shape, Node: root, Args: args, Result: fc.c.pass.TypesInfo.TypeOf(root)}
}
