package valuemodel

import (
	"go/ast"
	"go/token"
	"go/types"
	"math/big"

	"github.com/overfact/overfact/internal/tokenop"
)

// site is one assignment of a variable in a loop body; guard is the
// condition of the if statement around it, nil at the top level.
type site struct {
	stmt  ast.Stmt
	guard ast.Expr
	// peeled marks a site in a peel switch: in its default clause
	// (runs from trip peel.m on) or, with init, a plain assignment in
	// the constant case of trip trip.
	peeled bool
	init   bool
	trip   int64
}

// peel is a switch on the counter (or a tagless switch whose cases
// compare the counter with constants) in a loop body whose constant cases
// are the first m trips, one value each, and whose default clause runs
// on every later trip, the way Bernstein weights are set:
//
//	for i, p := range c {
//		switch i {
//		case 0:
//			w = 1
//		case 1:
//			w = n - 1
//		default:
//			w *= (n - i) / i
//		}
//		…
//	}
//
// An accumulator assigned in the case of trip m−1 and multiplied in
// the default clause is read as a loop from trip m on with that value
// as its start (the summary holds for loops of at least m trips).
type peel struct {
	sw    *ast.SwitchStmt
	cases []*ast.CaseClause // cases[t] runs on trip t
	def   *ast.CaseClause
	m     int64
}

// counterEq returns c of a condition counter == c or c == counter, nil
// for any other.
func (e *evaluator) counterEq(cond ast.Expr, counter types.Object) ast.Expr {
	b, ok := ast.Unparen(cond).(*ast.BinaryExpr)
	if !ok || b.Op != token.EQL {
		return nil
	}
	switch counter {
	case e.objOf(b.X):
		return b.Y
	case e.objOf(b.Y):
		return b.X
	}
	return nil
}

// peelOf recognises a peel switch among the statements of body.
func (e *evaluator) peelOf(l *Loop, body *ast.BlockStmt) *peel {
	if l.Counter == nil || !l.From.IsConst() || !isUnit(l.Step) {
		return nil
	}
	for _, st := range body.List {
		sw, ok := st.(*ast.SwitchStmt)
		if !ok || sw.Init != nil || sw.Tag != nil && e.objOf(sw.Tag) != l.Counter {
			continue
		}
		p := &peel{sw: sw}
		at := make(map[int64]*ast.CaseClause)
		for _, x := range sw.Body.List {
			cl := x.(*ast.CaseClause)
			if cl.List == nil {
				p.def = cl
				continue
			}
			if len(cl.List) != 1 {
				return nil
			}
			x := cl.List[0]
			if sw.Tag == nil {
				// switch { case i == 0: … }
				if x = e.counterEq(x, l.Counter); x == nil {
					return nil
				}
			}
			tv, ok := e.info.Types[x]
			if !ok || tv.Value == nil {
				return nil
			}
			c, ok := ratOf(tv.Value)
			if !ok {
				return nil
			}
			// counter = From + Step·t
			t := new(big.Rat).Sub(c, l.From.c())
			t.Quo(t, l.Step)
			if !t.IsInt() || t.Sign() < 0 || !t.Num().IsInt64() || at[t.Num().Int64()] != nil {
				return nil
			}
			at[t.Num().Int64()] = cl
		}
		p.m = int64(len(at))
		if p.def == nil || p.m == 0 {
			return nil
		}
		for t := int64(0); t < p.m; t++ {
			if at[t] == nil {
				return nil // the constant cases are not the first trips
			}
			p.cases = append(p.cases, at[t])
		}
		branches := false
		ast.Inspect(sw, func(n ast.Node) bool {
			if b, ok := n.(*ast.BranchStmt); ok && (b.Tok == token.FALLTHROUGH || b.Tok == token.BREAK) {
				branches = true
			}
			_, lit := n.(*ast.FuncLit)
			return !branches && !lit
		})
		if branches {
			return nil
		}
		return p
	}
	return nil
}

// role is what a loop does to a variable declared outside its body.
type role int

const (
	roleOther role = iota
	roleAcc
	roleSum
	roleStep
)

