package main

import (
	"encoding/json"
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"sort"
	"strconv"
	"strings"
	"testing"
)

// finding is one expected report: the file and line in the demo module
// and the category. Every finding of the demo depends on an input nothing
// bounds, so its category is the bare pattern, except where the comment
// says the overflow is certain (the ".definite" form).
type finding struct {
	file     string
	line     int
	category string
}

func (f finding) String() string { return fmt.Sprintf("%s:%d %s", f.file, f.line, f.category) }

// expected is a finding with a piece of its line, so that an edit of
// the demo that moves the line fails the test rather than the finding.
type expected struct {
	finding
	code string
}

// demoFindings lists, by hand from the code in testdata/demo, every
// finding the quick-start command must print. Each comment says why.
var demoFindings = []expected{
	// a^k/k! and a^c/c!, the Erlang B terms: the power and the factorial
	// overflow separately although the term is small.
	{finding{"staffing/erlang.go", 22, "power-over-factorial"}, "math.Pow(a, float64(k)) / factorial(k)"},
	{finding{"staffing/erlang.go", 24, "power-over-factorial"}, "math.Pow(a, float64(c)) / factorial(c)"},
	// ErlangC returns c·B/(c − a(1 − B)) of ErlangB's value, NaN where
	// ErlangB's is.
	{finding{"staffing/erlang.go", 30, "wrong-callee"}, "ErlangB(c, a)"},
	// n * fact(n-1) in int64 wraps from n = 21.
	{finding{"sampling/plan.go", 13, "factorial-recursion"}, "n * fact(n-1)"},
	// fact(n) / (fact(k) * fact(n-k)): the numerator wraps first.
	{finding{"sampling/plan.go", 18, "factorial-ratio"}, "fact(n) / (fact(k) * fact(n-k))"},
	// C(n,d)·p^d·(1−p)^(n−d), the binomial probability, with C(n, d)
	// from Choose, whose ratio of factorials wraps from n = 21.
	{finding{"sampling/plan.go", 27, "factorial-ratio"}, "float64(Choose(int64(n), int64(d)))"},
	// The for loop forms w * (n-k+i) before dividing by i.
	{finding{"sampling/plan.go", 36, "binomial-loop"}, "for i := 1; i <= k; i++"},
	// Ways(bad, d) * Ways(lot-bad, n-d) / Ways(lot, n), the hypergeometric
	// probability, from three binomials that each break.
	{finding{"sampling/plan.go", 47, "factorial-ratio"}, "float64(Ways(lot, n))"},
	// n * perms(n-1) in int.
	{finding{"dice/odds.go", 10, "factorial-recursion"}, "n * perms(n-1)"},
	// perms(n) / (perms(ones) * perms(sixes) * perms(n-ones-sixes)), the
	// multinomial.
	{finding{"dice/odds.go", 17, "factorial-ratio"}, "perms(n) / (perms(ones)"},
	// float64(perms(n)) converts a count that already wrapped in int.
	{finding{"dice/odds.go", 24, "late-conversion"}, "float64(perms(n))"},
	// perms(24): 24 ≥ 21 whatever the input, the one definite finding.
	{finding{"dice/odds.go", 46, "factorial-call.definite"}, "perms(24)"},
	// π^(d/2)/Γ(d/2+1): Γ is +Inf once d/2+1 passes 171.6, long before
	// the power overflows.
	{finding{"gas/model.go", 11, "gamma-overflow"}, "math.Gamma(d/2+1)"},
	// Γ(a+b)/(Γ(a)Γ(b)), the Beta normaliser.
	{finding{"gas/model.go", 17, "gamma-ratio"}, "math.Gamma(a+b) / (math.Gamma(a) * math.Gamma(b))"},
	// Γ((k+3)/2)/Γ(3/2) for any int k.
	{finding{"gas/model.go", 23, "gamma-ratio"}, "math.Gamma(float64(k+3)/2)"},
	// The for loop builds k! in float64 for the Taylor terms.
	{finding{"gas/model.go", 30, "factorial-loop"}, "for k := 1; k <= terms; k++"},
}

