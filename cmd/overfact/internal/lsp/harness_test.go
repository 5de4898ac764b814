package lsp

import (
	"bytes"
	"context"
	"encoding/json"
	"fmt"
	"go/ast"
	"io"
	"os"
	"path/filepath"
	"strings"
	"sync"
	"testing"
	"time"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/passes/inspect"
	"golang.org/x/tools/go/ast/inspector"
	"golang.org/x/tools/go/types/typeutil"
)

// gammaCalls is a stand-in analyzer for the server tests: it reports every
// call of math.Gamma and offers to replace it with a call of gammaChecked,
// so the server can be tested independently of overfact's own analyzer.
var gammaCalls = &analysis.Analyzer{
	Name:     "gammacalls",
	Doc:      "report calls of math.Gamma (test analyzer)",
	URL:      "https://example.invalid/gammacalls",
	Requires: []*analysis.Analyzer{inspect.Analyzer},
	Run: func(pass *analysis.Pass) (any, error) {
		ins := pass.ResultOf[inspect.Analyzer].(*inspector.Inspector)
		ins.Preorder([]ast.Node{(*ast.CallExpr)(nil)}, func(n ast.Node) {
			call := n.(*ast.CallExpr)
			fn := typeutil.StaticCallee(pass.TypesInfo, call)
			if fn == nil || fn.FullName() != "math.Gamma" {
				return
			}
			pass.Report(analysis.Diagnostic{
				Pos:      call.Pos(),
				End:      call.End(),
				Category: "gamma",
				Message:  "math.Gamma overflows",
				Related:  []analysis.RelatedInformation{{Pos: call.Args[0].Pos(), End: call.Args[0].End(), Message: "argument"}},
				SuggestedFixes: []analysis.SuggestedFix{
					{Message: "call gammaChecked", TextEdits: []analysis.TextEdit{{Pos: call.Fun.Pos(), End: call.Fun.End(), NewText: []byte("gammaChecked")}}},
					{Message: "drop the call", TextEdits: []analysis.TextEdit{{Pos: call.Pos(), End: call.End(), NewText: []byte("0")}}},
				},
			})
		})
		return nil, nil
	},
}

// panicky panics on every package, to test that the server survives.
var panicky = &analysis.Analyzer{
	Name: "panicky",
	Doc:  "panic (test analyzer)",
	Run:  func(*analysis.Pass) (any, error) { panic("deliberate test panic") },
}

// writeModule writes a module of the given files into a fresh directory.
func writeModule(t *testing.T, files map[string]string) string {
	t.Helper()
	dir := t.TempDir()
	if _, ok := files["go.mod"]; !ok {
		files["go.mod"] = "module example.com/desk\n\ngo 1.21\n"
	}
	writeFiles(t, dir, files)
	return dir
}

func writeFiles(t testing.TB, dir string, files map[string]string) {
	t.Helper()
	for name, text := range files {
		p := filepath.Join(dir, name)
		if err := os.MkdirAll(filepath.Dir(p), 0o755); err != nil {
			t.Fatal(err)
		}
		if err := os.WriteFile(p, []byte(text), 0o644); err != nil {
			t.Fatal(err)
		}
	}
}

// client drives a server over pipes with hand-built JSON-RPC messages.
type client struct {
	t      *testing.T
	in     *io.PipeWriter // client -> server
	done   chan error     // Serve's result
	nextID int

	mu        sync.Mutex
	responses map[string]chan *message
	notes     chan *message
}

// timeout bounds every wait: the machine is shared and go list is slow.
const timeout = 60 * time.Second

func startServer(t *testing.T, opts Options) *client {
	t.Helper()
	cr, cw := io.Pipe()
	sr, sw := io.Pipe()
	c := &client{t: t, in: cw, done: make(chan error, 1), responses: make(map[string]chan *message), notes: make(chan *message, 100)}
	go func() {
		err := Serve(context.Background(), cr, sw, opts)
		sw.Close()
		c.done <- err
	}()
	go c.read(newFrameReader(sr))
	t.Cleanup(func() {
		cw.Close()
		select {
		case <-c.done:
		case <-time.After(timeout):
			t.Error("server did not stop after its input closed")
		}
	})
	return c
}

func (c *client) read(fr *frameReader) {
	for {
		body, err := fr.next()
		if err != nil {
			close(c.notes)
			return
		}
		m := new(message)
		if err := json.Unmarshal(body, m); err != nil {
			c.t.Errorf("server sent bad JSON %q: %v", body, err)
			continue
		}
		if m.Method != "" {
			c.notes <- m
			continue
		}
		c.mu.Lock()
		ch := c.responses[idKey(m.ID)]
		c.mu.Unlock()
		if ch == nil {
			c.t.Errorf("response to unknown id: %s", body)
			continue
		}
		ch <- m
	}
}

func idKey(id *json.RawMessage) string {
	if id == nil {
		return "<none>"
	}
	return string(*id)
}

// sendRaw writes bytes to the server as they are.
func (c *client) sendRaw(s string) {
	c.t.Helper()
	if _, err := io.WriteString(c.in, s); err != nil {
		c.t.Fatal(err)
	}
}

