package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"math"
	"math/big"

	"golang.org/x/tools/go/analysis"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/analyzer/thresholds"
	vm "github.com/overfact/overfact/analyzer/valuemodel"
	"github.com/overfact/overfact/fixes"
	"github.com/overfact/overfact/internal/assigned"
)

// modelMaxNodes caps the syntax nodes the value model evaluates in one
// function; past it the rest of the function is unknown to the model.
const modelMaxNodes = vm.DefaultMaxNodes

// evalModel runs the value model over the function.
func (fc *fnCtx) evalModel() *vm.Result {
	res := vm.Evaluate(fc.c.pass.TypesInfo, fc.node, vm.Options{Callee: fc.modelCallee, LogCallee: fc.logCallee, LogGamma: fc.c.isLgammaCall, MaxNodes: modelMaxNodes})
	switch {
	case !debug || !res.Capped:
	case res.Failed != "":
		fmt.Fprintf(debugOut, "overfact: %s: value model failed (%s); the function is not modelled\n", fc.c.pass.Fset.Position(fc.node.Pos()), res.Failed)
	default:
		fmt.Fprintf(debugOut, "overfact: %s: value model stopped at %d syntax nodes; the rest of the function is not modelled\n", fc.c.pass.Fset.Position(fc.node.Pos()), modelMaxNodes)
	}
	return res
}

// modelOnce returns a function that evaluates fc's value model on its
// first call and gives that result on every later one: the checks of one
// function (checkModel, checkModelCalls, checkStirling) share one
// evaluation instead of walking the function once each.
func (fc *fnCtx) modelOnce() func() *vm.Result {
	var res *vm.Result
	return func() *vm.Result {
		if res == nil {
			res = fc.evalModel()
		}
		return res
	}
}

// modelCallee gives the value of a call of a function with a factorial
// fact, in the algebra.
func (fc *fnCtx) modelCallee(call *ast.CallExpr, args []*vm.Term) *vm.Term {
	fact := fc.c.factOf(fc.c.calleeOf(call))
	if fact == nil {
		return fc.valueCallee(call, args)
	}
	if fact.Param >= len(args) {
		return nil
	}
	n, ok := args[fact.Param].Affine()
	if !ok {
		return nil
	}
	var k vm.Affine
	if fact.Param2 >= 0 {
		if fact.Param2 >= len(args) {
			return nil
		}
		if k, ok = args[fact.Param2].Affine(); !ok {
			return nil
		}
	}
	switch kindOfName(fact.Kind) {
	case kindFactorial:
		return vm.Factorial(n.Shift(fact.Offset))
	case kindFalling:
		return vm.Factorial(n).Div(vm.Factorial(n.Sub(k)))
	case kindRising:
		return vm.GammaOf(k.Add(n)).Div(vm.GammaOf(k))
	case kindBinomial:
		return vm.Factorial(n).Div(vm.Factorial(k).Mul(vm.Factorial(n.Sub(k))))
	}
	return nil
}

// checkModel reports, from the value model, what the loops of the
// function compute where it leaves its type and no matcher reported the
// loop: one finding per root cause.
func (fc *fnCtx) checkModel(model func() *vm.Result) {
	if !fc.modelWorth() {
		return
	}
	res := model()
	judged := make(map[ast.Stmt]bool)
	for _, e := range fc.modelRoots(res) {
		fc.modelRatio(res, e, judged)
	}
	for _, l := range res.Loops {
		if judged[l.Stmt] {
			continue
		}
		// A while-style loop consumes a variable the code often bounds
		// only through a derived value (q := math.Abs(x); if q > 33
		// { return }; for x >= 3 { x--; z *= x } in std's math.Gamma),
		// which the range analysis does not follow: precision first,
		// only loops with a counter of their own are judged.
		if l.Counter == nil || l.Exits || fc.c.reportedAt(l.Stmt.Pos()) || fc.decidedAtCalls(l.Stmt) || fc.keptLoop(l.Stmt) {
			continue
		}
		mc := &modelCtx{fc: fc, res: res, loop: l}
		for _, a := range l.Accs {
			t, ok := fc.c.numOf(a.Obj.Type())
			if !ok {
				continue
			}
			if mc.runningFactorial(a, t) || mc.poissonRun(a, t) || mc.runStart(a, t) || mc.binomialPeak(a, t) || mc.binomialLoop(a, t) || mc.factorialLoop(a, t) || mc.fallingLoop(a, t) || mc.stepProduct(a, t) || mc.factorialProduct(a, t) {
				break
			}
		}
	}
	fc.modelSeries(res)
	fc.modelCountRatio(res)
	fc.modelLogSum(res)
	fc.modelZeroTimesSum(res)
	fc.modelRunningSum(res)
	for _, e := range fc.modelRoots(res) {
		fc.modelPMF(res, e)
	}
}

// reportedAt reports whether a finding of any category starts at pos:
// every finding is of a pattern's category (directives are reported
// apart), so one search of reportedPos answers for all of them.
func (c *checker) reportedAt(pos token.Pos) bool {
	return c.reportedIn(pos, pos+1)
}

// modelCtx is one loop of the model being judged.
type modelCtx struct {
	fc   *fnCtx
	res  *vm.Result
	loop *vm.Loop
}

// oneVar splits a into α·v + β for its one variable v.
func oneVar(a vm.Affine) (vm.Sym, *big.Rat, *big.Rat, bool) {
	if len(a.Terms) != 1 {
		return vm.Sym{}, nil, nil, false
	}
	return a.Terms[0].Sym, a.Terms[0].K, a.C, true
}

// plainVar returns the variable a is, when a is exactly one variable
// (coefficient 1, no constant).
func plainVar(a vm.Affine) (vm.Sym, bool) {
	v, alpha, beta, ok := oneVar(a)
	return v, ok && alpha.Cmp(big.NewRat(1, 1)) == 0 && beta.Sign() == 0
}

