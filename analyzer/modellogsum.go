package analyzer

import (
	"fmt"
	"go/ast"
	"go/constant"
	"go/token"
	"go/types"

	"github.com/overfact/overfact/analyzer/thresholds"
	vm "github.com/overfact/overfact/analyzer/valuemodel"
	"github.com/overfact/overfact/fixes"
)

// A sum of binomial coefficients whose logarithm is the value wanted
// (the number of ways to capitalise up to k of n letters, in bits) is
// accumulated in float64 one C(n, i) at a time. Once the terms pass the
// largest central coefficient float64 holds, the sum is +Inf and so is
// its logarithm, although the logarithm of the true sum is at most
// n·ln 2. The same sum returned as it is overflows only where the true
// sum does, and is not reported.

// logFuncs are the math logarithms whose argument is judged.
var logFuncs = [...]string{"Log", "Log2", "Log10"}

// eachLogCall calls f with each call of math.Log, Log2 or Log10 in the
// function's body (outside closures) at no position reported yet, and
// the function's name.
func (fc *fnCtx) eachLogCall(f func(call *ast.CallExpr, name string)) {
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		if _, ok := n.(*ast.FuncLit); ok {
			return false
		}
		call, ok := n.(*ast.CallExpr)
		if !ok || len(call.Args) != 1 || fc.c.reportedAt(call.Pos()) {
			return true
		}
		for _, name := range logFuncs {
			if fc.c.isMathFunc(call, name) {
				f(call, name)
			}
		}
		return true
	})
}

// binomTerm is the binomial factor of a term a loop adds to a sum.
type binomTerm struct {
	n, k string // as written (or as the model names them)
	nx   ast.Expr
}

// modelLogSum reports math.Log, Log2 or Log10 of a float variable that
// a counting loop before the call sums binomial coefficients into, the
// coefficient's k following the loop's counter and its n not bounded
// below the first central coefficient past the type.
func (fc *fnCtx) modelLogSum(res *vm.Result) {
	c := fc.c
	fc.eachLogCall(func(call *ast.CallExpr, name string) {
		obj := c.objOf(fc.stripConv(call.Args[0]))
		if obj == nil {
			return
		}
		t, ok := c.numOf(obj.Type())
		if !ok || !t.Float || fc.checksNonFinite(call.Args[0]) {
			return
		}
		central := thresholds.CentralBinomial(t.Num)
		bt, ok := fc.summedBinomial(res, obj, call.Pos(), central.FirstBad)
		if !ok {
			return
		}
		clause := ""
		if id, isID := ast.Unparen(bt.nx).(*ast.Ident); isID {
			clause, _ = verdict(id.Name, fc.rangeOf(bt.nx), central.FirstBad)
		}
		msg := fmt.Sprintf("math.%s of %s, a sum of C(%s, %s) accumulated in %s: its terms reach C(%s, ⌊%s/2⌋), which %s for %s ≥ %d (C(%d, %d) ≈ %s is the largest central one that fits), so the sum and its logarithm are +Inf although the logarithm of the sum is at most %s·ln 2%s",
			name, obj.Name(), bt.n, bt.k, t.typeName(), bt.n, parenText(bt.n), verb(t), bt.n, central.FirstBad, central.FirstBad-1, (central.FirstBad-1)/2, central.LastGoodApprox(), parenText(bt.n), clause)
		m := &fixes.Match{Shape: fixes.ShapeLogSum, Node: call, Acc: obj, Func: fc.node, Result: obj.Type(), Binomials: fc.binomialCalls(res)}
		fc.report(finding{node: call, cat: catRatio, msg: msg, match: m})
		return
	})
}

// binomialCalls returns the calls in the function of float functions
// whose value is C(n, k), by their binomial fact or their value fact,
// with their operands n and k.
func (fc *fnCtx) binomialCalls(res *vm.Result) []fixes.BinomialCall {
	var out []fixes.BinomialCall
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		if _, ok := n.(*ast.FuncLit); ok {
			return false
		}
		call, ok := n.(*ast.CallExpr)
		if !ok {
			return true
		}
		if t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(call)); !ok || !t.Float {
			return true
		}
		if fact := fc.c.factOf(fc.c.calleeOf(call)); fact != nil && kindOfName(fact.Kind) == kindBinomial && fact.Param < len(call.Args) && fact.Param2 >= 0 && fact.Param2 < len(call.Args) {
			out = append(out, fixes.BinomialCall{Call: call, N: call.Args[fact.Param], K: call.Args[fact.Param2]})
		} else if f := vm.Recognise(res.Values[call]); f.Kind == vm.Binomial && len(call.Args) == 2 {
			out = append(out, fixes.BinomialCall{Call: call, N: call.Args[0], K: call.Args[1]})
		}
		return true
	})
	return out
}

