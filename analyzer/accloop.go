package analyzer

import (
	"go/ast"
	"go/token"
	"go/types"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/internal/assigned"
)

// facKind is the kind of product a loop, a recursion or a function
// computes.
type facKind int

const (
	kindNone      facKind = iota
	kindFactorial         // 1·2·…·n
	kindDouble            // n·(n−2)·(n−4)·…
	kindFalling           // n·(n−1)·…·(n−k+1)
	kindRising            // x·(x+1)·…·(x+n−1)
	kindBinomial          // C(n, k), from a ratio or a multiplicative loop
	kindPower             // x^k by a loop multiplying by a loop-invariant x
)

var kindNames = map[facKind]string{
	kindFactorial: "factorial",
	kindDouble:    "double-factorial",
	kindFalling:   "falling-factorial",
	kindRising:    "rising-factorial",
	kindBinomial:  "binomial",
}

// accLoop is a loop that multiplies an accumulator, started at a
// constant, by a factor that moves with the induction variable.
type accLoop struct {
	shape   *loopShape
	acc     types.Object
	accInit ast.Stmt
	update  ast.Stmt
	mult    ast.Expr // the factor, as written
	div     ast.Expr // the divisor of a multiplicative binomial loop
	kind    facKind
	// The largest factor is top+topOff (the constant topOff when top is
	// nil); for a falling factorial the factors run from top down over
	// count values.
	top    ast.Expr
	topOff int64
	count  ast.Expr // falling and rising: number of factors, as count+countOff
	coff   int64
	// span is the number of factors of a falling factorial between two
	// variable ends that differ by a multiple of one variable, k from
	// n+1 to 3*n: no expression in the source counts them, so count is
	// nil and only span describes them.
	span *linear
	// from+fromOff is the smallest factor of a product between two ends
	// that are variables of their own, lo·(lo+1)·…·hi: neither a count
	// nor a span describes it, and it is top! where from ≤ 2.
	from    ast.Expr
	fromOff int64
	x       ast.Expr // rising: the base x
	// exits are where the loop can end before its test stops it, or
	// skip its update (see leavesEarly); early is set while any of them
	// may cut the product short.
	exits []ast.Stmt
	early bool
}

// accLoopOf recognises a product loop; before are the statements that
// precede the loop in its block, searched for the accumulator's start.
func (fc *fnCtx) accLoopOf(s ast.Stmt, before [][]ast.Stmt) *accLoop {
	sh := fc.shapeOf(s)
	if sh == nil {
		return nil
	}
	var found *accLoop
	for _, st := range sh.body.List {
		al := fc.updateOf(st, sh)
		if al == nil {
			continue
		}
		if found != nil && found.acc == al.acc {
			// acc *= x; acc /= y as two statements: a binomial loop.
			if found.div == nil && al.div != nil && al.mult == nil {
				found.div = al.div
				continue
			}
			return nil
		}
		if found == nil && al.mult != nil {
			found = al
		}
	}
	if found == nil {
		return nil
	}
	// The cheap tests first; the walks of the body and the function last.
	found.accInit = fc.constStart(found.acc, before)
	if found.accInit == nil || !fc.classify(found) {
		return nil
	}
	if fc.assignsElsewhere(sh.body, found) || fc.closureAssigns(found.acc) {
		return nil
	}
	found.exits = fc.leavesEarly(found)
	found.early = len(found.exits) > 0
	if found.early && (found.kind == kindFactorial || found.kind == kindDouble) && found.div == nil {
		if t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(found.update.(*ast.AssignStmt).Lhs[0])); ok {
			found.early = !fc.exitsPast(found, firstBadOf(found.kind, t))
		}
	}
	if found.early && found.kind == kindPower {
		return nil // not x^k: nothing to judge a term by
	}
	return found
}

