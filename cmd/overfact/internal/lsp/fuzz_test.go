package lsp

import (
	"bytes"
	"context"
	"encoding/json"
	"fmt"
	"go/token"
	"path/filepath"
	"strconv"
	"strings"
	"testing"
	"time"

	"golang.org/x/tools/go/analysis"
)

// FuzzServe feeds the server a byte stream as a client would write it to
// the server's standard input: Content-Length framing, JSON-RPC bodies, and
// sequences of requests and notifications, all mutated by the engine. The
// loading and analysis of packages is replaced by quickAnalysis, so each
// input costs the protocol code's time alone. For every input the server
// must end, without a panic (recovered or not) in its handlers, having
// written only well-formed frames: each a JSON-RPC 2.0 message, a
// notification of a method the server sends or a response carrying exactly
// one of result and error, to an id the input contained, never more often
// than the input sent that id; a code action's edits have ranges that end
// after they start.
//
// Run it with
//
//	go test -run '^$' -fuzz FuzzServe -fuzztime 10m -parallel 1 ./cmd/overfact/internal/lsp
func FuzzServe(f *testing.F) {
	for _, s := range fuzzSeeds() {
		f.Add([]byte(s))
	}
	f.Fuzz(func(t *testing.T, stream []byte) {
		var out bytes.Buffer // written under frameWriter's lock; read after Serve returns
		var trace syncBuffer
		done := make(chan error, 1)
		go func() {
			done <- serve(context.Background(), bytes.NewReader(stream), &out, Options{Debounce: -1, Log: &trace}, quickAnalysis)
		}()
		select {
		case <-done:
		case <-time.After(20 * time.Second):
			t.Fatalf("the server did not end after its input did")
		}
		if strings.Contains(trace.String(), "panic") {
			t.Fatalf("a handler panicked:\n%s", trace.String())
		}
		checkOutput(t, stream, out.Bytes())
	})
}

// quickAnalysis stands in for loading and analysing a package: the package
// of path is the open Go files of its directory, and every "Gamma(" in them
// is a finding whose fix renames it; positions go through the server's own
// converter, as a real analysis's do.
func quickAnalysis(docs map[string]*document, path string, enc encoding) (*result, error) {
	fset := token.NewFileSet()
	conv := &converter{enc: enc, overlay: overlayOf(docs), fset: fset, texts: make(map[string][]byte), severity: defaultSeverity}
	res := newResult()
	var diags []analysis.Diagnostic
	for p, d := range docs {
		if filepath.Dir(p) != filepath.Dir(path) || !isGoFile(p) {
			continue
		}
		res.docs[p] = d
		tf := fset.AddFile(p, -1, len(d.text))
		tf.SetLinesForContent(d.text)
		for i := 0; ; {
			j := bytes.Index(d.text[i:], []byte("Gamma("))
			if j < 0 {
				break
			}
			pos := tf.Pos(i + j)
			end := pos + token.Pos(len("Gamma"))
			diags = append(diags, analysis.Diagnostic{Pos: pos, End: end, Category: "gamma", Message: "Gamma overflows",
				SuggestedFixes: []analysis.SuggestedFix{{Message: "check it", TextEdits: []analysis.TextEdit{{Pos: pos, End: end, NewText: []byte("GammaChecked")}}}}})
			i += j + 1
		}
	}
	for _, d := range diags {
		res.add(conv, docs, d)
	}
	return res, nil
}

// checkOutput checks the server's output with a parser of its own, written
// from LSP 3.17 "Base Protocol" and JSON-RPC 2.0 sections 4 and 5.
func checkOutput(t *testing.T, in, out []byte) {
	t.Helper()
	sent := idsSent(in)
	answered := make(map[string]int)
	for len(out) > 0 {
		const prefix = "Content-Length: "
		if !bytes.HasPrefix(out, []byte(prefix)) {
			t.Fatalf("output does not start with a Content-Length header: %q", out)
		}
		header, rest, ok := bytes.Cut(out, []byte("\r\n\r\n"))
		if !ok {
			t.Fatalf("header without its blank line: %q", out)
		}
		n, err := strconv.Atoi(string(header[len(prefix):]))
		if err != nil || n > len(rest) {
			t.Fatalf("bad Content-Length in %q (%d bytes follow)", header, len(rest))
		}
		body := rest[:n]
		out = rest[n:]
		var m map[string]json.RawMessage
		if err := json.Unmarshal(body, &m); err != nil || string(m["jsonrpc"]) != `"2.0"` {
			t.Fatalf("not a JSON-RPC 2.0 message: %q (%v)", body, err)
		}
		id, hasID := m["id"]
		if method, ok := m["method"]; ok {
			if hasID || (string(method) != `"textDocument/publishDiagnostics"` && string(method) != `"window/logMessage"`) {
				t.Fatalf("unexpected message from the server: %s", body)
			}
			continue
		}
		result, hasResult := m["result"]
		_, hasError := m["error"]
		if !hasID || hasResult == hasError {
			t.Fatalf("a response needs an id and exactly one of result and error: %s", body)
		}
		if string(id) != "null" {
			k := idValue(id)
			answered[k]++
			if answered[k] > sent[k] {
				t.Fatalf("id %s answered %d times, sent %d times", id, answered[k], sent[k])
			}
		}
		var actions []CodeAction
		if json.Unmarshal(result, &actions) == nil {
			for _, a := range actions {
				checkEdit(t, a)
			}
		}
	}
}

