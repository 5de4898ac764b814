package analyzer

import (
	"go/ast"
	"go/token"
	"go/types"
)

// The syntactic prefilter: one cheap walk that tells which functions may
// hold anything to report, before any range analysis runs.

// scan is what the syntactic prefilter found in a function body.
type scan struct {
	product   bool // a *= or x = x*y (or t = append(t, x*y)): a product loop may be here
	loop      bool // a for or range statement
	callMul   bool // a multiplication with a call operand: recursion may be here
	knownCall bool // a call of math.Gamma, Pow or Exp or of a factorial-valued function
	localCall bool // a call of a function of this package, which may become factorial-valued
	logCall   bool // a call of math.Lgamma or math.Log: log-space forms (lgammasign.go, stirlingapproximation.go)
	sumCalls  bool // a sum (or difference) of two calls of one name, one maybe weighed: a Pascal's-rule, Stirling or derangement recursion may be here (pascalrule.go)
	sumTable  bool // a sum of two entries of one table: a table filled by such a rule, or a count table (counttable.go), may be here
	pairStep  bool // a, b = b, x or x := w·(a + b): a recurrence over two rolling variables may be here (pairrecurrence.go)
}

// scanAll is the syntactic prefilter. In one walk of the files it
// records for each function (a closure counts on its own) whether it
// multiplies and what it calls; it allocates only per function. Only
// what it finds is analysed further, and the range analysis runs only
// when a finding needs a range.
//
// It walks the syntax itself instead of asking for the shared
// inspector: because the analyzer has facts, the driver runs it on
// every dependency package, and an inspector built there stays alive
// until the whole run ends (docs/patterns.md, "Cost", has the figures).
func (c *checker) scanAll(files []*ast.File) map[ast.Node]*scan {
	out := make(map[ast.Node]*scan)
	var stack []ast.Node
	var cur *scan
	visit := func(n ast.Node) bool {
		if n == nil {
			return false
		}
		for len(stack) > 0 && n.Pos() >= stack[len(stack)-1].End() {
			stack = stack[:len(stack)-1]
			cur = nil
			if len(stack) > 0 {
				cur = out[stack[len(stack)-1]]
			}
		}
		switch n := n.(type) {
		case *ast.FuncDecl, *ast.FuncLit:
			c.allFuncs = append(c.allFuncs, n)
			cur = new(scan)
			out[n] = cur
			stack = append(stack, n)
		case *ast.ForStmt, *ast.RangeStmt:
			if cur != nil {
				cur.loop = true
			}
		case *ast.AssignStmt:
			if cur != nil && (n.Tok == token.MUL_ASSIGN || n.Tok == token.ASSIGN && len(n.Rhs) == 1 && (isMulOrQuo(n.Rhs[0]) || appendsProduct(n.Rhs[0]))) {
				cur.product = true
			}
			if cur != nil && !cur.pairStep {
				cur.pairStep = rollsPair(n) || weighsSum(n)
			}
			if cur != nil && n.Tok == token.ADD_ASSIGN && len(n.Lhs) == 1 && len(n.Rhs) == 1 {
				// c[s] += c[s-r]: a count table (counttable.go).
				_, table := sameKind(n.Lhs[0], ast.Unparen(n.Rhs[0]))
				cur.sumTable = cur.sumTable || table
			}
		case *ast.BinaryExpr:
			if cur != nil && n.Op == token.MUL && !cur.callMul {
				_, x := ast.Unparen(n.X).(*ast.CallExpr)
				_, y := ast.Unparen(n.Y).(*ast.CallExpr)
				cur.callMul = x || y
			}
			if cur != nil && (n.Op == token.ADD || n.Op == token.SUB) {
				calls, table := sameKind(ast.Unparen(n.X), ast.Unparen(n.Y))
				cur.sumCalls = cur.sumCalls || calls
				cur.sumTable = cur.sumTable || table
			}
		case *ast.CallExpr:
			if cur == nil {
				return true
			}
			if !cur.knownCall {
				cur.knownCall = c.knownCallee(n)
			}
			if !cur.logCall {
				cur.logCall = c.isMathFunc(n, "Lgamma") || c.isMathFunc(n, "Log")
			}
			if fn := c.calleeOf(n); fn != nil && fn.Pkg() == c.pass.Pkg {
				cur.localCall = true
			}
		}
		return true
	}
	for _, f := range files {
		ast.Inspect(f, visit)
	}
	return out
}

// knownCallee reports whether call calls math.Gamma, math.Pow, math.Exp
// or a function with a factorial fact.
func (c *checker) knownCallee(call *ast.CallExpr) bool {
	fn := c.calleeOf(call)
	if fn == nil {
		return false
	}
	if fn.Pkg() != nil && fn.Pkg().Path() == "math" {
		switch fn.Name() {
		case "Gamma", "Pow", "Exp":
			return true
		}
		return false
	}
	return c.factOf(fn) != nil || c.valueFactOf(fn) != nil
}

