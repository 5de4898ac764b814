package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"strings"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/fixes"
	"github.com/overfact/overfact/internal/assigned"
)

// checkLoopMultinomial reports a multinomial coefficient accumulated in
// a loop over the parts, in any loop form (a list, a slice, a channel):
//
//	for _, a := range parts {
//		sum += a
//		den *= fact(a)
//	}
//	return fact(sum) / den
//
// computes (Σaᵢ)!/Π aᵢ! (DLMF 26.4.2, from memory), which fits wherever
// one part holds nearly all of the sum, while fact(sum) breaks from the
// factorial's first bad argument on: every sum past it gives ±Inf, NaN
// or a wrapped value. The value model has no symbol for a product over
// the parts, so the shape is read here: one loop adds each part to the
// sum and multiplies the factorial of the same part into the divisor,
// and the root divides the factorial of the sum by the divisor.
func (fc *fnCtx) checkLoopMultinomial(root ast.Expr) {
	c := fc.c
	b, ok := fc.stripConv(root).(*ast.BinaryExpr)
	if !ok || b.Op != token.QUO || c.reportedWithin(root) {
		return
	}
	num, ok := fc.stripConv(b.X).(*ast.CallExpr)
	if !ok {
		return
	}
	ff := c.factOf(c.calleeOf(num))
	if ff == nil || ff.Safe || kindOfName(ff.Kind) != kindFactorial || ff.Offset != 0 || ff.Param >= len(num.Args) {
		return
	}
	sum := c.objOf(fc.stripConv(num.Args[ff.Param]))
	den := c.objOf(fc.stripConv(b.Y))
	if sum == nil || den == nil || sum == den {
		return
	}
	t, ok := c.numOf(c.pass.TypesInfo.TypeOf(root))
	if !ok {
		return
	}
	loop := fc.partsLoop(sum, den, root.Pos())
	if loop == nil {
		return
	}
	first := ff.FirstBad
	r := fc.rangeOf(fc.stripConv(num.Args[ff.Param]))
	if r.IsEmpty() || r.Hi < first {
		return
	}
	name := "the function literal"
	if d, ok := fc.node.(*ast.FuncDecl); ok {
		name = d.Name.Name
	}
	clause, definite := verdict(sum.Name(), r, first)
	breaks := verb(t)
	msg := fmt.Sprintf("%s computes the multinomial coefficient (Σ parts)!/Π part! as %s over the loop's parts in %s, which fits where %s already %s from %s = %d%s",
		name, src(root), t.typeName(), src(num), breaks, sum.Name(), first, clause)
	fc.report(finding{node: root, cat: catRatio, definite: definite, msg: msg, related: c.relatedDef(c.calleeOf(num).Name(), c.calleeOf(num).Pos()),
		match: fc.multinomialLogMatch(root, num, num.Args[ff.Param], den, loop, t)})
}

// checkDividedOut reports the other way to write a multinomial over a
// loop's parts: the factorial of a total first, w := fact(n), then each
// part's factorial divided out of it in a loop, w /= fact(x), and w
// returned. Whatever the total is made of, the value is n!/Π x!, at most
// n! and often far below it, while fact(n) already breaks from the
// factorial's first bad n: from there every quotient is wrong (wrapped,
// or +Inf), as where the parts are [12 12], C(24, 12) = 2704156, with
// 24! past uint64 (math/big).
func (fc *fnCtx) checkDividedOut() {
	c := fc.c
	body := funcBody(fc.node)
	if body == nil {
		return
	}
	ast.Inspect(body, func(n ast.Node) bool {
		if _, lit := n.(*ast.FuncLit); lit {
			return false
		}
		blk, ok := n.(*ast.BlockStmt)
		if !ok {
			return true
		}
		for i, st := range blk.List {
			w, num, ff := fc.factorialStart(st)
			if w == nil || !fc.returns(body, w) {
				continue
			}
			for _, next := range blk.List[i+1:] {
				if lb := loopBody(next); lb != nil && fc.dividesOutFactorials(lb, w) {
					fc.reportDividedOut(next, w, num, ff)
					break
				}
				if assigned.In(c.pass.TypesInfo, next, w, nil) {
					break
				}
			}
		}
		return true
	})
}

