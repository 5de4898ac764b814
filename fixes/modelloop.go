package fixes

import (
	"errors"
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"strings"
)

// A loop the value model reads as C(n, k), in any of the arrangements
// people write, becomes one call of the helper, placed where the
// accumulator started at 1, with the loop and the variables it alone
// stepped removed:
//
//	r := 1.0
//	m := float64(n)
//	for d := 1; d <= k; d++ {
//		r *= m
//		r /= float64(d)
//		m--
//	}
//
// becomes
//
//	r := lgamma.Choose(n, k)
//
// The analyzer vouches for what only the model knows (ShapeModelBinomLoop
// in match.go): the loop's value is C(n, k) of the operands' entry
// values and it runs exactly k trips, so the helper's answers agree with
// the loop's for k > n ≥ 0 (0) and for a negative n (the generalised
// coefficient). Over a negative k the loop runs no trip and leaves 1,
// where C(n, k) is 0: unless the analyzer shows k ≥ 0 (CountNonNeg) or k
// is unsigned, the call runs under the loop's own condition for running,
//
//	r := 1.0
//	if k > 0 {
//		r = lgamma.Choose(n, k)
//	} This builder checks the
//
// rest on its own: the accumulator starts at 1, the loop does nothing but
// update it and step variables read nowhere after it, no part of it can
// panic or call out, and the operands are parameters or receivers (or
// their fields) that hold their entry values where the call goes.
func buildModelLoop(b *builder) error {
	loop, acc, init := b.m.Loop, b.m.Acc, b.m.AccInit
	if loop == nil || acc == nil || init == nil || len(b.m.Args) != 2 {
		return errors.New("model loop match lacks the loop, the accumulator, its initialisation or n and k")
	}
	rhs, _ := assignedValue(b.pass.TypesInfo, init, acc)
	if rhs == nil || !isOne(b.pass.TypesInfo, rhs) {
		return fmt.Errorf("%s does not start at 1", acc.Name())
	}
	steps, err := b.modelBody(loop, acc)
	if err != nil {
		return err
	}
	// The declarations of stepped locals the loop alone reads go with it.
	var drop []ast.Stmt
	for _, v := range steps {
		if b.usedAfter(v, loop.End()) {
			return fmt.Errorf("%s, stepped by the loop, is read after it", v.Name())
		}
		if b.isParam(v) || !b.usedOnlyIn(v, loop) {
			continue
		}
		d := b.definition(v, loop)
		if d == nil {
			return fmt.Errorf("%s is read only by the loop but its definition cannot go with it", v.Name())
		}
		drop = append(drop, d)
	}
	name, err := b.pick(shapes[b.m.Shape].helpers, acc.Type())
	if err != nil {
		return err
	}
	// A loop of exactly k trips has the helper's value for every whole n
	// and k ≥ 0, k > n included: its factors reach 0 there (n+1−j at
	// j = n+1, n − i at i = n), as the helpers' 0 says, even where the
	// product had left float64 before (+Inf·0 = NaN).
	b.countBounds = loopTrips
	call, conds, err := b.countedCall(name, b.m.Args, acc.Type())
	b.countBounds = nil
	if err != nil {
		return err
	}
	// Float counts: the loop stays, as written, for the counts that are
	// no integers in the helper's domain; the domain's k ≥ 0 stands in
	// for the loop's condition for running.
	guarded := conds == nil && !b.m.CountNonNeg && classOf(b.pass.TypesInfo.TypeOf(b.m.Args[1])) != classUnsigned
	// The call goes at the initialisation when nothing but those
	// definitions separates it from the loop, else at the loop; under
	// its condition, always at the loop.
	at := loop.Pos()
	if between, ok := b.between(init, loop); ok && sameStmts(between, drop) && !guarded && conds == nil {
		at = rhs.Pos()
	} else if b.mentioned(acc, init.End(), loop.Pos()) {
		return fmt.Errorf("%s changes between its initialisation and the loop", acc.Name())
	}
	for _, a := range b.m.Args {
		if err := b.valueAt(a, at, loop); err != nil {
			return err
		}
	}
	if conds != nil {
		if rawString(loop) {
			return errors.New("the loop holds a raw string, which moving it into a branch would change")
		}
		indent := b.indentOf(loop.Pos())
		kept := strings.ReplaceAll(b.copyText(loop), "\n", "\n\t")
		b.replace(loop.Pos(), loop.End(), fmt.Sprintf("if %[2]s {\n%[1]s\t%[3]s = %[4]s\n%[1]s} else {\n%[1]s\t//overfact:allow %[5]s\n%[1]s\t%[6]s\n%[1]s}",
			indent, strings.Join(conds, " && "), acc.Name(), call, countsKept, kept))
		b.message = b.rewriteMessage() + ", where the counts are integers in its domain"
		return nil
	}
	if at == rhs.Pos() {
		b.replace(rhs.Pos(), rhs.End(), call)
		b.replace(init.End(), loop.End(), "")
	} else {
		text := acc.Name() + " = " + call
		if guarded {
			indent := b.indentOf(loop.Pos())
			text = fmt.Sprintf("if %s > 0 {\n%s\t%s\n%s}", b.copyText(b.m.Args[1]), indent, text, indent)
		}
		b.replace(loop.Pos(), loop.End(), text)
		for _, d := range drop {
			b.deleteStmt(d)
		}
	}
	b.message = b.rewriteMessage()
	if guarded {
		b.message += ", where " + b.text(b.m.Args[1]) + " > 0 lets the loop run"
	}
	return nil
}

