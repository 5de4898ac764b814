package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"math"

	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/fixes"
)

// affine is x = a·v + b with v a single variable (an integer converted to
// float, or a float), as Gamma arguments are written: float64(n)+1,
// (nu+1)/2.
type affine struct {
	a, b  float64
	v     ast.Expr // nil for a constant
	isInt bool     // v is an integer variable
}

// affineOf returns the affine form of a float expression.
func (fc *fnCtx) affineOf(e ast.Expr, depth int) (affine, bool) {
	if depth > maxDepth {
		return affine{}, false
	}
	e = ast.Unparen(e)
	if v, ok := fc.floatConst(e); ok {
		return affine{b: v}, true
	}
	if v, ok := fc.specialConst(e); ok {
		return affine{b: v}, true
	}
	switch x := e.(type) {
	case *ast.CallExpr:
		if len(x.Args) == 1 && fc.isConversion(x) {
			return fc.affineOf(x.Args[0], depth+1)
		}
	case *ast.Ident:
		if fc.c.objOf(x) == nil {
			return affine{}, false
		}
		if def := fc.singleDef(x); def != nil {
			if a, ok := fc.affineOf(def, depth+1); ok {
				return a, true
			}
		}
		t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(x))
		return affine{a: 1, v: x, isInt: ok && !t.Float}, ok
	case *ast.BinaryExpr:
		l, ok1 := fc.affineOf(x.X, depth+1)
		r, ok2 := fc.affineOf(x.Y, depth+1)
		if !ok1 || !ok2 || (l.v != nil && r.v != nil) {
			// Two variables: only n+n style sums of the same one would
			// do, and those are rare enough to leave.
			return affine{}, false
		}
		v, isInt := l.v, l.isInt
		if v == nil {
			v, isInt = r.v, r.isInt
		}
		switch x.Op {
		case token.ADD:
			return affine{l.a + r.a, l.b + r.b, v, isInt}, true
		case token.SUB:
			return affine{l.a - r.a, l.b - r.b, v, isInt}, true
		case token.MUL:
			if l.v == nil {
				return affine{r.a * l.b, r.b * l.b, v, isInt}, true
			}
			return affine{l.a * r.b, l.b * r.b, v, isInt}, true
		case token.QUO:
			if r.v == nil && r.b != 0 {
				return affine{l.a / r.b, l.b / r.b, v, isInt}, true
			}
		}
	}
	return affine{}, false
}

// gammaBound says where math.Gamma(arg) first returns +Inf: at the
// variable's value firstV (an integer when the variable is one). The
// range of the argument follows from the variable's range.
type gammaBound struct {
	aff       affine
	first     float64 // first bad argument
	firstV    float64 // first bad value of the variable
	lo, hi    float64 // range of the argument
	certain   bool    // lo ≥ first
	reachable bool    // hi ≥ first
}

func (fc *fnCtx) gammaBoundOf(arg ast.Expr) (gammaBound, bool) {
	aff, ok := fc.affineOf(arg, 0)
	if !ok {
		return gammaBound{}, false
	}
	g := gammaBound{aff: aff, first: thresholds.GammaFirstBad(floatNum(fc.c.pass.TypesSizes))}
	vlo, vhi := math.Inf(-1), math.Inf(1)
	if aff.v != nil && aff.isInt {
		r := fc.rangeOf(aff.v)
		if r.IsEmpty() {
			return g, false
		}
		// An end at or near a type limit (k < n gives k ≤ MaxInt64−1 for
		// an unbounded n) bounds nothing in practice.
		if !typeLimit(-r.Lo) && r.Lo != math.MinInt64 {
			vlo = float64(r.Lo)
		}
		if !typeLimit(r.Hi) {
			vhi = float64(r.Hi)
		}
	}
	if id, ok := aff.v.(*ast.Ident); ok && !aff.isInt {
		vlo, vhi = fc.floatBounds(id)
	}
	if aff.v == nil {
		vlo, vhi = 0, 0
	}
	g.lo, g.hi = aff.a*vlo+aff.b, aff.a*vhi+aff.b
	if aff.a < 0 {
		g.lo, g.hi = g.hi, g.lo
	}
	if aff.v == nil {
		g.lo, g.hi = aff.b, aff.b
	}
	g.certain = g.lo >= g.first
	g.reachable = g.hi >= g.first
	if aff.a > 0 {
		g.firstV = (g.first - aff.b) / aff.a
		if aff.isInt {
			g.firstV = math.Ceil(g.firstV)
		}
	}
	return g, true
}