// factorialStart matches w := f(n), w = f(n) or var w = f(n) with f a
// factorial function whose own value breaks (a fact, not Safe, offset 0).
func (fc *fnCtx) factorialStart(st ast.Stmt) (types.Object, *ast.CallExpr, *FactorialFact) {
	var lhs, rhs ast.Expr
	switch st := st.(type) {
	case *ast.AssignStmt:
		if len(st.Lhs) != 1 || len(st.Rhs) != 1 || st.Tok != token.DEFINE && st.Tok != token.ASSIGN {
			return nil, nil, nil
		}
		lhs, rhs = st.Lhs[0], st.Rhs[0]
	case *ast.DeclStmt:
		gd, ok := st.Decl.(*ast.GenDecl)
		if !ok || len(gd.Specs) != 1 {
			return nil, nil, nil
		}
		vs, ok := gd.Specs[0].(*ast.ValueSpec)
		if !ok || len(vs.Names) != 1 || len(vs.Values) != 1 {
			return nil, nil, nil
		}
		lhs, rhs = vs.Names[0], vs.Values[0]
	default:
		return nil, nil, nil
	}
	call, ok := fc.stripConv(rhs).(*ast.CallExpr)
	if !ok {
		return nil, nil, nil
	}
	ff := fc.c.factOf(fc.c.calleeOf(call))
	if ff == nil || ff.Safe || kindOfName(ff.Kind) != kindFactorial || ff.Offset != 0 || ff.Param >= len(call.Args) {
		return nil, nil, nil
	}
	w := fc.c.objOf(lhs)
	if w == nil {
		return nil, nil, nil
	}
	return w, call, ff
}

// dividesOutFactorials reports whether the loop body divides w by a
// factorial function's value, w /= f(x) or w = w / f(x), and changes w
// no other way.
func (fc *fnCtx) dividesOutFactorials(body *ast.BlockStmt, w types.Object) bool {
	c := fc.c
	divides, other := false, false
	assigned.Each(c.pass.TypesInfo, body, nil, func(v types.Object, at ast.Node) bool {
		if v != w {
			return true
		}
		a, ok := at.(*ast.AssignStmt)
		if !ok || len(a.Rhs) != 1 {
			other = true
			return false
		}
		var y ast.Expr
		switch {
		case a.Tok == token.QUO_ASSIGN:
			y = a.Rhs[0]
		case a.Tok == token.ASSIGN:
			if q, ok := fc.stripConv(a.Rhs[0]).(*ast.BinaryExpr); ok && q.Op == token.QUO && c.objOf(fc.stripConv(q.X)) == w {
				y = q.Y
			}
		}
		call, ok := fc.stripConv(y).(*ast.CallExpr)
		if y == nil || !ok {
			other = true
			return false
		}
		if ff := c.factOf(c.calleeOf(call)); ff == nil || kindOfName(ff.Kind) != kindFactorial {
			other = true
			return false
		}
		divides = true
		return true
	})
	return divides && !other
}

// reportDividedOut words checkDividedOut's finding.
func (fc *fnCtx) reportDividedOut(loop ast.Stmt, w types.Object, num *ast.CallExpr, ff *FactorialFact) {
	c := fc.c
	t, ok := c.numOf(w.Type())
	if !ok || c.reportedWithin(loop) {
		return
	}
	arg := fc.stripConv(num.Args[ff.Param])
	r := fc.rangeOf(arg)
	first := ff.FirstBad
	if r.IsEmpty() || r.Hi < first {
		return
	}
	name := "the function literal"
	if d, ok := fc.node.(*ast.FuncDecl); ok {
		name = d.Name.Name
	}
	clause, definite := verdict(shownName(arg), r, first)
	msg := fmt.Sprintf("%s divides %s = %s by factorials over a loop in %s: the quotient fits where they cancel most of it, but %s already %s from %s = %d%s",
		name, w.Name(), src(num), t.typeName(), src(num), verb(t), src(arg), first, clause)
	fn := c.calleeOf(num)
	fc.report(finding{node: loop, cat: catRatio, definite: definite, msg: msg, related: c.relatedDef(fn.Name(), fn.Pos())})
}

