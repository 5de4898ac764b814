package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"math"
	"sort"
	"strings"

	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/fixes"
	"github.com/overfact/overfact/internal/astpath"
	"github.com/overfact/overfact/internal/linform"
)

// The factorial-ratio category: binomials, permutations, multinomials,
// Catalan numbers, hypergeometric and binomial probabilities computed as
// ratios or products of factorial values whose numerator overflows first,
// float ratios whose divisor factorial overflows no later than the
// numerator's (checkDivisorFirst), and integer ratios whose bounded
// numerator fits but whose divisor wraps (checkBrokenDivisor).

// brokenFactor returns the numerator factor that can break first: the
// first whose argument is not bounded below its threshold, with the
// judgement of its argument and its first bad argument. ok is false
// when every numerator factor is safe.
func (fc *fnCtx) brokenFactor(num []factor) (f factor, j judgement, first int64, ok bool) {
	for _, f := range num {
		if f.kind == kindNone || f.kind == kindRising || f.kind == kindFalling {
			continue
		}
		if f.fact != nil && f.fact.Safe {
			continue
		}
		first := firstBadOf(f.kind, f.t) - f.off
		// The argument's range through the guards on its variables:
		// after m ≤ 10, (2m)! is at most 20!.
		j := decide(f.arg, fc.guardedRange(f.arg), first)
		fc.noteJudged(f.arg, first, j)
		if !j.silent {
			return f, j, first, true
		}
	}
	return factor{}, judgement{}, 0, false
}

// bang renders the factorial of an argument: n!, (n-k)!, (2*n)!.
func bang(arg ast.Expr, off int64) string {
	s := plus(src(arg), off)
	if _, ok := ast.Unparen(arg).(*ast.Ident); ok && off == 0 {
		return s + "!"
	}
	if _, ok := ast.Unparen(arg).(*ast.BasicLit); ok && off == 0 {
		return s + "!"
	}
	return "(" + s + ")!"
}

