package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"math"
	"math/big"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/analyzer/thresholds"
	vm "github.com/overfact/overfact/analyzer/valuemodel"
	"github.com/overfact/overfact/fixes"
	"golang.org/x/tools/go/analysis"
)

// binomialPeak judges a float running product that is a binomial
// coefficient after every update, C(n, j) at step j, the way one ratio
// per trip forms it:
//
//	for c := 1.0; c <= k; c++ { v *= (n + 1 - c) / c }  // C(n, c)
//	for i := 1; i < n; i++ { w *= T(n-i) / T(i) }        // C(n−1, i)
//
// Each intermediate is a binomial itself, so no product is formed
// before a division; but the steps climb to C(n, ⌊n/2⌋) and back down,
// and a running value that passed the type's range there is +Inf for
// every later step, although C(n, j) fits again near j = n. It reports
// true when the loop is of this form, judged or not.
func (mc *modelCtx) binomialPeak(a *vm.Acc, t numType) bool {
	l := mc.loop
	if !t.Float || a.Guarded || len(a.Ops) == 0 {
		return false
	}
	// Every op's result is C(N, J(t)) with N fixed by the loop and J
	// stepping by one per trip.
	var n, j vm.Affine
	for i, op := range a.Ops {
		f := vm.Recognise(op.After)
		if f.Kind != vm.Binomial || f.Args[0].Has(l.Iter) || !f.Args[1].Has(l.Iter) {
			return false
		}
		if s := f.Args[1].Coef(l.Iter); s.Cmp(big.NewRat(1, 1)) != 0 && s.Cmp(big.NewRat(-1, 1)) != 0 {
			return false
		}
		if i > 0 && !f.Args[0].Equal(n) {
			return false
		}
		n, j = f.Args[0], f.Args[1]
	}
	if len(a.Ops) != 1 {
		// Several updates per trip that each leave a binomial are no
		// arrangement people write; leave them to the other rules.
		return false
	}
	nv, alpha, beta, ok := oneVar(n)
	if !ok || alpha.Sign() <= 0 || !alpha.IsInt() || !beta.IsInt() {
		return false
	}
	first, ok := firstAt(alpha, beta, thresholds.CentralBinomial(t.Num).FirstBad)
	if !ok {
		return false
	}
	fc := mc.fc
	r := fc.symRange(mc.res, nv, l.Stmt)
	if r.IsEmpty() || r.Hi < first || mc.inReturnedPMF(a) {
		return true
	}
	// The steps stay on the rising side, where the running value is
	// the largest one so far and overflows only where it must, when
	// the number of trips is at most n/2 (k ≤ n/2 for C(n, k)).
	if cnt, ok := mc.countVar(); ok {
		if r, moved := mc.res.Reflected(cnt); moved {
			// k moved to the smaller half (k = n − k where k > n − k)
			// stays there; one moved the other way is left unjudged,
			// as before the model followed the move.
			return r.Low
		}
		kr := fc.symRange(mc.res, cnt, l.Stmt)
		if !kr.IsEmpty() && kr.Hi != math.MaxInt64 && r.Lo > 0 && r.Lo != math.MinInt64 && 2*kr.Hi <= r.Lo {
			return true
		}
	}
	if mc.staysRising(j, n, nv, first) {
		return true
	}
	jName, ok := mc.counterArg(j)
	if !ok {
		return false
	}
	// The final value as the code reads it past the loop.
	final := vm.Recognise(a.After)
	central := thresholds.CentralBinomial(t.Num)
	clause, _ := verdict(nv.Name(), r, first)
	peak := fmt.Sprintf("C(%s, ⌊%s/2⌋)", n, parenAffine(n))
	var msg string
	var definite bool
	if final.Kind == vm.Binomial && !final.Args[1].IsConst() {
		// The loop's value is C(n, k): it is wrong where k passes n/2.
		msg = fmt.Sprintf("multiplicative binomial loop computes C(%s, %s) in %s one ratio at a time: the running %s is C(%s, %s) after each step and passes %s when %s > %s/2, which %s for %s ≥ %d (C(%d, %d) ≈ %s is the largest central one that fits), after which it stays +Inf although C(%s, %s) fits again as %s nears %s",
			final.Args[0], final.Args[1], t.typeName(), a.Obj.Name(), n, jName, peak, final.Args[1], parenAffine(n), verb(t), nv.Name(), first,
			central.FirstBad-1, (central.FirstBad-1)/2, central.LastGoodApprox(), n, jName, jName, n)
	} else {
		// The steps themselves are read (a table of weights): those
		// past the peak are +Inf.
		msg = fmt.Sprintf("running product %s computes C(%s, %s) one ratio at a time in %s: it passes %s, which %s for %s ≥ %d (C(%d, %d) ≈ %s is the largest central one that fits), and stays +Inf for the steps after it, although C(%s, %s) fits again as %s nears %s",
			a.Obj.Name(), n, jName, t.typeName(), peak, verb(t), nv.Name(), first,
			central.FirstBad-1, (central.FirstBad-1)/2, central.LastGoodApprox(), n, jName, jName, n)
		// Over every step up to n the peak is always passed.
		definite = r.Lo >= first && r.Lo != math.MinInt64 && mc.coversPeak(j, n)
		mc.noteWeightFields(a, fmt.Sprintf("C(%s, %s)", n, jName), nv.Name(), first)
	}
	match := mc.binomialMatchIf(a, final)
	if match == nil {
		match = mc.runningWeightMatch(a)
	}
	fc.report(finding{node: l.Stmt, cat: catBinomLoop, definite: definite, msg: msg + clause, match: match})
	return true
}

