package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"math"
	"strings"

	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/fixes"
	"github.com/overfact/overfact/internal/assigned"
)

// The power-over-factorial category: x^k/k! terms (Poisson, Erlang,
// Taylor) whose power and factorial overflow separately.

// powerLoops is what the category keeps about a function: the power
// loops x·x·…·x by their accumulator, noted when the loops are read
// (noteLoop) for the products that divide their result by a factorial
// after the loop.
type powerLoops struct{ byAcc map[types.Object]*accLoop }

var powerLoopsKey = &stateKey[powerLoops]{"power loops by accumulator"}

func (fc *fnCtx) notePowerLoop(al *accLoop) {
	pl := stateOf(fc, powerLoopsKey)
	if pl.byAcc == nil {
		pl.byAcc = make(map[types.Object]*accLoop)
	}
	pl.byAcc[al.acc] = al
}

// powerLoopOf returns the power loop whose accumulator is v, or nil.
func (fc *fnCtx) powerLoopOf(v types.Object) *accLoop {
	if pl := peekState(fc, powerLoopsKey); pl != nil {
		return pl.byAcc[v]
	}
	return nil
}

// checkPowOverFactorial judges x^k/k! (with or without e^(−λ)): Poisson
// probabilities, Erlang B and C terms, Taylor-series terms. The term is
// small, but k! and x^k are computed separately and each overflows on
// its own: past k! the term is 0, past both it is NaN.
func (fc *fnCtx) checkPowOverFactorial(root ast.Expr, p *product) {
	var pow, fac, ex factor
	pows, exps := 0, 0
	for _, f := range p.num {
		switch {
		case f.math == "Pow":
			pow, pows = f, pows+1
		case f.math == "Exp":
			ex, exps = f, exps+1
		}
	}
	for _, f := range p.den {
		if f.kind != kindNone {
			fac = f
		}
	}
	if fac.kind != kindFactorial && fac.kind != kindDouble {
		return
	}
	first := firstBadOf(fac.kind, fac.t) - fac.off
	j := fc.judge(fac.arg, first)
	facSafe := (fac.fact != nil && fac.fact.Safe) || j.silent
	powText, powSafe := fc.powerLimit(pow)
	if facSafe && powSafe {
		return
	}
	m := &fixes.Match{Shape: fixes.ShapeNone, Node: root, Result: fc.c.pass.TypesInfo.TypeOf(root)}
	exact := fac.kind == kindFactorial && fac.off == 0 && p.other == 0 && pows == 1 && exps <= 1 &&
		len(p.num) == pows+exps && len(p.den) == 1 && fc.sameInt(pow.arg2, fac.arg)
	var what string
	switch {
	case exact && exps == 0:
		// The code's own names: a^c/c! for math.Pow(a, float64(c)) /
		// factorial(c), not a textbook x^k/k!.
		what = fmt.Sprintf("power-over-factorial term %s/%s", powerText(fc, pow), bang(fac.arg, fac.off))
		m.Shape, m.Args = fixes.ShapePowOverFactorial, []ast.Expr{pow.arg, pow.arg2}
	case exact && fc.negated(ex.arg, pow.arg):
		what = fmt.Sprintf("Poisson-style term %s·e^(−%s)/%s", powerText(fc, pow), atom(pow.arg), bang(fac.arg, fac.off))
		m.Shape, m.Args = fixes.ShapePoisson, []ast.Expr{pow.arg2, pow.arg}
	default:
		// Not the shape as written (x^(k+1)/k!, e^(−2λ), an extra
		// factor): name what the code computes instead.
		what = fmt.Sprintf("term with %s over %s", powerText(fc, pow), factorialText(fac))
		if fac.kind == kindFactorial && fac.t.Float && fac.call != nil && fac.fact != nil {
			// The term in log space, the factorial the value its
			// function returns with ln n! beside it (see
			// checkPowOverFactorials).
			m.Shape = fixes.ShapeProductChain
			m.Factorials = []fixes.FactorialCall{{Call: fac.call, Arg: fac.arg, Off: fac.off}}
		}
	}
	if (m.Shape == fixes.ShapePoisson || m.Shape == fixes.ShapePowOverFactorial) && fac.call != nil && fac.fact != nil && fac.fact.EmptyBelow {
		// Outside the helper's domain the fix keeps the term as written,
		// and may need to know that the divisor is the empty product there
		// (Match.EmptyBelow).
		m.EmptyBelow = true
		m.Factorials = []fixes.FactorialCall{{Call: fac.call, Arg: fac.arg, Off: fac.off}}
	}
	if pow.acc != nil && m.Shape != fixes.ShapeProductChain {
		m = fc.loopPowerMatch(m, root, pow)
	}
	var msg, clause string
	var way ast.Expr
	definite := false
	if !facSafe {
		clause, definite = j.clause, j.definite
		msg = fmt.Sprintf("%s in %s: the divisor %s %s for %s ≥ %d (%s), after which the term is 0 or NaN although its true value is small",
			what, fac.t.typeName(), factorialText(fac), verb(fac.t), src(fac.arg), first, largestFits(fac.kind, fac.t))
		if powText != "" {
			msg += "; " + powText
		} else if first := fc.powerFirst(pow, fac, first); first != "" {
			msg, way = msg+first, pow.arg
		}
	} else {
		msg = fmt.Sprintf("%s in %s: %s", what, pow.t.typeName(), powText)
	}
	fc.report(finding{node: root, cat: catPowOverFac, definite: definite, msg: msg + clause,
		related: fc.c.relatedDef(fac.def()), match: p.fix(m), floatWay: way})
}

