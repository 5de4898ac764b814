package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"math"

	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/internal/assigned"
)

// Tables of counts filled by additions, one row of the rule at a time,
// in a one-dimensional table (common practice: Pascal's row updated in
// place, the subsets of {1…n} counted by their sum as the exact
// distribution of a signed-rank statistic needs, the partitions of n):
//
//	c := make([]uint64, top+1)
//	c[0] = 1
//	for r := 1; r <= n; r++ {
//		for s := top; s >= r; s-- { // or s := r; s <= top; s++
//			c[s] += c[s-r]
//		}
//	}
//
// No single entry is multiplied, yet the largest entry grows
// exponentially with the rows (A025591 for subsets, C(n, n/2) for
// Pascal's row, p(n) for partitions) and wraps silently in an integer
// type; every later row adds the wrapped entries on.
// thresholds.CountTable follows the table the code fills, its end
// evaluated from the code at each row. Only tables whose every write is
// the make (or a zero array), one c[0] = K ≥ 1 before the loops and the
// step are read; the inner loop must cover every entry from the part
// to the table's end in each row, with nothing else in its body, and
// the rows must count one by one from a constant. Reported as
// pascal-rule; floats are left alone. No fix: the table's entries past
// the type have no integer type to go to.

// checkCountTables reports the count tables body fills.
func (fc *fnCtx) checkCountTables(body *ast.BlockStmt) {
	blockLoops(body, func(_ []ast.Stmt, loop *ast.ForStmt) { fc.judgeCountLoop(body, loop) })
}

// countStep is an inner loop's one statement c[s] += c[s-d] read with
// its loop.
type countStep struct {
	stmt        *ast.AssignStmt
	table       types.Object
	t           numType
	rule        thresholds.CountRule
	end         ast.Expr // the last index the inner loop reaches, plus endAdj
	endAdj      int64
	rowEnd      ast.Expr // the outer counter's last value, plus rowAdj
	rowAdj      int64
	counterName string
	index       string       // the inner counter's name
	counter     types.Object // the outer counter
	counterID   *ast.Ident   // where the outer loop declares it
	perRow      bool         // the end moves with the rows (for j := i; j >= 1; j--)
}

// judgeCountLoop judges outer as the rows of a count table.
func (fc *fnCtx) judgeCountLoop(fnBody *ast.BlockStmt, outer *ast.ForStmt) {
	counter, start, ok := fc.unitCounter(outer)
	if !ok {
		return
	}
	rowEnd, rowAdj, ok := fc.upperEnd(outer.Cond, counter)
	if !ok {
		return
	}
	for _, st := range outer.Body.List {
		inner, ok := st.(*ast.ForStmt)
		if !ok {
			continue
		}
		cs, ok := fc.countStepOf(inner, counter)
		if !ok {
			continue
		}
		cs.rule.Start, cs.rowEnd, cs.rowAdj, cs.counterName, cs.counterID = start, rowEnd, rowAdj, counter.Name, counter
		if fc.countTableOnly(fnBody, outer, cs) {
			fc.judgeCountStep(outer, cs)
		}
	}
}

// upperEnd reads cond as i <= X (the counter's last value X) or i < X
// (X − 1).
func (fc *fnCtx) upperEnd(cond ast.Expr, counter *ast.Ident) (ast.Expr, int64, bool) {
	b, ok := ast.Unparen(cond).(*ast.BinaryExpr)
	if !ok || fc.c.objOf(b.X) == nil || fc.c.objOf(b.X) != fc.c.objOf(counter) {
		return nil, 0, false
	}
	switch b.Op {
	case token.LEQ:
		return b.Y, 0, true
	case token.LSS:
		return b.Y, -1, true
	}
	return nil, 0, false
}

