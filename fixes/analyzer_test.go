package fixes_test

import (
	"path/filepath"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"

	"github.com/overfact/overfact/analyzer"
)

// fixPackages are the analysistest packages of the repository's testdata
// whose directory names start with "fix", and the category packages
// others add (caseDir finds those beside the analyzer): the real
// analyzer's findings and their fixes, against hand-written .golden files.
var fixPackages = []string{"fixratio", "fixterm", "fixloop", "fixguard", "fixconv", "fixseries", "fixexit", "fixcounts", "fixloggamma", "fixkept", "fixpascal", "fixconvbinom"}

func TestAnalyzerGolden(t *testing.T) {
	t.Parallel()
	dir := gopath(t, filepath.Join("..", "testdata", "src"), fixPackages...)
	analysistest.RunWithSuggestedFixes(t, dir, analyzer.Analyzer, fixPackages...)
}
