package analyzer

import (
	"go/ast"
	"go/token"
	"go/types"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/fixes"
)

// scan is what the syntactic prefilter found in a function body.
type scan struct {
	product   bool // a *= or x = x*y: a product loop may be here
	loop      bool // a for or range statement
	callMul   bool // a multiplication with a call operand: recursion may be here
	knownCall bool // a call of math.Gamma, Pow or Exp or of a factorial-valued function
	localCall bool // a call of a function of this package, which may become factorial-valued
}

// scanAll is the syntactic prefilter. In one walk of the files it
// records for each function (a closure counts on its own) whether it
// multiplies and what it calls; it allocates only per function. Only
// what it finds is analysed further, and the range analysis runs only
// when a finding needs a range.
//
// It walks the syntax itself instead of asking for the shared
// inspector: because the analyzer has facts, the driver runs it on
// every dependency package, and an inspector built there stays alive
// until the whole run ends (docs/patterns.md, "Cost", has the figures).
func (c *checker) scanAll(files []*ast.File) map[ast.Node]*scan {
	out := make(map[ast.Node]*scan)
	var stack []ast.Node
	var cur *scan
	visit := func(n ast.Node) bool {
		if n == nil {
			return false
		}
		for len(stack) > 0 && n.Pos() >= stack[len(stack)-1].End() {
			stack = stack[:len(stack)-1]
			cur = nil
			if len(stack) > 0 {
				cur = out[stack[len(stack)-1]]
			}
		}
		switch n := n.(type) {
		case *ast.FuncDecl, *ast.FuncLit:
			c.allFuncs = append(c.allFuncs, n)
			cur = new(scan)
			out[n] = cur
			stack = append(stack, n)
		case *ast.ForStmt, *ast.RangeStmt:
			if cur != nil {
				cur.loop = true
			}
		case *ast.AssignStmt:
			if cur != nil && (n.Tok == token.MUL_ASSIGN || n.Tok == token.ASSIGN && len(n.Rhs) == 1 && isMulOrQuo(n.Rhs[0])) {
				cur.product = true
			}
		case *ast.BinaryExpr:
			if cur != nil && n.Op == token.MUL && !cur.callMul {
				_, x := unparen(n.X).(*ast.CallExpr)
				_, y := unparen(n.Y).(*ast.CallExpr)
				cur.callMul = x || y
			}
		case *ast.CallExpr:
			if cur == nil {
				return true
			}
			if !cur.knownCall {
				cur.knownCall = c.knownCallee(n)
			}
			if fn := c.calleeOf(n); fn != nil && fn.Pkg() == c.pass.Pkg {
				cur.localCall = true
			}
		}
		return true
	}
	for _, f := range files {
		ast.Inspect(f, visit)
	}
	return out
}

// knownCallee reports whether call calls math.Gamma, math.Pow, math.Exp
// or a function with a factorial fact.
func (c *checker) knownCallee(call *ast.CallExpr) bool {
	fn := c.calleeOf(call)
	if fn == nil {
		return false
	}
	if fn.Pkg() != nil && fn.Pkg().Path() == "math" {
		switch fn.Name() {
		case "Gamma", "Pow", "Exp":
			return true
		}
		return false
	}
	return c.factOf(fn) != nil || c.valueFactOf(fn) != nil
}

// factOf returns the factorial fact of fn, from this package or an
// imported one.
func (c *checker) factOf(fn *types.Func) *FactorialFact {
	if fn == nil {
		return nil
	}
	if ff := c.funcs[fn]; ff != nil {
		return &ff.fact
	}
	if fn.Pkg() == c.pass.Pkg {
		return nil
	}
	f := new(FactorialFact)
	if c.pass.ImportObjectFact(fn, f) {
		return f
	}
	return nil
}

// checkFunc reports the findings of one function.
func (c *checker) checkFunc(n ast.Node, s scan) {
	if testHook != nil {
		testHook(n)
	}
	fc := c.ctx(n)
	body := funcBody(n)
	if s.worthLoops() {
		fc.eachLoop(body, fc.noteLoop)
	}
	if d, ok := n.(*ast.FuncDecl); ok && s.callMul {
		if ff := c.funcs[c.declObj(d)]; ff != nil && ff.rec != nil {
			fc.checkRecursion(ff)
		}
	}
	if s.knownCall || fc.powLoops != nil {
		fc.checkExprs(body)
	}
	if s.worthLoops() || s.knownCall {
		fc.checkModel()
	}
	if s.knownCall {
		fc.checkModelCalls()
	}
}

