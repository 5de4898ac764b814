package ranges

import (
	"go/ast"
	"go/token"
	"go/types"
	"strings"

	"golang.org/x/tools/go/types/typeutil"
)

// walker carries the abstract state through one function body in
// execution order, in the manner of the nilness pass's walk over the
// dominator tree with a stack of facts, but over the syntax tree.
type walker struct {
	f     *Func
	rec   bool // record ranges and snapshots (the final pass over a loop)
	depth int  // current recursion depth over statements and expressions
	loops int  // enclosing loops

	targets []*target // enclosing break/continue targets, innermost last
	label   string    // label of the statement about to be walked
}

// target collects the states that leave a loop, switch or select early.
type target struct {
	label  string
	loop   bool
	breaks []state
	conts  []state
}

func (w *walker) push(label string, loop bool) *target {
	t := &target{label: label, loop: loop}
	w.targets = append(w.targets, t)
	return t
}

func (w *walker) pop() { w.targets = w.targets[:len(w.targets)-1] }

// list walks a statement list iteratively, so long lists cost no stack.
func (w *walker) list(s state, stmts []ast.Stmt) state {
	for _, st := range stmts {
		s = w.stmt(s, st)
	}
	return s
}

// stmt walks st from state s and returns the state after it.
func (w *walker) stmt(s state, st ast.Stmt) state {
	label := w.label
	w.label = ""
	if st == nil {
		return s
	}
	if ls, ok := st.(*ast.LabeledStmt); ok && w.f.gotoTargets[ls.Label.Name] {
		// A goto may arrive from anywhere: assume nothing.
		s = state{live: true}
	}
	if !s.live {
		return s
	}
	w.depth++
	defer func() { w.depth-- }()
	w.f.work++
	if w.depth > maxDepth {
		return w.opaque(s, st)
	}
	if w.rec {
		w.f.snaps[st] = s.facts
	}
	return w.f.closeScope(w.walkStmt(s, st, label), st)
}

// walkStmt is stmt for a statement that is walked: reached, live, and
// not nested too deeply.
func (w *walker) walkStmt(s state, st ast.Stmt, label string) state {
	switch st := st.(type) {
	case *ast.BlockStmt:
		return w.list(s, st.List)
	case *ast.ExprStmt:
		w.eval(s, st.X)
		if w.noReturn(st.X) {
			return dead
		}
		return s
	case *ast.AssignStmt:
		return w.assign(s, st)
	case *ast.DeclStmt:
		return w.decl(s, st)
	case *ast.IncDecStmt:
		op := token.ADD
		if st.Tok == token.DEC {
			op = token.SUB
		}
		return w.update(s, st.X, op, Point(1))
	case *ast.IfStmt:
		return w.ifStmt(s, st)
	case *ast.ForStmt:
		return w.forStmt(s, st, label)
	case *ast.RangeStmt:
		return w.rangeStmt(s, st, label)
	case *ast.SwitchStmt:
		return w.switchStmt(s, st, label)
	case *ast.TypeSwitchStmt:
		return w.typeSwitch(s, st, label)
	case *ast.SelectStmt:
		return w.selectStmt(s, st, label)
	case *ast.ReturnStmt:
		for _, r := range st.Results {
			w.eval(s, r)
		}
		return dead
	case *ast.BranchStmt:
		return w.branch(s, st)
	case *ast.LabeledStmt:
		w.label = st.Label.Name
		return w.stmt(s, st.Stmt)
	case *ast.GoStmt:
		w.eval(s, st.Call)
	case *ast.DeferStmt:
		w.eval(s, st.Call)
	case *ast.SendStmt:
		w.eval(s, st.Chan)
		w.eval(s, st.Value)
	}
	return s
}

// opaque stands in for a statement nested too deeply to walk: every
// variable it assigns becomes unknown, and it may leave by any exit.
func (w *walker) opaque(s state, st ast.Stmt) state {
	w.f.opaque[st] = true
	if w.rec {
		w.f.snaps[st] = s.facts
	}
	for _, obj := range w.f.assignedIn(st) {
		s = w.f.forget(s, obj)
	}
	for _, t := range w.targets {
		t.breaks = append(t.breaks, s)
		t.conts = append(t.conts, s)
	}
	return s
}

func (w *walker) branch(s state, st *ast.BranchStmt) state {
	name := ""
	if st.Label != nil {
		name = st.Label.Name
	}
	switch st.Tok {
	case token.BREAK, token.CONTINUE:
		for i := len(w.targets) - 1; i >= 0; i-- {
			t := w.targets[i]
			if name != "" && t.label != name {
				continue
			}
			if st.Tok == token.CONTINUE {
				if !t.loop {
					continue
				}
				t.conts = append(t.conts, s)
			} else {
				t.breaks = append(t.breaks, s)
			}
			break
		}
		return dead
	case token.GOTO:
		return dead
	}
	return s // fallthrough: the switch walk carries the state on
}

func (w *walker) ifStmt(s state, st *ast.IfStmt) state {
	s = w.stmt(s, st.Init)
	if !s.live {
		return s
	}
	w.cond(s, st.Cond)
	then, els := w.refine2(s, st.Cond)
	then = w.stmt(then, st.Body)
	if st.Else != nil {
		els = w.stmt(els, st.Else)
	}
	return then.join(els)
}

// cond evaluates a condition and records the state it is evaluated in.
func (w *walker) cond(s state, e ast.Expr) {
	if e == nil {
		return
	}
	if w.rec {
		w.f.snaps[e] = s.facts
	}
	w.eval(s, e)
}

// noReturn reports whether the call e never returns: panic, os.Exit,
// log.Fatal* and log.Panic*, runtime.Goexit, and the testing methods
// that stop a test.
func (w *walker) noReturn(e ast.Expr) bool {
	call, ok := ast.Unparen(e).(*ast.CallExpr)
	if !ok {
		return false
	}
	switch obj := typeutil.Callee(w.f.info, call).(type) {
	case *types.Builtin:
		return obj.Name() == "panic"
	case *types.Func:
		if obj.Pkg() == nil {
			return false
		}
		name := obj.Name()
		switch obj.Pkg().Path() {
		case "os":
			return name == "Exit"
		case "runtime":
			return name == "Goexit"
		case "log":
			return strings.HasPrefix(name, "Fatal") || strings.HasPrefix(name, "Panic")
		case "testing":
			switch name {
			case "Fatal", "Fatalf", "FailNow", "Skip", "Skipf", "SkipNow":
				return true
			}
		}
	}
	return false
}
