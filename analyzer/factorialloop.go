package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"math"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/fixes"
	"github.com/overfact/overfact/internal/assigned"
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
	if al.kind != kindFactorial && al.kind != kindDouble || !fc.returnsProduct(al) || !fc.entryGuardExact(al, t) || !t.Float && !fc.productReturned(al) {
		if st := fc.seriesTermMatch(al); st != nil {
			return st
		}
		if pm := fc.productReadMatch(al); pm != nil {
			return pm
		}
		m.Shape = fixes.ShapeNone
	}
	if al.top != nil {
		m.Args = []ast.Expr{al.top}
		m.Param = fc.c.objOf(al.top)
		m.FirstBad = firstBadOf(al.kind, t) - al.topOff
		if m.Shape == fixes.ShapeNone && (al.kind == kindFactorial || al.kind == kindDouble) {
			fc.loopGuard(m, al, t, al.top, m.FirstBad)
		}
		if m.Shape == fixes.ShapeFactorial && al.shape.whileLike && m.Param == al.shape.iv &&
			!assigned.Before(fc.c.pass.TypesInfo, funcBody(fc.node), m.Param, al.shape.stmt.Pos()) {
			// The loop counts the parameter itself down from the value
			// it was called with (for n > 1 { f *= n; n-- }): the guard
			// at the entry tests the loop's first factor, although the
			// loop assigns the parameter.
			m.EntryGuard = true
		}
	}
	return m
}

// productReadMatch is the match of a float64 factorial loop whose
// product is read after the loop as a factor of a larger product, or of
// a square root of one, 1/math.Sqrt(math.Pow(2, n)*f*math.Sqrt(math.Pi)):
// n! may leave float64 where that product, or its root, does not. The
// fix carries the accumulator as a Product (ShapeLogSpaceTerm), which
// forms the same float64 values step by step and keeps the logarithm
// beside them; the fixer checks that the variable can be carried. nil
// where no read after the loop is such a factor.
func (fc *fnCtx) productReadMatch(al *accLoop) *fixes.Match {
	info := fc.c.pass.TypesInfo
	body := funcBody(fc.node)
	if al.kind != kindFactorial || al.accInit == nil || body == nil {
		return nil
	}
	if t, ok := info.TypeOf(al.update.(*ast.AssignStmt).Lhs[0]).Underlying().(*types.Basic); !ok || t.Kind() != types.Float64 {
		return nil
	}
	var m *fixes.Match
	ast.Inspect(body, func(n ast.Node) bool {
		id, ok := n.(*ast.Ident)
		if m != nil || !ok || id.Pos() < al.shape.stmt.End() || info.Uses[id] != al.acc {
			return m == nil
		}
		if root := fc.productOrRootOf(id); root != id {
			m = &fixes.Match{Shape: fixes.ShapeLogSpaceTerm, Node: root, Args: []ast.Expr{id}, Result: info.TypeOf(root), Func: fc.node}
		}
		return false
	})
	return m
}

// productOrRootOf is productRoot that climbs through math.Sqrt calls too.
func (fc *fnCtx) productOrRootOf(e ast.Expr) ast.Expr {
	for {
		top := fc.productRoot(e)
		call, ok := fc.parentMap()[top].(*ast.CallExpr)
		if !ok || len(call.Args) != 1 || !fc.c.isMathFunc(call, "Sqrt") {
			return top
		}
		e = call
	}
}

// loopGuard makes m a range guard before the loop (ShapeLoopGuard) when
// the loop's product decides the function's integer result and the
// parameter v, named by param, decides the product: the loop's product
// leaves t exactly when the loop starts with v ≥ first, and the
// function then returns that product times a positive constant, which
// leaves t too. The guard then panics only where the function would
// return a wrapped value, and everywhere it would. A float result is
// left alone: +Inf may still serve a caller.
func (fc *fnCtx) loopGuard(m *fixes.Match, al *accLoop, t numType, param ast.Expr, first int64) {
	id, ok := ast.Unparen(param).(*ast.Ident)
	sig := fc.signature()
	if t.Float || !ok || sig == nil || first <= 0 || first == math.MaxInt64 || !isParam(sig, fc.c.objOf(id)) || !fc.productReturned(al) {
		return
	}
	p := fc.c.objOf(id)
	m.Shape, m.Args, m.Param, m.FirstBad = fixes.ShapeLoopGuard, []ast.Expr{id}, p, first
	if assigned.Before(fc.c.pass.TypesInfo, funcBody(fc.node), p, al.shape.stmt.Pos()) {
		// A guard before the loop would name the assigned value: test
		// the caller's at the entry where that is exact, or nowhere.
		m.Shape, m.EntryGuard = fixes.ShapeNone, false
		if fc.entryGuardHolds(p, al.shape.stmt, first) {
			m.Shape, m.EntryGuard = fixes.ShapeFactorial, true
		}
	}
}