// updateOf matches acc *= X, acc = acc * X, acc = X * acc,
// acc = acc * X / Y and acc /= Y.
func (fc *fnCtx) updateOf(st ast.Stmt, sh *loopShape) *accLoop {
	as, ok := st.(*ast.AssignStmt)
	if !ok || len(as.Lhs) != 1 || len(as.Rhs) != 1 {
		return nil
	}
	acc := fc.c.objOf(as.Lhs[0])
	if acc == nil || acc == sh.iv {
		return nil
	}
	al := &accLoop{shape: sh, acc: acc, update: as}
	switch as.Tok {
	case token.MUL_ASSIGN:
		al.mult = as.Rhs[0]
	case token.QUO_ASSIGN:
		al.div = as.Rhs[0]
	case token.ASSIGN:
		rhs, ok := ast.Unparen(as.Rhs[0]).(*ast.BinaryExpr)
		if !ok {
			return nil
		}
		if rhs.Op == token.QUO {
			al.div = rhs.Y
			if rhs, ok = ast.Unparen(rhs.X).(*ast.BinaryExpr); !ok {
				return nil
			}
		}
		if rhs.Op != token.MUL {
			return nil
		}
		switch acc {
		case fc.c.objOf(rhs.X):
			al.mult = rhs.Y
		case fc.c.objOf(rhs.Y):
			al.mult = rhs.X
		default:
			return nil
		}
	default:
		return nil
	}
	return al
}

// assignsElsewhere reports whether the loop body changes the accumulator
// other than by its update, which would make it something else than a
// product.
func (fc *fnCtx) assignsElsewhere(body *ast.BlockStmt, al *accLoop) bool {
	own := func(n ast.Node) bool {
		as, ok := n.(*ast.AssignStmt)
		return ok && (as == al.update || al.div != nil && fc.isDivOf(as, al))
	}
	return assigned.In(fc.c.pass.TypesInfo, body, al.acc, own)
}

func (fc *fnCtx) isDivOf(as *ast.AssignStmt, al *accLoop) bool {
	return as.Tok == token.QUO_ASSIGN && len(as.Rhs) == 1 && as.Rhs[0] == al.div
}

// constStart finds the statement, among those before the loop, that last
// sets the accumulator, and returns it when it sets a non-zero constant.
func (fc *fnCtx) constStart(acc types.Object, before [][]ast.Stmt) ast.Stmt {
	for j := len(before) - 1; j >= 0; j-- {
		st, found := fc.startIn(acc, before[j])
		if found {
			return st
		}
	}
	return nil
}

// startIn searches one block's statements backwards; found reports that
// a statement touching the accumulator was met, st that it sets it to a
// non-zero constant.
func (fc *fnCtx) startIn(acc types.Object, list []ast.Stmt) (st ast.Stmt, found bool) {
	for i := len(list) - 1; i >= 0; i-- {
		switch st := list[i].(type) {
		case *ast.AssignStmt:
			for j, l := range st.Lhs {
				if fc.c.objOf(l) != acc {
					continue
				}
				if len(st.Rhs) == len(st.Lhs) && fc.nonZeroConst(st.Rhs[j]) {
					return st, true
				}
				return nil, true
			}
		case *ast.DeclStmt:
			gd, ok := st.Decl.(*ast.GenDecl)
			if !ok || gd.Tok != token.VAR {
				continue
			}
			for _, spec := range gd.Specs {
				vs := spec.(*ast.ValueSpec)
				for j, name := range vs.Names {
					if fc.c.pass.TypesInfo.Defs[name] != acc {
						continue
					}
					if len(vs.Values) == len(vs.Names) && fc.nonZeroConst(vs.Values[j]) {
						return st, true
					}
					return nil, true
				}
			}
		default:
			if mentions(fc.c.pass.TypesInfo, st, acc) {
				return nil, true
			}
		}
	}
	return nil, false
}

func (fc *fnCtx) nonZeroConst(e ast.Expr) bool {
	v, ok := fc.floatConst(fc.stripConv(e))
	return ok && v != 0
}

// mentions reports whether n uses obj.
func mentions(info *types.Info, n ast.Node, obj types.Object) bool {
	found := false
	ast.Inspect(n, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok && info.Uses[id] == obj {
			found = true
		}
		return !found
	})
	return found
}

