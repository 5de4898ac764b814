package analyzer

import (
	"cmp"
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"slices"

	"github.com/overfact/overfact/internal/assigned"
)

// Factorial tables (phase 1): a slice or array whose element i a loop
// fills with i!, by the recurrence t[i] = t[i-1]*i after t[lo-1] = 1, or
// by storing a running product, p *= i; t[i] = p, with p started at 1.
// Outside that loop a read t[e] is the factorial of e, a factor of
// products and ratios (products.go) as a factorial function's call is.

// facTable is a factorial table of the package.
type facTable struct {
	obj  *types.Var
	fill *ast.ForStmt // the loop that fills it
	in   ast.Node     // the function that holds the loop
	elem numType
	// fact is the table's factorial fact: the element at an index past
	// FirstBad is broken, and a loop with a constant bound below it
	// leaves the table Safe.
	fact FactorialFact
}

// tablesState is the pass's factorial tables, by their variable.
type tablesState struct {
	byVar map[types.Object]*facTable
}

var tablesKey = &stateKey[tablesState]{"factorial tables, by variable"}

// tableOf returns the factorial table that index reads, when the read is
// outside the loop that fills it (and after it, in the loop's function).
func (fc *fnCtx) tableOf(ix *ast.IndexExpr) *facTable {
	st := passStateOf(fc.c, tablesKey)
	if st.byVar == nil {
		return nil
	}
	tbl := st.byVar[fc.c.objOf(ix.X)]
	if tbl == nil || tbl.fill.Pos() <= ix.Pos() && ix.End() <= tbl.fill.End() {
		return nil
	}
	if fc.node == tbl.in && ix.Pos() < tbl.fill.End() {
		return nil
	}
	return tbl
}

// findFactorialTables finds the tables of the package's functions that
// may hold a product loop (the scan's worthLoops), and marks the
// functions that read one as worth checking.
func (c *checker) findFactorialTables(scans map[ast.Node]*scan) {
	var found []*facTable
	for _, n := range c.allFuncs {
		if s := scans[n]; s == nil || !s.worthLoops() || funcBody(n) == nil {
			continue
		}
		ast.Inspect(funcBody(n), func(m ast.Node) bool {
			if loop, ok := m.(*ast.ForStmt); ok {
				if tbl := c.tableFill(n, loop); tbl != nil {
					found = append(found, tbl)
				}
			}
			return true
		})
	}
	if len(found) == 0 {
		return
	}
	byVar := make(map[types.Object]*facTable)
	for _, tbl := range found {
		if _, dup := byVar[tbl.obj]; dup {
			byVar[tbl.obj] = nil // filled twice: neither fill is the table
			continue
		}
		byVar[tbl.obj] = tbl
	}
	c.dropChangedTables(byVar)
	if len(byVar) == 0 {
		return
	}
	passStateOf(c, tablesKey).byVar = byVar
	for _, n := range c.allFuncs {
		s := scans[n]
		if s == nil || s.knownCall || funcBody(n) == nil {
			continue
		}
		ast.Inspect(funcBody(n), func(m ast.Node) bool {
			if ix, ok := m.(*ast.IndexExpr); ok && byVar[c.objOf(ix.X)] != nil {
				s.knownCall = true
			}
			return !s.knownCall
		})
	}
}

// tableFill matches loop, `for i := lo; i <= hi; i++` (or i < hi), as
// the fill of a factorial table; fn is the function that holds it.
func (c *checker) tableFill(fn ast.Node, loop *ast.ForStmt) *facTable {
	q := c.queries()
	init, ok := loop.Init.(*ast.AssignStmt)
	post, ok2 := loop.Post.(*ast.IncDecStmt)
	cond, ok3 := loop.Cond.(*ast.BinaryExpr)
	if !ok || !ok2 || !ok3 || len(init.Lhs) != 1 || len(init.Rhs) != 1 || post.Tok != token.INC {
		return nil
	}
	i := q.objOf(init.Lhs[0])
	lo, ok := q.intConst(init.Rhs[0])
	if i == nil || !ok || lo < 1 || q.objOf(post.X) != i || q.objOf(cond.X) != i || cond.Op != token.LEQ && cond.Op != token.LSS {
		return nil
	}
	for _, st := range loop.Body.List {
		as, ok := st.(*ast.AssignStmt)
		if !ok || as.Tok != token.ASSIGN || len(as.Lhs) != 1 || len(as.Rhs) != 1 {
			continue
		}
		ix, ok := ast.Unparen(as.Lhs[0]).(*ast.IndexExpr)
		if !ok || q.objOf(ix.Index) != i {
			continue
		}
		t, _ := q.objOf(ix.X).(*types.Var)
		elem, ok := c.elemNum(t)
		if !ok {
			continue
		}
		if !c.recurrenceStep(t, i, as.Rhs[0], fn, lo) && !c.runningStore(t, i, as.Rhs[0], fn, loop) {
			continue
		}
		tbl := &facTable{obj: t, fill: loop, in: fn, elem: elem}
		tbl.fact = FactorialFact{Kind: kindNames[kindFactorial], Param: 0, Param2: -1}
		tbl.fact.FirstBad = firstBadOf(kindFactorial, elem)
		if hi, ok := q.intConst(cond.Y); ok {
			if cond.Op == token.LSS {
				hi--
			}
			if hi < tbl.fact.FirstBad {
				tbl.fact.Safe, tbl.fact.Lo, tbl.fact.Hi = true, 0, hi
			}
		}
		return tbl
	}
	return nil
}