// productReturned reports whether every return that can follow the loop
// returns its product times a positive integer constant (p, p * 2): the
// loop runs at most once per call (no loop or closure around it, no
// goto), runs to its end (no early exit), starts its accumulator at 1 or
// more, and nothing after it changes the accumulator.
func (fc *fnCtx) productReturned(al *accLoop) bool {
	d, ok := fc.node.(*ast.FuncDecl)
	loop := al.shape.stmt
	if !ok || d.Body == nil || al.early || al.div != nil {
		return false
	}
	if iv := fc.entryRange(al.acc, loop); iv.IsEmpty() || iv.Lo < 1 {
		return false
	}
	info := fc.c.pass.TypesInfo
	if !fc.oncePerCall(loop) || assigned.In(info, d.Body, al.acc, func(n ast.Node) bool { return n.End() <= loop.End() }) {
		return false
	}
	returned, others := 0, false
	ast.Inspect(d.Body, func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.FuncLit:
			// A closure (a deferred one included) may change the
			// product after the loop.
			others = others || mentions(fc.c.pass.TypesInfo, n, al.acc)
			return false
		case *ast.UnaryExpr:
			others = others || n.Op == token.AND && fc.c.objOf(n.X) == al.acc
		case *ast.BranchStmt:
			others = others || n.Tok == token.GOTO
		case *ast.ReturnStmt:
			if n.Pos() < loop.Pos() {
				return false // before the loop: the guard is not reached there
			}
			if n.Pos() < loop.End() {
				others = true
				return false
			}
			if len(n.Results) == 1 && fc.accTimesConst(n.Results[0], al.acc) {
				returned++
			} else {
				others = true
			}
		}
		return !others
	})
	return returned > 0 && !others
}

// entryGuardExact reports whether a guard at the function's entry on
// the loop's top parameter fires only where the loop runs: the loop is a
// statement of the function's body itself (not inside a condition,
// another loop or a closure), and no return before it can run with the
// parameter at its first bad value or above. Otherwise the guard goes
// before the loop (loopGuard), or nowhere.
func (fc *fnCtx) entryGuardExact(al *accLoop, t numType) bool {
	body, loop := funcBody(fc.node), al.shape.stmt
	p := fc.c.objOf(al.top)
	if body == nil || p == nil {
		return false
	}
	top := false
	for _, s := range body.List {
		top = top || s == loop
	}
	first := firstBadOf(al.kind, t) - al.topOff
	ast.Inspect(body, func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.FuncLit:
			return false
		case *ast.ReturnStmt:
			if iv := fc.entryRange(p, n); n.Pos() < loop.Pos() && !iv.IsEmpty() && iv.Hi >= first {
				top = false
			}
		}
		return top && n != nil && n.Pos() < loop.Pos()
	})
	return top
}

// oncePerCall reports whether the loop statement lies in no other loop
// and no closure of its function, so that it starts once per call at
// most.
func (fc *fnCtx) oncePerCall(loop ast.Stmt) bool {
	once := true
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		if n == nil || n == loop || !once || n.Pos() > loop.Pos() || n.End() < loop.End() {
			return false
		}
		switch n.(type) {
		case *ast.ForStmt, *ast.RangeStmt, *ast.FuncLit:
			once = false
		}
		return once
	})
	return once
}

// accTimesConst reports whether e is acc, or acc times an integer
// constant of at least 1, in any order and parentheses.
func (fc *fnCtx) accTimesConst(e ast.Expr, acc types.Object) bool {
	return fc.timesConst(e, func(x ast.Expr) bool {
		id, ok := x.(*ast.Ident)
		return ok && fc.c.objOf(id) == acc
	})
}

