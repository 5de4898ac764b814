package main

import (
	"fmt"
	"go/parser"
	"go/token"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"sync"
	"testing"
)

// helperGoMod returns a go.mod requiring the helper module from this
// repository, so that fixed code builds and analyses again.
func helperGoMod(t *testing.T) string {
	return fmt.Sprintf("module example.com/bottling\n\ngo 1.21\n\nrequire github.com/overfact/overfact/fixes/lgamma v0.1.0\n\nreplace github.com/overfact/overfact/fixes/lgamma => %s\n",
		filepath.ToSlash(filepath.Join(repoRoot(t), "fixes", "lgamma")))
}

// factFile defines a float64 factorial returned as it is: +Inf from
// n = 171 is the IEEE value of an n! beyond float64, so the file has no
// finding and no fix of its own; the callers' ratios are what -fix
// rewrites.
const factFile = `package line

// fact is n!, as the line's planners wrote it.
func fact(n int) float64 {
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}
`

// chooseFile divides factorials; its fix rewrites the ratio as a helper
// call, which stays right where fact(n) alone is +Inf.
const chooseFile = `package line

// Mixes is the number of ways to pick k crates of n for a mixed pallet.
func Mixes(n, k int) float64 {
	return fact(n) / (fact(k) * fact(n-k))
}
`

func goBuild(t *testing.T, dir string) {
	t.Helper()
	cmd := exec.Command("go", "build", "./...")
	cmd.Dir = dir
	cmd.Env = append(os.Environ(), isolated...)
	if out, err := cmd.CombinedOutput(); err != nil {
		t.Errorf("the fixed module does not build: %v\n%s", err, out)
	}
}

// TestFixReadOnlyKeepsPlan is a plan that touches a read-only file: with
// choose.go read-only nothing may be written (fact.go, which needs no
// fix, stays as it was); once it is writable, one run rewrites the
// ratio, which stays right where fact(n) alone is +Inf.
func TestFixReadOnlyKeepsPlan(t *testing.T) {
	dir := writeModule(t, map[string]string{"go.mod": helperGoMod(t), "line/fact.go": factFile, "line/choose.go": chooseFile})
	choose := filepath.Join(dir, "line", "choose.go")
	if err := os.Chmod(choose, 0o444); err != nil {
		t.Fatal(err)
	}
	r := runIn(t, dir, isolated, "-fix", "./...")
	noPanic(t, r)
	if r.code != 1 || !strings.Contains(r.stderr, choose) || !strings.Contains(r.stderr, "no file written") {
		t.Errorf("-fix with choose.go read-only: code %d, stderr %q; want 1, the file named, nothing written", r.code, r.stderr)
	}
	if got, _ := os.ReadFile(filepath.Join(dir, "line", "fact.go")); string(got) != factFile {
		t.Errorf("fact.go was fixed alone:\n%s", got)
	}
	if err := os.Chmod(choose, 0o644); err != nil {
		t.Fatal(err)
	}
	r = runIn(t, dir, isolated, "-fix", "./...")
	if r.code != 0 {
		t.Fatalf("-fix: code %d\n%s", r.code, r.stderr)
	}
	if got, _ := os.ReadFile(choose); !strings.Contains(string(got), "lgamma.Choose(n, k)") {
		t.Errorf("the ratio was not rewritten:\n%s", got)
	}
	goBuild(t, dir)
}

// TestFixManyFindings gives one package more fixable findings than the
// fixer checks in one analysis (32): one -fix must still apply them all,
// so that a second one finds nothing to change.
func TestFixManyFindings(t *testing.T) {
	var src strings.Builder
	src.WriteString("package line\n")
	for i := 0; i < 45; i++ {
		fmt.Fprintf(&src, "\n// Mixes%d counts pallets of kind %d.\nfunc Mixes%d(n, k int) float64 {\n\treturn fact(n) / (fact(k) * fact(n-k))\n}\n", i, i, i)
	}
	dir := writeModule(t, map[string]string{"go.mod": helperGoMod(t), "line/fact.go": factFile, "line/mixes.go": src.String()})
	r := runIn(t, dir, isolated, "-fix", "./...")
	if r.code != 0 {
		t.Fatalf("-fix: code %d\n%s", r.code, r.stderr)
	}
	got, _ := os.ReadFile(filepath.Join(dir, "line", "mixes.go"))
	if n := strings.Count(string(got), "lgamma.Choose(n, k)"); n != 45 {
		t.Errorf("%d of 45 ratios rewritten by one -fix", n)
	}
	if again := runIn(t, dir, isolated, "-diff", "./..."); again.code != 0 || again.stdout != "" {
		t.Errorf("a second run still has fixes (code %d):\n%s%s", again.code, again.stdout, again.stderr)
	}
	goBuild(t, dir)
}