// loopPowerMatch offers m, a power over a factorial or Poisson term
// whose power x^k a loop multiplies up (p *= x over k trips), with the
// loop's accumulator vouched for as that power (Match.Vouched) and the
// operands x and k as root reads them:
//
//	p := 1.0
//	for i := 0; i < k; i++ { p *= lambda }
//	return p * math.Exp(-lambda) / fact(k)
//
// becomes lgamma.PoissonTerm(k, lambda). Neither operand, nor the
// accumulator, may change between the loop's start and root: root's k
// must be the loop's trip count. ShapeNone where that cannot be shown.
func (fc *fnCtx) loopPowerMatch(m *fixes.Match, root ast.Expr, pow factor) *fixes.Match {
	none := &fixes.Match{Shape: fixes.ShapeNone, Node: root, Result: m.Result}
	if m.Shape != fixes.ShapePoisson && m.Shape != fixes.ShapePowOverFactorial {
		return none
	}
	info := fc.c.pass.TypesInfo
	acc := fc.c.objOf(pow.acc)
	watched := map[types.Object]bool{}
	for _, a := range m.Args {
		if !isIdentOrSel(ast.Unparen(fc.stripConv(a))) {
			return none
		}
		for _, v := range fc.exprVars(a) {
			watched[v] = true
		}
	}
	changed := false
	assigned.Each(info, funcBody(fc.node), nil, func(v types.Object, at ast.Node) bool {
		from := pow.loop.Pos() // the operands, from the loop's start
		if v == acc {
			from = pow.loop.End() // the accumulator, after its loop
		}
		if (watched[v] || v == acc) && at.Pos() >= from && at.Pos() < root.Pos() {
			changed = true
		}
		return !changed
	})
	if changed {
		return none
	}
	m.Vouched = pow.acc
	if m = fc.readIn(m, root); m == nil {
		return none
	}
	return m
}

// exprVars returns the variables e reads.
func (fc *fnCtx) exprVars(e ast.Expr) []types.Object {
	var out []types.Object
	ast.Inspect(e, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok {
			if v, ok := fc.c.pass.TypesInfo.Uses[id].(*types.Var); ok {
				out = append(out, v)
			}
		}
		return true
	})
	return out
}

// powerLimit describes where math.Pow(x, k) overflows when x is a
// constant; with x unknown nothing is claimed and the power counts as
// safe.
func (fc *fnCtx) powerLimit(pow factor) (string, bool) {
	x, ok := fc.floatConst(pow.arg)
	if !ok || math.Abs(x) <= 1 {
		return "", true
	}
	first := thresholds.PowerFirstBad(pow.t.Num, x)
	if fc.judge(fc.stripConv(pow.arg2), first).silent {
		return "", true
	}
	return fmt.Sprintf("math.Pow(%s, %s) %s for %s ≥ %d", src(pow.arg), src(pow.arg2), verb(pow.t), src(fc.stripConv(pow.arg2)), first), false
}

// powerFirst names, for a power x^e whose base the code does not fix,
// where the power overflows before the divisor does: e at the last
// value of the factorial's argument that still fits, and the first |x|
// whose e-th power passes the type there. Empty where the exponent is
// not a multiple of that argument plus a constant.
func (fc *fnCtx) powerFirst(pow, fac factor, first int64) string {
	if _, ok := fc.floatConst(pow.arg); ok || !pow.t.Float || fac.off != 0 {
		return ""
	}
	e, ok1 := fc.linearCount(fc.stripConv(pow.arg2))
	n, ok2 := fc.linearCount(fc.stripConv(fac.arg))
	if !ok1 || !ok2 || len(n.Terms) != 1 || n.C != 0 || n.Terms[0].K != 1 || len(e.Terms) != 1 || e.Terms[0].Sym != n.Terms[0].Sym || e.Terms[0].K <= 0 {
		return ""
	}
	last := e.Terms[0].K*(first-1) + e.C
	b := thresholds.PowerBaseFirstBad(pow.t.Num, last)
	if math.IsInf(b, 1) {
		return ""
	}
	return fmt.Sprintf("; where |%s| ≥ %s the power %s %s first, before %s reaches %d",
		src(pow.arg), fmtFloat(b), powerText(fc, pow), verb(pow.t), src(fc.stripConv(fac.arg)), first)
}

