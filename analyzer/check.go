package analyzer

import (
	"go/ast"
	"go/token"
	"go/types"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/fixes"
)

// candidate is the syntactic prefilter: only a function with a product
// assignment, a multiplication or division, or a call (which may be of
// math.Gamma or of a factorial function) is worth a range analysis. It
// allocates nothing per node.
func (c *checker) candidate(body *ast.BlockStmt) bool {
	found := false
	ast.Inspect(body, func(n ast.Node) bool {
		if found {
			return false
		}
		switch n := n.(type) {
		case *ast.FuncLit:
			return false // analysed on its own
		case *ast.AssignStmt:
			found = n.Tok == token.MUL_ASSIGN || n.Tok == token.QUO_ASSIGN
		case *ast.BinaryExpr:
			found = n.Op == token.MUL || n.Op == token.QUO
		case *ast.CallExpr:
			fn := c.calleeOf(n)
			found = fn != nil && (fn.Pkg() != nil && fn.Pkg().Path() == "math" && fn.Name() == "Gamma" || c.factOf(fn) != nil)
		}
		return !found
	})
	return found
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
func (c *checker) checkFunc(n ast.Node) {
	if testHook != nil {
		testHook(n)
	}
	fc := c.ctx(n)
	body := funcBody(n)
	fc.eachLoop(body, func(al *accLoop) {
		if al.kind == kindPower {
			if fc.powLoops == nil {
				fc.powLoops = make(map[types.Object]*accLoop)
			}
			fc.powLoops[al.acc] = al
			return
		}
		fc.checkAccLoop(al)
	})
	if d, ok := n.(*ast.FuncDecl); ok {
		if fn, _ := c.pass.TypesInfo.Defs[d.Name].(*types.Func); fn != nil {
			if ff := c.funcs[fn]; ff != nil && ff.rec != nil {
				fc.checkRecursion(ff)
			}
		}
	}
	fc.checkExprs(body)
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
	m := fc.loopMatch(al, t)
	fc.report(finding{
		node:     al.shape.stmt,
		cat:      catLoop,
		definite: definite,
		msg:      factorialLimitText(al.kind, name, al.topOff, t) + clause,
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
	if al.kind != kindFactorial {
		m.Shape = fixes.ShapeNone
	}
	if al.top != nil {
		m.Args = []ast.Expr{al.top}
		m.Param = fc.c.objOf(al.top)
		m.FirstBad = firstBadOf(al.kind, t) - al.topOff
	}
	return m
}

// checkRecursion reports a recursive factorial whose parameter is not
// bounded below the first value that breaks its result type.
func (fc *fnCtx) checkRecursion(ff *facFunc) {
	// The analysis of this pass has its own ranges; ff.recN is the same
	// node in both, so asking for its range here is sound.
	first := firstBadOf(ff.kind, ff.result)
	r := fc.rangeOf(ff.recN)
	if r.IsEmpty() || r.Hi < first {
		return
	}
	name := src(ff.recN)
	clause, definite := verdict(name, r, first)
	shape := fixes.ShapeFactorial
	if ff.kind != kindFactorial {
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
