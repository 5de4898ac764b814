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
	// A fixed finding must be gone: none left with its function,
	// category and message, and where a function had a fixed finding of
	// a category, no more left of that category than it had findings
	// without a fix (the message of a finding still there may read the
	// rewritten code differently). A finding of another category may
	// appear: a fix can uncover what its finding hid (the sign of a
	// log-gamma restored, the exponential's own range shows).
	fixed := make(map[string]bool)
	fixedAt := make(map[string]bool)
	unfixed := make(map[string]int)
	applied, skipped := applyFirstFixesSeen(t, dir, analyzer.Analyzer, func(fset *token.FileSet, files []*ast.File, d analysis.Diagnostic) {
		key, place := findingKey(fset, files, d)
		if len(d.SuggestedFixes) > 0 {
			fixed[key], fixedAt[place] = true, true
		} else {
			unfixed[place]++
		}
	}, patterns...)
	t.Logf("%d packages: %d fixes applied, %d skipped as overlapping", len(patterns), applied, skipped)
	if applied == 0 {
		t.Fatal("no fixes applied")
	}
	typeCheck(t, dir, patterns...)
	left := make(map[string]int)
	for _, r := range analysistest.Run(quiet{}, dir, analyzer.Analyzer, patterns...) {
		for _, d := range r.Diagnostics {
			key, place := findingKey(r.Action.Package.Fset, r.Action.Package.Syntax, d)
			if fixed[key] {
				t.Errorf("after its fix, %s is still reported", key)
			}
			if left[place]++; fixedAt[place] && left[place] > unfixed[place] {
				t.Errorf("after fixing, %s holds more findings than it had without a fix (%d)", place, unfixed[place])
			}
			if len(d.SuggestedFixes) > 0 {
				t.Errorf("after fixing, %s offers a fix again", key)
			}
		}
	}
}

// findingKey names a finding by its file, function, category and
// message (key), and by its file, function and category (place), not by
// its position, which the fixes above it move: a function may hold a
// finding without a fix beside one of the same category that is fixed
// (a term whose count is a float next to the loop's terms). No message
// names a line.
func findingKey(fset *token.FileSet, files []*ast.File, d analysis.Diagnostic) (key, place string) {
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
	place = filepath.Base(filepath.Dir(pos.Filename)) + "/" + filepath.Base(pos.Filename) + ": " + fn + ": " + d.Category
	return place + ": " + d.Message, place
}
