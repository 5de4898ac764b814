package fixes

import (
	"errors"
	"fmt"
	"go/ast"
	"go/constant"
	"go/token"
	"go/types"

	"github.com/overfact/overfact/internal/astpath"
)

// An integer loop that builds C(n,k) multiplicatively, or the falling
// factorial n(n-1)...(n-k+1), becomes one call of the exact helper; the
// loop and the accumulator's initialisation to 1 are replaced together:
//
//	b := 1
//	for i := 1; i <= k; i++ { b = b * (n - k + i) / i }
//
// becomes
//
//	b := int(lgamma.MustChooseInt64(int64(n), int64(k)))
//
// The loop leaves b at 1 for every k ≤ 0, while C(n, k) is 0 for k < 0
// (and the falling factorial is not defined there), so unless the
// analyzer shows that k is never negative (Match.CountNonNeg) the call
// runs only where the loop would:
//
//	b := 1
//	if k > 0 {
//		b = int(lgamma.MustChooseInt64(int64(n), int64(k)))
//	}
//
// For a negative n the loop computes the generalised coefficient
// C(n, k) = (−1)^k·C(k−n−1, k), which is what the helper's Choose family
// returns; the falling-factorial helpers take no negative n and panic
// where the loop multiplied negative factors (docs/fixes.md).
//
// The helpers are the row's in shapes.go, those of the ratio the loop
// computes.
func buildLoop(b *builder) error {
	loop, acc, init := b.m.Loop, b.m.Acc, b.m.AccInit
	if loop == nil {
		loop, _ = b.m.Node.(ast.Stmt)
	}
	if loop == nil || acc == nil || init == nil {
		// Without the initialisation the fixer cannot see that the
		// accumulator starts at 1.
		return errors.New("loop match lacks the loop, the accumulator or its initialisation")
	}
	if !onlyUpdates(b.pass.TypesInfo, loop, acc) {
		return fmt.Errorf("the loop does more than update %s", acc.Name())
	}
	if err := b.checkLoop(loop, acc); err != nil {
		return err
	}
	rhs := initValue(b.pass.TypesInfo, init, acc)
	if rhs == nil || !isOne(b.pass.TypesInfo, rhs) {
		return fmt.Errorf("%s does not start at 1", acc.Name())
	}
	name, err := b.pick(shapes[b.m.Shape].helpers, acc.Type())
	if err != nil {
		return err
	}
	call, err := b.call(name, b.m.Args, acc.Type())
	if err != nil {
		return err
	}
	if !b.m.CountNonNeg && classOf(b.pass.TypesInfo.TypeOf(b.m.Args[1])) != classUnsigned {
		// The loop is replaced by the call under the loop's own
		// condition for running; the accumulator keeps its 1 otherwise.
		if b.mentioned(acc, init.End(), loop.Pos()) {
			return fmt.Errorf("%s changes between its initialisation and the loop", acc.Name())
		}
		indent := b.indentOf(loop.Pos())
		b.replace(loop.Pos(), loop.End(), fmt.Sprintf("if %s > 0 {\n%s\t%s = %s\n%s}", b.copyText(b.m.Args[1]), indent, acc.Name(), call, indent))
		b.message = b.rewriteMessage() + ", where " + b.text(b.m.Args[1]) + " > 0 lets the loop run"
		return nil
	}
	if next(b.file, init) == loop {
		b.replace(rhs.Pos(), rhs.End(), call)
		b.replace(init.End(), loop.End(), "")
		b.message = b.rewriteMessage()
		return nil
	}
	if b.mentioned(acc, init.End(), loop.Pos()) {
		return fmt.Errorf("%s changes between its initialisation and the loop", acc.Name())
	}
	b.replace(loop.Pos(), loop.End(), acc.Name()+" = "+call)
	b.message = b.rewriteMessage()
	return nil
}

// onlyUpdates reports whether every statement of the loop's body assigns
// acc, so that replacing the loop drops no other effect.
func onlyUpdates(info *types.Info, loop ast.Stmt, acc types.Object) bool {
	var body *ast.BlockStmt
	switch l := loop.(type) {
	case *ast.ForStmt:
		body = l.Body
	case *ast.RangeStmt:
		body = l.Body
	default:
		return false
	}
	for _, s := range body.List {
		var lhs []ast.Expr
		switch s := s.(type) {
		case *ast.AssignStmt:
			lhs = s.Lhs
		case *ast.IncDecStmt:
			lhs = []ast.Expr{s.X}
		}
		if len(lhs) != 1 {
			return false
		}
		if id, ok := lhs[0].(*ast.Ident); !ok || info.ObjectOf(id) != acc {
			return false
		}
	}
	return true
}

// initValue returns the expression init assigns to acc, if init is a
// single-variable assignment, short declaration or var declaration.
func initValue(info *types.Info, init ast.Stmt, acc types.Object) ast.Expr {
	if e, n := assignedValue(info, init, acc); n == 1 {
		return e
	}
	return nil
}

// assignedValue returns the expression init assigns to acc, if init is
// an assignment, short declaration or var declaration with one value
// per variable (r := 1.0, or n, r := 0.0, 1.0), and the number of
// variables it assigns.
func assignedValue(info *types.Info, init ast.Stmt, acc types.Object) (ast.Expr, int) {
	switch s := init.(type) {
	case *ast.AssignStmt:
		if len(s.Lhs) == len(s.Rhs) && (s.Tok == token.ASSIGN || s.Tok == token.DEFINE) {
			for i, l := range s.Lhs {
				if id, ok := l.(*ast.Ident); ok && info.ObjectOf(id) == acc {
					return s.Rhs[i], len(s.Lhs)
				}
			}
		}
	case *ast.DeclStmt:
		g, ok := s.Decl.(*ast.GenDecl)
		if !ok || len(g.Specs) != 1 {
			return nil, 0
		}
		v, ok := g.Specs[0].(*ast.ValueSpec)
		if !ok || len(v.Names) != len(v.Values) {
			return nil, 0
		}
		for i, n := range v.Names {
			if info.Defs[n] == acc {
				return v.Values[i], len(v.Names)
			}
		}
	}
	return nil, 0
}

func isOne(info *types.Info, e ast.Expr) bool {
	tv, ok := info.Types[e]
	return ok && tv.Value != nil && constant.Compare(tv.Value, token.EQL, constant.MakeInt64(1))
}

// next returns the statement following s in its block, or nil.
func next(file *ast.File, s ast.Stmt) ast.Stmt {
	path, _ := astpath.Enclosing(file, s.Pos(), s.End())
	for _, n := range path {
		list := stmtList(n)
		if list == nil {
			continue
		}
		for i, t := range list {
			if t == s && i+1 < len(list) {
				return list[i+1]
			}
		}
		return nil
	}
	return nil
}

// stmtList returns the statements of a block or case clause, or nil.
func stmtList(n ast.Node) []ast.Stmt {
	switch p := n.(type) {
	case *ast.BlockStmt:
		return p.List
	case *ast.CaseClause:
		return p.Body
	case *ast.CommClause:
		return p.Body
	}
	return nil
}

// mentioned reports whether obj is referred to between pos and end.
func (b *builder) mentioned(obj types.Object, pos, end token.Pos) bool {
	found := false
	ast.Inspect(b.file, func(n ast.Node) bool {
		if found || n == nil || n.End() < pos || n.Pos() > end {
			return false
		}
		if id, ok := n.(*ast.Ident); ok && b.pass.TypesInfo.ObjectOf(id) == obj && id.Pos() >= pos && id.End() <= end {
			found = true
		}
		return true
	})
	return found
}
