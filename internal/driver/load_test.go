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
	dir := loadFactsModule(t)
	patterns := []string{"./app", "./combin"}
	source, _ := loadOutcome(t, dir, patterns, nil, nil)
	loaded, byID := loadOutcome(t, dir, patterns, nil, analyzer.MayCarryFacts)
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
		"diagnostic " + filepath.Join(dir, "app", "app.go") + ":19:3",
		// A slice of probabilities, each +Inf/+Inf = NaN from n = 171
		// (170! ≈ 7.26e306 is the largest factorial below MaxFloat64),
		// read by a caller in another package.
		"fact example.com/loadfacts/shares func shares.Split",
		"diagnostic " + filepath.Join(dir, "app", "app.go") + ":32:20",
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
		"example.com/loadfacts/shares": true,
		"example.com/loadfacts/dotted": true,
		"example.com/loadfacts/stats [example.com/loadfacts/combin.test]": true,
		"example.com/loadfacts/app":                                       true,
	} {
		checkFromSource(t, byID, id, fromSource)
	}
}

// TestLoadForFactsOverlaySameOutcome loads the module of
// TestLoadForFactsSameOutcome under overlays as the later rounds of -fix
// make them: every dependency from source (packages.LoadAllSyntax, what
// go/packages does under any overlay), and as the command loads, where
// only what the overlay reaches comes from source. The overlays give a
// dependency a range guard and a new import (fmt, which the files on disk
// do not import), and turn a dependency whose export data on disk carries
// no fact into one that carries a factorial: the outcomes must be the
// same, and must be those of the overlaid text, not of the disk's.
func TestLoadForFactsOverlaySameOutcome(t *testing.T) {
	dir := loadFactsModule(t)
	patterns := []string{"./app"}
	onDisk, _ := loadOutcome(t, dir, patterns, nil, analyzer.MayCarryFacts)
	// Each overlay is the file on disk with one edit.
	edited := func(file, old, new string) map[string][]byte {
		name := filepath.Join(dir, file)
		text, err := os.ReadFile(name)
		if err != nil {
			t.Fatal(err)
		}
		if !strings.Contains(string(text), old) {
			t.Fatalf("%s does not hold %q", file, old)
		}
		return map[string][]byte{name: []byte(strings.Replace(string(text), old, new, 1))}
	}
	for _, c := range []struct {
		name       string
		overlay    map[string][]byte
		fromSource map[string]bool
	}{
		{"a guard and a new import in a dependency",
			edited("combin/combin.go", "func Factorial(n int) int {\n", `import "fmt"

func Factorial(n int) int {
	if n >= 21 {
		panic(fmt.Sprintf("Factorial: n = %d overflows int (largest is 20)", n))
	}
`), map[string]bool{
				"example.com/loadfacts/combin": true, "example.com/loadfacts/stats": true, "example.com/loadfacts/app": true,
				"example.com/loadfacts/plain": false, "fmt": false,
			}},
		// Search now returns x!, the product 2·3·…·x (its definition).
		{"a dependency without facts on disk gains one",
			edited("plain/plain.go", "\treturn lo\n", "\tf := 1\n\tfor i := 2; i <= x; i++ {\n\t\tf *= i\n\t}\n\treturn f\n"), map[string]bool{
				"example.com/loadfacts/plain": true, "example.com/loadfacts/app": true,
				"example.com/loadfacts/ledger": false,
			}},
	} {
		t.Run(c.name, func(t *testing.T) {
			source, _ := loadOutcome(t, dir, patterns, c.overlay, nil)
			loaded, byID := loadOutcome(t, dir, patterns, c.overlay, analyzer.MayCarryFacts)
			if !slices.Equal(source, loaded) {
				t.Errorf("outcomes differ\nevery dependency from source:\n%s\nas the command loads:\n%s",
					strings.Join(source, "\n"), strings.Join(loaded, "\n"))
			}
			if slices.Equal(loaded, onDisk) {
				t.Errorf("the outcome under the overlay is the one of the files on disk:\n%s", strings.Join(loaded, "\n"))
			}
			for id, fromSource := range c.fromSource {
				checkFromSource(t, byID, id, fromSource)
			}
		})
	}
}

// loadOutcome loads patterns from dir with tests, under overlay, every
// dependency from source (scan nil) or as the command loads them, runs
// the analyzer and returns its outcome and the packages by ID.
func loadOutcome(t *testing.T, dir string, patterns []string, overlay map[string][]byte, scan driver.FactScan) ([]string, map[string]*packages.Package) {
	t.Helper()
	cfg := &packages.Config{Dir: dir, Tests: true, Overlay: overlay}
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

// loadFactsModule returns the directory of the module the load tests
// share, with the go command kept to it (no workspace, no proxy).
func loadFactsModule(t *testing.T) string {
	t.Helper()
	t.Setenv("GOWORK", "off")
	t.Setenv("GOFLAGS", "-mod=mod")
	t.Setenv("GOPROXY", "off")
	dir, err := filepath.Abs(filepath.Join("testdata", "loadfacts"))
	if err != nil {
		t.Fatal(err)
	}
	return dir
}

// checkFromSource checks that package id was loaded, from source or
// from export data as fromSource says.
func checkFromSource(t *testing.T, byID map[string]*packages.Package, id string, fromSource bool) {
	t.Helper()
	p := byID[id]
	switch {
	case p == nil:
		t.Errorf("%s was not loaded", id)
	case (p.Syntax != nil) != fromSource:
		t.Errorf("%s: loaded from source: %v, want %v", id, p.Syntax != nil, fromSource)
	}
}
