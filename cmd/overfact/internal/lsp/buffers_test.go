package lsp

import (
	"encoding/json"
	"go/parser"
	"go/token"
	"path/filepath"
	"strings"
	"testing"
	"time"

	"golang.org/x/tools/go/analysis"
)

// rotaDisk and rotaBuffer are one file of a rota planner as saved and as
// being edited: the buffer swaps n and k, and has the same size as the file
// on disk, so that nothing but the text itself tells them apart.
const rotaDisk = `package rota

// Ways counts the ways to pick k of n volunteers.
func Ways(n, k int) int {
	return fact(n) / (fact(k) * fact(n-k))
}

func fact(n int) int {
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}
`

var rotaBuffer = strings.Replace(rotaDisk, "fact(n) / (fact(k) * fact(n-k))", "fact(k) / (fact(n) * fact(k-n))", 1)

// TestFixFromBuffer runs overfact's analyzer on a buffer that differs from
// the file on disk, with the same size and with another size. The quick
// fix must be built from the buffer: k!/(n!(k-n)!) is the binomial
// coefficient C(k, n) (its definition, common practice), so the helper
// must be called with k first. A fix built from the disk's text would
// call it with n first, or not be offered at all.
func TestFixFromBuffer(t *testing.T) {
	for _, tc := range []struct{ name, buffer string }{
		{"same size", rotaBuffer},
		{"other size", strings.Replace(rotaBuffer, "// Ways", "// Ways (edited, not saved)", 1)},
	} {
		t.Run(tc.name, func(t *testing.T) {
			if len(rotaBuffer) != len(rotaDisk) {
				t.Fatal("the two texts must have the same size")
			}
			dir := writeModule(t, map[string]string{"rota.go": rotaDisk})
			c := startServer(t, Options{Debounce: -1})
			c.initialize(map[string]any{})
			uri := c.open(filepath.Join(dir, "rota.go"), tc.buffer)
			p := c.diagnosticsFor(uri, anyDiags)
			var ratio *Diagnostic
			for i, d := range p.Diagnostics {
				if d.Code == "factorial-ratio" {
					ratio = &p.Diagnostics[i]
				}
			}
			if ratio == nil || !strings.Contains(ratio.Message, "numerator k!") {
				t.Fatalf("no factorial-ratio finding about k!: %+v", p.Diagnostics)
			}
			as := c.codeActions(uri, ratio.Range)
			if len(as) == 0 {
				t.Fatal("no quick fix for the buffer")
			}
			fixed := applyEdits(t, tc.buffer, as[0].Edit.Changes[uri], encUTF16)
			if !strings.Contains(fixed, "ChooseInt64(int64(k), int64(n))") {
				t.Errorf("the fix does not compute C(k, n):\n%s", fixed)
			}
			if _, err := parser.ParseFile(token.NewFileSet(), "rota.go", fixed, 0); err != nil {
				t.Errorf("the fixed buffer does not parse: %v\n%s", err, fixed)
			}
		})
	}
}

// firstLineOfSource reports, at the start of each file, the first line of
// the file as pass.ReadFile returns it, and requires an analyzer with
// facts, so that the whole Requires graph of the server's copies is
// exercised.
var firstLineOfSource = &analysis.Analyzer{
	Name:     "firstline",
	Doc:      "report the first line of each file as read (test analyzer)",
	Requires: []*analysis.Analyzer{withFacts},
	Run: func(pass *analysis.Pass) (any, error) {
		for _, f := range pass.Files {
			name := pass.Fset.File(f.FileStart).Name()
			src, err := pass.ReadFile(name)
			if err != nil {
				return nil, err
			}
			line, _, _ := strings.Cut(string(src), "\n")
			pass.Report(analysis.Diagnostic{Pos: f.Package, Message: line})
		}
		return nil, nil
	},
}

type seenFact struct{}

func (*seenFact) AFact() {}

// withFacts exports a package fact on every package.
var withFacts = &analysis.Analyzer{
	Name:      "withfacts",
	Doc:       "export a fact on every package (test analyzer)",
	FactTypes: []analysis.Fact{new(seenFact)},
	Run: func(pass *analysis.Pass) (any, error) {
		pass.ExportPackageFact(new(seenFact))
		return nil, nil
	},
}

// TestReadFileFromBuffer checks that an analyzer reading the source of an
// open file through pass.ReadFile gets the buffer, not the disk.
func TestReadFileFromBuffer(t *testing.T) {
	dir := writeModule(t, map[string]string{"desk.go": "package desk // as saved\n"})
	c := startServer(t, Options{Analyzers: []*analysis.Analyzer{firstLineOfSource}, Debounce: -1})
	c.initialize(map[string]any{})
	uri := c.open(filepath.Join(dir, "desk.go"), "package desk // as typed\n")
	p := c.diagnosticsFor(uri, anyDiags)
	if got := p.Diagnostics[0].Message; got != "package desk // as typed" {
		t.Errorf("pass.ReadFile gave %q, want the buffer's first line", got)
	}
}

