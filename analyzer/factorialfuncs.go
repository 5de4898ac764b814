package analyzer

import (
	"go/ast"
	"go/types"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/internal/assigned"
)

// Factorial-valued functions (phase 1): a function whose result is a
// factorial of a parameter, by a loop, a recursion or a wrapper, and its
// fact.

// facFunc is a factorial-valued function of this package.
type facFunc struct {
	obj     *types.Func
	decl    *ast.FuncDecl
	kind    facKind
	param   int
	param2  int
	offset  int64
	loop    *accLoop        // the product loop, or nil
	rec     *ast.BinaryExpr // the recursive n*f(n-1), or nil
	recN    ast.Expr        // its n operand
	recCall *ast.CallExpr   // its recursive call, for a falling factorial f(n-1, k-1)
	stored  bool            // the recursion's product is stored (a memo) and then returned
	wrap    ast.Expr        // a wrapper's argument to the factorial it returns
	wrapOff int64           // the largest factor is wrap+wrapOff
	inner   *FactorialFact  // the wrapped factorial function's fact
	prod    ast.Node        // the loop or recursion that forms the product, or nil
	asIs    bool            // a float product that is returned as it is
	result  numType
	fact    FactorialFact
}

// findFactorialFunc decides whether decl returns a factorial of one of
// its parameters, and if so exports the fact.
func (c *checker) findFactorialFunc(decl *ast.FuncDecl) {
	obj, res, own := c.numericFunc(decl)
	if own == nil {
		return
	}
	ff := own.recursionOf(decl, obj)
	if ff == nil {
		ff = own.loopFuncOf(decl, obj)
	}
	if ff == nil {
		ff = own.wrapperOf(decl, obj)
	}
	if ff == nil {
		ff = own.modelFactorialFunc(decl)
	}
	if ff == nil {
		return
	}
	ff.obj, ff.decl, ff.result = obj, decl, res
	switch {
	case ff.loop != nil:
		ff.prod = ff.loop.shape.stmt
	case ff.rec != nil:
		ff.prod = ff.rec
	}
	ff.asIs = res.Float && ff.prod != nil && own.productAsIs(ff)
	ff.fact = FactorialFact{Kind: kindNames[ff.kind], Param: ff.param, Param2: ff.param2, Offset: ff.offset}
	ff.fact.FirstBad = firstBadOf(ff.kind, res) - ff.offset
	key := own.keyRange(ff)
	if !key.IsEmpty() && !key.IsTop() && key.Hi < firstBadOf(ff.kind, res) && ff.kind != kindFalling && ff.kind != kindRising {
		ff.fact.Safe = true
		ff.fact.Lo, ff.fact.Hi = shift(key, -ff.offset).Lo, shift(key, -ff.offset).Hi
	}
	if ff.inner != nil && ff.inner.Safe {
		// A wrapper of a safe function is safe on the same factors.
		ff.fact.Safe = true
		ff.fact.Lo, ff.fact.Hi = addSat(ff.inner.Lo, ff.inner.Offset-ff.offset), addSat(ff.inner.Hi, ff.inner.Offset-ff.offset)
	}
	ff.fact.EmptyBelow = own.emptyBelow(ff)
	ff.fact.Floor = ff.offset == 0 && ff.kind == kindFactorial && own.countsUpToParam(ff)
	c.funcs[obj] = ff
	c.pass.ExportObjectFact(obj, &ff.fact)
}

// firstBadOf returns the first largest factor at which a product of the
// kind stops fitting t.
func firstBadOf(k facKind, t numType) int64 {
	switch k {
	case kindDouble:
		return thresholds.DoubleFactorial(t.Num).FirstBad
	case kindBinomial:
		return thresholds.CentralBinomialRatio(t.Num).FirstBad
	}
	return thresholds.Factorial(t.Num).FirstBad
}

// keyRange is the range of the largest factor where it is multiplied.
func (fc *fnCtx) keyRange(ff *facFunc) ranges.Interval {
	if ff.rec != nil {
		return fc.rangeOf(ff.recN)
	}
	if ff.wrap != nil {
		return shift(fc.rangeOf(ff.wrap), ff.wrapOff)
	}
	return fc.rangeOf(fc.stripConv(ff.loop.mult))
}

// paramObj returns the idx-th parameter of decl, or nil.
func (c *checker) paramObj(decl *ast.FuncDecl, idx int) types.Object {
	var obj types.Object
	eachParam(decl, func(i int, name *ast.Ident) bool {
		if i == idx && name != nil {
			obj = c.pass.TypesInfo.Defs[name]
		}
		return i < idx
	})
	return obj
}

