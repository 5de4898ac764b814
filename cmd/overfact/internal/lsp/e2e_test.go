package lsp

import (
	"bytes"
	"context"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"
	"time"
)

// shiftSource is a support-desk file with a binomial coefficient written as
// a ratio of factorials, after non-ASCII text on the same line so that
// Neovim's UTF-16 to byte conversion is exercised, and a math.Gamma call
// whose finding has no fix.
const shiftSource = `package desk

import "math"

// Staff estimates the staffing table entry for n callers.
func Staff(n float64) float64 {
	return math.Gamma(n + 1)
}

// Shifts counts the ways to pick k operators of n for a shift.
func Shifts(n, k int) int {
	/* é λ 𝛤 */ return fact(n) / (fact(k) * fact(n-k))
}

func fact(n int) int {
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}
`

// TestNeovim runs "overfact lsp" under Neovim's built-in LSP client, a
// client written outside this project: testdata/lsp/e2e.lua opens a Go
// file, waits for the diagnostics, checks that Neovim placed the binomial
// finding on the right byte of its line, applies its preferred quick fix
// and writes the buffer, which this test then reads.
func TestNeovim(t *testing.T) {
	if testing.Short() {
		t.Skip("editor test skipped under -short")
	}
	nvim, err := exec.LookPath("nvim")
	if err != nil {
		t.Skip("nvim not on PATH; install it with: apt-get install -y neovim")
	}
	root, err := filepath.Abs(filepath.Join("..", "..", "..", ".."))
	if err != nil {
		t.Fatal(err)
	}
	ctx, cancel := context.WithTimeout(context.Background(), 4*time.Minute)
	defer cancel()

	tmp := t.TempDir()
	bin := filepath.Join(tmp, "overfact")
	build := exec.CommandContext(ctx, "go", "build", "-o", bin, "./cmd/overfact")
	build.Dir = root
	if out, err := build.CombinedOutput(); err != nil {
		t.Fatalf("go build: %v\n%s", err, out)
	}

	dir := writeModule(t, map[string]string{"desk.go": shiftSource})
	file := filepath.Join(dir, "desk.go")
	logPath := filepath.Join(tmp, "e2e.log")
	script := filepath.Join(root, "testdata", "lsp", "e2e.lua")

	gocache := goEnv(t, "GOCACHE") // kept: the XDG directories below move
	cmd := exec.CommandContext(ctx, nvim, "--headless", "--clean", "-u", "NONE", "-c", "luafile "+script)
	cmd.Dir = dir
	cmd.Env = append(os.Environ(),
		"OVERFACT_E2E_CMD="+bin+" lsp",
		"OVERFACT_E2E_FILE="+file,
		"OVERFACT_E2E_CODE=factorial-ratio",
		"OVERFACT_E2E_AT=fact(n) / (fact(k)",
		"OVERFACT_E2E_LOG="+logPath,
		"OVERFACT_E2E_TIMEOUT=30000",
		"GOCACHE="+gocache,
		// Keep Neovim's state, logs and swap files out of the user's home.
		"XDG_CONFIG_HOME="+filepath.Join(tmp, "config"),
		"XDG_DATA_HOME="+filepath.Join(tmp, "data"),
		"XDG_STATE_HOME="+filepath.Join(tmp, "state"),
		"XDG_CACHE_HOME="+filepath.Join(tmp, "cache"),
	)
	var out bytes.Buffer
	cmd.Stdout, cmd.Stderr = &out, &out
	runErr := cmd.Run()
	trace, _ := os.ReadFile(logPath)
	t.Logf("script trace:\n%s", trace)
	if runErr != nil {
		t.Fatalf("nvim: %v\n%s", runErr, out.Bytes())
	}
	if !bytes.Contains(trace, []byte("\nOK\n")) {
		t.Fatalf("script did not finish")
	}
	fixed, err := os.ReadFile(file)
	if err != nil {
		t.Fatal(err)
	}
	// The rewrite the fix promises: the ratio's statement returns a call
	// of the helper module, whose import is added (outside the helper's
	// domain the expression as written may stay beside it, in a test of
	// the operands: fixes/domain.go). The exact call is the fixes
	// package's business, checked by its own golden files.
	text := string(fixed)
	i := strings.Index(text, "/* é λ 𝛤 */")
	if i < 0 {
		t.Fatalf("the ratio's line is gone:\n%s", text)
	}
	stmt, _, _ := strings.Cut(text[i:], "\n}")
	if !strings.HasPrefix(stmt, "/* é λ 𝛤 */ return ") || !strings.Contains(stmt, "lgamma.") {
		t.Errorf("the ratio's statement after the fix is %q", stmt)
	}
	for _, want := range []string{`"github.com/overfact/overfact/fixes/lgamma"`, "return math.Gamma(n + 1)"} {
		if !strings.Contains(text, want) {
			t.Errorf("file after the fix lacks %q:\n%s", want, text)
		}
	}
}

func goEnv(t *testing.T, name string) string {
	t.Helper()
	out, err := exec.Command("go", "env", name).Output()
	if err != nil {
		t.Fatal(err)
	}
	return strings.TrimSpace(string(out))
}
