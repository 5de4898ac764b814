package analyzer

import (
	"go/version"
	"os/exec"
	"strings"
	"testing"

	"golang.org/x/tools/go/analysis"
	achecker "golang.org/x/tools/go/analysis/checker"
	"golang.org/x/tools/go/packages"
)

// TestStdLoopVariables runs the analyzer over std's math/rand with its
// tests, loaded through go/packages, which states no Go version for
// standard-library files. TestUniformFactorial there computes n! in a
// t.Run closure inside for n := 3; n <= top; n++ with top at most 6;
// std is compiled at the toolchain's language version (Go ≥ 1.22, one
// n per iteration; Go spec, "For statements with for clause"), so n is
// in [3, 6] in the closure and the product cannot wrap.
func TestStdLoopVariables(t *testing.T) {
	if testing.Short() {
		t.Skip("loads and analyses math/rand and its dependencies")
	}
	cfg := &packages.Config{Mode: packages.LoadAllSyntax | packages.NeedModule, Tests: true}
	pkgs, err := packages.Load(cfg, "math/rand")
	if err != nil {
		t.Fatal(err)
	}
	graph, err := achecker.Analyze([]*analysis.Analyzer{Analyzer}, pkgs, &achecker.Options{Sequential: true})
	if err != nil {
		t.Fatal(err)
	}
	sawTest := false
	for act := range graph.All() {
		if !act.IsRoot {
			continue
		}
		if act.Err != nil {
			t.Errorf("%s: %v", act.Package.ID, act.Err)
		}
		for _, f := range act.Package.GoFiles {
			sawTest = sawTest || strings.HasSuffix(f, "rand_test.go")
		}
		for _, d := range act.Diagnostics {
			pos := act.Package.Fset.Position(d.Pos)
			if strings.HasSuffix(pos.Filename, "rand_test.go") {
				t.Errorf("%s: %s", pos, d.Message)
			}
		}
	}
	if !sawTest {
		t.Fatal("rand_test.go was not among the analysed files")
	}
}

// TestStdVersion checks the language version assumed for std against
// the one the go command reports for its toolchain (go env GOVERSION).
func TestStdVersion(t *testing.T) {
	out, err := exec.Command("go", "env", "GOVERSION").Output()
	if err != nil {
		t.Skipf("go env: %v", err)
	}
	want := version.Lang(strings.TrimSpace(string(out)))
	if want == "" {
		t.Skipf("development toolchain %q", out)
	}
	if got := stdVersion(); got != want {
		t.Errorf("std language version %q, go env GOVERSION gives %q", got, want)
	}
}