// classify decides what product the loop forms from how its factor moves
// with the induction variable.
func (fc *fnCtx) classify(al *accLoop) bool {
	sh := al.shape
	if !mentions(fc.c.pass.TypesInfo, al.mult, sh.iv) {
		al.kind = kindPower
		al.count, al.coff = tripCount(sh)
		return al.count != nil && al.div == nil
	}
	lin, ok := fc.linear(al.mult)
	if !ok {
		return fc.classifyRising(al)
	}
	a := lin.coefOf(sh.iv)
	rest := lin.without(sh.iv)
	// hi and lo are the ends where the factor is largest and smallest.
	hi, hiOff, lo, loOff := sh.last, sh.lastOff, sh.first, sh.firstOff
	if (sh.step > 0) != (a > 0) {
		hi, hiOff, lo, loOff = lo, loOff, hi, hiOff
	}
	switch {
	case a == 1 && len(rest.Terms) == 0:
		// The factor is i+c: a factorial when it starts at 1 or 2.
		if lo == nil && loOff+rest.C <= 0 {
			return false // a zero factor: not a factorial
		}
		if lo == nil && loOff+rest.C > 2 && fc.risingFromConst(al, loOff+rest.C) {
			return true
		}
		if lo != nil || loOff+rest.C > 2 {
			return fc.classifyPartial(al, hi, hiOff+rest.C, lo, loOff+rest.C)
		}
		al.top, al.topOff = hi, hiOff+rest.C
		al.kind = kindFactorial
		if sh.step == 2 || sh.step == -2 {
			al.kind = kindDouble
		} else if sh.step != 1 && sh.step != -1 {
			return false
		}
		return true
	case (a == 1 || a == -1) && len(rest.Terms) > 0 && (sh.step == 1 || sh.step == -1):
		// The factor is n∓i: a falling factorial of n over the trip count.
		al.kind = kindFalling
		al.top = al.mult
		al.count, al.coff = tripCount(sh)
		return al.count != nil || sh.first == nil && sh.last == nil
	}
	return false
}

// risingFromConst matches a factor i+c that starts at the constant
// start > 2 and grows to a variable end, p *= 3 + float64(i) for i from
// 0: the product start·(start+1)·… is the rising factorial of start over
// the trip count, whose largest factor moves with the count. Read as a
// falling factorial its top and its count would look independent. The
// constant must be written as the factor's operand, for the message to
// name it; a binomial loop keeps its falling reading.
func (fc *fnCtx) risingFromConst(al *accLoop, start int64) bool {
	sh := al.shape
	if al.div != nil || sh.step != 1 && sh.step != -1 {
		return false
	}
	count, coff := tripCount(sh)
	if count == nil {
		return false
	}
	b, ok := fc.stripConv(al.mult).(*ast.BinaryExpr)
	if !ok || b.Op != token.ADD {
		return false
	}
	for _, x := range []ast.Expr{b.X, b.Y} {
		if v, ok := fc.floatConst(x); ok && v == float64(start) {
			al.kind, al.x, al.count, al.coff = kindRising, x, count, coff
			return true
		}
	}
	return false
}

// classifyPartial handles i+c starting above 2 or at a variable: the
// product of the factors down from the largest is a falling factorial;
// lo+loOff is the smallest factor.
func (fc *fnCtx) classifyPartial(al *accLoop, hi ast.Expr, hiOff int64, lo ast.Expr, loOff int64) bool {
	sh := al.shape
	if hi == nil || (sh.step != 1 && sh.step != -1) {
		return false
	}
	al.kind = kindFalling
	al.top, al.topOff = hi, hiOff
	al.count, al.coff = tripCount(sh)
	if al.count == nil {
		var ok bool
		al.count, al.coff, ok = fc.spanCount(sh)
		if !ok && al.div == nil {
			al.span = fc.scaledSpan(sh)
			if al.span == nil && lo != nil {
				al.from, al.fromOff = lo, loOff
			}
			return al.span != nil || al.from != nil
		}
		// A constant count is fine for a product; a binomial loop's
		// messages name its k.
		return ok && (al.count != nil || al.div == nil)
	}
	return true
}

// scaledSpan returns the trip count of a unit-step loop whose ends differ
// by a multiple of one variable, for k := n + 1; k <= 3*n; k++ (2n
// trips), or nil.
func (fc *fnCtx) scaledSpan(sh *loopShape) *linear {
	if sh.step != 1 && sh.step != -1 {
		return nil
	}
	d, ok := fc.span(sh)
	if !ok || len(d.Terms) != 1 || d.Terms[0].K < 2 {
		return nil
	}
	return &d
}