// parenText wraps s in parentheses unless it is one name.
func parenText(s string) string {
	if token.IsIdentifier(s) {
		return s
	}
	return "(" + s + ")"
}

// summedBinomial finds, in the last loop that ends before pos, a statement
// obj += X (or obj = obj + X) whose X, or the local X names, multiplies
// a binomial coefficient C(n, k) by other factors and divides by
// nothing, with k following the loop's counter, the loop able to run
// k up to n/2 at n = first, and n not bounded below first.
func (fc *fnCtx) summedBinomial(res *vm.Result, obj types.Object, pos token.Pos, first int64) (binomTerm, bool) {
	info := fc.c.pass.TypesInfo
	// The last loop before the call that adds to obj is the sum the
	// call reads.
	var last *ast.ForStmt
	var term ast.Expr
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		if n == nil || n.Pos() >= pos {
			return false
		}
		if _, isLit := n.(*ast.FuncLit); isLit {
			return false
		}
		loop, isFor := n.(*ast.ForStmt)
		if !isFor || loop.End() > pos {
			return true
		}
		for _, st := range loop.Body.List {
			if as, isAs := st.(*ast.AssignStmt); isAs {
				if x := addedTo(info, as, obj); x != nil {
					last, term = loop, x
				}
			}
		}
		return true
	})
	if last == nil {
		return binomTerm{}, false
	}
	counter := forCounter(info, last)
	if counter == nil || fc.smallCount(last, counter, first) {
		return binomTerm{}, false
	}
	if id, isID := ast.Unparen(term).(*ast.Ident); isID {
		term = definedIn(info, last.Body, info.Uses[id])
	}
	if term == nil {
		return binomTerm{}, false
	}
	return fc.binomialFactor(res, term, counter, first)
}

// forCounter returns the variable a for loop defines in its init and
// steps in its post statement.
func forCounter(info *types.Info, loop *ast.ForStmt) types.Object {
	init, ok := loop.Init.(*ast.AssignStmt)
	if !ok || init.Tok != token.DEFINE || len(init.Lhs) != 1 || loop.Post == nil {
		return nil
	}
	id, ok := init.Lhs[0].(*ast.Ident)
	if !ok {
		return nil
	}
	obj := info.Defs[id]
	if obj == nil || !mentions(info, loop.Post, obj) {
		return nil
	}
	return obj
}

// smallCount reports whether the loop's condition compares the counter
// with a constant below first/2: k then never reaches the central
// coefficient of an n at which it breaks.
func (fc *fnCtx) smallCount(loop *ast.ForStmt, counter types.Object, first int64) bool {
	info := fc.c.pass.TypesInfo
	for _, cj := range conjunctsOf(loop.Cond) {
		b, ok := ast.Unparen(cj).(*ast.BinaryExpr)
		if !ok {
			continue
		}
		var other ast.Expr
		switch {
		case fc.c.objOf(b.X) == counter:
			other = b.Y
		case fc.c.objOf(b.Y) == counter:
			other = b.X
		default:
			continue
		}
		if tv, ok := info.Types[other]; ok && tv.Value != nil {
			if v, exact := constant.Float64Val(constant.ToFloat(tv.Value)); exact || v != 0 {
				if v < float64(first/2) {
					return true
				}
			}
		}
	}
	return false
}

// conjunctsOf splits a && b && … into its parts.
func conjunctsOf(e ast.Expr) []ast.Expr {
	if b, ok := ast.Unparen(e).(*ast.BinaryExpr); ok && b.Op == token.LAND {
		return append(conjunctsOf(b.X), conjunctsOf(b.Y)...)
	}
	if e == nil {
		return nil
	}
	return []ast.Expr{e}
}

// addedTo returns X of obj += X or obj = obj + X (X not reading obj).
func addedTo(info *types.Info, as *ast.AssignStmt, obj types.Object) ast.Expr {
	if len(as.Lhs) != 1 || len(as.Rhs) != 1 {
		return nil
	}
	if id, ok := ast.Unparen(as.Lhs[0]).(*ast.Ident); !ok || info.ObjectOf(id) != obj {
		return nil
	}
	var x ast.Expr
	switch as.Tok {
	case token.ADD_ASSIGN:
		x = as.Rhs[0]
	case token.ASSIGN:
		b, ok := ast.Unparen(as.Rhs[0]).(*ast.BinaryExpr)
		if !ok || b.Op != token.ADD {
			return nil
		}
		if id, ok := ast.Unparen(b.X).(*ast.Ident); ok && info.ObjectOf(id) == obj {
			x = b.Y
		}
	}
	if x == nil || mentions(info, x, obj) {
		return nil
	}
	return x
}