// countRanges returns the variable n of a form over (n, k) and the
// ranges of n and k where the loop starts, with k's name as the form
// writes it. A k that is no plain variable has an unknown range, or,
// with constK, the point it is when it is an integer constant; ok is
// false when n is no plain variable, or k neither a variable nor (with
// constK) a constant.
func (mc *modelCtx) countRanges(f vm.Form, constK bool) (nv vm.Sym, n, k ranges.Interval, kName string, ok bool) {
	nv, ok = plainVar(f.Args[0])
	if !ok {
		return nv, n, k, "", false
	}
	fc := mc.fc
	n = fc.symRange(mc.res, nv, mc.loop.Stmt)
	k = ranges.Top()
	kName = f.Args[1].String()
	switch kv, isVar := plainVar(f.Args[1]); {
	case isVar:
		k = fc.symRange(mc.res, kv, mc.loop.Stmt)
	case !constK:
	case !f.Args[1].IsConst():
		return nv, n, k, kName, false
	default:
		if c := f.Args[1].C; c.IsInt() && c.Num().IsInt64() {
			k = ranges.Point(c.Num().Int64())
		}
	}
	return nv, n, k, kName, true
}

// firstAt returns the smallest integer v with α·v + β ≥ f, for α > 0.
func firstAt(alpha, beta *big.Rat, f int64) (int64, bool) {
	return firstAtRat(alpha, beta, big.NewRat(f, 1))
}

// symRange returns the range of a variable of the model at node at.
func (fc *fnCtx) symRange(res *vm.Result, s vm.Sym, at ast.Node) ranges.Interval {
	switch {
	case s.Loop != nil || s.Obj == nil:
		return ranges.Top()
	case s.Field != nil:
		// A read of the field inside at, where the guards before it
		// hold; else the first read the model met.
		var in ast.Expr
		ast.Inspect(at, func(n ast.Node) bool {
			if sel, ok := n.(*ast.SelectorExpr); ok && in == nil && fc.c.objOf(sel.X) == s.Obj && fc.c.pass.TypesInfo.ObjectOf(sel.Sel) == s.Field {
				in = sel
			}
			if fc.isLenOf(n, s) && in == nil {
				in = n.(ast.Expr)
			}
			return in == nil
		})
		if in == nil && fc.isLenSym(s) {
			if r, ok := fc.lenBefore(s, at); ok {
				return r.Meet(fc.lenLocalRange(s, at))
			}
		}
		if fv, ok := s.Field.(*types.Var); ok && in == nil {
			// The guards before at bound a field of a struct variable
			// as they bound a variable.
			if r := fc.ranges().FieldAt(s.Obj, fv, at); !r.IsTop() {
				return r
			}
		}
		if in == nil {
			in = res.Exprs[s]
		}
		if in != nil {
			return fc.rangeOf(in).Meet(fc.lenLocalRange(s, at))
		}
		return ranges.Top()
	}
	return fc.entryRange(s.Obj, at)
}

// isLenSym reports whether s is the model's variable len(x).
func (fc *fnCtx) isLenSym(s vm.Sym) bool {
	b, ok := s.Obj.(*types.Builtin)
	return ok && b.Name() == "len" && s.Field != nil
}

// isLenOf reports whether n is a call len(x) of s = len(x).
func (fc *fnCtx) isLenOf(n ast.Node, s vm.Sym) bool {
	call, ok := n.(*ast.CallExpr)
	if !ok || len(call.Args) != 1 || !fc.isLenSym(s) || fc.c.objOf(call.Args[0]) != s.Field {
		return false
	}
	b, ok := fc.c.pass.TypesInfo.Uses[calleeIdent(call)].(*types.Builtin)
	return ok && b.Name() == "len"
}

// lenBefore is the range of len(x) at at from its reads in the simple
// statements that run before at whenever at runs (earlier statements of
// a block that holds at, outside closures and the right operands of &&
// and ||): x keeps one length, so a bound at any of them holds at at
// too (c := make(T, len(cp)) after a guard on len(cp)).
func (fc *fnCtx) lenBefore(s vm.Sym, at ast.Node) (ranges.Interval, bool) {
	r, found := ranges.Top(), false
	var reads func(n ast.Node)
	reads = func(n ast.Node) {
		ast.Inspect(n, func(m ast.Node) bool {
			switch m := m.(type) {
			case *ast.FuncLit:
				return false
			case *ast.BinaryExpr:
				if m.Op == token.LAND || m.Op == token.LOR {
					reads(m.X)
					return false
				}
			}
			if fc.isLenOf(m, s) {
				r, found = r.Meet(fc.rangeOf(m.(ast.Expr))), true
			}
			return true
		})
	}
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		if n == nil || at.Pos() < n.Pos() || at.End() > n.End() {
			return false // not on the path to at
		}
		var list []ast.Stmt
		switch b := n.(type) {
		case *ast.BlockStmt:
			list = b.List
		case *ast.CaseClause:
			list = b.Body
		case *ast.FuncLit:
			return false
		}
		for _, st := range list {
			if st.Pos() > at.Pos() {
				break
			}
			switch st.(type) {
			case *ast.AssignStmt, *ast.DeclStmt, *ast.ExprStmt:
				if st.End() <= at.Pos() {
					reads(st)
				}
			}
		}
		return true
	})
	return r, found
}

// lenLocalRange is the range at at of the locals the function defines
// once as len(x), for the model's variable len(x): a bound the code or
// a directive puts on n := len(batch) bounds len(batch) too. Top for
// any other variable.
func (fc *fnCtx) lenLocalRange(s vm.Sym, at ast.Node) ranges.Interval {
	r := ranges.Top()
	if _, ok := s.Obj.(*types.Builtin); !ok || s.Field == nil {
		return r
	}
	info := fc.c.pass.TypesInfo
	writes := make(map[types.Object]int)
	assigned.Each(info, fc.node, nil, func(v types.Object, _ ast.Node) bool {
		writes[v]++
		return true
	})
	ast.Inspect(fc.node, func(n ast.Node) bool {
		as, ok := n.(*ast.AssignStmt)
		if !ok || as.Tok != token.DEFINE || len(as.Lhs) != 1 || len(as.Rhs) != 1 {
			return true
		}
		call, ok := ast.Unparen(as.Rhs[0]).(*ast.CallExpr)
		if !ok || len(call.Args) != 1 || fc.c.objOf(call.Args[0]) != s.Field {
			return true
		}
		if b, ok := info.Uses[calleeIdent(call)].(*types.Builtin); !ok || b.Name() != "len" {
			return true
		}
		if v := fc.c.objOf(as.Lhs[0]); v != nil && writes[v] == 1 {
			r = r.Meet(fc.entryRange(v, at))
		}
		return true
	})
	return r
}

