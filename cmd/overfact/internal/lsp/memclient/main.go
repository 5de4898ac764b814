// Command memclient measures the memory of "overfact lsp" over a long
// editing session. It writes a module of many small packages into a fresh
// directory, starts the server as an editor would (a child process spoken
// to over its standard input and output), and, for each package in turn,
// opens its file, waits for the diagnostics, asks for the quick fixes of
// the first one, edits the buffer, waits for the new diagnostics and closes
// the file. After each package it reads the server's resident set size
// (VmRSS) and peak (VmHWM) from /proc/PID/status, and prints them.
//
// With -latency it measures time instead (latency.go): a cold open of a
// file of an existing module to its first diagnostics, and edits of a
// generated 2,000-line file to their diagnostics.
//
// scripts/lsp-memory.sh and scripts/lsp-latency.sh build the server and
// run this command.
package main

import (
	"bufio"
	"encoding/json"
	"flag"
	"fmt"
	"io"
	"net/url"
	"os"
	"os/exec"
	"path/filepath"
	"strconv"
	"strings"
	"time"
)

// pkgSource is one package of the generated module: a scheduling helper of
// an invented rota planner, with a binomial coefficient written as a ratio
// of factorials (a finding with a quick fix) and imports of fmt and math,
// so that each package's load carries a realistic import graph.
const pkgSource = `package %[1]s

import (
	"fmt"
	"math"
)

// Rotas counts the ways to choose k of n volunteers for a shift.
func Rotas(n, k int) int {
	return fact(n) / (fact(k) * fact(n-k))
}

// Spread reports the share of rotas that include a given volunteer.
func Spread(n, k int) string {
	return fmt.Sprintf("%%.3f", math.Round(float64(k)/float64(n)*1000)/1000)
}

func fact(n int) int {
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}
`

func main() {
	server := flag.String("server", "overfact", "the overfact `command` to run as \"command lsp\"")
	n := flag.Int("packages", 120, "number of packages to open, analyse and close in turn")
	every := flag.Int("every", 10, "print the memory figures after every `n` packages")
	limit := flag.Int("target", 1024, "the peak RSS target in MiB, for the printed ratio")
	latency := flag.Bool("latency", false, "measure latency instead of memory: -open's cold open, then -edits edits of a generated file")
	open := flag.String("open", "", "with -latency: a Go `file` of an existing module to open cold")
	edits := flag.Int("edits", 20, "with -latency: edits of the generated file to time")
	flag.Parse()
	if *latency {
		if err := runLatency(*server, *open, *edits); err != nil {
			fmt.Fprintln(os.Stderr, "memclient:", err)
			os.Exit(1)
		}
		return
	}
	if err := run(*server, *n, *every, *limit); err != nil {
		fmt.Fprintln(os.Stderr, "memclient:", err)
		os.Exit(1)
	}
}

func run(server string, n, every, limit int) error {
	dir, err := os.MkdirTemp("", "overfact-lspmem-")
	if err != nil {
		return err
	}
	defer os.RemoveAll(dir)
	files, err := writeModule(dir, n)
	if err != nil {
		return err
	}
	c, cmd, err := startServer(server, dir)
	if err != nil {
		return err
	}
	defer cmd.Process.Kill()
	start := time.Now()
	peak := 0
	for i, f := range files {
		if err := c.session(f); err != nil {
			return fmt.Errorf("package %d: %v", i+1, err)
		}
		rss, hwm, err := memory(cmd.Process.Pid)
		if err != nil {
			return err
		}
		peak = hwm
		if (i+1)%every == 0 || i+1 == len(files) {
			fmt.Printf("after %3d packages: RSS %5d MiB, peak RSS %5d MiB, %v\n", i+1, rss/1024, hwm/1024, time.Since(start).Round(time.Second))
		}
	}
	if err := c.shutdown(cmd); err != nil {
		return err
	}
	fmt.Printf("peak RSS (VmHWM) over %d packages: %d MiB; target %d MiB; ratio %.2f×\n", n, peak/1024, limit, float64(peak)/1024/float64(limit))
	return nil
}

