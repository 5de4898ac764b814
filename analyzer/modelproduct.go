package analyzer

import (
	"fmt"
	"go/ast"
	"math/big"

	"github.com/overfact/overfact/analyzer/thresholds"
	vm "github.com/overfact/overfact/analyzer/valuemodel"
)

// factorialProduct reports an integer accumulator that every trip only
// multiplies, by whole factors that grow with the counter, whose value
// after the loop the model names as a product of Gamma values in the
// loop's count alone: h *= i·(i−1) is n!·(n−1)!, h *= (2i−1)·2i is
// (2n)!. None of the shapes before it names such a product; the first
// count at which it leaves the type is thresholds.ProductFirstBad's.
// The code's later arithmetic on it (a shift, a division) cannot undo
// the wrap.
func (mc *modelCtx) factorialProduct(a *vm.Acc, t numType) bool {
	l := mc.loop
	if t.Float || a.Guarded || a.After == nil || len(a.Ops) == 0 || l.Counter == nil || len(l.Sums) > 0 {
		return false
	}
	for _, op := range a.Ops {
		if !op.Mul {
			return false
		}
	}
	if len(a.After.Gamma) == 0 || a.After.SqrtPi != 0 || len(a.After.Pows) > 0 {
		return false
	}
	nv, alpha, beta, ok := oneVar(l.Count)
	if !ok || alpha.Cmp(big.NewRat(1, 1)) != 0 || !beta.IsInt() || !beta.Num().IsInt64() {
		return false
	}
	for _, s := range termSyms(a.After, vm.Int(0)) {
		if s != nv {
			return false
		}
	}
	// The loop runs at least once from count 1.
	first, last, ok := thresholds.ProductFirstBad(t.Num, 1-beta.Num().Int64(), termSeq(a.After, nv))
	if !ok {
		return false
	}
	fc := mc.fc
	j := decideName(nv.Name(), fc.symRange(mc.res, nv, l.Stmt), first)
	if j.silent {
		return true
	}
	if id := fc.condIdent(l.Stmt, nv); id != nil {
		// Callers learn where the function goes wrong: from n = first.
		fc.noteJudged(id, first, j)
	}
	what := a.After.String()
	if f := vm.RecogniseAny(a.After); f.Kind != vm.Unknown && f.Kind != vm.GammaRatio {
		what = f.String()
	}
	msg := fmt.Sprintf("running product %s computes %s, which in %s %s for %s ≥ %d (at %s = %d it is ≈ %s, the largest that fits)",
		a.Obj.Name(), what, t.typeName(), verb(t), nv.Name(), first, nv.Name(), first-1, thresholds.Approx(last))
	fc.report(finding{node: l.Stmt, cat: catLoop, definite: j.definite, msg: msg + j.clause})
	return true
}

// condIdent returns the use of v in the condition of loop, nil if the
// loop is no for statement or its condition does not read v.
func (fc *fnCtx) condIdent(loop ast.Stmt, v vm.Sym) *ast.Ident {
	f, ok := loop.(*ast.ForStmt)
	if !ok || f.Cond == nil || v.Field != nil {
		return nil
	}
	var out *ast.Ident
	ast.Inspect(f.Cond, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok && out == nil && fc.c.pass.TypesInfo.Uses[id] == v.Obj {
			out = id
		}
		return out == nil
	})
	return out
}
