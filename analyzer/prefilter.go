package analyzer

import (
	"go/ast"
	"go/token"
	"strconv"
)

// MayCarryFacts reports, from syntax alone, whether a function declared
// in files may get one of the analyzer's facts (funcs), and the names of
// the methods among those (methods). A driver takes a dependency for
// which funcs is false from export data instead of type-checking its
// source: the analyzer would export nothing there.
//
// It answers for a package whose imports have been answered already:
// imported returns the name of an imported package (by import path) and
// whether it may carry facts, and methodBelow whether a method of that
// name may carry a fact in any package below (a method call cannot be
// resolved to its package without types, so any call x.name counts).
//
// The answer is a superset of what run exports. A fact goes only on a
// declared function with parameters and one or two results, the first
// numeric, whose value is a factorial or a binomial of its parameters:
// it recurses on itself (recursionOf), multiplies in a loop by a factor
// that moves with the loop (loopFuncOf, the binomial loops, the value
// model's loops), calls math.Gamma or math.Lgamma (wrapperOf, the value
// model), or calls a function that carries a fact (wrapperOf,
// binomialRatioFunc). A call of a function of the same package matters
// only if that function carries a fact, which this answer covers already.
func MayCarryFacts(files []*ast.File, imported func(path string) (name string, carries bool), methodBelow func(name string) bool) (funcs bool, methods []string) {
	for _, f := range files {
		names, dot := map[string]bool{}, false
		for _, imp := range f.Imports {
			path, err := strconv.Unquote(imp.Path.Value)
			if err != nil {
				continue
			}
			name, carries := imported(path)
			switch {
			case !carries:
			case imp.Name == nil:
				names[name] = true
			case imp.Name.Name == ".":
				dot = true
			default:
				names[imp.Name.Name] = true
			}
		}
		for _, d := range f.Decls {
			fd, ok := d.(*ast.FuncDecl)
			if !ok || fd.Body == nil || fd.Type.Params.NumFields() == 0 || !mayBeNumeric(fd.Type) {
				continue
			}
			self := func(call *ast.CallExpr) bool {
				switch fun := calledName(call.Fun).(type) {
				case *ast.Ident:
					return fun.Name == fd.Name.Name && fd.Recv == nil
				case *ast.SelectorExpr:
					x, ok := fun.X.(*ast.Ident)
					return ok && fun.Sel.Name == fd.Name.Name && isReceiver(fd, x.Name)
				}
				return false
			}
			callee := func(call *ast.CallExpr) bool {
				switch fun := calledName(call.Fun).(type) {
				case *ast.Ident:
					return fun.Name == "Gamma" || fun.Name == "Lgamma" || dot
				case *ast.SelectorExpr:
					if fun.Sel.Name == "Gamma" || fun.Sel.Name == "Lgamma" || methodBelow(fun.Sel.Name) {
						return true
					}
					x, ok := fun.X.(*ast.Ident)
					return ok && names[x.Name]
				}
				return false
			}
			if calls(fd.Body, callee) || recursion(fd.Body, self) || productLoop(fd.Body) {
				funcs = true
				if fd.Recv != nil {
					methods = append(methods, fd.Name.Name)
				}
			}
		}
	}
	return funcs, methods
}

// mayBeNumeric reports whether a function of this type may have the one
// or two results, the first numeric, that numericFunc asks for.
func mayBeNumeric(t *ast.FuncType) bool {
	if t.Results == nil {
		return false
	}
	n := 0
	for _, r := range t.Results.List {
		n += max(1, len(r.Names))
	}
	if n > 2 {
		return false
	}
	switch r := t.Results.List[0].Type.(type) {
	case *ast.StarExpr, *ast.ArrayType, *ast.MapType, *ast.ChanType, *ast.FuncType, *ast.StructType, *ast.InterfaceType:
		return false
	case *ast.Ident:
		switch r.Name {
		case "string", "bool", "error", "any":
			return false
		}
	}
	return true
}

// calls reports whether n, closures included, makes a call match
// accepts.
func calls(n ast.Node, match func(*ast.CallExpr) bool) bool {
	found := false
	ast.Inspect(n, func(n ast.Node) bool {
		if call, ok := n.(*ast.CallExpr); ok && match(call) {
			found = true
		}
		return !found
	})
	return found
}