// modelBody checks that the loop's header and body do nothing but count,
// update acc and step other variables, with expressions that neither call
// out nor can panic, and returns the stepped variables.
func (b *builder) modelBody(loop ast.Stmt, acc types.Object) ([]types.Object, error) {
	var header []ast.Node
	var body *ast.BlockStmt
	switch l := loop.(type) {
	case *ast.ForStmt:
		init, ok := l.Init.(*ast.AssignStmt)
		if !ok || init.Tok != token.DEFINE || l.Cond == nil {
			return nil, errors.New("the loop does not define its own counter")
		}
		header, body = []ast.Node{l.Init, l.Cond, l.Post}, l.Body
	case *ast.RangeStmt:
		if l.Tok != token.DEFINE && l.Key != nil {
			return nil, errors.New("the loop does not define its own counter")
		}
		header, body = []ast.Node{l.X}, l.Body
	default:
		return nil, errors.New("not a counting loop")
	}
	for _, h := range header {
		if h != nil && !b.plain(h) {
			return nil, errors.New("the loop's header calls out or may panic")
		}
	}
	// Variables the header assigns must be its own.
	var bad error
	ast.Inspect(loop, func(n ast.Node) bool {
		if n == body {
			return false
		}
		if id, ok := n.(*ast.Ident); ok {
			if obj := b.pass.TypesInfo.Uses[id]; obj != nil && b.assigned(obj, loop) && !(loop.Pos() <= obj.Pos() && obj.Pos() < loop.End()) && obj != acc {
				bad = fmt.Errorf("the loop's header reads %s, which the loop steps", obj.Name())
			}
		}
		return true
	})
	if bad != nil {
		return nil, bad
	}
	var steps []types.Object
	seen := map[types.Object]bool{acc: true}
	for _, s := range body.List {
		var lhs, rhs ast.Expr
		switch s := s.(type) {
		case *ast.AssignStmt:
			if len(s.Lhs) != 1 || len(s.Rhs) != 1 || s.Tok == token.DEFINE {
				return nil, errors.New("the loop's body does more than update variables")
			}
			lhs, rhs = s.Lhs[0], s.Rhs[0]
		case *ast.IncDecStmt:
			lhs = s.X
		default:
			return nil, errors.New("the loop's body does more than update variables")
		}
		id, ok := ast.Unparen(lhs).(*ast.Ident)
		if !ok {
			return nil, errors.New("the loop's body assigns more than variables")
		}
		if rhs != nil && !b.plain(rhs) {
			return nil, errors.New("the loop's body calls out or may panic")
		}
		obj := b.pass.TypesInfo.ObjectOf(id)
		if obj == nil {
			return nil, errors.New("the loop's body assigns an unknown variable")
		}
		if !seen[obj] {
			seen[obj] = true
			steps = append(steps, obj)
		}
	}
	return steps, nil
}