// TestOutOfStep sends a change that cannot be applied (its range lies
// beyond the end of the buffer). The server must withdraw the document's
// findings, offer no fix for it, say so, ignore further incremental
// changes, and recover on a full-text change.
func TestOutOfStep(t *testing.T) {
	var trace syncBuffer
	c, _, uri := openDesk(t, Options{Analyzers: []*analysis.Analyzer{gammaCalls}, Debounce: -1, Log: &trace})
	line := lineOf(deskSource, "math.Gamma")
	finding := Range{Start: Position{line, 0}, End: Position{line + 1, 0}}

	beyond := Position{Line: 40, Character: 0}
	c.change(uri, 2, textChange{Range{Start: beyond, End: beyond}, "// lost\n"})
	if p := c.diagnosticsFor(uri, func(publishDiagnosticsParams) bool { return true }); len(p.Diagnostics) != 0 || p.Version == nil || *p.Version != 2 {
		t.Errorf("after the lost change: %+v, want the findings withdrawn at version 2", p)
	}
	var lm logMessageParams
	json.Unmarshal(c.note("window/logMessage").Params, &lm)
	if lm.Type != logWarning || !strings.Contains(lm.Message, "desk.go") {
		t.Errorf("log message = %+v, want a warning naming the file", lm)
	}
	if as := c.codeActions(uri, finding); len(as) != 0 {
		t.Errorf("code actions for a document out of step: %+v", as)
	}
	// An incremental change that fits the old text is no help: the
	// server does not know what the client's text is.
	start := Position{Line: 0, Character: 0}
	c.change(uri, 3, textChange{Range{Start: start, End: start}, "// x\n"})
	if as := c.codeActions(uri, finding); len(as) != 0 {
		t.Errorf("code actions after a further incremental change: %+v", as)
	}
	for _, want := range []string{"desk.go is out of step", "beyond"} {
		if !strings.Contains(trace.String(), want) {
			t.Errorf("trace lacks %q:\n%s", want, trace.String())
		}
	}

	// A full-text change brings it back.
	recovered := "// rota\n" + deskSource
	c.change(uri, 4, recovered)
	p := c.diagnosticsFor(uri, func(p publishDiagnosticsParams) bool { return *p.Version == 4 })
	if len(p.Diagnostics) != 1 || p.Diagnostics[0].Range.Start.Line != lineOf(recovered, "math.Gamma") {
		t.Fatalf("after the full text: %+v", p.Diagnostics)
	}
	as := c.codeActions(uri, p.Diagnostics[0].Range)
	if len(as) == 0 {
		t.Fatal("no code action after recovery")
	}
	if got := applyEdits(t, recovered, as[0].Edit.Changes[uri], encUTF16); !strings.Contains(got, "return gammaChecked(n + 1)") {
		t.Errorf("after the fix:\n%s", got)
	}
}

// TestOutOfStepReopen recovers a document out of step by closing and
// reopening it.
func TestOutOfStepReopen(t *testing.T) {
	c, path, uri := openDesk(t, testOptions())
	c.change(uri, 2, textChange{Range{Start: Position{1, 5}, End: Position{1, 1}}, "x"})
	c.diagnosticsFor(uri, noDiags)
	c.notify("textDocument/didClose", map[string]any{"textDocument": map[string]any{"uri": uri}})
	c.open(path, deskSource)
	p := c.diagnosticsFor(uri, anyDiags)
	if as := c.codeActions(uri, p.Diagnostics[0].Range); len(as) != 2 {
		t.Errorf("after reopening: %d code actions, want 2", len(as))
	}
}

// TestReopenWithoutClose sends a second didOpen at the same version with
// new text and no didClose between: the new text is taken, analysed and
// published, and its fixes are offered.
func TestReopenWithoutClose(t *testing.T) {
	c, path, uri := openDesk(t, testOptions())
	second := deskSource + "\nvar Spare = math.Gamma(3)\n"
	c.open(path, second) // version 1 again
	p := c.diagnosticsFor(uri, func(publishDiagnosticsParams) bool { return true })
	if len(p.Diagnostics) != 2 {
		t.Fatalf("after the second open: %d diagnostics, want the new text's 2", len(p.Diagnostics))
	}
	last := p.Diagnostics[1].Range
	if last.Start.Line != lineOf(second, "var Spare") {
		t.Errorf("second finding at %+v", last)
	}
	as := c.codeActions(uri, last)
	if len(as) == 0 {
		t.Fatal("no code action for the new text")
	}
	if got := applyEdits(t, second, as[0].Edit.Changes[uri], encUTF16); !strings.Contains(got, "var Spare = gammaChecked(3)") {
		t.Errorf("after the fix:\n%s", got)
	}
}

// TestClosedPackagesDropped opens and closes files of two packages; once
// both are closed, the loaded packages they pinned are dropped.
func TestClosedPackagesDropped(t *testing.T) {
	dir := writeModule(t, map[string]string{"desk.go": deskSource, "peak/peak.go": "package peak\n"})
	var trace syncBuffer
	c := startServer(t, Options{Analyzers: []*analysis.Analyzer{gammaCalls}, Debounce: -1, Log: &trace})
	c.initialize(map[string]any{})
	uri := c.open(filepath.Join(dir, "desk.go"), deskSource)
	c.diagnosticsFor(uri, anyDiags)
	peak := c.open(filepath.Join(dir, "peak", "peak.go"), "package peak\n")
	c.diagnosticsFor(peak, noDiags)
	// Closing peak.go drops its package but keeps desk's: desk.go is
	// still open, and an edit of it is still served by a re-check.
	c.notify("textDocument/didClose", map[string]any{"textDocument": map[string]any{"uri": peak}})
	waitFor(t, &trace, "dropped the packages of closed files")
	c.change(uri, 2, deskSource+"\n")
	c.diagnosticsFor(uri, func(p publishDiagnosticsParams) bool { return *p.Version == 2 })
	if !strings.Contains(trace.String(), "version 2, re-checked") {
		t.Errorf("the open package was dropped too; trace:\n%s", trace.String())
	}
}

func waitFor(t *testing.T, trace *syncBuffer, s string) {
	t.Helper()
	for deadline := time.Now().Add(timeout); !strings.Contains(trace.String(), s); time.Sleep(10 * time.Millisecond) {
		if time.Now().After(deadline) {
			t.Fatalf("trace lacks %q:\n%s", s, trace.String())
		}
	}
}
