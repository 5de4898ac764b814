package fixes_test

import (
	"go/ast"
	"go/token"
	"os"
	"path/filepath"
	"testing"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/analysistest"

	"github.com/overfact/overfact/analyzer"
)

// srcPackages lists the top-level packages of a testdata/src tree.
func srcPackages(t *testing.T, root string) []string {
	t.Helper()
	entries, err := os.ReadDir(root)
	if err != nil {
		t.Fatal(err)
	}
	var pkgs []string
	for _, e := range entries {
		if e.IsDir() {
			pkgs = append(pkgs, e.Name())
		}
	}
	return pkgs
}

// testdataTree copies every analysistest package of the repository (the
// analyzer's scenarios included) into a GOPATH tree, and returns it with
// a pattern per package.
func testdataTree(t *testing.T) (dir string, patterns []string) {
	t.Helper()
	root := filepath.Join("..", "testdata", "src")
	pkgs := append(srcPackages(t, root), analyzerCases...)
	dir = gopath(t, root, pkgs...)
	for _, p := range pkgs {
		patterns = append(patterns, p+"/...")
	}
	return dir, patterns
}

// TestAllTestdataFixes applies the first fix of every finding in every
// analysistest package of the repository (the analyzer's scenarios
// included) and checks that the result type-checks against the real
// helper module, and that analysing it again finds nothing left to fix
// and none of the findings that were fixed.
func TestAllTestdataFixes(t *testing.T) {
	t.Parallel()
	dir, patterns := testdataTree(t)
	// Packages that do not type-check as written (the analyzer's odd-code
	// scenarios) cannot be judged after fixing; leave them out.
	patterns = compiling(t, dir, patterns)
	fixed := make(map[string]bool)
	applied, skipped := applyFirstFixesSeen(t, dir, analyzer.Analyzer, func(fset *token.FileSet, files []*ast.File, d analysis.Diagnostic) {
		fixed[findingKey(fset, files, d)] = true
	}, patterns...)
	t.Logf("%d packages: %d fixes applied, %d skipped as overlapping", len(patterns), applied, skipped)
	if applied == 0 {
		t.Fatal("no fixes applied")
	}
	typeCheck(t, dir, patterns...)
	for _, r := range analysistest.Run(quiet{}, dir, analyzer.Analyzer, patterns...) {
		for _, d := range r.Diagnostics {
			key := findingKey(r.Action.Package.Fset, r.Action.Package.Syntax, d)
			if fixed[key] {
				t.Errorf("after its fix, %s is still reported", key)
			}
			if len(d.SuggestedFixes) > 0 {
				t.Errorf("after fixing, %s offers a fix again", key)
			}
		}
	}
}

func findingKey(fset *token.FileSet, files []*ast.File, d analysis.Diagnostic) string {
	fn := "(file scope)"
	for _, f := range files {
		if f.FileStart > d.Pos || d.Pos > f.FileEnd {
			continue
		}
		for _, decl := range f.Decls {
			if fd, ok := decl.(*ast.FuncDecl); ok && fd.Pos() <= d.Pos && d.Pos < fd.End() {
				fn = fd.Name.Name
			}
		}
	}
	pos := fset.Position(d.Pos)
	return filepath.Base(filepath.Dir(pos.Filename)) + "/" + filepath.Base(pos.Filename) + ": " + fn + ": " + d.Category
}
