package driver

import (
	"golang.org/x/tools/go/analysis"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

func TestApply(t *testing.T) {
	src := "package p\n\nfunc f(n int) int { return fact(n) / fact(n-2) }\n"
	i := strings.Index(src, "fact(n) / fact(n-2)")
	edits := []edit{
		{"f.go", i, i + len("fact(n) / fact(n-2)"), "n * (n - 1)"},
		{"f.go", len("package p\n"), len("package p\n"), "\n// f counts ordered pairs.\n"},
	}
	got, err := apply([]byte(src), edits)
	if err != nil {
		t.Fatal(err)
	}
	// Written by hand: both edits applied, then gofmt (the source was
	// gofmt-clean) folds the doubled blank line.
	want := "package p\n\n// f counts ordered pairs.\n\nfunc f(n int) int { return n * (n - 1) }\n"
	if string(got) != want {
		t.Errorf("apply = %q, want %q", got, want)
	}
	if _, err := apply([]byte(src), []edit{{"f.go", 0, 5, "x"}, {"f.go", 3, 8, "y"}}); err == nil {
		t.Error("overlapping edits applied without error")
	}
}

func TestOverlaps(t *testing.T) {
	tests := []struct {
		a, b edit
		want bool
	}{
		{edit{"f", 0, 5, ""}, edit{"f", 5, 9, ""}, false}, // adjacent
		{edit{"f", 0, 5, ""}, edit{"f", 4, 9, ""}, true},
		{edit{"f", 3, 3, "x"}, edit{"f", 3, 3, "y"}, true}, // two insertions at one point
		{edit{"f", 3, 3, "x"}, edit{"f", 0, 9, ""}, true},  // insertion inside a deletion
		{edit{"f", 0, 5, ""}, edit{"g", 0, 5, ""}, false},  // other file
	}
	for _, tt := range tests {
		if got := tt.a.overlaps(tt.b); got != tt.want {
			t.Errorf("%v overlaps %v = %v, want %v", tt.a, tt.b, got, tt.want)
		}
	}
}

func TestWriteAtomic(t *testing.T) {
	dir := t.TempDir()
	rw := filepath.Join(dir, "rw.go")
	ro := filepath.Join(dir, "ro.go")
	for _, name := range []string{rw, ro} {
		if err := os.WriteFile(name, []byte("old\n"), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	if err := os.Chmod(ro, 0o444); err != nil {
		t.Fatal(err)
	}
	if err := writeAtomic(rw, []byte("new\n")); err != nil {
		t.Fatal(err)
	}
	if got, _ := os.ReadFile(rw); string(got) != "new\n" {
		t.Errorf("rw.go = %q after write", got)
	}
	if info, _ := os.Stat(rw); info.Mode().Perm() != 0o644 {
		t.Errorf("rw.go mode = %v, want 0644 kept", info.Mode().Perm())
	}
	err := writeAtomic(ro, []byte("new\n"))
	if err == nil || !strings.Contains(err.Error(), ro) {
		t.Errorf("read-only write: err = %v, want one naming %s", err, ro)
	}
	if got, _ := os.ReadFile(ro); string(got) != "old\n" {
		t.Errorf("ro.go = %q, want it untouched", got)
	}
	entries, _ := os.ReadDir(dir)
	if len(entries) != 2 {
		t.Errorf("temporary files left behind: %v", entries)
	}
}

// A range guard bounds the factorial it guards, which silences the
// findings of ratios built from it; so the guards' fixes are planned
// after every other fix, keeping the order within each kind.
func TestGuardsLast(t *testing.T) {
	in := []analysis.Diagnostic{
		{Category: "factorial-recursion", Message: "a"},
		{Category: "factorial-ratio", Message: "b"},
		{Category: "factorial-loop.definite", Message: "c"},
		{Category: "power-over-factorial", Message: "d"},
		{Category: "factorial-loop", Message: "e"},
	}
	var got []string
	for _, d := range guardsLast(in) {
		got = append(got, d.Message)
	}
	if want := "b d a c e"; strings.Join(got, " ") != want {
		t.Errorf("guardsLast order = %v, want %s", got, want)
	}
	if in[0].Message != "a" {
		t.Error("guardsLast reordered its argument")
	}
}