// paramIndex returns the index of the parameter v of decl, or −1.
func (c *checker) paramIndex(decl *ast.FuncDecl, v types.Object) int {
	at := -1
	eachParam(decl, func(i int, name *ast.Ident) bool {
		if v != nil && name != nil && c.pass.TypesInfo.Defs[name] == v {
			at = i
		}
		return at < 0
	})
	return at
}

// eachParam calls f with each parameter's index and name (nil for an
// unnamed one) until f returns false.
func eachParam(decl *ast.FuncDecl, f func(i int, name *ast.Ident) bool) {
	i := 0
	for _, fl := range decl.Type.Params.List {
		if len(fl.Names) == 0 {
			if !f(i, nil) {
				return
			}
			i++
			continue
		}
		for _, name := range fl.Names {
			if !f(i, name) {
				return
			}
			i++
		}
	}
}

// loopFuncOf matches a function that returns the accumulator of a
// product loop whose largest factor is a parameter.
func (fc *fnCtx) loopFuncOf(decl *ast.FuncDecl, self *types.Func) *facFunc {
	var ff *facFunc
	fc.eachLoop(decl.Body, func(al *accLoop) {
		if ff != nil || al.div != nil || al.early || !fc.returns(decl.Body, al.acc) {
			return
		}
		resT := self.Type().(*types.Signature).Results().At(0).Type()
		if !types.Identical(fc.c.pass.TypesInfo.TypeOf(al.update.(*ast.AssignStmt).Lhs[0]), resT) {
			return
		}
		switch al.kind {
		case kindFactorial, kindDouble:
			p := fc.c.objOf(al.top)
			idx := fc.c.paramIndex(decl, p)
			if idx < 0 || assignedOutside(fc.c.pass.TypesInfo, decl.Body, p, al.shape.stmt) {
				return
			}
			ff = &facFunc{kind: al.kind, param: idx, param2: -1, offset: al.topOff, loop: al}
		case kindFalling:
			// p *= n - i for i < k: n!/(n-k)! of parameters n and k.
			n, k := fc.c.objOf(fc.fallingBase(al)), fc.c.objOf(al.count)
			ni, ki := fc.c.paramIndex(decl, n), fc.c.paramIndex(decl, k)
			if ni >= 0 && ki >= 0 && !assignedOutside(fc.c.pass.TypesInfo, decl.Body, n, al.shape.stmt) && !assignedOutside(fc.c.pass.TypesInfo, decl.Body, k, al.shape.stmt) {
				ff = &facFunc{kind: kindFalling, param: ni, param2: ki, loop: al}
			}
		case kindRising:
			// p *= x + i for i < n: x(x+1)…(x+n-1) of parameters n and x.
			n, x := fc.c.objOf(al.count), fc.c.objOf(al.x)
			ni, xi := fc.c.paramIndex(decl, n), fc.c.paramIndex(decl, x)
			if ni >= 0 && xi >= 0 && al.coff == 0 && !assignedOutside(fc.c.pass.TypesInfo, decl.Body, n, al.shape.stmt) && !assignedOutside(fc.c.pass.TypesInfo, decl.Body, x, al.shape.stmt) {
				ff = &facFunc{kind: kindRising, param: ni, param2: xi, loop: al}
			}
		}
	})
	return ff
}

// returned is, per body, the variables its return statements return
// first, gathered once per body, as closureAssigns is: it is asked per
// loop.
type returned struct {
	byBody map[*ast.BlockStmt]map[types.Object]bool
}

var returnedKey = &stateKey[returned]{"variables returned, per body"}

// returns reports whether some return statement of body returns v as its
// first result.
func (fc *fnCtx) returns(body *ast.BlockStmt, v types.Object) bool {
	r := stateOf(fc, returnedKey)
	set, ok := r.byBody[body]
	if !ok {
		set = make(map[types.Object]bool)
		ast.Inspect(body, func(n ast.Node) bool {
			switch n := n.(type) {
			case *ast.FuncLit:
				return false
			case *ast.ReturnStmt:
				if len(n.Results) > 0 {
					if obj := fc.c.objOf(n.Results[0]); obj != nil {
						set[obj] = true
					}
				}
			}
			return true
		})
		if r.byBody == nil {
			r.byBody = make(map[*ast.BlockStmt]map[types.Object]bool)
		}
		r.byBody[body] = set
	}
	return v != nil && set[v]
}

