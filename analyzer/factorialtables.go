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
// fills with i!, by the recurrence t[i] = t[i-1]*i after t[lo-1] = 1, by
// storing a running product, p *= i; t[i] = p, with p started at 1, or by
// growing the slice, t = append(t, t[len(t)-1]*len(t)) (appendFill).
// Outside that loop a read t[e] is the factorial of e, a factor of
// products and ratios (products.go) as a factorial function's call is.

// facTable is a factorial table of the package.
type facTable struct {
	obj  *types.Var
	fill *ast.ForStmt // the loop that fills it
	in   ast.Node     // the function that holds the loop
	// grow is the fill's t = append(t, …) for a table grown by append,
	// the one assignment of the whole variable besides its declaration.
	grow *ast.AssignStmt
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
				tbl := c.tableFill(n, loop)
				if tbl == nil {
					tbl = c.appendFill(n, loop)
				}
				if tbl != nil {
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
		return c.newTable(t, elem, fn, loop, cond)
	}
	return nil
}

// newTable returns the factorial table t of elem that loop fills while
// cond holds; a constant bound below the first factorial past elem
// leaves it Safe.
func (c *checker) newTable(t *types.Var, elem numType, fn ast.Node, loop *ast.ForStmt, cond *ast.BinaryExpr) *facTable {
	tbl := &facTable{obj: t, fill: loop, in: fn, elem: elem}
	tbl.fact = FactorialFact{Kind: kindNames[kindFactorial], Param: 0, Param2: -1}
	tbl.fact.FirstBad = firstBadOf(kindFactorial, elem)
	if hi, ok := c.queries().intConst(cond.Y); ok {
		if cond.Op == token.LSS {
			hi--
		}
		if hi < tbl.fact.FirstBad {
			tbl.fact.Safe, tbl.fact.Lo, tbl.fact.Hi = true, 0, hi
		}
	}
	return tbl
}

// appendFill matches loop as the growth of a factorial table by append,
//
//	for len(t) <= n {
//		m := len(t)
//		t = append(t, t[m-1]*float64(m))
//	}
//
// or `for i := lo; i <= n; i++ { t = append(t, t[i-1]*int64(i)) }`: the
// element appended at index m = len(t) is t[m−1]·m, so t[m] = m! when t
// starts with 0!, 1!, … (a literal; startFactorials). The length is read
// as len(t), a local set to len(t) before the append, or the loop's
// index when t starts with lo elements and the body appends exactly once
// a trip (no branch in it). The loop's condition is on the index or on
// len(t), whose last stored index it bounds as an index loop's does.
func (c *checker) appendFill(fn ast.Node, loop *ast.ForStmt) *facTable {
	q := c.queries()
	cond, ok := loop.Cond.(*ast.BinaryExpr)
	if !ok || cond.Op != token.LEQ && cond.Op != token.LSS {
		return nil
	}
	var idx types.Object
	lo := int64(-1)
	if init, ok := loop.Init.(*ast.AssignStmt); ok && len(init.Lhs) == 1 && len(init.Rhs) == 1 {
		post, ok := loop.Post.(*ast.IncDecStmt)
		v, isConst := q.intConst(init.Rhs[0])
		i := q.objOf(init.Lhs[0])
		if ok && isConst && post.Tok == token.INC && q.objOf(post.X) == i && i != nil && !branches(loop.Body) && !assignedOutside(c.pass.TypesInfo, loop.Body, i, nil) {
			idx, lo = i, v
		}
	}
	for i, st := range loop.Body.List {
		as, ok := st.(*ast.AssignStmt)
		if !ok || as.Tok != token.ASSIGN || len(as.Lhs) != 1 || len(as.Rhs) != 1 {
			continue
		}
		t, _ := q.objOf(as.Lhs[0]).(*types.Var)
		call, ok := ast.Unparen(as.Rhs[0]).(*ast.CallExpr)
		if t == nil || !ok || !c.isBuiltin(call, "append") || len(call.Args) != 2 || call.Ellipsis.IsValid() || q.objOf(call.Args[0]) != t {
			continue
		}
		elem, ok := c.elemNum(t)
		start := c.startFactorials(fn, t)
		if !ok || start < 1 {
			continue
		}
		// isLen reports whether e is len(t) where the append runs.
		isLen := func(e ast.Expr) bool {
			e = q.stripConv(e)
			if c.lenOf(e) == t {
				return true
			}
			v := q.objOf(e)
			if v != nil && v == idx {
				return lo == start
			}
			def := c.lenDef(loop.Body.List[:i], v, t)
			return def != nil && !assignedOutside(c.pass.TypesInfo, loop.Body, v, def)
		}
		if (q.objOf(cond.X) != idx || idx == nil) && c.lenOf(ast.Unparen(cond.X)) != t {
			return nil
		}
		if !c.prevTimes(t, call.Args[1], isLen) {
			continue
		}
		tbl := c.newTable(t, elem, fn, loop, cond)
		tbl.grow = as
		return tbl
	}
	return nil
}

