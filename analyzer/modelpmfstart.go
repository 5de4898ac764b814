package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"math"
	"math/big"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/analyzer/thresholds"
	vm "github.com/overfact/overfact/analyzer/valuemodel"
)

// runStart reports a running product whose start value underflows in
// float64 while the terms it is multiplied into later are not small:
// the first probability of a distribution, p^s of a negative binomial
// or p^n of a binomial (math.Pow), or e^(−x) of a Poisson term whose x
// is a product the algebra names apart (x := mu*t). Past the point
// where the start is 0 every term is 0, and the sum of them with it,
// although the terms near the mode are probabilities of order one. The
// loop must run a number of trips the code does not fix, so that it can
// reach the mode; poissonRun judges e^(−λ) of one variable.
func (mc *modelCtx) runStart(a *vm.Acc, t numType) bool {
	if len(a.Ops) == 0 || a.Init == nil || !t.Float || t.Bits != 64 || mc.loop.Count.IsConst() {
		return false
	}
	last := a.Ops[len(a.Ops)-1].After
	if last == nil {
		return false
	}
	if p, ok := powStart(a.Init); ok {
		f := vm.RecogniseAny(last)
		if f.Kind != vm.NegBinomialPMF && f.Kind != vm.BinomialPMF {
			return false
		}
		return mc.powStartReport(a, t, p, f)
	}
	return mc.expStart(a, t, last)
}

// powStart returns b^e when the term is that one power, of an exponent
// that varies, and nothing else.
func powStart(init *vm.Term) (vm.Power, bool) {
	if init.Coef.Cmp(big.NewRat(1, 1)) != 0 || init.SqrtPi != 0 || len(init.Gamma) != 0 || len(init.Pows) != 1 || !init.Exp.IsConst() || init.Exp.C.Sign() != 0 || init.Pows[0].Exp.IsConst() {
		return vm.Power{}, false
	}
	return init.Pows[0], true
}

// powStartReport judges a start b^e on its exponent: the first value
// at which b^e is subnormal at the base the code fixes, or at b = 1/2
// for a base it does not (a base near 1 underflows later, so the
// finding is then never definite).
func (mc *modelCtx) powStartReport(a *vm.Acc, t numType, p vm.Power, f vm.Form) bool {
	e, alpha, beta, ok := oneVar(p.Exp)
	if !ok || alpha.Sign() <= 0 {
		return false
	}
	base, fixed := 0.5, false
	if c, ok := p.Base.At(nil); ok && c != nil {
		base, _ = c.Float64()
		fixed = true
	}
	sub, zero := thresholds.PowUnderflow(t.Num, base)
	if sub == math.MaxInt64 {
		return false
	}
	first, ok := firstAt(alpha, beta, sub)
	if !ok {
		return false
	}
	firstZero, ok := firstAt(alpha, beta, zero)
	if !ok {
		return false
	}
	// The probabilities over the loop's counter, as the code counts.
	shown := vm.Form{Kind: f.Kind}
	for _, x := range f.Args {
		c, ok := mc.counterArg(x)
		if !ok {
			return false
		}
		shown.Args = append(shown.Args, c)
	}
	fc := mc.fc
	j := decideName(e.Name(), fc.symRange(mc.res, e, mc.loop.Stmt), first)
	if j.silent {
		return true
	}
	at := ""
	if !fixed {
		at = fmt.Sprintf(" (at %s = %s)", p.Base, fmtFloat(base))
	}
	msg := fmt.Sprintf("running product %s computes the probabilities %s one factor at a time from (%s)^(%s), which in %s loses its digits for %s ≥ %d and is 0 for %s ≥ %d%s, after which every term is wrong or 0 although the terms near the mode are not small",
		a.Obj.Name(), shown, p.Base, p.Exp, t.typeName(), e.Name(), first, e.Name(), firstZero, at)
	fc.report(finding{node: mc.loop.Stmt, cat: catPowOverFac, definite: j.definite && fixed, msg: msg + j.clause})
	return true
}

