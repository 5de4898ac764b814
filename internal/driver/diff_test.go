package driver

import (
	"bytes"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"testing"
)

// TestUnifiedDiffApplies checks the diffs against GNU patch, an
// implementation of the unified format independent of this one: applying
// the diff to the old text must give the new text.
func TestUnifiedDiffApplies(t *testing.T) {
	patch, err := exec.LookPath("patch")
	if err != nil {
		t.Skip("patch not installed")
	}
	var long []string
	for i := 0; i < 40; i++ {
		long = append(long, "line "+strings.Repeat("x", i%5))
	}
	base := strings.Join(long, "\n") + "\n"
	tests := []struct{ name, old, new string }{
		{"one line changed", "a\nb\nc\n", "a\nB\nc\n"},
		{"insert at start", "a\nb\n", "x\na\nb\n"},
		{"append", "a\nb\n", "a\nb\nc\nd\n"},
		{"delete all", "a\nb\n", ""},
		{"from empty", "", "package p\n"},
		{"no final newline", "a\nb", "a\nc"},
		{"two distant hunks", base, strings.Replace(strings.Replace(base, "line \n", "first\n", 1), "line xxxx\nline \nline x\nline xx\nline xxx\n", "LAST\n", 1)},
		{"import added and call rewritten",
			"package p\n\nimport \"math\"\n\nfunc f(n float64) float64 {\n\treturn math.Gamma(n) / math.Gamma(n-2)\n}\n",
			"package p\n\nimport (\n\t\"math\"\n\n\t\"github.com/overfact/overfact/fixes/lgamma\"\n)\n\nfunc f(n float64) float64 {\n\treturn lgamma.GammaRatio(n, n-2)\n}\n"},
	}
	for _, tt := range tests {
		dir := t.TempDir()
		name := filepath.Join(dir, "f.go")
		if err := os.WriteFile(name, []byte(tt.old), 0o644); err != nil {
			t.Fatal(err)
		}
		var diff bytes.Buffer
		if err := writeUnified(&diff, "f.go", []byte(tt.old), []byte(tt.new)); err != nil {
			t.Fatal(err)
		}
		cmd := exec.Command(patch, "-p1", "--quiet")
		cmd.Dir = dir
		cmd.Stdin = &diff
		if out, err := cmd.CombinedOutput(); err != nil {
			t.Errorf("%s: patch failed: %v\n%s\ndiff:\n%s", tt.name, err, out, diff.String())
			continue
		}
		got, _ := os.ReadFile(name)
		if string(got) != tt.new {
			t.Errorf("%s: patched text = %q, want %q", tt.name, got, tt.new)
		}
	}
}

func TestUnifiedDiffEmpty(t *testing.T) {
	var buf bytes.Buffer
	if err := writeUnified(&buf, "f.go", []byte("a\n"), []byte("a\n")); err != nil {
		t.Fatal(err)
	}
	if buf.Len() != 0 {
		t.Errorf("equal texts gave a diff:\n%s", buf.String())
	}
}
