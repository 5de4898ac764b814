package analyzer

import (
	"fmt"
	"go/ast"
	"go/types"
	"math"
	"math/big"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/analyzer/thresholds"
	vm "github.com/overfact/overfact/analyzer/valuemodel"
	"github.com/overfact/overfact/fixes"
)

// intRead is an integer read back from an exponential of log-gamma
// values or from math.Gamma: a conversion to an integer type, or a
// rounding (math.Floor, Round, …), of it.
type intRead struct {
	node  *ast.CallExpr // the outermost conversion or rounding
	inner *ast.CallExpr // the math.Exp or math.Gamma call
}

// roundings are the functions of package math that make a float an
// integer value.
var roundings = []string{"Floor", "Ceil", "Trunc", "Round", "RoundToEven"}

// integerReads finds the integer reads of the function body.
func (fc *fnCtx) integerReads(exps []*lgExp) []intRead {
	isLg := make(map[*ast.CallExpr]bool)
	for _, x := range exps {
		isLg[x.call] = true
	}
	var out []intRead
	inside := make(map[ast.Node]bool)
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		call, ok := n.(*ast.CallExpr)
		if _, lit := n.(*ast.FuncLit); lit {
			return false
		}
		if !ok || inside[call] || !fc.intReadOp(call) {
			return true
		}
		// Down through conversions and roundings to the value read.
		e, readsInt := ast.Expr(call), false
		for {
			c, ok := ast.Unparen(e).(*ast.CallExpr)
			if !ok || !fc.intReadOp(c) {
				break
			}
			inside[c] = true
			if t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(c)); ok && (!t.Float || !fc.isConversion(c)) {
				readsInt = true
			}
			e = c.Args[0]
		}
		inner, ok := ast.Unparen(e).(*ast.CallExpr)
		if ok && readsInt && (isLg[inner] || fc.c.isMathFunc(inner, "Gamma") && len(inner.Args) == 1) {
			out = append(out, intRead{node: call, inner: inner})
		}
		return true
	})
	return out
}

// intReadOp reports whether call is a numeric conversion or a rounding.
func (fc *fnCtx) intReadOp(call *ast.CallExpr) bool {
	if len(call.Args) != 1 {
		return false
	}
	if fc.isConversion(call) {
		_, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(call))
		return ok
	}
	for _, r := range roundings {
		if fc.c.isMathFunc(call, r) {
			return true
		}
	}
	return false
}

// checkLgammaInteger reports an integer read back from exp(ln Γ(n+1))
// (or Γ(n+1), or exp of the log-gamma form of C(n, k)) that is wrong for
// some n the code allows: ln n! is rounded, so exp of it is n!·(1+ε),
// and a truncating conversion of 119.99999999999999 gives 119 for 5!.
// The first wrong n comes from running the code's own float64
// computation (floatEval) and comparing it exactly with n! or C(n, k)
// (thresholds.FirstWrongInteger).
func (fc *fnCtx) checkLgammaInteger(res *vm.Result, reads []intRead, done map[ast.Node]bool) {
	for _, r := range reads {
		if done[r.inner] {
			continue
		}
		t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(r.node))
		if !ok {
			continue
		}
		f := vm.Recognise(res.Values[r.inner])
		switch f.Kind {
		case vm.Fact:
			fc.factorialRead(res, r, t, f, done)
		case vm.Binomial:
			fc.binomialRead(res, r, t, f, done)
		}
	}
}

func (fc *fnCtx) factorialRead(res *vm.Result, r intRead, t numType, f vm.Form, done map[ast.Node]bool) {
	v, alpha, beta, ok := oneVar(f.Args[0])
	if !ok || alpha.Cmp(big.NewRat(1, 1)) != 0 || !beta.IsInt() || !beta.Num().IsInt64() || v.Field != nil || v.Obj == nil {
		return
	}
	c := beta.Num().Int64() // the code computes (v+c)!
	sp, ok := fc.spanOf(res, v, r.node)
	if !ok || !sp.isInt {
		return
	}
	limit := thresholds.Factorial(t.Num).FirstBad // the first m with m! past t
	if t.Float {
		limit-- // past it both sides are +Inf
	}
	from, to := max(int64(sp.lo), -c), limit-c
	if !math.IsInf(sp.hi, 1) {
		to = min(to, int64(sp.hi))
	}
	env := map[types.Object]float64{}
	eval := func(x int64) (float64, bool) {
		env[v.Obj] = float64(x)
		return fc.floatEval(r.node, env, 0)
	}
	exact := func(x int64) *big.Int { return thresholds.Factorial64(x + c) }
	first, ok := thresholds.FirstWrongInteger(t.Num, eval, exact, from, to)
	if !ok {
		return
	}
	got, _ := eval(first)
	name := v.Name()
	value := fmt.Sprintf("%s!", plus(name, c))
	example := fmt.Sprintf("%s gives %s where %s is %s", src(r.node), gotText(t, got), fmt.Sprintf("%d!", first+c), exact(first))
	var m *fixes.Match
	if c == 0 {
		if args, ok := fc.plainArgs(r.node, []vm.Affine{vm.Var(v)}); ok {
			m = &fixes.Match{Shape: fixes.ShapeExpFactorial, Node: r.node, Args: args, Result: fc.c.pass.TypesInfo.TypeOf(r.node)}
		}
	}
	fc.reportIntRead(done, r, t, sp, value, first, example, m)
}

