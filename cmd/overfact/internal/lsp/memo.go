package lsp

import (
	"go/types"
	"reflect"
	"sync"

	"golang.org/x/tools/go/analysis"
)

// factMemo remembers, for the dependencies of one cached package, what each
// fact-producing analyzer exported and returned on them. The dependencies
// of a cached package are the same *packages.Package values on every
// re-check, and an analyzer's facts about a package depend only on that
// package and the facts of its own dependencies, so a re-check can replay
// them instead of running the analyzer over the whole import graph again;
// only the edited package is analysed for real.
type factMemo struct {
	mu     sync.Mutex
	m      map[memoKey]*depOutcome
	replay int // outcomes replayed, for tests
}

type memoKey struct {
	a   *analysis.Analyzer
	pkg *types.Package
}

// depOutcome is what one analyzer produced on one dependency.
type depOutcome struct {
	objs   []analysis.ObjectFact
	pkgs   []analysis.PackageFact
	result any
}

func newFactMemo() *factMemo {
	return &factMemo{m: make(map[memoKey]*depOutcome)}
}

func (fm *factMemo) get(k memoKey) *depOutcome {
	fm.mu.Lock()
	defer fm.mu.Unlock()
	o := fm.m[k]
	if o != nil {
		fm.replay++
	}
	return o
}

func (fm *factMemo) replayed() int {
	fm.mu.Lock()
	defer fm.mu.Unlock()
	return fm.replay
}

func (fm *factMemo) put(k memoKey, o *depOutcome) {
	fm.mu.Lock()
	defer fm.mu.Unlock()
	fm.m[k] = o
}

func (fm *factMemo) has(k memoKey) bool {
	fm.mu.Lock()
	defer fm.mu.Unlock()
	return fm.m[k] != nil
}

// wrap returns analyzers that behave as as do, except that on a package
// other than root an analyzer with facts replays its memoized outcome, or
// runs and memoizes it. Analyzers without facts never run on dependencies
// and are returned unchanged, as is an analyzer another one requires, since
// its copy and the original would then both declare its fact types.
//
// The requirements of a wrapped analyzer (inspect and the like) are wrapped
// too, when none of them has facts, so that they also skip a dependency
// whose outcome will be replayed: they would otherwise run on every
// dependency for nothing, and they are most of the cost of a re-check.
func (fm *factMemo) wrap(as []*analysis.Analyzer, root *types.Package) []*analysis.Analyzer {
	required := make(map[*analysis.Analyzer]bool)
	var mark func(a *analysis.Analyzer)
	mark = func(a *analysis.Analyzer) {
		for _, r := range a.Requires {
			required[r] = true
			mark(r)
		}
	}
	for _, a := range as {
		mark(a)
	}
	out := make([]*analysis.Analyzer, len(as))
	for i, a := range as {
		if len(a.FactTypes) == 0 || required[a] {
			out[i] = a
			continue
		}
		w := *a // same name, flags, fact and result types
		orig := make(map[*analysis.Analyzer]*analysis.Analyzer)
		if reqs, ok := fm.skippable(a, a.Requires, root, orig, make(map[*analysis.Analyzer]*analysis.Analyzer)); ok {
			w.Requires = reqs
		} else {
			clear(orig)
		}
		w.Run = fm.run(a, root, orig)
		out[i] = &w
	}
	return out
}

// skippable returns copies of reqs, the requirements of owner, that return
// a zero result on a dependency whose outcome for owner is memoized and
// otherwise run as the originals do; orig maps each copy to its original.
// It fails if a requirement has facts, since it must then run everywhere.
func (fm *factMemo) skippable(owner *analysis.Analyzer, reqs []*analysis.Analyzer, root *types.Package, orig, copies map[*analysis.Analyzer]*analysis.Analyzer) ([]*analysis.Analyzer, bool) {
	out := make([]*analysis.Analyzer, 0, len(reqs))
	for _, r := range reqs {
		if c, ok := copies[r]; ok {
			out = append(out, c)
			continue
		}
		if len(r.FactTypes) > 0 {
			return nil, false
		}
		sub, ok := fm.skippable(owner, r.Requires, root, orig, copies)
		if !ok {
			return nil, false
		}
		c := *r
		c.Requires = sub
		c.Run = func(pass *analysis.Pass) (any, error) {
			if pass.Pkg != root && fm.has(memoKey{owner, pass.Pkg}) {
				return zeroResult(r), nil
			}
			return r.Run(unwrapped(pass, r, orig))
		}
		copies[r], orig[&c] = &c, r
		out = append(out, &c)
	}
	return out, true
}

// zeroResult is a result of a's declared type that nothing will read.
func zeroResult(a *analysis.Analyzer) any {
	if a.ResultType == nil {
		return nil
	}
	return reflect.Zero(a.ResultType).Interface()
}

// unwrapped returns a copy of pass as the original analyzer a expects it:
// its ResultOf keyed by the original requirements, not their copies.
func unwrapped(pass *analysis.Pass, a *analysis.Analyzer, orig map[*analysis.Analyzer]*analysis.Analyzer) *analysis.Pass {
	if len(orig) == 0 {
		return pass
	}
	p := *pass
	p.Analyzer = a
	p.ResultOf = make(map[*analysis.Analyzer]any, len(pass.ResultOf))
	for k, v := range pass.ResultOf {
		if o, ok := orig[k]; ok {
			k = o
		}
		p.ResultOf[k] = v
	}
	return &p
}

// run is the Run function of a wrapped analyzer.
func (fm *factMemo) run(a *analysis.Analyzer, root *types.Package, orig map[*analysis.Analyzer]*analysis.Analyzer) func(*analysis.Pass) (any, error) {
	return func(pass *analysis.Pass) (any, error) {
		if pass.Pkg == root {
			return a.Run(unwrapped(pass, a, orig))
		}
		k := memoKey{a, pass.Pkg}
		if o := fm.get(k); o != nil {
			for _, f := range o.objs {
				pass.ExportObjectFact(f.Object, f.Fact)
			}
			for _, f := range o.pkgs {
				pass.ExportPackageFact(f.Fact)
			}
			return o.result, nil
		}
		result, err := a.Run(unwrapped(pass, a, orig))
		if err != nil {
			return nil, err // not memoized: the next analysis tries again
		}
		fm.put(k, exported(pass, result))
		return result, nil
	}
}

// exported collects the facts pass exported about its own package: the
// pass also sees facts inherited from dependencies, which it cannot export.
func exported(pass *analysis.Pass, result any) *depOutcome {
	o := &depOutcome{result: result}
	for _, f := range pass.AllObjectFacts() {
		if f.Object.Pkg() == pass.Pkg {
			o.objs = append(o.objs, f)
		}
	}
	for _, f := range pass.AllPackageFacts() {
		if f.Package == pass.Pkg {
			o.pkgs = append(o.pkgs, f)
		}
	}
	return o
}
