package ranges

import (
	"go/ast"
	"go/token"
	"go/types"
)

// pass walks one trip through a loop from the head state and returns
// the state that reaches the head again and the join of the states that
// leave the body by break (a break naming this loop or, through
// w.targets, none).
type pass func(head state) (next, breaks state)

// loop runs a loop to a fixpoint of its head state: join-based
// iteration, widening from the MaxVisits-th trip on (from the first
// inside two or more enclosing loops), then one descending step F(H)
// (Cousot and Cousot, POPL 1977) that doubles as the recording pass.
// Inside four or more enclosing loops, or past the work budget, the
// head just forgets every variable the loop assigns, which needs no
// iteration.
//
// leave returns the part of a head state in which the loop's own test
// ends the loop. It is applied to the entry state and to the states
// that come back to the head apart, not to their join: when the test
// holds on entry, the loop can only end after a trip, so what the body
// established (i ≤ 4 after "if i > 4 { break outer }" in a nested loop)
// survives the exit. Each is a sound description of the head states it
// stands for (head ⊒ entry ⊔ F(head) at the fixpoint), so their parts
// cover every state that leaves by the test.
func (w *walker) loop(entry state, n ast.Node, leave func(state) state, trip pass) state {
	if !entry.live {
		return entry
	}
	w.loops++
	defer func() { w.loops-- }()
	if w.loops > 4 || w.f.overBudget() {
		head := entry
		for _, obj := range w.f.assignedIn(n) {
			head = w.f.forget(head, obj)
		}
		_, breaks := trip(head)
		return w.leaving(leave, head).join(breaks)
	}
	if !w.f.carries(n) {
		// Nothing flows from one trip to the next: the entry state
		// is already the fixpoint.
		_, breaks := trip(entry)
		return w.leaving(leave, entry).join(breaks)
	}
	visits := w.f.opts.MaxVisits
	if w.loops > 2 {
		visits = 1
	}
	rec := w.rec
	w.rec = false
	head := entry
	var next state
	for i := 1; ; i++ {
		next, _ = trip(head)
		h := head.join(next)
		if i >= visits || w.f.overBudget() {
			h = head.widen(h)
		}
		if h.equal(head) {
			break
		}
		head = h
	}
	w.rec = rec
	// head is a post-fixpoint, so entry ⊔ next, one more application
	// of the loop's transfer function, is still sound and often tighter;
	// the states it sends back to the head cover every state that comes
	// back after one trip or more.
	again, breaks := trip(entry.join(next))
	return w.leaving(leave, entry).join(w.leaving(leave, again)).join(breaks)
}

// leaving applies leave to s without recording anything: the recording
// pass records the loop test once, in the state it is evaluated in.
func (w *walker) leaving(leave func(state) state, s state) state {
	if !s.live {
		return s
	}
	rec := w.rec
	w.rec = false
	defer func() { w.rec = rec }()
	return leave(s)
}

// carries reports whether loop n assigns a variable that lives across
// trips: one declared before the loop or in a for statement's init.
// Variables declared in the body, and the keys a range statement
// declares, start afresh on every trip.
func (f *Func) carries(n ast.Node) bool {
	var body ast.Node = n
	switch n := n.(type) {
	case *ast.ForStmt:
		body = n.Body
	case *ast.RangeStmt:
		body = n
	}
	for _, obj := range f.assignedIn(n) {
		if p := obj.Pos(); p < body.Pos() || p >= body.End() {
			return true
		}
	}
	return false
}

// overBudget reports whether the walk has spent its allowance of
// statement visits, a small multiple of the function size; past it,
// loops widen at once so that no MaxVisits setting can make the
// analysis of one function super-linear.
func (f *Func) overBudget() bool { return f.work > 10*f.size+1000 }

func (w *walker) forStmt(s state, st *ast.ForStmt, label string) state {
	s = w.stmt(s, st.Init)
	leave := func(head state) state {
		if st.Cond == nil {
			return dead
		}
		_, out := w.refine2(head, st.Cond)
		return out
	}
	return w.loop(s, st, leave, func(head state) (state, state) {
		in := head
		if st.Cond != nil {
			w.cond(head, st.Cond)
			in, _ = w.refine2(head, st.Cond)
		}
		t := w.push(label, true)
		end := w.stmt(in, st.Body)
		w.pop()
		end = joinAll(end, t.conts)
		end = w.stmt(end, st.Post)
		return end, joinAll(dead, t.breaks)
	})
}

func (w *walker) rangeStmt(s state, st *ast.RangeStmt, label string) state {
	x := w.eval(s, st.X)
	key, val := w.rangeKey(st.X, x)
	table := w.f.tableOf(st.X)
	if table != nil {
		if k, ok := w.f.tableKey(table); ok {
			key = key.Meet(k)
		}
	}
	// The loop may end at the head, after any number of trips.
	leave := func(head state) state { return head }
	return w.loop(s, st, leave, func(head state) (state, state) {
		in := head
		if key.IsEmpty() {
			in = dead
		}
		if st.Key != nil {
			w.operands(in, st.Key)
			in = w.store(in, st.Key, key)
			in = w.keyBelow(in, st)
		}
		if st.Value != nil {
			w.operands(in, st.Value)
			in = w.store(in, st.Value, val)
			if table != nil {
				in = w.tableValue(in, st.Value, table)
			}
		}
		t := w.push(label, true)
		end := w.stmt(in, st.Body)
		w.pop()
		end = joinAll(end, t.conts)
		return end, joinAll(dead, t.breaks)
	})
}

// keyBelow records key < x for "for key := range x" over an integer
// variable x that the loop never assigns (range evaluates x once).
func (w *walker) keyBelow(s state, st *ast.RangeStmt) state {
	k := w.kind(st.X)
	if !k.ok || k.float || st.Tok != token.DEFINE {
		return s
	}
	x, ok := ast.Unparen(st.X).(*ast.Ident)
	if !ok {
		return s
	}
	obj := w.f.objOf(x)
	if obj == nil {
		return s
	}
	for _, a := range w.f.assignedIn(st) {
		if a == obj {
			return s
		}
	}
	return w.relate(s, st.Key, token.LSS, x)
}

// rangeKey returns the ranges of the key and value of range x, where
// x has range xr; an empty key range means the body never runs.
func (w *walker) rangeKey(x ast.Expr, xr Interval) (key, val Interval) {
	tv, ok := w.f.info.Types[x]
	if !ok || tv.Type == nil {
		return Top(), Top()
	}
	if k := kindOf(tv.Type); k.ok && !k.float {
		return Span(0, strictBelow(xr.Hi, w.f.opts.NoWrap || k.u64)).Meet(Interval{0, posInf}), Top()
	}
	t := tv.Type.Underlying()
	if p, ok := t.(*types.Pointer); ok {
		t = p.Elem().Underlying()
	}
	switch t := t.(type) {
	case *types.Array:
		return Span(0, t.Len()-1), Top()
	case *types.Slice:
		return Interval{0, posInf - 1}, Top()
	case *types.Basic:
		if t.Info()&types.IsString != 0 {
			return Interval{0, posInf - 1}, Top()
		}
	}
	return Top(), Top()
}
