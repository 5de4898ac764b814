package analyzer

import (
	"go/ast"
	"go/token"
	"go/types"

	"github.com/overfact/overfact/fixes"
)

// Products and ratios of known factors: factorial calls, powers,
// exponentials and Gamma calls, followed through locals assigned once.

// A factor is one operand of a product or ratio that the analyzer knows:
// a factorial-valued call, math.Gamma, math.Pow or math.Exp.
type factor struct {
	kind facKind // kindFactorial … for calls with a fact; kindNone otherwise
	math string  // "Gamma", "Pow" or "Exp" for calls of package math
	call *ast.CallExpr
	arg  ast.Expr // n of a factorial, x of Gamma, Pow and Exp
	arg2 ast.Expr // k of a falling factorial or binomial, the exponent of Pow
	off  int64    // the call's value is (arg+off)!
	t    numType  // the type the value is computed in
	fn   *types.Func
	fact *FactorialFact
	// table is the factorial table a read t[e] comes from (fn is nil).
	table *facTable
	// acc, for a power x^k a loop multiplies up, is the read of its
	// accumulator in the product, and loop that loop.
	acc  *ast.Ident
	loop ast.Stmt
}

// def names the definition a finding on f points to: the factorial
// function, or the table that holds the factorials.
func (f factor) def() (string, token.Pos) {
	if f.table != nil {
		return f.table.obj.Name(), f.table.obj.Pos()
	}
	return f.fn.Name(), f.fn.Pos()
}

// product is a product and quotient of factors; other counts the
// operands it does not know.
type product struct {
	num, den []factor
	other    int
	// chained marks a product built over several statements (r :=
	// fact(n); r /= fact(k); …): no single expression holds its value,
	// so its finding has no fix.
	chained bool
	// For a chain whose links follow its start directly: the start's
	// value (fact(n) of r := fact(n)) and the links, which a ratio's fix
	// may absorb (see reportRatio).
	chainStart ast.Expr
	chainLinks []ast.Stmt
	// tabled marks a product with a factor read from a factorial table
	// (factorialtables.go): the fixes rewrite calls, so it has no fix.
	tabled bool
}

// fix returns the match of p's finding, or nil where p has no
// expression to rewrite.
func (p *product) fix(m *fixes.Match) *fixes.Match {
	if p.chained || p.tabled {
		return nil
	}
	return m
}

// factorialChain is the match of a product whose fix takes it in log
// space (fixes.ShapeProductChain), each factorial among fs the value its
// function returns with ln n! beside it: a float value, +Inf past its
// limit (an integer one has wrapped to a finite value, which a Product
// would keep, so any other factorial leaves the match without a shape).
func (fc *fnCtx) factorialChain(root ast.Expr, fs []factor) *fixes.Match {
	m := &fixes.Match{Shape: fixes.ShapeProductChain, Node: root, Result: fc.c.pass.TypesInfo.TypeOf(root)}
	for _, f := range fs {
		if f.kind != kindNone {
			if f.call == nil || f.fact == nil || f.kind != kindFactorial || !f.t.Float {
				m.Shape = fixes.ShapeNone
				break
			}
			m.Factorials = append(m.Factorials, fixes.FactorialCall{Call: f.call, Arg: f.arg, Off: f.off})
		}
	}
	return m
}