// prevTimes matches e as t[m-1]*m (either order), isM telling m.
func (c *checker) prevTimes(t *types.Var, e ast.Expr, isM func(ast.Expr) bool) bool {
	q := c.queries()
	b, ok := ast.Unparen(e).(*ast.BinaryExpr)
	if !ok || b.Op != token.MUL {
		return false
	}
	for _, pair := range [2][2]ast.Expr{{b.X, b.Y}, {b.Y, b.X}} {
		prev, ok := ast.Unparen(pair[0]).(*ast.IndexExpr)
		if !ok || q.objOf(prev.X) != t || !isM(pair[1]) {
			continue
		}
		d, ok := ast.Unparen(prev.Index).(*ast.BinaryExpr)
		if !ok || d.Op != token.SUB || !isM(d.X) {
			continue
		}
		if one, ok := q.intConst(d.Y); ok && one == 1 {
			return true
		}
	}
	return false
}

// isBuiltin reports whether call calls the predeclared function name.
func (c *checker) isBuiltin(call *ast.CallExpr, name string) bool {
	id, ok := ast.Unparen(call.Fun).(*ast.Ident)
	if !ok {
		return false
	}
	b, ok := c.pass.TypesInfo.Uses[id].(*types.Builtin)
	return ok && b.Name() == name
}

// lenOf returns the variable v of e = len(v), or nil.
func (c *checker) lenOf(e ast.Expr) types.Object {
	call, ok := e.(*ast.CallExpr)
	if !ok || len(call.Args) != 1 || !c.isBuiltin(call, "len") {
		return nil
	}
	return c.objOf(call.Args[0])
}

// lenDef returns the statement of stmts that defines v := len(t), or nil.
func (c *checker) lenDef(stmts []ast.Stmt, v, t types.Object) *ast.AssignStmt {
	for _, st := range stmts {
		as, ok := st.(*ast.AssignStmt)
		if ok && v != nil && as.Tok == token.DEFINE && len(as.Lhs) == 1 && len(as.Rhs) == 1 && c.pass.TypesInfo.Defs[as.Lhs[0].(*ast.Ident)] == v && c.lenOf(ast.Unparen(as.Rhs[0])) == t {
			return as
		}
	}
	return nil
}

// branches reports whether body holds a break, continue or goto (of its
// own loop or another), which may skip a statement of a trip.
func branches(body *ast.BlockStmt) bool {
	found := false
	ast.Inspect(body, func(n ast.Node) bool {
		_, ok := n.(*ast.BranchStmt)
		found = found || ok
		return !found
	})
	return found
}

// startFactorials returns how many elements the literal that declares
// t (in fn, or at package level) holds when they are 0!, 1!, … in turn;
// 0 when t is declared otherwise or they are not.
func (c *checker) startFactorials(fn ast.Node, t *types.Var) int64 {
	var lit *ast.CompositeLit
	find := func(root ast.Node) {
		ast.Inspect(root, func(n ast.Node) bool {
			if lit != nil {
				return false
			}
			var names []*ast.Ident
			var values []ast.Expr
			switch n := n.(type) {
			case *ast.AssignStmt:
				if n.Tok == token.DEFINE {
					for _, l := range n.Lhs {
						id, _ := l.(*ast.Ident)
						names = append(names, id)
					}
					values = n.Rhs
				}
			case *ast.ValueSpec:
				names, values = n.Names, n.Values
			}
			for k, id := range names {
				if id != nil && len(names) == len(values) && c.pass.TypesInfo.Defs[id] == t {
					lit, _ = ast.Unparen(values[k]).(*ast.CompositeLit)
				}
			}
			return true
		})
	}
	if t.Parent() == t.Pkg().Scope() {
		for _, f := range c.pass.Files {
			for _, d := range f.Decls {
				if g, ok := d.(*ast.GenDecl); ok && g.Tok == token.VAR {
					find(g)
				}
			}
		}
	} else {
		find(funcBody(fn))
	}
	if lit == nil {
		return 0
	}
	want := int64(1)
	for k, e := range lit.Elts {
		if k > 0 {
			want *= int64(k)
		}
		if v, ok := c.queries().intConst(e); !ok || v != want || k > 20 {
			return 0
		}
	}
	return int64(len(lit.Elts))
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
	if !c.prevTimes(t, rhs, func(e ast.Expr) bool { return q.objOf(q.stripConv(e)) == i }) {
		return false
	}
	return c.assignsOne(fn, func(lhs ast.Expr) bool {
		ix, ok := ast.Unparen(lhs).(*ast.IndexExpr)
		if !ok {
			return false
		}
		k, ok := q.intConst(ix.Index)
		return ok && q.objOf(ix.X) == t && k == lo-1
	})
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
				if m != byVar[v].grow {
					whole[v]++
				}
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
		// One assignment of the whole variable is its declaration (make,
		// a literal); a table grown by append and declared at package
		// level, by its literal, has none: a second would reset it.
		limit := 1
		if tbl != nil && tbl.grow != nil && v.Parent() == v.Pkg().Scope() {
			limit = 0
		}
		if tbl == nil || whole[v] > limit {
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