// loop summarises a counting loop and updates en past it; a loop of
// any other form is walked once with what it assigns unknown.
func (e *evaluator) loop(st ast.Stmt, en env) {
	l, body := e.shape(st, en)
	if l == nil {
		e.opaqueLoop(st, en)
		return
	}
	pl := e.peelOf(l, body)
	sites, ok := e.sites(body, l.Counter, pl)
	if _, stepped := sites[l.Counter]; !ok || l.Counter != nil && stepped {
		// The body moves the counter too: the trips are not the
		// ones the loop header counts.
		e.opaqueLoop(st, en)
		return
	}
	roles := make(map[types.Object]role)
	steps := make(map[types.Object]Affine)
	for obj, ss := range sites {
		if obj == l.Counter || body.Pos() <= obj.Pos() && obj.Pos() < body.End() {
			continue
		}
		roles[obj] = e.roleOf(obj, ss, steps)
		if roles[obj] == roleAcc && pl != nil && !e.peelStart(pl, obj, ss, sites) {
			roles[obj] = roleOther
		}
	}
	trip := func(dry bool) env {
		in := e.copyEnv(en)
		for obj, r := range roles {
			switch r {
			case roleStep:
				in[obj] = e.addAffine(e.cur(obj, en), steps[obj].Scale(new(big.Rat)).Add(Var(l.Iter).Scale(steps[obj].c())))
			case roleAcc:
				in[obj] = nil
				if !dry {
					in[obj] = e.tripStart(l, obj)
				}
			default:
				in[obj] = nil
			}
		}
		if l.Counter != nil {
			in[l.Counter] = &value{t: FromAffine(l.From.Add(Var(l.Iter).Scale(l.Step)))}
		}
		if rs, ok := st.(*ast.RangeStmt); ok && rs.Value != nil {
			if v := e.objOf(rs.Value); v != nil {
				in[v] = nil // the element changes with the trip
			}
		}
		return in
	}
	// Two passes: the first learns each accumulator's operands, the
	// second follows the accumulators through the trip with their
	// values at its start.
	for obj, r := range roles {
		if r == roleAcc {
			init := e.cur(obj, en)
			if x := peelInit(pl, obj, sites[obj]); x != nil {
				// The value the constant case of trip m−1 assigns.
				at := e.copyEnv(en)
				at[l.Counter] = &value{t: FromAffine(l.From.Add(Const(new(big.Rat).Mul(l.Step, rat(pl.m-1)))))}
				init = e.eval(x, at)
			}
			if init == nil || init.log {
				roles[obj] = roleOther
				continue
			}
			l.Accs = append(l.Accs, &Acc{Obj: obj, Init: init.t})
		}
	}
	l.Exits = l.Exits || e.exits(body)
	e.loops++
	e.trip(l, body, trip(true), roles, sites, pl, true)
	e.trip(l, body, trip(false), roles, sites, pl, false)
	e.loops--
	e.res.Loops = append(e.res.Loops, l)
	// Past the loop.
	for obj, r := range roles {
		switch r {
		case roleStep:
			en[obj] = nil
			if !l.Exits {
				en[obj] = e.addAffine(e.cur(obj, en), steps[obj].Scale(new(big.Rat)).Add(l.Count.Scale(steps[obj].c())))
			}
		case roleAcc:
			// A loop that can leave early need not run all its trips:
			// past it, what it stepped and accumulated is unknown.
			en[obj] = nil
			if a := l.acc(obj); a != nil && a.After != nil && !l.Exits {
				en[obj] = &value{t: a.After}
			}
		default:
			en[obj] = nil
		}
	}
	if l.Counter != nil && !(st.Pos() <= l.Counter.Pos() && l.Counter.Pos() < st.End()) {
		en[l.Counter] = nil
	}
}

func (l *Loop) acc(obj types.Object) *Acc {
	for _, a := range l.Accs {
		if a.Obj == obj {
			return a
		}
	}
	return nil
}

// cur returns the value of obj in en: the entry, or the variable itself.
func (e *evaluator) cur(obj types.Object, en env) *value {
	if v, ok := en[obj]; ok {
		return v
	}
	if e.opaque[obj] {
		return nil
	}
	if b, ok := obj.Type().Underlying().(*types.Basic); !ok || b.Info()&(types.IsInteger|types.IsFloat) == 0 {
		return nil
	}
	return &value{t: FromAffine(Var(Sym{Obj: obj}))}
}

// opaqueLoop walks a loop it cannot summarise: everything it assigns
// is unknown inside and after it.
func (e *evaluator) opaqueLoop(st ast.Stmt, en env) {
	e.forgetAssigned([]ast.Stmt{st}, en)
	in := e.copyEnv(en)
	e.loops++
	defer func() { e.loops-- }()
	switch s := st.(type) {
	case *ast.ForStmt:
		if s.Init != nil {
			e.forgetAssigned([]ast.Stmt{s.Init}, in)
		}
		e.block(s.Body.List, in)
	case *ast.RangeStmt:
		e.block(s.Body.List, in)
	}
}