// multinomialLogMatch offers to carry the divisor of a float multinomial
// in log space (ShapeLogSpaceTerm): den becomes an lgamma.Product, each
// factorial call the value its function returns with ln n! beside it
// (lgamma.FactorialProduct), so that the quotient keeps every value the
// code got right and takes the logarithms where a factorial is +Inf.
// nil for an integer result, whose wrapped factorials are finite.
func (fc *fnCtx) multinomialLogMatch(root ast.Expr, num *ast.CallExpr, total ast.Expr, den types.Object, loop ast.Stmt, t numType) *fixes.Match {
	if !t.Float {
		return nil
	}
	c := fc.c
	facs := []fixes.FactorialCall{{Call: num, Arg: total}}
	ast.Inspect(loop, func(n ast.Node) bool {
		as, ok := n.(*ast.AssignStmt)
		if !ok || len(as.Lhs) != 1 || len(as.Rhs) != 1 || c.objOf(as.Lhs[0]) != den {
			return true
		}
		call, ok := fc.stripConv(as.Rhs[0]).(*ast.CallExpr)
		if as.Tok != token.MUL_ASSIGN || !ok {
			return true
		}
		if ff := c.factOf(c.calleeOf(call)); ff != nil && kindOfName(ff.Kind) == kindFactorial && ff.Offset == 0 && ff.Param < len(call.Args) {
			facs = append(facs, fixes.FactorialCall{Call: call, Arg: call.Args[ff.Param]})
		}
		return true
	})
	if len(facs) < 2 {
		return nil
	}
	return &fixes.Match{Shape: fixes.ShapeLogSpaceTerm, Node: root, Result: c.pass.TypesInfo.TypeOf(root),
		Args: []ast.Expr{fc.stripConv(root.(*ast.BinaryExpr).Y)}, Func: fc.node, Factorials: facs}
}

// partsLoop returns the last loop before pos whose body adds a part to
// sum (sum += x) and multiplies the divisor by the factorial of the same
// part (den *= fact(x), with the factorial of num's kind), and assigns
// neither otherwise; nil when there is none. The two updates may also
// sit in two loops over the same collection, each assigning only its
// own variable, with the part the element each loop ranges over:
//
//	for _, a := range parts { sum += a }
//	for _, a := range parts { den *= fact(a) }
//
// then it returns the loop of the divisor.
func (fc *fnCtx) partsLoop(sum, den types.Object, pos token.Pos) ast.Stmt {
	var found, sumLoop, denLoop ast.Stmt
	var sumOver, denOver string
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		switch n.(type) {
		case *ast.FuncLit:
			return false
		case *ast.ForStmt, *ast.RangeStmt:
		default:
			return true
		}
		if n.End() > pos {
			return false
		}
		u := fc.partsUpdates(n.(ast.Stmt), sum, den)
		switch {
		case u.other:
		case len(u.added) == 1 && len(u.multiplied) == 1 && u.added[0] == u.multiplied[0]:
			found = n.(ast.Stmt)
		case len(u.added) == 1 && len(u.multiplied) == 0 && u.added[0] == u.elem && u.over != "":
			sumLoop, sumOver = n.(ast.Stmt), u.over
		case len(u.added) == 0 && len(u.multiplied) == 1 && u.multiplied[0] == u.elem && u.over != "":
			denLoop, denOver = n.(ast.Stmt), u.over
		}
		return true
	})
	if found == nil && sumLoop != nil && denLoop != nil && sumOver == denOver && !fc.collectionAssigned(sumLoop, denLoop) {
		return denLoop
	}
	return found
}

// partUpdates are the updates of a parts loop's sum and divisor: the
// parts added to the sum and the arguments of the factorials multiplied
// into the divisor, as written, whether either is assigned otherwise,
// and for a range loop over a variable, that variable and the element.
type partUpdates struct {
	added, multiplied []string
	other             bool
	over, elem        string
}

