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
// declared function with one or two results, the first numeric (or a
// slice or array of float64 or float32, as written: WrongValueFact), whose
// value is a factorial, a binomial or a value the value model names: it
// recurses on itself (recursionOf), multiplies in a loop (loopFuncOf,
// the binomial loops, the value model's loops and powers), calls
// math.Gamma, Lgamma, Pow or Exp (wrapperOf, the value model's Γ factors
// and intermediates that break, ValueFact), or calls a function that
// carries a fact (wrapperOf, binomialRatioFunc, the value model across
// calls). A call of a function of the same package matters only if that
// function carries a fact, which this answer covers already.
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
			if !ok || fd.Body == nil || !mayBeNumeric(fd.Type) {
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
					return knownName(fun.Name) || dot
				case *ast.SelectorExpr:
					if knownName(fun.Sel.Name) || methodBelow(fun.Sel.Name) {
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
	case *ast.ArrayType:
		// A slice or array of float64 or float32, a distribution whose
		// wrong entries its callers read (floatTable).
		elt, ok := r.Elt.(*ast.Ident)
		return ok && (elt.Name == "float64" || elt.Name == "float32")
	case *ast.StarExpr, *ast.MapType, *ast.ChanType, *ast.FuncType, *ast.StructType, *ast.InterfaceType:
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

// productLoop reports whether body multiplies or divides an accumulator
// inside a loop (acc *= x, acc /= x, acc = acc * x / y): a factorial, a
// binomial or a power that the value model may name.
func productLoop(body *ast.BlockStmt) bool {
	found := false
	inLoop := func(n ast.Node) bool {
		as, ok := n.(*ast.AssignStmt)
		if !ok || found || len(as.Lhs) != 1 || len(as.Rhs) != 1 {
			return !found
		}
		switch as.Tok {
		case token.MUL_ASSIGN, token.QUO_ASSIGN:
			found = true
		case token.ASSIGN:
			id, ok := ast.Unparen(as.Lhs[0]).(*ast.Ident)
			found = ok && isMulOrQuo(as.Rhs[0]) && mentionsName(as.Rhs[0], id.Name)
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

// knownName reports whether a call of that name may be one of the math
// functions the analyzer and its value model know.
func knownName(name string) bool {
	switch name {
	case "Gamma", "Lgamma", "Pow", "Exp":
		return true
	}
	return false
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
		switch x := ast.Unparen(e).(type) {
		case *ast.IndexExpr:
			e = x.X
		case *ast.IndexListExpr:
			e = x.X
		default:
			return x
		}
	}
}
