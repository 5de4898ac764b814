package ranges

import (
	"go/ast"
	"go/types"
)

// Options configures Analyze.
type Options struct {
	// Entry holds ranges known when the function starts: bound
	// annotations and, for unexported functions, the join of the
	// argument ranges at every call site in the package.
	Entry map[types.Object]Interval
	// MaxVisits caps how often one loop body is re-analysed before
	// widening to the loop-invariant bounds (default 3).
	MaxVisits int
	// NoWrap reads the extreme int64 bounds as unbounded instead of as
	// the values MinInt64 and MaxInt64, so that, say, n−1 after a guard
	// n <= 20 stays (-inf, 19] instead of becoming Top because n might be
	// MinInt64. Results are then sound only for executions where no
	// unbounded variable sits at the limits of its type.
	NoWrap bool
	// Tables holds package-level variables that hold a composite
	// literal nothing changes: the caller has checked that every use in
	// the package is a range expression or an argument of len or cap.
	// A range over one draws its values from the literal's constants.
	Tables map[types.Object]*ast.CompositeLit
}

// defaultVisits is the default for Options.MaxVisits.
const defaultVisits = 3

// maxDepth caps the recursion over nested statements and expressions;
// deeper code is treated as opaque.
const maxDepth = 1000

// Func holds the ranges computed for one function body.
type Func struct {
	info *types.Info
	root ast.Node
	body *ast.BlockStmt
	opts Options

	ids   map[types.Object]int32
	objs  []types.Object        // by id
	exprs map[ast.Expr]Interval // ranges at evaluation
	snaps map[ast.Node]*facts   // states before reached statements and calls
	// opaque marks statements beyond maxDepth: reached, but not walked.
	opaque map[ast.Node]bool
	lits   map[*ast.FuncLit]bool

	fields    map[fieldKey]*types.Var
	fieldBase map[types.Object]types.Object   // stand-in → variable
	fieldsOf  map[types.Object][]types.Object // variable → stand-ins

	escapes     map[types.Object][]escape
	rewritten   map[types.Object]bool // variables assigned after their definition
	hasGoto     bool
	gotoTargets map[string]bool
	assigned    map[ast.Node][]types.Object
	localTables map[types.Object]*ast.CompositeLit // locals declared with a literal
	tableUses   map[types.Object]*tableUses
	size        int // nodes in the function
	work        int // statements walked so far, for the budget
}

// Analyze computes ranges for fn, a *ast.FuncDecl or *ast.FuncLit,
// using info (Types, Defs, Uses, Selections filled in). It never panics
// on well-typed or partially typed code (nil types, missing info → Top).
func Analyze(info *types.Info, fn ast.Node, opts Options) *Func {
	if info == nil {
		info = &types.Info{}
	}
	if opts.MaxVisits <= 0 {
		opts.MaxVisits = defaultVisits
	}
	f := &Func{
		info:   info,
		root:   fn,
		opts:   opts,
		ids:    make(map[types.Object]int32),
		opaque: make(map[ast.Node]bool),
		lits:   make(map[*ast.FuncLit]bool),
	}
	var ftype *ast.FuncType
	switch fn := fn.(type) {
	case *ast.FuncDecl:
		f.body, ftype = fn.Body, fn.Type
	case *ast.FuncLit:
		f.body, ftype = fn.Body, fn.Type
		f.lits[fn] = true
	}
	if f.body == nil {
		return f
	}
	f.scan(f.body)
	// Made here, sized up front, and not before (nothing writes them
	// until the walk; a body-less function's stay nil, which reads as
	// empty): a long function's maps would otherwise be rehashed as they
	// grow, each time rereading every entry.
	f.exprs = make(map[ast.Expr]Interval, f.size/2)
	f.snaps = make(map[ast.Node]*facts, f.size/4)
	s := state{live: true}
	s = f.zeroResults(s, ftype)
	for obj, r := range opts.Entry {
		if !f.tracked(obj) {
			continue // package-level variables may change at any time
		}
		if r.IsEmpty() {
			s = dead
			break
		}
		s = f.put(s, obj, r)
	}
	w := &walker{f: f, rec: true}
	w.stmt(s, f.body)
	return f
}

// zeroResults starts named numeric results at zero.
func (f *Func) zeroResults(s state, ft *ast.FuncType) state {
	if ft == nil || ft.Results == nil {
		return s
	}
	for _, field := range ft.Results.List {
		for _, id := range field.Names {
			if obj := f.info.Defs[id]; obj != nil && f.tracked(obj) {
				s = f.put(s, obj, Point(0))
			}
		}
	}
	return s
}

// objOf returns the object id denotes, or nil.
func (f *Func) objOf(id *ast.Ident) types.Object {
	if obj := f.info.Defs[id]; obj != nil {
		return obj
	}
	return f.info.Uses[id]
}