// frame wraps body in a Content-Length header.
func frameOf(body string) string {
	return fmt.Sprintf("Content-Length: %d\r\n\r\n%s", len(body), body)
}

// expect registers interest in the response with the given raw id.
func (c *client) expect(id string) chan *message {
	ch := make(chan *message, 1)
	c.mu.Lock()
	c.responses[id] = ch
	c.mu.Unlock()
	return ch
}

// call sends a request and waits for its response.
func (c *client) call(method string, params any) *message {
	c.t.Helper()
	c.nextID++
	id := fmt.Sprint(c.nextID)
	ch := c.expect(id)
	c.send(id, method, params)
	return c.wait(ch)
}

func (c *client) wait(ch chan *message) *message {
	c.t.Helper()
	select {
	case m := <-ch:
		return m
	case <-time.After(timeout):
		c.t.Fatalf("no response within %v", timeout)
		return nil
	}
}

// send writes a request (id != "") or notification.
func (c *client) send(id, method string, params any) {
	c.t.Helper()
	raw, err := json.Marshal(params)
	if err != nil {
		c.t.Fatal(err)
	}
	m := map[string]any{"jsonrpc": "2.0", "method": method, "params": json.RawMessage(raw)}
	if id != "" {
		m["id"] = json.RawMessage(id)
	}
	body, _ := json.Marshal(m)
	c.sendRaw(frameOf(string(body)))
}

func (c *client) notify(method string, params any) { c.t.Helper(); c.send("", method, params) }

// initialize performs the opening handshake with the given capabilities.
func (c *client) initialize(caps map[string]any) initializeResult {
	c.t.Helper()
	m := c.call("initialize", map[string]any{"processId": nil, "capabilities": caps})
	if m.Error != nil {
		c.t.Fatalf("initialize: %v", m.Error)
	}
	var r initializeResult
	if err := json.Unmarshal(m.Result, &r); err != nil {
		c.t.Fatal(err)
	}
	c.notify("initialized", map[string]any{})
	return r
}

// diagnosticsFor waits for a publishDiagnostics of uri that satisfies ok,
// skipping other notifications; it returns the accepted params.
func (c *client) diagnosticsFor(uri string, ok func(publishDiagnosticsParams) bool) publishDiagnosticsParams {
	c.t.Helper()
	for {
		m := c.note("textDocument/publishDiagnostics")
		var p publishDiagnosticsParams
		if err := json.Unmarshal(m.Params, &p); err != nil {
			c.t.Fatal(err)
		}
		if p.URI == uri && ok(p) {
			return p
		}
	}
}

// note waits for a notification of the given method.
func (c *client) note(method string) *message {
	c.t.Helper()
	deadline := time.After(timeout)
	for {
		select {
		case m, open := <-c.notes:
			if !open {
				c.t.Fatalf("server closed its output while waiting for %s", method)
			}
			if m.Method == method {
				return m
			}
		case <-deadline:
			c.t.Fatalf("no %s within %v", method, timeout)
		}
	}
}

// open sends didOpen for the file at path with its text on disk or text.
func (c *client) open(path, text string) string {
	c.t.Helper()
	uri := pathToURI(path)
	c.notify("textDocument/didOpen", map[string]any{"textDocument": map[string]any{
		"uri": uri, "languageId": "go", "version": 1, "text": text,
	}})
	return uri
}

// shutdown performs the orderly end of a connection and returns Serve's result.
func (c *client) shutdown() error {
	c.t.Helper()
	if m := c.call("shutdown", nil); m.Error != nil {
		c.t.Fatalf("shutdown: %v", m.Error)
	}
	c.notify("exit", nil)
	select {
	case err := <-c.done:
		c.done <- err // for Cleanup
		return err
	case <-time.After(timeout):
		c.t.Fatal("server did not exit")
		return nil
	}
}

func anyDiags(p publishDiagnosticsParams) bool { return len(p.Diagnostics) > 0 }
func noDiags(p publishDiagnosticsParams) bool  { return len(p.Diagnostics) == 0 }
func lineOf(text string, sub string) uint32 {
	return uint32(strings.Count(text[:strings.Index(text, sub)], "\n"))
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

// openDesk starts a server with opts on a module holding deskSource as
// desk.go, opens the file and waits for its findings.
func openDesk(t *testing.T, opts Options) (c *client, path, uri string) {
	t.Helper()
	dir := writeModule(t, map[string]string{"desk.go": deskSource})
	c = startServer(t, opts)
	c.initialize(map[string]any{})
	path = filepath.Join(dir, "desk.go")
	uri = c.open(path, deskSource)
	c.diagnosticsFor(uri, anyDiags)
	return c, path, uri
}

// change sends a didChange of uri to version with the given content
// changes: a string is a full text, a textChange a ranged one.
func (c *client) change(uri string, version int, changes ...any) {
	c.t.Helper()
	var list []any
	for _, ch := range changes {
		switch ch := ch.(type) {
		case string:
			list = append(list, map[string]any{"text": ch})
		case textChange:
			list = append(list, map[string]any{"range": ch.r, "text": ch.text})
		}
	}
	c.notify("textDocument/didChange", map[string]any{
		"textDocument":   map[string]any{"uri": uri, "version": version},
		"contentChanges": list,
	})
}

type textChange struct {
	r    Range
	text string
}
