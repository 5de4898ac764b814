package main

import (
	"encoding/json"
	"fmt"
	"path/filepath"
	"sort"
	"strconv"
	"strings"
	"testing"
)

// finding is one expected report: the file and line in the demo module
// and the category, definite or not.
type finding struct {
	file     string
	line     int
	category string
}

func (f finding) String() string { return fmt.Sprintf("%s:%d %s", f.file, f.line, f.category) }

// demoFindings lists, by hand from the code in testdata/demo, every
// finding the quick-start command must print. Each comment says why.
var demoFindings = []finding{
	// The for loop multiplies f by i: c! in float64 is +Inf from c = 171
	// and c is any int.
	{"staffing/erlang.go", 10, "factorial-loop"},
	// a^k/k! and a^c/c!, the Erlang B terms: the power and the factorial
	// overflow separately although the term is small.
	{"staffing/erlang.go", 22, "power-over-factorial"},
	{"staffing/erlang.go", 24, "power-over-factorial"},
	// n * fact(n-1) in int64 wraps from n = 21.
	{"sampling/plan.go", 13, "factorial-recursion"},
	// fact(n) / (fact(k) * fact(n-k)): the numerator wraps first.
	{"sampling/plan.go", 18, "factorial-ratio"},
	// The for loop forms w * (n-k+i) before dividing by i.
	{"sampling/plan.go", 36, "binomial-loop"},
	// Ways(bad, d) * Ways(lot-bad, n-d) / Ways(lot, n), the hypergeometric
	// probability, from three binomials that each break.
	{"sampling/plan.go", 47, "factorial-ratio"},
	// n * perms(n-1) in int.
	{"dice/odds.go", 10, "factorial-recursion"},
	// perms(n) / (perms(ones) * perms(sixes) * perms(n-ones-sixes)), the
	// multinomial.
	{"dice/odds.go", 17, "factorial-ratio"},
	// float64(perms(n)) converts a count that already wrapped in int.
	{"dice/odds.go", 24, "late-conversion"},
	// π^(d/2)/Γ(d/2+1): Γ is +Inf once d/2+1 passes 171.6, long before
	// the power overflows.
	{"gas/model.go", 11, "gamma-overflow"},
	// Γ(a+b)/(Γ(a)Γ(b)), the Beta normaliser.
	{"gas/model.go", 17, "gamma-ratio"},
	// Γ((k+3)/2)/Γ(3/2) for any int k.
	{"gas/model.go", 23, "gamma-ratio"},
	// The for loop builds k! in float64 for the Taylor terms.
	{"gas/model.go", 30, "factorial-loop"},
}

// demoSilent lists the safe look-alikes: lines that must carry no
// finding. Each comment says why they are safe.
var demoSilent = []finding{
	{"staffing/shift.go", 11, ""}, // the team is clamped to 8 before the loop: 8! = 40320
	{"staffing/shift.go", 12, ""},
	{"staffing/shift.go", 19, ""}, // constant small arguments
	{"sampling/label.go", 5, ""},  // fact(6), a constant
	{"sampling/label.go", 14, ""}, // guarded: 0 <= labels <= 5
	{"dice/odds.go", 33, ""},      // perms(6) / perms(6-n) with n in 1..6
	{"dice/odds.go", 36, ""},      // total *= 6, a power, not a factorial
	{"gas/model.go", 39, ""},      // BallVolume(3), a constant argument
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
	if r.code != 0 {
		t.Fatalf("-json run: code %d\n%s", r.code, r.stderr)
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
			f := finding{filepath.ToSlash(file), line, strings.TrimSuffix(d.Category, ".definite")}
			got[f] = append(got[f], d.Message)
		}
	}
	return got
}

func TestDemoFindings(t *testing.T) {
	got := demoReport(t)
	want := make(map[finding]bool)
	for _, f := range demoFindings {
		want[f] = true
		if len(got[f]) == 0 {
			t.Errorf("missing finding %s", f)
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
		for f, msgs := range got {
			if f.file == s.file && f.line == s.line && s.category == "" {
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