// spanCount returns the trip count of a unit-step loop whose ends are
// both variable but differ by one variable or a constant, as count+off
// (count nil for a constant): the loop for i := n-k+1; i <= n; i++
// makes k trips, and for i := n-5; i <= n; i++ makes 6. It is how a
// falling factorial n!/(n−k)! is written counting up to n.
func (fc *fnCtx) spanCount(sh *loopShape) (ast.Expr, int64, bool) {
	d, ok := fc.span(sh)
	if !ok {
		return nil, 0, false
	}
	if len(d.Terms) == 0 {
		return nil, d.C, true
	}
	if len(d.Terms) != 1 || d.Terms[0].K != 1 {
		return nil, 0, false
	}
	id := identOf(fc.c.pass.TypesInfo, sh.last, d.Terms[0].Sym.Object)
	if id == nil {
		id = identOf(fc.c.pass.TypesInfo, sh.first, d.Terms[0].Sym.Object)
	}
	if id == nil {
		return nil, 0, false
	}
	return id, d.C, true
}

// span returns the trip count of a loop between two variable ends as a
// linear form: the high end less the low end, plus one.
func (fc *fnCtx) span(sh *loopShape) (linear, bool) {
	if sh.first == nil || sh.last == nil {
		return linear{}, false
	}
	lo, hi := sh.first, sh.last
	loOff, hiOff := sh.firstOff, sh.lastOff
	if sh.step < 0 {
		lo, hi, loOff, hiOff = hi, lo, hiOff, loOff
	}
	l, ok1 := fc.linear(lo)
	h, ok2 := fc.linear(hi)
	if !ok1 || !ok2 {
		return linear{}, false
	}
	d := h.add(l.scale(-1))
	d.C += hiOff - loOff + 1
	return d, true
}

// identOf returns an identifier in n that reads obj.
func identOf(info *types.Info, n ast.Node, obj types.Object) *ast.Ident {
	var found *ast.Ident
	ast.Inspect(n, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok && found == nil && info.Uses[id] == obj {
			found = id
		}
		return found == nil
	})
	return found
}

// classifyRising matches x + i with x a floating-point value.
func (fc *fnCtx) classifyRising(al *accLoop) bool {
	sh := al.shape
	b, ok := fc.stripConv(al.mult).(*ast.BinaryExpr)
	if !ok || b.Op != token.ADD || sh.step != 1 || sh.first != nil || sh.firstOff != 0 {
		return false
	}
	x := b.X
	if fc.c.objOf(fc.stripConv(b.Y)) != sh.iv {
		if fc.c.objOf(fc.stripConv(b.X)) != sh.iv {
			return false
		}
		x = b.Y
	}
	t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(x))
	if !ok || !t.Float {
		return false
	}
	al.kind = kindRising
	al.x = x
	al.count, al.coff = tripCount(sh)
	return al.count != nil
}

// tripCount returns the number of iterations of a unit-step loop whose
// one end is constant, as expr+off.
func tripCount(sh *loopShape) (ast.Expr, int64) {
	switch {
	case sh.step > 0 && sh.first == nil && sh.last != nil:
		return sh.last, sh.lastOff - sh.firstOff + 1
	case sh.step < 0 && sh.last == nil && sh.first != nil:
		return sh.first, sh.firstOff - sh.lastOff + 1
	}
	return nil, 0
}

// endRange is the range of expr+off, or the constant off when expr is
// nil.
func (fc *fnCtx) endRange(e ast.Expr, off int64) ranges.Interval {
	if e == nil {
		return ranges.Point(off)
	}
	return shift(fc.rangeOf(e), off)
}

// closureAssigned is the variables the closures of a function assign,
// gathered once per function: asked once per loop, a walk of the whole
// body each time made long functions quadratic.
type closureAssigned struct{ set map[types.Object]bool }

var closureAssignedKey = &stateKey[closureAssigned]{"variables closures assign"}

// closureAssigns reports whether a closure in the function assigns v; a
// call of it may then change the accumulator between the factors.
func (fc *fnCtx) closureAssigns(v types.Object) bool {
	ca := stateOf(fc, closureAssignedKey)
	if ca.set == nil {
		ca.set = make(map[types.Object]bool)
		ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
			lit, ok := n.(*ast.FuncLit)
			if !ok {
				return true
			}
			assigned.Each(fc.c.pass.TypesInfo, lit.Body, nil, func(obj types.Object, _ ast.Node) bool {
				ca.set[obj] = true
				return true
			})
			return false
		})
	}
	return v != nil && ca.set[v]
}
