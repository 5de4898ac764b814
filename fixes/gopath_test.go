package fixes_test

import (
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"

	"github.com/overfact/overfact/fixes"
)

// gopath builds a GOPATH-style tree for analysistest in a temporary
// directory: the named packages of srcRoot, and the helper module's
// current sources under its import path, so that testdata may import the
// helper. The helper is copied at test time rather than committed, so a
// stale copy can never be tested against.
func gopath(t *testing.T, srcRoot string, pkgs ...string) string {
	t.Helper()
	dir := t.TempDir()
	for _, p := range pkgs {
		copyDir(t, caseDir(srcRoot, p), filepath.Join(dir, "src", p), true)
	}
	copyDir(t, "lgamma", filepath.Join(dir, "src", filepath.FromSlash(fixes.HelperPath)), false)
	return dir
}

// analyzerCases are the log-space categories' case packages. They live
// beside the analyzer, in analyzer/testdata/src, one per category; the
// fixer's golden and differential tests build them too.
var analyzerCases = []string{"lgammasign", "lgammadigits", "lgammainteger", "lgammaoverflow", "stirlingapproximation"}

// caseDir returns the directory of the testdata package p: beside the
// analyzer for one of analyzerCases, under srcRoot otherwise.
func caseDir(srcRoot, p string) string {
	if slices.Contains(analyzerCases, p) {
		return filepath.Join("..", "analyzer", "testdata", "src", p)
	}
	return filepath.Join(srcRoot, p)
}

// copyDir copies the files of from into to; goldens only when withGolden,
// and never tests (the helper's tests may need modules GOPATH lacks).
func copyDir(t *testing.T, from, to string, withGolden bool) {
	t.Helper()
	entries, err := os.ReadDir(from)
	if err != nil {
		t.Fatal(err)
	}
	if err := os.MkdirAll(to, 0o755); err != nil {
		t.Fatal(err)
	}
	for _, e := range entries {
		name := e.Name()
		if e.IsDir() {
			if withGolden {
				copyDir(t, filepath.Join(from, name), filepath.Join(to, name), true)
			}
			continue
		}
		keep := strings.HasSuffix(name, ".go") && !strings.HasSuffix(name, "_test.go") ||
			withGolden && (strings.HasSuffix(name, ".golden") || strings.HasSuffix(name, "_test.go"))
		if !keep {
			continue
		}
		data, err := os.ReadFile(filepath.Join(from, name))
		if err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(filepath.Join(to, name), data, 0o644); err != nil {
			t.Fatal(err)
		}
	}
}

func readFile(t *testing.T, name string) []byte {
	t.Helper()
	data, err := os.ReadFile(name)
	if err != nil {
		t.Fatal(err)
	}
	return data
}
