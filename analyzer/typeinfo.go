package analyzer

import (
	"go/ast"
	"go/constant"
	"go/token"
	"go/types"

	"github.com/overfact/overfact/internal/assigned"
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
	if fn := typeutil.StaticCallee(c.pass.TypesInfo, call); fn != nil {
		return fn
	}
	return c.aliasCallee(call)
}

// funcAliases maps the variables of a package that name one function
// for good: set once, g := math.Gamma, or to a literal that only passes
// its parameters on, g := func(x float64) float64 { return math.Gamma(x)
// }, and never assigned again nor their address taken. A call g(x) then
// calls that function, for every category and for the value model.
type funcAliases struct {
	done bool
	to   map[types.Object]*types.Func
}

var funcAliasesKey = &stateKey[funcAliases]{"variables that name one function"}

// aliasCallee returns the function a call through such a variable calls.
func (c *checker) aliasCallee(call *ast.CallExpr) *types.Func {
	id, ok := ast.Unparen(call.Fun).(*ast.Ident)
	if !ok {
		return nil
	}
	st := passStateOf(c, funcAliasesKey)
	if !st.done {
		st.done, st.to = true, c.collectAliases()
	}
	return st.to[c.pass.TypesInfo.Uses[id]]
}

// collectAliases walks the package once for funcAliases.
func (c *checker) collectAliases() map[types.Object]*types.Func {
	info := c.pass.TypesInfo
	cands := make(map[types.Object]*types.Func)
	writes := make(map[types.Object]int)
	for _, f := range c.pass.Files {
		ast.Inspect(f, func(n ast.Node) bool {
			if a, ok := n.(*ast.AssignStmt); ok && a.Tok == token.DEFINE && len(a.Lhs) == len(a.Rhs) {
				for i, l := range a.Lhs {
					if obj := info.Defs[l.(*ast.Ident)]; obj != nil {
						if fn := c.forwardedFunc(a.Rhs[i]); fn != nil {
							cands[obj] = fn
						}
					}
				}
			}
			return true
		})
		assigned.Each(info, f, nil, func(v types.Object, _ ast.Node) bool {
			if cands[v] != nil {
				writes[v]++
			}
			return true
		})
	}
	for v := range cands {
		if writes[v] != 1 {
			delete(cands, v)
		}
	}
	return cands
}

// forwardedFunc returns the package-level function e names, or that a
// function literal calls with its own parameters, in order, and returns
// the result of; nil otherwise.
func (c *checker) forwardedFunc(e ast.Expr) *types.Func {
	info := c.pass.TypesInfo
	switch e := ast.Unparen(e).(type) {
	case *ast.Ident, *ast.SelectorExpr:
		var id *ast.Ident
		if sel, ok := e.(*ast.SelectorExpr); ok {
			id = sel.Sel
		} else {
			id = e.(*ast.Ident)
		}
		fn, ok := info.Uses[id].(*types.Func)
		if !ok || fn.Type().(*types.Signature).Recv() != nil {
			return nil
		}
		return fn
	case *ast.FuncLit:
		if len(e.Body.List) != 1 {
			return nil
		}
		ret, ok := e.Body.List[0].(*ast.ReturnStmt)
		if !ok || len(ret.Results) != 1 {
			return nil
		}
		call, ok := ast.Unparen(ret.Results[0]).(*ast.CallExpr)
		if !ok || call.Ellipsis.IsValid() {
			return nil
		}
		fn := typeutil.StaticCallee(info, call)
		if fn == nil || fn.Type().(*types.Signature).Recv() != nil {
			return nil
		}
		var params []types.Object
		for _, fld := range e.Type.Params.List {
			for _, name := range fld.Names {
				params = append(params, info.Defs[name])
			}
		}
		if len(params) != len(call.Args) {
			return nil
		}
		for i, a := range call.Args {
			id, ok := ast.Unparen(a).(*ast.Ident)
			if !ok || info.Uses[id] != params[i] {
				return nil
			}
		}
		return fn
	}
	return nil
}

// isMathFunc reports whether call calls the function name of package math.
func (c *checker) isMathFunc(call *ast.CallExpr, name string) bool {
	fn := c.calleeOf(call)
	return fn != nil && fn.Name() == name && fn.Pkg() != nil && fn.Pkg().Path() == "math"
}