func floatNum(sizes types.Sizes) thresholds.Num {
	n, _ := thresholds.Lookup(types.Typ[types.Float64], sizes)
	return n
}

// describe renders where the Gamma call breaks, in terms of its variable.
func (g gammaBound) describe(call string) string {
	if g.aff.v == nil || g.aff.a <= 0 {
		return fmt.Sprintf("%s is +Inf for arguments ≥ %.10g", call, g.first)
	}
	return fmt.Sprintf("%s is +Inf for %s ≥ %.10g (Γ(x) overflows float64 from x = %.10g)", call, src(g.aff.v), g.firstV, g.first)
}

func (g gammaBound) clause() string {
	switch {
	case g.certain:
		return "; the argument is always past it here"
	case g.aff.v == nil:
		return ""
	case math.IsInf(g.hi, 1):
		return fmt.Sprintf("; %s is not bounded here", src(g.aff.v))
	}
	return fmt.Sprintf("; the argument may reach %.10g here", g.hi)
}

// checkGammaRatio judges ratios of math.Gamma calls, such as the Beta
// function B(a,b) = Γ(a)Γ(b)/Γ(a+b) (DLMF 5.12.1) and the Student-t
// constant Γ((ν+1)/2)/(√(νπ)Γ(ν/2)) (common practice; DLMF section
// from memory): the ratio is
// finite where a Gamma in it is already +Inf.
func (fc *fnCtx) checkGammaRatio(root ast.Expr, p *product) {
	var worst *gammaBound
	var worstCall *ast.CallExpr
	for _, f := range p.num {
		if f.math != "Gamma" {
			continue
		}
		g, ok := fc.gammaBoundOf(f.arg)
		if !ok {
			g = gammaBound{first: thresholds.GammaFirstBad(floatNum(fc.c.pass.TypesSizes)), hi: math.Inf(1), reachable: true}
		}
		if g.reachable && (worst == nil || g.certain) {
			worst, worstCall = &g, f.call
		}
	}
	if worst == nil {
		return
	}
	what := "ratio of math.Gamma values"
	m := fc.gammaMatch(root, p)
	if m.Shape == fixes.ShapeBeta {
		what = "Beta function as Γ(a)Γ(b)/Γ(a+b)"
	}
	if m.Shape == fixes.ShapeNone {
		// Γ(a)/Γ(b)·x^k: the ratio may be grouped apart from the other
		// factors, as the AST of a left-to-right product often does.
		if sub, sp := fc.exactPart(root, gammaOnly(p)); sub != nil {
			if sm := fc.gammaMatch(sub, sp); sm.Shape != fixes.ShapeNone {
				m = sm
			}
		}
	}
	although := ""
	if fc.gammaRatioFinite(p, m, worst.first) {
		although = ", although the result itself is finite"
	}
	msg := fmt.Sprintf("%s in float64: %s%s%s", what, worst.describe("math.Gamma("+src(worstCall.Args[0])+")"), although, worst.clause())
	if n := gammaCount(p.num); n >= 2 && !worst.certain {
		// Γ(a)·Γ(b) passes the largest float64 once ln Γ(a) + ln Γ(b)
		// does, which can be well before either argument reaches the
		// single-Γ limit (a = b = 100 already does): the limit above
		// is where the first Γ alone breaks, not the first bad input.
		msg += fmt.Sprintf("; the product of the %d Γ values above the line can overflow first, before any one of them is +Inf", n)
	}
	at := fc.valueHolding(root, worstCall)
	fc.c.gammaLines[fc.c.lineOf(root)] = true
	fc.c.gammaLines[fc.c.lineOf(at)] = true
	fc.report(finding{node: at, cat: catGammaRatio, definite: worst.certain, msg: msg, match: p.fix(m)})
}