// startServer starts "server lsp" in dir and initializes it with dir as
// the workspace root.
func startServer(server, dir string) (*client, *exec.Cmd, error) {
	cmd := exec.Command(server, "lsp")
	cmd.Dir = dir
	cmd.Stderr = os.Stderr
	in, err := cmd.StdinPipe()
	if err != nil {
		return nil, nil, err
	}
	out, err := cmd.StdoutPipe()
	if err != nil {
		return nil, nil, err
	}
	if err := cmd.Start(); err != nil {
		return nil, nil, err
	}
	c := &client{in: in, out: bufio.NewReader(out)}
	if _, err := c.call("initialize", map[string]any{"processId": os.Getpid(), "rootUri": fileURI(dir), "capabilities": map[string]any{}}); err != nil {
		cmd.Process.Kill()
		return nil, nil, err
	}
	c.notify("initialized", map[string]any{})
	return c, cmd, nil
}

// shutdown asks the server to stop and waits for it.
func (c *client) shutdown(cmd *exec.Cmd) error {
	if _, err := c.call("shutdown", nil); err != nil {
		return err
	}
	c.notify("exit", nil)
	if err := cmd.Wait(); err != nil {
		return fmt.Errorf("server: %v", err)
	}
	return nil
}

// writeModule writes a module of n packages, one file each, and returns
// the files' paths.
func writeModule(dir string, n int) ([]string, error) {
	if err := os.WriteFile(filepath.Join(dir, "go.mod"), []byte("module example.com/rota\n\ngo 1.21\n"), 0o644); err != nil {
		return nil, err
	}
	var files []string
	for i := range n {
		name := fmt.Sprintf("shift%03d", i)
		p := filepath.Join(dir, name, name+".go")
		if err := os.MkdirAll(filepath.Dir(p), 0o755); err != nil {
			return nil, err
		}
		if err := os.WriteFile(p, []byte(fmt.Sprintf(pkgSource, name)), 0o644); err != nil {
			return nil, err
		}
		files = append(files, p)
	}
	return files, nil
}

// memory returns the VmRSS and VmHWM of process pid, in KiB.
func memory(pid int) (rss, hwm int, err error) {
	b, err := os.ReadFile(fmt.Sprintf("/proc/%d/status", pid))
	if err != nil {
		return 0, 0, err
	}
	for _, line := range strings.Split(string(b), "\n") {
		k, v, ok := strings.Cut(line, ":")
		if !ok {
			continue
		}
		kb, _ := strconv.Atoi(strings.TrimSuffix(strings.TrimSpace(v), " kB"))
		switch k {
		case "VmRSS":
			rss = kb
		case "VmHWM":
			hwm = kb
		}
	}
	return rss, hwm, nil
}

func fileURI(path string) string {
	return (&url.URL{Scheme: "file", Path: filepath.ToSlash(path)}).String()
}

// client speaks JSON-RPC 2.0 with Content-Length framing (LSP 3.17 "Base
// Protocol") to the server, one request at a time.
type client struct {
	in     io.Writer
	out    *bufio.Reader
	nextID int
}

type message struct {
	JSONRPC string          `json:"jsonrpc"`
	ID      *int            `json:"id,omitempty"`
	Method  string          `json:"method,omitempty"`
	Params  json.RawMessage `json:"params,omitempty"`
	Result  json.RawMessage `json:"result,omitempty"`
	Error   *struct {
		Message string `json:"message"`
	} `json:"error,omitempty"`
}

type diagnostics struct {
	URI         string `json:"uri"`
	Version     *int   `json:"version"`
	Diagnostics []struct {
		Range json.RawMessage `json:"range"`
	} `json:"diagnostics"`
}

