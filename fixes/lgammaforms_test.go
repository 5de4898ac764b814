package fixes_test

import (
	"path/filepath"
	"slices"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"

	"github.com/overfact/overfact/analyzer"
	"github.com/overfact/overfact/fixes"
)

// lgammaPackages are the scenario packages of the three log-gamma
// categories (lgamma-digits, lgamma-integer, lgamma-overflow): the real
// analyzer's findings and fixes, against hand-written .golden files.
var lgammaPackages = []string{"lgammadigits", "lgammainteger", "lgammaoverflow"}

func init() {
	for name, shape := range map[string]fixes.Shape{
		"expchoose": fixes.ShapeExpChoose, "expbeta": fixes.ShapeExpBeta, "expgammaratio": fixes.ShapeExpGammaRatio,
		"expfactorial": fixes.ShapeExpFactorial, "expbinompmf": fixes.ShapeExpBinomialPMF,
	} {
		probeShapes[name] = shape
	}
}

// TestLgammaProbeGolden asks the fixer for the log-gamma rewrites of
// hand-described matches, right and wrong ones: a wrong argument, a
// factor outside the exponential and a pmf with a wrong power must be
// refused, the others rewritten as the hand-written golden file shows.
func TestLgammaProbeGolden(t *testing.T) {
	t.Parallel()
	dir := gopath(t, filepath.Join("testdata", "src"), "probelgamma")
	analysistest.RunWithSuggestedFixes(t, dir, probe, "probelgamma")
}

func TestLgammaGolden(t *testing.T) {
	t.Parallel()
	dir := gopath(t, filepath.Join("..", "testdata", "src"), lgammaPackages...)
	analysistest.RunWithSuggestedFixes(t, dir, analyzer.Analyzer, lgammaPackages...)
}

// lgammaDiffCases run the fixed log-gamma scenarios against math/big
// in TestDifferential. The grids reach where the original loses digits
// (past 1e-12 relative), reads a wrong integer (5! as 119) or overflows
// (exp(ln 171!) = +Inf).
var lgammaDiffCases = []diffCase{
	{pkg: "lgammadigits", fn: "Tickets", loops: []string{"n := 200; n <= 1000000; n = n*5/2", "k := 0; k <= 40 && k <= n; k += 3"}, args: "n, k", typ: "float64", ref: refChoose},
	{pkg: "lgammadigits", fn: "RegionalDraw", loops: []string{"n := 0; n <= 1000; n += 37", "k := 0; k <= n; k += 1 + n/17"}, args: "n, k", typ: "float64", ref: refChoose},
	{pkg: "lgammadigits", fn: "PoolShare", loops: []string{"a := 1; a <= 20000; a = a*3 + 1", "b := 1; b <= 300; b += 37"}, args: "float64(a), float64(b)", typ: "float64", ref: refBeta},
	{pkg: "lgammadigits", fn: "ExactHits", loops: []string{"n := 200; n <= 1000000; n = n*5/2", "k := 0; k <= 300 && k <= n; k += 1 + n/97"}, args: "k, n, 0.0625", typ: "float64", ref: refBinomialPMF},
	{pkg: "lgammainteger", fn: "RotaOrders", loops: []string{"n := 0; n <= 25; n++"}, args: "n", typ: "int", ref: refFactorial},
	{pkg: "lgammainteger", fn: "Teams", loops: []string{"n := 0; n <= 70; n++", "k := 0; k <= n; k++"}, args: "n, k", typ: "int64", ref: refChoose},
	{pkg: "lgammainteger", fn: "DeskOrders", loops: []string{"n := 0; n <= 175; n++"}, args: "n", typ: "float64", ref: refFactorial},
	{pkg: "lgammaoverflow", fn: "Redundancy", loops: []string{"n := 0; n <= 1100; n += 13", "k := 0; k <= n; k += 1 + n/19"}, args: "n, k", typ: "float64", ref: refChoose},
	{pkg: "lgammaoverflow", fn: "WearRatio", loops: []string{"a := 150; a <= 400; a += 17", "b := 150; b <= 400; b += 23"}, args: "float64(a), float64(b)", typ: "float64", ref: refGammaRatio},
}

// realAnalyzerPkg reports whether a testdata package is the real
// analyzer's (the repository's testdata) rather than the probe's.
func realAnalyzerPkg(p string) bool {
	return analyzerPackage(p) || slices.Contains(lgammaPackages, p)
}
