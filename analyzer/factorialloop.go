package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"math"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/fixes"
)

// The factorial-loop category: a loop that multiplies an accumulator by
// its induction variable (a factorial or double factorial, and the
// falling and rising factorials below), judged by the range of the
// largest factor where the loop starts. The loop shapes are read in
// loops.go and accloop.go.

// topRange is the range of the expression naming the largest factor of
// a loop, where the loop starts.
func (fc *fnCtx) topRange(al *accLoop) ranges.Interval {
	switch {
	case al.top == nil:
		return ranges.Point(0)
	case al.shape.whileLike && fc.c.objOf(al.top) == al.shape.iv:
		return fc.entryRange(al.shape.iv, al.shape.stmt)
	}
	return fc.rangeOf(al.top)
}

func (fc *fnCtx) checkFactorialLoop(al *accLoop, t numType) {
	if fc.decidedAtCalls(al.shape.stmt) {
		return
	}
	first := firstBadOf(al.kind, t)
	if al.top == nil && al.topOff < first {
		return // a constant bound below the threshold
	}
	if fc.judge(fc.stripConv(al.mult), first).silent {
		return
	}
	// The verdict is the top's where the loop starts (with no top, a
	// constant bound, its range is the point 0 and the offset decides),
	// that holds whether or not the top alone stays below its limit.
	clause, definite := verdict(shownName(al.top), fc.topRange(al), first-al.topOff)
	name, off := shownFactorial(al.top, al.topOff)
	msg := factorialLimitText(al.kind, name, off, t) + clause
	if al.top == nil && al.shape.bigEnd != nil {
		// The largest factor is a constant beyond int64: say it as written.
		msg = factorialConstText(al.kind, src(al.shape.bigEnd), t)
	}
	m := fc.loopMatch(al, t)
	fc.reportLoop(al, finding{
		node:     al.shape.stmt,
		cat:      catLoop,
		definite: definite,
		msg:      msg,
		match:    m,
	})
}

// loopMatch describes a factorial loop for the fixes package.
func (fc *fnCtx) loopMatch(al *accLoop, t numType) *fixes.Match {
	m := &fixes.Match{
		Shape:   fixes.ShapeFactorial,
		Node:    al.shape.stmt,
		Result:  fc.c.pass.TypesInfo.TypeOf(al.update.(*ast.AssignStmt).Lhs[0]),
		Acc:     al.acc,
		AccInit: al.accInit,
		Loop:    al.shape.stmt,
		Func:    fc.node,
	}
	// A double factorial n!! gets the same guard as n!, with its own
	// first bad n. The guard tests the function's argument, so it is
	// right only where the product is what the function returns: a
	// product that feeds a sum, a ratio or a conversion (a series term
	// x^k/k!, 1/float64(f)) may still give a correct result past the
	// point where the product itself no longer fits, and a guard would
	// make that function panic.
	if al.kind != kindFactorial && al.kind != kindDouble || !fc.returnsProduct(al) {
		if st := fc.seriesTermMatch(al); st != nil {
			return st
		}
		m.Shape = fixes.ShapeNone
	}
	if al.top != nil {
		m.Args = []ast.Expr{al.top}
		m.Param = fc.c.objOf(al.top)
		m.FirstBad = firstBadOf(al.kind, t) - al.topOff
	}
	return m
}

// returnsProduct reports whether al's product is the value of its
// function: a factorial-valued function of this package whose loop
// accumulates into the same variable.
func (fc *fnCtx) returnsProduct(al *accLoop) bool {
	d, ok := fc.node.(*ast.FuncDecl)
	if !ok {
		return false
	}
	ff := fc.c.funcs[fc.c.declObj(d)]
	return ff != nil && ff.loop != nil && ff.loop.acc == al.acc
}

// checkFallingLoop reports n·(n−1)·…·(n−k+1) formed by a loop when the
// largest factor n and the number of factors k can make it exceed t.
// The product grows with both, so the largest n and k decide safety and
// the smallest decide certainty.
func (fc *fnCtx) checkFallingLoop(al *accLoop, t numType) {
	if al.span != nil {
		// Only the joint reading applies: no expression counts the
		// factors for the bounds of the top and the count to judge.
		if msg, definite, _ := fc.fallingAffine(al, t); msg != "" {
			fc.reportLoop(al, finding{node: al.shape.stmt, cat: catLoop, definite: definite, msg: msg, match: fc.bareLoopMatch(al, t)})
		}
		return
	}
	n := fc.rangeOf(fc.stripConv(al.mult))
	if al.top != nil && al.top != al.mult {
		n = shift(fc.rangeOf(al.top), al.topOff)
	}
	k := fc.endRange(al.count, al.coff)
	if n.IsEmpty() || k.IsEmpty() {
		return
	}
	if bounded(n) && bounded(k) && thresholds.FallingFits(t.Num, n.Hi, min(k.Hi, n.Hi)) {
		return
	}
	msg, definite, judged := fc.fallingAffine(al, t)
	if !judged {
		msg, definite = fallingText(al, t, n, k, src(fc.fallingTop(al)))
	}
	if msg == "" {
		return
	}
	m := fc.bareLoopMatch(al, t)
	if n := fc.fallingBase(al); n != nil {
		m.Shape, m.Args = fixes.ShapeFallingLoop, []ast.Expr{n, al.count}
	} else if n, k := fc.fallingSpan(al); n != nil {
		m.Shape, m.Args = fixes.ShapeFallingLoop, []ast.Expr{n, k}
	}
	fc.noteCountSign(m)
	fc.reportLoop(al, finding{node: al.shape.stmt, cat: catLoop, definite: definite, msg: msg, match: m})
}