// checkFactorialRatio judges binomials, permutations, Catalan numbers,
// multinomials and other products and ratios of factorial values.
func (fc *fnCtx) checkFactorialRatio(root ast.Expr, p *product) {
	if fc.checkDivisorFirst(root, p) {
		return
	}
	u, j, first, ok := fc.brokenFactor(p.num)
	if !ok {
		fc.checkBrokenDivisor(root, p)
		return
	}
	var facts, dens []factor
	for _, f := range p.num {
		if f.kind == kindFactorial {
			facts = append(facts, f)
		}
	}
	for _, f := range p.den {
		if f.kind == kindFactorial {
			dens = append(dens, f)
		}
	}
	clause, definite := j.clause, j.definite
	breaks := fmt.Sprintf("the numerator %s %s for %s ≥ %d", bang(u.arg, u.off), verb(u.t), src(u.arg), first)
	if _, lit := intLiteral(u.arg); lit {
		breaks = fmt.Sprintf("the numerator %s %s, as every factorial from %s does", bang(u.arg, u.off), verb(u.t), bang(&ast.BasicLit{Value: fmt.Sprint(first + u.off)}, 0))
	}
	m := &fixes.Match{Result: fc.c.pass.TypesInfo.TypeOf(root), Node: root}
	var msg string
	shape := fixes.ShapeNone
	// An unknown operand (2·n!/(k!(n−k)!)) makes the value something
	// else than the shape, so no shape is claimed for it.
	if len(facts) == 1 && len(p.num) == 1 && u.kind == kindFactorial && p.other == 0 {
		shape, msg = fc.ratioShape(u, dens, m, fc.linearCount)
	}
	switch {
	case shape == fixes.ShapeBinomial:
		central := thresholds.CentralBinomial(u.t.Num)
		// The code's own n, unless the numerator is a constant or an
		// offset, where no name stands for the row.
		n := atom(u.arg)
		_, lit := ast.Unparen(u.arg).(*ast.BasicLit)
		if _, val := intLiteral(ast.Unparen(u.arg)); u.off != 0 || lit && val {
			n = "n"
		}
		msg = fmt.Sprintf("binomial coefficient as a ratio of factorials in %s: %s, although C(%s, %s/2) itself fits up to %s = %d", u.t.typeName(), breaks, n, n, n, central.FirstBad-1)
	case shape == fixes.ShapeCatalan:
		// The threshold is stated for n, the half of the numerator's
		// argument, as the Catalan number is indexed by it.
		half := m.Args[0]
		cat, cv := thresholds.Catalan(u.t.Num), thresholds.CatalanValue(u.t.Num)
		// The numerator's verdict, told against the Catalan number's own
		// limit, which n may stay below.
		clause, definite = verdict(shownName(half), fc.rangeOf(half), cat.FirstBad)
		msg = fmt.Sprintf("Catalan number as (2n)!/((n+1)!n!) in %s: the numerator %s %s for %s ≥ %d although the Catalan number itself fits up to %s = %d",
			u.t.typeName(), bang(u.arg, u.off), verb(u.t), src(half), cat.FirstBad, src(half), cv.FirstBad-1)
	case shape == fixes.ShapePermutation:
		// The code's own n and k: fact(n) / fact(n-k) is n!/(n - k)!.
		what, k := "n!/(n-k)!", "k"
		if len(dens) == 1 && len(m.Args) == 2 {
			what, k = bang(u.arg, u.off)+"/"+bang(dens[0].arg, dens[0].off), atom(m.Args[1])
		}
		msg = fmt.Sprintf("permutation count %s as a ratio of factorials in %s: %s, although the product of the top %s factors may still fit", what, u.t.typeName(), breaks, k)
	case shape == fixes.ShapeMultinomial:
		msg = fmt.Sprintf("multinomial coefficient as a ratio of factorials in %s: %s before any division", u.t.typeName(), breaks)
	case len(p.den) == 0:
		msg = fmt.Sprintf("product of factorials in %s: the factor %s alone %s for %s ≥ %d, and the product earlier", u.t.typeName(), bang(u.arg, u.off), verb(u.t), src(u.arg), first)
	default:
		msg = fmt.Sprintf("ratio of factorials in %s: %s before the division", u.t.typeName(), breaks)
	}
	rooted := len(p.den) == 0 && fc.underSqrt(root)
	if u.t.Float && (len(p.den) > 0 || rooted) {
		// A product the code forms on the way may leave float64 before
		// any factor does: name it and its first input.
		what, at, ln, at1, ok := fc.intermediateOn(root, u.t)
		if id := fc.loneLineVar(root, ln); ok && id != nil {
			// One input alone moves the line: the function is wrong
			// from the intermediate's break on, before the factor's.
			fc.noteJudged(id, at1, j)
		}
		switch {
		case ok && rooted:
			msg = fmt.Sprintf("product of factorials and powers under math.Sqrt in %s: the intermediate %s %s first, at %s on that line of inputs, while the square root the code keeps still fits (%s alone only for %s ≥ %d)",
				u.t.typeName(), what, verb(u.t), at, bang(u.arg, u.off), src(u.arg), first)
		case ok:
			msg = fmt.Sprintf("ratio of factorials in %s: the intermediate %s %s first, at %s on that line of inputs, before any factor does (%s only for %s ≥ %d)",
				u.t.typeName(), what, verb(u.t), at, bang(u.arg, u.off), src(u.arg), first)
		case rooted && len(facts) == 1:
			// One factorial times powers (judged for its root alone,
			// checkProduct) breaks only where its root does too: the
			// code returns the +Inf the value is.
			return
		}
	}
	m.Shape = shape
	if shape != fixes.ShapeNone && len(facts)+len(dens) < len(p.num)+len(p.den) {
		// The shape is a part of the ratio only (days!/((days−n)!·days^n)
		// holds a power beside the permutation): the whole ratio is
		// taken in log space instead, where the chain applies.
		if cm := fc.factorialChainOf(root, p); cm.Shape != fixes.ShapeNone {
			m = cm
		}
	}
	if shape == fixes.ShapeNone {
		m.Args = nil
		if len(p.den) > 0 || rooted {
			// Another ratio of float factorials, a 2×2 table's
			// (a+b)!(c+d)!(a+c)!(b+d)!/(n!a!b!c!d!): in log space
			// where its factors leave float64.
			m = fc.factorialChainOf(root, p)
		}
	}
	fc.reportRatio(root, p, m, append([]factor{u}, dens...), u, definite, msg+clause)
}

// within reports whether every factorial call among the factors lies in
// root, the expression a fix rewrites, and not in the value of a local
// the product was followed into.
func within(root ast.Expr, fss ...[]factor) bool {
	for _, fs := range fss {
		for _, f := range fs {
			if f.kind != kindNone && (f.call == nil || f.call.Pos() < root.Pos() || f.call.End() > root.End()) {
				return false
			}
		}
	}
	return true
}

