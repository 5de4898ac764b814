package analyzer

import (
	"go/ast"
	"go/token"
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
	return fc.linearCountDepth(e, 0)
}

func (fc *fnCtx) linearCountDepth(e ast.Expr, depth int) (linear, bool) {
	if depth > maxDepth {
		return linear{}, false
	}
	e = ast.Unparen(e)
	if v, ok := fc.intConst(e); ok {
		return linear{C: v}, true
	}
	switch e := e.(type) {
	case *ast.Ident:
		if obj := fc.c.objOf(e); obj != nil {
			if _, ok := fc.c.numOf(obj.Type()); ok {
				return single(obj), true
			}
		}
	case *ast.SelectorExpr:
		// x.Number of a local formula value: a count read from a field.
		if v := fc.c.fieldVar(e); v != nil {
			return single(v), true
		}
	case *ast.UnaryExpr:
		if e.Op == token.SUB {
			x, ok := fc.linearCountDepth(e.X, depth+1)
			return x.scale(-1), ok
		}
	case *ast.BinaryExpr:
		x, okx := fc.linearCountDepth(e.X, depth+1)
		y, oky := fc.linearCountDepth(e.Y, depth+1)
		if !okx || !oky {
			return linear{}, false
		}
		switch e.Op {
		case token.ADD:
			return x.add(y), true
		case token.SUB:
			return x.add(y.scale(-1)), true
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