func (fc *fnCtx) partsUpdates(loop ast.Stmt, sum, den types.Object) partUpdates {
	c := fc.c
	var u partUpdates
	body := loopBody(loop)
	if l, ok := loop.(*ast.RangeStmt); ok {
		if id, ok := ast.Unparen(l.X).(*ast.Ident); ok && l.Value != nil && c.objOf(id) != nil {
			u.over, u.elem = id.Name, src(l.Value)
		}
	}
	ast.Inspect(body, func(m ast.Node) bool {
		switch s := m.(type) {
		case *ast.FuncLit:
			return false
		case *ast.AssignStmt:
			for i, l := range s.Lhs {
				obj := c.objOf(l)
				if obj != sum && obj != den {
					continue
				}
				switch {
				case obj == sum && s.Tok == token.ADD_ASSIGN && len(s.Rhs) == len(s.Lhs):
					u.added = append(u.added, src(fc.stripConv(s.Rhs[i])))
				case obj == den && s.Tok == token.MUL_ASSIGN && len(s.Rhs) == len(s.Lhs):
					call, ok := fc.stripConv(s.Rhs[i]).(*ast.CallExpr)
					if !ok {
						u.other = true
						continue
					}
					ff := c.factOf(c.calleeOf(call))
					if ff == nil || kindOfName(ff.Kind) != kindFactorial || ff.Offset != 0 || ff.Param >= len(call.Args) {
						u.other = true
						continue
					}
					u.multiplied = append(u.multiplied, src(fc.stripConv(call.Args[ff.Param])))
				default:
					u.other = true
				}
			}
		case *ast.IncDecStmt:
			if obj := c.objOf(s.X); obj == sum || obj == den {
				u.other = true
			}
		}
		return true
	})
	return u
}

// collectionAssigned reports whether the variable the two range loops
// run over may change after its definition (a new slice, its address
// taken) or an element of it is stored to: the loops might then see
// different parts.
func (fc *fnCtx) collectionAssigned(a, b ast.Stmt) bool {
	info := fc.c.pass.TypesInfo
	for _, l := range []ast.Stmt{a, b} {
		obj := fc.c.objOf(ast.Unparen(l.(*ast.RangeStmt).X))
		changed := false
		assigned.EachTarget(funcBody(fc.node), nil, func(target ast.Expr, at ast.Node) bool {
			if ix, ok := ast.Unparen(target).(*ast.IndexExpr); ok {
				target = ix.X
			}
			if id, ok := ast.Unparen(target).(*ast.Ident); ok && info.Uses[id] == obj {
				changed = true
			}
			return !changed
		})
		if changed {
			return true
		}
	}
	return false
}

// checkBinomialPartsLoops reports an integer multinomial coefficient
// built as a product of binomial coefficients over a loop's parts,
//
//	for _, c := range counts {
//		total += c
//		res *= binom(total, c)
//	}
//
// (or res = res * binom(total+c, c) before total += c): after the loop
// res is (Σ parts)!/Π part! (DLMF 26.4.2, from memory, as the product of
// C(s_i, c_i) over the running sums s_i; common practice), where binom
// is a function whose fact says it computes C(n, k). Every factor may fit
// while the product does not: with parts of 1 the factors are 1, 2, …,
// and the product is N! for a total N, which leaves the type from
// thresholds.Factorial on; with two equal halves it is C(N, ⌊N/2⌋),
// from thresholds.CentralBinomial on. The product then wraps silently.
// Floats are left alone: their product is +Inf only where the
// multinomial is past float64, which is IEEE's answer. No fix: no
// integer type holds the multinomial past the threshold.
func (fc *fnCtx) checkBinomialPartsLoops() {
	c := fc.c
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		if _, lit := n.(*ast.FuncLit); lit {
			return false
		}
		body := loopBody(n)
		if body == nil {
			return true
		}
		for i, st := range body.List {
			acc, call, ok := fc.productStep(st)
			if !ok {
				continue
			}
			t, ok := c.numOf(acc.Type())
			if !ok || t.Float || fc.guardsIn(body, acc) {
				continue
			}
			ff := c.factOf(c.calleeOf(call))
			if ff == nil || kindOfName(ff.Kind) != kindBinomial || ff.Offset != 0 || ff.Param2 < 0 || max(ff.Param, ff.Param2) >= len(call.Args) {
				continue
			}
			nArg, part := call.Args[ff.Param], fc.stripConv(call.Args[ff.Param2])
			total := fc.runningTotal(body.List, i, nArg, part)
			if total == nil || total == acc {
				continue
			}
			first := thresholds.Factorial(t.Num)
			halves := thresholds.CentralBinomial(t.Num)
			r := fc.rangeOf(fc.stripConv(nArg))
			if r.IsEmpty() || r.Hi < first.FirstBad || ff.Safe && ff.Hi < first.FirstBad {
				continue
			}
			clause, _ := verdict(total.Name(), r, first.FirstBad)
			msg := fmt.Sprintf("loop multiplies %s into %s over the parts %s in %s: the product is the multinomial coefficient (Σ parts)!/Π part!, which wraps where it leaves %s: from %s = %d with parts of 1, whose factors 1, 2, … all fit, where it is %d! (%d! ≈ %s is the largest that fits), and from %s = %d with two equal parts, where it is C(%d, %d)",
				src(call), acc.Name(), src(part), t.typeName(), t.Name, total.Name(), first.FirstBad, first.FirstBad, first.FirstBad-1, first.LastGoodApprox(),
				total.Name(), halves.FirstBad, halves.FirstBad, halves.FirstBad/2)
			fc.report(finding{node: st, cat: catRatio, msg: msg + clause, related: c.relatedDef(c.calleeOf(call).Name(), c.calleeOf(call).Pos())})
		}
		return true
	})
}

