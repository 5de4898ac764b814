package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
)

// One math.Gamma finding is made per line (gammaLines). When a line
// holds several calls whose arguments scale one term, as a Weibull
// kurtosis holds Γ(1+1/k), Γ(1+2/k), Γ(1+3/k) and Γ(1+4/k), the one to
// name is the one that overflows first, Γ(1+4/k), not the first
// written: the line is wrong from the point where that call breaks.

// gammaChoice is the call a line's Gamma finding names, and how many of
// the line's reportable calls share its term.
type gammaChoice struct {
	call    *ast.CallExpr
	sharing int    // calls over the same term, the chosen one included
	term    string // the shared term, "" when no other call shares it
}

// firstToOverflow returns, among the reportable math.Gamma calls on
// call's line in this function, the one whose argument c + k·t passes
// first, the first bad argument of Γ, when t grows: the smallest
// (first − c)/k over the calls with k > 0 and the same term t as call.
// Calls over other terms are not compared, and call itself is kept when
// its argument has no such form.
func (fc *fnCtx) firstToOverflow(call *ast.CallExpr, first float64) gammaChoice {
	best := gammaChoice{call: call, sharing: 1}
	c0, k0, t0, ok := fc.scaledTerm(call.Args[0], 0)
	if !ok || t0 == "" || k0 <= 0 {
		return best
	}
	bestAt := (first - c0) / k0
	for _, other := range fc.gammaCallsOn(fc.c.lineOf(call)) {
		if other == call {
			continue
		}
		// The form first: it reads the argument alone, while whether
		// the call is reportable asks how its value is used.
		c, k, t, ok := fc.scaledTerm(other.Args[0], 0)
		if !ok || t != t0 || k <= 0 || !fc.gammaReportable(other) {
			continue
		}
		best.sharing++
		best.term = t0
		if at := (first - c) / k; at < bestAt {
			best.call, bestAt = other, at
		}
	}
	return best
}

// clause describes the choice for a message.
func (g gammaChoice) clause() string {
	if g.sharing < 2 {
		return ""
	}
	return fmt.Sprintf("; of the %d math.Gamma calls on this line over %s, it overflows first", g.sharing, g.term)
}

// gammaReportable reports whether a bare math.Gamma call would get a
// finding of its own: no product consumed it, its argument can reach
// the overflow, and its value meets arithmetic.
func (fc *fnCtx) gammaReportable(call *ast.CallExpr) bool {
	if fc.c.consumed[call] {
		return false
	}
	if g, ok := fc.gammaBoundOf(call.Args[0]); ok && !g.reachable {
		return false
	}
	return fc.gammaEscapes(call)
}

// gammaPass is what the two Gamma categories keep for a pass: the lines
// with a Gamma finding, as one is enough for an expression with several
// Gamma calls.
type gammaPass struct {
	lines map[token.Position]bool
}

var gammaPassKey = &stateKey[gammaPass]{"the Gamma categories' lines with a finding"}

// gammaLines returns the pass's gammaPass.
func (c *checker) gammaLines() *gammaPass { return passStateOf(c, gammaPassKey) }

// reported reports whether line has a Gamma finding.
func (g *gammaPass) reported(line token.Position) bool { return g.lines[line] }

// note records a Gamma finding on line.
func (g *gammaPass) note(line token.Position) {
	if g.lines == nil {
		g.lines = make(map[token.Position]bool)
	}
	g.lines[line] = true
}

// gammaFunc is what they gather once per function: its math.Gamma calls
// by line (gammaCallsOn) and the parents of its nodes (parentMap).
type gammaFunc struct {
	calls   map[token.Position][]*ast.CallExpr
	parents map[ast.Node]ast.Node
}

var gammaFuncKey = &stateKey[gammaFunc]{"the Gamma categories' calls and parents"}

// gammaCallsOn returns the math.Gamma calls of one argument on line,
// in this function's own body (closures are functions of their own).
func (fc *fnCtx) gammaCallsOn(line token.Position) []*ast.CallExpr {
	g := stateOf(fc, gammaFuncKey)
	if g.calls == nil {
		g.calls = make(map[token.Position][]*ast.CallExpr)
		ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
			switch n := n.(type) {
			case *ast.FuncLit:
				return false
			case *ast.CallExpr:
				if fc.c.isMathFunc(n, "Gamma") && len(n.Args) == 1 {
					l := fc.c.lineOf(n)
					g.calls[l] = append(g.calls[l], n)
				}
			}
			return true
		})
	}
	return g.calls[line]
}

// scaledTerm reads e as c + k·t, where t is one term written the same
// way wherever it appears: 1 + 4/w.K is c = 1, k = 4, t = "1/w.K", and
// (x+1)/2 is c = 0.5, k = 0.5, t = "x". A constant has t = "".
func (fc *fnCtx) scaledTerm(e ast.Expr, depth int) (c, k float64, t string, ok bool) {
	if depth > maxDepth {
		return 0, 0, "", false
	}
	e = ast.Unparen(e)
	if v, isConst := fc.floatConst(e); isConst {
		return v, 0, "", true
	}
	b, isBin := e.(*ast.BinaryExpr)
	if !isBin {
		return 0, 1, src(e), true
	}
	lc, lk, lt, ok1 := fc.scaledTerm(b.X, depth+1)
	rc, rk, rt, ok2 := fc.scaledTerm(b.Y, depth+1)
	if !ok1 || !ok2 {
		return 0, 0, "", false
	}
	switch b.Op {
	case token.ADD, token.SUB:
		if b.Op == token.SUB {
			rc, rk = -rc, -rk
		}
		if lt != "" && rt != "" && lt != rt {
			return 0, 1, src(e), true
		}
		t := lt
		if t == "" {
			t = rt
		}
		return lc + rc, lk + rk, t, true
	case token.MUL:
		switch {
		case lt == "":
			return lc * rc, lc * rk, rt, true
		case rt == "":
			return lc * rc, lk * rc, lt, true
		}
	case token.QUO:
		switch {
		case rt == "" && rc != 0:
			return lc / rc, lk / rc, lt, true
		case lt == "" && rk == 1 && rc == 0:
			return 0, lc, "1/" + rt, true
		}
	}
	return 0, 1, src(e), true
}