// definedIn returns the value of v's one assignment in body, nil when
// it has none or several.
func definedIn(info *types.Info, body *ast.BlockStmt, v types.Object) ast.Expr {
	var val ast.Expr
	count := 0
	ast.Inspect(body, func(n ast.Node) bool {
		as, ok := n.(*ast.AssignStmt)
		if !ok {
			return true
		}
		for i, l := range as.Lhs {
			if id, ok := l.(*ast.Ident); ok && info.ObjectOf(id) == v {
				count++
				if len(as.Lhs) == len(as.Rhs) && (as.Tok == token.DEFINE || as.Tok == token.ASSIGN) {
					val = as.Rhs[i]
				} else {
					val = nil
				}
			}
		}
		return true
	})
	if count != 1 {
		return nil
	}
	return val
}

// binomialFactor returns the binomial coefficient x multiplies by its
// other factors: a call of a function with a binomial fact, or a value
// the model names C(n, k). Its k must read the counter and its n must
// not be a constant nor bounded below first.
func (fc *fnCtx) binomialFactor(res *vm.Result, x ast.Expr, counter types.Object, first int64) (binomTerm, bool) {
	var parts []seriesPart
	seriesFactors(x, false, &parts)
	info := fc.c.pass.TypesInfo
	for _, p := range parts {
		if p.den {
			return binomTerm{}, false
		}
	}
	for _, p := range parts {
		e := fc.stripConv(p.x)
		call, ok := e.(*ast.CallExpr)
		if !ok {
			continue
		}
		var nx, kx ast.Expr
		if fact := fc.c.factOf(fc.c.calleeOf(call)); fact != nil && kindOfName(fact.Kind) == kindBinomial && fact.Param < len(call.Args) && fact.Param2 >= 0 && fact.Param2 < len(call.Args) {
			if fact.Safe {
				continue
			}
			nx, kx = call.Args[fact.Param], call.Args[fact.Param2]
		} else if f := vm.Recognise(res.Values[e]); f.Kind == vm.Binomial && len(call.Args) == 2 {
			// A binomial function of (n, k) the model reads through its
			// value fact.
			nx, kx = call.Args[0], call.Args[1]
		} else {
			continue
		}
		if !mentions(info, kx, counter) {
			continue
		}
		if tv, ok := info.Types[nx]; ok && tv.Value != nil {
			continue
		}
		// Below zero the coefficient is 0: only the upper end counts.
		if r := fc.rangeOf(fc.stripConv(nx)); !typeLimit(r.Hi) && r.Hi < first {
			continue
		}
		return binomTerm{n: src(fc.stripConv(nx)), k: src(fc.stripConv(kx)), nx: fc.stripConv(nx)}, true
	}
	return binomTerm{}, false
}

// modelZeroTimesSum reports z *= s or z * s of float variables where s
// is a sum of binomial coefficients that passes float64 (as for
// modelLogSum) and z a sum started at 0 by loops whose trips depend on
// a variable: with no trip z is 0, and 0·(+Inf) is NaN although the
// product is 0. A product under a condition on z is not reported.
func (fc *fnCtx) modelZeroTimesSum(res *vm.Result) {
	c := fc.c
	info := c.pass.TypesInfo
	zeros, sums := zeroSumCandidates(info, funcBody(fc.node))
	if len(zeros) == 0 || len(sums) == 0 {
		return
	}
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		var x, y ast.Expr
		switch n := n.(type) {
		case *ast.FuncLit:
			return false
		case *ast.AssignStmt:
			if n.Tok != token.MUL_ASSIGN || len(n.Lhs) != 1 || len(n.Rhs) != 1 {
				return true
			}
			x, y = n.Lhs[0], n.Rhs[0]
		case *ast.BinaryExpr:
			if n.Op != token.MUL {
				return true
			}
			x, y = n.X, n.Y
		default:
			return true
		}
		t, ok := c.numOf(info.TypeOf(x))
		if !ok || !t.Float || c.reportedAt(n.Pos()) {
			return true
		}
		central := thresholds.CentralBinomial(t.Num)
		for _, p := range [2][2]ast.Expr{{x, y}, {y, x}} {
			z, s := c.objOf(fc.stripConv(p[0])), c.objOf(fc.stripConv(p[1]))
			if z == nil || s == nil || z == s || !zeros[z] || !sums[s] || !fc.zeroUntilTrips(z, n.Pos()) || fc.checksNonFinite(p[1]) {
				continue
			}
			bt, ok := fc.summedBinomial(res, s, n.Pos(), central.FirstBad)
			if !ok {
				continue
			}
			msg := fmt.Sprintf("%s times %s in %s: %s is 0 when the loops that add to it run no trip, and %s, a sum of C(%s, %s), is +Inf once its terms reach C(%s, ⌊%s/2⌋) at %s ≥ %d (C(%d, %d) ≈ %s is the largest central one that fits), so the product is 0·(+Inf) = NaN although its true value is 0",
				z.Name(), s.Name(), t.typeName(), z.Name(), s.Name(), bt.n, bt.k, bt.n, parenText(bt.n), bt.n, central.FirstBad, central.FirstBad-1, (central.FirstBad-1)/2, central.LastGoodApprox())
			fc.report(finding{node: n, cat: catRatio, msg: msg})
			return false
		}
		return true
	})
}