// tracked reports whether obj is a local numeric variable, the only
// kind of object the walk keeps facts about.
func (f *Func) tracked(obj types.Object) bool {
	if _, ok := f.fieldBase[obj]; ok {
		return true
	}
	v, ok := obj.(*types.Var)
	if !ok || v.IsField() || v.Pkg() == nil || v.Parent() == nil || v.Parent() == v.Pkg().Scope() {
		return false
	}
	return kindOf(v.Type()).ok
}

func (f *Func) id(obj types.Object) int32 {
	if id, ok := f.ids[obj]; ok {
		return id
	}
	id := int32(len(f.ids))
	f.ids[obj] = id
	f.objs = append(f.objs, obj)
	return id
}

// fact returns the interval s holds for variable id.
func (f *Func) fact(s state, id int32) Interval {
	if r, ok := s.facts.get(id); ok {
		return r
	}
	return kindOf(f.objs[id].Type()).top
}

// assignVar is put for an assignment: facts relating obj to other
// variables no longer hold.
func (f *Func) assignVar(s state, obj types.Object, r Interval) state {
	if id, ok := f.ids[obj]; ok && s.live {
		s.rels = killRels(s.rels, id)
	}
	return f.put(s, obj, r)
}

// put sets obj to r in s, within the range of obj's type.
func (f *Func) put(s state, obj types.Object, r Interval) state {
	if !s.live || !f.tracked(obj) {
		return s
	}
	k := kindOf(obj.Type())
	r = r.Meet(k.top)
	switch {
	case r.IsEmpty():
		return dead
	case r == k.top:
		s.facts = s.facts.del(f.id(obj))
	default:
		s.facts = s.facts.set(f.id(obj), r)
	}
	return s
}

// get returns the range of obj in s as read at node at.
func (f *Func) get(s state, obj types.Object, at ast.Node) Interval {
	if !s.live {
		return Empty()
	}
	if obj == nil || !f.tracked(obj) {
		if obj != nil {
			return kindOf(obj.Type()).top
		}
		return Top()
	}
	k := kindOf(obj.Type())
	if f.escapedAt(obj, at) {
		return k.top
	}
	if id, ok := f.ids[obj]; ok {
		if r, ok := s.facts.get(id); ok {
			return r
		}
	}
	return k.top
}

// Of returns the range of the integer- or float-valued expression e
// where it is evaluated (e must be a node inside fn): Top when nothing
// is known (or e is not a numeric value), Empty when that point is
// unreachable. For floats the bounds are rounded outwards to integers.
// For a variable on the left of an assignment it is the value assigned.
func (f *Func) Of(e ast.Expr) Interval {
	if e == nil {
		return Top()
	}
	if r, ok := f.exprs[e]; ok {
		return r
	}
	if f.body == nil {
		return Top()
	}
	if _, reached := f.locate(e); !reached {
		return Empty()
	}
	tv, ok := f.info.Types[e]
	switch {
	case !ok || !tv.IsValue():
		return Top()
	case tv.Value != nil:
		return constRange(tv.Value)
	}
	return kindOf(tv.Type).top
}

// At returns the range of variable v at the program point just before
// node n executes (n inside fn).
func (f *Func) At(v types.Object, n ast.Node) Interval {
	if v == nil || n == nil {
		return Top()
	}
	if c, ok := v.(*types.Const); ok {
		return constRange(c.Val())
	}
	if f.body == nil {
		return Top()
	}
	snap, reached := f.locate(n)
	if !reached {
		return Empty()
	}
	if snap == nil {
		return f.get(state{live: true}, v, n)
	}
	return f.get(state{facts: *snap, live: true}, v, n)
}

// locate finds the state recorded innermost around n and whether n is
// reached. It descends from the root along the nodes that contain n, so
// it costs the depth of n times the fan-out, not the function size.
func (f *Func) locate(n ast.Node) (snap **facts, reached bool) {
	if s, ok := f.snaps[n]; ok {
		return &s, true
	}
	if n.Pos() < f.root.Pos() || n.End() > f.root.End() {
		return nil, true
	}
	var inner ast.Stmt
	opaque := false
	var found *facts
	haveSnap := false
	ast.Inspect(f.root, func(m ast.Node) bool {
		if m == nil || m.Pos() > n.Pos() || m.End() < n.End() {
			return false
		}
		if st, ok := m.(ast.Stmt); ok {
			inner = st
		}
		if s, ok := f.snaps[m]; ok {
			found, haveSnap = s, true
		}
		if f.opaque[m] {
			opaque = true
		}
		return m != n
	})
	switch {
	case inner == nil:
		// n is in the signature: the function entry.
		return nil, true
	case opaque:
		if _, ok := f.snaps[inner]; !ok {
			return nil, true
		}
	}
	if _, ok := f.snaps[inner]; !ok {
		return nil, false
	}
	if !haveSnap {
		return nil, true
	}
	return &found, true
}