// shape recognises the counting forms of a loop.
func (e *evaluator) shape(st ast.Stmt, en env) (*Loop, *ast.BlockStmt) {
	l := &Loop{Stmt: st, Iter: Sym{Loop: st}}
	switch s := st.(type) {
	case *ast.RangeStmt:
		var n Affine
		if v := e.rangeLen(s); v != nil {
			// Over a slice that keeps its length: len(x) trips, the
			// element unknown on each.
			n, _ = affineOf(v)
		} else {
			if s.Value != nil || !e.numeric(s.X) {
				return nil, nil
			}
			if t := e.info.TypeOf(s.X); t != nil {
				if b, ok := t.Underlying().(*types.Basic); !ok || b.Info()&types.IsInteger == 0 {
					return nil, nil
				}
			}
			var ok bool
			n, ok = affineOf(e.eval(s.X, en))
			if !ok {
				return nil, nil
			}
		}
		if s.Key != nil {
			l.Counter = e.objOf(s.Key)
			if l.Counter == nil {
				return nil, nil
			}
		}
		l.From, l.Step, l.Count, l.Bound, l.BoundOff = Int(0), rat(1), n, s.X, rat(-1)
		return l, s.Body
	case *ast.ForStmt:
		// for … ; cond && more; … counts by cond and may stop early
		// on the rest: the trip count is an upper bound.
		conds := conjuncts(s.Cond)
		for _, c := range conds {
			cond, ok := ast.Unparen(c).(*ast.BinaryExpr)
			if !ok {
				continue
			}
			if out, body := e.forShape(&Loop{Stmt: st, Iter: l.Iter}, s, cond, en); out != nil {
				out.Exits = len(conds) > 1
				return out, body
			}
		}
		return e.untilShape(l, s, en)
	}
	return nil, nil
}

// untilShape recognises a loop that runs until a condition of its own
// holds (for term > eps { k++; … }, for { …; if done { break } }) and
// steps a variable by a constant once a trip: its trips are counted
// by that variable, their number is a variable of its own (Trips), and
// the loop may stop at any trip (Exits).
func (e *evaluator) untilShape(l *Loop, s *ast.ForStmt, en env) (*Loop, *ast.BlockStmt) {
	if s.Init != nil || s.Post != nil {
		return nil, nil
	}
	for _, b := range s.Body.List {
		id, ok := stepTarget(b)
		if !ok {
			continue
		}
		v := e.objOf(id)
		if v == nil || e.opaque[v] {
			continue
		}
		step := e.stepOf(b, v)
		from, ok := affineOf(e.cur(v, en))
		if step == nil || !ok {
			continue
		}
		l.From, l.Step = from, step
		l.Count = Var(Sym{Def: s})
		l.BoundOff = new(big.Rat)
		l.Exits = true
		return l, s.Body
	}
	return nil, nil
}

// stepTarget returns what s steps, for v++, v--, v += c and v = v + c.
func stepTarget(s ast.Stmt) (ast.Expr, bool) {
	switch s := s.(type) {
	case *ast.IncDecStmt:
		return s.X, true
	case *ast.AssignStmt:
		if len(s.Lhs) == 1 {
			return s.Lhs[0], true
		}
	}
	return nil, false
}

// conjuncts returns the parts cond joins with &&.
func conjuncts(cond ast.Expr) []ast.Expr {
	if b, ok := ast.Unparen(cond).(*ast.BinaryExpr); ok && b.Op == token.LAND {
		return append(conjuncts(b.X), conjuncts(b.Y)...)
	}
	return []ast.Expr{cond}
}

