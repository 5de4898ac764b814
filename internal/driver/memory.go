package driver

import (
	"go/parser"
	"os"
	"runtime/debug"
)

// parseMode is how the driver parses source. Nothing in the analysis
// reads go/ast's object resolution (go/types resolves names itself), so
// it is skipped: it costs an ast.Object per declared name and a scope per
// file for every package loaded from source.
const parseMode = parser.AllErrors | parser.ParseComments | parser.SkipObjectResolution

// memoryLimit is the soft limit on the Go heap a run sets unless
// GOMEMLIMIT says otherwise. A run holds every package it loads from
// source, syntax and types, until the analysis ends (go/analysis/checker
// analyses a loaded graph); with the collector's default pacing the heap
// then grows to twice what is live before it is collected, so "overfact
// std" (about 1 GB live at the end of its load) peaked at 1.5 GiB. Under
// the limit the collector runs more often as the heap nears it instead.
// A run whose live heap exceeds the limit runs the collector often, at
// most about half of the CPU by the runtime's own bound; GOMEMLIMIT=off
// restores the default pacing. The command's standalone mode also raises
// GOGC under this limit (cmd/overfact/collector.go), which the limit is
// the ceiling of.
const memoryLimit = 1280 << 20

// limitMemory sets memoryLimit for the run unless the environment sets a
// limit, and returns the function that restores the previous one.
func limitMemory() (restore func()) {
	if _, set := os.LookupEnv("GOMEMLIMIT"); set {
		return func() {}
	}
	prev := debug.SetMemoryLimit(memoryLimit)
	return func() { debug.SetMemoryLimit(prev) }
}
