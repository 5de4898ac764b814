package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/fixes"
)

// The binomial-loop category: a multiplicative binomial loop whose
// intermediate product overflows before the division.

// maxBinomialScan bounds the values of k tried when n is bounded but k
// is not; beyond it the loop is reported as possible.
const maxBinomialScan = 256

// checkBinomialLoop reports b = b*(n-k+i)/i and its variants in an
// integer type (the multiplicative formula C(n,k) = ∏ (n−k+i)/i, common
// practice; every partial product is an exact binomial, so the division
// is exact): the product b*(n-k+i) is formed before the division, so it
// wraps while C(n, k) itself still fits.
func (fc *fnCtx) checkBinomialLoop(al *accLoop, t numType) {
	if t.Float || al.kind != kindFalling {
		return
	}
	sh := al.shape
	k := fc.endRange(al.count, al.coff)
	kExpr := al.count
	nExpr, form := fc.binomialN(al)
	var n ranges.Interval
	switch {
	case nExpr != nil:
		n = fc.rangeOf(nExpr)
	case form != nil:
		// n is a sum the code never writes (n − 1 + i over q trips is
		// C(n+q−1, q)): named and ranged as that sum, and not fixed,
		// since no operand of the loop holds it.
		nExpr, n, kExpr = form.expr(), fc.rangeQueries.affineRange(*form, al.mult), nil
	default:
		return
	}
	if nExpr == nil || n.IsEmpty() || k.IsEmpty() || fc.binomialLoopSafe(t, n, k) {
		return
	}
	product := src(&ast.BinaryExpr{X: ast.NewIdent(al.acc.Name()), Op: token.MUL, Y: &ast.ParenExpr{X: ast.Unparen(al.mult)}})
	msg, definite := binomialProductText("loop", t, product, "the division", nExpr, n, k)
	if al.coff != 0 {
		kExpr = nil
	}
	m := &fixes.Match{
		Shape:   fixes.ShapeBinomialLoop,
		Node:    sh.stmt,
		Result:  fc.c.pass.TypesInfo.TypeOf(al.update.(*ast.AssignStmt).Lhs[0]),
		Acc:     al.acc,
		AccInit: al.accInit,
		Loop:    sh.stmt,
		Func:    fc.node,
	}
	if kExpr != nil {
		m.Args = []ast.Expr{nExpr, kExpr}
	}
	fc.noteCountSign(m)
	fc.reportLoop(al, finding{node: sh.stmt, cat: catBinomLoop, definite: definite, msg: msg, match: m})
}

// binomialN finds n in the factor: the variable with coefficient +1
// other than the induction variable and the trip count, or the
// subexpression that is all of n. Where n is known but no expression of
// the code is all of it, it returns nil and n's linear form.
func (fc *fnCtx) binomialN(al *accLoop) (ast.Expr, *linear) {
	lin, ok := fc.linear(al.mult)
	if !ok {
		return nil, nil
	}
	kObj := fc.c.objOf(al.count)
	var nObj types.Object
	for _, t := range lin.Terms {
		if t.Sym.Object != al.shape.iv && t.Sym.Object != kObj && t.K == 1 {
			nObj = t.Sym.Object
		}
	}
	if nObj == nil {
		return nil, nil
	}
	id := identOf(fc.c.pass.TypesInfo, al.mult, nObj)
	if id == nil {
		return nil, nil
	}
	if want, ok := fc.loopBinomialN(al, lin); ok && !single(nObj).equal(want) {
		// The variable stands for only part of n, as h does in
		// r*(w+h-i)/(i+1), which is C(w+h, w): a subexpression of the
		// factor may be all of it. Where none is, as in the rising
		// w*(n-1+i)/i over q trips, C(n+q−1, q), naming the variable
		// would state another binomial and its thresholds.
		if e := fc.exprOfForm(al.mult, want); e != nil {
			return e, nil
		}
		return nil, &want
	}
	return id, nil
}