// forShape recognises a for statement that counts by cond.
func (e *evaluator) forShape(l *Loop, s *ast.ForStmt, cond *ast.BinaryExpr, en env) (*Loop, *ast.BlockStmt) {
	if s.Init == nil && s.Post == nil {
		// for n > 1 { …; n-- }
		v := e.objOf(cond.X)
		if v == nil {
			v = e.objOf(cond.Y)
		}
		if v == nil {
			return nil, nil
		}
		var step *big.Rat
		for _, b := range s.Body.List {
			if d := e.stepOf(b, v); d != nil {
				if step != nil {
					return nil, nil
				}
				step = d
			}
		}
		from, ok := affineOf(e.cur(v, en))
		if step == nil || !ok {
			return nil, nil
		}
		l.Counter, l.From, l.Step = v, from, step
		// The counter is stepped in the body: the body sees it
		// through its role, not as the trip's counter.
		if !e.bound(l, cond, en) {
			return nil, nil
		}
		l.Counter = nil
		return l, s.Body
	}
	init, ok := s.Init.(*ast.AssignStmt)
	if !ok || len(init.Lhs) != 1 || len(init.Rhs) != 1 {
		return nil, nil
	}
	v := e.objOf(init.Lhs[0])
	if v == nil || e.opaque[v] {
		return nil, nil
	}
	from, ok := affineOf(e.eval(init.Rhs[0], en))
	step := e.stepOf(s.Post, v)
	if !ok || step == nil {
		return nil, nil
	}
	l.Counter, l.From, l.Step = v, from, step
	if !e.bound(l, cond, en) {
		return nil, nil
	}
	return l, s.Body
}

// bound reads the loop condition counter <op> bound into the trip
// count.
func (e *evaluator) bound(l *Loop, cond *ast.BinaryExpr, en env) bool {
	op, b := cond.Op, cond.Y
	if e.objOf(cond.X) != l.Counter {
		if e.objOf(cond.Y) != l.Counter {
			return false
		}
		op, b = tokenop.Flip(op), cond.X
	}
	bv, ok := affineOf(e.eval(b, en))
	if !ok {
		return false
	}
	up := l.Step.Sign() > 0
	var span Affine
	off := new(big.Rat)
	switch {
	case up && (op == token.LSS || op == token.NEQ):
		span, off = bv.Sub(l.From), rat(-1)
	case up && op == token.LEQ:
		span = bv.Sub(l.From).Add(Const(l.Step))
	case !up && (op == token.GTR || op == token.NEQ):
		span, off = bv.Sub(l.From), rat(1)
	case !up && op == token.GEQ:
		span = bv.Sub(l.From).Add(Const(l.Step))
	default:
		return false
	}
	l.Count = span.Scale(new(big.Rat).Inv(l.Step))
	l.Bound, l.BoundOff = b, off
	return true
}

// stepOf returns the constant by which s changes v, or nil.
func (e *evaluator) stepOf(s ast.Stmt, v types.Object) *big.Rat {
	switch s := s.(type) {
	case *ast.IncDecStmt:
		if e.objOf(s.X) != v {
			return nil
		}
		if s.Tok == token.INC {
			return rat(1)
		}
		return rat(-1)
	case *ast.AssignStmt:
		if len(s.Lhs) != 1 || len(s.Rhs) != 1 || e.objOf(s.Lhs[0]) != v {
			return nil
		}
		var c ast.Expr
		neg := false
		switch s.Tok {
		case token.ADD_ASSIGN:
			c = s.Rhs[0]
		case token.SUB_ASSIGN:
			c, neg = s.Rhs[0], true
		case token.ASSIGN:
			b, ok := ast.Unparen(s.Rhs[0]).(*ast.BinaryExpr)
			if !ok || (b.Op != token.ADD && b.Op != token.SUB) || e.objOf(b.X) != v {
				return nil
			}
			c, neg = b.Y, b.Op == token.SUB
		default:
			return nil
		}
		tv, ok := e.info.Types[c]
		if !ok || tv.Value == nil {
			return nil
		}
		r, ok := ratOf(tv.Value)
		if !ok || r.Sign() == 0 {
			return nil
		}
		if neg {
			r = new(big.Rat).Neg(r)
		}
		return r
	}
	return nil
}

