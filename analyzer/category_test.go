package analyzer

import (
	"os"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"
	"golang.org/x/tools/go/packages"
)

// categoryPackages are the packages of testdata/src beside the analyzer,
// one per category, named after it: each holds that category's positive
// and negative cases with // want comments and, where a fix is offered,
// the fixed file as .golden. The realistic scenario packages of the
// repository's testdata (TestScenarios) are the integration test.
var categoryPackages = []string{
	"factorialloop", "factorialrecursion", "factorialcall", "factorialratio", "binomialloop", "pascalrule",
	"poweroverfactorial", "gammaratio", "gammaoverflow", "lateconversion",
	"lgammasign", "lgammadigits", "lgammainteger", "lgammaoverflow", "stirlingapproximation",
}

func TestCategories(t *testing.T) {
	analysistest.RunWithSuggestedFixes(t, analysistest.TestData(), Analyzer, categoryPackages...)
}

// TestCategoryPackagesTypeCheck makes sure every category package
// type-checks: the analyzer offers no fix in a package with type errors,
// so RunWithSuggestedFixes would compare none of its .golden files and
// the test above would pass without checking them.
func TestCategoryPackagesTypeCheck(t *testing.T) {
	dir := analysistest.TestData()
	cfg := &packages.Config{
		Mode: packages.NeedName | packages.NeedTypes | packages.NeedSyntax | packages.NeedTypesInfo,
		Dir:  dir,
		Env:  append(os.Environ(), "GOPATH="+dir, "GO111MODULE=off", "GOPROXY=off"),
	}
	pkgs, err := packages.Load(cfg, categoryPackages...)
	if err != nil {
		t.Fatal(err)
	}
	if len(pkgs) != len(categoryPackages) {
		t.Fatalf("loaded %d packages, want %d", len(pkgs), len(categoryPackages))
	}
	for _, p := range pkgs {
		for _, e := range p.Errors {
			t.Errorf("%s: %v", p.PkgPath, e)
		}
	}
}
