package lsp

import (
	"go/types"
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

// wrap returns analyzers that behave as as do, except that on a package
// other than root an analyzer with facts replays its memoized outcome, or
// runs and memoizes it. Analyzers without facts never run on dependencies
// and are returned unchanged.
func (fm *factMemo) wrap(as []*analysis.Analyzer, root *types.Package) []*analysis.Analyzer {
	out := make([]*analysis.Analyzer, len(as))
	for i, a := range as {
		if len(a.FactTypes) == 0 {
			out[i] = a
			continue
		}
		w := *a // same name, flags, requirements, fact and result types
		w.Run = fm.run(a, root)
		out[i] = &w
	}
	return out
}

// run is the Run function of a wrapped analyzer.
func (fm *factMemo) run(a *analysis.Analyzer, root *types.Package) func(*analysis.Pass) (any, error) {
	return func(pass *analysis.Pass) (any, error) {
		if pass.Pkg == root {
			return a.Run(pass)
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
		result, err := a.Run(pass)
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