// elemNum returns the numeric element type of a slice or array variable.
func (c *checker) elemNum(t *types.Var) (numType, bool) {
	if t == nil {
		return numType{}, false
	}
	var elem types.Type
	switch u := t.Type().Underlying().(type) {
	case *types.Slice:
		elem = u.Elem()
	case *types.Array:
		elem = u.Elem()
	default:
		return numType{}, false
	}
	return c.numOf(elem)
}

// recurrenceStep matches rhs as t[i-1]*i (either order, i converted or
// not) with t[lo-1] = 1 assigned in fn.
func (c *checker) recurrenceStep(t *types.Var, i types.Object, rhs ast.Expr, fn ast.Node, lo int64) bool {
	q := c.queries()
	b, ok := ast.Unparen(rhs).(*ast.BinaryExpr)
	if !ok || b.Op != token.MUL {
		return false
	}
	for _, pair := range [2][2]ast.Expr{{b.X, b.Y}, {b.Y, b.X}} {
		prev, ok := ast.Unparen(pair[0]).(*ast.IndexExpr)
		if !ok || q.objOf(prev.X) != t || q.objOf(q.stripConv(pair[1])) != i {
			continue
		}
		d, ok := ast.Unparen(prev.Index).(*ast.BinaryExpr)
		if one, ok1 := q.intConst(d.Y); !ok || d.Op != token.SUB || q.objOf(d.X) != i || !ok1 || one != 1 {
			continue
		}
		return c.assignsOne(fn, func(lhs ast.Expr) bool {
			ix, ok := ast.Unparen(lhs).(*ast.IndexExpr)
			k, ok1 := q.intConst(ix.Index)
			return ok && ok1 && q.objOf(ix.X) == t && k == lo-1
		})
	}
	return false
}

// runningStore matches rhs as the accumulator p of a running product
// p *= i (or p = p*i) earlier in the loop's body, with p started at 1
// by its only other assignment in fn.
func (c *checker) runningStore(t *types.Var, i types.Object, rhs ast.Expr, fn ast.Node, loop *ast.ForStmt) bool {
	q := c.queries()
	p := q.objOf(rhs)
	if p == nil || p == t {
		return false
	}
	stepped := false
	for _, st := range loop.Body.List {
		as, ok := st.(*ast.AssignStmt)
		if !ok || len(as.Lhs) != 1 || len(as.Rhs) != 1 || q.objOf(as.Lhs[0]) != p {
			continue
		}
		if as.Rhs[0] == rhs {
			break
		}
		switch as.Tok {
		case token.MUL_ASSIGN:
			stepped = q.objOf(q.stripConv(as.Rhs[0])) == i
		case token.ASSIGN:
			b, ok := ast.Unparen(as.Rhs[0]).(*ast.BinaryExpr)
			stepped = ok && b.Op == token.MUL && (q.objOf(b.X) == p && q.objOf(q.stripConv(b.Y)) == i || q.objOf(b.Y) == p && q.objOf(q.stripConv(b.X)) == i)
		}
	}
	if !stepped {
		return false
	}
	// p's assignments in fn: the start at 1 and the step.
	starts, others := 0, 0
	ast.Inspect(funcBody(fn), func(m ast.Node) bool {
		as, ok := m.(*ast.AssignStmt)
		if !ok {
			return true
		}
		for k, lhs := range as.Lhs {
			if q.objOf(lhs) != p {
				continue
			}
			if v, ok := q.intConst(q.stripConv(as.Rhs[min(k, len(as.Rhs)-1)])); ok && v == 1 && len(as.Lhs) == len(as.Rhs) && !(loop.Pos() <= as.Pos() && as.End() <= loop.End()) {
				starts++
			} else if !(loop.Pos() <= as.Pos() && as.End() <= loop.End()) {
				others++
			}
		}
		return true
	})
	return starts == 1 && others == 0
}