// reportRatio reports a ratio's finding, its definition related and its
// match told whether every factorial function returns 1 below zero.
func (fc *fnCtx) reportRatio(root ast.Expr, p *product, m *fixes.Match, fs []factor, def factor, definite bool, msg string) {
	m.EmptyBelow = emptyBelowAll(fs)
	m.Floor = floorAll(fs)
	match := p.fix(m)
	if p.chained && !p.tabled && p.chainStart != nil && m.EmptyBelow && m.Shape != fixes.ShapeNone {
		// r := fact(n); r /= fact(k); r /= fact(n-k): the start takes the
		// whole value and the links go, exact outside the helper's domain
		// as well since the factorial functions return 1 below zero.
		m.Node, m.Chain, match = p.chainStart, p.chainLinks, m
	}
	fc.report(finding{
		node:     root,
		cat:      catRatio,
		definite: definite,
		msg:      msg,
		related:  fc.c.relatedDef(def.def()),
		match:    match,
	})
}

// ratioShape matches the denominators of a single-factorial numerator
// against the binomial, Catalan, permutation and multinomial forms, and
// fills the Match arguments in the order fixes documents. The forms are
// the textbook ones (common practice): C(n,k) = n!/(k!(n−k)!) (DLMF
// 26.3.1), n!/(n−k)! for k-permutations, the multinomial n!/(k₁!…kₘ!)
// with Σkᵢ = n (DLMF 26.4.2), and the Catalan number
// (2n)!/((n+1)!n!) (OEIS A000108); section numbers from memory. lin
// reads the arguments as linear forms: fc.linear, or fc.linearCount for
// the match of a finding, whose fix takes float counts where they hold
// integers (a function's value fact claims a shape over integers only).
func (fc *fnCtx) ratioShape(u factor, dens []factor, m *fixes.Match, lin func(ast.Expr) (linear, bool)) (fixes.Shape, string) {
	n, ok := lin(u.arg)
	if !ok || len(dens) == 0 || u.off != 0 {
		return fixes.ShapeNone, ""
	}
	var lins []linear
	sum := linear{}
	for _, d := range dens {
		l, ok := lin(d.arg)
		if !ok || d.off != 0 {
			return fixes.ShapeNone, ""
		}
		lins = append(lins, l)
		sum = sum.add(l)
	}
	switch {
	case len(dens) == 2 && sum.equal(n):
		k := dens[0].arg
		if len(lins[1].Terms) < len(lins[0].Terms) {
			k = dens[1].arg
		}
		m.Args = []ast.Expr{u.arg, k}
		return fixes.ShapeBinomial, ""
	case len(dens) == 2 && sum.scale(2).equal(n.scale(2).add(linear{C: 2})) && (lins[0].scale(2).equal(n) || lins[1].scale(2).equal(n)):
		half := dens[0].arg
		if !lins[0].scale(2).equal(n) {
			half = dens[1].arg
		}
		m.Args = []ast.Expr{half}
		return fixes.ShapeCatalan, ""
	case len(dens) == 1:
		if b, ok := ast.Unparen(dens[0].arg).(*ast.BinaryExpr); ok && b.Op == token.SUB {
			if x, ok := lin(b.X); ok && x.equal(n) {
				m.Args = []ast.Expr{u.arg, b.Y}
			}
		}
		return fixes.ShapePermutation, ""
	case len(dens) >= 3 && sum.equal(n):
		for _, d := range dens {
			m.Args = append(m.Args, d.arg)
		}
		m.Extra = []ast.Expr{u.arg}
		return fixes.ShapeMultinomial, ""
	}
	return fixes.ShapeNone, ""
}

// checkHypergeometric judges C(K,k)·C(N−K,n−k)/C(N,n) formed from calls
// of a binomial-valued function (the hypergeometric pmf, common
// practice): the denominator's C(N, n), with the largest n, breaks first.
func (fc *fnCtx) checkHypergeometric(root ast.Expr, p *product) {
	d := p.den[0]
	for _, f := range p.den {
		if f.kind == kindBinomial {
			d = f
		}
	}
	j, first := fc.judgeCall(d)
	if j.silent {
		return
	}
	clause, definite := j.clause, j.definite
	msg := fmt.Sprintf("hypergeometric probability from three binomial coefficients in %s: %s(%s, …) breaks for %s ≥ %d before the division%s",
		d.t.typeName(), d.fn.Name(), src(d.arg), src(d.arg), first, clause)
	m := &fixes.Match{Shape: fixes.ShapeNone, Node: root, Result: fc.c.pass.TypesInfo.TypeOf(root)}
	if args := fc.hyperArgs(p); args != nil && p.other == 0 {
		m.Shape, m.Args = fixes.ShapeHypergeometric, args
	}
	fc.report(finding{node: root, cat: catRatio, definite: definite, msg: msg, related: fc.c.relatedDef(d.def()), match: p.fix(m)})
}