// countStepOf reads inner as for s := top; s >= d; s-- (or s := d; s
// <= top; s++) { c[s] += c[s-d] }, d = r + β or a constant β ≥ 1.
func (fc *fnCtx) countStepOf(inner *ast.ForStmt, counter *ast.Ident) (countStep, bool) {
	var cs countStep
	init, ok1 := inner.Init.(*ast.AssignStmt)
	post, ok2 := inner.Post.(*ast.IncDecStmt)
	cond, ok3 := ast.Unparen(inner.Cond).(*ast.BinaryExpr)
	if !ok1 || !ok2 || !ok3 || len(init.Lhs) != 1 || len(init.Rhs) != 1 || len(inner.Body.List) != 1 {
		return cs, false
	}
	sObj := fc.c.objOf(init.Lhs[0])
	if sObj == nil || fc.c.objOf(post.X) != sObj || fc.c.objOf(cond.X) != sObj || assigned.In(fc.c.pass.TypesInfo, inner.Body, sObj, nil) {
		return cs, false
	}
	// The first index the loop updates (low, +lowAdj) and the last.
	var low ast.Expr
	var lowAdj int64
	cs.rule.Falling = post.Tok == token.DEC
	switch {
	case cs.rule.Falling && cond.Op == token.GEQ:
		low, cs.end = cond.Y, init.Rhs[0]
	case cs.rule.Falling && cond.Op == token.GTR:
		low, lowAdj, cs.end = cond.Y, 1, init.Rhs[0]
	case !cs.rule.Falling && cond.Op == token.LEQ:
		low, cs.end = init.Rhs[0], cond.Y
	case !cs.rule.Falling && cond.Op == token.LSS:
		low, cs.end, cs.endAdj = init.Rhs[0], cond.Y, -1
	default:
		return cs, false
	}
	as, ok := inner.Body.List[0].(*ast.AssignStmt)
	if !ok || len(as.Lhs) != 1 || len(as.Rhs) != 1 {
		return cs, false
	}
	lhs, ok := as.Lhs[0].(*ast.IndexExpr)
	if !ok || fc.c.objOf(lhs.Index) != sObj {
		return cs, false
	}
	table := fc.c.objOf(lhs.X)
	var read ast.Expr
	switch as.Tok {
	case token.ADD_ASSIGN:
		read = as.Rhs[0]
	case token.ASSIGN:
		sum, ok := ast.Unparen(as.Rhs[0]).(*ast.BinaryExpr)
		if !ok || sum.Op != token.ADD {
			return cs, false
		}
		switch {
		case src(sum.X) == src(lhs):
			read = sum.Y
		case src(sum.Y) == src(lhs):
			read = sum.X
		default:
			return cs, false
		}
	default:
		return cs, false
	}
	rd, ok := ast.Unparen(read).(*ast.IndexExpr)
	if !ok || table == nil || fc.c.objOf(rd.X) != table {
		return cs, false
	}
	t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(lhs))
	if !ok || t.Float {
		return cs, false
	}
	// The part d = s − index, and the low end must be d itself.
	d, ok := fc.partOf(lhs.Index, rd.Index, counter)
	if !ok {
		return cs, false
	}
	cs.rule.Alpha, cs.rule.Beta = d.alpha, d.beta
	lw, ok := fc.partOf(low, nil, counter)
	if !ok || lw.alpha != d.alpha || lw.beta+lowAdj != d.beta {
		return cs, false
	}
	cs.counter = fc.c.objOf(counter)
	cs.perRow = mentions(fc.c.pass.TypesInfo, cs.end, cs.counter)
	cs.stmt, cs.table, cs.t, cs.index = as, table, t, sObj.Name()
	return cs, true
}

// part is α·r + β over the outer counter r, α 0 or 1.
type part struct{ alpha, beta int64 }

// partOf returns a − b (b nil: a) as a part over counter.
func (fc *fnCtx) partOf(a, b ast.Expr, counter *ast.Ident) (part, bool) {
	la, ok := fc.linear(a)
	if !ok {
		return part{}, false
	}
	if b != nil {
		lb, ok := fc.linear(b)
		if !ok {
			return part{}, false
		}
		la = la.add(lb.scale(-1))
	}
	switch {
	case len(la.Terms) == 0:
		return part{0, la.C}, true
	case len(la.Terms) == 1 && la.Terms[0].K == 1 && la.Terms[0].Sym.Object == fc.c.objOf(counter):
		return part{1, la.C}, true
	}
	return part{}, false
}