// guardsIn reports whether body holds an if statement whose condition
// reads acc and whose body leaves the loop or the function (an overflow
// check before the product, if res > max/b { … }).
func (fc *fnCtx) guardsIn(body *ast.BlockStmt, acc types.Object) bool {
	found := false
	ast.Inspect(body, func(n ast.Node) bool {
		if ifs, ok := n.(*ast.IfStmt); ok && !found {
			found = mentions(fc.c.pass.TypesInfo, ifs.Cond, acc) && (fc.exits(ifs.Body) || branches(ifs.Body))
		}
		return !found
	})
	return found
}

// productStep matches st as acc *= call or acc = acc * call (either
// order), a conversion of the call allowed.
func (fc *fnCtx) productStep(st ast.Stmt) (types.Object, *ast.CallExpr, bool) {
	as, ok := st.(*ast.AssignStmt)
	if !ok || len(as.Lhs) != 1 || len(as.Rhs) != 1 {
		return nil, nil, false
	}
	acc := fc.c.objOf(as.Lhs[0])
	if acc == nil {
		return nil, nil, false
	}
	rhs := as.Rhs[0]
	if as.Tok == token.ASSIGN {
		b, ok := ast.Unparen(rhs).(*ast.BinaryExpr)
		if !ok || b.Op != token.MUL {
			return nil, nil, false
		}
		switch acc {
		case fc.c.objOf(b.X):
			rhs = b.Y
		case fc.c.objOf(b.Y):
			rhs = b.X
		default:
			return nil, nil, false
		}
	} else if as.Tok != token.MUL_ASSIGN {
		return nil, nil, false
	}
	call, ok := fc.stripConv(rhs).(*ast.CallExpr)
	return acc, call, ok
}

// runningTotal returns the variable total of a statement total += part
// among stmts when nArg is the running sum including the part at stmts[at]:
// total itself where the addition comes before, total + part where it
// comes after (conversions aside, the part as written). total must not
// be assigned otherwise in stmts.
func (fc *fnCtx) runningTotal(stmts []ast.Stmt, at int, nArg, part ast.Expr) types.Object {
	var total types.Object
	after := false
	for j, st := range stmts {
		as, ok := st.(*ast.AssignStmt)
		if !ok || as.Tok != token.ADD_ASSIGN || len(as.Lhs) != 1 || len(as.Rhs) != 1 || src(fc.stripConv(as.Rhs[0])) != src(part) {
			continue
		}
		if total != nil {
			return nil
		}
		total, after = fc.c.objOf(as.Lhs[0]), j > at
	}
	if total == nil {
		return nil
	}
	for _, st := range stmts {
		other := false
		assigned.EachTarget(st, nil, func(e ast.Expr, m ast.Node) bool {
			if fc.c.objOf(e) == total {
				as, ok := m.(*ast.AssignStmt)
				other = !ok || as.Tok != token.ADD_ASSIGN || src(fc.stripConv(as.Rhs[0])) != src(part)
			}
			return !other
		})
		if other {
			return nil
		}
	}
	n := fc.stripConv(nArg)
	if !after {
		if fc.c.objOf(n) != total {
			return nil
		}
		return total
	}
	b, ok := n.(*ast.BinaryExpr)
	if !ok || b.Op != token.ADD {
		return nil
	}
	for _, pair := range [2][2]ast.Expr{{b.X, b.Y}, {b.Y, b.X}} {
		if fc.c.objOf(fc.stripConv(pair[0])) == total && src(fc.stripConv(pair[1])) == src(part) {
			return total
		}
	}
	return nil
}

