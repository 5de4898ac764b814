package analyzer

import (
	"fmt"
	"math"
	"math/big"

	"github.com/overfact/overfact/analyzer/thresholds"
	vm "github.com/overfact/overfact/analyzer/valuemodel"
)

// stepProduct reports an integer accumulator that each trip multiplies
// and then divides (c = c * 2*(2k+1) / (k+2), the Catalan numbers'
// step), whose value after the loop the model names, where the product
// formed before the division wraps while that value still fits: on the
// last trip the product is the value times the divisor. The multiplier
// must depend on the trip alone, so that the product of every earlier
// trip is the last one of a shorter loop, and the value on the loop's
// count n alone: the first n is then where the code first goes wrong
// (thresholds.StepProduct). A binomial coefficient is binomialLoop's.
func (mc *modelCtx) stepProduct(a *vm.Acc, t numType) bool {
	if t.Float || a.Guarded || a.After == nil || len(a.Ops) < 2 || mc.loop.Counter == nil {
		return false
	}
	mul, div := a.Ops[0], a.Ops[1]
	if !mul.Mul || div.Mul || mul.After == nil {
		return false
	}
	if _, ok := mul.By.IsConst(); ok {
		return false
	}
	for _, op := range a.Ops[2:] {
		if op.Mul {
			return false // another product after the division
		}
	}
	nv, alpha, beta, ok := oneVar(mc.loop.Count)
	if !ok || alpha.Cmp(big.NewRat(1, 1)) != 0 || !beta.IsInt() || !beta.Num().IsInt64() {
		return false
	}
	iter := mc.loop.Iter
	for _, s := range termSyms(mul.After, vm.Int(0)) {
		if s != iter {
			return false
		}
	}
	for _, s := range termSyms(a.After, vm.Int(0)) {
		if s != nv {
			return false
		}
	}
	// The product on the last trip, in n: the trip index is count − 1.
	last := mul.After.Subst(iter, mc.loop.Count.Shift(-1))
	// The loop runs at least once from count 1.
	from := 1 - beta.Num().Int64()
	first, valueLast, ok := thresholds.StepProduct(t.Num, from, termSeq(a.After, nv), termSeq(last, nv))
	if !ok {
		return false
	}
	fc := mc.fc
	n := fc.symRange(mc.res, nv, mc.loop.Stmt)
	if n.IsEmpty() || n.Hi < first {
		return true
	}
	clause, _ := verdict(nv.Name(), n, first)
	what := "its value after the loop"
	if f := vm.RecogniseAny(a.After); f.Kind != vm.Unknown && f.Kind != vm.GammaRatio {
		what = f.String()
	} else if len(a.After.Gamma) == 0 || a.After.SqrtPi == 0 {
		what = a.After.String()
	}
	definite := n.Lo >= first && n.Lo <= valueLast && n.Lo != math.MinInt64
	msg := fmt.Sprintf("running product %s * %s in %s %s before the division by %s for %s ≥ %d, although %s fits up to %s = %d%s",
		a.Obj.Name(), src(mul.X), t.typeName(), verb(t), src(div.X), nv.Name(), first, what, nv.Name(), valueLast, clause)
	fc.report(finding{node: mc.loop.Stmt, cat: catBinomLoop, definite: definite, msg: msg})
	return true
}

// termSeq is the term x as a sequence in its one variable nv, for the
// thresholds' scans of running products.
func termSeq(x *vm.Term, nv vm.Sym) thresholds.StepSeq {
	return thresholds.StepSeq{
		Log: func(n int64) (float64, bool) {
			return x.LogAbs(map[vm.Sym]float64{nv: float64(n)})
		},
		Exact: func(n int64) (*big.Int, bool) {
			r, ok := x.RatAt(map[vm.Sym]*big.Rat{nv: big.NewRat(n, 1)})
			if !ok || !r.IsInt() {
				return nil, false
			}
			return r.Num(), true
		},
	}
}