// plain reports whether evaluating n calls no function (conversions
// aside), reads no channel, and cannot panic on an index or a pointer.
func (b *builder) plain(n ast.Node) bool {
	ok := true
	ast.Inspect(n, func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.CallExpr:
			if tv, has := b.pass.TypesInfo.Types[n.Fun]; !has || !tv.IsType() {
				ok = false
			}
		case *ast.UnaryExpr:
			if n.Op == token.ARROW || n.Op == token.AND {
				ok = false
			}
		case *ast.IndexExpr, *ast.IndexListExpr, *ast.SliceExpr, *ast.StarExpr, *ast.TypeAssertExpr, *ast.FuncLit:
			ok = false
		}
		return ok
	})
	return ok
}

// funcBody returns the body of the match's function.
func (b *builder) funcBody() *ast.BlockStmt {
	switch f := b.m.Func.(type) {
	case *ast.FuncDecl:
		return f.Body
	case *ast.FuncLit:
		return f.Body
	}
	return nil
}

// usedAfter reports whether the function reads v after pos.
func (b *builder) usedAfter(v types.Object, pos token.Pos) bool {
	found := false
	ast.Inspect(b.funcBody(), func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok && id.Pos() >= pos && b.pass.TypesInfo.Uses[id] == v {
			found = true
		}
		return !found
	})
	return found
}

// isParam reports whether v is a parameter or the receiver of the
// match's function.
func (b *builder) isParam(v types.Object) bool {
	var ft *ast.FuncType
	var recv *ast.FieldList
	switch f := b.m.Func.(type) {
	case *ast.FuncDecl:
		ft, recv = f.Type, f.Recv
	case *ast.FuncLit:
		ft = f.Type
	default:
		return false
	}
	in := func(l *ast.FieldList) bool { return l != nil && l.Pos() <= v.Pos() && v.Pos() < l.End() }
	return in(ft.Params) || in(recv)
}

// definition returns the statement of loop's block, before it, that
// defines v from a plain value, or nil.
func (b *builder) definition(v types.Object, loop ast.Stmt) ast.Stmt {
	for _, s := range b.blockOf(loop) {
		if s.Pos() >= loop.Pos() {
			break
		}
		if b.definedVar(s) != v {
			continue
		}
		switch d := s.(type) {
		case *ast.AssignStmt:
			if b.plain(d.Rhs[0]) {
				return s
			}
		case *ast.DeclStmt:
			if b.plain(d) {
				return s
			}
		}
	}
	return nil
}

// blockOf returns the statements of the block holding s.
func (b *builder) blockOf(s ast.Stmt) []ast.Stmt {
	var list []ast.Stmt
	ast.Inspect(b.funcBody(), func(n ast.Node) bool {
		if l := stmtList(n); l != nil {
			for _, t := range l {
				if t == s {
					list = l
				}
			}
		}
		return list == nil
	})
	return list
}

// between returns the statements strictly between from and to, when
// both are in one block.
func (b *builder) between(from, to ast.Stmt) ([]ast.Stmt, bool) {
	list := b.blockOf(to)
	i, j := -1, -1
	for x, s := range list {
		switch s {
		case from:
			i = x
		case to:
			j = x
		}
	}
	if i < 0 || j < i {
		return nil, false
	}
	return list[i+1 : j], true
}

// sameStmts reports whether a and b hold the same statements.
func sameStmts(a, b []ast.Stmt) bool {
	if len(a) != len(b) {
		return false
	}
	in := make(map[ast.Stmt]bool)
	for _, s := range b {
		in[s] = true
	}
	for _, s := range a {
		if !in[s] {
			return false
		}
	}
	return true
}