// checkBinomialProduct reports an integer product of binomial
// coefficients in one expression, binom(n, k) * binom(n-k, j) (a
// trinomial) or any product of calls of functions whose fact says they
// compute C(n, k), with arguments linear in at most three variables:
// it wraps where the product leaves the type while every factor still
// fits, which thresholds.ChooseProductWitness finds (the first such
// input by its largest argument, confirmed with math/big). Floats are
// left alone (+Inf past float64 is IEEE's answer), and so is a product
// with other factors. No fix: no integer type holds the product there.
func (fc *fnCtx) checkBinomialProduct(root ast.Expr) {
	c := fc.c
	t, ok := c.numOf(c.pass.TypesInfo.TypeOf(root))
	if !ok || t.Float || c.reportedWithin(root) {
		return
	}
	var calls []*ast.CallExpr
	var flatten func(e ast.Expr) bool
	flatten = func(e ast.Expr) bool {
		switch e := fc.stripConv(e).(type) {
		case *ast.BinaryExpr:
			return e.Op == token.MUL && flatten(e.X) && flatten(e.Y)
		case *ast.CallExpr:
			calls = append(calls, e)
			return true
		}
		return false
	}
	if b, ok := fc.stripConv(root).(*ast.BinaryExpr); !ok || b.Op != token.MUL || !flatten(b) || len(calls) < 2 {
		return
	}
	var vars []types.Object
	index := func(v types.Object) int {
		for i, w := range vars {
			if w == v {
				return i
			}
		}
		vars = append(vars, v)
		return len(vars) - 1
	}
	var lins [][2]linear
	for _, call := range calls {
		ff := c.factOf(c.calleeOf(call))
		if ff == nil || kindOfName(ff.Kind) != kindBinomial || ff.Offset != 0 || ff.Param2 < 0 || max(ff.Param, ff.Param2) >= len(call.Args) {
			return
		}
		n, ok1 := fc.linear(call.Args[ff.Param])
		k, ok2 := fc.linear(call.Args[ff.Param2])
		if !ok1 || !ok2 {
			return
		}
		for _, l := range []linear{n, k} {
			for _, term := range l.Terms {
				index(term.Sym.Object)
			}
		}
		lins = append(lins, [2]linear{n, k})
	}
	if len(vars) == 0 || len(vars) > 3 {
		return
	}
	form := func(l linear) thresholds.IntForm {
		f := thresholds.IntForm{C: l.C, Coef: make([]int64, len(vars))}
		for _, term := range l.Terms {
			f.Coef[index(term.Sym.Object)] += term.K
		}
		return f
	}
	var ns, ks []thresholds.IntForm
	for _, nk := range lins {
		ns, ks = append(ns, form(nk[0])), append(ks, form(nk[1]))
	}
	lo, hi := make([]int64, len(vars)), make([]int64, len(vars))
	for i, v := range vars {
		r := fc.varRange(root, v)
		if r.IsEmpty() {
			return
		}
		lo[i], hi[i] = r.Lo, r.Hi
	}
	x, factors, product, ok := thresholds.ChooseProductWitness(t.Num, ns, ks, lo, hi)
	if !ok {
		return
	}
	var at, vals []string
	for i, v := range vars {
		at = append(at, fmt.Sprintf("%s = %d", v.Name(), x[i]))
	}
	for i, f := range factors {
		vals = append(vals, fmt.Sprintf("%s ≈ %s", src(calls[i]), thresholds.Approx(f)))
	}
	msg := fmt.Sprintf("product of binomial coefficients %s in %s wraps where it leaves %s while every factor fits: first at %s by the largest argument, where %s fit and the product ≈ %s does not",
		src(root), t.typeName(), t.Name, strings.Join(at, ", "), strings.Join(vals, " and "), thresholds.Approx(product))
	// The binomial function the product calls, first named: where its
	// value comes from.
	callee := c.calleeOf(calls[0])
	fc.report(finding{node: root, cat: catRatio, msg: msg, related: c.relatedDef(callee.Name(), callee.Pos())})
}

// varRange returns the range of v at the first read of it within root.
func (fc *fnCtx) varRange(root ast.Node, v types.Object) ranges.Interval {
	var read *ast.Ident
	ast.Inspect(root, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok && read == nil && fc.c.pass.TypesInfo.Uses[id] == v {
			read = id
		}
		return read == nil
	})
	if read == nil {
		return ranges.Empty()
	}
	return fc.rangeOf(read)
}
