package analyzer

import (
	"fmt"
	"go/ast"
	"go/types"
	"math/big"

	"github.com/overfact/overfact/analyzer/thresholds"
	vm "github.com/overfact/overfact/analyzer/valuemodel"
	"github.com/overfact/overfact/fixes"
	"github.com/overfact/overfact/internal/assigned"
)

// The factorial-call category: a call of a factorial-valued function
// (of this package, or of another through its fact) whose argument is
// certainly past the function's first bad value. A call whose argument
// only may reach it is the definition's finding, not the call's. A float
// factorial returned as it is (return factF(200)) is +Inf, the IEEE value
// of a number beyond the type, and is not reported.

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
	if !j.definite && !j.silent && !f.t.Float {
		fc.checkClampedCall(call, f, first, j)
		return
	}
	if !j.definite || f.t.Float && fc.returnedAsIs(call) {
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

// checkClampedCall reports an integer factorial call that only may
// reach its limit, return f(n), where the function assigns its
// parameter n before passing it (if n > 30 { n = 30 }): the factorial
// function's own guard would name the value passed to it, which the
// caller's caller never passed, so the call gets the guard on the
// caller's argument at the entry, where the range analysis shows that
// exact (entryGuardHolds).
func (fc *fnCtx) checkClampedCall(call *ast.CallExpr, f factor, first int64, j judgement) {
	d, isDecl := fc.node.(*ast.FuncDecl)
	body, sig := funcBody(fc.node), fc.signature()
	id, ok := ast.Unparen(f.arg).(*ast.Ident)
	if !isDecl || !ok || body == nil || sig == nil || !isParam(sig, fc.c.objOf(id)) {
		return
	}
	p := fc.c.objOf(id)
	var ret *ast.ReturnStmt
	for _, s := range body.List {
		if r, ok := s.(*ast.ReturnStmt); ok && len(r.Results) == 1 && ast.Unparen(r.Results[0]) == call {
			ret = r
		}
	}
	if ret == nil || !assigned.Before(fc.c.pass.TypesInfo, body, p, ret.Pos()) || !fc.entryGuardHolds(p, ret, first) {
		return
	}
	name, off := shownFactorial(f.arg, f.off)
	fc.report(finding{
		node:    call,
		cat:     catCall,
		msg:     fmt.Sprintf("%s(%s): %s%s, after %s reassigns it", f.fn.Name(), src(f.arg), factorialLimitText(f.kind, name, off, f.t), j.clause, d.Name.Name),
		related: fc.c.relatedDef(f.fn.Name(), f.fn.Pos()),
		match: &fixes.Match{Shape: fixes.ShapeFactorial, Node: call, Args: []ast.Expr{f.arg},
			Result: fc.c.pass.TypesInfo.TypeOf(call), Func: fc.node, Param: p, FirstBad: first, EntryGuard: true},
	})
}

// checkLogOfModelValue reports math.Log, Log2 or Log10 of a call whose
// value fact names a binomial coefficient in float64 (a method's
// running product over its receiver's fields included), where the
// coefficient's n, k and n − k can reach the central one past float64:
// the call is +Inf there, and so is the logarithm, which is finite.
// A call with a factorial or binomial fact is checkLogOfValue's.
func (fc *fnCtx) checkLogOfModelValue(model func() *vm.Result) {
	c := fc.c
	fc.eachLogCall(func(log *ast.CallExpr, name string) {
		inner, ok := fc.stripConv(log.Args[0]).(*ast.CallExpr)
		if !ok || c.reportedWithin(log) {
			return
		}
		fn := c.calleeOf(inner)
		if c.factOf(fn) != nil {
			return
		}
		f := c.valueFactOf(fn)
		t, isNum := c.numOf(c.pass.TypesInfo.TypeOf(inner))
		if f == nil || f.Log || !isNum || !t.Float || !types.Identical(c.pass.TypesInfo.TypeOf(inner), types.Typ[types.Float64]) {
			return
		}
		res := model()
		form := vm.Recognise(res.Values[inner])
		if form.Kind != vm.Binomial {
			return
		}
		central := thresholds.CentralBinomial(t.Num)
		n, k := form.Args[0], form.Args[1]
		half := (central.FirstBad - 1) / 2
		if !fc.reaches(res, n, log, central.FirstBad) || !fc.reaches(res, k, log, half) || !fc.reaches(res, n.Sub(k), log, half) {
			return
		}
		clause := ""
		if v, alpha, beta, ok := oneVar(n); ok {
			if first, ok := firstAtRat(alpha, beta, big.NewRat(central.FirstBad, 1)); ok {
				clause, _ = verdict(v.Name(), fc.symRange(res, v, log), first)
			}
		} else {
			clause = fmt.Sprintf("; %s is not bounded here", n)
		}
		msg := fmt.Sprintf("math.%s of %s, whose value is C(%s, %s): it overflows to +Inf for %s ≥ %d at %s = %s/2 (C(%d, %d) ≈ %s is the largest central one that fits), so the logarithm is +Inf where ln C(%s, %s) is finite%s",
			name, src(inner), n, k, n, central.FirstBad, k, parenAffine(n), central.FirstBad-1, (central.FirstBad-1)/2, central.LastGoodApprox(), n, k, clause)
		fc.report(finding{node: log, cat: catCall, msg: msg, related: c.relatedDef(fn.Name(), fn.Pos())})
	})
}

// checkLogOfValue reports math.Log, Log2 or Log10 of a call of a float
// factorial or binomial function (through its fact) whose argument may
// reach the point where the value is +Inf: the IEEE value of a number
// past float64, but its logarithm is finite (ln 171! ≈ 711.7), so the
// logarithm the code wants is +Inf although it fits. The same value
// returned, stored or compared is right and not reported.
func (fc *fnCtx) checkLogOfValue() {
	c := fc.c
	fc.eachLogCall(func(log *ast.CallExpr, name string) {
		inner, ok := fc.stripConv(log.Args[0]).(*ast.CallExpr)
		if !ok {
			return
		}
		f, ok := fc.factorOf(inner)
		if !ok || f.fact == nil || f.fact.Safe || !f.t.Float || !types.Identical(c.pass.TypesInfo.TypeOf(inner), types.Typ[types.Float64]) {
			return
		}
		m := &fixes.Match{Shape: fixes.ShapeLogOfValue, Node: log, Result: c.pass.TypesInfo.TypeOf(log), Func: fc.node}
		var msg string
		switch {
		case f.kind == kindFactorial:
			first := firstBadOf(f.kind, f.t) - f.off
			j := fc.judge(f.arg, first)
			if j.silent {
				return
			}
			shown, off := shownFactorial(f.arg, f.off)
			msg = fmt.Sprintf("math.%s of %s, whose value is %s!: the %s, so the logarithm is +Inf where ln %s! is finite%s",
				name, src(inner), parenText(plus(shown, off)), factorialLimitText(f.kind, shown, off, f.t), parenText(plus(shown, off)), j.clause)
			m.Factorials = []fixes.FactorialCall{{Call: inner, Arg: f.arg, Off: f.off}}
		case f.kind == kindBinomial && f.arg2 != nil:
			central := thresholds.CentralBinomial(f.t.Num)
			j := fc.judge(f.arg, central.FirstBad)
			if j.silent {
				return
			}
			n, k := src(fc.stripConv(f.arg)), src(fc.stripConv(f.arg2))
			msg = fmt.Sprintf("math.%s of %s, whose value is C(%s, %s): it %s for %s ≥ %d at %s = %s/2 (C(%d, %d) ≈ %s is the largest central one that fits), so the logarithm is +Inf where ln C(%s, %s) is finite%s",
				name, src(inner), n, k, verb(f.t), n, central.FirstBad, k, parenText(n), central.FirstBad-1, (central.FirstBad-1)/2, central.LastGoodApprox(), n, k, j.clause)
			m.Binomials = []fixes.BinomialCall{{Call: inner, N: f.arg, K: f.arg2}}
		default:
			return
		}
		fc.report(finding{node: log, cat: catCall, msg: msg, related: c.relatedDef(f.fn.Name(), f.fn.Pos()), match: m})
		return
	})
}
