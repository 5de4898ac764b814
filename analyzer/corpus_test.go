package analyzer

import (
	"go/ast"
	"go/token"
	"path/filepath"
	"sort"
	"testing"

	"golang.org/x/tools/go/analysis"
	driver "golang.org/x/tools/go/analysis/checker"
	"golang.org/x/tools/go/packages"
)

// TestGonumCorpus runs the analyzer over real code: gonum's stat/combin
// package (a test-only dependency of this module). Its Binomial documents
// "No check is made for overflow" and uses the multiplicative loop
// b = (n - k + i) * b / i, and its unexported factorial multiplies an
// int up to an argument nothing bounds; those two, and nothing else in
// the package, are reported.
func TestGonumCorpus(t *testing.T) {
	if testing.Short() {
		t.Skip("loads gonum")
	}
	pkgs, err := packages.Load(&packages.Config{Mode: packages.LoadAllSyntax}, "gonum.org/v1/gonum/stat/combin")
	if err != nil || packages.PrintErrors(pkgs) > 0 {
		t.Fatalf("load: %v", err)
	}
	res, err := driver.Analyze([]*analysis.Analyzer{Analyzer}, pkgs, nil)
	if err != nil {
		t.Fatal(err)
	}
	var got []string
	for _, act := range res.Roots {
		if act.Err != nil {
			t.Fatal(act.Err)
		}
		for _, d := range act.Diagnostics {
			p := act.Package.Fset.Position(d.Pos)
			got = append(got, filepath.Base(p.Filename)+" "+funcAt(act.Package, d.Pos)+" "+d.Category)
		}
	}
	sort.Strings(got)
	want := []string{"combin.go Binomial binomial-loop", "combin.go factorial factorial-loop"}
	if len(got) != len(want) || got[0] != want[0] || got[1] != want[1] {
		t.Errorf("findings in gonum stat/combin:\n got %q\nwant %q", got, want)
	}
}

// funcAt names the function declaration holding pos.
func funcAt(pkg *packages.Package, pos token.Pos) string {
	for _, f := range pkg.Syntax {
		for _, d := range f.Decls {
			if fd, ok := d.(*ast.FuncDecl); ok && fd.Pos() <= pos && pos < fd.End() {
				return fd.Name.Name
			}
		}
	}
	return "?"
}
