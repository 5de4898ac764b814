package fixes_test

import (
	"go/parser"
	"go/token"
	"path/filepath"
	"strings"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"
)

// singleFixDropsImport applies the one fix of probeterm/scalar.go by
// itself, with no driver clean-up afterwards (as an editor applies a
// quick fix), and checks that the import it leaves unused is gone and the
// helper's is there.
func singleFixDropsImport(t *testing.T, results []*analysistest.Result) {
	for _, r := range results {
		fset := r.Action.Package.Fset
		for _, d := range r.Diagnostics {
			name := fset.File(d.Pos).Name()
			if filepath.Base(name) != "scalar.go" || len(d.SuggestedFixes) == 0 {
				continue
			}
			edits := make(map[string][]fileEdit)
			merge(fset, edits, d.SuggestedFixes[0])
			src := readFile(t, name)
			out := string(applyEdits(src, edits[name]))
			f, err := parser.ParseFile(token.NewFileSet(), name, out, parser.ImportsOnly)
			if err != nil {
				t.Fatalf("fixed file does not parse: %v\n%s", err, out)
			}
			var paths []string
			for _, s := range f.Imports {
				paths = append(paths, s.Path.Value)
			}
			if got := strings.Join(paths, " "); got != `"github.com/overfact/overfact/fixes/lgamma"` {
				t.Errorf("imports after one fix = %s; want only the helper\n%s", got, out)
			}
			return
		}
	}
	t.Fatal("no fix in scalar.go")
}
