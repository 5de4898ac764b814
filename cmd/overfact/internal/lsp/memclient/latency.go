package main

import (
	"fmt"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"time"
)

// debounce is the server's default wait after a change (defaultDebounce
// in cmd/overfact/internal/lsp); the edit target is set beyond it.
const debounce = 300 * time.Millisecond

// runLatency measures, with a fresh server each time, a cold open of
// open (twice: the first may also build the module's export data into
// the go build cache, as the first build of a checkout does), and then
// edits of a generated 2,000-line file, each timed from the change to
// the diagnostics of its version.
func runLatency(server, open string, edits int) error {
	if open != "" {
		abs, err := filepath.Abs(open)
		if err != nil {
			return err
		}
		for _, run := range []string{"first", "second"} {
			d, n, err := coldOpen(server, abs)
			if err != nil {
				return err
			}
			fmt.Printf("cold open of %s (%s server): first diagnostics (%d) after %v; target 1.5s; ratio %.2f×\n",
				filepath.Base(abs), run, n, d.Round(time.Millisecond), d.Seconds()/1.5)
		}
	}
	return editLoop(server, edits)
}

// coldOpen starts a server in the file's directory, opens the file and
// returns the time to its first diagnostics and their number.
func coldOpen(server, file string) (time.Duration, int, error) {
	c, cmd, err := startServer(server, filepath.Dir(file))
	if err != nil {
		return 0, 0, err
	}
	defer cmd.Process.Kill()
	text, err := os.ReadFile(file)
	if err != nil {
		return 0, 0, err
	}
	uri := fileURI(file)
	start := time.Now()
	c.notify("textDocument/didOpen", map[string]any{"textDocument": map[string]any{"uri": uri, "languageId": "go", "version": 1, "text": string(text)}})
	d, err := c.diagnostics(uri, func(d diagnostics) bool { return d.Version != nil && *d.Version == 1 })
	if err != nil {
		return 0, 0, err
	}
	took := time.Since(start)
	return took, len(d.Diagnostics), c.shutdown(cmd)
}

// editLoop writes a module with one 2,000-line file of the memory
// session's package repeated, opens it, and then changes one line per
// edit, waiting for the diagnostics of each version.
func editLoop(server string, edits int) error {
	dir, err := os.MkdirTemp("", "overfact-lsplat-")
	if err != nil {
		return err
	}
	defer os.RemoveAll(dir)
	file, lines, err := writeLongFile(dir, 2000)
	if err != nil {
		return err
	}
	c, cmd, err := startServer(server, dir)
	if err != nil {
		return err
	}
	defer cmd.Process.Kill()
	text, err := os.ReadFile(file)
	if err != nil {
		return err
	}
	uri := fileURI(file)
	start := time.Now()
	c.notify("textDocument/didOpen", map[string]any{"textDocument": map[string]any{"uri": uri, "languageId": "go", "version": 1, "text": string(text)}})
	first, err := c.diagnostics(uri, func(d diagnostics) bool { return d.Version != nil && *d.Version == 1 })
	if err != nil {
		return err
	}
	fmt.Printf("open of a %d-line file: %d diagnostics after %v\n", lines, len(first.Diagnostics), time.Since(start).Round(time.Millisecond))
	var beyond []float64
	for v := 2; v < edits+2; v++ {
		// A new comment line at the top: every finding moves, so every
		// diagnostic must be recomputed and published again.
		edited := fmt.Sprintf("// edit %d\n%s", v, text)
		start := time.Now()
		c.notify("textDocument/didChange", map[string]any{
			"textDocument":   map[string]any{"uri": uri, "version": v},
			"contentChanges": []any{map[string]any{"text": edited}},
		})
		d, err := c.diagnostics(uri, func(d diagnostics) bool { return d.Version != nil && *d.Version == v })
		if err != nil {
			return err
		}
		if len(d.Diagnostics) != len(first.Diagnostics) {
			return fmt.Errorf("edit %d: %d diagnostics, want %d", v, len(d.Diagnostics), len(first.Diagnostics))
		}
		beyond = append(beyond, (time.Since(start)-debounce).Seconds()*1000)
	}
	slices.Sort(beyond)
	fmt.Printf("edit → diagnostics on the %d-line file, %d edits: beyond the %v debounce median %.0fms, max %.0fms; target 100ms; ratio %.2f×\n",
		lines, len(beyond), debounce, beyond[len(beyond)/2], beyond[len(beyond)-1], beyond[len(beyond)/2]/100)
	return c.shutdown(cmd)
}

// writeLongFile writes a module whose one package is one file of at least
// lines lines: the memory session's functions, renamed per copy, with the
// factorial ones (a finding each, with a quick fix) in one copy of ten,
// the others plain arithmetic, as in a long file of real code.
func writeLongFile(dir string, lines int) (string, int, error) {
	if err := os.WriteFile(filepath.Join(dir, "go.mod"), []byte("module example.com/rota\n\ngo 1.21\n"), 0o644); err != nil {
		return "", 0, err
	}
	body := pkgSource[strings.Index(pkgSource, "// Rotas"):]
	plain := body[strings.Index(body, "// Spread"):strings.Index(body, "func fact")]
	var b strings.Builder
	b.WriteString("package rota\n\nimport (\n\t\"fmt\"\n\t\"math\"\n)\n")
	for i := 0; strings.Count(b.String(), "\n") < lines; i++ {
		r := strings.NewReplacer("Rotas", fmt.Sprintf("Rotas%d", i), "Spread", fmt.Sprintf("Spread%d", i), "fact", fmt.Sprintf("fact%d", i), "%%", "%")
		if i%10 == 0 {
			b.WriteString("\n" + r.Replace(body))
		} else {
			b.WriteString("\n" + r.Replace(plain))
		}
	}
	file := filepath.Join(dir, "rota.go")
	return file, strings.Count(b.String(), "\n"), os.WriteFile(file, []byte(b.String()), 0o644)
}
