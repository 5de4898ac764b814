package main

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// TestCfgDirectoryPattern names a package directory ending in ".cfg":
// it is a pattern to analyse, not a go vet unit configuration, which is a
// file of JSON (TestGoVet and TestCgoVet cover the real ones).
func TestCfgDirectoryPattern(t *testing.T) {
	dir := writeModule(t, map[string]string{"go.mod": goMod, "plans.cfg/line.go": loopFile})
	r := runIn(t, dir, isolated, "./plans.cfg")
	noPanic(t, r)
	want := filepath.Join("plans.cfg", "line.go") + ":6:2: factorial of n"
	if r.code != 3 || !strings.Contains(r.stderr, want) {
		t.Errorf("code %d; want 3 and %q\n%s", r.code, want, r.stderr)
	}
	// A .cfg file that is not a vet configuration is not one either.
	if err := os.WriteFile(filepath.Join(dir, "lint.cfg"), []byte("max = 3\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	r = runIn(t, dir, isolated, "./plans.cfg", "lint.cfg")
	noPanic(t, r)
	if strings.Contains(r.stderr, "vet config") || strings.Contains(r.stderr, "invalid character") {
		t.Errorf("lint.cfg was read as a vet configuration:\n%s", r.stderr)
	}
}