func (fc *fnCtx) binomialRead(res *vm.Result, r intRead, t numType, f vm.Form, done map[ast.Node]bool) {
	nv, okN := plainVar(f.Args[0])
	kv, okK := plainVar(f.Args[1])
	if !okN || !okK || nv.Field != nil || kv.Field != nil || nv.Obj == nil || kv.Obj == nil {
		return
	}
	sn, ok1 := fc.spanOf(res, nv, r.node)
	sk, ok2 := fc.spanOf(res, kv, r.node)
	if !ok1 || !ok2 || !sn.isInt || !sk.isInt {
		return
	}
	limit := thresholds.CentralBinomial(t.Num).FirstBad
	if t.Float {
		limit--
	}
	from, to := max(int64(sn.lo), 0), limit
	if !math.IsInf(sn.hi, 1) {
		to = min(to, int64(sn.hi))
	}
	env := map[types.Object]float64{}
	var first, firstK int64 = -1, 0
	for n := from; n <= to && first < 0; n++ {
		kLo, kHi := max(int64(sk.lo), 0), n
		if !math.IsInf(sk.hi, 1) {
			kHi = min(kHi, int64(sk.hi))
		}
		eval := func(k int64) (float64, bool) {
			env[nv.Obj], env[kv.Obj] = float64(n), float64(k)
			return fc.floatEval(r.node, env, 0)
		}
		exact := func(k int64) *big.Int { return thresholds.ChooseExact(n, k) }
		if k, bad := thresholds.FirstWrongInteger(t.Num, eval, exact, kLo, kHi); bad {
			first, firstK = n, k
		}
	}
	if first < 0 {
		return
	}
	env[nv.Obj], env[kv.Obj] = float64(first), float64(firstK)
	got, _ := fc.floatEval(r.node, env, 0)
	example := fmt.Sprintf("at %s = %d it gives %s where C(%d, %d) is %s", kv.Name(), firstK, gotText(t, got), first, firstK, thresholds.ChooseExact(first, firstK))
	var m *fixes.Match
	if args, ok := fc.plainArgs(r.node, []vm.Affine{vm.Var(nv), vm.Var(kv)}); ok {
		m = &fixes.Match{Shape: fixes.ShapeExpChoose, Node: r.node, Args: args, Result: fc.c.pass.TypesInfo.TypeOf(r.node)}
	}
	fc.reportIntRead(done, r, t, sn, fmt.Sprintf("C(%s, %s)", nv.Name(), kv.Name()), first, example, m)
}

// reportIntRead words and reports an integer read that is wrong from
// the variable's value first on.
func (fc *fnCtx) reportIntRead(done map[ast.Node]bool, r intRead, t numType, sp symSpan, value string, first int64, example string, m *fixes.Match) {
	iv := ranges.Interval{Lo: math.MinInt64, Hi: math.MaxInt64}
	if sp.loKnown {
		iv.Lo = int64(sp.lo)
	}
	if !math.IsInf(sp.hi, 1) {
		iv.Hi = int64(sp.hi)
	}
	clause, definite := verdict(sp.name, iv, first)
	from := "math.Exp of its log-gamma value"
	if fc.c.isMathFunc(r.inner, "Gamma") {
		from = "math.Gamma"
	}
	msg := fmt.Sprintf("%s reads the integer %s back from %s in float64, which is not exactly it: the %s result is wrong from %s = %d (%s)%s",
		src(r.node), value, from, t.typeName(), sp.name, first, example, clause)
	fc.report(finding{node: r.node, cat: catLgammaInteger, definite: definite, msg: msg, match: m})
	done[r.inner] = true
}

// gotText renders what the code computes, as its result type holds it.
func gotText(t numType, got float64) string {
	if t.Float {
		return fmt.Sprintf("%.17g", got)
	}
	tr := math.Trunc(got)
	if math.IsNaN(tr) || math.IsInf(tr, 0) {
		return fmt.Sprint(got)
	}
	bi, _ := new(big.Float).SetFloat64(tr).Int(nil)
	if bi.CmpAbs(t.Num.MaxInt()) > 0 {
		return fmt.Sprintf("%.6g, which does not fit %s", got, t.typeName())
	}
	return bi.String()
}