// timesConst reports whether e is a value that is accepts, or one times an
// integer constant of at least 1, in any order and parentheses: a value
// that leaves an integer type wherever the accepted one does.
func (fc *fnCtx) timesConst(e ast.Expr, is func(ast.Expr) bool) bool {
	e = ast.Unparen(e)
	if is(e) {
		return true
	}
	b, ok := e.(*ast.BinaryExpr)
	if !ok || b.Op != token.MUL {
		return false
	}
	if c, ok := fc.intConst(b.Y); ok && c >= 1 {
		return fc.timesConst(b.X, is)
	}
	if c, ok := fc.intConst(b.X); ok && c >= 1 {
		return fc.timesConst(b.Y, is)
	}
	return false
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
	if al.from != nil {
		fc.checkRangeProduct(al, t)
		return
	}
	if al.span != nil {
		// Only the joint reading applies: no expression counts the
		// factors for the bounds of the top and the count to judge.
		if msg, definite, _ := fc.fallingAffine(al, t); msg != "" {
			fc.reportLoop(al, finding{node: al.shape.stmt, cat: catLoop, definite: definite, msg: msg, match: fc.fallingGuard(al, t)})
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
	if !t.Float && !fc.productReturned(al) {
		// The integer helper panics where the product leaves t, but a
		// product divided or reduced afterwards (n!/(n−k)! over k!, a
		// binomial) may give a result that fits: leave it as written,
		// unless it is divided by k! itself, which makes C(n, k).
		q, kept := fc.loopQuotient(al)
		if kept {
			// The fix of the quotient left it as written only outside
			// 0 ≤ k ≤ n, by an allow directive: nothing else reads the
			// product, and the value model leaves the loop alone too.
			stateOf(fc, keptLoopsKey).add(al.shape.stmt)
			return
		}
		if q != nil {
			m = q
		}
	} else if n := fc.fallingBase(al); n != nil {
		m.Shape, m.Args = fixes.ShapeFallingLoop, []ast.Expr{n, al.count}
	} else if n, k := fc.fallingSpan(al); n != nil {
		m.Shape, m.Args = fixes.ShapeFallingLoop, []ast.Expr{n, k}
	} else if judged {
		m = fc.fallingGuard(al, t)
	}
	fc.noteCountSign(m)
	fc.reportLoop(al, finding{node: al.shape.stmt, cat: catLoop, definite: definite, msg: msg, match: m})
}

// checkRangeProduct reports lo·(lo+1)·…·hi formed by a loop whose ends
// are variables of their own, for v := lo; v <= hi; v++ { p *= v }:
// where lo can be 1 or 2 the product is hi!, so it breaks from the
// factorial's first bad hi on. A smallest factor that cannot be 1 or 2
// leaves it alone: above, no count bounds the product; below, a factor
// is 0 or every factor negative.
func (fc *fnCtx) checkRangeProduct(al *accLoop, t numType) {
	lo := shift(fc.rangeOf(al.from), al.fromOff)
	hi := shift(fc.rangeOf(al.top), al.topOff)
	first := thresholds.Factorial(t.Num).FirstBad
	if lo.IsEmpty() || hi.IsEmpty() || lo.Lo > 2 || lo.Hi < 1 || hi.Hi < first {
		return
	}
	clause, definite := verdict(shownName(al.top), fc.topRange(al), first-al.topOff)
	definite = definite && lo.Hi <= 2 && lo.Lo >= 1
	loName, hiName := plus(src(al.from), al.fromOff), plus(src(al.top), al.topOff)
	msg := fmt.Sprintf("product of the factors from %s up to %s in %s %s: with %s at 1 or 2 it is %s!, which %s for %s ≥ %d%s",
		loName, hiName, t.typeName(), verb(t), loName, hiName, verb(t), hiName, first, clause)
	fc.reportLoop(al, finding{node: al.shape.stmt, cat: catLoop, definite: definite, msg: msg, match: fc.bareLoopMatch(al, t)})
}

// fallingAffine judges a falling factorial whose largest factor and
// number of factors are both affine in one variable v, as in
// for k := n + 1; k <= 2*n; k++ { p *= k }: the two grow together, so
// the first bad input is that of their joint product, (2n)!/n! first
// wraps int64 at n = 15, and neither bound alone names it. It returns
// the message (empty when the loop fits), whether the overflow is
// certain, and false when the loop is not of this form.
func (fc *fnCtx) fallingAffine(al *accLoop, t numType) (string, bool, bool) {
	id, first, ok := fc.fallingAffineLimit(al, t)
	if !ok {
		return "", false, false
	}
	v := fc.c.objOf(id)
	top, _ := fc.linear(al.top)
	cnt, _ := fc.fallingCount(al)
	a, b := top.Terms[0].K, top.C+al.topOff
	c, d := cnt.Terms[0].K, cnt.C
	start := thresholds.FallingAffineStart(a, b, c, d)
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

// fallingGuard is the match of a falling-factorial loop with no rewrite
// of its own: a range guard where one variable decides the product
// (fallingAffineLimit).
func (fc *fnCtx) fallingGuard(al *accLoop, t numType) *fixes.Match {
	m := fc.bareLoopMatch(al, t)
	if id, first, ok := fc.fallingAffineLimit(al, t); ok {
		fc.loopGuard(m, al, t, id, first)
	}
	return m
}

// fallingCount is the number of factors of a falling-factorial loop as
// a linear form.
func (fc *fnCtx) fallingCount(al *accLoop) (linear, bool) {
	if al.span != nil {
		return *al.span, true
	}
	if al.count == nil {
		return linear{}, false
	}
	cnt, ok := fc.linear(al.count)
	cnt.C += al.coff
	return cnt, ok
}

// fallingAffineLimit reads a falling factorial whose largest factor and
// number of factors are both affine in one variable v (see
// fallingAffine): the identifier naming v in the top, and the first v
// whose product does not fit t; false when the loop is not of this form.
func (fc *fnCtx) fallingAffineLimit(al *accLoop, t numType) (*ast.Ident, int64, bool) {
	if al.top == nil {
		return nil, 0, false
	}
	top, ok1 := fc.linear(al.top)
	cnt, ok2 := fc.fallingCount(al)
	if !ok1 || !ok2 || len(top.Terms) != 1 || len(cnt.Terms) != 1 || top.Terms[0].Sym.Object != cnt.Terms[0].Sym.Object {
		return nil, 0, false
	}
	v := top.Terms[0].Sym.Object
	a, b := top.Terms[0].K, top.C+al.topOff
	c, d := cnt.Terms[0].K, cnt.C
	first := thresholds.FallingAffineFirstBad(t.Num, a, b, c, d)
	id := identOf(fc.c.pass.TypesInfo, al.top, v)
	if first == math.MaxInt64 || thresholds.FallingAffineStart(a, b, c, d) == math.MaxInt64 || id == nil {
		return nil, 0, false
	}
	return id, first, true
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
	if k.Hi < first {
		// A count of zero or less makes no trips: only its top decides.
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
	m := fc.bareLoopMatch(al, t)
	if xconst && x >= 1 && float64(x) == xv {
		// With x a whole constant the limit is exact, and the product
		// grows with the count from there.
		fc.loopGuard(m, al, t, al.count, first-al.coff)
	}
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

// keptLoops are the loops of a function whose product only a quotient
// read, which an allow directive keeps as written (loopQuotient): they
// get no finding, from the matchers or from the value model (keptLoop).
type keptLoops struct{ set map[ast.Stmt]bool }

var keptLoopsKey = &stateKey[keptLoops]{"loops whose one read a directive keeps"}

func (k *keptLoops) add(s ast.Stmt) {
	if k.set == nil {
		k.set = make(map[ast.Stmt]bool)
	}
	k.set[s] = true
}

// keptLoop reports whether the loop s is one of keptLoops.
func (fc *fnCtx) keptLoop(s ast.Stmt) bool {
	k := peekState(fc, keptLoopsKey)
	return k != nil && k.set[s]
}

// loopQuotient is the match of num / den, where the falling-factorial
// loop al leaves num = n(n−1)…(n−k+1) and a factorial loop of the same
// function leaves den = k!: the quotient is C(n, k) (ShapeLoopQuotient;
// the fixer checks the loops and the flow between them itself). nil
// where there is no such pair. kept tells that the quotient is the one
// read of num and an allow directive keeps it as written, as the fix
// leaves it outside 0 ≤ k ≤ n: no match then.
func (fc *fnCtx) loopQuotient(al *accLoop) (m *fixes.Match, kept bool) {
	n, k := fc.fallingBase(al), al.count
	if n == nil {
		n, k = fc.fallingSpan(al)
	}
	kl, ok := fc.linear(k)
	body := funcBody(fc.node)
	if n == nil || !ok || al.early || al.accInit == nil || body == nil {
		return nil, false
	}
	var den *accLoop
	fc.eachLoop(body, func(o *accLoop) {
		if den != nil || o.acc == al.acc || o.kind != kindFactorial || o.top == nil || o.topOff != 0 || o.early || o.div != nil || o.accInit == nil {
			return
		}
		if tl, ok := fc.linear(o.top); ok && tl.equal(kl) {
			den = o
		}
	})
	if den == nil {
		return nil, false
	}
	var q *ast.BinaryExpr
	count, reads := 0, 0
	ast.Inspect(body, func(x ast.Node) bool {
		if b, ok := x.(*ast.BinaryExpr); ok && b.Op == token.QUO && fc.c.objOf(b.X) == al.acc && fc.c.objOf(b.Y) == den.acc {
			q = b
			count++
		}
		if id, ok := x.(*ast.Ident); ok && fc.c.pass.TypesInfo.Uses[id] == al.acc && (id.Pos() < al.shape.stmt.Pos() || id.Pos() >= al.shape.stmt.End()) {
			reads++
		}
		return true
	})
	if count != 1 {
		return nil, false
	}
	if fi := fc.c.fileOf(q.Pos()); fi == nil || fi.dirs.allowed(fc.c.pass.Fset, q.Pos()) {
		return nil, fi != nil && reads == 1
	}
	return &fixes.Match{
		Shape:   fixes.ShapeLoopQuotient,
		Node:    q,
		Args:    []ast.Expr{n, k},
		Result:  fc.c.pass.TypesInfo.TypeOf(q),
		Acc:     al.acc,
		AccInit: al.accInit,
		Loop:    al.shape.stmt,
		Func:    fc.node,
		Divisor: &fixes.Match{Acc: den.acc, AccInit: den.accInit, Loop: den.shape.stmt},
	}, false
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
	if fc.c.objOf(fc.stripConv(al.mult)) != sh.iv && !fc.neverNegative(al.top) {
		// A factor written off the counter (p *= i + 1 for i from n−k
		// to n−1) is the fixer's to check; over a negative n the
		// falling helpers panic where the loop multiplied negative
		// factors, so only a top that is never negative is handed over.
		return nil, nil
	}
	return al.top, al.count
}

// neverNegative reports whether the integer e is unsigned or never
// negative where it is evaluated.
func (fc *fnCtx) neverNegative(e ast.Expr) bool {
	if b, ok := fc.c.pass.TypesInfo.TypeOf(e).Underlying().(*types.Basic); ok && b.Info()&types.IsUnsigned != 0 {
		return true
	}
	iv := fc.rangeOf(e)
	return !iv.IsEmpty() && iv.Lo >= 0
}

// fallingTop returns the expression that names a falling factorial's
// largest factor: n of "p *= n - i" counting i up from 0, or the end n of
// a loop "for i := n - k + 1; i <= n; i++ { p *= i }". It is nil when no
// single expression does.
func (fc *fnCtx) fallingTop(al *accLoop) ast.Expr {
	if n := fc.fallingBase(al); n != nil {
		return n
	}
	if al.top != nil && al.topOff == 0 && !(al.top == al.mult && fc.readsInduction(al)) {
		return al.top
	}
	// A factor that moves with the loop, g - 1 + i, is no largest factor:
	// no expression of the code names that one.
	return nil
}

// readsInduction reports whether the loop's factor reads its induction
// variable.
func (fc *fnCtx) readsInduction(al *accLoop) bool {
	lin, ok := fc.linear(al.mult)
	return ok && lin.coefOf(al.shape.iv) != 0
}
