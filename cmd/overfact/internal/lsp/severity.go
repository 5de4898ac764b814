package lsp

import (
	"golang.org/x/tools/go/analysis"

	"github.com/overfact/overfact/analyzer"
)

// defaultAnalyzers is the analyzer set of a server whose Options name none.
func defaultAnalyzers() []*analysis.Analyzer {
	return []*analysis.Analyzer{analyzer.Analyzer}
}

// defaultSeverity takes the analyzer's severity of the category: certain
// overflows are errors and possible ones warnings.
func defaultSeverity(category string) int {
	if analyzer.Severity(category) == analyzer.SeverityError {
		return SeverityError
	}
	return SeverityWarning
}
