package analyzer

import (
	"regexp"
	"strconv"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"

	"github.com/overfact/overfact/analyzer/thresholds"
)

// TestLgammaToleranceFlag runs the analyzer with -lgamma-tolerance=1e-6,
// as go vet and the command pass it: a census of at most 10⁶ households
// is then within tolerance, and the unbounded one is reported from the
// first n where the error bound of C(n, k) as exp of three log-gamma
// values reaches 1e-6; that n is checked against the bound itself.
func TestLgammaToleranceFlag(t *testing.T) {
	f := Analyzer.Flags.Lookup("lgamma-tolerance")
	if f == nil || f.DefValue != "1e-12" {
		t.Fatalf("flag lgamma-tolerance: %+v", f)
	}
	defer Analyzer.Flags.Set("lgamma-tolerance", f.DefValue)
	if err := Analyzer.Flags.Set("lgamma-tolerance", "1e-6"); err != nil {
		t.Fatal(err)
	}
	res := analysistest.Run(t, analysistest.TestData(), Analyzer, "lgammatolerance")
	re := regexp.MustCompile(`from n = (\d+) `)
	terms := []thresholds.LogGammaTerm{{P: 1, C: 1, K: []float64{1, 0}}, {P: -1, C: 1, K: []float64{0, 1}}, {P: -1, C: 1, K: []float64{1, -1}}}
	bound := func(n float64) float64 {
		b, _ := thresholds.ExpLogGammaError([][]thresholds.LogGammaTerm{terms}, []float64{n, 0}, []float64{n, n})
		return b
	}
	for _, r := range res {
		for _, d := range r.Diagnostics {
			m := re.FindStringSubmatch(d.Message)
			if m == nil {
				t.Fatalf("no first n in %q", d.Message)
			}
			n, _ := strconv.ParseFloat(m[1], 64)
			if !(bound(n) > 1e-6 && bound(n-1) <= 1e-6) || n <= 1e6 {
				t.Errorf("first n %g: bound %g there, %g before", n, bound(n), bound(n-1))
			}
		}
	}
}
