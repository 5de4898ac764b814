package analyzer

import (
	"go/ast"
	"go/token"
	"math"
	"math/big"
	"path/filepath"
	"slices"
	"sort"
	"testing"

	"golang.org/x/tools/go/analysis"
	driver "golang.org/x/tools/go/analysis/checker"
	"golang.org/x/tools/go/packages"
	"gonum.org/v1/gonum/stat/combin"
)

// TestGonumCorpus runs the analyzer over real code: gonum's stat/combin
// package (a test-only dependency of this module). Its Binomial documents
// "No check is made for overflow" and uses the multiplicative loop
// b = (n - k + i) * b / i, its unexported factorial multiplies an int up
// to an argument nothing bounds, and its NumPermutations multiplies the
// factors n-k+1 to n, which wrap at k = n from n = 21 (checked below
// against math/big); its GeneralizedBinomial is math.Exp of
// LogGeneralizedBinomial, a sum of three log-gamma values in another
// function, whose rounding leaves more than 1e-12 relative error in
// C(n, k) for large n (lgamma-digits; checked below against math/big).
// Those four, and nothing else in the package, are reported.
func TestGonumCorpus(t *testing.T) {
	if testing.Short() {
		t.Skip("loads gonum")
	}
	pkgs, err := packages.Load(&packages.Config{Mode: packages.LoadAllSyntax}, "gonum.org/v1/gonum/stat/combin")
	if err != nil || packages.PrintErrors(pkgs) > 0 {
		t.Fatalf("load: %v", err)
	}
	res, err := driver.Analyze([]*analysis.Analyzer{Analyzer}, pkgs, nil)
	if err != nil {
		t.Fatal(err)
	}
	var got []string
	for _, act := range res.Roots {
		if act.Err != nil {
			t.Fatal(act.Err)
		}
		for _, d := range act.Diagnostics {
			p := act.Package.Fset.Position(d.Pos)
			got = append(got, filepath.Base(p.Filename)+" "+funcAt(act.Package, d.Pos)+" "+d.Category)
		}
	}
	sort.Strings(got)
	want := []string{"combin.go Binomial binomial-loop", "combin.go GeneralizedBinomial lgamma-digits", "combin.go NumPermutations factorial-loop", "combin.go factorial factorial-loop"}
	if !slices.Equal(got, want) {
		t.Errorf("findings in gonum stat/combin:\n got %q\nwant %q", got, want)
	}
}

// TestNumPermutationsWraps shows the NumPermutations finding is a real
// bug: 21!/0! computed by gonum differs from the exact value (math/big),
// while 20!/0! is still right.
func TestNumPermutationsWraps(t *testing.T) {
	for _, tc := range []struct {
		n     int
		wrong bool
	}{{20, false}, {21, true}} {
		exact := new(big.Int).MulRange(1, int64(tc.n))
		got := big.NewInt(int64(combin.NumPermutations(tc.n, tc.n)))
		if (got.Cmp(exact) != 0) != tc.wrong {
			t.Errorf("NumPermutations(%d, %d) = %v, exact %v", tc.n, tc.n, got, exact)
		}
	}
}

// TestGeneralizedBinomialDigits shows the GeneralizedBinomial finding is
// a real loss of digits: C(10⁶, 20), exact in math/big, is off by more
// than the 1e-12 relative tolerance of lgamma-digits, while C(30, 15)
// (first n of the finding: 249) is within it.
func TestGeneralizedBinomialDigits(t *testing.T) {
	for _, tc := range []struct {
		n, k int64
		over bool
	}{{30, 15, false}, {1000000, 20, true}} {
		exact := new(big.Float).SetInt(new(big.Int).Binomial(tc.n, tc.k))
		got := big.NewFloat(combin.GeneralizedBinomial(float64(tc.n), float64(tc.k)))
		rel, _ := new(big.Float).Quo(new(big.Float).Sub(got, exact), exact).Float64()
		if (math.Abs(rel) > 1e-12) != tc.over {
			t.Errorf("GeneralizedBinomial(%d, %d): relative error %g", tc.n, tc.k, rel)
		}
	}
}

// funcAt names the function declaration holding pos.
func funcAt(pkg *packages.Package, pos token.Pos) string {
	for _, f := range pkg.Syntax {
		for _, d := range f.Decls {
			if fd, ok := d.(*ast.FuncDecl); ok && fd.Pos() <= pos && pos < fd.End() {
				return fd.Name.Name
			}
		}
	}
	return "?"
}