// calleeIdent is the identifier a call names as its function, or nil.
func calleeIdent(call *ast.CallExpr) *ast.Ident {
	id, _ := ast.Unparen(call.Fun).(*ast.Ident)
	return id
}

// counterArg rewrites a form in the trip index t as a form in the
// loop's counter j = From + Step·t.
func (mc *modelCtx) counterArg(a vm.Affine) (vm.Affine, bool) {
	l := mc.loop
	if l.Counter == nil {
		return a, !a.Has(l.Iter)
	}
	j := vm.Var(vm.Sym{Obj: l.Counter})
	// t = (j − From)/Step
	t := j.Sub(l.From).Scale(new(big.Rat).Inv(l.Step))
	return a.Subst(l.Iter, t), true
}

// reach returns the variable that decides how many trips the loop
// makes and the first value of it at which trip tBad runs: the trip
// count α·v + β must pass tBad.
func (mc *modelCtx) reach(tBad int64) (vm.Sym, int64, bool) {
	v, alpha, beta, ok := oneVar(mc.loop.Count)
	if !ok {
		return vm.Sym{}, 0, false
	}
	first, ok := firstAt(alpha, beta, tBad+1)
	return v, first, ok
}

// factorialLoop reports an accumulator that ends as n! of a loop the
// matchers did not read, such as one counting in float64.
func (mc *modelCtx) factorialLoop(a *vm.Acc, t numType) bool {
	if a.Guarded || len(a.Ops) == 0 || len(mc.loop.Sums) > 0 {
		return false
	}
	f := vm.Recognise(a.After)
	if f.Kind != vm.Fact {
		return false
	}
	v, alpha, beta, ok := oneVar(f.Args[0])
	if !ok || !beta.IsInt() || !alpha.IsInt() {
		return false
	}
	F := thresholds.Factorial(t.Num).FirstBad
	first, ok := firstAt(alpha, beta, F)
	if !ok {
		return false
	}
	fc := mc.fc
	r := fc.symRange(mc.res, v, mc.loop.Stmt)
	j := decideName(v.Name(), r, first)
	if j.silent {
		return true
	}
	clause, definite := j.clause, j.definite
	var msg string
	if alpha.Cmp(big.NewRat(1, 1)) == 0 {
		msg = factorialLimitText(kindFactorial, v.Name(), beta.Num().Int64(), t)
	} else {
		msg = fmt.Sprintf("factorial of %s in %s %s for %s ≥ %d (%s)", f.Args[0], t.typeName(), verb(t), v.Name(), first, largestFits(kindFactorial, t))
	}
	fc.report(finding{node: mc.loop.Stmt, cat: catLoop, definite: definite, msg: msg + clause})
	return true
}

// runningFactorial reports a factorial kept inside the summation loop
// that divides by it, fact *= k; sum += pow(a, k)/fact (Erlang B and
// C, Poisson CDFs, Bessel and Taylor series): past its threshold the
// accumulator is +Inf (or wraps) and each term is 0 or NaN, although
// the terms and the sum are finite.
func (mc *modelCtx) runningFactorial(a *vm.Acc, t numType) bool {
	l := mc.loop
	if len(l.Sums) == 0 || len(a.Ops) == 0 {
		return false
	}
	last := a.Ops[len(a.Ops)-1]
	for _, op := range a.Ops {
		if !op.Mul {
			return false
		}
	}
	run := vm.Recognise(last.After)
	if run.Kind != vm.Fact || !run.Args[0].Has(l.Iter) {
		return false
	}
	divides := false
	for _, s := range l.Sums {
		if s.Sum.Term == nil {
			continue
		}
		for _, g := range s.Sum.Term.Gamma {
			if g.Pow < 0 && g.Arg.Equal(run.Args[0].Shift(1)) {
				divides = true
			}
		}
	}
	if !divides {
		return false
	}
	// The running value is (α·t + β)!: the first bad trip and its
	// counter value.
	alpha, beta := run.Args[0].Coef(l.Iter), run.Args[0].Sub(vm.Var(l.Iter).Scale(run.Args[0].Coef(l.Iter)))
	if !beta.IsConst() {
		return false
	}
	F := firstBadOf(kindFactorial, t)
	tBad, ok := firstAt(alpha, beta.C, F)
	if !ok {
		return false
	}
	arg, ok := mc.counterArg(run.Args[0])
	if !ok {
		return false
	}
	v, first, ok := mc.reach(tBad)
	if !ok {
		return false
	}
	fc := mc.fc
	r := fc.symRange(mc.res, v, l.Stmt)
	j := decideName(v.Name(), r, first)
	if j.silent {
		return true
	}
	clause, definite := j.clause, j.definite
	jBad := tBad
	if l.Counter != nil {
		jv, _ := l.From.Add(vm.Int(tBad).Scale(l.Step)).At(nil)
		if jv != nil && jv.IsInt() {
			jBad = jv.Num().Int64()
		}
	}
	at := ""
	if l.Counter != nil {
		at = fmt.Sprintf(" from %s = %d", l.Counter.Name(), jBad)
	}
	msg := fmt.Sprintf("running factorial %s computes %s inside the sum that divides by it: in %s it %s%s (%s), after which each term is 0 or NaN although the terms are finite; the loop reaches that trip for %s ≥ %d",
		a.Obj.Name(), vm.Recognise(vm.Factorial(arg)), t.typeName(), verb(t), at, largestFits(kindFactorial, t), v.Name(), first)
	fc.report(finding{node: l.Stmt, cat: catPowOverFac, definite: definite, msg: msg + clause, match: fc.runningTermFix(mc.res, l, a)})
	return true
}