// countTableOnly reports whether the function writes the table only by
// its make (or as a zero array), one c[0] = K ≥ 1 before outer, and
// the step, and passes it to no call before the loops end.
func (fc *fnCtx) countTableOnly(fnBody *ast.BlockStmt, outer *ast.ForStmt, cs countStep) bool {
	info := fc.c.pass.TypesInfo
	if cs.table.Pos() < fnBody.Pos() || cs.table.Pos() > outer.Pos() {
		return false
	}
	made, seeded, ok := false, false, true
	assigned.EachTarget(fnBody, nil, func(target ast.Expr, at ast.Node) bool {
		root := assigned.Root(target)
		if root == nil || info.ObjectOf(root) != cs.table {
			return true
		}
		as, isAssign := at.(*ast.AssignStmt)
		switch {
		case at == cs.stmt:
		case isAssign && !made && at.Pos() < outer.Pos() && ast.Unparen(target) == root && len(as.Rhs) == 1 && isMake(info, as.Rhs[0]):
			made = true
		case isAssign && !seeded && at.Pos() < outer.Pos() && len(as.Lhs) == 1 && len(as.Rhs) == 1 && as.Tok == token.ASSIGN && fc.seed(target, as.Rhs[0], cs.table):
			seeded = true
		default:
			ok = false
		}
		return ok
	})
	if !ok || !seeded {
		return false
	}
	if !made {
		// var c [N]T: an array of zeros.
		if _, isArray := cs.table.Type().Underlying().(*types.Array); !isArray {
			return false
		}
	}
	passed := false
	ast.Inspect(fnBody, func(n ast.Node) bool {
		call, ok := n.(*ast.CallExpr)
		if !ok || call.Pos() > outer.End() {
			return !passed
		}
		if id, ok := call.Fun.(*ast.Ident); ok && (id.Name == "len" || id.Name == "cap" || id.Name == "make") {
			return true
		}
		for _, a := range call.Args {
			passed = passed || mentions(info, a, cs.table)
		}
		return !passed
	})
	return !passed
}

// isMake reports whether e is make(…), a table of zeros.
func isMake(info *types.Info, e ast.Expr) bool {
	call, ok := ast.Unparen(e).(*ast.CallExpr)
	if !ok {
		return false
	}
	id, ok := call.Fun.(*ast.Ident)
	_, builtin := info.ObjectOf(id).(*types.Builtin)
	return ok && builtin && id.Name == "make"
}

// seed reports whether target = v is c[0] = K with K a constant ≥ 1.
func (fc *fnCtx) seed(target, v ast.Expr, table types.Object) bool {
	ix, ok := ast.Unparen(target).(*ast.IndexExpr)
	if !ok || fc.c.objOf(ix.X) != table {
		return false
	}
	i, ok1 := fc.c.queries().intConst(ix.Index)
	k, ok2 := fc.c.queries().intConst(v)
	return ok1 && ok2 && i == 0 && k >= 1
}

// judgeCountStep reports cs where the rows may reach the first that
// leaves the type.
func (fc *fnCtx) judgeCountStep(outer *ast.ForStmt, cs countStep) {
	endAt, ok := fc.endOf(cs, outer)
	if !ok {
		fc.judgePascalRowTo(outer, cs)
		return
	}
	first := thresholds.CountTable(cs.t.Num, cs.rule, endAt)
	if first.None() {
		return
	}
	// The rows end at rowEnd + rowAdj: the first bad row in the bound's terms.
	bad := first.FirstBad - cs.rowAdj
	// Judged at the rows' bound, so that a function returning the table
	// carries the bound to its callers (wrongcallee.go).
	j := fc.judge(cs.rowEnd, bad)
	if j.silent {
		return
	}
	name := src(cs.rowEnd)
	r, c, sx := cs.counterName, cs.table.Name(), cs.index
	what := "its entries grow with every row"
	switch {
	case cs.rule.Falling && cs.rule.Alpha == 0 && cs.rule.Beta == 1 && cs.rule.Start == 1:
		what = fmt.Sprintf("after row %s it holds that row of Pascal's triangle, %s[%s] = C(%s, %s)", r, c, sx, r, sx)
	case cs.rule.Falling && cs.rule.Alpha == 1:
		what = fmt.Sprintf("each row adds one part, and %s[%s] counts the sets of distinct parts with sum %s", c, sx, sx)
	case !cs.rule.Falling && cs.rule.Alpha == 1:
		what = fmt.Sprintf("each row adds one part that may repeat, and %s[%s] counts the partitions of %s into those parts", c, sx, sx)
	}
	dir := "rising"
	if cs.rule.Falling {
		dir = "falling"
	}
	msg := fmt.Sprintf("table %s is filled by additions row by row (%s, %s %s) in %s: %s; its largest entry %s once %s reaches %d (the largest a row before, ≈ %s, fits), and the rows after add the wrapped entries on",
		c, stepText(cs.stmt), sx, dir, cs.t.typeName(), what, verb(cs.t), name, bad, first.LastGoodApprox())
	fc.report(finding{node: outer, cat: catPascal, definite: j.definite, msg: msg + j.clause})
}

