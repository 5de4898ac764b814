package analyzer

import (
	"go/ast"

	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/fixes"
)

// findBinomialFunc decides whether decl returns C(n, k) of two of its
// parameters, as a ratio of factorial calls or by a multiplicative loop,
// and if so exports the fact; calls of it then form hypergeometric
// probabilities. It runs after every factorial function is known.
func (c *checker) findBinomialFunc(decl *ast.FuncDecl, calls, loops bool) {
	obj, res, own := c.numericFunc(decl)
	if own == nil || c.funcs[obj] != nil {
		return
	}
	var fact *FactorialFact
	if calls {
		fact = own.binomialRatioFunc(decl)
	}
	if fact == nil && loops {
		fact = own.binomialLoopFunc(decl, res)
	}
	if fact == nil && loops {
		fact = own.modelBinomialFunc(decl, res)
	}
	if fact == nil {
		return
	}
	c.funcs[obj] = &facFunc{obj: obj, decl: decl, kind: kindBinomial, param: fact.Param, param2: fact.Param2, result: res, fact: *fact}
	c.pass.ExportObjectFact(obj, fact)
}

// binomialRatioFunc matches return n!/(k!(n-k)!) over parameters n, k.
func (fc *fnCtx) binomialRatioFunc(decl *ast.FuncDecl) *FactorialFact {
	var fact *FactorialFact
	ast.Inspect(decl.Body, func(n ast.Node) bool {
		if _, ok := n.(*ast.FuncLit); ok || fact != nil {
			return false
		}
		ret, ok := n.(*ast.ReturnStmt)
		if !ok || len(ret.Results) == 0 {
			return true
		}
		p := fc.evalProduct(ret.Results[0])
		// An unknown operand (2·n!/(k!(n−k)!)) makes it no binomial.
		if len(p.num) != 1 || len(p.den) != 2 || p.num[0].kind != kindFactorial || p.other != 0 {
			return true
		}
		u := p.num[0]
		var k ast.Expr
		var m fixes.Match
		if sh, _ := fc.ratioShape(u, p.den, &m, fc.linear); sh == fixes.ShapeBinomial {
			k = m.Args[1]
		}
		nIdx := fc.c.paramIndex(decl, fc.c.objOf(u.arg))
		kIdx := fc.c.paramIndex(decl, fc.c.objOf(k))
		if k == nil || nIdx < 0 || kIdx < 0 {
			return true
		}
		fact = &FactorialFact{Kind: kindNames[kindBinomial], Param: nIdx, Param2: kIdx, FirstBad: firstBadOf(kindFactorial, u.t) - u.off}
		if _, _, _, broken := fc.brokenFactor(p.num); !broken {
			fact.Safe = true
			r := fc.rangeOf(u.arg)
			fact.Lo, fact.Hi = r.Lo, r.Hi
		}
		return false
	})
	return fact
}

// binomialLoopFunc matches a function returning the accumulator of a
// multiplicative binomial loop over parameters n and k.
func (fc *fnCtx) binomialLoopFunc(decl *ast.FuncDecl, res numType) *FactorialFact {
	var fact *FactorialFact
	fc.eachLoop(decl.Body, func(al *accLoop) {
		if fact != nil || al.div == nil || al.early || al.kind != kindFalling || !fc.returns(decl.Body, al.acc) {
			return
		}
		nExpr := fc.binomialN(al)
		nIdx := fc.c.paramIndex(decl, fc.c.objOf(nExpr))
		kIdx := fc.c.paramIndex(decl, fc.c.objOf(al.count))
		if nIdx < 0 || kIdx < 0 || res.Float {
			return
		}
		fact = &FactorialFact{Kind: kindNames[kindBinomial], Param: nIdx, Param2: kIdx, FirstBad: thresholds.CentralBinomialLoop(res.Num).FirstBad}
		n := fc.rangeOf(nExpr)
		k := fc.endRange(al.count, al.coff)
		if fc.binomialLoopSafe(res, n, k) {
			fact.Safe, fact.Lo, fact.Hi = true, n.Lo, n.Hi
		}
	})
	return fact
}