// poissonRun reports a running product started at math.Exp(−λ) that
// computes the Poisson terms λ^k·e^(−λ)/k! one factor at a time: the
// start underflows in float64 while the terms near k = λ are not small.
func (mc *modelCtx) poissonRun(a *vm.Acc, t numType) bool {
	if len(a.Ops) == 0 || a.Init == nil || !t.Float {
		return false
	}
	// e^(−λ) with λ one variable of coefficient 1.
	lam, k, _, ok := oneVar(a.Init.Exp)
	if !ok || k.Cmp(big.NewRat(-1, 1)) != 0 || len(a.Init.Gamma) > 0 || len(a.Init.Pows) > 0 {
		return false
	}
	last := a.Ops[len(a.Ops)-1]
	if vm.Recognise(last.After).Kind != vm.Poisson {
		return false
	}
	sub, zero := thresholds.ExpUnderflow(t.Num)
	if math.IsInf(zero, 1) {
		return false
	}
	fc := mc.fc
	r := fc.symRange(mc.res, lam, mc.loop.Stmt)
	first := int64(math.Ceil(sub))
	j := decideName(lam.Name(), r, first)
	if j.silent {
		return true
	}
	clause, definite := j.clause, j.definite
	msg := fmt.Sprintf("running product %s computes the Poisson terms %s^k·e^(−%s)/k! from math.Exp(-%s), which in %s loses its digits for %s > %s and is 0 for %s ≥ %s, after which every term is wrong or 0 although the terms near k = %s are not small",
		a.Obj.Name(), lam.Name(), lam.Name(), lam.Name(), t.typeName(), lam.Name(), fmtFloat(sub), lam.Name(), fmtFloat(zero), lam.Name())
	fc.report(finding{node: mc.loop.Stmt, cat: catPowOverFac, definite: definite, msg: msg + clause, match: mc.poissonRunFix(a, lam)})
	return true
}

// poissonRunFix is the fix of a running Poisson product: the one
// statement that updates it becomes the term itself, taken from the
// helper in log space, so that the loop keeps every other use of it
// (a sum, a return after the loop). It vouches for what the model
// knows: after that statement on each trip the accumulator holds
// λ^k·e^(−λ)/k! for the loop's counter k, an integer (a float counter
// starts at an integer and steps by 1).
func (mc *modelCtx) poissonRunFix(a *vm.Acc, lam vm.Sym) *fixes.Match {
	l := mc.loop
	if a.Guarded || l.Counter == nil || lam.Obj == nil || lam.Field != nil || lam.Loop != nil || lam.Def != nil {
		return nil
	}
	if a.Init.Coef.Cmp(big.NewRat(1, 1)) != 0 {
		return nil
	}
	stmt := a.Ops[0].Stmt
	for _, op := range a.Ops {
		if op.Stmt != stmt {
			return nil
		}
	}
	last := a.Ops[len(a.Ops)-1].After
	if last == nil {
		return nil
	}
	f := vm.Recognise(last)
	if f.Kind != vm.Poisson || last.Coef.Cmp(big.NewRat(1, 1)) != 0 {
		return nil
	}
	if x, ok := plainVar(f.Args[0]); !ok || x != lam {
		return nil
	}
	k, ok := mc.counterArg(f.Args[1])
	if kv, isVar := plainVar(k); !ok || !isVar || kv.Obj != l.Counter {
		return nil
	}
	if ct, ok := l.Counter.Type().Underlying().(*types.Basic); !ok || ct.Info()&types.IsInteger == 0 {
		// A float counter counts whole numbers only from a whole start
		// by unit steps.
		from, ok := l.From.At(nil)
		if !ok || from == nil || !from.IsInt() || l.Step.Cmp(big.NewRat(1, 1)) != 0 {
			return nil
		}
	}
	info := mc.fc.c.pass.TypesInfo
	var kx, lx ast.Expr
	ast.Inspect(stmt, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok {
			switch info.Uses[id] {
			case l.Counter:
				kx = id
			case lam.Obj:
				lx = id
			}
		}
		return true
	})
	if kx == nil || lx == nil {
		return nil
	}
	return &fixes.Match{
		Shape:  fixes.ShapeModelPoissonRun,
		Node:   stmt,
		Args:   []ast.Expr{kx, lx},
		Result: a.Obj.Type(),
		Acc:    a.Obj,
		Loop:   l.Stmt,
		Func:   mc.fc.node,
	}
}

func fmtFloat(x float64) string { return fmt.Sprintf("%.6g", x) }

// binomialLoop reports a multiplicative binomial loop that multiplies
// before it divides, in any arrangement, in a float type or over
// operands the matchers do not read (struct fields, receivers).
func (mc *modelCtx) binomialLoop(a *vm.Acc, t numType) bool {
	f := vm.Recognise(a.After)
	if f.Kind != vm.Binomial || a.Guarded {
		return false
	}
	// The product is formed before the division when a multiplication
	// by a growing integer factor is an op of its own before a
	// division.
	var mul *vm.Op
	for i := range a.Ops {
		op := &a.Ops[i]
		if op.Mul && mul == nil {
			if _, ok := op.By.Affine(); ok {
				mul = op
			}
		}
		if !op.Mul && mul != nil {
			break
		}
		if !op.Mul && mul == nil {
			return false
		}
	}
	if mul == nil {
		return true
	}
	by, _ := mul.By.Affine()
	down := by.Coef(mc.loop.Iter).Sign() < 0
	nv, n, k, kName, ok := mc.countRanges(f, false)
	if !ok {
		return false
	}
	if n.IsEmpty() || k.IsEmpty() {
		return true
	}
	fc := mc.fc
	fits := func(n, k int64) bool {
		if down {
			return thresholds.BinomialLoopDownFits(t.Num, n, k)
		}
		return thresholds.BinomialLoopFits(t.Num, n, k)
	}
	lim := thresholds.CentralBinomialLoop(t.Num)
	// The largest intermediate over every k ≤ n is at k = ⌈n/2⌉, one
	// past the central limit's k = ⌊n/2⌋ for odd n: a margin of one n
	// covers it.
	if bounded(n) && k.Lo >= 0 && n.Hi < lim.FirstBad-1 {
		return true
	}
	if bounded(n) {
		lo, hi := max(k.Lo, 0), min(k.Hi, n.Hi)
		safe := hi-lo <= maxBinomialScan
		for kk := lo; safe && kk <= hi; kk++ {
			safe = fits(n.Hi, kk)
		}
		if safe {
			return true
		}
	}
	central := thresholds.CentralBinomial(t.Num)
	name := nv.Name()
	clause, _ := verdict(name, n, lim.FirstBad)
	definite := n.Lo == n.Hi && k.Lo == k.Hi && !fits(n.Lo, k.Lo)
	computes := fmt.Sprintf("computes C(%s, %s)", name, kName)
	if k := f.Args[1]; k.IsConst() && k.C.Sign() < 0 {
		// A loop through every k ≤ n: its last step's factor n − n is 0,
		// so the form is C(n, n+1), which the algebra writes C(n, −1).
		kName = "k"
		computes = fmt.Sprintf("steps through C(%s, k) for every k ≤ %s", name, name)
	}
	msg := fmt.Sprintf("multiplicative binomial loop %s in %s: the product %s*(%s) %s before the division for %s ≥ %d at %s = %s/2, although C(%s, %s/2) itself fits up to %s = %d%s",
		computes, t.typeName(), a.Obj.Name(), src(ast.Unparen(mul.X)), verb(t), name, lim.FirstBad, kName, name, name, name, name, central.FirstBad-1, clause)
	fc.report(finding{node: mc.loop.Stmt, cat: catBinomLoop, definite: definite, msg: msg, match: mc.loopOrPMFMatch(a, f)})
	return true
}