// factorialChainOf is the match of a float product or ratio of
// factorial values whose fix takes it in log space: the expression
// itself as a chain (factorialChain) where every factorial call lies in
// it; where some lie in the values of locals it reads, assigned once
// (num := 2^nAB·n!·nA!·nB!; return num / (…)), those locals are carried
// as Products too (fixes.ShapeLogSpaceTerm), so that a numerator past
// float64 keeps its value until the divisor brings it back. A match
// without a shape where neither applies.
func (fc *fnCtx) factorialChainOf(root ast.Expr, p *product) *fixes.Match {
	m := fc.factorialChain(root, append(p.num[:len(p.num):len(p.num)], p.den...))
	if m.Shape == fixes.ShapeNone || within(root, p.num, p.den) {
		return m
	}
	calls := make(map[*ast.CallExpr]bool)
	for _, f := range m.Factorials {
		calls[f.Call] = true
	}
	var locals []ast.Expr
	var walk func(e ast.Expr, depth int)
	walk = func(e ast.Expr, depth int) {
		if depth > maxDepth {
			return
		}
		switch x := fc.stripConv(e).(type) {
		case *ast.BinaryExpr:
			if x.Op == token.MUL || x.Op == token.QUO {
				walk(x.X, depth+1)
				walk(x.Y, depth+1)
			}
		case *ast.Ident:
			if def := fc.singleDef(x); def != nil && holdsCall(def, calls) {
				locals = append(locals, x)
			}
		}
	}
	walk(root, 0)
	if len(locals) == 0 {
		m.Shape = fixes.ShapeNone
		return m
	}
	m.Shape, m.Args, m.Func = fixes.ShapeLogSpaceTerm, locals, fc.node
	return m
}

// holdsCall reports whether one of calls lies in e.
func holdsCall(e ast.Expr, calls map[*ast.CallExpr]bool) bool {
	found := false
	ast.Inspect(e, func(n ast.Node) bool {
		if c, ok := n.(*ast.CallExpr); ok && calls[c] {
			found = true
		}
		return !found
	})
	return found
}

// evalProduct splits e into known factors, following local variables
// that are assigned exactly once.
func (fc *fnCtx) evalProduct(e ast.Expr) *product {
	p := new(product)
	fc.evalInto(p, e, false, 0)
	return p
}

func (fc *fnCtx) evalInto(p *product, e ast.Expr, den bool, depth int) {
	if depth > maxDepth {
		p.other++
		return
	}
	e = fc.stripConv(e)
	switch e := e.(type) {
	case *ast.BinaryExpr:
		switch e.Op {
		case token.MUL:
			fc.evalInto(p, e.X, den, depth+1)
			fc.evalInto(p, e.Y, den, depth+1)
			return
		case token.QUO:
			fc.evalInto(p, e.X, den, depth+1)
			fc.evalInto(p, e.Y, !den, depth+1)
			return
		case token.SHL:
			if den {
				// A divisor x << s is x·2^s, s ≥ 0: the quotient is
				// at most the one by x, a factor the product does not
				// know beside it.
				fc.evalInto(p, e.X, den, depth+1)
				p.other++
				return
			}
		}
	case *ast.CallExpr:
		if f, ok := fc.factorOf(e); ok {
			if den {
				p.den = append(p.den, f)
			} else {
				p.num = append(p.num, f)
			}
			return
		}
	case *ast.IndexExpr:
		if tbl := fc.tableOf(e); tbl != nil {
			f := factor{kind: kindFactorial, arg: e.Index, t: tbl.elem, fact: &tbl.fact, table: tbl}
			if den {
				p.den = append(p.den, f)
			} else {
				p.num = append(p.num, f)
			}
			p.tabled = true
			return
		}
	case *ast.Ident:
		if al := fc.powerLoopOf(fc.c.objOf(e)); al != nil && e.Pos() > al.shape.stmt.End() {
			// The accumulator of a power loop, used after the loop.
			t, _ := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(e))
			f := factor{math: "Pow", arg: al.mult, arg2: al.count, t: t}
			if al.coff == 0 {
				// The loop runs count trips exactly: its product is
				// the power a fix may take for it.
				f.acc, f.loop = e, al.shape.stmt
			}
			p.num = append(p.num, f)
			return
		}
		if def := fc.singleDef(e); def != nil {
			fc.inlined(def)
			fc.evalInto(p, def, den, depth+1)
			return
		}
	}
	p.other++
}

