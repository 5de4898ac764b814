package fuzz

import "github.com/overfact/overfact/analyzer"

// underTest is the analyzer fuzzed.
var underTest = analyzer.Analyzer
