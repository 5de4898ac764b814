package main

import (
	"bytes"
	"encoding/json"
	"fmt"
	"os/exec"
	"strings"
	"testing"
	"time"
)

// TestTestFlag checks -test: findings in _test.go files are reported by
// default, as singlechecker does, and not with -test=false.
func TestTestFlag(t *testing.T) {
	dir := writeModule(t, map[string]string{
		"go.mod":            goMod,
		"line/line.go":      "// Package line models the bottling line.\npackage line\n",
		"line/line_test.go": strings.Replace(loopFile, "package line", "package line\n\nimport \"testing\"\n\nfunc TestOrders(t *testing.T) { _ = Orders(3) }", 1),
	})
	r := runIn(t, dir, isolated, "./...")
	if r.code != 3 || !strings.Contains(r.stderr, "line_test.go:") {
		t.Errorf("default run: code %d, stderr %q; want the finding in line_test.go", r.code, r.stderr)
	}
	r = runIn(t, dir, isolated, "-test=false", "./...")
	if r.code != 0 || r.stderr != "" {
		t.Errorf("-test=false: code %d, stderr %q; want a clean run", r.code, r.stderr)
	}
}

// TestJSONOnce checks -json on a package with tests: the finding in
// line.go belongs to both "line" and "line [line.test]", and is reported
// once, as go vet reports it; the exit code is 3, as in text mode, and 0
// when the run is clean.
func TestJSONOnce(t *testing.T) {
	dir := writeModule(t, map[string]string{
		"go.mod":            goMod,
		"line/line.go":      loopFile,
		"line/line_test.go": "package line\n\nimport \"testing\"\n\nfunc TestOrders(t *testing.T) { _ = Orders(3) }\n",
		"clean/clean.go":    "// Package clean has nothing to report.\npackage clean\n",
	})
	r := runIn(t, dir, isolated, "-json", "./...")
	var tree map[string]map[string][]struct{ Posn, Message string }
	if err := json.Unmarshal([]byte(r.stdout), &tree); err != nil {
		t.Fatalf("-json output: %v\n%s", err, r.stdout)
	}
	n := 0
	for _, byAnalyzer := range tree {
		n += len(byAnalyzer["overfact"])
	}
	if r.code != 3 || n != 1 {
		t.Errorf("-json: code %d, %d findings; want 3 and one finding\n%s", r.code, n, r.stdout)
	}
	if r := runIn(t, dir, isolated, "-json", "./clean"); r.code != 0 {
		t.Errorf("-json on a clean package: code %d, want 0\n%s", r.code, r.stderr)
	}
}

// frame encodes one JSON-RPC message with the Content-Length header of
// the Language Server Protocol's base protocol.
func frame(body string) string {
	return fmt.Sprintf("Content-Length: %d\r\n\r\n%s", len(body), body)
}

// TestLSPSubcommand starts "overfact lsp", sends initialize, shutdown
// and exit as an editor does (LSP 3.17 lifecycle), and expects the
// initialize result with the server's capabilities and a clean exit.
func TestLSPSubcommand(t *testing.T) {
	in := frame(`{"jsonrpc":"2.0","id":1,"method":"initialize","params":{"processId":null,"rootUri":null,"capabilities":{}}}`) +
		frame(`{"jsonrpc":"2.0","method":"initialized","params":{}}`) +
		frame(`{"jsonrpc":"2.0","id":2,"method":"shutdown"}`) +
		frame(`{"jsonrpc":"2.0","method":"exit"}`)
	cmd := exec.Command(overfactBin, "lsp")
	cmd.Stdin = strings.NewReader(in)
	var out, errb bytes.Buffer
	cmd.Stdout, cmd.Stderr = &out, &errb
	if err := cmd.Start(); err != nil {
		t.Fatal(err)
	}
	done := make(chan error, 1)
	go func() { done <- cmd.Wait() }()
	select {
	case err := <-done:
		if err != nil {
			t.Errorf("overfact lsp: %v\n%s", err, errb.String())
		}
	case <-time.After(20 * time.Second):
		cmd.Process.Kill()
		t.Fatalf("overfact lsp did not exit after the exit notification")
	}
	if !strings.Contains(out.String(), `"capabilities"`) || !strings.Contains(out.String(), `"id":2`) {
		t.Errorf("no initialize result and shutdown reply:\n%s", out.String())
	}
}

func TestConflictingFlags(t *testing.T) {
	for _, args := range [][]string{
		{"-fix", "-json", "./..."},
		{"-diff", "-sarif", "out.sarif", "./..."},
		{"-json", "-sarif", "-", "./..."},
	} {
		if r := runIn(t, ".", nil, args...); r.code != 2 || !strings.Contains(r.stderr, "overfact: ") {
			t.Errorf("%v: code %d, stderr %q; want 2 and an explanation", args, r.code, r.stderr)
		}
	}
}