// sites lists where the body assigns each variable: at its top level,
// or in an if statement with no else whose condition compares the
// counter (the site's guard); a site with a nil stmt is anywhere else.
func (e *evaluator) sites(body *ast.BlockStmt, counter types.Object, pl *peel) (map[types.Object][]site, bool) {
	out := make(map[types.Object][]site)
	var note func(st ast.Stmt, guard ast.Expr, nested bool)
	var mark func(s site) site
	mark = func(s site) site { return s }
	note = func(st ast.Stmt, guard ast.Expr, nested bool) {
		ast.Inspect(st, func(n ast.Node) bool {
			switch n := n.(type) {
			case *ast.FuncLit:
				return false
			case *ast.AssignStmt:
				for _, l := range n.Lhs {
					if obj := e.objOf(l); obj != nil {
						s := site{stmt: n, guard: guard}
						if nested {
							s.stmt = nil
						}
						out[obj] = append(out[obj], mark(s))
					}
				}
			case *ast.IncDecStmt:
				if obj := e.objOf(n.X); obj != nil {
					s := site{stmt: n, guard: guard}
					if nested {
						s.stmt = nil
					}
					out[obj] = append(out[obj], mark(s))
				}
			case *ast.RangeStmt:
				for _, x := range []ast.Expr{n.Key, n.Value} {
					if obj := e.objOf(x); obj != nil {
						out[obj] = append(out[obj], site{})
					}
				}
			}
			return true
		})
	}
	for _, st := range body.List {
		if pl != nil && st == pl.sw {
			// The default clause runs from trip m on; a plain
			// assignment in a constant case sets a start value.
			for t, cl := range pl.cases {
				for _, b := range cl.Body {
					// Only a plain assignment is a start value;
					// anything else there is beyond the summary.
					as, ok := b.(*ast.AssignStmt)
					plain := ok && as.Tok == token.ASSIGN && len(as.Lhs) == 1 && len(as.Rhs) == 1
					mark = func(s site) site {
						s.peeled, s.init, s.trip = true, plain, int64(t)
						return s
					}
					note(b, nil, !plain)
				}
			}
			mark = func(s site) site { s.peeled = true; return s }
			for _, b := range pl.def.Body {
				switch b.(type) {
				case *ast.AssignStmt, *ast.IncDecStmt:
					note(b, nil, false)
				default:
					note(b, nil, true)
				}
			}
			mark = func(s site) site { return s }
			continue
		}
		switch s := st.(type) {
		case *ast.AssignStmt, *ast.IncDecStmt:
			note(s, nil, false)
		case *ast.IfStmt:
			if s.Init == nil && s.Else == nil && counter != nil && e.counterCmp(s.Cond, counter) {
				for _, b := range s.Body.List {
					switch b.(type) {
					case *ast.AssignStmt, *ast.IncDecStmt:
						note(b, s.Cond, false)
					default:
						note(b, nil, true)
					}
				}
				continue
			}
			note(s, nil, true)
		default:
			note(st, nil, true)
		}
	}
	return out, true
}

func (e *evaluator) counterCmp(cond ast.Expr, counter types.Object) bool {
	b, ok := ast.Unparen(cond).(*ast.BinaryExpr)
	if !ok {
		return false
	}
	switch b.Op {
	case token.LSS, token.LEQ, token.GTR, token.GEQ:
		return e.objOf(b.X) == counter || e.objOf(b.Y) == counter
	}
	return false
}

// roleOf decides what the loop does to obj from where it assigns it.
func (e *evaluator) roleOf(obj types.Object, ss []site, steps map[types.Object]Affine) role {
	if e.opaque[obj] {
		return roleOther
	}
	for _, s := range ss {
		if s.stmt == nil {
			return roleOther
		}
	}
	if len(ss) == 1 && ss[0].guard == nil && !ss[0].peeled {
		if d := e.stepOf(ss[0].stmt, obj); d != nil {
			steps[obj] = Const(d)
			return roleStep
		}
	}
	acc, sum := true, true
	for _, s := range ss {
		as, ok := s.stmt.(*ast.AssignStmt)
		if !ok {
			return roleOther
		}
		if s.init {
			// A start value, checked by peelStart.
			sum = false
			continue
		}
		if _, ok := e.accOps(as, obj); !ok {
			acc = false
		}
		if _, _, ok := e.sumTerm(as, obj); !ok {
			sum = false
		}
	}
	switch {
	case acc:
		return roleAcc
	case sum:
		return roleSum
	}
	return roleOther
}

// peelStart reports whether an accumulator's sites fit the peel
// switch: without a start value in it, its ops are anywhere; with one,
// every op is in the default clause, the case of trip m−1 assigns it,
// and no start value reads a variable the loop body assigns.
func (e *evaluator) peelStart(pl *peel, obj types.Object, ss []site, all map[types.Object][]site) bool {
	if peelInit(pl, obj, ss) == nil {
		for _, s := range ss {
			if s.init {
				return false
			}
		}
		return true
	}
	for _, s := range ss {
		if !s.peeled {
			return false
		}
		if !s.init {
			continue
		}
		as := s.stmt.(*ast.AssignStmt)
		for v := range all {
			if mentionsObj(e.info, as.Rhs[0], v) {
				return false
			}
		}
	}
	return true
}

