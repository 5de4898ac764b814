package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"math"
	"strings"

	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/fixes"
)

// The gamma-overflow category: a math.Gamma call whose argument is not
// bounded below the point where it returns +Inf, where the +Inf reaches
// arithmetic (gammaEscapes).

// checkGamma judges a math.Gamma call no product consumed.
func (fc *fnCtx) checkGamma(call *ast.CallExpr) {
	line := fc.c.lineOf(call)
	if fc.c.gammaLines().reported(line) || !fc.gammaReportable(call) {
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
	msg += choice.clause() + fc.gammaPowerFirst(call, first)
	fc.c.gammaLines().note(line)
	fc.report(finding{node: call, cat: catGamma, definite: g.certain, msg: msg, match: fc.gammaCallMatch(call)})
}

// gammaCallMatch is the match of a math.Gamma call's finding: a bare
// call has no rewrite, but a power divided by it, math.Pow(x, p) /
// math.Gamma(a), is the value x^p/Γ(a) the helper takes in log space.
func (fc *fnCtx) gammaCallMatch(call *ast.CallExpr) *fixes.Match {
	m := &fixes.Match{Shape: fixes.ShapeGamma, Node: call, Args: []ast.Expr{call.Args[0]}, Result: fc.c.pass.TypesInfo.TypeOf(call)}
	var up ast.Node = call
	for {
		p, ok := fc.parentMap()[up].(*ast.ParenExpr)
		if !ok {
			break
		}
		up = p
	}
	if quo, ok := fc.parentMap()[up].(*ast.BinaryExpr); ok && quo.Op == token.QUO && quo.Y == up {
		if pow, ok := ast.Unparen(quo.X).(*ast.CallExpr); ok && fc.c.isMathFunc(pow, "Pow") && len(pow.Args) == 2 {
			return &fixes.Match{Shape: fixes.ShapePowOverGamma, Node: quo, Args: []ast.Expr{pow.Args[0], pow.Args[1], call.Args[0]}, Result: fc.c.pass.TypesInfo.TypeOf(quo)}
		}
	}
	if pm := fc.productChain(call); pm != nil {
		return pm
	}
	return m
}

// productChain describes the largest product (or quotient) around e in
// which e is a factor, for the fixer to take in log space: the powers,
// Gamma values and exponentials among its factors become products that
// keep their logarithms (fixes/logproduct.go), which changes no value
// the float64 arithmetic got right. Where that product is the value of
// a local variable (g := math.Gamma(x), w *= Γ(a)/Γ(b)), the variable is
// carried too, with the copies and products made of it. nil where e is
// no factor of a product and no variable's value; the fixer checks the
// factors and the variable.
func (fc *fnCtx) productChain(e ast.Expr) *fixes.Match {
	top := fc.productRoot(e)
	if as, ok := fc.parentMap()[top].(*ast.AssignStmt); ok && len(as.Lhs) == len(as.Rhs) {
		for i, r := range as.Rhs {
			if r != top {
				continue
			}
			if id, ok := ast.Unparen(as.Lhs[i]).(*ast.Ident); ok && as.Tok != token.ADD_ASSIGN && as.Tok != token.SUB_ASSIGN {
				return &fixes.Match{Shape: fixes.ShapeLogSpaceTerm, Node: top, Args: []ast.Expr{id}, Result: fc.c.pass.TypesInfo.TypeOf(top), Func: fc.node}
			}
		}
	}
	if ast.Unparen(top) == ast.Unparen(e) {
		return nil
	}
	return &fixes.Match{Shape: fixes.ShapeProductChain, Node: top, Result: fc.c.pass.TypesInfo.TypeOf(top)}
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
	g := stateOf(fc, gammaFuncKey)
	if g.parents == nil {
		g.parents = parentsIn(funcBody(fc.node))
	}
	return g.parents
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
	lhs, rhs := assignedPairs(parents[e])
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

// gammaPowerFirst names, for math.Gamma(v+c) in the divisor of
// math.Pow(x, e)/(…) whose base the code does not fix and whose exponent
// grows with v (e = a·v + the rest, a > 0, the rest never negative where
// it is read), where the power overflows before the Γ value does: at the
// last v whose Γ value fits, e is at least a·v + the rest's least value,
// and from the e-th root of the largest float (thresholds.PowerBaseFirstBad)
// on, the power is +Inf first (a Bessel series x^(2m+d)/(m!(m+d)!)).
// Empty for any other shape.
func (fc *fnCtx) gammaPowerFirst(call *ast.CallExpr, gammaFirst float64) string {
	parents := fc.parentMap()
	var quo *ast.BinaryExpr
	var up ast.Node = call
	for quo == nil {
		p := parents[up]
		switch p := p.(type) {
		case *ast.ParenExpr:
		case *ast.BinaryExpr:
			switch {
			case p.Op == token.QUO && p.Y == up:
				quo = p
			case p.Op != token.MUL:
				return ""
			}
		default:
			return ""
		}
		up = p
	}
	pow, ok := ast.Unparen(quo.X).(*ast.CallExpr)
	if !ok || !fc.c.isMathFunc(pow, "Pow") || len(pow.Args) != 2 {
		return ""
	}
	t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(pow))
	if _, konst := fc.floatConst(pow.Args[0]); konst || !ok || !t.Float {
		return ""
	}
	g, ok1 := fc.linearCount(fc.stripConv(call.Args[0]))
	e, ok2 := fc.linearCount(fc.stripConv(pow.Args[1]))
	if !ok1 || !ok2 || len(g.Terms) != 1 || g.Terms[0].K != 1 {
		return ""
	}
	v := g.Terms[0].Sym
	a := e.coefOf(v.Object)
	if a <= 0 {
		return ""
	}
	// The last v whose Γ(v + c) fits: v + c < gammaFirst.
	last := int64(math.Ceil(gammaFirst-float64(g.C))) - 1
	least := a*last + e.C
	var at []string
	for _, term := range e.without(v.Object).Terms {
		id := identOf(fc.c.pass.TypesInfo, pow.Args[1], term.Sym.Object)
		if id == nil || term.K <= 0 {
			return ""
		}
		// A term the code may make negative is measured at 0, and
		// the message says so (|d| where d = MinInt64 stays negative).
		r := fc.rangeOf(id)
		switch {
		case r.IsEmpty():
			return ""
		case r.Lo < 0:
			at = append(at, id.Name+" = 0")
		case r.Lo > (math.MaxInt64-least)/term.K:
			return ""
		default:
			least += term.K * r.Lo
		}
	}
	where := ""
	if len(at) > 0 {
		where = " at " + strings.Join(at, ", ")
	}
	b := thresholds.PowerBaseFirstBad(t.Num, least)
	if math.IsInf(b, 1) {
		return ""
	}
	return fmt.Sprintf("; where |%s| ≥ %s%s the power %s^%s %s first, before %s reaches %d",
		src(pow.Args[0]), fmtFloat(b), where, atom(pow.Args[0]), atom(fc.stripConv(pow.Args[1])), verb(t), v.Object.Name(), last+1)
}
