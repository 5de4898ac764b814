package fixes_test

import (
	"path/filepath"
	"runtime"
	"testing"
	"weak"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/analysistest"
)

// TestFixerDiesWithPass checks that building fixes keeps no pass alive
// after its analysis: what a package's fixes share belongs to the pass,
// so once the driver lets go of the pass, the collector can free it and
// the whole loaded package it points to. A process-wide cache of recent
// passes once kept them, which in a long-running language server pinned
// loaded packages long after they were closed.
func TestFixerDiesWithPass(t *testing.T) {
	var passes []weak.Pointer[analysis.Pass]
	a := &analysis.Analyzer{
		Name: probe.Name,
		Doc:  probe.Doc,
		Run: func(pass *analysis.Pass) (any, error) {
			passes = append(passes, weak.Make(pass))
			return probe.Run(pass)
		},
	}
	dir := gopath(t, filepath.Join("testdata", "src"), "probebinom", "probeguard")
	func() {
		// The results hold the passes; they go out of scope here.
		results := analysistest.Run(t, dir, a, "probebinom", "probeguard")
		if len(results) != 2 {
			t.Fatalf("analysed %d packages, want 2", len(results))
		}
	}()
	if len(passes) != 2 {
		t.Fatalf("ran on %d passes, want 2", len(passes))
	}
	runtime.GC()
	runtime.GC()
	for i, p := range passes {
		if p.Value() != nil {
			t.Errorf("pass %d is still reachable after its analysis", i)
		}
	}
}
