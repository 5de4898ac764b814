package analyzer

import (
	"go/ast"
	"go/token"
	"go/types"

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
	if fact == nil {
		fact = own.binomialRecursionFunc(decl, obj, res)
	}
	if fact == nil && loops {
		fact = own.modelBinomialFunc(decl, res)
	}
	if fact == nil {
		return
	}
	if fact.Form == "" && res.Signed && !res.Float && own.zeroOutside(decl, fact) {
		fact.Form = binomialZero
	}
	c.funcs[obj] = &facFunc{obj: obj, decl: decl, kind: kindBinomial, param: fact.Param, param2: fact.Param2, result: res, fact: *fact}
	c.pass.ExportObjectFact(obj, fact)
}

// The forms of a binomial function (FactorialFact.Form).
const (
	binomialLoop       = "loop"
	binomialFactorials = "factorials"
	binomialZero       = "zero"
)

// binomialForms are the forms as the fixer names them.
var binomialForms = map[string]fixes.BinomialForm{
	binomialLoop: fixes.FormLoop, binomialFactorials: fixes.FormFactorials, binomialZero: fixes.FormZero,
}

// zeroOutside reports whether decl, a binomial function of fact's n and
// k, first of all returns 0 wherever k < 0 or k > n:
//
//	if k < 0 || k > n {
//		return 0
//	}
//
// in either order, with either comparison written either way round.
// Then it computes C(n, k) only for 0 ≤ k ≤ n and is 0 everywhere else
// (FactorialFact.Form "zero").
func (fc *fnCtx) zeroOutside(decl *ast.FuncDecl, fact *FactorialFact) bool {
	if decl.Body == nil || len(decl.Body.List) == 0 {
		return false
	}
	ifs, ok := decl.Body.List[0].(*ast.IfStmt)
	if !ok || ifs.Init != nil || ifs.Else != nil || len(ifs.Body.List) != 1 {
		return false
	}
	ret, ok := ifs.Body.List[0].(*ast.ReturnStmt)
	if !ok || len(ret.Results) != 1 {
		return false
	}
	if v, ok := fc.intConst(ret.Results[0]); !ok || v != 0 {
		return false
	}
	or, ok := ast.Unparen(ifs.Cond).(*ast.BinaryExpr)
	if !ok || or.Op != token.LOR {
		return false
	}
	// less returns x, y of x < y (y > x read the other way round).
	less := func(e ast.Expr) (x, y ast.Expr, ok bool) {
		cmp, ok := ast.Unparen(e).(*ast.BinaryExpr)
		switch {
		case !ok:
			return nil, nil, false
		case cmp.Op == token.LSS:
			return cmp.X, cmp.Y, true
		case cmp.Op == token.GTR:
			return cmp.Y, cmp.X, true
		}
		return nil, nil, false
	}
	param := func(e ast.Expr) int { return fc.c.paramIndex(decl, fc.c.objOf(e)) }
	negK, kAboveN := false, false
	for _, side := range []ast.Expr{or.X, or.Y} {
		x, y, ok := less(side)
		if !ok {
			return false
		}
		if v, ok := fc.intConst(y); ok && v == 0 && param(x) == fact.Param2 {
			negK = true
		} else if param(x) == fact.Param && param(y) == fact.Param2 {
			kAboveN = true
		}
	}
	return negK && kAboveN
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
		if !u.t.Float && u.t.Signed && len(decl.Body.List) == 1 && decl.Body.List[0] == ret && emptyBelowAll(append([]factor{u}, p.den...)) {
			fact.Form = binomialFactorials
		}
		if _, _, _, broken := fc.brokenFactor(p.num); !broken {
			fact.Safe = true
			r := fc.rangeOf(u.arg)
			fact.Lo, fact.Hi = r.Lo, r.Hi
		}
		return false
	})
	return fact
}

