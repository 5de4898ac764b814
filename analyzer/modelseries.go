package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"math/big"
	"strings"

	"github.com/overfact/overfact/analyzer/thresholds"
	vm "github.com/overfact/overfact/analyzer/valuemodel"
	"github.com/overfact/overfact/fixes"
)

// seriesPart is one factor of a series term that the code forms on its
// own and that grows with the trips: a running power, a running
// factorial or rising factorial, a product an inner loop builds.
type seriesPart struct {
	x   ast.Expr
	val *vm.Term
	den bool // the term divides by it
}

// modelSeries reports the series loops whose term is a ratio of
// products the code keeps apart, each growing with the trips:
//
//	pw *= x * x; f1 *= float64(n + k); f2 *= float64(k)
//	sum += pw / (f1 * f2)                      // Bessel I_n
//
//	divisor := a
//	for i := 1; i <= n; i++ { divisor *= a + float64(i) }
//	sum += math.Pow(x, float64(n)) / divisor   // a power over a rising factorial
//
// The term is finite where the terms of the series are, but a part
// that left its type's range makes it +Inf, 0 or NaN: Inf/finite,
// finite/Inf and Inf/Inf. Convergence loops (a condition of their own
// beside the counter, or instead of one) are judged too: one that stops
// when the terms are small runs on while they are not, which is where
// the parts are large.
func (fc *fnCtx) modelSeries(res *vm.Result) {
	for _, l := range res.Loops {
		if fc.c.reportedAt(l.Stmt.Pos()) {
			continue
		}
		for _, e := range fc.loopTerms(l) {
			if fc.seriesTerm(res, l, e) {
				break
			}
		}
	}
}

// loopTerms returns the right-hand sides the loop's body assigns,
// outside nested loops and closures: the places a term is formed.
func (fc *fnCtx) loopTerms(l *vm.Loop) []ast.Expr {
	var body *ast.BlockStmt
	switch s := l.Stmt.(type) {
	case *ast.ForStmt:
		body = s.Body
	case *ast.RangeStmt:
		body = s.Body
	}
	if body == nil {
		return nil
	}
	var out []ast.Expr
	ast.Inspect(body, func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.FuncLit, *ast.ForStmt, *ast.RangeStmt:
			return false
		case *ast.AssignStmt:
			out = append(out, n.Rhs...)
		}
		return true
	})
	return out
}

// seriesFactors splits e into the factors it multiplies and divides.
func seriesFactors(e ast.Expr, den bool, out *[]seriesPart) {
	switch x := ast.Unparen(e).(type) {
	case *ast.BinaryExpr:
		switch x.Op {
		case token.MUL:
			seriesFactors(x.X, den, out)
			seriesFactors(x.Y, den, out)
			return
		case token.QUO:
			seriesFactors(x.X, den, out)
			seriesFactors(x.Y, !den, out)
			return
		}
	case *ast.UnaryExpr:
		if x.Op == token.SUB || x.Op == token.ADD {
			seriesFactors(x.X, den, out)
			return
		}
	}
	*out = append(*out, seriesPart{x: e, den: den})
}

// grows reports whether t has a factor that grows without bound with
// the trip index: Γ of an argument rising with it, or a power of a
// variable whose exponent rises with it.
func grows(t *vm.Term, iter vm.Sym) bool {
	if t == nil {
		return false
	}
	for _, g := range t.Gamma {
		if g.Pow > 0 && g.Arg.Coef(iter).Sign() > 0 {
			return true
		}
	}
	for _, p := range t.Pows {
		if !p.Base.IsConst() && p.Exp.Coef(iter).Sign() > 0 {
			return true
		}
	}
	return false
}

