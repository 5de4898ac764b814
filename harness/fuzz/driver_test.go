package fuzz

import (
	"bytes"
	"go/ast"
	"go/format"
	"go/token"
	"path/filepath"
	"testing"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/passes/inspect"
	"golang.org/x/tools/go/ast/inspector"

	"github.com/overfact/overfact/fixes"
)

var helperDir = filepath.Join("..", "..", "fixes", "lgamma")

// expand is a fixture analyzer: it reports every x *= y and offers the
// rewrite x = x * (y), so that the driver and the edit application can be
// checked against text written out by hand.
var expand = &analysis.Analyzer{
	Name:     "expand",
	Doc:      "fixture: rewrites x *= y as x = x * (y)",
	Requires: []*analysis.Analyzer{inspect.Analyzer},
	Run: func(pass *analysis.Pass) (any, error) {
		ins := pass.ResultOf[inspect.Analyzer].(*inspector.Inspector)
		ins.Preorder([]ast.Node{(*ast.AssignStmt)(nil)}, func(n ast.Node) {
			as := n.(*ast.AssignStmt)
			if as.Tok != token.MUL_ASSIGN {
				return
			}
			var lhs, rhs bytes.Buffer
			format.Node(&lhs, pass.Fset, as.Lhs[0])
			format.Node(&rhs, pass.Fset, as.Rhs[0])
			pass.Report(analysis.Diagnostic{Pos: as.Pos(), Message: "compound product",
				SuggestedFixes: []analysis.SuggestedFix{{Message: "expand", TextEdits: []analysis.TextEdit{
					{Pos: as.Pos(), End: as.End(), NewText: []byte(lhs.String() + " = " + lhs.String() + " * (" + rhs.String() + ")")},
				}}}})
		})
		return nil, nil
	},
}

func TestDriverAppliesFixes(t *testing.T) {
	c := NewChecker(helperDir)
	src := map[string][]byte{"a.go": []byte("package a\n\nfunc f(n int) int {\n\tp := 1\n\tfor i := 2; i <= n; i++ {\n\t\tp *= i\n\t}\n\tp *= n + 1\n\treturn p\n}\n")}
	// Written out by hand from the fixture's documented rewrite.
	want := "package a\n\nfunc f(n int) int {\n\tp := 1\n\tfor i := 2; i <= n; i++ {\n\t\tp = p * (i)\n\t}\n\tp = p * (n + 1)\n\treturn p\n}\n"
	pkg, err := c.Check("a", src)
	if err != nil {
		t.Fatal(err)
	}
	diags, err := Run(expand, pkg)
	if err != nil {
		t.Fatal(err)
	}
	if len(diags) != 2 {
		t.Fatalf("got %d diagnostics, want 2", len(diags))
	}
	var all []edit
	for _, d := range diags {
		es, err := resolve(pkg.Fset, src, d.SuggestedFixes[0])
		if err != nil {
			t.Fatal(err)
		}
		var ok bool
		if all, ok = merge(all, es); !ok {
			t.Fatalf("fixes of distinct statements conflict")
		}
	}
	got := apply(src, all)["a.go"]
	if string(got) != want {
		t.Errorf("fixed source:\n%s\nwant:\n%s", got, want)
	}
	if _, err := c.Check("a", map[string][]byte{"a.go": got}); err != nil {
		t.Errorf("fixed source does not type-check: %v", err)
	}
}

func TestOverlap(t *testing.T) {
	tests := []struct {
		name string
		es   []edit
		want bool
	}{
		{"disjoint", []edit{{"a", 0, 2, "x"}, {"a", 2, 4, "y"}}, false},
		{"nested", []edit{{"a", 0, 4, "x"}, {"a", 1, 2, "y"}}, true},
		{"two insertions", []edit{{"a", 3, 3, "x"}, {"a", 3, 3, "y"}}, false},
		{"insertion inside", []edit{{"a", 0, 4, "x"}, {"a", 2, 2, "y"}}, true},
		{"other file", []edit{{"a", 0, 4, "x"}, {"b", 1, 2, "y"}}, false},
	}
	for _, tt := range tests {
		es := append([]edit(nil), tt.es...)
		sortEdits(es)
		if got := firstOverlap(es) >= 0; got != tt.want {
			t.Errorf("%s: overlap = %v, want %v", tt.name, got, tt.want)
		}
	}
}

func TestHelperImport(t *testing.T) {
	c := NewChecker(helperDir)
	src := map[string][]byte{"a.go": []byte("package a\n\nimport _ \"" + fixes.HelperPath + "\"\n")}
	if _, err := c.Check("a", src); err != nil {
		t.Errorf("importing the helper module: %v", err)
	}
}

func TestGenerateTypeChecks(t *testing.T) {
	// Every shape, with seeds that walk the choices of each.
	c := NewChecker(helperDir)
	for s := range len(shapes) * 8 {
		seed := []byte{3, byte(s % len(shapes)), byte(s), byte(s / 2), byte(s * 7), byte(s * 13), byte(s + 1), byte(s * 3), byte(s * 5)}
		src := Generate("gen", seed)
		if _, err := c.Check("gen", map[string][]byte{"gen.go": []byte(src)}); err != nil {
			t.Fatalf("seed %v: %v\n%s", seed, err, src)
		}
	}
}

// BenchmarkExec measures one fuzz execution on generated input, without
// the fuzzing engine's coverage instrumentation.
func BenchmarkExec(b *testing.B) {
	t := &testing.T{}
	for i := 0; b.Loop(); i++ {
		seed := []byte{byte(i), byte(i >> 3), byte(i * 7), byte(i * 11), byte(i * 13), 5, 9}
		checkPackage(t, underTest, "example.com/gen", map[string][]byte{"gen.go": []byte(Generate("gen", seed))}, true)
	}
}

func TestMerge(t *testing.T) {
	// The rule -fix applies between fixes (internal/driver): identical
	// edits coalesce; distinct insertions at one point clash.
	base := []edit{{"a", 10, 10, "(\n"}, {"a", 20, 20, "\n\t\"fmt\"\n)"}}
	if got, ok := merge(base, []edit{{"a", 10, 10, "(\n"}, {"a", 30, 34, "x"}}); !ok || len(got) != 3 {
		t.Errorf("identical insertion plus a disjoint edit: ok=%v, %d edits; want true, 3", ok, len(got))
	}
	if _, ok := merge(base, []edit{{"a", 20, 20, "\n\t\"math\"\n)"}}); ok {
		t.Errorf("distinct insertions at one point merged")
	}
	if _, ok := merge(base, []edit{{"a", 15, 25, ""}}); ok {
		t.Errorf("a deletion spanning an insertion merged")
	}
}
