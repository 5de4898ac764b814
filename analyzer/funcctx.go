package analyzer

import (
	"go/ast"
	"go/types"
	"maps"
	"math"

	"github.com/overfact/overfact/analyzer/ranges"
)

// The function context: one function under analysis, with its lazily
// run range analysis and the bound annotations that narrow it.

// fnCtx is one function under analysis. Its range analysis runs lazily,
// on the first question about a range, so functions without a candidate
// cost only the syntactic scan.
//
// What every check asks about the function lives in three named parts:
// questions to the type checker, range queries and definitions. What one category or pass
// gathers for itself is not a field here: the owner declares a
// stateKey beside its detector and gets its state with stateOf.
type fnCtx struct {
	c    *checker
	node ast.Node // *ast.FuncDecl or *ast.FuncLit
	file *fileInfo
	typeQueries
	rangeQueries
	definitions
	owned states // what categories keep about the function (stateOf)
}

// rangeQueries is the part of a function context that answers range
// questions about node (rangeOf, entryRange): the ranges of the
// parameters at entry, the range analysis run on the first question,
// and the statement-level bound annotations that narrow it.
type rangeQueries struct {
	q       typeQueries
	node    ast.Node
	tables  func() map[types.Object]*ast.CompositeLit // the package's tables (packageTables)
	entry   map[types.Object]ranges.Interval
	rng     *ranges.Func
	assumes []stmtAssume
	ran     *ranAnalyses // the pass's range analyses, shared by contexts of one function
}

// ranAnalyses holds the range analyses run in a pass, by function, each
// with the entry ranges it ran from. A function is analysed with its own
// annotations to find its facts (ownCtx, callSiteRange) and with the
// ranges its call sites give it to judge it (ctx); where those entries
// are equal, as for every exported function, the analysis is the same
// (ranges.Analyze depends on nothing else that differs between them: the
// type information, the package's tables and maxVisits are the pass's)
// and runs once.
type ranAnalyses struct {
	byNode map[ast.Node][]ranAnalysis
}

type ranAnalysis struct {
	entry map[types.Object]ranges.Interval // a copy, which no context changes
	rng   *ranges.Func
}

var ranAnalysesKey = &stateKey[ranAnalyses]{"range analyses"}

// find returns the analysis of n from entry, if one ran.
func (ra *ranAnalyses) find(n ast.Node, entry map[types.Object]ranges.Interval) *ranges.Func {
	for _, a := range ra.byNode[n] {
		if maps.Equal(a.entry, entry) {
			return a.rng
		}
	}
	return nil
}

// forgetRanges drops the range analyses of n once n is judged: those
// kept for a later context of it, and the one of the context it was
// judged in, which the pass keeps (fnInfo) for the rest of the run. A
// question after that analyses afresh, from the same entry ranges, so
// that no analysis outlives the pass's use of it: on a file of many small
// functions they held a fifth of the live heap, and none was asked again.
func (c *checker) forgetRanges(n ast.Node) {
	delete(passStateOf(c, ranAnalysesKey).byNode, n)
	if fc := c.fnInfo[n]; fc != nil {
		fc.rng = nil
	}
}

func (ra *ranAnalyses) add(n ast.Node, entry map[types.Object]ranges.Interval, rng *ranges.Func) {
	if ra.byNode == nil {
		ra.byNode = make(map[ast.Node][]ranAnalysis)
	}
	ra.byNode[n] = append(ra.byNode[n], ranAnalysis{entry, rng})
}

// definitions is the part of a function context that knows every value
// each local variable of node is given (collectDefs and singleDef,
// products.go), gathered on first use (defsOf).
type definitions struct {
	q    typeQueries
	node ast.Node
	defs map[types.Object][]ast.Expr
}

// defsOf returns the values v is given in the function, a nil value
// standing for a change the analyzer does not follow.
func (d *definitions) defsOf(v types.Object) []ast.Expr {
	if d.defs == nil {
		d.collectDefs()
	}
	return d.defs[v]
}

// A stateKey names what one category keeps about a function or a pass (a
// cache of its own, what it noted for a later check). The owner declares
// the key beside its detector; the state is made on first use and dies
// with the function context (stateOf) or the pass (passStateOf).
type stateKey[T any] struct{ name string }