// TestFixConcurrentProcesses starts two -fix processes over one module
// at the same moment (repeat it with -count=N). Whichever writes first,
// the other either writes the same fixes or finds the files changed and
// writes nothing: at least one succeeds, every file parses, and the
// module builds. (TestFixConcurrentRuns in internal/driver forces the
// order where the second run applies its fixes after the first wrote.)
func TestFixConcurrentProcesses(t *testing.T) {
	if testing.Short() {
		t.Skip("runs -fix twice and builds the result")
	}
	files := map[string]string{"go.mod": helperGoMod(t), "line/fact.go": factFile, "line/choose.go": chooseFile, "line/a.go": loopFile}
	dir := writeModule(t, files)
	var wg sync.WaitGroup
	results := make([]result, 2)
	for i := range results {
		wg.Add(1)
		go func() {
			defer wg.Done()
			results[i] = runIn(t, dir, isolated, "-fix", "./...")
		}()
	}
	wg.Wait()
	ok := 0
	for i, r := range results {
		noPanic(t, r)
		switch {
		case r.code == 0:
			ok++
		case r.code != 1 || !strings.Contains(r.stderr, "changed since it was analysed"):
			t.Errorf("run %d: code %d\n%s", i, r.code, r.stderr)
		}
	}
	if ok == 0 {
		t.Errorf("neither run succeeded:\n%s%s", results[0].stderr, results[1].stderr)
	}
	for name, orig := range files {
		if !strings.HasSuffix(name, ".go") {
			continue
		}
		path := filepath.Join(dir, filepath.FromSlash(name))
		got, _ := os.ReadFile(path)
		if _, err := parser.ParseFile(token.NewFileSet(), path, got, 0); err != nil {
			t.Errorf("%s does not parse after two concurrent runs: %v\n%s", name, err, got)
		}
		if fixed := string(got) != orig; fixed != (name != "line/fact.go") {
			t.Errorf("%s: fixed %v by the run that succeeded; only fact.go has no fix", name, fixed)
		}
	}
	goBuild(t, dir)
}

// TestFixWithoutHelperModule runs -fix in a module that does not require
// the helper module, with no module proxy: the rewritten code could not
// build, so the run stops before anything is written, naming the
// helper module.
func TestFixWithoutHelperModule(t *testing.T) {
	dir := writeModule(t, map[string]string{"go.mod": goMod, "line/fact.go": factFile, "line/choose.go": chooseFile})
	r := runIn(t, dir, isolated, "-fix", "./...")
	noPanic(t, r)
	if r.code != 1 || !strings.Contains(r.stderr, "github.com/overfact/overfact/fixes/lgamma") || !strings.Contains(r.stderr, "Nothing was written") {
		t.Errorf("code %d, stderr %q; want 1, the helper's import named and nothing written", r.code, r.stderr)
	}
	for name, want := range map[string]string{"fact.go": factFile, "choose.go": chooseFile} {
		if got, _ := os.ReadFile(filepath.Join(dir, "line", name)); string(got) != want {
			t.Errorf("%s was written:\n%s", name, got)
		}
	}
}

// termsFile uses math only in two terms that two separate fixes rewrite:
// neither fix alone empties the import, both together do. Its counts are
// unsigned, so the rewrites need no test of their domain
// (fixes/domain.go), which would keep math's calls as written.
const termsFile = `package line

import "math"

// ufact is n! for the line's unsigned counts.
func ufact(n uint) float64 {
	r := 1.0
	for i := uint(2); i <= n; i++ {
		r *= float64(i)
	}
	return r
}

// Crates is the Erlang-style load term a^k/k! of the packing line.
func Crates(a float64, k uint) float64 {
	return math.Pow(a, float64(k)) / ufact(k)
}

// Pallets is the same term for the pallet wrapper.
func Pallets(b float64, k uint) float64 {
	return math.Pow(b, float64(k)) / ufact(k)
}
`

// TestFixEmptiedImport runs -fix where the fixes of one round together
// leave an import unused: the run drops it, so the fixed module builds,
// where it used to stop with "imported and not used" and write nothing.
func TestFixEmptiedImport(t *testing.T) {
	dir := writeModule(t, map[string]string{"go.mod": helperGoMod(t), "line/fact.go": factFile, "line/terms.go": termsFile})
	r := runIn(t, dir, isolated, "-fix", "./...")
	noPanic(t, r)
	if r.code != 0 {
		t.Fatalf("code %d, stderr %q; want 0", r.code, r.stderr)
	}
	got, _ := os.ReadFile(filepath.Join(dir, "line", "terms.go"))
	if strings.Contains(string(got), `"math"`) || !strings.Contains(string(got), "lgamma.PowOverFactorial(a, int(k))") || !strings.Contains(string(got), "lgamma.PowOverFactorial(b, int(k))") {
		t.Errorf("terms.go after -fix:\n%s", got)
	}
	goBuild(t, dir)
}
