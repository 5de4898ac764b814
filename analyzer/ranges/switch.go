package ranges

import (
	"go/ast"
	"go/token"
)

func (w *walker) switchStmt(s state, st *ast.SwitchStmt, label string) state {
	s = w.stmt(s, st.Init)
	if !s.live || st.Body == nil {
		return s
	}
	if st.Tag != nil {
		w.cond(s, st.Tag)
	}
	// Entry states: each case is tried only when the ones before it
	// failed; default gets what no case matched.
	clauses := st.Body.List
	entries := make([]state, len(clauses))
	rest := s
	def := -1
	for i, c := range clauses {
		cc, ok := c.(*ast.CaseClause)
		if !ok {
			continue
		}
		if cc.List == nil {
			def = i
			continue
		}
		in := dead
		for _, e := range cc.List {
			w.eval(rest, e)
			var t, f state
			if st.Tag != nil {
				t, f = w.compare(rest, st.Tag, token.EQL, e), w.compare(rest, st.Tag, token.NEQ, e)
			} else {
				t, f = w.refine2(rest, e)
			}
			in, rest = in.join(t), f
		}
		entries[i] = in
	}
	if def >= 0 {
		entries[def] = rest
	}
	t := w.push(label, false)
	out, carry := dead, dead
	for i, c := range clauses {
		cc, ok := c.(*ast.CaseClause)
		if !ok {
			continue
		}
		// fallthrough carries the previous clause's end state in.
		in := entries[i].join(carry)
		carry = dead
		if !in.live {
			continue
		}
		if w.rec {
			w.f.snaps[cc] = in.facts
		}
		end := w.list(in, cc.Body)
		if endsInFallthrough(cc) {
			carry = end
		} else {
			out = out.join(end)
		}
	}
	w.pop()
	if def < 0 {
		out = out.join(rest)
	}
	return joinAll(out, t.breaks)
}

func endsInFallthrough(cc *ast.CaseClause) bool {
	if len(cc.Body) == 0 {
		return false
	}
	b, ok := cc.Body[len(cc.Body)-1].(*ast.BranchStmt)
	return ok && b.Tok == token.FALLTHROUGH
}

// typeSwitch walks every clause from the same state: types carry no
// numeric facts.
func (w *walker) typeSwitch(s state, st *ast.TypeSwitchStmt, label string) state {
	s = w.stmt(s, st.Init)
	s = w.stmt(s, st.Assign)
	if !s.live || st.Body == nil {
		return s
	}
	t := w.push(label, false)
	out := dead
	hasDefault := false
	for _, c := range st.Body.List {
		cc, ok := c.(*ast.CaseClause)
		if !ok {
			continue
		}
		hasDefault = hasDefault || cc.List == nil
		if w.rec {
			w.f.snaps[cc] = s.facts
		}
		out = out.join(w.list(s, cc.Body))
	}
	w.pop()
	if !hasDefault {
		out = out.join(s)
	}
	return joinAll(out, t.breaks)
}

// selectStmt joins the clauses; a select with none blocks forever.
func (w *walker) selectStmt(s state, st *ast.SelectStmt, label string) state {
	if st.Body == nil {
		return s
	}
	t := w.push(label, false)
	out := dead
	for _, c := range st.Body.List {
		cc, ok := c.(*ast.CommClause)
		if !ok {
			continue
		}
		if w.rec {
			w.f.snaps[cc] = s.facts
		}
		in := w.stmt(s, cc.Comm)
		out = out.join(w.list(in, cc.Body))
	}
	w.pop()
	return joinAll(out, t.breaks)
}
