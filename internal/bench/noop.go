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

// sides maps the names used on the command line to the analyzers measured.
func side(name string) *analysis.Analyzer {
	switch name {
	case "noop":
		return noop
	case "overfact":
		return target
	}
	return nil
}