// seriesTerm judges one term of the loop; true when it reported.
func (fc *fnCtx) seriesTerm(res *vm.Result, l *vm.Loop, e ast.Expr) bool {
	b, ok := ast.Unparen(e).(*ast.BinaryExpr)
	if !ok || (b.Op != token.QUO && b.Op != token.MUL) || fc.c.reportedAt(e.Pos()) {
		return false
	}
	t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(e))
	if !ok || !t.Float {
		return false
	}
	up, down := fc.growingParts(res, l, e)
	if len(up) == 0 || len(down) == 0 {
		return false
	}
	// The parts that can leave the range within the loop's trips, and
	// the first statement of where.
	// Name the trip by the loop's counter where it has one.
	trip := "trip t (from 0)"
	name := namer{iter: l.Iter, back: vm.Var(l.Iter)}
	if l.Counter != nil && l.Step.Sign() != 0 {
		j := vm.Var(vm.Sym{Obj: l.Counter})
		name.back = j.Sub(l.From).Scale(new(big.Rat).Inv(l.Step))
		trip = "the trip of " + l.Counter.Name()
	}
	term := res.Values[e]
	what := "a ratio of products"
	if term != nil {
		what = name.term(term)
	}
	var why []string
	for _, p := range append(up, down...) {
		if s, ok := fc.partBreaks(l, p, t, name); ok {
			why = append(why, s)
		}
	}
	if len(why) == 0 {
		return false
	}
	exits := ""
	if l.Exits {
		exits = "; the loop may stop early, but one that stops when the terms are small runs on where they are not"
	}
	msg := fmt.Sprintf("series term %s computes %s on %s, from parts formed apart that each grow with the trips: %s; past that the term is +Inf, 0 or NaN although it is finite%s",
		src(e), what, trip, strings.Join(why, "; "), exits)
	m := fc.seriesTermFix(res, l, e, up, down)
	if m == nil {
		m = fc.logSpaceTermFix(e, up, down)
	}
	fc.report(finding{node: e, cat: catPowOverFac, msg: msg, match: m})
	return true
}

// logSpaceTermFix describes, for the fixer, a term whose growing parts
// the rewrite carries as products in log space (fixes/logproduct.go):
// the fixer checks on its own that each is a running product it can
// carry, and the rewrite keeps every value the float64 arithmetic got
// right, so the model vouches for nothing here.
func (fc *fnCtx) logSpaceTermFix(e ast.Expr, up, down []seriesPart) *fixes.Match {
	var args []ast.Expr
	for _, p := range append(up, down...) {
		args = append(args, ast.Unparen(p.x))
	}
	return &fixes.Match{
		Shape:  fixes.ShapeLogSpaceTerm,
		Node:   e,
		Args:   args,
		Result: fc.c.pass.TypesInfo.TypeOf(e),
		Func:   fc.node,
	}
}

// formedApart reports whether x is a value the code keeps as a number
// of its own: a variable or a call (math.Pow), not an inline factor.
func (fc *fnCtx) formedApart(x ast.Expr) bool {
	switch x := fc.stripConv(x).(type) {
	case *ast.Ident:
		return true
	case *ast.CallExpr:
		return fc.c.isMathFunc(x, "Pow") || fc.c.isMathFunc(x, "Gamma")
	}
	return false
}

