package analyzer

import (
	"go/ast"
	"go/types"

	vm "github.com/overfact/overfact/analyzer/valuemodel"
	"github.com/overfact/overfact/fixes"
)

// binomialMatch describes a binomial loop of the model for the fixer,
// or returns nil where the model cannot vouch that one helper call
// computes the same value as the loop wherever the loop was right:
//
//   - n and k are each one variable or a field of one, read as they
//     are: a parameter or receiver (its entry value), or a local the
//     model reads as the value it holds where the loop starts (the one
//     definition it has, or the last assignment the algebra could not
//     evaluate, n = math.Trunc(n)); an integer, or a float, which may hold
//     a fraction the integer helpers would drop, so that the fixer keeps
//     the loop as written wherever a float operand is no integer in the
//     helper's domain;
//   - the loop runs exactly k trips: its trip count is k and it has no
//     early exit; over a negative k it runs none and leaves 1, where
//     C(n, k) is 0, so unless k ≥ 0 where it starts (CountNonNeg) the
//     fixer keeps the call under if k > 0;
//   - over a negative n the loop forms the generalised binomial
//     C(n, k) = (−1)^k·C(k−n−1, k), which is what the helpers' Choose
//     family returns, so n may take any value;
//   - the accumulator is the loop's only one, multiplied on every trip,
//     and the loop sums nothing.
//
// The fixer checks the syntax on its own: the start at 1, a body that
// does nothing else, the stepped variables unread after the loop, and
// that n and k still hold their entry values where the call goes.
func (mc *modelCtx) binomialMatch(a *vm.Acc, f vm.Form) *fixes.Match {
	return mc.loopMatch(fixes.ShapeModelBinomLoop, a, f)
}

// loopMatch is binomialMatch for the row shape, whose helpers compute
// f: C(n, k), or n!/(n−k)! for a falling-factorial loop of k trips,
// which over a negative n is the product of the k negative factors the
// helpers' Falling family returns too.
func (mc *modelCtx) loopMatch(shape fixes.Shape, a *vm.Acc, f vm.Form) *fixes.Match {
	l, fc := mc.loop, mc.fc
	if l.Counter == nil || l.Exits || len(l.Accs) != 1 || len(l.Sums) > 0 || a.Guarded || len(f.Args) != 2 {
		return nil
	}
	if !l.Count.Equal(f.Args[1]) {
		return nil
	}
	var args []ast.Expr
	countNonNeg := false
	for i, arg := range f.Args {
		v, ok := plainVar(arg)
		if !ok || v.Obj == nil || v.Loop != nil {
			return nil
		}
		typ := v.Obj.Type()
		if v.Field != nil {
			typ = v.Field.Type()
		}
		b, ok := typ.Underlying().(*types.Basic)
		if !ok || b.Info()&(types.IsInteger|types.IsFloat) == 0 {
			return nil
		}
		if b.Info()&types.IsInteger != 0 {
			r := fc.symRange(mc.res, v, l.Stmt)
			if r.IsEmpty() {
				return nil
			}
			if i == 1 {
				countNonNeg = r.Lo >= 0
			}
		}
		e := mc.res.Exprs[v]
		if e == nil && v.Def != nil && v.Field == nil {
			// A local the algebra reads as the value of its last
			// assignment: the loop reads that value, so a read of the
			// variable in the loop names it.
			if id := identOf(fc.c.pass.TypesInfo, l.Stmt, v.Obj); id != nil {
				e = id
			}
		}
		if e == nil {
			return nil
		}
		args = append(args, e)
	}
	init := fc.accStart(a.Obj, l.Stmt)
	if init == nil {
		return nil
	}
	return &fixes.Match{
		Shape:   shape,
		Node:    l.Stmt,
		Args:    args,
		Result:  a.Obj.Type(),
		Acc:     a.Obj,
		AccInit: init,
		Loop:    l.Stmt,
		Func:    fc.node,

		CountNonNeg: countNonNeg,
	}
}

// accStart returns the statement of loop's own block that last sets acc
// before the loop, when it sets it to a non-zero constant.
func (fc *fnCtx) accStart(acc types.Object, loop ast.Stmt) ast.Stmt {
	var st ast.Stmt
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		b, ok := n.(*ast.BlockStmt)
		if !ok || st != nil {
			return st == nil
		}
		for i, s := range b.List {
			if s == loop {
				st, _ = fc.startIn(acc, b.List[:i])
				return false
			}
		}
		return true
	})
	return st
}