// powerText renders math.Pow(x, e) as x^e, with the exponent's
// conversion dropped.
func powerText(fc *fnCtx, pow factor) string {
	return atom(pow.arg) + "^" + atom(fc.stripConv(pow.arg2))
}

// atom renders e for a place where an operator binds tightly, as the
// base or exponent of x^k: in parentheses unless it is a name, a
// selector, a literal or a call.
func atom(e ast.Expr) string {
	switch ast.Unparen(e).(type) {
	case *ast.Ident, *ast.BasicLit, *ast.SelectorExpr, *ast.CallExpr:
		return src(ast.Unparen(e))
	}
	return "(" + src(e) + ")"
}

// sameInt reports whether the integer expressions a and b (conversions
// aside) have the same linear form: the exponent and the factorial of
// x^k/k! must be one k.
func (fc *fnCtx) sameInt(a, b ast.Expr) bool {
	// Float counts too (linearCount): the fix runs the helper only
	// where they hold whole numbers.
	la, ok1 := fc.linearCount(a)
	lb, ok2 := fc.linearCount(b)
	return ok1 && ok2 && la.equal(lb)
}

// negated reports whether e is −x: the exponent of e^(−λ) beside λ^k.
func (fc *fnCtx) negated(e, x ast.Expr) bool {
	u, ok := ast.Unparen(e).(*ast.UnaryExpr)
	if !ok || u.Op != token.SUB {
		// 0 - λ, or a field read λ = v.F: compare the linear forms.
		le, ok1 := fc.linearCount(e)
		lx, ok2 := fc.linearCount(x)
		return ok1 && ok2 && len(lx.Terms) > 0 && le.equal(lx.scale(-1))
	}
	a, ok1 := fc.affineOf(u.X, 0)
	b, ok2 := fc.affineOf(x, 0)
	if !ok1 || !ok2 || a.a() != b.a() || a.b() != b.b() {
		return false
	}
	return a.v == nil && b.v == nil || sameVar(fc, a.v, b.v)
}

// checkPowOverFactorials judges a power over a product of factorials,
// each computed on its own, as a Bessel series writes its terms:
//
//	math.Pow(x/2, float64(2*k+n)) / (fact(k) * fact(k+n))   // J_n
//
// A factorial past its limit is +Inf, and so is the divisor; the term
// is 0 there, or NaN where the power overflowed too, although its true
// value is finite (the product of the factorials leaves the type even
// before either does). The message names the factorial that breaks,
// the first one whose range reaches its limit.
func (fc *fnCtx) checkPowOverFactorials(root ast.Expr, p *product) {
	var pow factor
	for _, f := range p.num {
		if f.math == "Pow" {
			pow = f
		}
	}
	var dens []string
	var worst *factor
	var wj judgement
	var first int64
	for i, f := range p.den {
		if f.kind == kindNone {
			continue
		}
		if f.kind != kindFactorial && f.kind != kindDouble {
			return
		}
		dens = append(dens, factorialText(f))
		fb := firstBadOf(f.kind, f.t) - f.off
		j := fc.judge(f.arg, fb)
		if f.fact != nil && f.fact.Safe || j.silent || worst != nil && (wj.definite || !j.definite) {
			continue
		}
		worst, wj, first = &p.den[i], j, fb
	}
	if worst == nil {
		return
	}
	what := fmt.Sprintf("term with %s over %s", powerText(fc, pow), strings.Join(dens, "·"))
	msg := fmt.Sprintf("%s in %s: %s %s for %s ≥ %d (%s), and the divisor with it, after which the term is 0 or NaN although its true value is finite",
		what, worst.t.typeName(), factorialText(*worst), verb(worst.t), src(worst.arg), first, largestFits(worst.kind, worst.t))
	var way ast.Expr
	if pow.call != nil {
		if first := fc.powerFirst(pow, *worst, first); first != "" {
			msg, way = msg+first, pow.arg
		}
	}
	m := fc.factorialChain(root, p.den)
	fc.report(finding{node: root, cat: catPowOverFac, definite: wj.definite, msg: msg + wj.clause,
		related: fc.c.relatedDef(worst.def()), match: p.fix(m), floatWay: way})
}

// factorialText names the factorial a divisor computes: n! or, for a
// double factorial, n!!.
func factorialText(f factor) string {
	if f.kind == kindDouble {
		return bang(f.arg, f.off) + "!"
	}
	return bang(f.arg, f.off)
}
