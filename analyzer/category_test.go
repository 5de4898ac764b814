package analyzer

import (
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"
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