// gammaCount counts the math.Gamma factors among fs.
func gammaCount(fs []factor) int {
	n := 0
	for _, f := range fs {
		if f.math == "Gamma" {
			n++
		}
	}
	return n
}

// gammaMatch describes a product of Gamma calls that is exactly one of
// the shapes the fixes package rewrites, with root as its node; its Shape
// is ShapeNone otherwise.
func (fc *fnCtx) gammaMatch(root ast.Expr, p *product) *fixes.Match {
	m := &fixes.Match{Node: root, Result: fc.c.pass.TypesInfo.TypeOf(root)}
	if a, b, ok := fc.betaArgs(p.num, p.den, p.other); ok {
		m.Shape, m.Args = fixes.ShapeBeta, []ast.Expr{a, b}
	} else if a, b, ok := fc.betaArgs(p.den, p.num, p.other); ok {
		m.Shape, m.Args = fixes.ShapeInverseBeta, []ast.Expr{a, b}
	} else if len(p.num) == 1 && len(p.den) == 1 && p.num[0].math == "Gamma" && p.den[0].math == "Gamma" && p.other == 0 {
		m.Shape, m.Args = fixes.ShapeGammaRatio, []ast.Expr{p.num[0].arg, p.den[0].arg}
	}
	return m
}

// gammaOnly returns the Gamma factors of p, with the others counted as
// unknown, for exactPart to find the sub-expression that holds just them.
func gammaOnly(p *product) *product {
	q := &product{other: p.other}
	for _, f := range p.num {
		if f.math == "Gamma" {
			q.num = append(q.num, f)
		} else {
			q.other++
		}
	}
	for _, f := range p.den {
		if f.math == "Gamma" {
			q.den = append(q.den, f)
		} else {
			q.other++
		}
	}
	return q
}

// betaArgs matches Γ(a)Γ(b)/Γ(a+b) with two, the Γ(a)Γ(b), and one, the
// Γ(a+b); swapped, it matches the inverse 1/B(a,b) = Γ(a+b)/(Γ(a)Γ(b)).
func (fc *fnCtx) betaArgs(two, one []factor, other int) (a, b ast.Expr, ok bool) {
	if len(two) != 2 || len(one) != 1 || other != 0 {
		return nil, nil, false
	}
	for _, f := range append(append([]factor{}, two...), one...) {
		if f.math != "Gamma" {
			return nil, nil, false
		}
	}
	la, ok1 := fc.affineOf(two[0].arg, 0)
	lb, ok2 := fc.affineOf(two[1].arg, 0)
	ls, ok3 := fc.affineOf(one[0].arg, 0)
	if ok1 && ok2 && ok3 && (la.v == nil || lb.v == nil || sameVar(fc, la.v, lb.v)) {
		if la.a+lb.a == ls.a && la.b+lb.b == ls.b {
			return two[0].arg, two[1].arg, true
		}
	}
	// Γ(a)Γ(b)/Γ(a+b) with a, b separate variables: compare the syntax.
	if s, ok := ast.Unparen(one[0].arg).(*ast.BinaryExpr); ok && s.Op == token.ADD {
		if src(s.X) == src(two[0].arg) && src(s.Y) == src(two[1].arg) || src(s.Y) == src(two[0].arg) && src(s.X) == src(two[1].arg) {
			return two[0].arg, two[1].arg, true
		}
	}
	return nil, nil, false
}

func sameVar(fc *fnCtx, x, y ast.Expr) bool {
	return x != nil && y != nil && fc.c.objOf(x) == fc.c.objOf(y)
}