// lastGoodApprox formats the largest value of the kind that fits t.
func lastGoodApprox(k facKind, t numType) string {
	if k == kindDouble {
		return thresholds.DoubleFactorial(t.Num).LastGoodApprox()
	}
	return thresholds.Factorial(t.Num).LastGoodApprox()
}

// assignedOutside reports whether v is assigned in body outside the
// statement skip: then the function's result is not a factorial of the
// argument it was called with.
func assignedOutside(info *types.Info, body *ast.BlockStmt, v types.Object, skip ast.Node) bool {
	return assigned.In(info, body, v, func(n ast.Node) bool { return n == skip })
}

// wrapperOf matches a function that returns a factorial of a parameter
// computed elsewhere: return f(n+c) of a factorial function f, return
// t[n+c] of a factorial table t (factorialtables.go), or
// return math.Gamma(float64(n)+b) with an integer b ≥ 1, which is
// (n+b−1)! in float64 since Γ(n+1) = n! (DLMF 5.4.1, from memory).
func (fc *fnCtx) wrapperOf(decl *ast.FuncDecl, self *types.Func) *facFunc {
	var ff *facFunc
	resT := self.Type().(*types.Signature).Results().At(0).Type()
	ast.Inspect(decl.Body, func(n ast.Node) bool {
		if _, ok := n.(*ast.FuncLit); ok || ff != nil {
			return false
		}
		ret, ok := n.(*ast.ReturnStmt)
		if !ok || len(ret.Results) == 0 {
			return true
		}
		if !types.Identical(fc.c.pass.TypesInfo.TypeOf(ret.Results[0]), resT) {
			return false
		}
		switch e := ast.Unparen(ret.Results[0]).(type) {
		case *ast.CallExpr:
			ff = fc.wrappedCall(decl, e)
		case *ast.IndexExpr:
			if tbl := fc.tableOf(e); tbl != nil {
				ff = fc.wrappedFactor(decl, factor{kind: kindFactorial, arg: e.Index, fact: &tbl.fact})
			}
		}
		return false
	})
	return ff
}

func (fc *fnCtx) wrappedCall(decl *ast.FuncDecl, call *ast.CallExpr) *facFunc {
	if fc.c.isMathFunc(call, "Gamma") && len(call.Args) == 1 {
		aff, ok := fc.affineOf(call.Args[0], 0)
		if !ok || aff.a() != 1 || !aff.isInt || aff.b() < 1 || aff.b() != float64(int64(aff.b())) {
			return nil
		}
		idx := fc.c.paramIndex(decl, fc.c.objOf(aff.v))
		if idx < 0 || assignedOutside(fc.c.pass.TypesInfo, decl.Body, fc.c.objOf(aff.v), nil) {
			return nil
		}
		off := int64(aff.b()) - 1
		return &facFunc{kind: kindFactorial, param: idx, param2: -1, offset: off, wrap: aff.v, wrapOff: off}
	}
	f, ok := fc.factorOf(call)
	if !ok {
		return nil
	}
	return fc.wrappedFactor(decl, f)
}

// wrappedFactor returns the factorial function decl is when it returns
// the factor f (a call, a table's element) of one of its parameters.
func (fc *fnCtx) wrappedFactor(decl *ast.FuncDecl, f factor) *facFunc {
	if f.kind != kindFactorial && f.kind != kindDouble {
		return nil
	}
	lin, ok := fc.linear(f.arg)
	if !ok || len(lin.Terms) != 1 || lin.Terms[0].K != 1 {
		return nil
	}
	p := lin.Terms[0].Sym.Object
	idx := fc.c.paramIndex(decl, p)
	if idx < 0 || assignedOutside(fc.c.pass.TypesInfo, decl.Body, p, nil) {
		return nil
	}
	return &facFunc{kind: f.kind, param: idx, param2: -1, offset: lin.C + f.off, wrap: f.arg, wrapOff: f.off, inner: f.fact}
}

// numericFunc returns the function decl declares, its numeric result
// type and a context for it that knows only its own annotations, or a
// nil context when the first of at most two results is not numeric.
func (c *checker) numericFunc(decl *ast.FuncDecl) (*types.Func, numType, *fnCtx) {
	obj := c.declObj(decl)
	if obj == nil {
		return nil, numType{}, nil
	}
	sig := obj.Type().(*types.Signature)
	if sig.Results().Len() == 0 || sig.Results().Len() > 2 {
		return nil, numType{}, nil
	}
	res, ok := c.numOf(sig.Results().At(0).Type())
	if !ok {
		return nil, numType{}, nil
	}
	return obj, res, c.ownCtx(decl)
}

