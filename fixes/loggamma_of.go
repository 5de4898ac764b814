package fixes

import (
	"errors"
	"go/ast"

	"github.com/overfact/overfact/internal/astpath"
)

// The log of a gamma value, math.Log(math.Gamma(x)), is +Inf from
// x = 171.62 on, where Γ(x) overflows although ln Γ(x) is about 708 and
// grows slowly. A bare Γ has no rewrite (no float64 holds Γ(172)), but
// its logarithm has one: ln Γ(x) = lgamma.LogGamma(x) for x > 0, where
// Γ is positive (DLMF 5.2.1, common practice). For x ≤ 0 the original's
// value (NaN where Γ is negative, −Inf or +Inf at the poles and where Γ
// underflows) is kept:
//
//	func() float64 {
//		if x > 0 {
//			return lgamma.LogGamma(x)
//		}
//		//overfact:allow arguments at or below 0 keep the original arithmetic
//		return math.Log(math.Gamma(x))
//	}()
func buildLogOfGamma(b *builder) error {
	if len(b.m.Args) != 1 || classOf(b.m.Result) != classFloat {
		return errors.New("a bare math.Gamma: no float64 holds Γ(172)")
	}
	path, _ := astpath.Enclosing(b.file, b.m.Node.Pos(), b.m.Node.End())
	var log *ast.CallExpr
	for i := 1; i < len(path); i++ {
		if _, ok := path[i].(*ast.ParenExpr); ok {
			continue
		}
		if c, fn := b.callOf(asExpr(path[i])); c != nil && isMath(fn, "Log") && len(c.Args) == 1 && ast.Unparen(c.Args[0]) == b.m.Node {
			log = c
		}
		break
	}
	if log == nil {
		return errors.New("a bare math.Gamma: no float64 holds Γ(172)")
	}
	if err := b.checkShape(); err != nil {
		return err
	}
	text, err := b.call("LogGamma", b.m.Args, b.m.Result)
	if err != nil {
		return err
	}
	x := b.copyText(b.m.Args[0])
	if _, ok := ast.Unparen(b.m.Args[0]).(*ast.Ident); !ok {
		if _, ok := ast.Unparen(b.m.Args[0]).(*ast.SelectorExpr); !ok {
			x = "(" + x + ")"
		}
	}
	g, err := b.keepAsWritten(text, log, []string{x + " > 0"}, true, "arguments at or below 0 keep the original arithmetic")
	if err != nil {
		return err
	}
	b.replace(log.Pos(), log.End(), g)
	b.message = "Rewrite the log of the gamma value as " + text + " where the argument is positive (imports " + HelperPath + ")"
	return nil
}

// asExpr returns n as an expression, or nil.
func asExpr(n ast.Node) ast.Expr {
	e, _ := n.(ast.Expr)
	return e
}
