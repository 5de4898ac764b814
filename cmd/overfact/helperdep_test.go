package main

import (
	"os"
	"path/filepath"
	"strings"
	"testing"

	"golang.org/x/mod/modfile"
)

// A user module of the bottling-line scenario that does not require the
// helper: Plans divides factorials, a finding whose fix calls
// lgamma.MustChooseInt64. Its test checks values from OEIS.
var planModule = map[string]string{
	"go.mod": "module example.com/bottling\n\ngo 1.21\n",
	"plan/plan.go": `// Package plan counts acceptance-sampling plans.
package plan

func fact(n int64) int64 {
	r := int64(1)
	for i := int64(2); i <= n; i++ {
		r *= i
	}
	return r
}

// Plans is the number of ways to pick k of n crates for inspection.
func Plans(n, k int64) int64 {
	return fact(n) / (fact(k) * fact(n-k))
}
`,
	"plan/plan_test.go": `package plan

import "testing"

// C(2n, n), OEIS A000984; 30! and 60! no longer fit int64, C(60, 30)
// still does.
func TestPlans(t *testing.T) {
	for _, c := range []struct{ n, k, want int64 }{
		{20, 10, 184756}, {30, 15, 155117520}, {60, 30, 118264581564861424},
	} {
		if got := Plans(c.n, c.k); got != c.want {
			t.Errorf("Plans(%d, %d) = %d, want %d", c.n, c.k, got, c.want)
		}
	}
}
`,
}

// snapshot reads every file under dir.
func snapshot(t *testing.T, dir string) map[string]string {
	t.Helper()
	files := make(map[string]string)
	err := filepath.WalkDir(dir, func(path string, d os.DirEntry, err error) error {
		if err != nil || d.IsDir() {
			return err
		}
		data, err := os.ReadFile(path)
		files[path] = string(data)
		return err
	})
	if err != nil {
		t.Fatal(err)
	}
	return files
}

// requirement returns the version and indirect mark of the module's
// requirement on the helper, or "" when it has none.
func requirement(t *testing.T, dir string) (version string, indirect bool) {
	t.Helper()
	data, err := os.ReadFile(filepath.Join(dir, "go.mod"))
	if err != nil {
		t.Fatal(err)
	}
	f, err := modfile.Parse("go.mod", data, nil)
	if err != nil {
		t.Fatal(err)
	}
	for _, r := range f.Require {
		if r.Mod.Path == helperPath {
			return r.Mod.Version, r.Indirect
		}
	}
	return "", false
}

// run runs the installed command.
func (r *release) run(t *testing.T, dir string, env []string, args ...string) result {
	t.Helper()
	return runBinary(t, r.bin, dir, env, args...)
}

// TestFixAddsHelper runs -fix, with the command installed from the
// release proxy, on a module that does not require the helper: the
// command adds the requirement at its own version, and the fixed module
// builds and passes its tests, which fail before the fix. The -fix runs
// of these tests leave out test files (-test=false), which hold nothing
// to fix and would only add the testing package's dependencies to the
// analysis.
func TestFixAddsHelper(t *testing.T) {
	r := published(t)
	dir := writeModule(t, planModule)
	env := r.env(t.TempDir())
	if out, err := goCmd(dir, env, "test", "./..."); err == nil {
		t.Fatalf("the module's test passes before the fix; it tests nothing:\n%s", out)
	}
	res := r.run(t, dir, env, "-fix", "-test=false", "./...")
	if res.code != 0 {
		t.Fatalf("-fix: code %d\n%s", res.code, res.stderr)
	}
	t.Logf("stderr:\n%s", res.stderr)
	if !strings.Contains(res.stderr, helperPath) {
		t.Errorf("-fix did not say it added %s:\n%s", helperPath, res.stderr)
	}
	if v, indirect := requirement(t, dir); v != releaseVersion || indirect {
		t.Errorf("go.mod requires the helper at %q (indirect %v), want %s, direct", v, indirect, releaseVersion)
	}
	if out, err := goCmd(dir, env, "test", "./..."); err != nil {
		t.Errorf("the fixed module's tests fail: %v\n%s", err, out)
	}
}

