package ranges

import (
	"go/ast"
	"go/types"
)

// Table-driven code ranges over a literal of constants, and the values
// it draws bound what it computes:
//
//	for _, tc := range []struct{ n int }{{5}, {12}} { check(fact(tc.n)) }
//
// A table is a composite literal ranged over directly, or held by a
// variable that nothing can change: a local declared with the literal
// whose every use in the function is a range expression or an argument
// of len or cap, or a package-level variable the caller vouches for in
// Options.Tables. Each trip's value then lies in the join of the
// elements' constants; an element that is not a constant of its kind
// leaves the value unknown.

// tableUses counts, for a variable declared with a composite literal,
// its uses that leave the literal as it is (safe) and all its uses.
type tableUses struct{ safe, all int }

// tableDecls calls add for each name declared with a composite literal
// in names := values or var names = values.
func tableDecls(info *types.Info, names []ast.Expr, values []ast.Expr, add func(types.Object, *ast.CompositeLit)) {
	if len(names) != len(values) {
		return
	}
	for i, n := range names {
		id, ok := n.(*ast.Ident)
		lit, isLit := ast.Unparen(values[i]).(*ast.CompositeLit)
		if !ok || !isLit {
			continue
		}
		if obj := info.Defs[id]; obj != nil {
			add(obj, lit)
		}
	}
}

// specNames returns the names a var spec declares, as expressions like
// the left side of a := declaration.
func specNames(vs *ast.ValueSpec) []ast.Expr {
	names := make([]ast.Expr, len(vs.Names))
	for i, id := range vs.Names {
		names[i] = id
	}
	return names
}

// noteTableDecl records the locals a declaration gives a literal.
func (f *Func) noteTableDecl(names []ast.Expr, values []ast.Expr) {
	tableDecls(f.info, names, values, func(obj types.Object, lit *ast.CompositeLit) {
		if f.localTables == nil {
			f.localTables = make(map[types.Object]*ast.CompositeLit)
			f.tableUses = make(map[types.Object]*tableUses)
		}
		f.localTables[obj] = lit
		f.tableUses[obj] = &tableUses{}
	})
}

// noteTableUses counts the uses n makes of candidate tables: every
// identifier is a use, and the X of a range statement or the argument
// of len or cap is a safe one besides.
func noteTableUses(info *types.Info, n ast.Node, uses map[types.Object]*tableUses) {
	if id, ok := n.(*ast.Ident); ok {
		if u := uses[info.Uses[id]]; u != nil {
			u.all++
		}
		return
	}
	if id := tableSafeIdent(info, n); id != nil {
		if u := uses[info.Uses[id]]; u != nil {
			u.safe++
		}
	}
}

// tableSafeIdent returns the identifier n uses as a table in a safe way,
// if any: the X of a range statement, or the argument of len or cap.
func tableSafeIdent(info *types.Info, n ast.Node) *ast.Ident {
	switch n := n.(type) {
	case *ast.RangeStmt:
		id, _ := ast.Unparen(n.X).(*ast.Ident)
		return id
	case *ast.CallExpr:
		fn, ok := ast.Unparen(n.Fun).(*ast.Ident)
		if !ok || len(n.Args) != 1 {
			return nil
		}
		if b, ok := info.Uses[fn].(*types.Builtin); !ok || b.Name() != "len" && b.Name() != "cap" {
			return nil
		}
		id, _ := ast.Unparen(n.Args[0]).(*ast.Ident)
		return id
	}
	return nil
}

// PackageTables returns the unexported package-level variables of files
// that are declared with a composite literal and that every use leaves
// as it is (a range over it, len or cap): the tables Options.Tables
// takes. An exported variable is never one, since importers may change
// it.
func PackageTables(info *types.Info, files []*ast.File) map[types.Object]*ast.CompositeLit {
	lits := make(map[types.Object]*ast.CompositeLit)
	uses := make(map[types.Object]*tableUses)
	for _, f := range files {
		for _, d := range f.Decls {
			gd, ok := d.(*ast.GenDecl)
			if !ok {
				continue
			}
			for _, spec := range gd.Specs {
				vs, ok := spec.(*ast.ValueSpec)
				if !ok {
					continue
				}
				tableDecls(info, specNames(vs), vs.Values, func(obj types.Object, lit *ast.CompositeLit) {
					if _, isVar := obj.(*types.Var); isVar && !obj.Exported() {
						lits[obj], uses[obj] = lit, &tableUses{}
					}
				})
			}
		}
	}
	if len(lits) == 0 {
		return nil
	}
	for _, f := range files {
		ast.Inspect(f, func(n ast.Node) bool {
			noteTableUses(info, n, uses)
			return true
		})
	}
	for obj, u := range uses {
		if u.safe != u.all {
			delete(lits, obj)
		}
	}
	return lits
}