// runningWeightMatch describes, for the fixer, the running product
// whose steps the code reads: carried as a product in log space
// (fixes/logproduct.go) it forms the same float values step by step and
// keeps the logarithm beside them, so a step past the peak is the
// binomial it stands for again once that fits. nil where the update is
// no assignment to the accumulator.
func (mc *modelCtx) runningWeightMatch(a *vm.Acc) *fixes.Match {
	op := a.Ops[0]
	as, ok := op.Stmt.(*ast.AssignStmt)
	if !ok || len(as.Lhs) != 1 {
		return nil
	}
	info := mc.fc.c.pass.TypesInfo
	id, ok := ast.Unparen(as.Lhs[0]).(*ast.Ident)
	if !ok || info.ObjectOf(id) != a.Obj {
		return nil
	}
	return &fixes.Match{Shape: fixes.ShapeLogSpaceTerm, Node: op.X, Args: []ast.Expr{id}, Result: info.TypeOf(op.X), Func: mc.fc.node}
}

// staysRising reports whether the last step j(Count−1) stays on the
// near side of n/2 in the direction j moves, for every n from first
// on: then the running value only climbs, and it overflows only where
// the coefficient it ends at does.
func (mc *modelCtx) staysRising(j, n vm.Affine, nv vm.Sym, first int64) bool {
	l := mc.loop
	s := j.Coef(l.Iter)
	end := j.Subst(l.Iter, l.Count.Shift(-1))
	d := end.Sub(n.Scale(big.NewRat(1, 2))).Scale(s)
	for _, v := range d.Syms() {
		if v != nv {
			return false
		}
	}
	g := d.Coef(nv)
	if g.Sign() > 0 {
		return false
	}
	at, ok := d.Subst(nv, vm.Int(first)).At(nil)
	return ok && at.Sign() <= 0
}

// inReturnedPMF reports whether the function returns a binomial
// probability built on the accumulator: its coefficient breaks there
// for every k, not only past n/2, and modelPMF reports it as such.
func (mc *modelCtx) inReturnedPMF(a *vm.Acc) bool {
	for _, e := range mc.fc.modelRoots(mc.res) {
		if vm.Recognise(mc.res.Values[e]).Kind == vm.BinomialPMF && mentions(mc.fc.c.pass.TypesInfo, e, a.Obj) {
			return true
		}
	}
	return false
}