// states holds the owners' states, by their stateKey.
type states struct{ m map[any]any }

func stateIn[T any](s *states, k *stateKey[T]) *T {
	if v, ok := s.m[k]; ok {
		return v.(*T)
	}
	v := new(T)
	if s.m == nil {
		s.m = make(map[any]any)
	}
	s.m[k] = v
	return v
}

// stateOf returns the owner's state for the function, made zero on
// first use.
func stateOf[T any](fc *fnCtx, k *stateKey[T]) *T { return stateIn(&fc.owned, k) }

// passStateOf returns the owner's state for the pass, made zero on
// first use.
func passStateOf[T any](c *checker, k *stateKey[T]) *T { return stateIn(&c.owned, k) }

// peekState returns the owner's state for the function, or nil when the
// owner has not made it.
func peekState[T any](fc *fnCtx, k *stateKey[T]) *T {
	v, _ := fc.owned.m[k].(*T)
	return v
}

// maxVisits bounds the range analysis of one function; past it the
// ranges package widens, which only makes findings "possible". It is the
// ranges default: with it every finding on the test scenarios and on
// gonum v0.17.0 with its tests is the same as with 20000 trips (the
// scenario tests pass at both; 29 findings on gonum at both, counting
// test variants apart), while 20000 trips cost 8x as much per node on
// standard library code (3,851 vs 469 ns/node, measured with
// go test ./analyzer/ranges -run XXX -bench BenchmarkStdlib/analyze).
const maxVisits = 3

// ctx returns the context of function n, made once per pass: its entry
// ranges are those its call sites give it.
func (c *checker) ctx(n ast.Node) *fnCtx {
	if fc, ok := c.fnInfo[n]; ok {
		return fc
	}
	fc := c.newCtx(n, c.entryOf(n))
	fc.liftAssumes()
	c.fnInfo[n] = fc
	return fc
}

// newCtx makes a context for function n with the given entry ranges and
// the statement-level bound annotations of its file.
func (c *checker) newCtx(n ast.Node, entry map[types.Object]ranges.Interval) *fnCtx {
	q := c.queries()
	fc := &fnCtx{c: c, node: n, file: c.fileOf(n.Pos()), typeQueries: q,
		rangeQueries: rangeQueries{q: q, node: n, tables: c.packageTables, entry: entry, ran: passStateOf(c, ranAnalysesKey)},
		definitions:  definitions{q: q, node: n}}
	if fc.file != nil {
		fc.assumes = fc.file.dirs.stmtAssumesIn(n)
	}
	return fc
}

// ranges returns the range analysis of the function, running it once.
func (r *rangeQueries) ranges() *ranges.Func {
	if r.rng == nil {
		if r.rng = r.ran.find(r.node, r.entry); r.rng == nil {
			entry := maps.Clone(r.entry)
			opts := ranges.Options{Entry: entry, MaxVisits: maxVisits, Tables: r.tables()}
			r.rng = ranges.Analyze(r.q.info, r.node, opts)
			r.ran.add(r.node, entry, r.rng)
		}
	}
	return r.rng
}

// packageTables returns the package's unexported table variables that
// nothing changes, so that table-driven code, for _, tc := range cases
// { fact(tc.n) }, is judged by the values its table holds.
func (c *checker) packageTables() map[types.Object]*ast.CompositeLit {
	if !c.tablesDone {
		c.tables, c.tablesDone = ranges.PackageTables(c.pass.TypesInfo, c.pass.Files), true
	}
	return c.tables
}

// rangeOf returns the range of the integer expression e where it is
// evaluated, narrowed by statement-level bound annotations over it.
func (r *rangeQueries) rangeOf(e ast.Expr) ranges.Interval {
	e = ast.Unparen(e)
	if v, ok := r.q.intConst(e); ok {
		return ranges.Point(v)
	}
	iv := r.ranges().Of(e)
	if lin, ok := r.q.linear(e); ok && len(lin.Terms) == 1 && lin.Terms[0].K == 1 {
		for _, a := range r.assumes {
			if a.obj == lin.Terms[0].Sym.Object && a.from <= e.Pos() && e.End() <= a.to {
				iv = iv.Meet(shift(a.iv, lin.C))
			}
		}
	}
	return iv
}