// checkGamma judges a math.Gamma call no product consumed.
func (fc *fnCtx) checkGamma(call *ast.CallExpr) {
	line := fc.c.lineOf(call)
	if fc.c.gammaLines[line] || !fc.gammaReportable(call) {
		return
	}
	first := thresholds.GammaFirstBad(floatNum(fc.c.pass.TypesSizes))
	choice := fc.firstToOverflow(call, first)
	call = choice.call
	g, ok := fc.gammaBoundOf(call.Args[0])
	if !ok {
		g = gammaBound{first: first, hi: math.Inf(1)}
	}
	msg := fmt.Sprintf("math.Gamma overflows: %s%s", g.describe("math.Gamma("+src(call.Args[0])+")"), g.clause())
	if !ok {
		msg = fmt.Sprintf("math.Gamma overflows: %s; the argument is not bounded here", g.describe("math.Gamma("+src(call.Args[0])+")"))
	}
	msg += choice.clause()
	fc.c.gammaLines[line] = true
	fc.report(finding{node: call, cat: catGamma, definite: g.certain, msg: msg,
		match: &fixes.Match{Shape: fixes.ShapeGamma, Node: call, Args: []ast.Expr{call.Args[0]}, Result: fc.c.pass.TypesInfo.TypeOf(call)}})
}

// gammaEscapes reports whether the value of a bare math.Gamma call can
// meet arithmetic, the only place its +Inf is wrong: an IEEE +Inf for a
// Γ(x) beyond float64 is the right answer when it is only compared,
// passed to a function outside package math, or stored (TestGamma in
// std's math/all_test.go compares Γ of its table against an expected
// +Inf). It can meet arithmetic when it is an operand of + - * / or
// their assignment forms, or an argument to a math function that maps
// it to a value that may be finite (math.Log(math.Gamma(x)) is +Inf
// where ln Γ(x) is finite); directly, through sign changes, conversions
// and math.Abs, or through a local variable it is stored in, any use of
// which is such an operand. A returned value counts as meeting
// arithmetic: the function is then a numeric building block whose
// callers compute with it, which a per-function look cannot follow.
func (fc *fnCtx) gammaEscapes(call *ast.CallExpr) bool {
	root := funcBody(fc.node)
	if root == nil {
		return true
	}
	return fc.meetsArith(root, call, fc.parentMap(), make(map[*types.Var]bool))
}

// parentMap returns the parents of the nodes of the function body, built
// once per function: a line of several Gamma calls asks for each of them.
func (fc *fnCtx) parentMap() map[ast.Node]ast.Node {
	if fc.parents == nil {
		fc.parents = parentsIn(funcBody(fc.node))
	}
	return fc.parents
}

// valueHolding returns where a finding about the product at root is
// reported: at root, unless the call that breaks lies outside it, in the
// value of a local that root uses (c := Γ(a)/Γ(b); return c * t). Then
// it is that value, the whole expression assigned, so that the finding
// sits where the arithmetic is written and an allow directive on that
// line reaches it.
func (fc *fnCtx) valueHolding(root ast.Expr, call ast.Expr) ast.Expr {
	if root.Pos() <= call.Pos() && call.End() <= root.End() || funcBody(fc.node) == nil {
		return root
	}
	parents := fc.parentMap()
	top := call
	for n := parents[call]; n != nil; n = parents[n] {
		e, ok := n.(ast.Expr)
		if !ok {
			break
		}
		top = e
	}
	return top
}

// meetsArith reports whether the value of e meets arithmetic, following
// it through the local variables it is copied into; each variable is
// followed once, so x = x and copy cycles end.
func (fc *fnCtx) meetsArith(root ast.Node, e ast.Expr, parents map[ast.Node]ast.Node, seen map[*types.Var]bool) bool {
	e, use := fc.gammaUse(e, parents)
	if use != useStored {
		return use == useArith
	}
	v := fc.storedIn(e, parents)
	if v == nil || seen[v] {
		return false
	}
	seen[v] = true
	found := false
	ast.Inspect(root, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok && !found && fc.c.pass.TypesInfo.Uses[id] == v {
			found = fc.meetsArith(root, id, parents, seen)
		}
		return !found
	})
	return found
}

type gammaUseKind int