// countVar returns the variable the trip count is, when it is one.
func (mc *modelCtx) countVar() (vm.Sym, bool) {
	return plainVar(mc.loop.Count)
}

// coversPeak reports whether the steps j(t), t in [0, Count), run from
// a constant start to n minus a constant: then they pass ⌊n/2⌋
// whatever n is.
func (mc *modelCtx) coversPeak(j, n vm.Affine) bool {
	l := mc.loop
	start := j.Subst(l.Iter, vm.Int(0))
	end := j.Subst(l.Iter, l.Count.Shift(-1))
	for _, pair := range [][2]vm.Affine{{start, end}, {end, start}} {
		if pair[0].IsConst() && n.Sub(pair[1]).IsConst() {
			return true
		}
	}
	return false
}

// binomialMatchIf offers the helper call for a loop whose value is the
// coefficient the code reads, where the model vouches for it.
func (mc *modelCtx) binomialMatchIf(a *vm.Acc, final vm.Form) *fixes.Match {
	if final.Kind != vm.Binomial {
		return nil
	}
	return mc.binomialMatch(a, final)
}

// parenAffine renders a as a factor: in parentheses unless it is one
// variable or a constant.
func parenAffine(a vm.Affine) string {
	if _, ok := plainVar(a); ok || a.IsConst() {
		return a.String()
	}
	return "(" + a.String() + ")"
}

// modelCountRatio reports a float quotient whose divisor is a binomial
// coefficient the code forms on its own (exp of log-gamma differences,
// a loop, a binomial function), such as a count of orderings over all
// of them, C(n1+n2, n1): past C(n, n/2)'s limit the divisor is +Inf,
// and the quotient 0, or NaN where the count overflowed too, although
// the ratio is finite. A constant numerator (1/C(n, k)) is left alone:
// 0 is then within rounding of the true value.
func (fc *fnCtx) modelCountRatio(res *vm.Result) {
	info := fc.c.pass.TypesInfo
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.FuncLit:
			return false
		case *ast.BinaryExpr:
			if n.Op != token.QUO {
				return true
			}
			if tv, ok := info.Types[n.X]; ok && tv.Value != nil {
				return true
			}
			t, ok := fc.c.numOf(info.TypeOf(n))
			if !ok || !t.Float || fc.c.reportedAt(n.Pos()) {
				return true
			}
			y := fc.stripConv(n.Y)
			switch y.(type) {
			case *ast.Ident, *ast.CallExpr:
			default:
				return true
			}
			f := vm.Recognise(res.Values[y])
			if f.Kind != vm.Binomial || fc.fromReportedLoop(res, y) {
				return true
			}
			nv, ok := plainVar(f.Args[0])
			var r ranges.Interval
			if ok {
				r = fc.symRange(res, nv, n)
			} else if v, alpha, beta, ok1 := oneVar(f.Args[0]); ok1 && alpha.Cmp(big.NewRat(1, 1)) == 0 && beta.Sign() == 0 {
				nv, r = v, fc.symRange(res, v, n)
			} else {
				// n a sum of variables (n1 + n2): unknown range.
				r = ranges.Top()
			}
			central, reach := thresholds.CentralBinomial(t.Num), "fits"
			if fc.expFormed(y) {
				central, reach = thresholds.CentralBinomialExp(t.Num), "math.Exp reaches"
			}
			if w, first, ok := fc.divisorWeak(res, y, f.Args[0], t); ok && first < central.FirstBad {
				// The code's divisor breaks inside, at every k, long
				// before the coefficient itself leaves the type.
				if !r.IsEmpty() && !(bounded(r) && r.Hi < first) {
					fc.reportDivisorWeak(n, f, w, first, r, nv, t)
				}
				return true
			}
			if r.IsEmpty() || bounded(r) && r.Hi < central.FirstBad {
				return true
			}
			name := f.Args[0].String()
			clause := ""
			if ok {
				clause, _ = verdict(nv.Name(), r, central.FirstBad)
			}
			msg := fmt.Sprintf("divides by C(%s, %s) formed on its own in %s: it %s for %s ≥ %d at %s = %s/2 (C(%d, %d) ≈ %s is the largest central one that %s), after which the quotient is 0, or NaN where %s overflowed too, although the ratio is finite%s",
				f.Args[0], f.Args[1], t.typeName(), verb(t), name, central.FirstBad, f.Args[1], parenAffine(f.Args[0]), central.FirstBad-1, (central.FirstBad-1)/2, central.LastGoodApprox(), reach, src(n.X), clause)
			fc.report(finding{node: n, cat: catRatio, msg: msg})
		}
		return true
	})
}

