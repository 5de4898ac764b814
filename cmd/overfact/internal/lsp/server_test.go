package lsp

import (
	"encoding/json"
	"os"
	"path/filepath"
	"strings"
	"sync"
	"testing"
	"time"
	"unicode/utf16"

	"golang.org/x/tools/go/analysis"
)

// deskSource is a file of a support-desk staffing estimator whose finding
// sits after non-ASCII text on its own line, so that a byte column and a
// UTF-16 column differ: é and λ are one UTF-16 unit but two bytes each, and
// U+1D6E4 (mathematical italic capital gamma) is a surrogate pair, two
// units and four bytes (Unicode Standard, chapter 3, UTF-16 and UTF-8 forms).
const deskSource = `package desk

import "math"

// Staff estimates the staffing table entry for n callers.
func Staff(n float64) float64 {
	/* é λ 𝛤 */ return math.Gamma(n + 1)
}
`

// utf16Col is the UTF-16 length of the text before sub on its line,
// computed with unicode/utf16 as an independent reference.
func utf16Col(text, sub string) uint32 {
	i := strings.Index(text, sub)
	start := strings.LastIndex(text[:i], "\n") + 1
	return uint32(len(utf16.Encode([]rune(text[start:i]))))
}

// byteCol is the byte length of the text before sub on its line.
func byteCol(text, sub string) uint32 {
	i := strings.Index(text, sub)
	return uint32(i - (strings.LastIndex(text[:i], "\n") + 1))
}

func testOptions(as ...*analysis.Analyzer) Options {
	if len(as) == 0 {
		as = []*analysis.Analyzer{gammaCalls}
	}
	return Options{Analyzers: as, Debounce: 50 * 1e6}
}

func TestDiagnosticsAndQuickFix(t *testing.T) {
	dir := writeModule(t, map[string]string{"desk.go": deskSource})
	c := startServer(t, testOptions())
	r := c.initialize(map[string]any{})
	if r.Capabilities.PositionEncoding != "utf-16" {
		t.Errorf("position encoding = %q, want utf-16 when the client offers none", r.Capabilities.PositionEncoding)
	}
	if r.Capabilities.TextDocumentSync.Change != syncIncremental {
		t.Errorf("sync kind = %d, want incremental", r.Capabilities.TextDocumentSync.Change)
	}
	uri := c.open(filepath.Join(dir, "desk.go"), deskSource)
	p := c.diagnosticsFor(uri, anyDiags)
	if len(p.Diagnostics) != 1 {
		t.Fatalf("got %d diagnostics, want 1: %+v", len(p.Diagnostics), p.Diagnostics)
	}
	d := p.Diagnostics[0]
	wantStart := Position{Line: lineOf(deskSource, "math.Gamma"), Character: utf16Col(deskSource, "math.Gamma")}
	wantEnd := Position{Line: wantStart.Line, Character: utf16Col(deskSource, "\n}")}
	if d.Range.Start != wantStart || d.Range.End != wantEnd {
		t.Errorf("range = %+v, want %+v-%+v", d.Range, wantStart, wantEnd)
	}
	if d.Source != "overfact" || d.Code != "gamma" || d.Severity != SeverityWarning {
		t.Errorf("source, code, severity = %q, %q, %d", d.Source, d.Code, d.Severity)
	}
	// go/analysis documents Diagnostic.URL as the analyzer URL plus
	// "#" and the category when the diagnostic gives none.
	if d.CodeDescription == nil || d.CodeDescription.Href != gammaCalls.URL+"#gamma" {
		t.Errorf("codeDescription = %+v, want the analyzer URL", d.CodeDescription)
	}
	if len(d.RelatedInformation) != 1 || d.RelatedInformation[0].Location.Range.Start.Character != utf16Col(deskSource, "n + 1)") {
		t.Errorf("relatedInformation = %+v", d.RelatedInformation)
	}

	// A range strictly inside the finding selects it.
	inside := Range{Start: Position{wantStart.Line, wantStart.Character + 2}, End: Position{wantStart.Line, wantStart.Character + 3}}
	actions := c.codeActions(uri, inside)
	if len(actions) != 2 {
		t.Fatalf("got %d code actions, want 2: %+v", len(actions), actions)
	}
	if !actions[0].IsPreferred || actions[1].IsPreferred || actions[0].Kind != "quickfix" {
		t.Errorf("preferred/kind = %v %v %q", actions[0].IsPreferred, actions[1].IsPreferred, actions[0].Kind)
	}
	edits := actions[0].Edit.Changes[uri]
	if len(edits) != 1 {
		t.Fatalf("edit = %+v", actions[0].Edit)
	}
	got := applyEdits(t, deskSource, edits, encUTF16)
	if !strings.Contains(got, "/* é λ 𝛤 */ return gammaChecked(n + 1)") {
		t.Errorf("after the fix:\n%s", got)
	}
	// A range on another line selects nothing.
	if a := c.codeActions(uri, Range{Start: Position{0, 0}, End: Position{0, 3}}); len(a) != 0 {
		t.Errorf("code actions on line 0 = %+v", a)
	}
	// A filter for another kind selects nothing.
	if a := c.codeActionsOnly(uri, inside, []string{"refactor"}); len(a) != 0 {
		t.Errorf("code actions for refactor = %+v", a)
	}

	c.notify("textDocument/didClose", map[string]any{"textDocument": map[string]any{"uri": uri}})
	c.diagnosticsFor(uri, noDiags)
	if err := c.shutdown(); err != nil {
		t.Errorf("Serve after shutdown and exit = %v", err)
	}
}

