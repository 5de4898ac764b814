package ranges

import (
	"go/ast"
	"go/token"
	"go/types"

	"github.com/overfact/overfact/internal/tokenop"
)

func (w *walker) assign(s state, st *ast.AssignStmt) state {
	switch st.Tok {
	case token.ASSIGN, token.DEFINE:
	default:
		if len(st.Lhs) != 1 || len(st.Rhs) != 1 {
			return s
		}
		return w.update(s, st.Lhs[0], tokenop.OfAssign(st.Tok), w.eval(s, st.Rhs[0]))
	}
	// Go evaluates every operand before assigning any.
	vals := make([]Interval, len(st.Lhs))
	if len(st.Lhs) == len(st.Rhs) {
		for i, r := range st.Rhs {
			vals[i] = w.eval(s, r)
		}
	} else {
		for _, r := range st.Rhs {
			w.eval(s, r)
		}
		for i := range vals {
			vals[i] = Top()
		}
	}
	for _, l := range st.Lhs {
		w.operands(s, l)
	}
	for i, l := range st.Lhs {
		s = w.store(s, l, vals[i])
		if len(st.Lhs) == len(st.Rhs) {
			s = w.structInit(s, l, st.Rhs[i], true)
		}
	}
	return s
}

// structInit sets the fields of a struct variable l assigned the
// composite literal r, or declared without a value (r nil, zero).
func (w *walker) structInit(s state, l, r ast.Expr, needLit bool) state {
	id, ok := ast.Unparen(l).(*ast.Ident)
	if !ok || !s.live {
		return s
	}
	obj := w.f.objOf(id)
	if obj == nil || !w.f.structVar(obj) {
		return s
	}
	lit, _ := ast.Unparen(r).(*ast.CompositeLit)
	if needLit && lit == nil {
		return s
	}
	return w.initFields(s, obj, lit)
}

// operands evaluates the parts of an assignment target that are read
// (indexes, pointers), but not a plain variable or tracked field, which
// is written.
func (w *walker) operands(s state, l ast.Expr) {
	switch x := ast.Unparen(l).(type) {
	case *ast.Ident:
		return
	case *ast.SelectorExpr:
		if _, ok := w.f.fieldOf(x); ok {
			return
		}
	}
	w.eval(s, l)
}

// store assigns r to the target l.
func (w *walker) store(s state, l ast.Expr, r Interval) state {
	var obj types.Object
	switch x := ast.Unparen(l).(type) {
	case *ast.Ident:
		if x.Name == "_" {
			return s
		}
		obj = w.f.objOf(x)
	case *ast.SelectorExpr:
		obj, _ = w.f.fieldOf(x)
	}
	if obj == nil {
		return s
	}
	if w.f.structVar(obj) {
		return w.f.forgetFields(s, obj)
	}
	if !w.f.tracked(obj) {
		return s
	}
	s = w.f.assignVar(s, obj, r)
	if w.rec && s.live {
		w.f.exprs[ast.Unparen(l)] = r.Meet(kindOf(obj.Type()).top)
	}
	return s
}

// update applies x op= r, also used for x++ and x--.
func (w *walker) update(s state, l ast.Expr, op token.Token, r Interval) state {
	l = ast.Unparen(l)
	cur := w.eval(s, l)
	switch x := l.(type) {
	case *ast.Ident:
	case *ast.SelectorExpr:
		if _, ok := w.f.fieldOf(x); !ok {
			return s
		}
	default:
		return s
	}
	k := w.kind(l)
	if !k.ok {
		return s
	}
	return w.store(s, l, arith(op, cur, r, k, w.f.opts.NoWrap))
}

func (w *walker) decl(s state, st *ast.DeclStmt) state {
	gd, ok := st.Decl.(*ast.GenDecl)
	if !ok || gd.Tok != token.VAR {
		return s
	}
	for _, spec := range gd.Specs {
		vs, ok := spec.(*ast.ValueSpec)
		if !ok {
			continue
		}
		vals := make([]Interval, len(vs.Names))
		switch {
		case len(vs.Values) == 0:
			for i := range vals {
				vals[i] = Point(0) // the zero value
			}
		case len(vs.Values) == len(vs.Names):
			for i, v := range vs.Values {
				vals[i] = w.eval(s, v)
			}
		default:
			for _, v := range vs.Values {
				w.eval(s, v)
			}
			for i := range vals {
				vals[i] = Top()
			}
		}
		for i, id := range vs.Names {
			s = w.store(s, id, vals[i])
			switch {
			case len(vs.Values) == 0:
				s = w.structInit(s, id, nil, false)
			case len(vs.Values) == len(vs.Names):
				s = w.structInit(s, id, vs.Values[i], true)
			}
		}
	}
	return s
}
