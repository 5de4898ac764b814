package analyzer

import (
	"go/ast"
	"go/types"
)

// linearCount is linear for the arguments of a factorial whose counts
// are kept in float variables (n!/(k!(n−k)!) over float64 n and k, as
// spreadsheet code writes it): it also takes float variables as terms.
// It serves only to recognise which canonical form a ratio of
// factorials is; the fixes run the helper where the float operands hold
// integers and keep the original arithmetic elsewhere
// (fixes/floatcount.go), so a float term never stands for a fraction
// here.
func (fc *fnCtx) linearCount(e ast.Expr) (linear, bool) {
	if l, ok := fc.linear(e); ok {
		return l, true
	}
	return fc.linearOf(e, 0, fc.c.countTerm)
}

// countTerm reads a term of a float count: a numeric variable, or a
// field read x.Number of a local formula value.
func (c *checker) countTerm(e ast.Expr) (linear, bool) {
	switch e := e.(type) {
	case *ast.Ident:
		if obj := c.objOf(e); obj != nil {
			if _, ok := c.numOf(obj.Type()); ok {
				return single(obj), true
			}
		}
	case *ast.SelectorExpr:
		if v := c.fieldVar(e); v != nil {
			return single(v), true
		}
	}
	return linear{}, false
}

// fieldVar returns the variable that stands for the numeric field read
// e = v.F of a variable v in linear forms, the same one for every read
// of v.F in the package, or nil when e is not such a read. Within one
// expression every read of v.F has the same value.
func (c *checker) fieldVar(e *ast.SelectorExpr) *types.Var {
	base := c.objOf(e.X)
	sel, ok := c.pass.TypesInfo.Selections[e]
	if base == nil || !ok || sel.Kind() != types.FieldVal {
		return nil
	}
	field := sel.Obj()
	if _, ok := c.numOf(field.Type()); !ok {
		return nil
	}
	key := [2]types.Object{base, field}
	fv := passStateOf(c, fieldVarsKey)
	if v, ok := fv.vars[key]; ok {
		return v
	}
	if fv.vars == nil {
		fv.vars = make(map[[2]types.Object]*types.Var)
	}
	v := types.NewVar(base.Pos(), base.Pkg(), base.Name()+"."+field.Name(), field.Type())
	fv.vars[key] = v
	return v
}

// fieldVars holds the variables that stand for field reads v.F in the
// linear forms of float counts, one per v and F, for the pass.
type fieldVars struct {
	vars map[[2]types.Object]*types.Var
}

var fieldVarsKey = &stateKey[fieldVars]{"variables standing for field reads in float counts"}