// divisorWeak returns the intermediate of the divisor y, whose value is
// C(n, ·), that breaks first (a factorial or Γ value inside the helper
// the code calls, Γ(n+1) or n!), with the first n at which it does: its
// argument must be n plus a constant for the two to compare.
func (fc *fnCtx) divisorWeak(res *vm.Result, y ast.Expr, n vm.Affine, t numType) (weak, int64, bool) {
	var best weak
	first, found := int64(math.MaxInt64), false
	for _, w := range fc.weakPoints(res, y, t) {
		d := w.arg.Sub(n)
		if !d.IsConst() {
			continue
		}
		// n + d ≥ bad from n = ⌈bad − d⌉.
		at := new(big.Rat).Sub(w.bad, d.C)
		q := new(big.Int).Quo(at.Num(), at.Denom())
		if at.Sign() > 0 && !at.IsInt() {
			q.Add(q, big.NewInt(1))
		}
		if q.IsInt64() && q.Int64() < first {
			best, first, found = w, q.Int64(), true
		}
	}
	return best, first, found
}

// reportDivisorWeak words modelCountRatio's finding where the divisor's
// own intermediate breaks first: the quotient is then 0 or NaN from
// that n, whatever k.
func (fc *fnCtx) reportDivisorWeak(quo *ast.BinaryExpr, f vm.Form, w weak, first int64, r ranges.Interval, nv vm.Sym, t numType) {
	name := f.Args[0].String()
	clause := ""
	if nv.Obj != nil {
		clause, _ = verdict(nv.Name(), r, first)
	}
	via := ""
	if w.via != "" && w.via != w.what {
		via = fmt.Sprintf(" (its %s breaks first)", w.via)
	}
	msg := fmt.Sprintf("divides by C(%s, %s) formed on its own in %s: %s is +Inf or NaN for %s ≥ %d%s, long before C(%s, %s) leaves %s, after which the quotient is 0 or NaN although the ratio is finite%s",
		f.Args[0], f.Args[1], t.typeName(), w.what, name, first, via, f.Args[0], f.Args[1], t.Name, clause)
	var related []analysis.RelatedInformation
	if w.call != nil {
		related = fc.coefDef(w.call)
	}
	fc.report(finding{node: quo, cat: catRatio, msg: msg, related: related})
}

// fromReportedLoop reports whether y reads an accumulator of a loop
// that has a finding already: that loop is the root cause.
func (fc *fnCtx) fromReportedLoop(res *vm.Result, y ast.Expr) bool {
	for _, l := range res.Loops {
		for _, a := range l.Accs {
			if mentions(fc.c.pass.TypesInfo, y, a.Obj) && fc.c.reportedAt(l.Stmt.Pos()) {
				return true
			}
		}
	}
	return false
}

// divides reports whether the function has a float division, the
// other half of modelWorth's test for a log-gamma binomial: a count
// divided by it.
func (fc *fnCtx) divides() bool {
	found := false
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		if b, ok := n.(*ast.BinaryExpr); ok && b.Op == token.QUO {
			if t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(b)); ok && t.Float {
				found = true
			}
		}
		return !found
	})
	return found
}