// hyperArgs returns k, N, K, n of C(K,k)C(N-K,n-k)/C(N,n), or nil.
func (fc *fnCtx) hyperArgs(p *product) []ast.Expr {
	if len(p.num) != 2 || len(p.den) != 1 {
		return nil
	}
	a, b, d := p.num[0], p.num[1], p.den[0]
	if a.arg2 == nil || b.arg2 == nil || d.arg2 == nil {
		return nil
	}
	N, ok1 := fc.linear(d.arg)
	n, ok2 := fc.linear(d.arg2)
	K, ok3 := fc.linear(a.arg)
	k, ok4 := fc.linear(a.arg2)
	K2, ok5 := fc.linear(b.arg)
	k2, ok6 := fc.linear(b.arg2)
	if !(ok1 && ok2 && ok3 && ok4 && ok5 && ok6) {
		return nil
	}
	if !K.add(K2).equal(N) || !k.add(k2).equal(n) {
		return nil
	}
	if len(K2.Terms) < len(K.Terms) {
		a = b // the simpler pair is C(K, k), the other C(N-K, n-k)
	}
	return []ast.Expr{a.arg2, d.arg, a.arg, d.arg2}
}

// checkBinomialPMF judges C(n,k)·p^k·(1−p)^(n−k) (the binomial pmf,
// common practice) where C(n, k) comes from a binomial-valued function
// that breaks: the probability is small, the coefficient is not.
func (fc *fnCtx) checkBinomialPMF(root ast.Expr, p *product) {
	var b factor
	var pows []factor
	for _, f := range p.num {
		switch {
		case f.kind == kindBinomial:
			b = f
		case f.math == "Pow":
			pows = append(pows, f)
		}
	}
	j, first := fc.judgeCall(b)
	if j.silent {
		return
	}
	clause, definite := j.clause, j.definite
	what := "C(n,k)·p^k·(1−p)^(n−k)"
	pmf := b.arg2 != nil && len(pows) == 2 && fc.pmfExponents(b, pows)
	if b.arg2 != nil && len(pows) > 0 {
		// The code's own n, k and p: C(n, d)·p^d·(1−p)^(n−d).
		bn, bk := fc.stripConv(b.arg), fc.stripConv(b.arg2)
		n, k, q := atom(bn), atom(bk), atom(pows[0].arg)
		what = fmt.Sprintf("C(%s, %s)·%s^%s·(1−%s)^(%s−%s)", src(bn), src(bk), q, k, q, n, k)
	}
	if b.arg2 != nil && len(pows) == 2 && !pmf {
		// Other powers (the negative binomial's C(k+r−1, k)·p^r·(1−p)^k):
		// the code's own factors.
		what = fmt.Sprintf("C(%s, %s)·%s·%s", src(fc.stripConv(b.arg)), src(fc.stripConv(b.arg2)), src(pows[0].call), src(pows[1].call))
	}
	bound := "the probability itself is at most 1"
	if !pmf {
		bound = "the product with the powers may still fit"
	}
	msg := fmt.Sprintf("binomial probability %s in %s: %s(%s, …) breaks for %s ≥ %d although %s%s",
		what, b.t.typeName(), b.fn.Name(), src(b.arg), src(b.arg), first, bound, clause)
	m := &fixes.Match{Shape: fixes.ShapeNone, Node: root, Result: fc.c.pass.TypesInfo.TypeOf(root)}
	if pmf && p.other == 0 {
		m.Shape, m.Args = fixes.ShapeBinomialPMF, []ast.Expr{b.arg2, b.arg, pows[0].arg}
	}
	fc.report(finding{node: root, cat: catRatio, definite: definite, msg: msg, related: fc.c.relatedDef(b.def()), match: p.fix(m)})
}

// pmfExponents reports whether the two powers' exponents are k and
// n − k of the coefficient C(n, k), in either order, or are not read as
// linear forms (then the fixer's own check of the shape decides).
func (fc *fnCtx) pmfExponents(b factor, pows []factor) bool {
	n, ok1 := fc.linear(b.arg)
	k, ok2 := fc.linear(b.arg2)
	e0, ok3 := fc.linear(pows[0].arg2)
	e1, ok4 := fc.linear(pows[1].arg2)
	if !(ok1 && ok2 && ok3 && ok4) {
		return true
	}
	return e0.add(e1).equal(n) && (e0.equal(k) || e1.equal(k))
}