// recursion reports whether body multiplies by a call of the function
// itself, which self recognises: n * f(n-1) as recursionOf matches it.
func recursion(body *ast.BlockStmt, self func(*ast.CallExpr) bool) bool {
	found := false
	ast.Inspect(body, func(n ast.Node) bool {
		if b, ok := n.(*ast.BinaryExpr); ok && b.Op == token.MUL {
			found = calls(b, self)
		}
		return !found
	})
	return found
}

// productLoop reports whether body multiplies or divides, inside a loop,
// by a factor that mentions a variable some statement of body steps
// (x++, x--, x += c, x -= c, x = y ± z, the post statement of a for,
// the key of a range): a product that moves with a loop, as accLoopOf and
// the value model require, and not a scaling by a fixed factor.
func productLoop(body *ast.BlockStmt) bool {
	stepped := map[string]bool{}
	step := func(e ast.Expr) {
		if id, ok := unparen(e).(*ast.Ident); ok {
			stepped[id.Name] = true
		}
	}
	ast.Inspect(body, func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.IncDecStmt:
			step(n.X)
		case *ast.AssignStmt:
			if n.Tok == token.ADD_ASSIGN || n.Tok == token.SUB_ASSIGN {
				step(n.Lhs[0])
			}
			if n.Tok == token.ASSIGN && len(n.Lhs) == 1 && len(n.Rhs) == 1 {
				// i = i + 1
				if b, ok := unparen(n.Rhs[0]).(*ast.BinaryExpr); ok && (b.Op == token.ADD || b.Op == token.SUB) {
					step(n.Lhs[0])
				}
			}
		case *ast.ForStmt:
			if as, ok := n.Post.(*ast.AssignStmt); ok {
				for _, l := range as.Lhs {
					step(l)
				}
			}
		case *ast.RangeStmt:
			if n.Key != nil {
				step(n.Key)
			}
		}
		return true
	})
	if len(stepped) == 0 {
		return false
	}
	moves := func(e ast.Expr, acc string) bool {
		found := false
		ast.Inspect(e, func(n ast.Node) bool {
			if id, ok := n.(*ast.Ident); ok && id.Name != acc && stepped[id.Name] {
				found = true
			}
			return !found
		})
		return found
	}
	found := false
	var inLoop func(n ast.Node) bool
	inLoop = func(n ast.Node) bool {
		as, ok := n.(*ast.AssignStmt)
		if !ok || found || len(as.Lhs) != 1 || len(as.Rhs) != 1 {
			return !found
		}
		acc := ""
		if id, ok := unparen(as.Lhs[0]).(*ast.Ident); ok {
			acc = id.Name
		}
		switch as.Tok {
		case token.MUL_ASSIGN, token.QUO_ASSIGN:
			found = moves(as.Rhs[0], acc)
		case token.ASSIGN:
			// acc = acc * x, acc = x * acc, acc = acc * x / y
			found = acc != "" && isMulOrQuo(as.Rhs[0]) && mentionsName(as.Rhs[0], acc) && moves(as.Rhs[0], acc)
		}
		return !found
	}
	ast.Inspect(body, func(n ast.Node) bool {
		switch n := n.(type) {
		case *ast.ForStmt:
			ast.Inspect(n.Body, inLoop)
		case *ast.RangeStmt:
			ast.Inspect(n.Body, inLoop)
		}
		return !found
	})
	return found
}

func mentionsName(e ast.Expr, name string) bool {
	found := false
	ast.Inspect(e, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok && id.Name == name {
			found = true
		}
		return !found
	})
	return found
}

// isReceiver reports whether name is fd's receiver: a call name.f
// inside method f is a recursion.
func isReceiver(fd *ast.FuncDecl, name string) bool {
	if fd.Recv == nil {
		return false
	}
	for _, f := range fd.Recv.List {
		for _, n := range f.Names {
			if n.Name == name {
				return true
			}
		}
	}
	return false
}

// calledName strips the parentheses and type arguments of a callee.
func calledName(e ast.Expr) ast.Expr {
	for {
		switch x := unparen(e).(type) {
		case *ast.IndexExpr:
			e = x.X
		case *ast.IndexListExpr:
			e = x.X
		default:
			return x
		}
	}
}