// stepText prints an assignment of one target.
func stepText(as *ast.AssignStmt) string {
	return fmt.Sprintf("%s %s %s", src(as.Lhs[0]), as.Tok, src(as.Rhs[0]))
}

// endOf returns the table's last index at each row R, the code's end
// expression evaluated with the rows' bound at R − rowAdj.
func (fc *fnCtx) endOf(cs countStep, outer *ast.ForStmt) (func(int64) (int64, bool), bool) {
	if v, ok := fc.c.queries().intConst(cs.end); ok {
		return func(int64) (int64, bool) { return v + cs.endAdj, true }, true
	}
	ev := endEval{fc: fc, bound: cs.rowEnd, outer: outer}
	if cs.perRow {
		// An end that moves with the rows is read only where every row
		// reaches the last entry its parts make nonzero, so the table
		// holds every entry of the rule.
		if !cs.rule.Falling {
			return nil, false
		}
		ev.counter = cs.counter
		sum := int64(0)
		for r := cs.rule.Start; r <= cs.rule.Start+64; r++ {
			sum += cs.rule.Alpha*r + cs.rule.Beta
			ev.row = r
			v, ok := ev.eval(cs.end, 0)
			if !ok || v+cs.endAdj < sum {
				return nil, false
			}
		}
		return func(int64) (int64, bool) { return math.MaxInt64, true }, true
	}
	if _, ok := ev.eval(cs.end, 1); !ok {
		return nil, false
	}
	return func(R int64) (int64, bool) {
		v, ok := ev.eval(cs.end, R-cs.rowAdj)
		return v + cs.endAdj, ok
	}, true
}

// endEval evaluates an integer expression of the rows' bound: constants,
// + − * /, conversions, the bound itself (as written), locals defined
// once from such expressions and never changed, and len of a table made
// with such a length.
type endEval struct {
	fc      *fnCtx
	bound   ast.Expr
	outer   *ast.ForStmt
	depth   int
	counter types.Object // the outer counter, standing for row, or nil
	row     int64
}

func (ev endEval) eval(e ast.Expr, x int64) (int64, bool) {
	if ev.depth > maxDepth {
		return 0, false
	}
	ev.depth++
	e = ev.fc.stripConv(e)
	if src(e) == src(ev.bound) && !ev.changedIn(e) {
		return x, true
	}
	if v, ok := ev.fc.c.queries().intConst(e); ok {
		return v, true
	}
	switch e := e.(type) {
	case *ast.BinaryExpr:
		a, ok1 := ev.eval(e.X, x)
		b, ok2 := ev.eval(e.Y, x)
		if !ok1 || !ok2 || a < -1<<31 || a > 1<<31 || b < -1<<31 || b > 1<<31 {
			return 0, false
		}
		switch e.Op {
		case token.ADD:
			return a + b, true
		case token.SUB:
			return a - b, true
		case token.MUL:
			return a * b, true
		case token.QUO:
			if b != 0 {
				return a / b, true
			}
		}
	case *ast.Ident:
		if ev.counter != nil && ev.fc.c.objOf(e) == ev.counter {
			return ev.row, true
		}
		if def, ok := ev.onlyDef(e); ok {
			return ev.eval(def, x)
		}
	case *ast.CallExpr:
		id, ok := e.Fun.(*ast.Ident)
		if !ok || id.Name != "len" || len(e.Args) != 1 {
			break
		}
		arg, ok := ast.Unparen(e.Args[0]).(*ast.Ident)
		if !ok {
			break
		}
		if def, ok := ev.onlyDef(arg); ok {
			if call, ok := ast.Unparen(def).(*ast.CallExpr); ok && isMake(ev.fc.c.pass.TypesInfo, call) && len(call.Args) == 2 {
				return ev.eval(call.Args[1], x)
			}
		}
	}
	return 0, false
}