// zeroSumCandidates returns, from one walk of body, the locals defined
// as 0 and the variables something is added to (s += x, s = s + x):
// the only ones zeroUntilTrips and summedBinomial, which each walk the
// whole body, can accept, so that a long function's many products do
// not each cost a walk.
func zeroSumCandidates(info *types.Info, body ast.Node) (zeros, sums map[types.Object]bool) {
	zeros, sums = make(map[types.Object]bool), make(map[types.Object]bool)
	ast.Inspect(body, func(n ast.Node) bool {
		as, ok := n.(*ast.AssignStmt)
		if !ok {
			return true
		}
		for i, l := range as.Lhs {
			id, ok := ast.Unparen(l).(*ast.Ident)
			if !ok {
				continue
			}
			obj := info.ObjectOf(id)
			if obj == nil {
				continue
			}
			if as.Tok == token.DEFINE && len(as.Rhs) == len(as.Lhs) && isZeroConst(info, as.Rhs[i]) {
				zeros[obj] = true
			}
			if addedTo(info, as, obj) != nil {
				sums[obj] = true
			}
		}
		return true
	})
	return zeros, sums
}

// zeroUntilTrips reports whether the float variable z, where pos reads
// it, is a local defined as 0 that only loops add to before pos (or
// that is multiplied, which keeps 0), each
// loop's condition comparing its counter with a variable (so it may run
// no trip), and that no condition around pos tests.
func (fc *fnCtx) zeroUntilTrips(z types.Object, pos token.Pos) bool {
	info := fc.c.pass.TypesInfo
	zero, adds, other, tested := false, 0, false, false
	var loops []*ast.ForStmt
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		switch n := n.(type) {
		case nil:
			return false
		case *ast.ForStmt:
			loops = append(loops, n)
		case *ast.IfStmt:
			if n.Pos() <= pos && pos < n.End() && mentions(info, n.Cond, z) {
				tested = true
			}
		case *ast.AssignStmt:
			if n.Pos() >= pos {
				return true
			}
			for i, l := range n.Lhs {
				if id, ok := ast.Unparen(l).(*ast.Ident); !ok || info.ObjectOf(id) != z {
					continue
				}
				switch {
				case n.Tok == token.DEFINE && len(n.Rhs) == len(n.Lhs) && isZeroConst(info, n.Rhs[i]):
					zero = true
				case addedTo(info, n, z) != nil && fc.inVariableLoop(loops, n):
					adds++
				case n.Tok == token.MUL_ASSIGN:
					// A factor keeps 0 at 0.
				default:
					other = true
				}
			}
		}
		return true
	})
	return zero && adds > 0 && !other && !tested
}

// inVariableLoop reports whether st lies in one of the loops whose
// condition compares a counter with a non-constant bound.
func (fc *fnCtx) inVariableLoop(loops []*ast.ForStmt, st ast.Stmt) bool {
	info := fc.c.pass.TypesInfo
	for _, l := range loops {
		if st.Pos() < l.Body.Pos() || st.End() > l.Body.End() {
			continue
		}
		counter := forCounter(info, l)
		if counter == nil {
			continue
		}
		for _, cj := range conjunctsOf(l.Cond) {
			b, ok := ast.Unparen(cj).(*ast.BinaryExpr)
			if !ok {
				continue
			}
			other := b.Y
			if fc.c.objOf(b.X) != counter {
				other = b.X
			}
			if tv, ok := info.Types[other]; ok && tv.Value == nil && fc.c.objOf(other) != counter {
				return true
			}
		}
	}
	return false
}

// isZeroConst reports whether e is the constant 0.
func isZeroConst(info *types.Info, e ast.Expr) bool {
	tv, ok := info.Types[e]
	if !ok || tv.Value == nil {
		return false
	}
	switch tv.Value.Kind() {
	case constant.Int, constant.Float, constant.Complex:
		return constant.Sign(tv.Value) == 0
	}
	return false // a bool or string constant (x == true) is no number
}