// partBreaks says where the part leaves t within the loop: for a
// factorial of integers, the argument from which it does (the
// factorial threshold); for Γ of another argument, the Γ threshold;
// for a rising or falling product or a power of a variable, that it
// does once its operands are large enough. ok is false when the part
// stays in range over every trip the loop can make.
func (fc *fnCtx) partBreaks(l *vm.Loop, p seriesPart, t numType, name namer) (string, bool) {
	last := func(a vm.Affine) vm.Affine { return a.Subst(l.Iter, l.Count.Shift(-1)) }
	gammaFirst := thresholds.GammaFirstBad(t.Num)
	val := name.term(p.val)
	for _, g := range p.val.Gamma {
		if g.Pow <= 0 || g.Arg.Coef(l.Iter).Sign() <= 0 {
			continue
		}
		if c, ok := last(g.Arg).At(nil); ok {
			// A constant trip count and start: the part is in range
			// over every trip when its last argument is.
			if f, _ := c.Float64(); f < gammaFirst {
				continue
			}
		}
		if len(p.val.Gamma) == 1 && g.Pow == 1 && len(p.val.Pows) == 0 {
			arg := name.affine(g.Arg.Shift(-1))
			if fc.integerArg(g.Arg) {
				F := thresholds.Factorial(t.Num).FirstBad
				return fmt.Sprintf("%s holds %s, which %s once %s ≥ %d (%s)", src(p.x), factorialOf(g.Arg.Shift(-1).Subst(name.iter, name.back), arg), verb(t), arg, F, largestFits(kindFactorial, t)), true
			}
			arg = name.affine(g.Arg)
			return fmt.Sprintf("%s holds Γ(%s), which %s once %s ≥ %s", src(p.x), arg, verb(t), arg, fmtFloat(gammaFirst)), true
		}
		return fmt.Sprintf("%s holds %s, which %s once it passes the largest %s, for large enough operands", src(p.x), val, verb(t), t.typeName()), true
	}
	for _, pw := range p.val.Pows {
		if pw.Base.IsConst() || pw.Exp.Coef(l.Iter).Sign() <= 0 {
			continue
		}
		if len(p.val.Pows) == 1 && len(p.val.Gamma) == 0 && p.val.Coef.Cmp(big.NewRat(1, 1)) == 0 {
			// x^e alone: the first |x| at which its last trip's power
			// leaves the type.
			// Past 2^16 factors the bisection's exact powers cost more
			// than a message is worth.
			if e, ok := last(pw.Exp).At(nil); ok && e.IsInt() && e.Num().IsInt64() && e.Sign() > 0 && e.Num().Int64() <= 1<<16 {
				k := e.Num().Int64()
				return fmt.Sprintf("%s holds %s, which %s on the loop's last trip, at %s^%d, for |%s| ≥ %s", src(p.x), val, verb(t), parenAffine(pw.Base), k, pw.Base, fmtFloat(thresholds.PowerBaseFirstBad(t.Num, k))), true
			}
		}
		return fmt.Sprintf("%s holds %s, which %s once it passes the largest %s, for |%s| large enough", src(p.x), val, verb(t), t.typeName(), pw.Base), true
	}
	return "", false
}

// factorialOf writes name! for the form a, in parentheses unless a is one
// variable.
func factorialOf(a vm.Affine, name string) string {
	if _, ok := plainVar(a); ok || a.IsConst() {
		return name + "!"
	}
	return "(" + name + ")!"
}

// namer writes the forms of a loop in the code's names: the trip
// index as the loop's counter where it has one.
type namer struct {
	iter vm.Sym
	back vm.Affine // the trip index in the counter
}

func (n namer) term(t *vm.Term) string { return t.Subst(n.iter, n.back).String() }

func (n namer) affine(a vm.Affine) string { return a.Subst(n.iter, n.back).String() }

// integerArg reports whether every variable of a has an integer type
// (the trip index has one), so that a is an integer with it.
func (fc *fnCtx) integerArg(a vm.Affine) bool {
	if !a.Integral() {
		return false
	}
	for _, s := range a.Syms() {
		if s.Loop != nil {
			continue
		}
		typ := s.Obj.Type()
		if s.Field != nil {
			typ = s.Field.Type()
		}
		if n, ok := fc.c.numOf(typ); !ok || n.Float {
			return false
		}
	}
	return true
}