// binomialRecursionFunc matches an integer function whose returns are
// the multiplicative recursion f(n-1, k-1) * n / k (checkBinomialRecursion)
// and constants 0 or 1, its base cases: C(n, k) for 0 ≤ k ≤ n. Its
// products are the binomial loop's, so it breaks where that loop does.
func (fc *fnCtx) binomialRecursionFunc(decl *ast.FuncDecl, self *types.Func, res numType) *FactorialFact {
	if res.Float {
		return nil // the value model reads a float recursion
	}
	var fact *FactorialFact
	for _, ret := range fc.returnsOutsideClosures() {
		if len(ret.Results) != 1 {
			return nil
		}
		if v, ok := fc.c.queries().intConst(fc.stripConv(ret.Results[0])); ok && (v == 0 || v == 1) {
			continue
		}
		quo, ok := fc.stripConv(ret.Results[0]).(*ast.BinaryExpr)
		if !ok || quo.Op != token.QUO || fact != nil {
			return nil
		}
		mul, ok := ast.Unparen(quo.X).(*ast.BinaryExpr)
		if !ok || mul.Op != token.MUL {
			return nil
		}
		nExpr, idx, j, ok := fc.binomialRecursion(decl, self, mul, quo)
		if !ok {
			return nil
		}
		fact = &FactorialFact{Kind: kindNames[kindBinomial], Param: idx, Param2: j, FirstBad: thresholds.CentralBinomialLoop(res.Num).FirstBad}
		if n, k := fc.rangeOf(nExpr), fc.rangeOf(fc.stripConv(quo.Y)); fc.binomialLoopSafe(res, n, k) {
			fact.Safe, fact.Lo, fact.Hi = true, n.Lo, n.Hi
		}
	}
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
		nExpr, _ := fc.binomialN(al)
		if nExpr == nil {
			return
		}
		nIdx := fc.c.paramIndex(decl, fc.c.objOf(nExpr))
		kIdx := fc.c.paramIndex(decl, fc.c.objOf(al.count))
		if nIdx < 0 || kIdx < 0 || res.Float {
			return
		}
		fact = &FactorialFact{Kind: kindNames[kindBinomial], Param: nIdx, Param2: kIdx, FirstBad: thresholds.CentralBinomialLoop(res.Num).FirstBad}
		if res.Signed && al.coff == 0 && fc.isOne(initOf(al.accInit)) && fc.onlyLoop(decl.Body, al) {
			fact.Form = binomialLoop
		}
		n := fc.rangeOf(nExpr)
		k := fc.endRange(al.count, al.coff)
		if fc.binomialLoopSafe(res, n, k) {
			fact.Safe, fact.Lo, fact.Hi = true, n.Lo, n.Hi
		}
	})
	return fact
}

// onlyLoop reports whether body is the loop's accumulator set to its
// start, the loop and the accumulator returned, and nothing else: no
// statement that returns another value or changes a parameter first, so
// that the loop's value is the function's for every input.
func (fc *fnCtx) onlyLoop(body *ast.BlockStmt, al *accLoop) bool {
	if len(body.List) != 3 || body.List[0] != al.accInit || body.List[1] != al.shape.stmt {
		return false
	}
	ret, ok := body.List[2].(*ast.ReturnStmt)
	return ok && len(ret.Results) == 1 && fc.c.objOf(ret.Results[0]) == al.acc
}

// intBinomials returns the calls in a float match's node of binomial
// functions whose form is known (FactorialFact.Form), for the fixer's
// expression kept as written (fixes.Match.IntBinomials).
func (fc *fnCtx) intBinomials(m *fixes.Match) map[*ast.CallExpr]fixes.IntBinomial {
	if m.Node == nil || m.Result == nil {
		return nil
	}
	if b, ok := m.Result.Underlying().(*types.Basic); !ok || b.Info()&types.IsFloat == 0 {
		return nil
	}
	var out map[*ast.CallExpr]fixes.IntBinomial
	ast.Inspect(m.Node, func(n ast.Node) bool {
		call, ok := n.(*ast.CallExpr)
		if !ok {
			return true
		}
		fact := fc.c.factOf(fc.c.calleeOf(call))
		if fact == nil || kindOfName(fact.Kind) != kindBinomial || max(fact.Param, fact.Param2) >= len(call.Args) || fact.Param2 < 0 {
			return true
		}
		form, known := binomialForms[fact.Form]
		if !known {
			return true
		}
		if out == nil {
			out = make(map[*ast.CallExpr]fixes.IntBinomial)
		}
		out[call] = fixes.IntBinomial{N: call.Args[fact.Param], K: call.Args[fact.Param2], Form: form}
		return true
	})
	return out
}