// valueAt checks that the operand e holds at pos the value the model
// read: at the loop, the value a variable holds where the loop starts,
// which the analyzer vouches for, so long as e names the same variable
// there (a variable the loop steps is read after it nowhere, which
// buildModelLoop checks); before it, the entry value of a parameter or
// receiver or a field of one (entryValueAt).
func (b *builder) valueAt(e ast.Expr, pos token.Pos, loop ast.Stmt) error {
	if pos != loop.Pos() {
		return b.entryValueAt(e, pos)
	}
	root := ast.Unparen(e)
	if sel, ok := root.(*ast.SelectorExpr); ok {
		root = ast.Unparen(sel.X)
	}
	id, ok := root.(*ast.Ident)
	if !ok {
		return fmt.Errorf("%s is not a variable or a field of one", b.text(e))
	}
	v := b.pass.TypesInfo.ObjectOf(id)
	if _, obj := b.scopeAt(pos).LookupParent(id.Name, pos); v == nil || obj != v {
		return fmt.Errorf("%s names another variable where the call goes", id.Name)
	}
	if _, isSel := ast.Unparen(e).(*ast.SelectorExpr); isSel {
		// A field may change through a pointer: only an entry value
		// is vouched for.
		return b.entryValueAt(e, pos)
	}
	return nil
}

// entryValueAt checks that the operand e, a parameter or receiver or a
// field of one, names the same variable at pos and still holds the
// value it had when the function was entered.
func (b *builder) entryValueAt(e ast.Expr, pos token.Pos) error {
	e = ast.Unparen(e)
	root, field := e, types.Object(nil)
	if sel, ok := e.(*ast.SelectorExpr); ok {
		root, field = ast.Unparen(sel.X), b.pass.TypesInfo.ObjectOf(sel.Sel)
		if s := b.pass.TypesInfo.Selections[sel]; s == nil || s.Kind() != types.FieldVal || len(s.Index()) != 1 {
			return fmt.Errorf("%s is not a field of a variable", b.text(e))
		}
	}
	id, ok := root.(*ast.Ident)
	if !ok {
		return fmt.Errorf("%s is not a variable or a field of one", b.text(e))
	}
	v := b.pass.TypesInfo.ObjectOf(id)
	if v == nil || !b.isParam(v) {
		return fmt.Errorf("%s is not a parameter or the receiver", id.Name)
	}
	if _, obj := b.scopeAt(pos).LookupParent(id.Name, pos); obj != v {
		return fmt.Errorf("%s names another variable where the call goes", id.Name)
	}
	body := b.funcBody()
	changed := false
	ast.Inspect(body, func(n ast.Node) bool {
		if changed || n == nil || n.Pos() >= pos {
			return false
		}
		switch n := n.(type) {
		case *ast.FuncLit:
			// A closure may run at any time: one that assigns the
			// operand makes its value unknown.
			changed = b.assigned(v, n)
			return false
		case *ast.AssignStmt, *ast.IncDecStmt, *ast.UnaryExpr, *ast.RangeStmt:
			changed = b.assigned(v, n)
		case *ast.SelectorExpr:
			// A field written through any path, or a call that could
			// write it through a pointer, is a change too.
			if field != nil && b.pass.TypesInfo.ObjectOf(n.Sel) == field && b.isLHS(n) {
				changed = true
			}
		case *ast.CallExpr:
			if tv, has := b.pass.TypesInfo.Types[n.Fun]; field != nil && (!has || !tv.IsType()) {
				changed = true
			}
		}
		return !changed
	})
	if changed {
		return fmt.Errorf("%s may change before the call", b.text(e))
	}
	return nil
}

// isLHS reports whether the function assigns to or takes the address of
// e.
func (b *builder) isLHS(e ast.Expr) bool {
	found := false
	ast.Inspect(b.funcBody(), func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.AssignStmt:
			for _, l := range n.Lhs {
				found = found || ast.Unparen(l) == e
			}
		case *ast.IncDecStmt:
			found = found || ast.Unparen(n.X) == e
		case *ast.UnaryExpr:
			found = found || n.Op == token.AND && ast.Unparen(n.X) == e
		}
		return !found
	})
	return found
}

// rawString reports whether n holds a raw string literal, whose lines
// an indentation added to the code around it would change.
func rawString(n ast.Node) bool {
	found := false
	ast.Inspect(n, func(x ast.Node) bool {
		if l, ok := x.(*ast.BasicLit); ok && l.Kind == token.STRING && strings.HasPrefix(l.Value, "`") {
			found = true
		}
		return !found
	})
	return found
}