// noteLoop reports a product loop, or records a power loop for the
// products that use its result.
func (fc *fnCtx) noteLoop(al *accLoop) {
	if al.kind == kindPower {
		if fc.powLoops == nil {
			fc.powLoops = make(map[types.Object]*accLoop)
		}
		fc.powLoops[al.acc] = al
		return
	}
	fc.checkAccLoop(al)
}

// checkAccLoop reports a product loop whose product can exceed its type.
func (fc *fnCtx) checkAccLoop(al *accLoop) {
	t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(al.update.(*ast.AssignStmt).Lhs[0]))
	if !ok {
		return
	}
	if al.div != nil {
		fc.checkBinomialLoop(al, t)
		return
	}
	switch al.kind {
	case kindFactorial, kindDouble:
		fc.checkFactorialLoop(al, t)
	case kindFalling:
		fc.checkFallingLoop(al, t)
	case kindRising:
		fc.checkRisingLoop(al, t)
	}
}

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
	r := fc.rangeOf(fc.stripConv(al.mult))
	if r.IsEmpty() || r.Hi < first {
		return
	}
	name := src(al.top)
	top := fc.topRange(al)
	clause, definite := verdict(name, top, first-al.topOff)
	if al.top == nil {
		definite = al.topOff >= first
	}
	msg := factorialLimitText(al.kind, name, al.topOff, t) + clause
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

// checkRecursion reports a recursive factorial whose parameter is not
// bounded below the first value that breaks its result type.
func (fc *fnCtx) checkRecursion(ff *facFunc) {
	// The analysis of this pass has its own ranges; ff.recN is the same
	// node in both, so asking for its range here is sound.
	if fc.decidedAtCalls(ff.rec) {
		return
	}
	first := firstBadOf(ff.kind, ff.result)
	r := fc.rangeOf(ff.recN)
	if r.IsEmpty() || r.Hi < first {
		return
	}
	name := src(ff.recN)
	clause, definite := verdict(name, r, first)
	shape := fixes.ShapeFactorial
	if ff.kind != kindFactorial && ff.kind != kindDouble {
		shape = fixes.ShapeNone
	}
	fc.report(finding{
		node:     ff.rec,
		cat:      catRecursion,
		definite: definite,
		msg:      "recursive " + factorialLimitText(ff.kind, name, 0, ff.result) + clause,
		match: &fixes.Match{
			Shape:    shape,
			Node:     ff.rec,
			Args:     []ast.Expr{ff.recN},
			Result:   ff.obj.Type().(*types.Signature).Results().At(0).Type(),
			Func:     ff.decl,
			Param:    fc.c.objOf(ff.recN),
			FirstBad: first,
		},
	})
}

func isMulOrQuo(e ast.Expr) bool {
	b, ok := unparen(e).(*ast.BinaryExpr)
	return ok && (b.Op == token.MUL || b.Op == token.QUO)
}

// worthLoops reports whether a function may hold a product loop.
func (s *scan) worthLoops() bool { return s.loop && s.product }

// worth reports whether a function may hold anything to report.
func (s *scan) worth() bool { return s.worthLoops() || s.callMul || s.knownCall }

// decidedAtCalls reports whether n is the product loop or the recursion
// of this function's factorial, and every call of the function in the
// package is either safe or certainly past its first bad value: the
// calls past it are the findings (fact(25)), one each, and a finding at
// the definition would only repeat them with a range the calls gave it.
func (fc *fnCtx) decidedAtCalls(n ast.Node) bool {
	d, ok := fc.node.(*ast.FuncDecl)
	if !ok {
		return false
	}
	ff := fc.c.funcs[fc.c.declObj(d)]
	if ff == nil || !fc.c.sitesDecided[ff.obj] {
		return false
	}
	return ff.rec == n || ff.loop != nil && ff.loop.shape.stmt == n
}
