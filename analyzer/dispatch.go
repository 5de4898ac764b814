package analyzer

import (
	"go/ast"
	"go/token"
)

// What runs for each function that the prefilter passed: its loops go to
// the loop categories, its recursion to factorial-recursion, its products
// and ratios (checkProduct) and the calls no product consumed (checkCall)
// to the category that matches their shape, then the value model.

// checkFunc reports the findings of one function.
func (c *checker) checkFunc(n ast.Node, s scan) {
	if testHook != nil {
		testHook(n)
	}
	fc := c.ctx(n)
	body := funcBody(n)
	if s.worthLoops() {
		fc.eachLoop(body, fc.noteLoop)
		fc.checkTableFills()
	}
	if d, ok := n.(*ast.FuncDecl); ok && s.callMul {
		if ff := c.funcs[c.declObj(d)]; ff != nil && ff.rec != nil {
			fc.checkRecursion(ff)
		} else if ff == nil || ff.kind == kindBinomial {
			// A binomial recursion is a binomial function too
			// (binomialRecursionFunc).
			fc.checkBinomialRecursion(d)
		}
	}
	if d, ok := n.(*ast.FuncDecl); ok && s.sumCalls {
		fc.checkPascalRecursion(d)
	}
	if s.sumTable {
		fc.checkPascalTables(body)
		fc.checkCountTables(body)
		fc.checkPascalRows(body)
	}
	if s.loop && s.pairStep {
		fc.checkPairRecurrences(body)
	}
	if !s.worthProducts() {
		return
	}
	if s.knownCall || peekState(fc, powerLoopsKey) != nil {
		fc.checkExprs(body)
	}
	model := fc.modelOnce()
	if s.worthLoops() || s.knownCall {
		fc.checkModel(model)
	}
	if s.knownCall {
		fc.checkModelCalls(model)
	}
	if s.logCall {
		fc.checkLgammaSign()
	}
	if s.logCall || s.knownCall {
		fc.checkStirling(model)
	}
	if s.knownCall {
		fc.checkLogGamma()
		fc.checkLogOfValue()
		fc.checkLogOfModelValue(model)
	}
}

// noteLoop reports a product loop, or records a power loop for the
// products that use its result.
func (fc *fnCtx) noteLoop(al *accLoop) {
	if al.kind == kindPower {
		fc.notePowerLoop(al)
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

// checkCall judges a call that no product consumed: a conversion that
// comes after the factorial has broken (late-conversion), math.Gamma
// (gamma-overflow) or a factorial call (factorial-call).
func (fc *fnCtx) checkCall(call *ast.CallExpr) {
	switch {
	case fc.c.consumed[call]:
	case len(call.Args) == 1 && fc.isConversion(call):
		fc.checkConversion(call)
	case fc.c.isMathFunc(call, "Gamma") && len(call.Args) == 1:
		fc.checkGamma(call)
	default:
		fc.checkFactorialCall(call)
	}
}

// checkExprs judges the products and ratios of known factors in body,
// then the factorial calls, conversions and Gamma calls that no product
// consumed. One product is one root cause: the factors of a ratio are
// not reported again on their own.
func (fc *fnCtx) checkExprs(body *ast.BlockStmt) {
	var roots []*ast.BinaryExpr
	var calls []*ast.CallExpr
	var blocks [][]ast.Stmt
	inner := make(map[ast.Expr]bool)
	ast.Inspect(body, func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.FuncLit:
			return false
		case *ast.BlockStmt:
			blocks = append(blocks, n.List)
		case *ast.CaseClause:
			blocks = append(blocks, n.Body)
		case *ast.BinaryExpr:
			if n.Op == token.MUL || n.Op == token.QUO {
				roots = append(roots, n)
				for _, x := range []ast.Expr{n.X, n.Y} {
					if b, ok := fc.stripConv(x).(*ast.BinaryExpr); ok && (b.Op == token.MUL || b.Op == token.QUO) {
						inner[b] = true
					}
				}
			}
		case *ast.CallExpr:
			calls = append(calls, n)
		}
		return true
	})
	type rooted struct {
		e *ast.BinaryExpr
		p *product
	}
	var prods []rooted
	for _, r := range roots {
		if !inner[r] {
			prods = append(prods, rooted{r, fc.evalProduct(r)})
		}
	}
	for _, r := range prods {
		if !fc.isInlined(r.e) {
			fc.checkProduct(r.e, r.p)
		}
	}
	for _, list := range blocks {
		fc.checkChains(list)
	}
	for _, call := range calls {
		fc.checkCall(call)
	}
}

