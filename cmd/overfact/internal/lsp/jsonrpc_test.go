package lsp

import (
	"encoding/json"
	"fmt"
	"io"
	"path/filepath"
	"strings"
	"testing"
)

// TestFrameReader feeds streams framed as LSP 3.17 "Base Protocol" describes
// (header lines ended by \r\n, a blank line, then Content-Length bytes),
// and broken variants of them.
func TestFrameReader(t *testing.T) {
	for _, tc := range []struct {
		name   string
		stream string
		want   []string // bodies; "!nolength" and "!eof"/"!unexpected" for errors
	}{
		{"one", "Content-Length: 2\r\n\r\n{}", []string{"{}", "!eof"}},
		{"two with content type", "Content-Length: 2\r\nContent-Type: application/vscode-jsonrpc; charset=utf-8\r\n\r\n{}Content-Length: 3\r\n\r\n[1]", []string{"{}", "[1]", "!eof"}},
		{"header name case", "content-length: 2\r\n\r\n{}", []string{"{}", "!eof"}},
		{"bare newlines", "Content-Length: 2\n\n{}", []string{"{}", "!eof"}},
		{"garbage before", "hello\r\nworld\r\nContent-Length: 2\r\n\r\n{}", []string{"{}", "!eof"}},
		{"missing length", "Content-Type: x\r\n\r\n{\"a\":1}\r\nContent-Length: 2\r\n\r\n{}", []string{"!nolength", "{}", "!eof"}},
		// The body of the length-less frame has no newline, so the next
		// header is glued to it and must still be found.
		{"glued header", "Content-Type: x\r\n\r\n{}Content-Length: 2\r\n\r\n{}", []string{"!nolength", "{}", "!eof"}},
		{"bad length", "Content-Length: x\r\n\r\n{}Content-Length: 2\r\n\r\n{}", []string{"!nolength", "{}", "!eof"}},
		{"negative length", "Content-Length: -4\r\n\r\nContent-Length: 2\r\n\r\n{}", []string{"!nolength", "{}", "!eof"}},
		{"short body", "Content-Length: 10\r\n\r\n{}", []string{"!unexpected"}},
		{"eof in header", "Content-Length: 10\r\n", []string{"!unexpected"}},
		{"empty", "", []string{"!eof"}},
		// Invalid UTF-8 before a glued header (found by FuzzServe): the
		// header's index must be one into the line as read.
		{"invalid UTF-8 before header", "\x9b\x9b}Content-Length: 2\r\n\r\n{}", []string{"{}", "!eof"}},
		{"upper-case header", "CONTENT-LENGTH: 2\r\n\r\n{}", []string{"{}", "!eof"}},
	} {
		t.Run(tc.name, func(t *testing.T) {
			fr := newFrameReader(strings.NewReader(tc.stream))
			for i, want := range tc.want {
				body, err := fr.next()
				got := string(body)
				switch err {
				case nil:
				case errNoLength:
					got = "!nolength"
				case io.EOF:
					got = "!eof"
				case io.ErrUnexpectedEOF:
					got = "!unexpected"
				default:
					got = "!" + err.Error()
				}
				if got != want {
					t.Fatalf("frame %d = %q, want %q", i, got, want)
				}
			}
		})
	}
}

func TestGuessID(t *testing.T) {
	for _, tc := range []struct{ body, want string }{
		{`{"jsonrpc":"2.0","id":7,"method":`, "7"},
		{`{"id": "a\"b", "method"`, `"a\"b"`},
		{`{"method":"x"`, ""},
		{`{{{`, ""},
	} {
		got := ""
		if id := guessID([]byte(tc.body)); id != nil {
			got = string(*id)
		}
		if got != tc.want {
			t.Errorf("guessID(%s) = %s, want %s", tc.body, got, tc.want)
		}
	}
}