// guardedRange is rangeOf read through the guards on the variables of
// a linear e (see affineRange).
func (r *rangeQueries) guardedRange(e ast.Expr) ranges.Interval {
	iv := r.rangeOf(e)
	lin, ok := r.q.linear(ast.Unparen(e))
	if ok && len(lin.Terms) > 0 && (typeLimit(iv.Hi) || lowLimit(iv.Lo)) && noConversion(e) {
		iv = iv.Meet(r.affineRange(lin, e))
	}
	return iv
}

// noConversion reports whether e converts nothing: a conversion such as
// uint64(i) changes the value where i is negative, which the linear
// form, reading through it, does not see.
func noConversion(e ast.Expr) bool {
	none := true
	ast.Inspect(e, func(n ast.Node) bool {
		if _, call := n.(*ast.CallExpr); call {
			none = false
		}
		return none
	})
	return none
}

// affineRange returns the range of the linear form lin, evaluated at e,
// from the ranges of its variables there: the guards on m bound 2*m+1
// and m+k through m's and k's own ranges. The range analysis alone
// gives such a sum the whole type whenever a variable is unbounded on
// one side (m ≤ 10 leaves m free to sit at MinInt64, where 2*m wraps);
// here an unbounded end stays unbounded and the bounded end carries
// through, as ranges.Options.NoWrap reads it: the range is then sound
// for every execution in which no unbounded variable lies near the
// limits of its type, the trade every guard n ≤ 20 in front of n−1
// makes.
func (r *rangeQueries) affineRange(lin linear, e ast.Expr) ranges.Interval {
	out := ranges.Point(lin.C)
	for _, t := range lin.Terms {
		v := r.entryRange(t.Sym.Object, e)
		if v.IsEmpty() || t.K == 0 {
			return ranges.Top()
		}
		lo, hi := v.Lo, v.Hi
		if lowLimit(lo) {
			lo = math.MinInt64
		}
		if typeLimit(hi) {
			hi = math.MaxInt64
		}
		term := ranges.Span(lo, hi).Mul(ranges.Point(t.K))
		if term.Lo == math.MaxInt64 || term.Hi == math.MinInt64 {
			return ranges.Top()
		}
		out = out.Add(term)
	}
	return out
}

// entryRange returns the range of variable v at node n.
func (r *rangeQueries) entryRange(v types.Object, n ast.Node) ranges.Interval {
	iv := r.ranges().At(v, n)
	for _, a := range r.assumes {
		if a.obj == v && a.from <= n.Pos() && n.End() <= a.to {
			iv = iv.Meet(a.iv)
		}
	}
	return iv
}

// liftAssumes turns a statement-level bound on a parameter that the
// function never assigns into an entry range: the parameter has the same
// value everywhere, so the bound holds at entry when it holds at the
// statement, and the range analysis then carries it into every
// expression derived from it.
func (fc *fnCtx) liftAssumes() {
	if len(fc.assumes) == 0 {
		return
	}
	sig := fc.signature()
	if sig == nil {
		return
	}
	for _, a := range fc.assumes {
		if len(fc.defsOf(a.obj)) > 0 || !isParam(sig, a.obj) {
			continue
		}
		iv := a.iv
		if old, ok := fc.entry[a.obj]; ok {
			iv = iv.Meet(old)
		}
		fc.entry[a.obj] = iv
	}
}

func (fc *fnCtx) signature() *types.Signature {
	var t types.Type
	switch n := fc.node.(type) {
	case *ast.FuncDecl:
		if obj := fc.c.pass.TypesInfo.Defs[n.Name]; obj != nil {
			t = obj.Type()
		}
	case *ast.FuncLit:
		t = fc.c.pass.TypesInfo.TypeOf(n)
	}
	sig, _ := t.(*types.Signature)
	return sig
}

func isParam(sig *types.Signature, v types.Object) bool {
	for i := 0; i < sig.Params().Len(); i++ {
		if sig.Params().At(i) == v {
			return true
		}
	}
	return false
}