// fallingAffine judges a falling factorial whose largest factor and
// number of factors are both affine in one variable v, as in
// for k := n + 1; k <= 2*n; k++ { p *= k }: the two grow together, so
// the first bad input is that of their joint product, (2n)!/n! first
// wraps int64 at n = 15, and neither bound alone names it. It returns
// the message (empty when the loop fits), whether the overflow is
// certain, and false when the loop is not of this form.
func (fc *fnCtx) fallingAffine(al *accLoop, t numType) (string, bool, bool) {
	if al.top == nil || al.count == nil && al.span == nil {
		return "", false, false
	}
	top, ok1 := fc.linear(al.top)
	cnt, ok2 := linear{}, true
	if al.span != nil {
		cnt = *al.span
	} else {
		cnt, ok2 = fc.linear(al.count)
		cnt.C += al.coff
	}
	if !ok1 || !ok2 || len(top.Terms) != 1 || len(cnt.Terms) != 1 || top.Terms[0].Sym.Object != cnt.Terms[0].Sym.Object {
		return "", false, false
	}
	v := top.Terms[0].Sym.Object
	a, b := top.Terms[0].K, top.C+al.topOff
	c, d := cnt.Terms[0].K, cnt.C
	first := thresholds.FallingAffineFirstBad(t.Num, a, b, c, d)
	start := thresholds.FallingAffineStart(a, b, c, d)
	id := identOf(fc.c.pass.TypesInfo, al.top, v)
	if first == math.MaxInt64 || start == math.MaxInt64 || id == nil {
		return "", false, false
	}
	vr := fc.rangeOf(id)
	// Below the start either the loop makes no trips (the count is what
	// starts it: MirroredHalls at n ≤ 0) or some factor is not positive,
	// where the bounds of the top and the count must decide.
	empty := c*(start-1)+d <= 0 // first is finite, so |c|, |d|, |start| ≤ 2^41
	switch {
	case vr.IsEmpty():
		return "", false, true
	case vr.Hi < first && (empty || vr.Lo >= start && vr.Lo != math.MinInt64):
		return "", false, true
	case vr.Hi < first:
		return "", false, false
	}
	clause, definite := verdict(v.Name(), vr, first)
	msg := fmt.Sprintf("falling factorial of %s factors down from %s in %s %s for %s ≥ %d%s",
		affineText(v.Name(), c, d), affineText(v.Name(), a, b), t.typeName(), verb(t), v.Name(), first, clause)
	return msg, definite, true
}

// bareLoopMatch is the match of a loop reported without a rewrite of its own.
func (fc *fnCtx) bareLoopMatch(al *accLoop, t numType) *fixes.Match {
	m := fc.loopMatch(al, t)
	m.Shape, m.Args, m.Param, m.FirstBad = fixes.ShapeNone, nil, nil, 0
	return m
}

// affineText renders a·name+b.
func affineText(name string, a, b int64) string {
	if a != 1 {
		name = fmt.Sprintf("%d*%s", a, name)
	}
	return plus(name, b)
}

// fallingText is the message of a falling-factorial loop whose largest
// factor n and number of factors k are judged by their own ranges.
//
// nName is the largest factor as the code writes it (n of n·(n−1)·…), or
// "" when no single expression names it.
func fallingText(al *accLoop, t numType, n, k ranges.Interval, nName string) (string, bool) {
	kName := plus(src(al.count), al.coff)
	var msg string
	switch {
	case al.count == nil && k.Hi > 0:
		msg = fmt.Sprintf("falling factorial of %s factors in %s %s for a largest factor ≥ %d", kName, t.typeName(), verb(t), thresholds.FallingFirstBad(t.Num, k.Hi))
	case finite(k) && k.Hi > 0:
		msg = fmt.Sprintf("falling factorial of %s factors in %s %s: with %s = %d, for a largest factor ≥ %d", kName, t.typeName(), verb(t), kName, k.Hi, thresholds.FallingFirstBad(t.Num, k.Hi))
	case nName != "":
		// Neither end is bounded: the product is worst when it runs
		// all the way down, where it is n! itself.
		msg = fmt.Sprintf("falling factorial of %s factors from %s down in %s %s: when %s = %s it is %s!, which %s for %s ≥ %d", kName, nName, t.typeName(), verb(t), kName, nName, nName, verb(t), nName, thresholds.Factorial(t.Num).FirstBad)
	default:
		msg = fmt.Sprintf("falling factorial of %s factors in %s %s: when its factors run down to 1 it is a factorial, which %s from %d!", kName, t.typeName(), verb(t), verb(t), thresholds.Factorial(t.Num).FirstBad)
	}
	definite := n.Lo > 0 && k.Lo > 0 && n.Lo != math.MinInt64 && !thresholds.FallingFits(t.Num, n.Lo, k.Lo)
	switch {
	case definite:
		msg += fmt.Sprintf("; the product always exceeds %s here", t.Name)
	case !finite(n) && nName != "":
		msg += fmt.Sprintf("; %s is not bounded here", nName)
	case !finite(n):
		msg += "; the largest factor is not bounded here"
	case !finite(k):
		msg += fmt.Sprintf("; %s is not bounded here", kName)
	default:
		msg += fmt.Sprintf("; the largest factor may reach %d and %s may reach %d here", n.Hi, kName, k.Hi)
	}
	return msg, definite
}

