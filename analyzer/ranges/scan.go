package ranges

import (
	"go/ast"
	"go/token"
	"go/types"
)

// escape is a place where a variable starts to be changeable behind
// the analysis' back: its address is taken, a closure assigns it, or a
// pointer method is called on it.
type escape struct {
	at   token.Pos // the escaping expression, or the outermost closure holding it
	loop ast.Node  // outermost loop around at, nil if none
}

// scan is the one syntactic pass made before the walk: it finds escapes,
// goto targets and the size of the function.
func (f *Func) scan(body ast.Node) {
	var loops, lits []ast.Node
	var stack []ast.Node
	ast.Inspect(body, func(n ast.Node) bool {
		if n == nil {
			top := stack[len(stack)-1]
			stack = stack[:len(stack)-1]
			switch top.(type) {
			case *ast.ForStmt, *ast.RangeStmt:
				loops = loops[:len(loops)-1]
			case *ast.FuncLit:
				lits = lits[:len(lits)-1]
			}
			return false
		}
		stack = append(stack, n)
		f.size++
		// site records an escape of id at n. A plain write escapes only
		// from inside a closure that does not declare the variable.
		site := func(id *ast.Ident, writeOnly bool) {
			obj := f.objOf(id)
			if obj == nil {
				return
			}
			at := n.Pos()
			if len(lits) > 0 {
				if writeOnly && declaredIn(obj, lits) {
					return
				}
				at = lits[0].Pos()
			} else if writeOnly {
				return
			}
			var loop ast.Node
			if len(loops) > 0 && loops[0].Pos() <= at {
				loop = loops[0]
			}
			if f.escapes == nil {
				f.escapes = make(map[types.Object][]escape)
			}
			f.escapes[obj] = append(f.escapes[obj], escape{at, loop})
		}
		if f.tableUses != nil {
			// A local is declared before it is used, so until a table
			// candidate is declared there is nothing to count.
			noteTableUses(f.info, n, f.tableUses)
		}
		switch n := n.(type) {
		case *ast.ValueSpec:
			f.noteTableDecl(specNames(n), n.Values)
		case *ast.ForStmt:
			loops = append(loops, n)
		case *ast.FuncLit:
			lits = append(lits, n)
		case *ast.BranchStmt:
			if n.Tok == token.GOTO && n.Label != nil {
				f.hasGoto = true
				if f.gotoTargets == nil {
					f.gotoTargets = make(map[string]bool)
				}
				f.gotoTargets[n.Label.Name] = true
			}
		case *ast.UnaryExpr:
			if id, ok := RootIdent(n.X); ok && n.Op == token.AND {
				site(id, false)
			}
		case *ast.AssignStmt:
			for _, l := range n.Lhs {
				if id, ok := RootIdent(l); ok {
					site(id, true)
				}
				if id, ok := ast.Unparen(l).(*ast.Ident); ok && (n.Tok != token.DEFINE || f.info.Defs[id] == nil) {
					f.noteRewrite(id)
				}
			}
			if n.Tok == token.DEFINE {
				f.noteTableDecl(n.Lhs, n.Rhs)
			}
		case *ast.IncDecStmt:
			if id, ok := RootIdent(n.X); ok {
				site(id, true)
			}
		case *ast.RangeStmt:
			loops = append(loops, n)
			if n.Tok == token.ASSIGN {
				for _, l := range []ast.Expr{n.Key, n.Value} {
					if id, ok := RootIdent(l); ok && l != nil {
						site(id, true)
					}
					if id, ok := ast.Unparen(l).(*ast.Ident); ok {
						f.noteRewrite(id)
					}
				}
			}
		case *ast.SelectorExpr:
			if id, ok := RootIdent(n.X); ok && f.pointerMethod(n) {
				site(id, false)
			}
		}
		return true
	})
}

// declaredIn reports whether obj is declared inside the innermost
// closure on the stack, so assigning it there is a plain local write.
func declaredIn(obj types.Object, lits []ast.Node) bool {
	lit := lits[len(lits)-1]
	return obj.Pos() >= lit.Pos() && obj.Pos() < lit.End()
}

// pointerMethod reports whether sel selects a pointer-receiver method
// on an addressable value, which takes the value's address implicitly.
func (f *Func) pointerMethod(sel *ast.SelectorExpr) bool {
	s, ok := f.info.Selections[sel]
	if !ok || s.Kind() != types.MethodVal {
		return false
	}
	fn, ok := s.Obj().(*types.Func)
	if !ok {
		return false
	}
	recv := fn.Signature().Recv()
	if recv == nil {
		return false
	}
	_, ptrRecv := recv.Type().(*types.Pointer)
	_, ptrArg := types.Unalias(s.Recv()).(*types.Pointer)
	return ptrRecv && !ptrArg
}

// escapedAt reports whether v may have been changed out of sight when n
// runs: n follows an escape of v, or shares a loop with one, or the
// function uses goto.
func (f *Func) escapedAt(v types.Object, n ast.Node) bool {
	if base, ok := f.fieldBase[v]; ok {
		v = base
	}
	es := f.escapes[v]
	if len(es) == 0 {
		return false
	}
	if f.hasGoto {
		return true
	}
	for _, e := range es {
		if e.at < n.Pos() {
			return true
		}
		if e.loop != nil && e.loop.Pos() <= n.Pos() && n.End() <= e.loop.End() {
			return true
		}
	}
	return false
}

// assignedIn lists the tracked variables that st may assign, for the
// statements the walk treats as opaque.
func (f *Func) assignedIn(st ast.Node) []types.Object {
	if objs, ok := f.assigned[st]; ok {
		return objs
	}
	var objs []types.Object
	add := func(e ast.Expr) {
		switch x := ast.Unparen(e).(type) {
		case *ast.Ident:
			if obj := f.objOf(x); obj != nil && (f.tracked(obj) || f.structVar(obj)) {
				objs = append(objs, obj)
			}
		case *ast.SelectorExpr:
			if v, ok := f.fieldOf(x); ok {
				objs = append(objs, v)
			}
		}
	}
	ast.Inspect(st, func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.AssignStmt:
			for _, l := range n.Lhs {
				add(l)
			}
		case *ast.IncDecStmt:
			add(n.X)
		case *ast.RangeStmt:
			add(n.Key)
			add(n.Value)
		case *ast.ValueSpec:
			for _, id := range n.Names {
				add(id)
			}
		}
		return true
	})
	if f.assigned == nil {
		f.assigned = make(map[ast.Node][]types.Object)
	}
	f.assigned[st] = objs
	return objs
}

// noteRewrite records that the variable id names is assigned after its
// definition.
func (f *Func) noteRewrite(id *ast.Ident) {
	obj := f.objOf(id)
	if obj == nil {
		return
	}
	if f.rewritten == nil {
		f.rewritten = make(map[types.Object]bool)
	}
	f.rewritten[obj] = true
}
