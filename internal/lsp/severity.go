package lsp

import (
	"strings"

	"golang.org/x/tools/go/analysis"

	"github.com/overfact/overfact/analyzer"
)

// defaultAnalyzers is the analyzer set of a server whose Options name none.
func defaultAnalyzers() []*analysis.Analyzer {
	return []*analysis.Analyzer{analyzer.Analyzer}
}

// definiteMarker ends the category of a finding that overflows for every
// input the code allows; analyzer.Categories lists each pattern both bare
// and with this suffix.
const definiteMarker = ".definite"

// defaultSeverity makes certain overflows errors and possible ones
// warnings.
func defaultSeverity(category string) int {
	if strings.HasSuffix(category, definiteMarker) {
		return SeverityError
	}
	return SeverityWarning
}