// checkRisingLoop reports x·(x+1)·…·(x+n−1) in a float loop. With x
// unknown the analyzer measures against x = 1, the rising factorial that
// equals n!: a larger x breaks sooner, so silence below that point is a
// documented approximation.
func (fc *fnCtx) checkRisingLoop(al *accLoop, t numType) {
	k := fc.endRange(al.count, al.coff)
	if k.IsEmpty() {
		return
	}
	x := int64(1)
	xv, xconst := fc.floatConst(al.x)
	if xconst && xv == math.Trunc(xv) && math.Abs(xv) < 1<<53 {
		x = int64(xv)
	}
	first := thresholds.RisingFirstBad(t.Num, x)
	if bounded(k) && k.Hi < first {
		return
	}
	kName := plus(src(al.count), al.coff)
	vName := kName
	if al.coff == 0 {
		vName = shownName(al.count) // nothing for a literal count
	}
	clause, definite := verdict(vName, k, first)
	// With x unknown, say which x the limit is measured at; a constant x
	// already stands in "from".
	at := ""
	if !xconst {
		at = fmt.Sprintf(" at %s = %d", src(al.x), x)
	}
	msg := fmt.Sprintf("rising factorial of %s factors from %s in %s %s for %s ≥ %d%s%s", kName, src(al.x), t.typeName(), verb(t), kName, first, at, clause)
	m := fc.loopMatch(al, t)
	m.Shape, m.Args, m.Param, m.FirstBad = fixes.ShapeNone, nil, nil, 0
	fc.reportLoop(al, finding{node: al.shape.stmt, cat: catLoop, definite: definite && xconst, msg: msg, match: m})
}

// bounded reports whether iv is non-empty with finite ends.
func bounded(iv ranges.Interval) bool {
	return !iv.IsEmpty() && iv.Lo != math.MinInt64 && iv.Hi != math.MaxInt64
}

// finite reports whether iv is bounded by ends a message can name: an
// end at or near a type limit (k < n gives k ≤ MaxInt64−1 for an
// unbounded n) is a bound of the arithmetic, not of the code.
func finite(iv ranges.Interval) bool {
	return bounded(iv) && !typeLimit(iv.Hi) && !typeLimit(-iv.Lo)
}

// fallingBase returns n when the loop is exactly
// for i := 0; i < k; i++ { p *= n - i }, the form whose product is
// n!/(n-k)! with the arguments as written; otherwise nil.
func (fc *fnCtx) fallingBase(al *accLoop) ast.Expr {
	sh := al.shape
	if sh.step != 1 || sh.first != nil || sh.firstOff != 0 || al.coff != 0 || al.count == nil {
		return nil
	}
	b, ok := fc.stripConv(al.mult).(*ast.BinaryExpr)
	if !ok || b.Op != token.SUB || fc.c.objOf(fc.stripConv(b.Y)) != sh.iv {
		return nil
	}
	if lin, ok := fc.linear(b.X); !ok || lin.coefOf(sh.iv) != 0 {
		return nil
	}
	return b.X
}

// fallingSpan returns n and k when the loop counts up by one from n−k+1
// to n and multiplies by i itself, for i := n - k + 1; i <= n; i++ {
// p *= i }: the other way to write n!/(n−k)!. Otherwise both are nil;
// a span of constant length has no k in the source to hand over.
func (fc *fnCtx) fallingSpan(al *accLoop) (ast.Expr, ast.Expr) {
	sh := al.shape
	if sh.step != 1 || sh.first == nil || sh.last == nil || al.top == nil || al.topOff != 0 || al.count == nil || al.coff != 0 {
		return nil, nil
	}
	if fc.c.objOf(fc.stripConv(al.mult)) != sh.iv {
		return nil, nil
	}
	return al.top, al.count
}

// fallingTop returns the expression that names a falling factorial's
// largest factor: n of "p *= n - i" counting i up from 0, or the end n of
// a loop "for i := n - k + 1; i <= n; i++ { p *= i }". It is nil when no
// single expression does.
func (fc *fnCtx) fallingTop(al *accLoop) ast.Expr {
	if n := fc.fallingBase(al); n != nil {
		return n
	}
	if al.top != nil && al.topOff == 0 {
		return al.top
	}
	return nil
}