// applyEdits applies LSP text edits to text, converting positions with the
// package's own conversion; the edits of one fix do not overlap.
func applyEdits(t *testing.T, text string, edits []TextEdit, enc encoding) string {
	t.Helper()
	b := []byte(text)
	for i := len(edits) - 1; i >= 0; i-- { // the fixes here are in order
		var err error
		b, err = applyChange(b, contentChange{Range: &edits[i].Range, Text: edits[i].NewText}, enc)
		if err != nil {
			t.Fatal(err)
		}
	}
	return string(b)
}

func (c *client) codeActions(uri string, r Range) []CodeAction {
	c.t.Helper()
	return c.codeActionsOnly(uri, r, nil)
}

func (c *client) codeActionsOnly(uri string, r Range, only []string) []CodeAction {
	c.t.Helper()
	ctx := map[string]any{"diagnostics": []any{}}
	if only != nil {
		ctx["only"] = only
	}
	m := c.call("textDocument/codeAction", map[string]any{
		"textDocument": map[string]any{"uri": uri}, "range": r, "context": ctx,
	})
	if m.Error != nil {
		c.t.Fatalf("codeAction: %v", m.Error)
	}
	var as []CodeAction
	if err := json.Unmarshal(m.Result, &as); err != nil {
		c.t.Fatal(err)
	}
	return as
}

func TestUTF8Negotiated(t *testing.T) {
	dir := writeModule(t, map[string]string{"desk.go": deskSource})
	c := startServer(t, testOptions())
	r := c.initialize(map[string]any{"general": map[string]any{"positionEncodings": []string{"utf-16", "utf-8"}}})
	if r.Capabilities.PositionEncoding != "utf-8" {
		t.Fatalf("position encoding = %q, want utf-8 when offered", r.Capabilities.PositionEncoding)
	}
	uri := c.open(filepath.Join(dir, "desk.go"), deskSource)
	p := c.diagnosticsFor(uri, anyDiags)
	if got, want := p.Diagnostics[0].Range.Start.Character, byteCol(deskSource, "math.Gamma"); got != want {
		t.Errorf("utf-8 start character = %d, want %d", got, want)
	}
}

// TestIncrementalEdits changes an unsaved buffer in two incremental steps:
// the first adds a second finding, the second removes the first; only the
// newest version's diagnostics count.
func TestIncrementalEdits(t *testing.T) {
	dir := writeModule(t, map[string]string{"desk.go": deskSource})
	c := startServer(t, testOptions())
	c.initialize(map[string]any{})
	uri := c.open(filepath.Join(dir, "desk.go"), deskSource)
	c.diagnosticsFor(uri, anyDiags)

	line := lineOf(deskSource, "math.Gamma")
	endOfFile := Position{Line: lineOf(deskSource, "\n}\n") + 2, Character: 0}
	add := "\nfunc Spare(x float64) float64 { return math.Gamma(x) }\n"
	c.notify("textDocument/didChange", map[string]any{
		"textDocument": map[string]any{"uri": uri, "version": 2},
		"contentChanges": []any{
			map[string]any{"range": Range{Start: endOfFile, End: endOfFile}, "text": add},
		},
	})
	// Replace "math.Gamma(n + 1)" with "n"; the range is in UTF-16 units.
	start := Position{line, utf16Col(deskSource, "math.Gamma")}
	end := Position{line, utf16Col(deskSource, "\n}")}
	c.notify("textDocument/didChange", map[string]any{
		"textDocument": map[string]any{"uri": uri, "version": 3},
		"contentChanges": []any{
			map[string]any{"range": Range{Start: start, End: end}, "text": "n"},
		},
	})
	p := c.diagnosticsFor(uri, func(p publishDiagnosticsParams) bool { return p.Version != nil && *p.Version == 3 })
	if len(p.Diagnostics) != 1 {
		t.Fatalf("version 3 has %d diagnostics, want 1: %+v", len(p.Diagnostics), p.Diagnostics)
	}
	wantLine := lineOf(deskSource, "\n}\n") + 3
	if got := p.Diagnostics[0].Range.Start; got.Line != wantLine || got.Character != uint32(len("func Spare(x float64) float64 { return ")) {
		t.Errorf("finding at %+v, want line %d", got, wantLine)
	}
	// The fix offered now is computed on version 3.
	as := c.codeActions(uri, p.Diagnostics[0].Range)
	if len(as) == 0 {
		t.Fatal("no code action for the edited buffer")
	}
	if ch := as[0].Edit.Changes[uri]; len(ch) != 1 || ch[0].Range.Start.Line != wantLine {
		t.Errorf("fix edits = %+v", ch)
	}
}