const (
	useOther  gammaUseKind = iota // compared, passed on, returned, discarded
	useArith                      // operand of arithmetic
	useStored                     // the right-hand side of an assignment
)

// gammaUse classifies the use of the value of e, looking through
// wrappers that keep its magnitude; it returns the outermost wrapper.
func (fc *fnCtx) gammaUse(e ast.Expr, parents map[ast.Node]ast.Node) (ast.Expr, gammaUseKind) {
	for {
		switch p := parents[e].(type) {
		case *ast.ParenExpr:
			e = p
			continue
		case *ast.UnaryExpr:
			if p.Op == token.SUB || p.Op == token.ADD {
				e = p
				continue
			}
		case *ast.BinaryExpr:
			switch p.Op {
			case token.ADD, token.SUB, token.MUL, token.QUO:
				return e, useArith
			}
		case *ast.AssignStmt:
			switch p.Tok {
			case token.ADD_ASSIGN, token.SUB_ASSIGN, token.MUL_ASSIGN, token.QUO_ASSIGN:
				return e, useArith
			case token.ASSIGN, token.DEFINE:
				return e, useStored
			}
		case *ast.ValueSpec:
			return e, useStored
		case *ast.ReturnStmt:
			// A function that returns Γ as it is (or converted) returns
			// +Inf exactly where the true value does not fit: the honest
			// float result, and its callers' arithmetic is theirs.
			return e, useOther
		case *ast.CallExpr:
			if len(p.Args) == 1 && (fc.isConversion(p) || fc.c.isMathFunc(p, "Abs")) {
				e = p
				continue
			}
			if fn := fc.c.calleeOf(p); fn != nil && fn.Pkg() != nil && fn.Pkg().Path() == "math" && gammaMaps[fn.Name()] {
				return e, useArith
			}
		}
		return e, useOther
	}
}

// gammaMaps are the math functions that can map an infinite Γ value to
// a value that should have been finite.
var gammaMaps = map[string]bool{
	"Pow": true, "Exp": true, "Exp2": true, "Expm1": true, "Log": true, "Log2": true,
	"Log10": true, "Log1p": true, "Sqrt": true, "Cbrt": true, "Hypot": true, "FMA": true,
	"Mod": true, "Remainder": true, "Atan": true, "Atan2": true, "Tanh": true,
}

// storedIn returns the local variable e is assigned to, or nil.
func (fc *fnCtx) storedIn(e ast.Expr, parents map[ast.Node]ast.Node) *types.Var {
	var lhs []ast.Expr
	var rhs []ast.Expr
	switch p := parents[e].(type) {
	case *ast.AssignStmt:
		lhs, rhs = p.Lhs, p.Rhs
	case *ast.ValueSpec:
		for _, n := range p.Names {
			lhs = append(lhs, n)
		}
		rhs = p.Values
	}
	if len(lhs) != len(rhs) {
		return nil
	}
	for i, r := range rhs {
		if r != e {
			continue
		}
		id, ok := ast.Unparen(lhs[i]).(*ast.Ident)
		if !ok {
			return nil
		}
		v, _ := fc.c.objOf(id).(*types.Var)
		if v == nil || v.Parent() == nil || v.Parent() == v.Pkg().Scope() {
			return nil // a package variable is read where this function cannot see
		}
		return v
	}
	return nil
}

// parentsIn maps each node under root to its parent.
func parentsIn(root ast.Node) map[ast.Node]ast.Node {
	parents := make(map[ast.Node]ast.Node)
	var stack []ast.Node
	ast.Inspect(root, func(n ast.Node) bool {
		if n == nil {
			stack = stack[:len(stack)-1]
			return false
		}
		if len(stack) > 0 {
			parents[n] = stack[len(stack)-1]
		}
		stack = append(stack, n)
		return true
	})
	return parents
}

// lineOf returns the file and line of n, without the column.
func (c *checker) lineOf(n ast.Node) token.Position {
	p := c.pass.Fset.Position(n.Pos())
	return token.Position{Filename: p.Filename, Line: p.Line}
}
