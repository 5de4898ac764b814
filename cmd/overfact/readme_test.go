package main

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// TestReadmeFixClaims checks what the README says is fixed and what is
// only reported, on the README's own examples: the Student-t constant
// as usually written is reported with no fix and, written as a quotient
// of two Γ values divided by the square root, is fixed to GammaRatio; a
// falling factorial loop counting up becomes MustFallingInt64 (under
// if k > 0, since k may be negative) and one
// counting down is reported with no fix. Each snippet must appear in the
// README as it is checked here.
func TestReadmeFixClaims(t *testing.T) {
	root := repoRoot(t)
	readme, err := os.ReadFile(filepath.Join(root, "README.md"))
	if err != nil {
		t.Fatal(err)
	}
	const (
		studentT   = "math.Gamma((v+1)/2) / (math.Sqrt(v*math.Pi) * math.Gamma(v/2))"
		studentT2  = "math.Gamma((v+1)/2) / math.Gamma(v/2) / math.Sqrt(v*math.Pi)"
		studentFix = "lgamma.GammaRatio((v+1)/2, v/2) / math.Sqrt(v*math.Pi)"
		fallUp     = "for i := int64(0); i < k; i++ { r *= n - i }"
		fallUpFix  = "lgamma.MustFallingInt64(n, k)"
		fallDown   = "for i := n; i > n-k; i-- { r *= i }"
	)
	for _, s := range []string{studentT, studentT2, studentFix, fallUp, fallUpFix, fallDown} {
		if !strings.Contains(string(readme), s) {
			t.Errorf("README.md does not show %q", s)
		}
	}
	helper := filepath.Join(root, "fixes", "lgamma")
	dir := writeModule(t, map[string]string{
		"go.mod": "module example.com/lab\n\ngo 1.21\n\nrequire " + helperPath + " v0.0.0\n\nreplace " + helperPath + " => " + helper + "\n",
		"stats/stats.go": `// Package stats holds a lab's distribution constants.
package stats

import "math"

// TConst is the Student-t normalising constant.
func TConst(v float64) float64 {
	return ` + studentT + `
}

// TConst2 is the same constant, divided in another order.
func TConst2(v float64) float64 {
	return ` + studentT2 + `
}

// Up is n(n-1)…(n-k+1), counting its factors up.
func Up(n, k int64) int64 {
	r := int64(1)
	` + fallUp + `
	return r
}

// Down is n(n-1)…(n-k+1), counting its factors down.
func Down(n, k int64) int64 {
	r := int64(1)
	` + fallDown + `
	return r
}
`,
	})
	report := runIn(t, dir, isolated, "./...")
	for _, line := range []string{"stats.go:8:", "stats.go:13:", "stats.go:19:", "stats.go:26:"} {
		if !strings.Contains(report.stderr, line) {
			t.Errorf("no finding at %s:\n%s", line, report.stderr)
		}
	}
	diff := runIn(t, dir, isolated, "-diff", "./...").stdout
	for _, tt := range []struct {
		line  string
		fixed bool
	}{{studentT, false}, {"return " + studentFix, true}, {"\tr = " + fallUpFix, true}, {fallDown, false}} {
		changed := strings.Contains(diff, "+\t"+tt.line) || strings.Contains(diff, "-\t"+tt.line)
		if changed != tt.fixed {
			t.Errorf("%q: in the diff %v, want %v\n%s", tt.line, changed, tt.fixed, diff)
		}
	}
}
