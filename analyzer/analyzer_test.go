package analyzer

import (
	"path/filepath"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"
)

func testdata(t *testing.T) string {
	dir, err := filepath.Abs(filepath.Join("..", "testdata"))
	if err != nil {
		t.Fatal(err)
	}
	return dir
}

// The packages of testdata/src, each a scenario with its expectations in
// // want comments.
var scenarios = []string{
	"cardshuffle", "mathkit", "bottling", "staffing", "gasmodel", "dice",
	"reliability", "generic", "gentable", "tables", "oddcode",
}

func TestScenarios(t *testing.T) {
	for _, pkg := range scenarios {
		t.Run(pkg, func(t *testing.T) {
			analysistest.Run(t, testdata(t), Analyzer, pkg)
		})
	}
}