// checkProduct dispatches a product to the pattern its factors form. A
// product with operands the analyzer does not know is judged at the
// sub-expression that holds its factors alone, when the syntax groups
// one: that is the expression a shape describes and a fix replaces.
func (fc *fnCtx) checkProduct(root ast.Expr, p *product) {
	if sub, sp := fc.exactPart(root, p); sub != nil && !fc.rootedChain(root) {
		root, p = sub, sp
	}
	var facNum, facDen, gamma, powNum, binNum, binDen int
	for _, f := range p.num {
		switch {
		case f.kind == kindBinomial:
			binNum++
		case f.kind != kindNone:
			facNum++
		case f.math == "Gamma":
			gamma++
		case f.math == "Pow":
			powNum++
		}
	}
	gammaNum := gamma
	for _, f := range p.den {
		switch {
		case f.kind == kindBinomial:
			binDen++
		case f.kind != kindNone:
			facDen++
		case f.math == "Gamma":
			gamma++
		}
	}
	switch {
	case gammaNum >= 1 && gamma > gammaNum:
		fc.consume(p)
		fc.checkGammaRatio(root, p)
	case powNum >= 1 && facDen == 1 && facNum == 0:
		fc.consume(p)
		fc.checkPowOverFactorial(root, p)
	case powNum >= 1 && facDen >= 2 && facNum == 0 && binDen == 0:
		fc.consume(p)
		fc.checkPowOverFactorials(root, p)
	case binNum == 2 && binDen == 1 && facNum == 0 && facDen == 0:
		fc.consume(p)
		fc.checkHypergeometric(root, p)
	case binNum == 1 && binDen == 0 && powNum == 2 && facNum == 0 && facDen == 0:
		fc.consume(p)
		fc.checkBinomialPMF(root, p)
	case facNum >= 1 && (facDen >= 1 || facNum >= 2 || powNum >= 1 && fc.underSqrt(root)):
		// A power times a factorial fits where its true value does; under
		// a square root (1/√(2^n·n!·√π)) the root the code keeps fits
		// where the product it forms first does not.
		fc.consume(p)
		fc.checkFactorialRatio(root, p)
	}
}

// consume marks the calls of a judged product.
func (fc *fnCtx) consume(p *product) {
	for _, list := range [][]factor{p.num, p.den} {
		for _, f := range list {
			fc.c.consumed[f.call] = true
		}
	}
}

// judged reports whether a call of p is already part of a judged
// product.
func (fc *fnCtx) judged(p *product) bool {
	for _, list := range [][]factor{p.num, p.den} {
		for _, f := range list {
			if f.call != nil && fc.c.consumed[f.call] {
				return true
			}
		}
	}
	return false
}

// checkChains judges values built by simple re-assignments in one block,
// r := fact(n); r /= fact(k); r /= fact(n-k), as the product they form.
// The finding is placed at the last re-assignment and has no fix, as no
// single expression holds the value.
func (fc *fnCtx) checkChains(list []ast.Stmt) {
	for i, st := range list {
		init, ok := st.(*ast.AssignStmt)
		if !ok || len(init.Lhs) != 1 || len(init.Rhs) != 1 || (init.Tok != token.DEFINE && init.Tok != token.ASSIGN) {
			continue
		}
		v := fc.c.objOf(init.Lhs[0])
		if v == nil {
			continue
		}
		var chain []*ast.AssignStmt
		for _, next := range list[i+1:] {
			as, ok := next.(*ast.AssignStmt)
			if ok && len(as.Lhs) == 1 && fc.c.objOf(as.Lhs[0]) == v && (as.Tok == token.MUL_ASSIGN || as.Tok == token.QUO_ASSIGN) {
				chain = append(chain, as)
			}
		}
		// Every change of v must be the start or a link of the chain:
		// collectDefs notes a start once and each link twice.
		if len(chain) == 0 || len(fc.defsOf(v)) != 1+2*len(chain) {
			continue
		}
		p := fc.evalProduct(init.Rhs[0])
		for _, as := range chain {
			fc.evalInto(p, as.Rhs[0], as.Tok == token.QUO_ASSIGN, 1)
		}
		if fc.judged(p) {
			// A link such as w *= Γ(c)/Γ(b) was already judged as a
			// product of its own: one finding per root cause.
			continue
		}
		p.chained = true
		if consecutive(list[i+1:], chain) {
			p.chainStart = init.Rhs[0]
			for _, as := range chain {
				p.chainLinks = append(p.chainLinks, as)
			}
		}
		fc.checkProduct(chain[len(chain)-1].Lhs[0], p)
	}
}

// consecutive reports whether the chain's links are the first statements
// of rest, in order: nothing reads the value between its start and its
// last link.
func consecutive(rest []ast.Stmt, chain []*ast.AssignStmt) bool {
	if len(chain) > len(rest) {
		return false
	}
	for i, as := range chain {
		if rest[i] != ast.Stmt(as) {
			return false
		}
	}
	return true
}