// emptyBelowAll reports whether every factor is a call of a factorial
// function that returns 1 for negative arguments (FactorialFact.EmptyBelow).
func emptyBelowAll(fs []factor) bool {
	for _, f := range fs {
		if f.fact == nil || !f.fact.EmptyBelow || f.off != 0 || f.call == nil || len(f.call.Args) != 1 {
			return false
		}
	}
	return len(fs) > 0
}

// floorAll reports whether every factor is a call of a factorial
// function that returns ⌊x⌋! for every x (FactorialFact.Floor).
func floorAll(fs []factor) bool {
	for _, f := range fs {
		if f.fact == nil || !f.fact.Floor {
			return false
		}
	}
	return len(fs) > 0
}

// checkBrokenDivisor judges an integer binomial, permutation or
// multinomial whose numerator is bounded below its threshold but one of
// whose divisors is not: with n ≤ 20, C(n, k) = n!/(k!(n−k)!) is in
// range, but for k > n or k < 0 (k ≥ 21, or n − k ≥ 21) the divisor
// wraps first, to 0 from 66! on (a division by zero), or to a value
// below the numerator's (a wrong quotient), where the true quotient is
// a small number (0 for a factorial function that returns 1 below
// zero). A float divisor overflows to +Inf, and the quotient 0 is then
// right: not reported.
func (fc *fnCtx) checkBrokenDivisor(root ast.Expr, p *product) {
	if len(p.num) != 1 || p.other != 0 || p.num[0].kind != kindFactorial || p.num[0].t.Float || p.num[0].fact == nil {
		return
	}
	u := p.num[0]
	var dens []factor
	for _, f := range p.den {
		if f.kind != kindFactorial || f.fact == nil {
			return
		}
		dens = append(dens, f)
	}
	m := &fixes.Match{Result: fc.c.pass.TypesInfo.TypeOf(root), Node: root}
	shape, _ := fc.ratioShape(u, dens, m, fc.linearCount)
	if shape != fixes.ShapeBinomial && shape != fixes.ShapePermutation && shape != fixes.ShapeMultinomial {
		return
	}
	for _, d := range dens {
		j, first := fc.judgeCall(d)
		if j.silent {
			continue
		}
		m.Shape = shape
		fc.reportRatio(root, p, m, append([]factor{u}, dens...), d, false,
			fmt.Sprintf("%s as a ratio of factorials in %s: the divisor %s %s for %s ≥ %d, where the numerator %s still fits%s",
				shapeWords[shape], d.t.typeName(), bang(d.arg, d.off), verb(d.t), src(d.arg), first, bang(u.arg, u.off), j.clause))
		return
	}
}

// shapeWords names the integer ratios checkBrokenDivisor judges.
var shapeWords = map[fixes.Shape]string{
	fixes.ShapeBinomial:    "binomial coefficient",
	fixes.ShapePermutation: "permutation count",
	fixes.ShapeMultinomial: "multinomial coefficient",
}

// divisorFirst returns the divisor factorial of a float ratio that
// overflows no later than any factorial of the numerator: its argument
// exceeds each of theirs by a form with no negative coefficient that is
// not 0 (k!/(k+j)!, (l−m)!/(l+m)!, n!/(n+1)!, a!b!/(a+b+1)!), so that
// it passes its threshold first wherever the variables added are not
// negative, the way the code is written to be called. The quotient,
// the reciprocal of a rising factorial or a ratio below 1, is then 0
// (NaN once the numerator follows) where it may still fit.
func (fc *fnCtx) divisorFirst(p *product) (d factor, j judgement, first int64, ok bool) {
	var nums []linear
	for _, f := range p.num {
		if f.kind != kindFactorial {
			continue
		}
		l, ok := fc.linear(f.arg)
		if !ok || !f.t.Float {
			return factor{}, judgement{}, 0, false
		}
		nums = append(nums, l.add(linear{C: f.off}))
	}
	if len(nums) == 0 {
		return factor{}, judgement{}, 0, false
	}
	for _, d := range p.den {
		if d.kind != kindFactorial || !d.t.Float || d.fact != nil && d.fact.Safe {
			continue
		}
		l, ok := fc.linear(d.arg)
		if !ok || !exceedsAll(l.add(linear{C: d.off}), nums) {
			continue
		}
		first := firstBadOf(d.kind, d.t) - d.off
		if j := fc.judge(d.arg, first); !j.silent {
			return d, j, first, true
		}
	}
	return factor{}, judgement{}, 0, false
}

