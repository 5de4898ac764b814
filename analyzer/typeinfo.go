package analyzer

import (
	"go/ast"
	"go/constant"
	"go/types"

	"golang.org/x/tools/go/types/typeutil"
)

// Questions to the type checker about one expression: its constant value,
// whether it is a conversion, the variable it names, the function it calls.

// typeQueries is the part of a function context that asks the type
// checker about one expression: its constant value, whether it converts,
// the variable it names, its numeric type (numtype.go), its linear form
// (linear.go). The checker asks the same questions through queries.
type typeQueries struct {
	info  *types.Info
	sizes types.Sizes
}

// queries returns the pass's type queries.
func (c *checker) queries() typeQueries { return typeQueries{c.pass.TypesInfo, c.pass.TypesSizes} }

// intConst returns the value of a constant integer expression.
func (q typeQueries) intConst(e ast.Expr) (int64, bool) {
	tv, ok := q.info.Types[e]
	if !ok || tv.Value == nil {
		return 0, false
	}
	v := constant.ToInt(tv.Value)
	if v.Kind() != constant.Int {
		return 0, false
	}
	return constant.Int64Val(v)
}

// floatConst returns the value of a constant numeric expression.
func (q typeQueries) floatConst(e ast.Expr) (float64, bool) {
	tv, ok := q.info.Types[ast.Unparen(e)]
	if !ok || tv.Value == nil {
		return 0, false
	}
	v := constant.ToFloat(tv.Value)
	if v.Kind() != constant.Float && v.Kind() != constant.Int {
		return 0, false
	}
	f, _ := constant.Float64Val(v)
	return f, true
}

// stripConv removes parentheses and numeric conversions around e.
func (q typeQueries) stripConv(e ast.Expr) ast.Expr {
	for {
		e = ast.Unparen(e)
		call, ok := e.(*ast.CallExpr)
		if !ok || len(call.Args) != 1 || !q.isConversion(call) {
			return e
		}
		e = call.Args[0]
	}
}

func (q typeQueries) isConversion(call *ast.CallExpr) bool {
	tv, ok := q.info.Types[call.Fun]
	return ok && tv.IsType()
}

// objOf returns the variable an identifier denotes.
func (c *checker) objOf(e ast.Expr) types.Object { return c.queries().objOf(e) }

// objOf returns the variable an identifier denotes.
func (q typeQueries) objOf(e ast.Expr) types.Object {
	id, ok := ast.Unparen(e).(*ast.Ident)
	if !ok {
		return nil
	}
	obj := q.info.ObjectOf(id)
	if _, ok := obj.(*types.Var); !ok {
		return nil
	}
	return obj
}

// calleeOf returns the function a call statically calls, or nil; for a
// generic function or method, the generic one.
func (c *checker) calleeOf(call *ast.CallExpr) *types.Func {
	return typeutil.StaticCallee(c.pass.TypesInfo, call)
}

// isMathFunc reports whether call calls the function name of package math.
func (c *checker) isMathFunc(call *ast.CallExpr, name string) bool {
	fn := c.calleeOf(call)
	return fn != nil && fn.Name() == name && fn.Pkg() != nil && fn.Pkg().Path() == "math"
}