// factorOf recognises a call as a known factor.
func (fc *fnCtx) factorOf(call *ast.CallExpr) (factor, bool) {
	c := fc.c
	fn := c.calleeOf(call)
	if fn == nil {
		return factor{}, false
	}
	f := factor{call: call, fn: fn}
	if fn.Pkg() != nil && fn.Pkg().Path() == "math" {
		switch fn.Name() {
		case "Gamma", "Exp":
			if len(call.Args) != 1 {
				return f, false
			}
			f.math, f.arg = fn.Name(), call.Args[0]
		case "Pow":
			if len(call.Args) != 2 {
				return f, false
			}
			f.math, f.arg, f.arg2 = "Pow", call.Args[0], call.Args[1]
		default:
			return f, false
		}
		f.t, _ = c.numOf(c.pass.TypesInfo.TypeOf(call))
		return f, true
	}
	fact := c.factOf(fn)
	if fact == nil || fact.Param >= len(call.Args) {
		return f, false
	}
	t, ok := c.numOf(c.pass.TypesInfo.TypeOf(call))
	if !ok {
		return f, false
	}
	f.kind = kindOfName(fact.Kind)
	f.arg, f.off, f.t, f.fact = call.Args[fact.Param], fact.Offset, t, fact
	if fact.Param2 >= 0 && fact.Param2 < len(call.Args) {
		f.arg2 = call.Args[fact.Param2]
	}
	return f, true
}

func kindOfName(s string) facKind {
	for k, name := range kindNames {
		if name == s {
			return k
		}
	}
	return kindNone
}

// singleDef returns the one value a local variable is ever given, or nil
// when it is assigned more than once, in a closure, by address, or is a
// parameter.
func (d *definitions) singleDef(id *ast.Ident) ast.Expr {
	obj := d.q.objOf(id)
	if obj == nil || !(d.node.Pos() <= obj.Pos() && obj.Pos() < d.node.End()) {
		return nil
	}
	defs := d.defsOf(obj)
	if len(defs) != 1 {
		return nil
	}
	return defs[0]
}

// collectDefs records every value each local variable is given; a nil
// value stands for a change the analyzer does not follow.
func (d *definitions) collectDefs() {
	d.defs = make(map[types.Object][]ast.Expr)
	info := d.q.info
	note := func(lhs ast.Expr, rhs ast.Expr) {
		if obj := d.q.objOf(lhs); obj != nil {
			d.defs[obj] = append(d.defs[obj], rhs)
		}
	}
	ast.Inspect(funcBody(d.node), func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.AssignStmt:
			for i, l := range n.Lhs {
				if (n.Tok == token.ASSIGN || n.Tok == token.DEFINE) && len(n.Rhs) == len(n.Lhs) {
					note(l, n.Rhs[i])
				} else {
					note(l, nil)
					note(l, nil)
				}
			}
		case *ast.ValueSpec:
			for i, name := range n.Names {
				if obj := info.Defs[name]; obj != nil {
					if len(n.Values) == len(n.Names) {
						d.defs[obj] = append(d.defs[obj], n.Values[i])
					} else {
						d.defs[obj] = append(d.defs[obj], nil, nil)
					}
				}
			}
		case *ast.IncDecStmt:
			note(n.X, nil)
			note(n.X, nil)
		case *ast.UnaryExpr:
			if n.Op == token.AND {
				note(n.X, nil)
				note(n.X, nil)
			}
		case *ast.RangeStmt:
			if n.Key != nil {
				note(n.Key, nil)
				note(n.Key, nil)
			}
			if n.Value != nil {
				note(n.Value, nil)
				note(n.Value, nil)
			}
		}
		return true
	})
}

// inlinedValues is the values of a function that a larger product
// consumes, noted by the product that reads them (inlined).
type inlinedValues struct{ set map[ast.Expr]bool }

var inlinedKey = &stateKey[inlinedValues]{"values consumed by a larger product"}

// inlined marks a variable's value as consumed by a larger expression,
// so that it is not also judged on its own.
func (fc *fnCtx) inlined(e ast.Expr) {
	in := stateOf(fc, inlinedKey)
	if in.set == nil {
		in.set = make(map[ast.Expr]bool)
	}
	in.set[ast.Unparen(e)] = true
}

// isInlined reports whether a larger product consumes e (inlined).
func (fc *fnCtx) isInlined(e ast.Expr) bool {
	in := peekState(fc, inlinedKey)
	return in != nil && in.set[ast.Unparen(e)]
}
