package lsp

import "golang.org/x/tools/go/analysis"

// defaultAnalyzers is the analyzer set of a server whose Options name none.
func defaultAnalyzers() []*analysis.Analyzer {
	return nil
}

// defaultSeverity maps every category to a warning.
func defaultSeverity(category string) int {
	return SeverityWarning
}