// assignsOne reports whether fn assigns the constant 1 to an operand
// that match accepts.
func (c *checker) assignsOne(fn ast.Node, match func(ast.Expr) bool) bool {
	q := c.queries()
	found := false
	ast.Inspect(funcBody(fn), func(m ast.Node) bool {
		as, ok := m.(*ast.AssignStmt)
		if !ok || found || as.Tok != token.ASSIGN || len(as.Lhs) != 1 || len(as.Rhs) != 1 {
			return !found
		}
		v, ok := q.intConst(q.stripConv(as.Rhs[0]))
		found = ok && v == 1 && match(as.Lhs[0])
		return !found
	})
	return found
}

// dropChangedTables removes the tables whose variable or elements the
// package assigns anywhere else than the fill loop, its start value and
// one declaration, := or = of the variable itself (make, a literal).
func (c *checker) dropChangedTables(byVar map[types.Object]*facTable) {
	q := c.queries()
	whole := make(map[types.Object]int)
	for _, n := range c.allFuncs {
		if funcBody(n) == nil {
			continue
		}
		assigned.EachTarget(funcBody(n), nil, func(e ast.Expr, m ast.Node) bool {
			if v := q.objOf(e); v != nil && byVar[v] != nil {
				whole[v]++
				return true
			}
			ix, ok := ast.Unparen(e).(*ast.IndexExpr)
			if !ok {
				return true
			}
			tbl := byVar[q.objOf(ix.X)]
			if tbl == nil {
				return true
			}
			inFill := tbl.fill.Pos() <= ix.Pos() && ix.End() <= tbl.fill.End()
			k, isConst := q.intConst(ix.Index)
			if !inFill && !(isConst && n == tbl.in && k >= 0 && c.isStart(m)) {
				byVar[tbl.obj] = nil
			}
			return true
		})
	}
	for v, tbl := range byVar {
		if tbl == nil || whole[v] > 1 {
			delete(byVar, v)
		}
	}
}

// isStart reports whether m assigns the constant 1.
func (c *checker) isStart(m ast.Node) bool {
	as, ok := m.(*ast.AssignStmt)
	if !ok || len(as.Rhs) != 1 {
		return false
	}
	v, ok := c.queries().intConst(c.queries().stripConv(as.Rhs[0]))
	return ok && v == 1
}

// checkTableFills reports the loops of this function that fill an
// integer factorial table past the last index whose factorial fits its
// element type: every element from there on has wrapped, whoever reads
// it (a table returned or kept in a package variable is read outside).
// A float table is left to its readers: its elements past the limit are
// +Inf, as the factorials they stand for are, and only a ratio of them
// goes wrong (products.go).
func (fc *fnCtx) checkTableFills() {
	// The function's integer tables, in the order of their fills, so
	// that the findings come in source order whatever the map's order.
	var fills []*facTable
	for _, tbl := range passStateOf(fc.c, tablesKey).byVar {
		if tbl != nil && tbl.in == fc.node && !tbl.elem.Float && !tbl.fact.Safe {
			fills = append(fills, tbl)
		}
	}
	slices.SortFunc(fills, func(a, b *facTable) int { return cmp.Compare(a.fill.Pos(), b.fill.Pos()) })
	for _, tbl := range fills {
		cond, ok := tbl.fill.Cond.(*ast.BinaryExpr)
		if !ok {
			continue
		}
		// The last index the loop stores: hi for i <= hi, hi−1 for i < hi.
		off := int64(0)
		if cond.Op == token.LSS {
			off = -1
		}
		first := tbl.fact.FirstBad
		name, last := shownFactorial(cond.Y, off)
		if name == "" && last < first {
			continue
		}
		r := fc.endRange(cond.Y, off)
		if r.IsEmpty() || r.Hi < first && !typeLimit(r.Hi) {
			continue
		}
		clause, definite := verdict(shownName(cond.Y), fc.rangeOf(cond.Y), first-off)
		msg := fmt.Sprintf("loop fills the factorial table %s with i! at index i up to %s: the %s",
			tbl.obj.Name(), plus(name, last), factorialLimitText(kindFactorial, name, last, tbl.elem))
		fc.report(finding{node: tbl.fill, cat: catLoop, definite: definite, msg: msg + clause})
	}
}
