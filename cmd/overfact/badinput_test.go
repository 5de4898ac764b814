package main

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

const goMod = "module example.com/bottling\n\ngo 1.21\n"

// loopFile holds a factorial loop whose accumulator overflows int at
// n = 21, the shape every fix and report mode has something to say about.
const loopFile = `package line

// Orders is the number of orders in which n crates can leave the line.
func Orders(n int) int {
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}
`

func noPanic(t *testing.T, r result) {
	t.Helper()
	if strings.Contains(r.stderr, "panic:") || strings.Contains(r.stderr, "goroutine ") {
		t.Errorf("the command crashed:\n%s", r.stderr)
	}
}

func TestMissingPackages(t *testing.T) {
	dir := writeModule(t, map[string]string{"go.mod": goMod, "line/line.go": loopFile})
	for _, pattern := range []string{"./nosuch", "./nosuch/...", "example.com/bottling/nosuch"} {
		r := runIn(t, dir, isolated, pattern)
		noPanic(t, r)
		if r.code != 1 || r.stderr == "" {
			t.Errorf("%s: code %d, stderr %q; want 1 and an error", pattern, r.code, r.stderr)
		}
	}
	r := runIn(t, dir, isolated, "-C", filepath.Join(dir, "nodir"), "./...")
	if r.code != 1 || !strings.Contains(r.stderr, "nodir: no such directory") || strings.Contains(r.stderr, "fork/exec") {
		t.Errorf("-C to a missing directory: code %d, stderr %q; want 1 and that the directory does not exist", r.code, r.stderr)
	}
}

func TestBrokenPackages(t *testing.T) {
	tests := []struct {
		name, src, where string
	}{
		{"syntax error", "package line\n\nfunc Orders(n int int {\n\treturn n\n}\n", "line/line.go:3:"},
		{"type error", "package line\n\nfunc Orders(n int) int {\n\tvar s string = n\n\treturn s\n}\n", "line/line.go:4:"},
	}
	for _, tt := range tests {
		dir := writeModule(t, map[string]string{"go.mod": goMod, "line/line.go": tt.src, "line/ok.go": strings.ReplaceAll(loopFile, "Orders", "Crates")})
		r := runIn(t, dir, isolated, "./...")
		noPanic(t, r)
		if r.code != 1 || !strings.Contains(r.stderr, filepath.FromSlash(tt.where)) {
			t.Errorf("%s: code %d, stderr %q; want 1 and the error at %s", tt.name, r.code, r.stderr, tt.where)
		}
		// Fixes are never applied to a package that did not type-check.
		r = runIn(t, dir, isolated, "-fix", "./...")
		noPanic(t, r)
		if r.code != 1 {
			t.Errorf("%s: -fix exit code %d, want 1", tt.name, r.code)
		}
		for name, want := range map[string]string{"line.go": tt.src, "ok.go": strings.ReplaceAll(loopFile, "Orders", "Crates")} {
			if got, _ := os.ReadFile(filepath.Join(dir, "line", name)); string(got) != want {
				t.Errorf("%s: -fix changed %s of a broken package:\n%s", tt.name, name, got)
			}
		}
	}
}

// TestFixReadOnly runs -fix over two files with findings, one of them
// read-only: the command names that file, writes neither (a run's fixes
// are all or nothing, since one file's guard can silence another file's
// finding) and leaves no temporary file behind.
func TestFixReadOnly(t *testing.T) {
	dir := writeModule(t, map[string]string{
		"go.mod":      goMod,
		"line/a.go":   loopFile,
		"line/b.go":   strings.ReplaceAll(loopFile, "Orders", "Crates"),
		"line/doc.go": "// Package line models the bottling line.\npackage line\n",
	})
	if r := runIn(t, dir, isolated, "-diff", "./..."); !strings.Contains(r.stdout, "b/line/a.go") || !strings.Contains(r.stdout, "b/line/b.go") {
		t.Skipf("no fix offered for the factorial loop in both files (code %d):\n%s%s", r.code, r.stdout, r.stderr)
	}
	ro := filepath.Join(dir, "line", "b.go")
	if err := os.Chmod(ro, 0o444); err != nil {
		t.Fatal(err)
	}
	r := runIn(t, dir, isolated, "-fix", "./...")
	noPanic(t, r)
	if r.code != 1 || !strings.Contains(r.stderr, ro) {
		t.Errorf("-fix with a read-only file: code %d, stderr %q; want 1 and the file named", r.code, r.stderr)
	}
	if got, _ := os.ReadFile(ro); string(got) != strings.ReplaceAll(loopFile, "Orders", "Crates") {
		t.Errorf("the read-only file changed:\n%s", got)
	}
	if got, _ := os.ReadFile(filepath.Join(dir, "line", "a.go")); string(got) != loopFile {
		t.Errorf("the writable file was fixed although the read-only one was not:\n%s", got)
	}
	entries, _ := os.ReadDir(filepath.Join(dir, "line"))
	if len(entries) != 3 {
		t.Errorf("files left in the package directory: %v", entries)
	}
}
