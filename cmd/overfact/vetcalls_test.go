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