// loopOrPMFMatch is the binomial loop's match, or, where its accumulator
// is the coefficient of a binomial probability the function returns
// (c·p^k·(1−p)^(n−k)), the probability's (loopPMFMatch), which rewrites
// the loop with it: rewritten alone, the loop would leave that product
// 0·Inf = NaN where k > n and a power of p leaves float64.
func (mc *modelCtx) loopOrPMFMatch(a *vm.Acc, f vm.Form) *fixes.Match {
	lm := mc.binomialMatch(a, f)
	if lm == nil {
		return nil
	}
	fc := mc.fc
	for _, e := range fc.modelRoots(mc.res) {
		pf := vm.Recognise(mc.res.Values[e])
		if pf.Kind != vm.BinomialPMF {
			continue
		}
		if coef := fc.pmfCoefficient(mc.res, e); coef != nil && fc.c.pass.TypesInfo.Uses[identOfExpr(coef)] == a.Obj {
			if m := fc.loopPMFMatch(mc.res, e, pf, coef); m != nil && m.CoefficientLoop != nil {
				return m
			}
		}
	}
	return lm
}

// identOfExpr returns e as a name, or nil.
func identOfExpr(e ast.Expr) *ast.Ident {
	id, _ := ast.Unparen(e).(*ast.Ident)
	return id
}

// modelRoots returns the returned expressions of the function, outside
// closures: the places where its whole value is known.
func (fc *fnCtx) modelRoots(res *vm.Result) []ast.Expr {
	var out []ast.Expr
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.FuncLit:
			return false
		case *ast.ReturnStmt:
			if len(n.Results) == 1 {
				out = append(out, n.Results[0])
			}
		}
		return true
	})
	return out
}

// modelPMF reports a binomial probability C(n, k)·p^k·(1−p)^(n−k), or
// a negative binomial one C(f+s−1, f)·p^s·(1−p)^f, whose coefficient is
// formed in a float type on its own, by a loop or as exp of log-gamma
// differences: past the central limit it is +Inf, and the product +Inf
// or NaN (+Inf times powers that underflow to 0), although the
// probability is at most 1.
func (fc *fnCtx) modelPMF(res *vm.Result, e ast.Expr) {
	f := vm.RecogniseAny(res.Values[e])
	if f.Kind != vm.BinomialPMF && f.Kind != vm.NegBinomialPMF || fc.c.reportedAt(e.Pos()) {
		return
	}
	t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(e))
	if !ok || !t.Float {
		return
	}
	// The coefficient must be one operand of its own: a product whose
	// operands are the coefficient and the two powers.
	b, ok := ast.Unparen(e).(*ast.BinaryExpr)
	if !ok || b.Op != token.MUL {
		return
	}
	coef := fc.pmfCoefficient(res, e)
	if coef == nil {
		return
	}
	// A coefficient from a loop already reported (its product breaks
	// first) is that loop's root cause.
	for _, l := range res.Loops {
		for _, a := range l.Accs {
			if mentions(fc.c.pass.TypesInfo, e, a.Obj) && fc.c.reportedAt(l.Stmt.Pos()) {
				return
			}
		}
	}
	// The coefficient's top n, its range, and the count at which C(n, ·)
	// is central.
	var top, half string
	var n ranges.Interval
	kind := "binomial"
	switch f.Kind {
	case vm.BinomialPMF:
		nv, ok := plainVar(f.Args[0])
		if !ok {
			return
		}
		n = fc.symRange(res, nv, e)
		top, half = nv.Name(), fmt.Sprintf("%s = %s/2", f.Args[1], nv.Name())
	case vm.NegBinomialPMF:
		fv, okF := plainVar(f.Args[0])
		sv, okS := plainVar(f.Args[1])
		if !okF || !okS {
			return
		}
		fr, sr := fc.symRange(res, fv, e), fc.symRange(res, sv, e)
		if fr.IsEmpty() || sr.IsEmpty() {
			return
		}
		n = shift(fr.Add(sr), -1)
		top = fmt.Sprintf("%s + %s - 1", fv.Name(), sv.Name())
		half, kind = fmt.Sprintf("%s = %s - 1", fv.Name(), sv.Name()), "negative binomial"
	}
	central, reach := thresholds.CentralBinomial(t.Num), "fits"
	if fc.expFormed(coef) {
		central, reach = thresholds.CentralBinomialExp(t.Num), "math.Exp reaches"
	}
	if n.IsEmpty() || n.Hi < central.FirstBad {
		return
	}
	clause, definite := verdict(top, n, central.FirstBad)
	coefArgs := vm.Recognise(res.Values[coef]).Args
	msg := fmt.Sprintf("computes the %s probability %s in %s with C(%s, %s) formed on its own: it %s for %s ≥ %d at %s (C(%d, %d) ≈ %s is the largest central one that %s), after which the product is +Inf or NaN although the probability is at most 1",
		kind, f, t.typeName(), coefArgs[0], coefArgs[1], verb(t), top, central.FirstBad, half, central.FirstBad-1, (central.FirstBad-1)/2, central.LastGoodApprox(), reach)
	m := fc.formedPMFMatch(res, e, f)
	if m == nil && f.Kind == vm.BinomialPMF {
		m = fc.loopPMFMatch(res, e, f, coef)
	}
	if m == nil {
		m = fc.expPMFMatch(res, e, f, coef)
	}
	fc.report(finding{node: e, cat: catRatio, definite: definite, msg: msg + clause, match: m, related: fc.coefDef(coef)})
}