// session opens file, analyses it, asks for the fixes of its first
// finding, edits it and closes it.
func (c *client) session(file string) error {
	text, err := os.ReadFile(file)
	if err != nil {
		return err
	}
	uri := fileURI(file)
	c.notify("textDocument/didOpen", map[string]any{"textDocument": map[string]any{"uri": uri, "languageId": "go", "version": 1, "text": string(text)}})
	d, err := c.diagnostics(uri, func(d diagnostics) bool { return d.Version != nil && *d.Version == 1 })
	if err != nil {
		return err
	}
	if len(d.Diagnostics) == 0 {
		return fmt.Errorf("no diagnostics for %s", file)
	}
	res, err := c.call("textDocument/codeAction", map[string]any{
		"textDocument": map[string]any{"uri": uri},
		"range":        d.Diagnostics[0].Range,
		"context":      map[string]any{"diagnostics": []any{}},
	})
	if err != nil {
		return err
	}
	var actions []json.RawMessage
	if err := json.Unmarshal(res, &actions); err != nil || len(actions) == 0 {
		return fmt.Errorf("no quick fix for %s (%v)", file, err)
	}
	edited := strings.Replace(string(text), "return fact(n)", "return 1 * fact(n)", 1)
	c.notify("textDocument/didChange", map[string]any{
		"textDocument":   map[string]any{"uri": uri, "version": 2},
		"contentChanges": []any{map[string]any{"text": edited}},
	})
	if _, err := c.diagnostics(uri, func(d diagnostics) bool { return d.Version != nil && *d.Version == 2 }); err != nil {
		return err
	}
	c.notify("textDocument/didClose", map[string]any{"textDocument": map[string]any{"uri": uri}})
	_, err = c.diagnostics(uri, func(d diagnostics) bool { return d.Version == nil && len(d.Diagnostics) == 0 })
	return err
}

func (c *client) write(m message) {
	m.JSONRPC = "2.0"
	body, _ := json.Marshal(m)
	fmt.Fprintf(c.in, "Content-Length: %d\r\n\r\n%s", len(body), body)
}

func (c *client) notify(method string, params any) {
	raw, _ := json.Marshal(params)
	c.write(message{Method: method, Params: raw})
}

// call sends a request and returns its result, skipping notifications.
func (c *client) call(method string, params any) (json.RawMessage, error) {
	c.nextID++
	id := c.nextID
	raw, _ := json.Marshal(params)
	c.write(message{ID: &id, Method: method, Params: raw})
	for {
		m, err := c.read()
		if err != nil {
			return nil, err
		}
		if m.Method == "" && m.ID != nil && *m.ID == id {
			if m.Error != nil {
				return nil, fmt.Errorf("%s: %s", method, m.Error.Message)
			}
			return m.Result, nil
		}
	}
}

// diagnostics waits for a publishDiagnostics of uri that satisfies ok.
func (c *client) diagnostics(uri string, ok func(diagnostics) bool) (diagnostics, error) {
	for {
		m, err := c.read()
		if err != nil {
			return diagnostics{}, err
		}
		if m.Method != "textDocument/publishDiagnostics" {
			continue
		}
		var d diagnostics
		if err := json.Unmarshal(m.Params, &d); err != nil {
			return d, err
		}
		if d.URI == uri && ok(d) {
			return d, nil
		}
	}
}

// read returns the next message from the server.
func (c *client) read() (*message, error) {
	length := -1
	for {
		line, err := c.out.ReadString('\n')
		if err != nil {
			return nil, err
		}
		line = strings.TrimRight(line, "\r\n")
		if line == "" {
			break
		}
		if v, ok := strings.CutPrefix(line, "Content-Length: "); ok {
			length, _ = strconv.Atoi(v)
		}
	}
	if length < 0 {
		return nil, fmt.Errorf("frame without Content-Length")
	}
	body := make([]byte, length)
	if _, err := io.ReadFull(c.out, body); err != nil {
		return nil, err
	}
	m := new(message)
	return m, json.Unmarshal(body, m)
}