// tableOf returns the literal x ranges over when x is a table.
func (f *Func) tableOf(x ast.Expr) *ast.CompositeLit {
	switch x := ast.Unparen(x).(type) {
	case *ast.CompositeLit:
		return x
	case *ast.Ident:
		obj := f.info.Uses[x]
		if lit, ok := f.opts.Tables[obj]; ok {
			return lit
		}
		// Every use of the variable is counted once as a plain use; the
		// safe ones once more. A table's counts agree.
		if u := f.tableUses[obj]; u != nil && u.safe == u.all {
			return f.localTables[obj]
		}
	}
	return nil
}

// tableElems returns the element expressions of a slice, array or map
// literal, and whether some element is left at its zero value (indexed
// elements, or an array longer than its list).
func tableElems(lit *ast.CompositeLit, t types.Type) ([]ast.Expr, bool) {
	zero := false
	if a, ok := t.Underlying().(*types.Array); ok && a.Len() > int64(len(lit.Elts)) {
		zero = true
	}
	_, isMap := t.Underlying().(*types.Map)
	elems := make([]ast.Expr, 0, len(lit.Elts))
	for _, e := range lit.Elts {
		if kv, ok := e.(*ast.KeyValueExpr); ok {
			// An index key may skip elements; a map has only its entries.
			zero = zero || !isMap
			e = kv.Value
		}
		elems = append(elems, e)
	}
	return elems, zero
}

// tableKey returns the range of the key over a slice table: its length
// is known when no element is keyed. An array's length is its type's,
// which rangeKey already gives ([4]int{1, 2} runs four trips), and a
// map's keys are not indices.
func (f *Func) tableKey(lit *ast.CompositeLit) (Interval, bool) {
	if tv, ok := f.info.Types[lit]; !ok || tv.Type == nil {
		return Interval{}, false
	} else if _, isSlice := tv.Type.Underlying().(*types.Slice); !isSlice {
		return Interval{}, false
	}
	for _, e := range lit.Elts {
		if _, ok := e.(*ast.KeyValueExpr); ok {
			return Interval{}, false
		}
	}
	if len(lit.Elts) == 0 {
		return Empty(), true
	}
	return Span(0, int64(len(lit.Elts))-1), true
}

// constOf returns the range of a constant expression, or Top.
func (f *Func) constOf(e ast.Expr) Interval {
	if tv, ok := f.info.Types[e]; ok && tv.Value != nil {
		return constRange(tv.Value)
	}
	return Top()
}

// tableValue stores into the value variable v of a range over lit what
// the table's elements say: its range when it is a number, the ranges
// of its numeric fields when it is a struct.
func (w *walker) tableValue(s state, v ast.Expr, lit *ast.CompositeLit) state {
	f := w.f
	tv, ok := f.info.Types[lit]
	if !ok || tv.Type == nil {
		return s
	}
	elems, zero := tableElems(lit, tv.Type)
	id, ok := ast.Unparen(v).(*ast.Ident)
	if !ok {
		return s
	}
	obj := f.objOf(id)
	if obj == nil {
		return s
	}
	if f.tracked(obj) {
		r := Empty()
		if zero {
			r = Point(0)
		}
		for _, e := range elems {
			r = r.Join(f.constOf(e))
		}
		s = f.assignVar(s, obj, r)
		if w.rec && s.live {
			f.exprs[id] = r.Meet(kindOf(obj.Type()).top)
		}
		return s
	}
	st, ok := obj.Type().Underlying().(*types.Struct)
	if !ok || !f.structVar(obj) || len(elems) == 0 {
		return s
	}
	joined := make([]Interval, st.NumFields())
	for i := range joined {
		joined[i] = Empty()
		if zero {
			joined[i] = Point(0)
		}
	}
	for _, e := range elems {
		lit, ok := ast.Unparen(e).(*ast.CompositeLit)
		if !ok {
			return s // the fields stay unknown, as store left them
		}
		vals, ok := literalFields(st, lit, f.constOf)
		if !ok {
			return s
		}
		for i := range joined {
			joined[i] = joined[i].Join(vals[i])
		}
	}
	for i := range joined {
		if fv := st.Field(i); kindOf(fv.Type()).ok {
			s = f.assignVar(s, f.standIn(obj, fv), joined[i])
		}
	}
	return s
}
