package main

import (
	"encoding/json"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// lineModule has files whose //line directives point elsewhere: parse's
// to a grammar that is not there (a generator run on another machine),
// tmpl's to a template that is, after its first lines.
var lineModule = map[string]string{
	"go.mod": goMod,
	"parse/parse.go": `package parse

// Orders is the number of orders of n crates.
func Orders(n int) int {
	r := 1
//line grammar.y:102
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}
`,
	"tmpl/tmpl.go": `package tmpl

func fact(n int) int {
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}

// Plans is the number of ways to pick k of n crates.
func Plans(n, k int) int {
//line orders.tmpl:3:1
	return fact(n) / (fact(k) * fact(n-k))
}
`,
	"tmpl/orders.tmpl": "plans\n\n{{ choose n k }}\n",
}

// TestLineDirectives checks that a finding under a //line directive is
// reported at the mapped file only when that file exists, with a column
// in SARIF that is at least 1, that the SARIF log carries every finding
// the text output does, that -json follows the same rule, and that -fix
// never edits the mapped file.
func TestLineDirectives(t *testing.T) {
	dir := writeModule(t, lineModule)
	r := runIn(t, dir, isolated, "./...")
	noPanic(t, r)
	for _, want := range []string{filepath.Join("parse", "parse.go") + ":7:2: factorial of n", filepath.Join("tmpl", "orders.tmpl") + ":3:9: binomial coefficient"} {
		if !strings.Contains(r.stderr, want) {
			t.Errorf("text output lacks %q:\n%s", want, r.stderr)
		}
	}
	if strings.Contains(r.stderr, "grammar.y") || strings.Contains(r.stderr, ":0:") {
		t.Errorf("text output names the missing file or a column 0:\n%s", r.stderr)
	}
	textFindings := strings.Count(r.stderr, "\n") - strings.Count(r.stderr, ": \t")

	s := runIn(t, dir, isolated, "-sarif", "-", "./...")
	noPanic(t, s)
	if s.code != 3 || s.stderr != r.stderr {
		t.Errorf("-sarif: code %d, stderr differs from the text run:\n%s", s.code, s.stderr)
	}
	var log struct {
		Runs []struct {
			Results []struct {
				Locations []struct {
					PhysicalLocation struct {
						ArtifactLocation struct{ URI string }
						Region           map[string]int
					}
				}
			}
		}
	}
	if err := json.Unmarshal([]byte(s.stdout), &log); err != nil || len(log.Runs) != 1 {
		t.Fatalf("bad SARIF log (%v):\n%s", err, s.stdout)
	}
	res := log.Runs[0].Results
	if len(res) != textFindings || textFindings == 0 {
		t.Errorf("%d SARIF results for %d text findings", len(res), textFindings)
	}
	for _, rs := range res {
		loc := rs.Locations[0].PhysicalLocation
		if strings.Contains(loc.ArtifactLocation.URI, "grammar.y") {
			t.Errorf("SARIF result in the missing file: %+v", loc)
		}
		for _, k := range []string{"startColumn", "endColumn"} {
			if c, ok := loc.Region[k]; ok && c < 1 {
				t.Errorf("SARIF %s %d in %+v", k, c, loc)
			}
		}
	}

	j := runIn(t, dir, isolated, "-json", "./...")
	noPanic(t, j)
	if strings.Contains(j.stdout, "grammar.y") || !strings.Contains(j.stdout, "parse.go:7:2") || !strings.Contains(j.stdout, "orders.tmpl:3:9") {
		t.Errorf("-json names the missing file, or not the compiled one and the existing mapped one:\n%s", j.stdout)
	}

	f := runIn(t, dir, isolated, "-fix", "./...")
	noPanic(t, f)
	if strings.Contains(f.stderr, "orders.tmpl") {
		t.Errorf("-fix touched the mapped file:\n%s", f.stderr)
	}
	if got, _ := os.ReadFile(filepath.Join(dir, "tmpl", "orders.tmpl")); string(got) != lineModule["tmpl/orders.tmpl"] {
		t.Errorf("-fix changed orders.tmpl:\n%s", got)
	}
}