// TestBadInput sends the server broken and unexpected messages and checks
// the JSON-RPC 2.0 error codes (specification section 5.1) and that the
// server goes on answering afterwards.
func TestBadInput(t *testing.T) {
	c := startServer(t, testOptions())

	// Before initialize, requests fail with ServerNotInitialized (LSP 3.17).
	ch := c.expect("100")
	c.send("100", "textDocument/codeAction", map[string]any{})
	if m := c.wait(ch); m.Error == nil || m.Error.Code != codeServerNotInitialized {
		t.Errorf("request before initialize: %+v", m.Error)
	}
	c.initialize(map[string]any{})

	// Garbage and a length-less frame are skipped.
	c.sendRaw("this is not a header\r\n")
	c.sendRaw("Content-Type: text/plain\r\n\r\n{\"jsonrpc\":\"2.0\",\"id\":555,\"method\":\"shutdown\"}")

	// Invalid JSON with a recognisable id gets a parse error.
	ch = c.expect("7")
	c.sendRaw(frameOf(`{"jsonrpc":"2.0","id":7,"method":"textDocument/codeAction","params":{`))
	if m := c.wait(ch); m.Error == nil || m.Error.Code != codeParseError {
		t.Errorf("bad JSON: %+v", m)
	}
	// Invalid JSON without one is dropped.
	c.sendRaw(frameOf(`{{{`))

	// An unknown request gets MethodNotFound; an unknown notification
	// nothing.
	c.notify("overfact/noSuchNotification", map[string]any{})
	ch = c.expect("8")
	c.send("8", "overfact/noSuchMethod", map[string]any{})
	if m := c.wait(ch); m.Error == nil || m.Error.Code != codeMethodNotFound {
		t.Errorf("unknown method: %+v", m)
	}
	// A second initialize is refused.
	if m := c.call("initialize", map[string]any{"capabilities": map[string]any{}}); m.Error == nil || m.Error.Code != codeInvalidRequest {
		t.Errorf("second initialize: %+v", m)
	}
	// Bad params are InvalidParams.
	ch = c.expect("9")
	c.sendRaw(frameOf(`{"jsonrpc":"2.0","id":9,"method":"textDocument/codeAction","params":[1,2]}`))
	if m := c.wait(ch); m.Error == nil || m.Error.Code != codeInvalidParams {
		t.Errorf("bad params: %+v", m)
	}
	// Notifications about documents that are not open, or not files.
	c.notify("textDocument/didChange", map[string]any{"textDocument": map[string]any{"uri": "file:///nowhere/x.go", "version": 2}, "contentChanges": []any{map[string]any{"text": "package x"}}})
	c.notify("textDocument/didOpen", map[string]any{"textDocument": map[string]any{"uri": "untitled:Untitled-1", "languageId": "go", "version": 1, "text": "package x"}})
	c.notify("textDocument/didClose", map[string]any{"textDocument": map[string]any{"uri": "::"}})

	// Member names are case-sensitive (JSON-RPC 2.0 section 4): with "iD"
	// instead of "id" this is a notification, which is not answered, and
	// shutdown is not a notification the server knows (found by FuzzServe).
	c.sendRaw(frameOf(`{"jsonrpc":"2.0","iD":556,"method":"shutdown"}`))

	// The server still works: the skipped shutdowns (ids 555 and 556)
	// were not obeyed.
	if err := c.shutdown(); err != nil {
		t.Errorf("Serve = %v", err)
	}
}

// TestExitWithoutShutdown checks that Serve reports a client that exits
// without shutdown, which LSP 3.17 maps to exit code 1.
func TestExitWithoutShutdown(t *testing.T) {
	c := startServer(t, testOptions())
	c.initialize(map[string]any{})
	c.notify("exit", nil)
	if err := <-c.done; err == nil {
		t.Error("Serve returned nil after exit without shutdown")
	}
	c.done <- nil
}

// TestTruncatedInput closes the input in the middle of a frame.
func TestTruncatedInput(t *testing.T) {
	c := startServer(t, testOptions())
	c.initialize(map[string]any{})
	c.sendRaw("Content-Length: 100\r\n\r\n{\"jsonrpc\"")
	c.in.Close()
	if err := <-c.done; err == nil {
		t.Error("Serve returned nil for input cut inside a frame")
	}
	c.done <- nil
}

// TestConcurrentRequests sends code action requests for two files without
// waiting and checks every one is answered with its own id.
func TestConcurrentRequests(t *testing.T) {
	dir := writeModule(t, map[string]string{"desk.go": deskSource, "queue/queue.go": strings.Replace(deskSource, "package desk", "package queue", 1)})
	c := startServer(t, testOptions())
	c.initialize(map[string]any{})
	uris := []string{c.open(filepath.Join(dir, "desk.go"), deskSource), c.open(filepath.Join(dir, "queue", "queue.go"), strings.Replace(deskSource, "package desk", "package queue", 1))}
	line := lineOf(deskSource, "math.Gamma")
	var chans []chan *message
	for i := 0; i < 12; i++ {
		id := fmt.Sprintf(`"r%d"`, i) // string ids, as JSON-RPC 2.0 allows
		chans = append(chans, c.expect(id))
		c.send(id, "textDocument/codeAction", map[string]any{
			"textDocument": map[string]any{"uri": uris[i%2]},
			"range":        Range{Start: Position{line, 30}, End: Position{line, 30}},
			"context":      map[string]any{"diagnostics": []any{}},
		})
	}
	for i, ch := range chans {
		m := c.wait(ch)
		var as []CodeAction
		if m.Error != nil || json.Unmarshal(m.Result, &as) != nil || len(as) != 2 {
			t.Errorf("request %d: %s %+v", i, m.Result, m.Error)
		}
	}
}