// loopPMFMatch offers the helper call for a binomial probability whose
// coefficient is a local that a loop multiplies up to C(n, k), which the
// model vouches for where the product reads it:
//
//	c := 1.0
//	for j := 1; j <= k; j++ { c *= float64(n+1-j) / float64(j) }
//	return c * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k))
//
// becomes lgamma.BinomialPMF(k, n, p) inside the helper's domain; the
// loop stays, for the expression as written outside it (k > n, where
// c is 0 and a power may be +Inf). The coefficient must be one of the
// product's own factors, a plain name, and the form's C(n, k).
func (fc *fnCtx) loopPMFMatch(res *vm.Result, e ast.Expr, f vm.Form, coef ast.Expr) *fixes.Match {
	id, ok := ast.Unparen(coef).(*ast.Ident)
	if !ok {
		return nil
	}
	c := vm.Recognise(res.Values[id])
	if c.Kind != vm.Binomial || len(c.Args) != 2 || !c.Args[0].Equal(f.Args[0]) || !c.Args[1].Equal(f.Args[1]) {
		return nil
	}
	m := fc.readIn(fc.callRootMatch(res, e, f), e)
	if m == nil {
		return nil
	}
	m.Vouched = id
	// The loop that forms it, rewritten with the expression. A loop the
	// binomial loop's rules do not vouch for (an early exit, a trip
	// count other than k) vouches for no coefficient either.
	obj := fc.c.pass.TypesInfo.Uses[id]
	for _, l := range res.Loops {
		for _, a := range l.Accs {
			if a.Obj == obj && a.Obj != nil {
				if m.CoefficientLoop = (&modelCtx{fc: fc, res: res, loop: l}).binomialMatchIf(a, vm.Recognise(a.After)); m.CoefficientLoop == nil {
					return nil
				}
			}
		}
	}
	return m
}

// pmfCoefficient returns the first expression in e, a binomial
// probability, whose value is a binomial coefficient, or nil.
func (fc *fnCtx) pmfCoefficient(res *vm.Result, e ast.Expr) ast.Expr {
	var coef ast.Expr
	ast.Inspect(e, func(n ast.Node) bool {
		if x, ok := n.(ast.Expr); ok && coef == nil {
			if g := vm.Recognise(res.Values[x]); g.Kind == vm.Binomial {
				coef = x
			}
		}
		return coef == nil
	})
	return coef
}

// coefDef points at the function of this package whose call forms the
// coefficient coef (a log-gamma wrapper, a function with a value fact),
// directly or in the one definition of the local coef names; nil when
// the coefficient calls none.
func (fc *fnCtx) coefDef(coef ast.Expr) []analysis.RelatedInformation {
	x := fc.stripConv(coef)
	if id, ok := x.(*ast.Ident); ok {
		if d := fc.singleDef(id); d != nil {
			x = d
		}
	}
	var fn *types.Func
	ast.Inspect(x, func(n ast.Node) bool {
		if call, ok := n.(*ast.CallExpr); ok && fn == nil {
			if g := fc.c.calleeOf(call); g != nil && g.Pkg() == fc.c.pass.Pkg {
				fn = g
			}
		}
		return fn == nil
	})
	if fn == nil {
		return nil
	}
	return fc.c.relatedDef(fn.Name(), fn.Pos())
}

// expFormed reports whether x is math.Exp of something, directly or as
// the one value of a local: an exponential of log-gamma values, which
// is +Inf from CentralBinomialExp on, where math.Exp stops.
func (fc *fnCtx) expFormed(x ast.Expr) bool {
	x = fc.stripConv(x)
	if id, ok := x.(*ast.Ident); ok {
		if d := fc.singleDef(id); d != nil {
			x = fc.stripConv(d)
		}
	}
	call, ok := x.(*ast.CallExpr)
	return ok && fc.c.isMathFunc(call, "Exp")
}

// formedPMFMatch offers the helper call for a binomial probability
// whose coefficient is the call of another function whose value fact is
// the binomial (exp of log-gamma differences, a table for small n):
// tallykit.Choose(n, k) * math.Pow(p, k) * math.Pow(1-p, n-k) becomes
// lgamma.BinomialPMF(k, n, p), which the fixer checks factor by factor.
// An exponential the code takes itself (math.Exp(Lchoose(n, k))) has
// no such factor: expPMFMatch vouches for it instead.
func (fc *fnCtx) formedPMFMatch(res *vm.Result, e ast.Expr, f vm.Form) *fixes.Match {
	found := false
	var walk func(x ast.Expr)
	walk = func(x ast.Expr) {
		switch x := fc.stripConv(x).(type) {
		case *ast.BinaryExpr:
			if x.Op == token.MUL {
				walk(x.X)
				walk(x.Y)
			}
		case *ast.CallExpr:
			found = found || fc.formedCall(x) && !fc.c.isMathFunc(x, "Exp")
		}
	}
	walk(e)
	if !found {
		return nil
	}
	return fc.readIn(fc.callRootMatch(res, e, f), e)
}

// readIn returns m with its operands as e reads them (the model's first
// read of a variable may lie in a guard or loop above), or nil where e
// does not read one of them.
func (fc *fnCtx) readIn(m *fixes.Match, e ast.Expr) *fixes.Match {
	if m == nil {
		return nil
	}
	for i, a := range m.Args {
		var in ast.Expr
		ast.Inspect(e, func(n ast.Node) bool {
			if x, ok := n.(ast.Expr); ok && in == nil && (isIdentOrSel(x)) && src(x) == src(a) {
				in = x
			}
			return in == nil
		})
		if in == nil {
			return nil
		}
		m.Args[i] = in
	}
	return m
}

