package lsp

import (
	"strings"
	"testing"

	"github.com/overfact/overfact/analyzer"
)

// TestSeverityScheme checks the mapping against the analyzer's own list of
// categories: every definite category is the definite form of a listed
// bare one, and maps to an error; every other category to a warning.
func TestSeverityScheme(t *testing.T) {
	ids := make(map[string]bool)
	for _, c := range analyzer.Categories() {
		ids[c.ID] = true
	}
	definite := 0
	for id := range ids {
		base, isDefinite := strings.CutSuffix(id, ".definite") // the suffix doc.go documents
		want := SeverityWarning
		if isDefinite {
			definite++
			want = SeverityError
			if !ids[base] {
				t.Errorf("category %s has no bare form %s", id, base)
			}
		}
		if got := defaultSeverity(id); got != want {
			t.Errorf("severity(%s) = %d, want %d", id, got, want)
		}
	}
	if definite == 0 {
		t.Errorf("no definite categories among %d: the suffix %q is not the analyzer's", len(ids), ".definite")
	}
}