// TestFixHelperUnavailable runs -fix where the helper cannot be fetched:
// no proxy and an empty module cache, and GOFLAGS=-mod=vendor. Nothing
// may be written, the exit code is 1, and the message names the helper
// module and the command that adds it.
func TestFixHelperUnavailable(t *testing.T) {
	r := published(t)
	for _, tt := range []struct {
		name  string
		extra []string
		want  string
	}{
		{"GOPROXY=off", []string{"GOPROXY=off"}, "go get " + helperPath + "@" + releaseVersion},
		{"GOFLAGS=-mod=vendor", []string{"GOFLAGS=-mod=vendor"}, "go mod vendor"},
	} {
		t.Run(tt.name, func(t *testing.T) {
			dir := writeModule(t, planModule)
			before := snapshot(t, dir)
			res := r.run(t, dir, r.env(t.TempDir(), tt.extra...), "-fix", "-test=false", "./...")
			if res.code != 1 || !strings.Contains(res.stderr, helperPath) || !strings.Contains(res.stderr, tt.want) {
				t.Errorf("-fix: code %d, stderr:\n%s\nwant 1 and a message naming %s and %q", res.code, res.stderr, helperPath, tt.want)
			}
			t.Logf("stderr:\n%s", res.stderr)
			after := snapshot(t, dir)
			for name, content := range after {
				if before[name] != content {
					t.Errorf("%s was written", name)
				}
			}
			if len(after) != len(before) {
				t.Errorf("%d files before, %d after", len(before), len(after))
			}
		})
	}
}

// TestHelperCopy keeps the helper inside the user's module: "overfact
// helper" copies it, from the proxy or from a checkout (-from), and wires
// it with a relative replace; -fix then works with no proxy at all, and
// the fixed module's tests pass.
func TestHelperCopy(t *testing.T) {
	r := published(t)
	for _, tt := range []struct {
		name  string
		env   []string
		extra []string
	}{
		{"from the proxy", nil, nil},
		{"from a checkout", []string{"GOPROXY=off"}, []string{"-from", filepath.Join(repoRoot(t), "fixes", "lgamma")}},
	} {
		t.Run(tt.name, func(t *testing.T) {
			dir := writeModule(t, planModule)
			gopath := t.TempDir()
			res := r.run(t, dir, r.env(gopath, tt.env...), append(append([]string{"helper"}, tt.extra...), "third_party/lgamma")...)
			if res.code != 0 {
				t.Fatalf("overfact helper: code %d\n%s", res.code, res.stderr)
			}
			t.Logf("stdout:\n%s", res.stdout)
			if _, err := os.Stat(filepath.Join(dir, "third_party", "lgamma", "go.mod")); err != nil {
				t.Fatalf("no copy of the helper: %v", err)
			}
			data, _ := os.ReadFile(filepath.Join(dir, "go.mod"))
			if !strings.Contains(string(data), "=> ./third_party/lgamma") {
				t.Errorf("go.mod has no relative replace:\n%s", data)
			}
			offline := r.env(t.TempDir(), "GOPROXY=off")
			if res := r.run(t, dir, offline, "-fix", "-test=false", "./..."); res.code != 0 {
				t.Fatalf("-fix with the copy and GOPROXY=off: code %d\n%s", res.code, res.stderr)
			}
			if out, err := goCmd(dir, offline, "test", "./..."); err != nil {
				t.Errorf("the fixed module's tests fail: %v\n%s", err, out)
			}
			if res := r.run(t, dir, offline, "helper"); res.code != 1 || !strings.Contains(res.stderr, "already exists") {
				t.Errorf("a second overfact helper: code %d, stderr %q; want 1, the copy exists", res.code, res.stderr)
			}
		})
	}
}

// TestHelperReleaseMatchesGoMod keeps the helper version of a build from
// a checkout equal to the one the root go.mod requires.
func TestHelperReleaseMatchesGoMod(t *testing.T) {
	if v, _ := requirement(t, repoRoot(t)); v != helperRelease {
		t.Errorf("go.mod requires %s %s, helperRelease is %s; docs/release.md moves both", helperPath, v, helperRelease)
	}
}
