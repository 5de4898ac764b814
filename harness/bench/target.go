package main

import "github.com/overfact/overfact/analyzer"

// target is the analyzer measured.
var target = analyzer.Analyzer