// changedIn reports whether a variable of e is assigned in the rows'
// loop, where e would not keep its value.
func (ev endEval) changedIn(e ast.Expr) bool {
	changed := false
	info := ev.fc.c.pass.TypesInfo
	ast.Inspect(e, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok {
			if v, ok := info.ObjectOf(id).(*types.Var); ok && assigned.In(info, ev.outer, v, nil) {
				changed = true
			}
		}
		return !changed
	})
	return changed
}

// onlyDef returns the expression a local is defined from, when it is
// defined once by := before the rows' loop and never assigned again.
func (ev endEval) onlyDef(id *ast.Ident) (ast.Expr, bool) {
	info := ev.fc.c.pass.TypesInfo
	v, ok := info.ObjectOf(id).(*types.Var)
	if !ok || v.Pos() > ev.outer.Pos() {
		return nil, false
	}
	var def ast.Expr
	count := 0
	body := funcBody(ev.fc.node)
	assigned.Each(info, body, nil, func(obj types.Object, at ast.Node) bool {
		if obj != v {
			return true
		}
		count++
		if as, ok := at.(*ast.AssignStmt); ok && as.Tok == token.DEFINE && len(as.Lhs) == len(as.Rhs) {
			for i, l := range as.Lhs {
				if info.Defs[l.(*ast.Ident)] == v {
					def = as.Rhs[i]
				}
			}
		}
		return true
	})
	if count != 1 || def == nil {
		return nil, false
	}
	return def, true
}

// judgePascalRowTo judges Pascal's row kept only up to an entry k the
// code does not fix, for j := min(i, k); j > 0; j-- { c[j] += c[j-1] }
// (or from k itself): after row n the table holds C(n, s) for s ≤ k,
// judged over the ranges of n and k as a table of Pascal's rule is
// (pascalFits).
func (fc *fnCtx) judgePascalRowTo(outer *ast.ForStmt, cs countStep) {
	if !cs.rule.Falling || cs.rule.Alpha != 0 || cs.rule.Beta != 1 || cs.rule.Start != 1 {
		return
	}
	k := cs.end
	if call, ok := ast.Unparen(k).(*ast.CallExpr); ok && len(call.Args) == 2 {
		id, ok := ast.Unparen(call.Fun).(*ast.Ident)
		if _, builtin := fc.c.pass.TypesInfo.ObjectOf(id).(*types.Builtin); !ok || !builtin || id.Name != "min" {
			return
		}
		// min(i, k): entries past i are still 0 at row i.
		for i, a := range call.Args {
			if d, ok := fc.shiftOf(a, cs.counterID); ok && d == 0 {
				k = call.Args[1-i]
			}
		}
	}
	if k == cs.end && cs.perRow || mentions(fc.c.pass.TypesInfo, k, cs.counter) {
		return
	}
	n := shift(fc.rangeOf(cs.rowEnd), cs.rowAdj)
	kr := shift(fc.rangeOf(k), cs.endAdj)
	if n.IsEmpty() || kr.IsEmpty() || pascalFits(cs.t, n, kr) {
		return
	}
	first := thresholds.CentralBinomial(cs.t.Num)
	if kr.Hi < first.FirstBad/2 {
		// k stays below the central entry of the first row that
		// wraps: C(n, k) wraps only further on, at a row this message
		// does not compute.
		return
	}
	bad := first.FirstBad - cs.rowAdj
	name := src(cs.rowEnd)
	clause, _ := verdict(name, fc.rangeOf(cs.rowEnd), bad)
	msg := fmt.Sprintf("table %s is filled by additions row by row (%s, %s falling) in %s: after row %s it holds that row of Pascal's triangle up to entry %s, %s[%s] = C(%s, %s), which %s where it leaves %s, from %s = %d at %s = ⌊%s/2⌋ (C(%d, %d) ≈ %s is the largest central one that fits), and the rows after add the wrapped entries on",
		cs.table.Name(), stepText(cs.stmt), cs.index, cs.t.typeName(), cs.counterName, src(k), cs.table.Name(), cs.index, cs.counterName, cs.index,
		verb(cs.t), cs.t.Name, name, bad, src(k), name, first.FirstBad-1, (first.FirstBad-1)/2, first.LastGoodApprox())
	fc.report(finding{node: outer, cat: catPascal, definite: pascalAlwaysPast(cs.t, n, kr), msg: msg + clause})
}
