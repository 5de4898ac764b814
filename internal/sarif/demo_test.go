package sarif

import (
	"path/filepath"
	"testing"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/checker"
	"golang.org/x/tools/go/packages"

	"github.com/overfact/overfact/analyzer"
)

// TestDemoLogMatchesSchema builds the log of the analyzer's real
// findings on the demo module, fixes and related locations included,
// and checks it against the SARIF 2.1.0 schema.
func TestDemoLogMatchesSchema(t *testing.T) {
	if testing.Short() {
		t.Skip("loads and analyses the demo module")
	}
	demo, err := filepath.Abs(filepath.Join("..", "..", "testdata", "demo"))
	if err != nil {
		t.Fatal(err)
	}
	cfg := &packages.Config{Mode: packages.LoadAllSyntax | packages.NeedModule, Dir: demo}
	pkgs, err := packages.Load(cfg, "./...")
	if err != nil || packages.PrintErrors(pkgs) > 0 {
		t.Fatalf("loading the demo: %v", err)
	}
	graph, err := checker.Analyze([]*analysis.Analyzer{analyzer.Analyzer}, pkgs, nil)
	if err != nil {
		t.Fatal(err)
	}
	var rules []Rule
	for _, c := range analyzer.Categories() {
		rules = append(rules, Rule{ID: c.ID, Title: c.Title, Help: c.Help})
	}
	b, err := NewBuilder(ToolComponent{Name: "overfact"}, rules, demo)
	if err != nil {
		t.Fatal(err)
	}
	fixes := 0
	for _, act := range graph.Roots {
		for _, d := range act.Diagnostics {
			fixes += len(d.SuggestedFixes)
			if err := b.Add(act.Package.Fset, d, "overfact"); err != nil {
				t.Fatal(err)
			}
		}
	}
	if len(b.Log().Runs[0].Results) == 0 || fixes == 0 {
		t.Fatalf("the demo gave %d results and %d fixes; the check would be vacuous", len(b.Log().Runs[0].Results), fixes)
	}
	checkSchema(t, b)
}
