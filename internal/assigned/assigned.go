// Package assigned finds the variables a piece of Go syntax may change:
// the one walker that the analyzer and the fixer share for "is this
// variable assigned here".
//
// A variable counts as changed by
//
//   - an assignment to it (=, := and the op= forms),
//   - an increment or decrement (x++, x--),
//   - a range clause that names it as key or value (for k, v = range …
//     and for k, v := range …),
//   - taking its address (&x), after which anything may change it.
//
// Special cases are:
//
//	Each(info, nil, …) visits nothing
//	a blank identifier (_) and selectors or index expressions (s.f, a[i])
//	name no variable and are not visited
package assigned

import (
	"go/ast"
	"go/token"
	"go/types"
)

// Each calls f, in source order, with each variable root may change and
// the node that changes it, until f returns false. skip, when not nil,
// tells the nodes whose subtree is not walked (a loop's own update, a
// closure).
func Each(info *types.Info, root ast.Node, skip func(ast.Node) bool, f func(v types.Object, at ast.Node) bool) {
	EachTarget(root, skip, func(e ast.Expr, at ast.Node) bool {
		if id, ok := ast.Unparen(e).(*ast.Ident); ok {
			if obj := info.ObjectOf(id); obj != nil {
				return f(obj, at)
			}
		}
		return true
	})
}

// EachTarget is Each for what is written rather than the variables: it
// calls f with each expression root assigns to, increments, ranges into
// or takes the address of, as written (a[i] and s.f included, a blank
// identifier too), and the node that writes it, until f returns false.
func EachTarget(root ast.Node, skip func(ast.Node) bool, f func(target ast.Expr, at ast.Node) bool) {
	if root == nil {
		return
	}
	more := true
	visit := func(e ast.Expr, at ast.Node) {
		if e != nil && more {
			more = f(e, at)
		}
	}
	ast.Inspect(root, func(n ast.Node) bool {
		if !more || n == nil {
			return false
		}
		if skip != nil && skip(n) {
			return false
		}
		switch n := n.(type) {
		case *ast.AssignStmt:
			for _, l := range n.Lhs {
				visit(l, n)
			}
		case *ast.IncDecStmt:
			visit(n.X, n)
		case *ast.UnaryExpr:
			if n.Op == token.AND {
				visit(n.X, n)
			}
		case *ast.RangeStmt:
			visit(n.Key, n)
			visit(n.Value, n)
		}
		return more
	})
}

// Root returns the variable a target of EachTarget writes into: x of
// x, x.f, x[i], *x and their combinations ((*x).f[i]), or nil where the
// target starts from no identifier (f().g, a composite literal).
func Root(target ast.Expr) *ast.Ident {
	for {
		switch x := ast.Unparen(target).(type) {
		case *ast.Ident:
			return x
		case *ast.SelectorExpr:
			target = x.X
		case *ast.IndexExpr:
			target = x.X
		case *ast.StarExpr:
			target = x.X
		default:
			return nil
		}
	}
}

// In reports whether root may change v, outside the subtrees skip names.
func In(info *types.Info, root ast.Node, v types.Object, skip func(ast.Node) bool) bool {
	found := false
	Each(info, root, skip, func(obj types.Object, _ ast.Node) bool {
		found = obj == v
		return !found
	})
	return found
}

// Before reports whether root may change v at a node that starts before
// pos: the statements that run before the one at pos, when no loop
// encloses both.
func Before(info *types.Info, root ast.Node, v types.Object, pos token.Pos) bool {
	found := false
	Each(info, root, func(n ast.Node) bool { return n.Pos() >= pos }, func(obj types.Object, at ast.Node) bool {
		found = obj == v && at.Pos() < pos
		return !found
	})
	return found
}