// expStart judges a start e^(−x) where x is a product of variables the
// code forms before it (x := mu*t), which the algebra keeps as a term
// and not as an exponent of its own: the running value after the loop
// must then be the Poisson term x^k·e^(−x)/k!, the start times
// powers of x's factors over a factorial.
func (mc *modelCtx) expStart(a *vm.Acc, t numType, last *vm.Term) bool {
	arg, x, ok := mc.expStartArg(a.Init)
	if !ok || !poissonOver(last.Div(a.Init), x) {
		return false
	}
	fc := mc.fc
	sub, zero := thresholds.ExpUnderflow(t.Num)
	if math.IsInf(zero, 1) {
		return false
	}
	name := src(arg)
	r := ranges.Top()
	if id, ok := arg.(*ast.Ident); ok {
		if obj := fc.c.objOf(id); obj != nil {
			r = fc.symRange(mc.res, vm.Sym{Obj: obj}, mc.loop.Stmt)
		}
	}
	j := decideName(name, r, int64(math.Ceil(sub)))
	if j.silent {
		return true
	}
	msg := fmt.Sprintf("running product %s computes the Poisson terms %s^k·e^(−%s)/k! from math.Exp(-%s) with %s = %s, which in %s loses its digits for %s > %s and is 0 for %s ≥ %s, after which every term is wrong or 0 although the terms near k = %s are not small",
		a.Obj.Name(), name, name, name, name, x, t.typeName(), name, fmtFloat(sub), name, fmtFloat(zero), name)
	fc.report(finding{node: mc.loop.Stmt, cat: catPowOverFac, definite: false, msg: msg + j.clause})
	return true
}

// expStartArg returns, for a start the algebra could not evaluate that
// the code assigns from math.Exp(-x), the expression x and its value:
// a product of variables to the first power with coefficient 1.
func (mc *modelCtx) expStartArg(init *vm.Term) (ast.Expr, *vm.Term, bool) {
	a, ok := init.Affine()
	if !ok {
		return nil, nil, false
	}
	s, ok := plainVar(a)
	if !ok || s.Def == nil || s.Obj == nil {
		return nil, nil, false
	}
	call, ok := ast.Unparen(mc.fc.c.definedAs(s.Def, s.Obj)).(*ast.CallExpr)
	if !ok || len(call.Args) != 1 || !mc.fc.c.isMathFunc(call, "Exp") {
		return nil, nil, false
	}
	neg, ok := ast.Unparen(call.Args[0]).(*ast.UnaryExpr)
	if !ok || neg.Op != token.SUB {
		return nil, nil, false
	}
	x := mc.res.Values[neg.X]
	if x == nil || x.Coef.Cmp(big.NewRat(1, 1)) != 0 || x.SqrtPi != 0 || len(x.Gamma) != 0 || len(x.Pows) < 2 || !x.Exp.IsConst() || x.Exp.C.Sign() != 0 {
		return nil, nil, false
	}
	for _, p := range x.Pows {
		if !p.Exp.IsConst() || p.Exp.C.Cmp(big.NewRat(1, 1)) != 0 {
			return nil, nil, false
		}
	}
	return ast.Unparen(neg.X), x, true
}

// poissonOver reports whether r is x^j/j! for one affine j: every power
// of x's factors to the exponent j and Γ(j+1) below the line.
func poissonOver(r, x *vm.Term) bool {
	if r == nil || r.Coef.Cmp(big.NewRat(1, 1)) != 0 || r.SqrtPi != 0 || len(r.Gamma) != 1 || r.Gamma[0].Pow != -1 || len(r.Pows) != len(x.Pows) || !r.Exp.IsConst() || r.Exp.C.Sign() != 0 {
		return false
	}
	j := r.Gamma[0].Arg.Shift(-1)
	if j.IsConst() {
		return false
	}
	for i, p := range r.Pows {
		if !p.Base.Equal(x.Pows[i].Base) || !p.Exp.Equal(j) {
			return false
		}
	}
	return true
}

// definedAs returns the expression the assignment def gives obj; nil
// when def is no assignment of one value to each variable.
func (c *checker) definedAs(def ast.Node, obj types.Object) ast.Expr {
	as, ok := def.(*ast.AssignStmt)
	if !ok || len(as.Lhs) != len(as.Rhs) {
		return nil
	}
	for i, l := range as.Lhs {
		if c.objOf(l) == obj {
			return as.Rhs[i]
		}
	}
	return nil
}
