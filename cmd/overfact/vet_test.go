package main

import (
	"bytes"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"
)

// twoPackages is a module where the factorial lives in one package and
// the ratio that overflows in another, so that a finding in odds needs
// the fact exported by the analysis of fact.
var twoPackages = map[string]string{
	"go.mod": "module example.com/league\n\ngo 1.21\n",
	"fact/fact.go": `package fact

// Of returns n!.
func Of(n int) int {
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}
`,
	"odds/odds.go": `package odds

import "example.com/league/fact"

// Pairs is the number of ordered pairs among n players.
func Pairs(n int) int {
	return fact.Of(n) / fact.Of(n-2)
}
`,
}

// goTool runs the go command in dir.
func goTool(t *testing.T, dir string, args ...string) (stdout, stderr string, err error) {
	t.Helper()
	cmd := exec.Command("go", args...)
	cmd.Dir = dir
	cmd.Env = append(os.Environ(), isolated...)
	var out, errb bytes.Buffer
	cmd.Stdout, cmd.Stderr = &out, &errb
	err = cmd.Run()
	return out.String(), errb.String(), err
}

// TestGoVet runs go vet with overfact as its vet tool. go vet analyses
// each package separately, passing facts between them in files, so the
// finding on the ratio in odds (line 7) shows that the fact about
// fact.Of crossed the package boundary.
func TestGoVet(t *testing.T) {
	if testing.Short() {
		t.Skip("runs go vet")
	}
	dir := writeModule(t, twoPackages)
	_, stderr, err := goTool(t, dir, "vet", "-vettool="+overfactBin, "./...")
	if err == nil {
		t.Fatalf("go vet succeeded; want findings\n%s", stderr)
	}
	if !strings.Contains(stderr, filepath.Join("odds", "odds.go")+":7:") {
		t.Errorf("go vet output lacks the ratio at odds/odds.go:7:\n%s", stderr)
	}
	if !strings.Contains(stderr, filepath.Join("fact", "fact.go")+":") {
		t.Errorf("go vet output lacks the factorial loop in fact/fact.go:\n%s", stderr)
	}
}

// TestGoFix runs go fix with overfact as its fix tool, first with -diff
// (nothing written), then for real.
func TestGoFix(t *testing.T) {
	if testing.Short() {
		t.Skip("runs go fix")
	}
	dir := writeModule(t, twoPackages)
	stdout, stderr, err := goTool(t, dir, "fix", "-fixtool="+overfactBin, "-diff", "./...")
	if strings.Contains(stderr, "flag provided but not defined") || strings.Contains(stderr, "unsupported") {
		t.Fatalf("go fix -diff rejected the tool: %v\n%s", err, stderr)
	}
	if stdout == "" {
		t.Skipf("no fix offered for the two-package module (go fix: %v)\n%s", err, stderr)
	}
	if !strings.Contains(stdout, "odds.go") || !strings.Contains(stdout, "+") {
		t.Errorf("go fix -diff printed no change to odds.go:\n%s", stdout)
	}
	before, _ := os.ReadFile(filepath.Join(dir, "odds", "odds.go"))
	if string(before) != twoPackages["odds/odds.go"] {
		t.Errorf("go fix -diff changed odds.go")
	}
	if _, stderr, err := goTool(t, dir, "fix", "-fixtool="+overfactBin, "./..."); err != nil {
		t.Fatalf("go fix: %v\n%s", err, stderr)
	}
	after, _ := os.ReadFile(filepath.Join(dir, "odds", "odds.go"))
	if string(after) == string(before) {
		t.Errorf("go fix left odds.go unchanged")
	}
}
