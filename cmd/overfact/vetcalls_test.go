package main

import (
	"path/filepath"
	"strings"
	"testing"
)

// calcPackages is a module where a binomial helper built from float
// factorials lives in one package and the probability that relies on it
// in another: the finding in pmf needs the ValueFact of calc.Choose,
// exported by the analysis of calc and read by the analysis of pmf.
var calcPackages = map[string]string{
	"go.mod": "module example.com/orchard\n\ngo 1.21\n",
	"calc/calc.go": `package calc

// Fact returns n! of a whole number held in a float64.
func Fact(n float64) float64 {
	v := 1.0
	for i := 2.0; i <= n; i++ {
		v *= i
	}
	return v
}

// Choose returns C(n, k).
func Choose(n, k float64) float64 {
	return Fact(n) / (Fact(k) * Fact(n-k))
}
`,
	"pmf/pmf.go": `package pmf

import (
	"math"

	"example.com/orchard/calc"
)

// Blight is the chance that k of n trees are blighted.
func Blight(k, n, p float64) float64 {
	return calc.Choose(n, k) * math.Pow(p, k) * math.Pow(1-p, n-k)
}
`,
}

// TestGoVetValueFacts runs go vet with overfact as its vet tool on
// calcPackages: go vet analyses calc and pmf in separate processes, so
// the finding on Blight's probability (pmf/pmf.go:11) shows that the
// value of calc.Choose and the factorial inside it that breaks crossed
// the package boundary.
func TestGoVetValueFacts(t *testing.T) {
	if testing.Short() {
		t.Skip("runs go vet")
	}
	dir := writeModule(t, calcPackages)
	_, stderr, err := goTool(t, dir, "vet", "-vettool="+overfactBin, "./...")
	if err == nil {
		t.Fatalf("go vet succeeded; want findings\n%s", stderr)
	}
	want := filepath.Join("pmf", "pmf.go") + ":11:"
	if !strings.Contains(stderr, want) || !strings.Contains(stderr, "Blight computes C(n, k)") || !strings.Contains(stderr, "calc.Choose(n, k) already is +Inf or NaN from n = 171") {
		t.Errorf("go vet output lacks the probability at %s over calc.Choose:\n%s", want, stderr)
	}
}

// tablePackages is a module whose binomial helper answers small inputs
// from a table and the rest from log-gamma, and whose log binomial is
// a sum of log-gamma values; their callers live in another package.
var tablePackages = map[string]string{
	"go.mod": "module example.com/seedlab\n\ngo 1.21\n",
	"tally/tally.go": `package tally

import "math"

var small = [21]int64{1, 1, 2, 6, 24, 120, 720, 5040, 40320, 362880, 3628800}

// Choose returns C(n, k), exact from the table for n <= 10.
func Choose(n, k int) float64 {
	if k < 0 || n < k {
		return 0
	}
	if n <= 10 {
		return float64(small[n] / (small[k] * small[n-k]))
	}
	return math.Exp(Lchoose(n, k))
}

// Lchoose returns ln C(n, k).
func Lchoose(n, k int) float64 {
	a, _ := math.Lgamma(float64(n + 1))
	b, _ := math.Lgamma(float64(k + 1))
	c, _ := math.Lgamma(float64(n - k + 1))
	return a - b - c
}
`,
	"trial/trial.go": `package trial

import (
	"math"

	"example.com/seedlab/tally"
)

// Share is the share of the orderings of two seed lots, given a count.
func Share(count float64, n1, n2 int) float64 {
	return count / tally.Choose(n1+n2, n1)
}

// Sprouts is the chance that k of n seeds sprout.
func Sprouts(k, n int, p float64) float64 {
	return math.Exp(tally.Lchoose(n, k)) * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k))
}
`,
}

// TestGoVetTableAndLogFacts runs go vet over tablePackages: the
// findings in trial need the value of tally.Choose past its table and
// the logarithm tally.Lchoose returns, both passed between packages.
// The helper itself overflows nowhere: its one finding is the digits
// its exponential of Lchoose's log-gamma sum loses (lgamma-digits, read
// through Lchoose's fact), which trial's exponential of tally.Lchoose
// loses too.
func TestGoVetTableAndLogFacts(t *testing.T) {
	if testing.Short() {
		t.Skip("runs go vet")
	}
	dir := writeModule(t, tablePackages)
	_, stderr, err := goTool(t, dir, "vet", "-vettool="+overfactBin, "./...")
	if err == nil {
		t.Fatalf("go vet succeeded; want findings\n%s", stderr)
	}
	for _, want := range []string{
		filepath.Join("trial", "trial.go") + ":11:9: divides by C(n1 + n2, n1) formed on its own",
		filepath.Join("trial", "trial.go") + ":16:9: computes the binomial probability C(n, k)",
		filepath.Join("trial", "trial.go") + ":16:9: math.Exp of log-gamma values computes C(n, k)·p^k·(1−p)^(-k + n) from 3 log-gamma values",
		filepath.Join("tally", "tally.go") + ":15:9: math.Exp of log-gamma values computes C(n, k) from 3 log-gamma values",
	} {
		if !strings.Contains(stderr, want) {
			t.Errorf("go vet output lacks %q:\n%s", want, stderr)
		}
	}
	if strings.Count(stderr, filepath.Join("tally", "tally.go")) != 1 {
		t.Errorf("go vet reports the helper for more than its digits:\n%s", stderr)
	}
}