// TestDeletedWhileOpen removes the file from disk while its buffer is open;
// the overlay still holds the text, so the analysis still sees it.
func TestDeletedWhileOpen(t *testing.T) {
	dir := writeModule(t, map[string]string{"desk.go": deskSource})
	c := startServer(t, testOptions())
	c.initialize(map[string]any{})
	path := filepath.Join(dir, "desk.go")
	uri := c.open(path, deskSource)
	c.diagnosticsFor(uri, anyDiags)
	if err := os.Remove(path); err != nil {
		t.Fatal(err)
	}
	c.notify("textDocument/didSave", map[string]any{"textDocument": map[string]any{"uri": uri}})
	p := c.diagnosticsFor(uri, func(publishDiagnosticsParams) bool { return true })
	if len(p.Diagnostics) != 1 {
		t.Errorf("after deletion: %d diagnostics, want the overlay's 1", len(p.Diagnostics))
	}
}

// TestOutsideModule opens files in a directory with no go.mod above it.
// One importing only the standard library is still a package to go list
// (command-line-arguments) and is analysed; one importing a package no
// module provides cannot be loaded, which is logged once, with no findings.
func TestOutsideModule(t *testing.T) {
	dir := t.TempDir()
	loose := filepath.Join(dir, "loose.go")
	if err := os.WriteFile(loose, []byte(deskSource), 0o644); err != nil {
		t.Fatal(err)
	}
	broken := filepath.Join(dir, "lost", "lost.go")
	lostSource := "package lost\n\nimport \"example.com/nowhere\"\n\nvar X = nowhere.Y\n"
	os.MkdirAll(filepath.Dir(broken), 0o755)
	if err := os.WriteFile(broken, []byte(lostSource), 0o644); err != nil {
		t.Fatal(err)
	}
	c := startServer(t, testOptions())
	c.initialize(map[string]any{})
	uri := c.open(loose, deskSource)
	c.diagnosticsFor(uri, anyDiags)

	uri = c.open(broken, lostSource)
	m := c.note("window/logMessage")
	var lm logMessageParams
	json.Unmarshal(m.Params, &lm)
	t.Log(lm.Message)
	if !strings.Contains(lm.Message, "lost.go") {
		t.Errorf("log message = %q, want it to name the file", lm.Message)
	}
	c.diagnosticsFor(uri, noDiags)
	if err := c.shutdown(); err != nil {
		t.Errorf("Serve = %v", err)
	}
}

// TestAnalyzerPanic checks that a panicking analyzer is reported and the
// server goes on answering.
func TestAnalyzerPanic(t *testing.T) {
	dir := writeModule(t, map[string]string{"desk.go": deskSource})
	c := startServer(t, testOptions(panicky))
	c.initialize(map[string]any{})
	uri := c.open(filepath.Join(dir, "desk.go"), deskSource)
	m := c.note("window/logMessage")
	var lm logMessageParams
	json.Unmarshal(m.Params, &lm)
	if lm.Type != logError || !strings.Contains(lm.Message, "deliberate test panic") {
		t.Errorf("log message = %+v", lm)
	}
	c.diagnosticsFor(uri, noDiags)
	if err := c.shutdown(); err != nil {
		t.Errorf("Serve = %v", err)
	}
}

