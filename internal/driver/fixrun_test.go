package driver

import (
	"bytes"
	"fmt"
	"go/ast"
	"go/token"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"golang.org/x/tools/go/analysis"
)

// noteAnalyzer reports every x *= y with one message, so that all its
// findings share a key. Each fix inserts a note at the top of the file,
// all at the same offset, so that two fixes always clash; the fix of
// x *= y also rewrites the statement as x = x * y, which silences the
// finding, except for a variable named keep, whose fix only adds the
// note and leaves the finding in place.
var noteAnalyzer = &analysis.Analyzer{
	Name: "note",
	Doc:  "reports multiplying assignments",
	Run: func(pass *analysis.Pass) (any, error) {
		for _, f := range pass.Files {
			ast.Inspect(f, func(n ast.Node) bool {
				as, ok := n.(*ast.AssignStmt)
				if !ok || as.Tok != token.MUL_ASSIGN {
					return true
				}
				name := as.Lhs[0].(*ast.Ident).Name
				edits := []analysis.TextEdit{{Pos: f.Package, End: f.Package, NewText: []byte("// note: " + name + "\n")}}
				if name != "keep" {
					rhs := as.Rhs[0].(*ast.Ident).Name
					edits = append(edits, analysis.TextEdit{Pos: as.Pos(), End: as.End(), NewText: []byte(fmt.Sprintf("%s = %s * %s", name, name, rhs))})
				}
				pass.Report(analysis.Diagnostic{Pos: as.Pos(), End: as.End(), Message: "product",
					SuggestedFixes: []analysis.SuggestedFix{{Message: "note it", TextEdits: edits}}})
				return true
			})
		}
		return nil, nil
	},
}

const noteSrc = `package p

func f(keep, a, b, i int) int {
	keep *= i
	a *= i
	b *= i
	return keep + a + b
}
`

// TestFixRounds checks that fixes clashing at one insertion point are
// all applied over successive rounds, and that the fix of a finding it
// does not silence is applied once only.
func TestFixRounds(t *testing.T) {
	t.Setenv("GOWORK", "off")
	t.Setenv("GOFLAGS", "-mod=mod")
	t.Setenv("GOPROXY", "off")
	dir := t.TempDir()
	for name, content := range map[string]string{"go.mod": "module example.com/p\n\ngo 1.21\n", "p.go": noteSrc} {
		if err := os.WriteFile(filepath.Join(dir, name), []byte(content), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	var stdout, stderr bytes.Buffer
	code := Run(noteAnalyzer, []string{"."}, Options{Dir: dir, Fix: true, Stdout: &stdout, Stderr: &stderr})
	if code != ExitClean {
		t.Fatalf("exit code %d\n%s", code, stderr.String())
	}
	got, _ := os.ReadFile(filepath.Join(dir, "p.go"))
	// Written by hand: round 1 takes keep's fix (the first) and holds back
	// a's and b's, which clash with it at the top of the file; round 2
	// takes a's and holds back b's; round 3 takes b's. keep's finding
	// stays but its fix is not applied again. Each note goes just before
	// the package clause, so after the notes already there.
	want := "// note: keep\n// note: a\n// note: b\npackage p\n\nfunc f(keep, a, b, i int) int {\n\tkeep *= i\n\ta = a * i\n\tb = b * i\n\treturn keep + a + b\n}\n"
	if string(got) != want {
		t.Errorf("fixed file:\n%s\nwant:\n%s", got, want)
	}
	if strings.Count(string(got), "note: keep") != 1 {
		t.Errorf("the fix that leaves its finding was applied %d times", strings.Count(string(got), "note: keep"))
	}
}