// exceedsAll reports whether d − n has no negative coefficient and is
// not 0 for every n of nums.
func exceedsAll(d linear, nums []linear) bool {
	for _, n := range nums {
		diff := d.add(n.scale(-1))
		if diff.C < 0 || diff.C == 0 && len(diff.Terms) == 0 {
			return false
		}
		for _, t := range diff.Terms {
			if t.K < 0 {
				return false
			}
		}
	}
	return true
}

// checkDivisorFirst reports a float ratio whose divisor factorial
// overflows first (divisorFirst); it returns whether it did.
func (fc *fnCtx) checkDivisorFirst(root ast.Expr, p *product) bool {
	d, j, first, ok := fc.divisorFirst(p)
	if !ok {
		return false
	}
	if _, _, earlier := fc.firstIntermediate(root, d.t); earlier {
		// A product the code forms breaks before the divisor does.
		return false
	}
	var nums []string
	for _, f := range p.num {
		if f.kind == kindFactorial {
			nums = append(nums, bang(f.arg, f.off))
		}
	}
	m := &fixes.Match{Result: fc.c.pass.TypesInfo.TypeOf(root), Node: root}
	// The quotient the code means fits where its divisor does not:
	// taken in log space, each factorial the value its function returns
	// with ln n! beside it.
	if cm := fc.factorialChainOf(root, p); cm.Shape != fixes.ShapeNone {
		m = cm
	}
	fc.reportRatio(root, p, m, append(append([]factor{}, p.num...), d), d, j.definite,
		fmt.Sprintf("ratio of factorials in %s: the divisor %s %s for %s ≥ %d, no later than the numerator's %s, and the quotient is then 0, or NaN once the numerator follows, although it may still fit%s",
			d.t.typeName(), bang(d.arg, d.off), verb(d.t), src(d.arg), first, strings.Join(nums, ", "), j.clause))
	return true
}

// A chainPart is one factor of a float product of factorials and
// powers as the code writes it: (arg)! when base is 0, base^arg
// otherwise, in the divisor when div is set.
type chainPart struct {
	arg   linear
	base  int64
	div   bool
	text  string
	konst float64 // a positive constant factor, when > 0
}

// A chainStep is one value the code forms on its way to a product: a
// factor, or the result of one multiplication or division, with the
// parts whose product it is.
type chainStep struct {
	parts []chainPart
	leaf  bool
}

// chainSteps returns the values a float product of factorial calls and
// integer-based powers forms, in the order the code evaluates them
// (locals the product reads, assigned once, before the expression), or
// false when an operand is anything else.
func (fc *fnCtx) chainSteps(root ast.Expr) (steps []chainStep, ok bool) {
	var pre []chainStep
	var walk func(e ast.Expr, local bool, depth int) ([]chainPart, bool)
	walk = func(e ast.Expr, local bool, depth int) ([]chainPart, bool) {
		if depth > maxDepth {
			return nil, false
		}
		add := func(s chainStep) {
			if local {
				pre = append(pre, s)
			} else {
				steps = append(steps, s)
			}
		}
		switch e := ast.Unparen(e).(type) {
		case *ast.BinaryExpr:
			if e.Op != token.MUL && e.Op != token.QUO {
				return nil, false
			}
			x, okx := walk(e.X, local, depth+1)
			y, oky := walk(e.Y, local, depth+1)
			if !okx || !oky {
				return nil, false
			}
			parts := append([]chainPart{}, x...)
			for _, p := range y {
				p.div = p.div != (e.Op == token.QUO)
				parts = append(parts, p)
			}
			add(chainStep{parts: parts})
			return parts, true
		case *ast.CallExpr:
			f, ok := fc.factorOf(e)
			if !ok {
				// A positive constant such as √π: a factor that moves no
				// threshold's line but shifts where the product breaks.
				if c, ok := fc.positiveConst(e); ok {
					p := chainPart{konst: c, text: src(e)}
					add(chainStep{parts: []chainPart{p}, leaf: true})
					return []chainPart{p}, true
				}
			}
			if !ok || !f.t.Float {
				return nil, false
			}
			var p chainPart
			switch {
			case f.kind == kindFactorial && f.fact != nil && !f.fact.Safe:
				l, ok := fc.linear(f.arg)
				if !ok {
					return nil, false
				}
				p = chainPart{arg: fc.expandLocals(l.add(linear{C: f.off}), 0), text: bang(f.arg, f.off)}
			case f.math == "Pow":
				b, okb := fc.intConst(f.arg)
				l, okl := fc.linear(f.arg2)
				if !okb || !okl || b < 2 {
					return nil, false
				}
				p = chainPart{arg: fc.expandLocals(l, 0), base: b, text: fmt.Sprintf("%d^%s", b, atom(fc.stripConv(f.arg2)))}
			default:
				return nil, false
			}
			add(chainStep{parts: []chainPart{p}, leaf: true})
			return []chainPart{p}, true
		case *ast.Ident:
			if def := fc.singleDef(e); def != nil {
				return walk(def, true, depth+1)
			}
		}
		return nil, false
	}
	if _, ok := walk(root, false, 0); !ok {
		return nil, false
	}
	return append(pre, steps...), true
}