// peelInit returns the value the case of trip m−1 assigns obj, the
// start of its ops in the default clause; nil when there is none.
func peelInit(pl *peel, obj types.Object, ss []site) ast.Expr {
	if pl == nil {
		return nil
	}
	var x ast.Expr
	for _, s := range ss {
		if s.init && s.trip == pl.m-1 {
			if x != nil {
				return nil // assigned twice in that case
			}
			x = s.stmt.(*ast.AssignStmt).Rhs[0]
		}
	}
	return x
}

// opExpr is one operand of an accumulator update, as written.
type opExpr struct {
	mul bool
	x   ast.Expr
}

// accOps reads acc *= X, acc /= X, acc = acc*X/Y and their variants
// into the operations in the order the code performs them.
func (e *evaluator) accOps(as *ast.AssignStmt, acc types.Object) ([]opExpr, bool) {
	if len(as.Lhs) != 1 || len(as.Rhs) != 1 || e.objOf(as.Lhs[0]) != acc {
		return nil, false
	}
	switch as.Tok {
	case token.MUL_ASSIGN:
		return []opExpr{{true, as.Rhs[0]}}, true
	case token.QUO_ASSIGN:
		return []opExpr{{false, as.Rhs[0]}}, true
	case token.ASSIGN:
	default:
		return nil, false
	}
	var ops []opExpr
	x := ast.Unparen(as.Rhs[0])
	for depth := 0; depth < 8; depth++ {
		if e.objOf(x) == acc {
			// reverse: the innermost operation runs first
			for i, j := 0, len(ops)-1; i < j; i, j = i+1, j-1 {
				ops[i], ops[j] = ops[j], ops[i]
			}
			return ops, len(ops) > 0
		}
		b, ok := x.(*ast.BinaryExpr)
		if !ok || (b.Op != token.MUL && b.Op != token.QUO) {
			return nil, false
		}
		if b.Op == token.MUL && e.objOf(b.Y) == acc && len(ops) == 0 || b.Op == token.MUL && e.objOf(b.Y) == acc {
			ops = append(ops, opExpr{true, b.X})
			x = ast.Unparen(b.Y)
			continue
		}
		if mentionsObj(e.info, b.Y, acc) {
			return nil, false
		}
		ops = append(ops, opExpr{b.Op == token.MUL, b.Y})
		x = ast.Unparen(b.X)
	}
	return nil, false
}

// sumTerm reads s += X, s -= X, s = s + X and s = X + s.
func (e *evaluator) sumTerm(as *ast.AssignStmt, s types.Object) (ast.Expr, bool, bool) {
	if len(as.Lhs) != 1 || len(as.Rhs) != 1 || e.objOf(as.Lhs[0]) != s {
		return nil, false, false
	}
	switch as.Tok {
	case token.ADD_ASSIGN:
		return as.Rhs[0], false, !mentionsObj(e.info, as.Rhs[0], s)
	case token.SUB_ASSIGN:
		return as.Rhs[0], true, !mentionsObj(e.info, as.Rhs[0], s)
	case token.ASSIGN:
		b, ok := ast.Unparen(as.Rhs[0]).(*ast.BinaryExpr)
		if !ok || b.Op != token.ADD {
			return nil, false, false
		}
		switch s {
		case e.objOf(b.X):
			return b.Y, false, !mentionsObj(e.info, b.Y, s)
		case e.objOf(b.Y):
			return b.X, false, !mentionsObj(e.info, b.X, s)
		}
	}
	return nil, false, false
}

func mentionsObj(info *types.Info, n ast.Node, obj types.Object) bool {
	found := false
	ast.Inspect(n, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok && info.ObjectOf(id) == obj {
			found = true
		}
		return !found
	})
	return found
}

// tripStart returns an accumulator's value at the start of trip t,
// assuming each of its ops has run on every trip of its range before
// t: Init·∏ over each op of its operands on the trips before.
func (e *evaluator) tripStart(l *Loop, obj types.Object) *value {
	a := l.acc(obj)
	if a == nil || len(a.Ops) == 0 {
		return nil
	}
	v := a.Init
	for _, op := range a.Ops {
		v = v.Mul(opProduct(l, op, Var(l.Iter).Sub(op.From)))
	}
	if v == nil {
		return nil
	}
	return &value{t: v}
}

// opProduct returns ∏ of op's operand (or its inverse) over n trips
// starting at op.From.
func opProduct(l *Loop, op Op, n Affine) *Term {
	if op.By == nil {
		return nil
	}
	dummy := Sym{Loop: l.body()}
	f := op.By.Subst(l.Iter, Var(dummy).Add(op.From))
	p := ProductOver(f, dummy, n)
	if !op.Mul {
		p = p.Inv()
	}
	return p
}

