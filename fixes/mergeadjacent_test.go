package fixes_test

import (
	"go/parser"
	"go/token"
	"os"
	"sort"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"

	"github.com/overfact/overfact/analyzer"
)

// TestFixesMergeAdjacent applies every first fix of every testdata
// package the way golangci-lint v2's --fix does (pkg/result/processors/
// fixer.go of v2.15.0, read from the module proxy's source): all edits of
// the linter in a file sorted by start and end, a copy of an edit dropped
// only when it is next to its twin, the file skipped when two edits
// overlap. Fixes that add imports to a file share edits (the parentheses
// around a single import); each fixed file must still parse.
func TestFixesMergeAdjacent(t *testing.T) {
	t.Parallel()
	dir, patterns := testdataTree(t)
	edits := make(map[string][]fileEdit)
	for _, r := range analysistest.Run(quiet{}, dir, analyzer.Analyzer, patterns...) {
		fset := r.Action.Package.Fset
		for _, d := range r.Diagnostics {
			if len(d.SuggestedFixes) == 0 {
				continue
			}
			for _, e := range d.SuggestedFixes[0].TextEdits {
				f := fset.File(e.Pos)
				edits[f.Name()] = append(edits[f.Name()], fileEdit{f.Offset(e.Pos), f.Offset(e.End), string(e.NewText)})
			}
		}
	}
	fixed, skipped := 0, 0
	for name, es := range edits {
		sort.SliceStable(es, func(i, j int) bool {
			return es[i].start < es[j].start || es[i].start == es[j].start && es[i].end < es[j].end
		})
		unique := es[:1]
		clash := false
		for i := 1; i < len(es); i++ {
			if es[i] != es[i-1] {
				unique = append(unique, es[i])
				clash = clash || es[i-1].end > es[i].start
			}
		}
		if clash {
			skipped++
			continue
		}
		src, err := os.ReadFile(name)
		if err != nil {
			t.Fatal(err)
		}
		out := applyEdits(src, unique)
		if _, err := parser.ParseFile(token.NewFileSet(), name, out, parser.SkipObjectResolution); err != nil {
			t.Errorf("%s does not parse after its fixes are merged: %v\n%s", name, err, out)
		}
		fixed++
	}
	t.Logf("%d files fixed, %d skipped for overlapping edits", fixed, skipped)
	if fixed == 0 {
		t.Fatal("no file fixed")
	}
}