// TestDocumentChanges checks the versioned form of WorkspaceEdit for a
// client that declares workspace.workspaceEdit.documentChanges.
func TestDocumentChanges(t *testing.T) {
	dir := writeModule(t, map[string]string{"desk.go": deskSource})
	c := startServer(t, testOptions())
	c.initialize(map[string]any{"workspace": map[string]any{"workspaceEdit": map[string]any{"documentChanges": true}}})
	uri := c.open(filepath.Join(dir, "desk.go"), deskSource)
	p := c.diagnosticsFor(uri, anyDiags)
	as := c.codeActions(uri, p.Diagnostics[0].Range)
	if len(as) == 0 {
		t.Fatal("no code actions")
	}
	e := as[0].Edit
	if e.Changes != nil || len(e.DocumentChanges) != 1 {
		t.Fatalf("edit = %+v, want one documentChanges entry", e)
	}
	dc := e.DocumentChanges[0]
	if dc.TextDocument.URI != uri || dc.TextDocument.Version == nil || *dc.TextDocument.Version != 1 {
		t.Errorf("document = %+v, want %s at version 1", dc.TextDocument, uri)
	}
}

// TestPackageSiblings opens two files of one package; a change to one
// republishes both, the other's at its unchanged version.
func TestPackageSiblings(t *testing.T) {
	other := "package desk\n\nimport \"math\"\n\nvar Peak = math.Gamma(40)\n"
	dir := writeModule(t, map[string]string{"desk.go": deskSource, "peak.go": other})
	c := startServer(t, testOptions())
	c.initialize(map[string]any{})
	uri := c.open(filepath.Join(dir, "desk.go"), deskSource)
	c.diagnosticsFor(uri, anyDiags)
	peak := c.open(filepath.Join(dir, "peak.go"), other)
	c.diagnosticsFor(peak, anyDiags)
	c.notify("textDocument/didChange", map[string]any{
		"textDocument":   map[string]any{"uri": uri, "version": 2},
		"contentChanges": []any{map[string]any{"text": "package desk\n"}},
	})
	// The two publications come in either order.
	var sawEdited, sawSibling bool
	for !sawEdited || !sawSibling {
		m := c.note("textDocument/publishDiagnostics")
		var p publishDiagnosticsParams
		json.Unmarshal(m.Params, &p)
		switch {
		case p.URI == uri && *p.Version == 2:
			sawEdited = true
			if len(p.Diagnostics) != 0 {
				t.Errorf("edited file: %+v", p.Diagnostics)
			}
		case p.URI == peak: // its first publication was consumed above
			sawSibling = true
			if *p.Version != 1 || len(p.Diagnostics) != 1 {
				t.Errorf("sibling republished as %+v", p)
			}
		}
	}
}

// TestEditStorm sends twenty full-text changes faster than the debounce;
// publications must never go back to an older version, and the last one
// must be the newest version's.
func TestEditStorm(t *testing.T) {
	dir := writeModule(t, map[string]string{"desk.go": deskSource})
	c := startServer(t, testOptions())
	c.initialize(map[string]any{})
	uri := c.open(filepath.Join(dir, "desk.go"), deskSource)
	const last = 21
	for v := 2; v <= last; v++ {
		// Version v has v-1 extra calls, hence v findings.
		text := deskSource + strings.Repeat("var _ = math.Gamma(3)\n", v-1)
		c.notify("textDocument/didChange", map[string]any{
			"textDocument":   map[string]any{"uri": uri, "version": v},
			"contentChanges": []any{map[string]any{"text": text}},
		})
	}
	newest := int32(0)
	p := c.diagnosticsFor(uri, func(p publishDiagnosticsParams) bool {
		if *p.Version < newest {
			t.Errorf("version %d published after version %d", *p.Version, newest)
		}
		newest = *p.Version
		if got := len(p.Diagnostics); got != int(*p.Version) {
			t.Errorf("version %d published with %d findings", *p.Version, got)
		}
		return *p.Version == last
	})
	if as := c.codeActions(uri, p.Diagnostics[len(p.Diagnostics)-1].Range); len(as) != 2 {
		t.Errorf("code actions for the newest finding: %d", len(as))
	}
}

// TestTestFile opens a _test.go file, which go list puts in the test
// variant of its package; each finding is published once.
func TestTestFile(t *testing.T) {
	testSource := "package desk\n\nimport (\n\t\"math\"\n\t\"testing\"\n)\n\nfunc TestStaff(t *testing.T) {\n\t_ = math.Gamma(200)\n}\n"
	dir := writeModule(t, map[string]string{"desk.go": deskSource, "desk_test.go": testSource})
	c := startServer(t, testOptions())
	c.initialize(map[string]any{})
	uri := c.open(filepath.Join(dir, "desk_test.go"), testSource)
	p := c.diagnosticsFor(uri, func(publishDiagnosticsParams) bool { return true })
	if len(p.Diagnostics) != 1 || p.Diagnostics[0].Range.Start.Line != lineOf(testSource, "math.Gamma") {
		t.Errorf("test file diagnostics = %+v, want the one call", p.Diagnostics)
	}
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