// trip walks one trip of the body. In the dry pass it records each
// accumulator's operands; in the other it records the values the
// accumulators take, the terms of the sums, and the value after the
// loop.
func (e *evaluator) trip(l *Loop, body *ast.BlockStmt, in env, roles map[types.Object]role, sites map[types.Object][]site, pl *peel, dry bool) {
	saved := e.res
	if dry {
		// Record nothing from the dry pass.
		e.res = &Result{Values: make(map[ast.Expr]*Term), Logs: make(map[ast.Expr]*Term), Exprs: saved.Exprs}
	}
	defer func() {
		if dry {
			e.res = saved
		}
	}()
	opIndex := make(map[types.Object]int)
	// from is set while the default clause of a peel switch is walked:
	// what it does runs from trip m on.
	var from *Affine
	var walk func(list []ast.Stmt, guard ast.Expr)
	walk = func(list []ast.Stmt, guard ast.Expr) {
		for _, st := range list {
			if !e.tick() {
				return
			}
			as, _ := st.(*ast.AssignStmt)
			var obj types.Object
			if as != nil && len(as.Lhs) == 1 {
				obj = e.objOf(as.Lhs[0])
			}
			switch {
			case obj != nil && roles[obj] == roleAcc:
				ops, _ := e.accOps(as, obj)
				a := l.acc(obj)
				for _, o := range ops {
					by := e.eval(o.x, in)
					var t *Term
					if by != nil && !by.log {
						t = by.t
					}
					i := opIndex[obj]
					opIndex[obj]++
					if dry {
						op := Op{Stmt: st, X: o.x, Mul: o.mul, By: t, From: Int(0), To: l.Count}
						if from != nil {
							// From trip m on; with no start value
							// in the switch, skipped before it.
							op.From = *from
							a.Guarded = a.Guarded || peelInit(pl, obj, sites[obj]) == nil
						}
						if guard != nil {
							op.From, op.To, t = e.guardRange(l, guard, in)
							if t == nil {
								op.By = nil
							}
							a.Guarded = true
						}
						a.Ops = append(a.Ops, op)
						continue
					}
					if i >= len(a.Ops) {
						continue
					}
					op := &a.Ops[i]
					cur := in[obj]
					if cur == nil || t == nil {
						in[obj] = nil
						continue
					}
					op.Before = cur.t
					if o.mul {
						op.After = cur.t.Mul(t)
					} else {
						op.After = cur.t.Div(t)
					}
					in[obj] = &value{t: op.After}
				}
			case obj != nil && roles[obj] == roleSum:
				x, neg, _ := e.sumTerm(as, obj)
				v := e.eval(x, in)
				if dry {
					continue
				}
				var t *Term
				if v != nil && !v.log {
					t = v.t
					if neg {
						t = t.Neg()
					}
				}
				lo, to := Int(0), l.Count
				if from != nil {
					lo = *from
				}
				if guard != nil {
					lo, to, _ = e.guardRange(l, guard, in)
				}
				l.Sums = append(l.Sums, &SumAcc{Obj: obj, Stmt: st, Sum: Sum{Iter: l.Iter, From: lo, To: to, Term: t}})
			case pl != nil && st == pl.sw && from == nil:
				e.peelTrip(pl, in, roles)
				m := Int(pl.m)
				from = &m
				walk(pl.def.Body, guard)
				from = nil
			default:
				if ifs, ok := st.(*ast.IfStmt); ok && ifs.Init == nil && ifs.Else == nil && l.Counter != nil && e.counterCmp(ifs.Cond, l.Counter) {
					e.eval(ifs.Cond, in)
					walk(ifs.Body.List, ifs.Cond)
					continue
				}
				e.stmt(st, in)
			}
		}
	}
	walk(body.List, nil)
	if dry {
		return
	}
	for _, a := range l.Accs {
		v := a.Init
		for _, op := range a.Ops {
			v = v.Mul(opProduct(l, op, op.To.Sub(op.From)))
		}
		a.After = v
	}
}

// peelTrip walks the constant cases of a peel switch for the values
// inside; what they assign is unknown past the switch but for the
// accumulators, whose values on the trips from m on the default
// clause gives.
func (e *evaluator) peelTrip(pl *peel, in env, roles map[types.Object]role) {
	saved := make(env)
	for obj, r := range roles {
		if r == roleAcc {
			saved[obj] = in[obj]
		}
	}
	for _, cl := range pl.cases {
		e.block(cl.Body, e.copyEnv(in))
		var list []ast.Stmt
		list = append(list, cl.Body...)
		e.forgetAssigned(list, in)
	}
	for obj, v := range saved {
		in[obj] = v
	}
}