// expandLocals substitutes in l the linear value of each local it reads
// that is assigned once (n := a + b + c), so that the forms speak of the
// same variables.
func (fc *fnCtx) expandLocals(l linear, depth int) linear {
	if depth > maxDepth {
		return l
	}
	for _, t := range l.Terms {
		obj := t.Sym.Object
		if !(fc.node.Pos() <= obj.Pos() && obj.Pos() < fc.node.End()) {
			continue
		}
		if defs := fc.defsOf(obj); len(defs) == 1 && defs[0] != nil {
			if d, ok := fc.linear(defs[0]); ok {
				return fc.expandLocals(linear(lform(l).Subst(t.Sym, lform(d))), depth+1)
			}
		}
	}
	return l
}

// A chainLine is the line of inputs a chain is judged along: every
// variable t, but those centred at 0.
type chainLine struct {
	vars    []linform.Obj
	centred map[linform.Obj]bool
	from    int64
}

// lineOf chooses the line: each variable equal to t, except one that
// two factorials take with opposite signs around the same rest
// ((j+m)! and (j−m)!), which is held at 0, the middle of its pair. It
// fails where a factorial's argument or an exponent falls along it.
func lineOf(steps []chainStep) (chainLine, bool) {
	all := steps[len(steps)-1].parts
	ln := chainLine{centred: map[linform.Obj]bool{}}
	seen := map[linform.Obj]bool{}
	for i, a := range all {
		for _, t := range a.arg.Terms {
			if !seen[t.Sym] {
				seen[t.Sym] = true
				ln.vars = append(ln.vars, t.Sym)
			}
			for _, b := range all[i+1:] {
				if a.base == 0 && b.base == 0 && b.arg.coefOf(t.Sym.Object) == -t.K && a.arg.without(t.Sym.Object).equal(b.arg.without(t.Sym.Object)) {
					ln.centred[t.Sym] = true
				}
			}
		}
	}
	sort.Slice(ln.vars, func(i, j int) bool { return ln.vars[i].Before(ln.vars[j]) })
	if len(ln.centred) == len(ln.vars) {
		return ln, false
	}
	for _, p := range all {
		a, b := ln.coef(p.arg)
		switch {
		case a < 0 || a == 0 && b < 0:
			return ln, false
		case a > 0 && b < 0:
			ln.from = max(ln.from, (-b+a-1)/a)
		}
	}
	return ln, true
}

// coef returns l along the line as A·t + B.
func (ln chainLine) coef(l linear) (a, b int64) {
	for _, t := range l.Terms {
		if !ln.centred[t.Sym] {
			a += t.K
		}
	}
	return a, l.C
}

// parts returns the thresholds' parts of a step along the line.
func (ln chainLine) parts(s chainStep) []thresholds.ChainPart {
	var out []thresholds.ChainPart
	for _, p := range s.parts {
		a, b := ln.coef(p.arg)
		out = append(out, thresholds.ChainPart{A: a, B: b, Base: p.base, Div: p.div, Const: p.konst})
	}
	return out
}

// text names the inputs of the line at t.
func (ln chainLine) text(t int64) string {
	var on, off []string
	for _, v := range ln.vars {
		if ln.centred[v] {
			off = append(off, v.Name())
		} else {
			on = append(on, v.Name())
		}
	}
	s := strings.Join(on, " = ") + fmt.Sprintf(" = %d", t)
	if len(on) > 1 {
		s += " (all equal)"
	}
	if len(off) > 0 {
		s += ", " + strings.Join(off, " = ") + " = 0"
	}
	return s
}

