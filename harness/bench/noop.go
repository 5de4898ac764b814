package main

import (
	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/passes/inspect"
)

// noop is the baseline: it pays for what any syntax-walking analyzer pays
// (the shared inspector) and does nothing else, so the difference between
// it and overfact is what overfact itself costs.
var noop = &analysis.Analyzer{
	Name:     "noop",
	Doc:      "baseline analyzer: builds the inspector and reports nothing",
	Requires: []*analysis.Analyzer{inspect.Analyzer},
	Run: func(pass *analysis.Pass) (any, error) {
		_ = pass.ResultOf[inspect.Analyzer]
		return nil, nil
	},
}

// side maps the names used on the command line to the analyzers measured.
// "noop-roots" is the no-op analyzer loaded as it needs itself (syntax of
// the named packages only, export data for the rest), the cost of a run
// of an analyzer without facts: the baseline of the targets. "overfact"
// is loaded as -load says (by default as the command loads),
// "overfact-source" with every dependency from source, as the command
// loaded before it took dependencies without facts from export data.
func side(name string) *analysis.Analyzer {
	switch name {
	case "noop-roots":
		return noop
	case "overfact", "overfact-source":
		return target
	}
	return nil
}

// strategyOf is the load strategy of a side.
func strategyOf(name string) string {
	switch name {
	case "noop-roots":
		return "roots"
	case "overfact-source":
		return "source"
	}
	return *loadFlag
}