// lookAlike is a line of safe code that must carry no finding; code is
// a piece of the line, so that an edit of the demo that moves it fails
// the test instead of making it vacuous.
type lookAlike struct {
	file string
	line int
	code string
}

// demoSilent lists the safe look-alikes. Each comment says why they are
// safe.
var demoSilent = []lookAlike{
	{"staffing/shift.go", 11, "for i := 2; i <= team; i++"}, // team is clamped to 8 before the loop: 8! = 40320
	{"staffing/shift.go", 12, "orders *= i"},
	{"staffing/shift.go", 19, "shiftOrders(4) * shiftOrders(4)"}, // constant small arguments
	{"sampling/label.go", 6, "fact(6)"},                          // the factorial of a small constant
	{"sampling/label.go", 16, "fact(labels)"},                    // guarded: 0 <= labels <= 5
	{"dice/odds.go", 33, "perms(6) / perms(6-n)"},                // n in 1..6
	{"dice/odds.go", 36, "total *= 6"},                           // a power, not a factorial
	{"gas/model.go", 40, "math.Gamma(2.5)"},                      // constant arguments
	// factorial returns its float64 c! as it is: +Inf from c = 171 is the
	// IEEE value of a c! beyond float64, not a wrong one; the Erlang terms
	// that divide by it (lines 22 and 24) are the findings.
	{"staffing/erlang.go", 10, "for i := 2; i <= c; i++"},
}

// demoLine returns line n of a demo file.
func demoLine(t *testing.T, file string, n int) string {
	t.Helper()
	data, err := os.ReadFile(filepath.Join(repoRoot(t), "testdata", "demo", filepath.FromSlash(file)))
	if err != nil {
		t.Fatal(err)
	}
	lines := strings.Split(string(data), "\n")
	if n < 1 || n > len(lines) {
		t.Fatalf("%s has no line %d", file, n)
	}
	return lines[n-1]
}

type jsonDiagnostic struct {
	Category string `json:"category"`
	Posn     string `json:"posn"`
	Message  string `json:"message"`
}

// demoReport runs the quick-start command with -json and returns the
// findings keyed by file (relative to the demo) and line.
func demoReport(t *testing.T) map[finding][]string {
	t.Helper()
	root := repoRoot(t)
	demo := filepath.Join(root, "testdata", "demo")
	r := runIn(t, root, nil, "-C", filepath.Join("testdata", "demo"), "-json", "./...")
	if r.code != 3 {
		t.Fatalf("-json run: code %d, want 3 (findings)\n%s", r.code, r.stderr)
	}
	var tree map[string]map[string]json.RawMessage
	if err := json.Unmarshal([]byte(r.stdout), &tree); err != nil {
		t.Fatalf("decoding -json output: %v\n%s", err, r.stdout)
	}
	got := make(map[finding][]string)
	for pkg, byAnalyzer := range tree {
		var diags []jsonDiagnostic
		if err := json.Unmarshal(byAnalyzer["overfact"], &diags); err != nil {
			t.Fatalf("package %s: %s", pkg, byAnalyzer["overfact"])
		}
		for _, d := range diags {
			// posn is file:line:col with an absolute file name.
			parts := strings.Split(d.Posn, ":")
			line, _ := strconv.Atoi(parts[len(parts)-2])
			file, _ := filepath.Rel(demo, strings.Join(parts[:len(parts)-2], ":"))
			f := finding{filepath.ToSlash(file), line, d.Category}
			got[f] = append(got[f], d.Message)
		}
	}
	return got
}

func TestDemoFindings(t *testing.T) {
	got := demoReport(t)
	want := make(map[finding]bool)
	for _, e := range demoFindings {
		if l := demoLine(t, e.file, e.line); !strings.Contains(l, e.code) {
			t.Errorf("%s:%d is %q, not %q: update the test", e.file, e.line, l, e.code)
		}
		want[e.finding] = true
		if len(got[e.finding]) == 0 {
			t.Errorf("missing finding %s", e.finding)
		}
	}
	var extra []string
	for f, msgs := range got {
		if !want[f] {
			extra = append(extra, fmt.Sprintf("%s: %s", f, strings.Join(msgs, "; ")))
		}
	}
	sort.Strings(extra)
	for _, e := range extra {
		t.Errorf("unexpected finding %s", e)
	}
	for _, s := range demoSilent {
		if l := demoLine(t, s.file, s.line); !strings.Contains(l, s.code) {
			t.Errorf("%s:%d is %q, not the look-alike %q: update the test", s.file, s.line, l, s.code)
		}
		for f, msgs := range got {
			if f.file == s.file && f.line == s.line {
				t.Errorf("safe look-alike %s:%d reported: %v", s.file, s.line, msgs)
			}
		}
	}
}