// loneLineVar returns a read in root of the one variable a line of
// inputs moves, or nil where it moves several or holds one at 0.
func (fc *fnCtx) loneLineVar(root ast.Expr, ln chainLine) *ast.Ident {
	if len(ln.vars) != 1 || len(ln.centred) != 0 {
		return nil
	}
	var found *ast.Ident
	ast.Inspect(root, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok && found == nil && fc.c.objOf(id) == ln.vars[0].Object {
			found = id
		}
		return found == nil
	})
	return found
}

// underSqrt reports whether root is the argument of math.Sqrt: the code
// keeps its square root, which fits where root may not.
func (fc *fnCtx) underSqrt(root ast.Expr) bool {
	if fc.file == nil {
		return false
	}
	path, _ := astpath.Enclosing(fc.file.file, root.Pos(), root.End())
	for _, n := range path[1:] {
		if _, paren := n.(*ast.ParenExpr); paren {
			continue
		}
		call, ok := n.(*ast.CallExpr)
		return ok && fc.c.isMathFunc(call, "Sqrt")
	}
	return false
}

// rootedChain reports whether root is a float product under math.Sqrt
// whose operands are all factorial calls, integer-based powers and
// positive constants (2^n·n!·√π): judged whole, since the root the code
// keeps is of the whole product.
func (fc *fnCtx) rootedChain(root ast.Expr) bool {
	if !fc.underSqrt(root) {
		return false
	}
	_, ok := fc.chainSteps(root)
	return ok
}

// positiveConst returns the value of a positive constant factor: a
// constant expression, or math.Sqrt of one (√π, √2).
func (fc *fnCtx) positiveConst(e ast.Expr) (float64, bool) {
	if call, ok := ast.Unparen(e).(*ast.CallExpr); ok && len(call.Args) == 1 && fc.c.isMathFunc(call, "Sqrt") {
		if v, ok := fc.floatConst(call.Args[0]); ok && v > 0 && !math.IsInf(v, 0) {
			return math.Sqrt(v), true
		}
		return 0, false
	}
	v, ok := fc.floatConst(e)
	return v, ok && v > 0 && !math.IsInf(v, 0)
}

// firstIntermediate returns, for a float product of factorials and
// powers, the value the code forms that leaves float64 first along the
// line lineOf chooses, where that is no single factor and the whole
// value still fits there: the product's text, where it breaks, and the
// leaf factors' own first break along the line.
func (fc *fnCtx) firstIntermediate(root ast.Expr, t numType) (what, at string, ok bool) {
	what, at, _, _, ok = fc.intermediateOn(root, t)
	return what, at, ok
}

// intermediateOn is firstIntermediate with the line of inputs and the t
// on it where the intermediate breaks.
func (fc *fnCtx) intermediateOn(root ast.Expr, t numType) (what, at string, ln chainLine, first int64, ok bool) {
	steps, ok := fc.chainSteps(root)
	if !ok || len(steps) < 2 {
		return "", "", ln, 0, false
	}
	ln, ok = lineOf(steps)
	if !ok {
		return "", "", ln, 0, false
	}
	best, bestAt := -1, int64(math.MaxInt64)
	for i, s := range steps {
		if x := thresholds.ChainFirstBad(t.Num, ln.parts(s), ln.from); x < bestAt {
			best, bestAt = i, x
		}
	}
	last := steps[len(steps)-1]
	// The value the code keeps is the product, or its square root.
	root2 := 1
	if fc.underSqrt(root) {
		root2 = 2
	}
	if best < 0 || steps[best].leaf || !thresholds.ChainFits(t.Num, ln.parts(last), bestAt, root2) {
		return "", "", ln, 0, false
	}
	for _, v := range ln.vars {
		iv := fc.entryRange(v.Object, root)
		if want := map[bool]int64{false: bestAt, true: 0}[ln.centred[v]]; iv.IsEmpty() || iv.Hi < want || iv.Lo > want {
			return "", "", ln, 0, false
		}
	}
	var num, den []string
	for _, p := range steps[best].parts {
		if p.div {
			den = append(den, p.text)
		} else {
			num = append(num, p.text)
		}
	}
	what = strings.Join(num, "·")
	if len(num) == 0 {
		what = "1"
	}
	if len(den) == 1 {
		what += "/" + den[0]
	} else if len(den) > 1 {
		what += "/(" + strings.Join(den, "·") + ")"
	}
	return what, ln.text(bestAt), ln, bestAt, true
}
