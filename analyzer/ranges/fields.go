package ranges

import (
	"go/ast"
	"go/token"
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
	return f.standIn(base, fv), true
}

// standIn returns the key object for field fv of variable base.
func (f *Func) standIn(base types.Object, fv *types.Var) types.Object {
	key := fieldKey{base, fv}
	if v, ok := f.fields[key]; ok {
		return v
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
	return v
}

// initFields sets the numeric fields of struct variable base from a
// composite literal of its type, or to zero when lit is nil (a var
// declaration without value). Fields the literal leaves out are zero.
func (w *walker) initFields(s state, base types.Object, lit *ast.CompositeLit) state {
	st, ok := base.Type().Underlying().(*types.Struct)
	if !ok {
		return s
	}
	vals := zeroFields(st)
	if lit != nil {
		vals, ok = literalFields(st, lit, func(e ast.Expr) Interval { return w.quiet(s, e) })
		if !ok {
			return s
		}
	}
	for i := range vals {
		fv := st.Field(i)
		if kindOf(fv.Type()).ok {
			s = w.f.assignVar(s, w.f.standIn(base, fv), vals[i])
		}
	}
	return s
}

func zeroFields(st *types.Struct) []Interval {
	vals := make([]Interval, st.NumFields())
	for i := range vals {
		vals[i] = Point(0)
	}
	return vals
}

// literalFields returns the ranges of the fields of struct literal lit,
// each given by eval, and zero for the fields it leaves out.
func literalFields(st *types.Struct, lit *ast.CompositeLit, eval func(ast.Expr) Interval) ([]Interval, bool) {
	vals := zeroFields(st)
	for i, el := range lit.Elts {
		if kv, ok := el.(*ast.KeyValueExpr); ok {
			id, ok := kv.Key.(*ast.Ident)
			if !ok {
				return nil, false
			}
			j := fieldIndex(st, id.Name)
			if j < 0 {
				return nil, false
			}
			vals[j] = eval(kv.Value)
		} else if i < len(vals) {
			vals[i] = eval(el)
		}
	}
	return vals, true
}

func fieldIndex(st *types.Struct, name string) int {
	for i := 0; i < st.NumFields(); i++ {
		if st.Field(i).Name() == name {
			return i
		}
	}
	return -1
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

// RootIdent returns the variable at the root of a selector chain x.a.b.
func RootIdent(e ast.Expr) (*ast.Ident, bool) {
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

// lenField keys the stand-in of len(x) among the stand-ins of x.
var lenField = types.NewVar(token.NoPos, nil, "len", types.Typ[types.Int])

// lenOf returns the stand-in for len(x) of a local slice variable x (a
// parameter included) that the function never assigns after its
// definition: x then has one length wherever it is in scope, and a
// guard on len(x) bounds every later read of it. An escape of x (its
// address taken, a closure assigning it) is an escape of its length.
func (f *Func) lenOf(call *ast.CallExpr) (types.Object, bool) {
	id, ok := ast.Unparen(call.Fun).(*ast.Ident)
	if !ok || len(call.Args) != 1 {
		return nil, false
	}
	if b, ok := f.info.Uses[id].(*types.Builtin); !ok || b.Name() != "len" {
		return nil, false
	}
	x, ok := ast.Unparen(call.Args[0]).(*ast.Ident)
	if !ok {
		return nil, false
	}
	v, ok := f.objOf(x).(*types.Var)
	if !ok || v.IsField() || v.Pkg() == nil || v.Parent() == nil || v.Parent() == v.Pkg().Scope() || f.rewritten[v] {
		return nil, false
	}
	if _, ok := v.Type().Underlying().(*types.Slice); !ok {
		return nil, false
	}
	return f.standIn(v, lenField), true
}

// FieldAt returns the range of field fv of the local struct variable
// base (a parameter or receiver of struct type included) just before
// node n executes: guards on base.fv before n narrow it as they narrow
// a variable. It is Top where the function never reads the field as a
// tracked one (a pointer's field, an embedded one).
func (f *Func) FieldAt(base types.Object, fv *types.Var, n ast.Node) Interval {
	v, ok := f.fields[fieldKey{base, fv}]
	if !ok {
		return Top()
	}
	return f.At(v, n)
}