// isIdentOrSel reports whether x is a name or a selection x.f.
func isIdentOrSel(x ast.Expr) bool {
	switch x.(type) {
	case *ast.Ident, *ast.SelectorExpr:
		return true
	}
	return false
}

// modelFactorialFunc recognises, from the value model, a function
// whose last statement returns n! of a parameter n plus a constant,
// computed in a way the matchers do not read (a loop counting in
// float64), so that its callers' ratios are judged as those of any
// factorial function.
func (fc *fnCtx) modelFactorialFunc(decl *ast.FuncDecl) *facFunc {
	list := decl.Body.List
	if len(list) == 0 {
		return nil
	}
	ret, ok := list[len(list)-1].(*ast.ReturnStmt)
	if !ok || len(ret.Results) != 1 {
		return nil
	}
	if _, ok := ast.Unparen(ret.Results[0]).(*ast.Ident); !ok {
		return nil
	}
	res := fc.evalModel()
	for _, l := range res.Loops {
		if l.Exits {
			// A loop that can stop early need not form the whole
			// product: its function is no factorial of its argument.
			return nil
		}
	}
	f := vm.Recognise(res.Values[ret.Results[0]])
	if f.Kind != vm.Fact {
		return nil
	}
	v, alpha, beta, ok := oneVar(f.Args[0])
	if !ok || alpha.Cmp(big.NewRat(1, 1)) != 0 || !beta.IsInt() || !beta.Num().IsInt64() || v.Field != nil || v.Obj == nil {
		return nil
	}
	idx := fc.c.paramIndex(decl, v.Obj)
	// The range of n where the product is formed: a read of it in the
	// last loop, after the guards that bound it.
	var read ast.Expr
	if len(res.Loops) == 0 || res.Loops[len(res.Loops)-1].Counter == nil {
		return nil
	}
	{
		ast.Inspect(res.Loops[len(res.Loops)-1].Stmt, func(n ast.Node) bool {
			if id, ok := n.(*ast.Ident); ok && read == nil && fc.c.pass.TypesInfo.Uses[id] == v.Obj {
				read = id
			}
			return read == nil
		})
	}
	if read == nil {
		read = res.Exprs[v]
	}
	if idx < 0 || read == nil || assignedOutside(fc.c.pass.TypesInfo, decl.Body, v.Obj, nil) {
		return nil
	}
	off := beta.Num().Int64()
	return &facFunc{kind: kindFactorial, param: idx, param2: -1, offset: off, wrap: read, wrapOff: off, prod: res.Loops[len(res.Loops)-1].Stmt}
}

// modelRatio reports a returned quotient of loop accumulators that
// computes C(n, k), a falling product or n! over one or two factorial
// loops (in one loop or several): the numerator leaves the type while
// C(n, k) still fits. The loops it judges are marked, so that each is
// not reported again on its own.
func (fc *fnCtx) modelRatio(res *vm.Result, e ast.Expr, judged map[ast.Stmt]bool) {
	b, ok := ast.Unparen(e).(*ast.BinaryExpr)
	if !ok || b.Op != token.QUO {
		return
	}
	f := vm.Recognise(res.Values[e])
	if f.Kind != vm.Binomial {
		return
	}
	var loops []*vm.Loop
	for _, l := range res.Loops {
		for _, a := range l.Accs {
			if mentions(fc.c.pass.TypesInfo, b, a.Obj) {
				loops = append(loops, l)
				break
			}
		}
	}
	if len(loops) == 0 {
		return
	}
	for _, l := range loops {
		if l.Counter == nil || l.Exits || fc.c.reportedAt(l.Stmt.Pos()) || fc.decidedAtCalls(l.Stmt) || fc.keptLoop(l.Stmt) {
			return
		}
	}
	t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(e))
	if !ok {
		return
	}
	num := vm.Recognise(res.Values[b.X])
	// n!/(n−k)! grows with k up to n! at k = n: the numerator breaks
	// first where n! does, whichever form it has.
	first := thresholds.Factorial(t.Num).FirstBad
	if num.Kind != vm.Fact && num.Kind != vm.Falling {
		return
	}
	nv, alpha, beta, ok := oneVar(f.Args[0])
	if !ok || alpha.Cmp(big.NewRat(1, 1)) != 0 || beta.Sign() != 0 || !num.Args[0].Equal(f.Args[0]) {
		return
	}
	for _, l := range loops {
		judged[l.Stmt] = true
	}
	n := fc.symRange(res, nv, e)
	j := decideName(nv.Name(), n, first)
	if j.silent {
		return
	}
	clause, definite := j.clause, j.definite
	den := "its divisor"
	if d := vm.Recognise(res.Values[b.Y]); d.Kind != vm.Unknown && d.Kind != vm.GammaRatio {
		den = d.String()
	}
	at := ""
	if num.Kind == vm.Falling {
		at = fmt.Sprintf(" at %s = %s and for %s ≥ %d at %s = %s/2", f.Args[1], nv.Name(), nv.Name(), thresholds.CentralFalling(t.Num).FirstBad, f.Args[1], nv.Name())
	}
	central := thresholds.CentralBinomial(t.Num)
	msg := fmt.Sprintf("computes C(%s, %s) as %s divided by %s in %s: the numerator %s for %s ≥ %d%s, although C(%s, %s/2) itself fits up to %s = %d",
		f.Args[0], f.Args[1], num, den, t.typeName(), verb(t), nv.Name(), first, at, nv.Name(), nv.Name(), nv.Name(), central.FirstBad-1)
	fc.report(finding{node: e, cat: catRatio, definite: definite, msg: msg + clause, match: fc.loopQuotientLogMatch(res, b, loops)})
}