// loopBinomialN is the n of C(n, k) that the loop's factor F = lin makes
// with the divisors j+1, j = i − lo over the k = count+coff trips of an
// induction variable i counting up by one from the constant lo (common
// practice: Π (n−j)/(j+1) and Π (n−k+1+j)/(j+1) over 0 ≤ j < k are both
// C(n, k)): n = F(j=0) for a falling factor, F(j=0)+k−1 for a rising one.
func (fc *fnCtx) loopBinomialN(al *accLoop, lin linear) (linear, bool) {
	sh := al.shape
	if sh.step != 1 || sh.first != nil || al.count == nil {
		return linear{}, false
	}
	k, ok := fc.linear(al.count)
	if !ok {
		return linear{}, false
	}
	k.C += al.coff
	a := lin.coefOf(sh.iv)
	atLo := lin.without(sh.iv)
	atLo.C += a * sh.firstOff
	switch a {
	case -1:
		return atLo, true
	case 1:
		n := atLo.add(k)
		n.C--
		return n, true
	}
	return linear{}, false
}

// exprOfForm returns the outermost subexpression of e, conversions and
// parentheses looked through, whose linear form is want, or nil.
func (fc *fnCtx) exprOfForm(e ast.Expr, want linear) ast.Expr {
	var found ast.Expr
	ast.Inspect(e, func(n ast.Node) bool {
		x, ok := n.(ast.Expr)
		if found != nil || !ok {
			return found == nil
		}
		if l, ok := fc.linear(x); ok && l.equal(want) {
			found = x
		}
		return found == nil
	})
	return found
}

// binomialLoopSafe reports whether every (n, k) in the ranges keeps the
// loop's intermediate within t. The intermediate grows with n, so the
// largest n decides; every k up to it is tried.
func (fc *fnCtx) binomialLoopSafe(t numType, n, k ranges.Interval) bool {
	if !bounded(n) {
		return false
	}
	lo, hi := max(k.Lo, 0), min(k.Hi, n.Hi)
	if hi-lo > maxBinomialScan {
		return false
	}
	for kk := lo; kk <= hi; kk++ {
		if !thresholds.BinomialLoopFits(t.Num, n.Hi, kk) {
			return false
		}
	}
	return true
}

// noteCountSign records in a loop match whether its number of factors,
// Args[1], is never negative, so that the rewrite need not keep the
// loop's result for k < 0 (see fixes.Match.CountNonNeg).
func (fc *fnCtx) noteCountSign(m *fixes.Match) {
	if len(m.Args) == 2 {
		k := fc.rangeOf(m.Args[1])
		m.CountNonNeg = !k.IsEmpty() && k.Lo >= 0
	}
}

// binomialProductText describes a multiplicative binomial whose product
// is formed before the division (form: "loop" or "recursion"), the
// products of C(m−1, j−1)·m for C(n, k), against the thresholds of the
// type, and reports whether the overflow is certain: n and k each one
// value whose products leave the type.
func binomialProductText(form string, t numType, product, division string, nExpr ast.Expr, n, k ranges.Interval) (string, bool) {
	lim := thresholds.CentralBinomialLoop(t.Num)
	central := thresholds.CentralBinomial(t.Num)
	name := src(nExpr)
	half := name
	if _, ok := ast.Unparen(nExpr).(*ast.BinaryExpr); ok {
		half = "(" + name + ")"
	}
	clause, _ := verdict(shownName(nExpr), n, lim.FirstBad)
	definite := n.Lo == n.Hi && k.Lo == k.Hi && !thresholds.BinomialLoopFits(t.Num, n.Lo, k.Lo)
	return fmt.Sprintf("multiplicative binomial %s in %s: the product %s %s before %s for %s ≥ %d at k = %s/2, although C(%s, %s/2) itself fits up to %s = %d%s",
		form, t.typeName(), product, verb(t), division, name, lim.FirstBad, half, name, half, name, central.FirstBad-1, clause), definite
}
