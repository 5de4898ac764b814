package driver_test

import (
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/checker"
	"golang.org/x/tools/go/packages"

	"github.com/overfact/overfact/analyzer"
	"github.com/overfact/overfact/internal/driver"
)

// TestLoadForFactsSameOutcome loads a module of packages that carry facts
// in every way a dependency can (a loop, a wrapper of an imported
// function under another name, a method promoted through a package that
// defines nothing, math.Gamma, a dot import, an external test importing a
// package that imports the one under test) beside one that carries none,
// once with every dependency from source, which is what
// checker.Analyze documents, and once as the command loads it. Every
// diagnostic, fix and fact must be the same, and the second load must
// really have taken the package without facts from export data.
func TestLoadForFactsSameOutcome(t *testing.T) {
	t.Setenv("GOWORK", "off")
	t.Setenv("GOFLAGS", "-mod=mod")
	t.Setenv("GOPROXY", "off")
	dir, err := filepath.Abs(filepath.Join("testdata", "loadfacts"))
	if err != nil {
		t.Fatal(err)
	}
	patterns := []string{"./app", "./combin"}
	run := func(scan driver.FactScan) ([]string, map[string]*packages.Package) {
		cfg := &packages.Config{Dir: dir, Tests: true}
		pkgs, err := driver.LoadForFacts(cfg, patterns, scan)
		if err != nil {
			t.Fatal(err)
		}
		if n := packages.PrintErrors(pkgs); n > 0 {
			t.Fatalf("%d load errors", n)
		}
		byID := make(map[string]*packages.Package)
		packages.Visit(pkgs, nil, func(p *packages.Package) { byID[p.ID] = p })
		g, err := checker.Analyze([]*analysis.Analyzer{analyzer.Analyzer}, pkgs, nil)
		if err != nil {
			t.Fatal(err)
		}
		return driver.Outcome(g), byID
	}
	source, _ := run(nil)
	loaded, byID := run(analyzer.MayCarryFacts)
	if !slices.Equal(source, loaded) {
		t.Errorf("outcomes differ\nevery dependency from source:\n%s\nas the command loads:\n%s",
			strings.Join(source, "\n"), strings.Join(loaded, "\n"))
	}
	// The outcome is not empty: the facts the app's findings rest on are
	// there (each a factorial or binomial of the functions above, by
	// the definitions of n! and C(n, k)).
	for _, want := range []string{
		"fact example.com/loadfacts/combin func combin.Factorial",
		"fact example.com/loadfacts/combin func combin.Binomial",
		"fact example.com/loadfacts/stats func stats.Ways",
		"fact example.com/loadfacts/tally func (tally.Counter).Orders",
		"fact example.com/loadfacts/gammaw func gammaw.Fact",
		"diagnostic " + filepath.Join(dir, "app", "app.go") + ":18:3",
	} {
		if !slices.ContainsFunc(loaded, func(s string) bool { return strings.HasPrefix(s, want) }) {
			t.Errorf("no line starting %q in the outcome:\n%s", want, strings.Join(loaded, "\n"))
		}
	}
	// A package that does not compile reports its errors once, as the
	// load from source does, not also as go list's failed build.
	broken := filepath.Join(t.TempDir(), "broken")
	if err := os.MkdirAll(broken, 0o755); err != nil {
		t.Fatal(err)
	}
	for name, text := range map[string]string{"go.mod": "module example.com/broken\n\ngo 1.22\n", "b.go": "package b\n\nfunc F() int { return y }\n"} {
		if err := os.WriteFile(filepath.Join(broken, name), []byte(text), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	var errs [2][]string
	for i, scan := range []driver.FactScan{nil, analyzer.MayCarryFacts} {
		pkgs, err := driver.LoadForFacts(&packages.Config{Dir: broken}, []string{"."}, scan)
		if err != nil {
			t.Fatal(err)
		}
		packages.Visit(pkgs, nil, func(p *packages.Package) {
			for _, e := range p.Errors {
				errs[i] = append(errs[i], e.Error())
			}
		})
	}
	if len(errs[0]) == 0 || !slices.Equal(errs[0], errs[1]) {
		t.Errorf("errors of a package that does not compile:\nevery dependency from source: %q\nas the command loads: %q", errs[0], errs[1])
	}
	for id, fromSource := range map[string]bool{
		"example.com/loadfacts/plain":  false,
		"example.com/loadfacts/ledger": false,
		"fmt":                          false,
		"example.com/loadfacts/tally":  true,
		"example.com/loadfacts/stats":  true,
		"example.com/loadfacts/dotted": true,
		"example.com/loadfacts/stats [example.com/loadfacts/combin.test]": true,
		"example.com/loadfacts/app":                                       true,
	} {
		p := byID[id]
		switch {
		case p == nil:
			t.Errorf("%s was not loaded", id)
		case (p.Syntax != nil) != fromSource:
			t.Errorf("%s: loaded from source: %v, want %v", id, p.Syntax != nil, fromSource)
		}
	}
}
