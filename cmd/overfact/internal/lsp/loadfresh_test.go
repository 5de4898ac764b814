package lsp

import (
	"path/filepath"
	"testing"

	"golang.org/x/tools/go/packages"

	"github.com/overfact/overfact/analyzer"
)

// TestColdOpenUsesExportData checks that a file opened as it is on disk
// is loaded as the command loads it, with the standard library from
// export data, and that a buffer that differs from the disk is loaded
// from source throughout, as go/packages does under an overlay.
func TestColdOpenUsesExportData(t *testing.T) {
	t.Setenv("GOWORK", "off")
	dir := t.TempDir()
	writeFiles(t, dir, map[string]string{"go.mod": "module example.com/desk\n\ngo 1.21\n", "desk.go": staffingSource})
	path := filepath.Join(dir, "desk.go")
	for _, tc := range []struct {
		text       string
		fmtSyntax  bool
		whatBuffer string
	}{
		{staffingSource, false, "as on disk"},
		{staffingSource + "// unsaved\n", true, "edited"},
	} {
		cfg := &packages.Config{Mode: loadMode, Dir: dir, Overlay: map[string][]byte{path: []byte(tc.text)}}
		roots, _, _, err := load(cfg, path, new(loadCache), analyzer.MayCarryFacts)
		if err != nil {
			t.Fatal(err)
		}
		if len(roots) != 1 || roots[0].TypesInfo == nil {
			t.Fatalf("buffer %s: roots %v, want the package with types", tc.whatBuffer, roots)
		}
		fmtPkg := roots[0].Imports["fmt"]
		if fmtPkg == nil || fmtPkg.Types == nil || !fmtPkg.Types.Complete() {
			t.Fatalf("buffer %s: fmt not loaded with its types", tc.whatBuffer)
		}
		if got := fmtPkg.Syntax != nil; got != tc.fmtSyntax {
			t.Errorf("buffer %s: fmt loaded from source: %v, want %v", tc.whatBuffer, got, tc.fmtSyntax)
		}
	}
}