// TestDemoText checks the text form of the quick-start command: exit
// code 3 and one file:line:col: message line per finding.
func TestDemoText(t *testing.T) {
	root := repoRoot(t)
	r := runIn(t, root, nil, "-C", filepath.Join("testdata", "demo"), "./...")
	if r.code != 3 {
		t.Fatalf("exit code %d, want 3 (findings)\n%s", r.code, r.stderr)
	}
	for _, l := range strings.Split(strings.TrimSpace(r.stderr), "\n") {
		parts := strings.SplitN(l, ":", 4)
		if len(parts) != 4 || !strings.HasSuffix(parts[0], ".go") || filepath.IsAbs(parts[0]) {
			t.Errorf("line %q is not relative-file:line:col: message", l)
		}
	}
}

// TestDemoDiff runs the second quick-start command.
func TestDemoDiff(t *testing.T) {
	root := repoRoot(t)
	r := runIn(t, root, nil, "-C", filepath.Join("testdata", "demo"), "-diff", "./...")
	if r.stdout == "" {
		t.Skipf("no fixes offered for the demo yet (code %d)\n%s", r.code, r.stderr)
	}
	if r.code != 3 || !strings.Contains(r.stdout, "--- a/") || !strings.Contains(r.stdout, "+++ b/") {
		t.Errorf("-diff: code %d, output:\n%s", r.code, r.stdout)
	}
}

// copyTree copies the regular files under src to dst.
func copyTree(t *testing.T, src, dst string) {
	t.Helper()
	err := filepath.WalkDir(src, func(path string, d os.DirEntry, err error) error {
		if err != nil {
			return err
		}
		rel, _ := filepath.Rel(src, path)
		target := filepath.Join(dst, rel)
		if d.IsDir() {
			return os.MkdirAll(target, 0o755)
		}
		data, err := os.ReadFile(path)
		if err != nil {
			return err
		}
		return os.WriteFile(target, data, 0o644)
	})
	if err != nil {
		t.Fatal(err)
	}
}

// TestDemoFixBuilds applies the fixes to a copy of the demo, laid out
// as in the repository so that its replace directive finds the helper
// module, and checks that the fixed code builds and that the findings
// whose fixes were applied are gone.
func TestDemoFixBuilds(t *testing.T) {
	if testing.Short() {
		t.Skip("builds the fixed demo")
	}
	root := repoRoot(t)
	tmp := t.TempDir()
	copyTree(t, filepath.Join(root, "testdata", "demo"), filepath.Join(tmp, "testdata", "demo"))
	copyTree(t, filepath.Join(root, "fixes", "lgamma"), filepath.Join(tmp, "fixes", "lgamma"))
	demo := filepath.Join(tmp, "testdata", "demo")
	env := []string{"GOFLAGS=", "GOPROXY=off"} // the demo has its own go.work

	before := runIn(t, demo, env, "./...")
	fix := runIn(t, demo, env, "-fix", "./...")
	if fix.code != 0 {
		t.Fatalf("-fix: code %d\n%s", fix.code, fix.stderr)
	}
	cmd := exec.Command("go", "build", "./...")
	cmd.Dir = demo
	cmd.Env = append(os.Environ(), env...)
	if out, err := cmd.CombinedOutput(); err != nil {
		t.Fatalf("the fixed demo does not build: %v\n%s", err, out)
	}
	after := runIn(t, demo, env, "./...")
	nb, na := strings.Count(before.stderr, "\n")-strings.Count(before.stderr, ": \t"), strings.Count(after.stderr, "\n")-strings.Count(after.stderr, ": \t")
	if na >= nb {
		t.Errorf("%d findings before -fix, %d after; want fewer\n%s", nb, na, after.stderr)
	}
}
