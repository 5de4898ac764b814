package lsp

import (
	"path/filepath"
	"strings"
	"testing"
)

// combinSource defines a factorial in one package of a module; overfact's
// analyzer records it as a fact, which must reach the package that calls
// it through the server's loading, cold and warm.
const combinSource = `package combin

// Fact returns n!.
func Fact(n int) int {
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}
`

const rotaSource = `package desk

import "example.com/desk/combin"

// Shifts counts the ways to pick k operators of n for a shift.
func Shifts(n, k int) int {
	return combin.Fact(n) / (combin.Fact(k) * combin.Fact(n-k))
}
`

// TestFactsAcrossPackages runs overfact's own analyzer: the ratio in desk
// is a finding only if the fact about combin.Fact crossed the package
// boundary, as it does under go vet.
func TestFactsAcrossPackages(t *testing.T) {
	dir := writeModule(t, map[string]string{"combin/combin.go": combinSource, "rota.go": rotaSource})
	var trace syncBuffer
	c := startServer(t, Options{Debounce: -1, Log: &trace})
	c.initialize(map[string]any{})
	uri := c.open(filepath.Join(dir, "rota.go"), rotaSource)
	isRatio := func(p publishDiagnosticsParams) bool {
		for _, d := range p.Diagnostics {
			if d.Code == "factorial-ratio" && d.Range.Start == (Position{lineOf(rotaSource, "combin.Fact(n) /"), 8}) {
				return true
			}
		}
		return false
	}
	if p := c.diagnosticsFor(uri, func(publishDiagnosticsParams) bool { return true }); !isRatio(p) {
		t.Fatalf("cold analysis: no factorial-ratio finding at the ratio: %+v", p.Diagnostics)
	}
	// An edit of rota.go alone is served by re-checking it against the
	// dependencies kept in memory; the fact must still be there.
	edited := strings.Replace(rotaSource, "// Shifts", "// Shifts (rota)", 1)
	c.notify("textDocument/didChange", map[string]any{
		"textDocument":   map[string]any{"uri": uri, "version": 2},
		"contentChanges": []any{map[string]any{"text": edited}},
	})
	p := c.diagnosticsFor(uri, func(p publishDiagnosticsParams) bool { return *p.Version == 2 })
	if !isRatio(p) {
		t.Errorf("warm analysis: no factorial-ratio finding at the ratio: %+v", p.Diagnostics)
	}
	if !strings.Contains(trace.String(), "version 2, re-checked") {
		t.Errorf("the edit was not served by re-checking; trace:\n%s", trace.String())
	}
}
