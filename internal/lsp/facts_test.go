package lsp

import (
	"bytes"
	"encoding/json"
	"path/filepath"
	"strings"
	"sync"
	"testing"
	"time"

	"golang.org/x/tools/go/analysis"
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

// Shifts counts the ways to pick k agents of n for a shift.
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

// syncBuffer is a bytes.Buffer safe for the server's concurrent logging.
type syncBuffer struct {
	mu  sync.Mutex
	buf bytes.Buffer
}

func (b *syncBuffer) Write(p []byte) (int, error) {
	b.mu.Lock()
	defer b.mu.Unlock()
	return b.buf.Write(p)
}

func (b *syncBuffer) String() string {
	b.mu.Lock()
	defer b.mu.Unlock()
	return b.buf.String()
}

// TestOpenTogether opens two files of one package while another analysis
// holds the server busy; once it is done, one analysis serves both files.
func TestOpenTogether(t *testing.T) {
	gate, started := make(chan struct{}), make(chan struct{})
	var once sync.Once
	gated := &analysis.Analyzer{
		Name: "gated",
		Doc:  "wait for the test's signal on the first run (test analyzer)",
		Run: func(*analysis.Pass) (any, error) {
			once.Do(func() { close(started) })
			<-gate
			return nil, nil
		},
	}
	peak := "package desk\n\nimport \"math\"\n\nvar Peak = math.Gamma(40)\n"
	dir := writeModule(t, map[string]string{"desk.go": deskSource, "peak.go": peak, "other/other.go": "package other\n"})
	var trace syncBuffer
	c := startServer(t, Options{Analyzers: []*analysis.Analyzer{gated, gammaCalls}, Log: &trace})
	c.initialize(map[string]any{})
	c.open(filepath.Join(dir, "other", "other.go"), "package other\n")
	<-started
	a := c.open(filepath.Join(dir, "desk.go"), deskSource)
	b := c.open(filepath.Join(dir, "peak.go"), peak)
	// The server handles messages in order, so once this request is
	// answered both buffers are open.
	if m := c.call("overfact/ping", nil); m.Error == nil || m.Error.Code != codeMethodNotFound {
		t.Fatalf("ping: %+v", m)
	}
	close(gate)
	seen := map[string]bool{}
	for !seen[a] || !seen[b] {
		m := c.note("textDocument/publishDiagnostics")
		var p publishDiagnosticsParams
		json.Unmarshal(m.Params, &p)
		seen[p.URI] = true
	}
	// The second file's own analysis must find its findings current.
	for deadline := time.Now().Add(timeout); !strings.Contains(trace.String(), "already analysed"); time.Sleep(10 * time.Millisecond) {
		if time.Now().After(deadline) {
			t.Fatalf("the second analysis was not skipped; trace:\n%s", trace.String())
		}
	}
	if n := strings.Count(trace.String(), "analysed "); n != 2 {
		t.Errorf("%d analyses, want 2 (other.go, then desk.go and peak.go together); trace:\n%s", n, trace.String())
	}
}