// modelWorth is the model's own cheap prefilter: a counting loop that
// no matcher reported, or a binomial coefficient from math.Lgamma (or
// from a function whose value fact is such a binomial or its
// logarithm) beside two math.Pow calls (the pmf) or a division. Functions whose loops are all reported
// already cost one walk of their syntax and no evaluation.
func (fc *fnCtx) modelWorth() bool {
	open, lgamma, pows := false, false, 0
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.FuncLit:
			return false
		case *ast.ForStmt, *ast.RangeStmt:
			open = open || !fc.c.reportedAt(n.Pos())
		case *ast.CallExpr:
			switch {
			case fc.c.isMathFunc(n, "Lgamma"), fc.c.isLgammaCall(n):
				lgamma = true
			case fc.c.isMathFunc(n, "Pow"):
				pows++
			case fc.formedCall(n):
				// A binomial another function forms from log-gamma.
				lgamma = true
			}
		}
		return !open
	})
	return open || lgamma && pows >= 2 || lgamma && fc.divides()
}

// assignedOutsideReflections is assignedOutside, where the statements
// that move v to the other end of a symmetric range (k = n − k, which
// leaves C(n, k) as it was) do not count either.
func assignedOutsideReflections(info *types.Info, body *ast.BlockStmt, v types.Object, skip ast.Node, refl []vm.Reflection) bool {
	return assigned.In(info, body, v, func(n ast.Node) bool {
		if n == skip {
			return true
		}
		for _, r := range refl {
			if r.Sym.Obj == v && n == r.Stmt {
				return true
			}
		}
		return false
	})
}

// fallingLoop reports an accumulator that ends as n!/(n−k)! of a loop
// the matchers did not read (one counting in float64), the way they
// report one counting in an integer type: the product grows with n and
// k, and is n! itself at k = n.
func (mc *modelCtx) fallingLoop(a *vm.Acc, t numType) bool {
	if a.Guarded || len(a.Ops) == 0 || len(mc.loop.Sums) > 0 {
		return false
	}
	f := vm.Recognise(a.After)
	if f.Kind != vm.Falling {
		return false
	}
	nv, n, k, kName, ok := mc.countRanges(f, true)
	if !ok {
		return false
	}
	if n.IsEmpty() || k.IsEmpty() {
		return true
	}
	fc := mc.fc
	if bounded(n) && bounded(k) && thresholds.FallingFits(t.Num, n.Hi, min(k.Hi, n.Hi)) {
		return true
	}
	definite := n.Lo > 0 && k.Lo > 0 && n.Lo != math.MinInt64 && !thresholds.FallingFits(t.Num, n.Lo, min(k.Lo, n.Lo))
	var msg string
	if bounded(k) {
		// A bounded count: the largest factor decides.
		first := thresholds.FallingFirstBad(t.Num, k.Hi)
		if first == math.MaxInt64 {
			return true
		}
		clause, _ := verdict(nv.Name(), n, first)
		with := ""
		if k.Lo != k.Hi {
			with = fmt.Sprintf(" with %s up to %d", kName, k.Hi)
		}
		msg = fmt.Sprintf("falling factorial %s of %s factors in %s %s for %s ≥ %d%s%s", f, kName, t.typeName(), verb(t), nv.Name(), first, with, clause)
	} else {
		first := thresholds.Factorial(t.Num).FirstBad
		clause, _ := verdict(nv.Name(), n, first)
		msg = fmt.Sprintf("falling factorial %s of %s factors in %s %s for %s ≥ %d at %s = %s%s", f, kName, t.typeName(), verb(t), nv.Name(), first, kName, nv.Name(), clause)
	}
	fc.report(finding{node: mc.loop.Stmt, cat: catLoop, definite: definite, msg: msg, match: mc.loopMatch(fixes.ShapeModelFallingLoop, a, f)})
	return true
}

// modelBinomialFunc recognises, from the value model, a function whose
// last statement returns C(n, k) of two parameters computed by a loop
// in a float type, which the matchers leave alone: calls of it then
// form binomial probabilities and hypergeometric ratios like those of
// any binomial function. Its first bad n is where the loop's largest
// intermediate leaves the type: the product before the division when
// it multiplies first, else C(n, n/2) itself.
func (fc *fnCtx) modelBinomialFunc(decl *ast.FuncDecl, res numType) *FactorialFact {
	if !res.Float {
		return nil
	}
	list := decl.Body.List
	if len(list) == 0 {
		return nil
	}
	ret, ok := list[len(list)-1].(*ast.ReturnStmt)
	if !ok || len(ret.Results) != 1 {
		return nil
	}
	id, ok := ast.Unparen(ret.Results[0]).(*ast.Ident)
	if !ok {
		return nil
	}
	m := fc.evalModel()
	f := vm.Recognise(m.Values[ret.Results[0]])
	if f.Kind != vm.Binomial {
		return nil
	}
	var acc *vm.Acc
	var loop *vm.Loop
	for _, l := range m.Loops {
		for _, a := range l.Accs {
			if a.Obj == fc.c.pass.TypesInfo.Uses[id] {
				acc, loop = a, l
			}
		}
	}
	if acc == nil || loop.Counter == nil || loop.Exits || acc.Guarded {
		return nil
	}
	// A parameter stepped by the loop itself (r *= n; r /= d; n--) is
	// one the model follows from its value at entry; one assigned
	// anywhere else is not the argument any more.
	var idx [2]int
	for i, a := range f.Args {
		v, ok := plainVar(a)
		if !ok || v.Field != nil || v.Obj == nil || v.Def != nil {
			return nil
		}
		if idx[i] = fc.c.paramIndex(decl, v.Obj); idx[i] < 0 || assignedOutsideReflections(fc.c.pass.TypesInfo, decl.Body, v.Obj, loop.Stmt, m.Reflections) {
			return nil
		}
	}
	first := thresholds.CentralBinomial(res.Num).FirstBad
	for _, op := range acc.Ops {
		if !op.Mul {
			break
		}
		if _, ok := op.By.Affine(); ok {
			first = thresholds.CentralBinomialLoop(res.Num).FirstBad
			break
		}
	}
	fact := &FactorialFact{Kind: kindNames[kindBinomial], Param: idx[0], Param2: idx[1], FirstBad: first}
	nv, _, _, _ := oneVar(f.Args[0])
	if n := fc.symRange(m, nv, loop.Stmt); bounded(n) && n.Hi < first-1 {
		fact.Safe, fact.Lo, fact.Hi = true, n.Lo, n.Hi
	}
	return fact
}