// seriesTermFix describes, for the fixer, a term math.Pow(x, k)·…/acc
// whose divisor the model knows to hold k! where the term reads it, a
// running factorial of the loop multiplied on every trip (the update
// may be guarded) that starts at 1: the term becomes
// lgamma.PowOverFactorial(x, k)·… and acc goes. nil for any other
// term.
func (fc *fnCtx) seriesTermFix(res *vm.Result, l *vm.Loop, e ast.Expr, up, down []seriesPart) *fixes.Match {
	if len(up) != 1 || len(down) != 1 {
		return nil
	}
	call, ok := fc.stripConv(up[0].x).(*ast.CallExpr)
	if !ok || !fc.c.isMathFunc(call, "Pow") || len(call.Args) != 2 {
		return nil
	}
	pw := up[0].val
	if pw.Coef.Cmp(big.NewRat(1, 1)) != 0 || len(pw.Pows) != 1 || len(pw.Gamma) != 0 || pw.SqrtPi != 0 {
		return nil
	}
	k := pw.Pows[0].Exp
	f := vm.Recognise(down[0].val)
	if f.Kind != vm.Fact || !f.Args[0].Equal(k) || down[0].val.Coef.Cmp(big.NewRat(1, 1)) != 0 {
		return nil
	}
	// The fixer passes a float exponent as int(k): it must be a whole
	// number on every trip, as the trip index's integral forms are.
	if !fc.integerArg(k) {
		return nil
	}
	id, ok := ast.Unparen(down[0].x).(*ast.Ident)
	if !ok {
		return nil
	}
	acc := fc.c.pass.TypesInfo.Uses[id]
	var a *vm.Acc
	for _, x := range l.Accs {
		if x.Obj == acc {
			a = x
		}
	}
	if a == nil || a.Init == nil || l.Exits && !exitsAfter(l.Stmt, e, a) {
		return nil
	}
	if c, ok := a.Init.IsConst(); !ok || c.Cmp(big.NewRat(1, 1)) != 0 {
		return nil
	}
	for _, op := range a.Ops {
		if !op.Mul {
			return nil
		}
	}
	// The term must divide by acc directly: X / acc.
	var quo *ast.BinaryExpr
	ast.Inspect(e, func(n ast.Node) bool {
		if b, ok := n.(*ast.BinaryExpr); ok && b.Op == token.QUO && ast.Unparen(b.Y) == down[0].x && quo == nil {
			quo = b
		}
		return quo == nil
	})
	if quo == nil || !(quo.X.Pos() <= call.Pos() && call.End() <= quo.X.End()) {
		return nil
	}
	return &fixes.Match{
		Shape:  fixes.ShapeModelSeriesTerm,
		Node:   quo,
		Args:   []ast.Expr{call.Args[0], call.Args[1]},
		Extra:  []ast.Expr{call},
		Result: fc.c.pass.TypesInfo.TypeOf(quo),
		Acc:    acc,
		Loop:   l.Stmt,
		Func:   fc.node,
	}
}

// exitsAfter reports whether every way out of the loop's trip (break,
// continue, goto, return) comes after the term e and after every update
// of a: a trip that leaves early has then formed a and read the term as
// a full trip does, and the model's value of a where the term reads it
// holds on every trip.
func exitsAfter(loop ast.Stmt, e ast.Expr, a *vm.Acc) bool {
	last := e.End()
	for _, op := range a.Ops {
		if op.Stmt.End() > last {
			last = op.Stmt.End()
		}
	}
	ok := true
	ast.Inspect(loop, func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.FuncLit:
			return false
		case *ast.BranchStmt, *ast.ReturnStmt:
			if n.Pos() < last {
				ok = false
			}
		}
		return ok
	})
	return ok
}

// runningTermFix finds the term of the loop that divides a power by
// the running factorial a, for the fix of a finding made at the loop.
func (fc *fnCtx) runningTermFix(res *vm.Result, l *vm.Loop, a *vm.Acc) *fixes.Match {
	for _, e := range fc.loopTerms(l) {
		up, down := fc.growingParts(res, l, e)
		if len(down) == 1 && mentions(fc.c.pass.TypesInfo, down[0].x, a.Obj) {
			return fc.seriesTermFix(res, l, e, up, down)
		}
	}
	return nil
}

// growingParts splits the term e into its factors and returns those
// the code holds apart that grow with the trips, multiplied and
// divided.
func (fc *fnCtx) growingParts(res *vm.Result, l *vm.Loop, e ast.Expr) (up, down []seriesPart) {
	var parts []seriesPart
	seriesFactors(e, false, &parts)
	for _, p := range parts {
		p.val = res.Values[p.x]
		if !grows(p.val, l.Iter) || !fc.formedApart(p.x) {
			continue
		}
		if p.den {
			down = append(down, p)
		} else {
			up = append(up, p)
		}
	}
	return up, down
}