// checkEdit checks that the edits of a code action have well-formed
// ranges (a start not after its end).
func checkEdit(t *testing.T, a CodeAction) {
	t.Helper()
	if a.Edit == nil {
		t.Fatalf("code action %q without an edit", a.Title)
	}
	all := [][]TextEdit{}
	for _, edits := range a.Edit.Changes {
		all = append(all, edits)
	}
	for _, dc := range a.Edit.DocumentChanges {
		all = append(all, dc.Edits)
	}
	for _, edits := range all {
		for _, e := range edits {
			if before(e.Range.End, e.Range.Start) {
				t.Fatalf("edit range %+v ends before it starts", e.Range)
			}
		}
	}
}

// idsSent counts the ids of the request-shaped bodies in a stream, by
// value, so that 1 and 1.0 or "a" and "\u0061" are one id.
func idsSent(in []byte) map[string]int {
	ids := make(map[string]int)
	for _, body := range bodies(in) {
		var m map[string]json.RawMessage
		if json.Unmarshal(body, &m) == nil {
			if id, ok := m["id"]; ok {
				ids[idValue(id)]++
			}
		} else if id := guessID(body); id != nil {
			ids[idValue(*id)]++
		}
	}
	return ids
}

// bodies splits a stream as the server's reader does.
func bodies(in []byte) [][]byte {
	var out [][]byte
	fr := newFrameReader(bytes.NewReader(in))
	for {
		body, err := fr.next()
		if err == errNoLength {
			continue
		}
		if err != nil {
			return out
		}
		out = append(out, body)
	}
}

func idValue(raw json.RawMessage) string {
	var v any
	if json.Unmarshal(raw, &v) != nil {
		return string(raw)
	}
	return fmt.Sprintf("%T %v", v, v)
}

// fuzzSeeds are whole sessions and broken ones: the engine mutates them
// into the rest.
func fuzzSeeds() []string {
	msg := func(id any, method string, params any) string {
		m := map[string]any{"jsonrpc": "2.0", "method": method}
		if id != nil {
			m["id"] = id
		}
		if params != nil {
			m["params"] = params
		}
		b, _ := json.Marshal(m)
		return frameOf(string(b))
	}
	uri := "file:///rota/shift.go"
	doc := func(v int) map[string]any { return map[string]any{"uri": uri, "version": v} }
	text := "package rota\n\nimport \"math\"\n\n// é λ 𝛤\nvar X = math.Gamma(20)\n"
	rng := func(l1, c1, l2, c2 int) map[string]any {
		return map[string]any{"start": map[string]any{"line": l1, "character": c1}, "end": map[string]any{"line": l2, "character": c2}}
	}
	init := msg(1, "initialize", map[string]any{"capabilities": map[string]any{}}) + msg(nil, "initialized", map[string]any{})
	open := msg(nil, "textDocument/didOpen", map[string]any{"textDocument": map[string]any{"uri": uri, "languageId": "go", "version": 1, "text": text}})
	action := msg(2, "textDocument/codeAction", map[string]any{"textDocument": map[string]any{"uri": uri}, "range": rng(5, 0, 5, 30), "context": map[string]any{"diagnostics": []any{}}})
	end := msg(9, "shutdown", nil) + msg(nil, "exit", nil)
	return []string{
		init + open + action + end,
		init + open +
			msg(nil, "textDocument/didChange", map[string]any{"textDocument": doc(2), "contentChanges": []any{map[string]any{"range": rng(5, 8, 5, 8), "text": "2*"}}}) +
			action + msg(nil, "textDocument/didSave", map[string]any{"textDocument": doc(2)}) +
			msg(nil, "textDocument/didClose", map[string]any{"textDocument": doc(2)}) + end,
		// A change that cannot be applied, then recovery by a full text.
		init + open +
			msg(nil, "textDocument/didChange", map[string]any{"textDocument": doc(2), "contentChanges": []any{map[string]any{"range": rng(50, 0, 50, 0), "text": "x"}}}) +
			action +
			msg(nil, "textDocument/didChange", map[string]any{"textDocument": doc(3), "contentChanges": []any{map[string]any{"text": text + "var Y = math.Gamma(2)\n"}}}) +
			action + end,
		// Reopen without close, utf-8 negotiated, documentChanges.
		msg(1, "initialize", map[string]any{"capabilities": map[string]any{"general": map[string]any{"positionEncodings": []string{"utf-8"}}, "workspace": map[string]any{"workspaceEdit": map[string]any{"documentChanges": true}}}}) +
			open + open + action + end,
		// Requests before initialize, twice initialize, unknown methods,
		// responses and odd ids.
		msg(1, "textDocument/codeAction", map[string]any{}) + init + init + msg("x", "overfact/none", nil) +
			msg(nil, "$/cancelRequest", map[string]any{"id": 1}) + frameOf(`{"jsonrpc":"2.0","id":7,"result":null}`) +
			frameOf(`{"jsonrpc":"2.0","id":{"a":1},"method":"shutdown"}`) + frameOf(`[{"jsonrpc":"2.0"}]`) + end,
		// Framing: no length, a bad length, garbage, lower-case header,
		// Content-Type, a truncated body.
		"Content-Type: application/vscode-jsonrpc; charset=utf-8\r\n\r\n{}" + "garbage\r\n" + "Content-Length: -4\r\n\r\n" +
			"content-length: 2\r\n\r\n{}" + "Content-Length: 99999999999\r\n\r\n" + init + "Content-Length: 40\r\n\r\n{\"id\":3",
		init + frameOf(`{"jsonrpc":"2.0","id":5,"method":"textDocument/codeAction","params":"x"}`) + frameOf(`{"id":6,`) + frameOf(``) + end + open,
		init + msg(nil, "exit", nil) + open,
	}
}