// factOf returns the factorial fact of fn, from this package or an
// imported one.
func (c *checker) factOf(fn *types.Func) *FactorialFact {
	if fn == nil {
		return nil
	}
	if ff := c.funcs[fn]; ff != nil {
		return &ff.fact
	}
	if fn.Pkg() == c.pass.Pkg {
		return nil
	}
	f := new(FactorialFact)
	if c.pass.ImportObjectFact(fn, f) {
		return f
	}
	return nil
}

// sameKind reports whether x and y may be the two terms of Pascal's
// rule, of a Stirling-number rule (one of them weighed) or of the
// derangement recurrence: calls of one function by the
// same name (calls), or entries of two-dimensional tables
// (t[i-1][j-1] + t[i-1][j]) or of one table (d[i-1] + d[i-2]) (table).
func sameKind(x, y ast.Expr) (calls, table bool) {
	// A weighted term, w·f(…) or w·t[…][…] (Stirling numbers), is
	// compared by each of its factors.
	for _, pair := range [2][2]ast.Expr{{x, y}, {y, x}} {
		if m, ok := pair[1].(*ast.BinaryExpr); ok && m.Op == token.MUL {
			c1, t1 := sameKind(pair[0], ast.Unparen(m.X))
			c2, t2 := sameKind(pair[0], ast.Unparen(m.Y))
			return c1 || c2, t1 || t2
		}
	}
	switch x := x.(type) {
	case *ast.CallExpr:
		y, ok := y.(*ast.CallExpr)
		if !ok {
			return false, false
		}
		fx, fy := funcName(x.Fun), funcName(y.Fun)
		return fx != "" && fx == fy, false
	case *ast.IndexExpr:
		y, ok := y.(*ast.IndexExpr)
		if !ok {
			return false, false
		}
		_, inX := ast.Unparen(x.X).(*ast.IndexExpr)
		_, inY := ast.Unparen(y.X).(*ast.IndexExpr)
		if inX && inY {
			return false, true
		}
		bx, okX := ast.Unparen(x.X).(*ast.Ident)
		by, okY := ast.Unparen(y.X).(*ast.Ident)
		return false, okX && okY && bx.Name == by.Name
	}
	return false, false
}

// funcName returns the name a call's function is written with (f, or
// m of p.m), or "".
func funcName(fun ast.Expr) string {
	switch f := calledName(fun).(type) {
	case *ast.Ident:
		return f.Name
	case *ast.SelectorExpr:
		return f.Sel.Name
	}
	return ""
}

// appendsProduct reports whether e is append(t, x*y), the step of a
// table grown by append (factorialtables.go).
func appendsProduct(e ast.Expr) bool {
	call, ok := ast.Unparen(e).(*ast.CallExpr)
	if !ok || len(call.Args) != 2 {
		return false
	}
	id, ok := call.Fun.(*ast.Ident)
	return ok && id.Name == "append" && isMulOrQuo(call.Args[1])
}

func isMulOrQuo(e ast.Expr) bool {
	b, ok := ast.Unparen(e).(*ast.BinaryExpr)
	return ok && (b.Op == token.MUL || b.Op == token.QUO)
}

// worthLoops reports whether a function may hold a product loop.
func (s *scan) worthLoops() bool { return s.loop && s.product }

// worth reports whether a function may hold anything to report.
func (s *scan) worth() bool {
	return s.worthProducts() || s.sumCalls || s.sumTable || s.loop && s.pairStep
}

// rollsPair reports whether as is a, b = b, x or b, a = x, b: two
// variables rolled forward by one step.
func rollsPair(as *ast.AssignStmt) bool {
	if as.Tok != token.ASSIGN || len(as.Lhs) != 2 || len(as.Rhs) != 2 {
		return false
	}
	same := func(x, y ast.Expr) bool {
		a, ok1 := x.(*ast.Ident)
		b, ok2 := y.(*ast.Ident)
		return ok1 && ok2 && a.Name == b.Name && a.Name != "_"
	}
	return same(as.Rhs[0], as.Lhs[1]) || same(as.Rhs[1], as.Lhs[0])
}

// weighsSum reports whether as is x := w·(a + b) over two variables, the
// new value of a pair rolled one variable at a time (a = b; b = x).
func weighsSum(as *ast.AssignStmt) bool {
	if as.Tok != token.DEFINE || len(as.Rhs) != 1 {
		return false
	}
	m, ok := ast.Unparen(as.Rhs[0]).(*ast.BinaryExpr)
	if !ok || m.Op != token.MUL {
		return false
	}
	for _, e := range []ast.Expr{m.X, m.Y} {
		if sum, ok := ast.Unparen(e).(*ast.BinaryExpr); ok && sum.Op == token.ADD {
			_, x := ast.Unparen(sum.X).(*ast.Ident)
			_, y := ast.Unparen(sum.Y).(*ast.Ident)
			if x && y {
				return true
			}
		}
	}
	return false
}

// worthProducts reports whether a function may hold anything to report
// but Pascal's rule: only these run the value model.
func (s *scan) worthProducts() bool {
	return s.worthLoops() || s.callMul || s.knownCall || s.logCall
}
