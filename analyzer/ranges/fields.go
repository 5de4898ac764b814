package ranges

import (
	"go/ast"
	"go/types"
)

// Direct numeric fields of local struct variables (not pointers), such
// as c.Batch for a parameter c of type Config, are tracked like
// variables. Each (variable, field) pair gets a stand-in *types.Var as
// its key. Assigning the whole variable forgets its fields, and an
// escape of the variable is an escape of its fields.

type fieldKey struct {
	base  types.Object
	field *types.Var
}

// fieldOf returns the stand-in for sel if it selects a direct numeric
// field of a local struct variable.
func (f *Func) fieldOf(sel *ast.SelectorExpr) (types.Object, bool) {
	id, ok := ast.Unparen(sel.X).(*ast.Ident)
	if !ok {
		return nil, false
	}
	base := f.objOf(id)
	if base == nil || !f.structVar(base) {
		return nil, false
	}
	s, ok := f.info.Selections[sel]
	if !ok || s.Kind() != types.FieldVal || len(s.Index()) != 1 {
		return nil, false
	}
	fv, ok := s.Obj().(*types.Var)
	if !ok || !kindOf(fv.Type()).ok {
		return nil, false
	}
	key := fieldKey{base, fv}
	if v, ok := f.fields[key]; ok {
		return v, true
	}
	// The stand-in takes the variable's position: loops judge by it
	// whether a value lives across trips.
	v := types.NewVar(base.Pos(), base.Pkg(), base.Name()+"."+fv.Name(), fv.Type())
	if f.fields == nil {
		f.fields = make(map[fieldKey]*types.Var)
		f.fieldBase = make(map[types.Object]types.Object)
		f.fieldsOf = make(map[types.Object][]types.Object)
	}
	f.fields[key] = v
	f.fieldBase[v] = base
	f.fieldsOf[base] = append(f.fieldsOf[base], v)
	return v, true
}

// structVar reports whether obj is a local variable of struct type.
func (f *Func) structVar(obj types.Object) bool {
	v, ok := obj.(*types.Var)
	if !ok || v.IsField() || v.Pkg() == nil || v.Parent() == nil || v.Parent() == v.Pkg().Scope() {
		return false
	}
	_, ok = v.Type().Underlying().(*types.Struct)
	return ok
}

// forgetFields drops what is known about the fields of base, which is
// being assigned as a whole.
func (f *Func) forgetFields(s state, base types.Object) state {
	for _, v := range f.fieldsOf[base] {
		s = f.assignVar(s, v, Top())
	}
	return s
}

// forget makes obj unknown: a variable, a stand-in, or every field of
// a struct variable.
func (f *Func) forget(s state, obj types.Object) state {
	if f.structVar(obj) {
		return f.forgetFields(s, obj)
	}
	return f.assignVar(s, obj, Top())
}

// rootIdent returns the variable at the root of a selector chain x.a.b.
func rootIdent(e ast.Expr) (*ast.Ident, bool) {
	for {
		switch x := ast.Unparen(e).(type) {
		case *ast.Ident:
			return x, true
		case *ast.SelectorExpr:
			e = x.X
		default:
			return nil, false
		}
	}
}