// ownCtx returns a fresh context for fn with its own annotations only,
// not the ranges its call sites give it.
func (c *checker) ownCtx(fn ast.Node) *fnCtx {
	return c.newCtx(fn, c.ownEntry(fn))
}

// returnedAsIs reports whether e, in the function of fc, is the returned
// value itself, through parentheses, sign changes and conversions, and
// is returned as a float.
func (fc *fnCtx) returnedAsIs(e ast.Expr) bool {
	return funcBody(fc.node) != nil && fc.returnedIn(e, fc.parentMap())
}

// returnedIn is returnedAsIs with the parents of e's function.
func (fc *fnCtx) returnedIn(e ast.Expr, parents map[ast.Node]ast.Node) bool {
	e, _ = fc.gammaUse(e, parents)
	_, ret := parents[e].(*ast.ReturnStmt)
	return ret && fc.floatValued(e)
}

// floatValued reports whether e has a float type: a conversion of +Inf
// to an integer type (int64(f)) is no IEEE value but a wrong one.
func (fc *fnCtx) floatValued(e ast.Expr) bool {
	t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(e))
	return ok && t.Float
}

// decidedAtCalls reports whether n is the product loop or the recursion
// of this function's factorial and the finding, if any, belongs to the
// callers. That is so when every call of the function in the package is
// either safe or certainly past its first bad value: the calls past it
// are the findings (fact(25)), one each, and a finding at the
// definition would only repeat them with a range the calls gave it. It
// is also so when the product is a float returned as it is (asIs): +Inf
// is then the IEEE value of an n! beyond the type, not a wrong one, a
// range guard would make a correct function panic, and the fact carries
// the factorial to the callers' ratios, which are judged there.
func (fc *fnCtx) decidedAtCalls(n ast.Node) bool {
	d, ok := fc.node.(*ast.FuncDecl)
	if !ok {
		return false
	}
	ff := fc.c.funcs[fc.c.declObj(d)]
	if ff == nil || ff.prod != n {
		return false
	}
	// A loop the value model found (no loop or rec) is judged at its
	// definition whatever its calls are, as before.
	return ff.asIs || fc.c.sitesDecide(ff) && (ff.loop != nil || ff.rec != nil)
}

// productAsIs reports whether the product of ff reaches no arithmetic
// in its function: the recursion n*f(n-1) is the returned value itself
// (through parentheses and float conversions), and the loop's local
// accumulator is, outside its updates in the loop, only returned,
// compared or passed on, as gammaEscapes asks of a math.Gamma value, and
// never converted to an integer type.
func (fc *fnCtx) productAsIs(ff *facFunc) bool {
	root := ff.decl.Body
	parents := parentsIn(root)
	if ff.rec != nil {
		// A memo's product is stored and returned as it is.
		return fc.returnedIn(ff.rec, parents) || ff.stored && fc.floatValued(ff.rec)
	}
	var v types.Object
	if ff.loop != nil {
		v = ff.loop.acc
	} else if ret, ok := root.List[len(root.List)-1].(*ast.ReturnStmt); ok && len(ret.Results) == 1 {
		v = fc.c.objOf(ret.Results[0]) // modelFactorialFunc's shape
	}
	if lv, ok := v.(*types.Var); !ok || lv.Parent() == nil || lv.Parent() == lv.Pkg().Scope() {
		return false // a package variable is read where this function cannot see
	}
	asIs := true
	ast.Inspect(root, func(n ast.Node) bool {
		inLoop := n != nil && ff.prod.Pos() <= n.Pos() && n.End() <= ff.prod.End()
		if a, ok := n.(*ast.AssignStmt); ok && inLoop && len(a.Lhs) == 1 && fc.c.objOf(a.Lhs[0]) == v {
			return false // the loop's update of the product: v *= i, v = v * i
		}
		if id, ok := n.(*ast.Ident); ok && asIs && fc.c.pass.TypesInfo.Uses[id] == v {
			e, _ := fc.gammaUse(id, parents)
			asIs = fc.floatValued(e) && !fc.meetsArith(root, id, parents, map[*types.Var]bool{})
		}
		return asIs
	})
	return asIs
}