// guardRange turns a condition comparing the counter with a
// loop-invariant bound into the trips on which it holds, [from, to);
// the third result is nil when the condition is not of that form.
func (e *evaluator) guardRange(l *Loop, cond ast.Expr, en env) (Affine, Affine, *Term) {
	b, ok := ast.Unparen(cond).(*ast.BinaryExpr)
	if !ok || !isUnit(l.Step) {
		return Int(0), l.Count, nil
	}
	op, x := b.Op, b.Y
	if e.objOf(b.X) != l.Counter {
		op, x = tokenop.Flip(op), b.X
	}
	bv, ok := affineOf(e.eval(x, en))
	if !ok || bv.Has(l.Iter) {
		return Int(0), l.Count, nil
	}
	// counter = From + Step·t
	tAt := bv.Sub(l.From).Scale(l.Step) // the trip on which counter = bound
	if l.Step.Sign() < 0 {
		op = tokenop.Flip(op)
	}
	switch op {
	case token.LEQ:
		return Int(0), tAt.Shift(1), One()
	case token.LSS:
		return Int(0), tAt, One()
	case token.GEQ:
		return tAt, l.Count, One()
	case token.GTR:
		return tAt.Shift(1), l.Count, One()
	}
	return Int(0), l.Count, nil
}

// body returns the loop's body, which stands for the running index of
// the products the summary forms.
func (l *Loop) body() ast.Node {
	switch s := l.Stmt.(type) {
	case *ast.ForStmt:
		return s.Body
	case *ast.RangeStmt:
		return s.Body
	}
	return nil
}

// exits reports whether body can leave its loop before the condition
// fails, or skip the rest of a trip: a break or continue of the loop
// itself, a labelled break or continue, a goto, a return or a call of
// panic, outside closures.
func (e *evaluator) exits(body *ast.BlockStmt) bool {
	found := false
	var walk func(n ast.Node, inner bool)
	walk = func(n ast.Node, inner bool) {
		ast.Inspect(n, func(m ast.Node) bool {
			if found || m == nil {
				return false
			}
			switch m := m.(type) {
			case *ast.FuncLit:
				return false
			case *ast.ForStmt, *ast.RangeStmt, *ast.SwitchStmt, *ast.TypeSwitchStmt, *ast.SelectStmt:
				if m != n {
					walk(m, true)
					return false
				}
			case *ast.BranchStmt:
				switch {
				case m.Tok == token.GOTO, m.Label != nil && m.Tok != token.FALLTHROUGH:
					found = true
				case (m.Tok == token.BREAK || m.Tok == token.CONTINUE) && !inner:
					found = true
				}
			case *ast.ReturnStmt:
				found = true
			case *ast.CallExpr:
				if id, ok := ast.Unparen(m.Fun).(*ast.Ident); ok && id.Name == "panic" {
					if _, ok := e.info.Uses[id].(*types.Builtin); ok {
						found = true
					}
				}
			}
			return true
		})
	}
	walk(body, false)
	return found
}

// rangeLen returns len(x) for a range over a slice variable x that
// keeps its length, nil otherwise.
func (e *evaluator) rangeLen(s *ast.RangeStmt) *value {
	if sl, ok := ast.Unparen(s.X).(*ast.SliceExpr); ok && sl.High == nil && sl.Max == nil && sl.Low != nil {
		// x[lo:] of such a slice: len(x) − lo trips.
		n := e.sliceLen(e.objOf(sl.X))
		tv, ok := e.info.Types[sl.Low]
		if n == nil || !ok || tv.Value == nil {
			return nil
		}
		lo, ok := ratOf(tv.Value)
		a, ok2 := affineOf(n)
		if !ok || !ok2 {
			return nil
		}
		return &value{t: FromAffine(a.Sub(Const(lo)))}
	}
	return e.sliceLen(e.objOf(s.X))
}

// sliceLen returns len(x) for a slice variable x that keeps its length.
func (e *evaluator) sliceLen(x types.Object) *value {
	if l, ok := e.lenSym(x); ok {
		if v := e.makeLen[x]; v != nil {
			return v
		}
		return &value{t: FromAffine(Var(l))}
	}
	return nil
}
