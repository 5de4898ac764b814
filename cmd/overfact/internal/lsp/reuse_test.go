package lsp

import (
	"context"
	"go/types"
	"os"
	"path/filepath"
	"reflect"
	"strings"
	"testing"
	"time"

	"golang.org/x/tools/go/packages"
)

// TestReuseMatchesFullLoad analyses a sequence of edits twice, once through
// the package cache and once with a fresh load each time, and requires the
// same findings; go/packages' full load is the reference.
func TestReuseMatchesFullLoad(t *testing.T) {
	dir := writeModule(t, map[string]string{"desk.go": deskSource})
	path := filepath.Join(dir, "desk.go")
	edits := []struct {
		name   string
		text   string
		reused bool // whether the cache may serve it
	}{
		{"first load", deskSource, false},
		{"second call", strings.Replace(deskSource, "\n}\n", "\n}\n\nfunc Spare(x float64) float64 { return math.Gamma(x) * 2 }\n", 1), true},
		{"new import", strings.Replace(deskSource, `import "math"`, "import (\n\t\"fmt\"\n\t\"math\"\n)\n\nvar _ = fmt.Sprint", 1), false},
		{"syntax error", strings.Replace(deskSource, "return math", "return (math", 1), true},
		{"type error", strings.Replace(deskSource, "n + 1", `n + "one"`, 1), true},
		{"build constraint added", "//go:build ignore\n\n" + deskSource, false},
		{"package renamed", strings.Replace(deskSource, "package desk", "package help", 1), false},
		{"back", deskSource, false}, // the cache now holds package help
	}
	// A second analyzer runs despite type errors, as overfact's does, so
	// the findings on broken code are compared too.
	tolerant := *gammaCalls
	tolerant.Name, tolerant.RunDespiteErrors = "gammatolerant", true
	opts := withDefaults(testOptions(gammaCalls, &tolerant))
	cache := new(loadCache)
	for i, e := range edits {
		docs := map[string]*document{path: {uri: pathToURI(path), path: path, version: int32(i), text: []byte(e.text)}}
		warm, werr := analyze(context.Background(), &opts, cache, docs, path, encUTF16)
		cold, cerr := analyze(context.Background(), &opts, new(loadCache), docs, path, encUTF16)
		if (werr == nil) != (cerr == nil) {
			t.Errorf("%s: cached error %v, fresh error %v", e.name, werr, cerr)
			continue
		}
		if werr == nil && warm.rechecked != e.reused {
			t.Errorf("%s: result says rechecked = %v", e.name, warm.rechecked)
		}
		if werr == nil && (!reflect.DeepEqual(warm.findings, cold.findings) || !reflect.DeepEqual(warm.docs, cold.docs)) {
			t.Errorf("%s: cached result\n%+v\nfresh result\n%+v", e.name, warm, cold)
		}
	}
}

// TestReuseNoticesDisk changes files on disk between analyses of an open
// buffer and checks when the cached package may still serve.
func TestReuseNoticesDisk(t *testing.T) {
	dir := writeModule(t, map[string]string{"combin/combin.go": combinSource, "rota.go": rotaSource})
	path := filepath.Join(dir, "rota.go")
	docs := map[string]*document{path: {uri: pathToURI(path), path: path, version: 1, text: []byte(rotaSource)}}
	opts := withDefaults(testOptions())
	cache := new(loadCache)
	for _, step := range []struct {
		name   string
		change func()
		reused bool
	}{
		{"first load", func() {}, false},
		{"nothing changed", func() {}, true},
		{"open buffer saved", func() { writeLater(t, path, rotaSource) }, true},
		{"backup file written", func() { writeLater(t, path+"~", rotaSource) }, true},
		{"dependency edited on disk", func() { writeLater(t, filepath.Join(dir, "combin", "combin.go"), combinSource+"\nvar Unused int\n") }, false},
		{"again unchanged", func() {}, true},
		{"file added to the package", func() { writeLater(t, filepath.Join(dir, "extra.go"), "package desk\n") }, false},
		{"go.mod edited", func() { writeLater(t, filepath.Join(dir, "go.mod"), "module example.com/desk\n\ngo 1.22\n") }, false},
	} {
		step.change()
		res, err := analyze(context.Background(), &opts, cache, docs, path, encUTF16)
		if err != nil {
			t.Fatalf("%s: %v", step.name, err)
		}
		if res.rechecked != step.reused {
			t.Errorf("%s: re-checked = %v, want %v", step.name, res.rechecked, step.reused)
		}
	}
}

// writeLater writes a file with a modification time clearly after any
// earlier write, since file systems may keep coarse timestamps.
func writeLater(t *testing.T, path, text string) {
	t.Helper()
	if err := os.WriteFile(path, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	later := time.Now().Add(2 * time.Second)
	if err := os.Chtimes(path, later, later); err != nil {
		t.Fatal(err)
	}
}

// TestReuseLimit checks that an entry is retired after maxUses re-checks,
// so that a long-running server's FileSet starts anew.
func TestReuseLimit(t *testing.T) {
	dir := writeModule(t, map[string]string{"desk.go": deskSource})
	path := filepath.Join(dir, "desk.go")
	docs := map[string]*document{path: {uri: pathToURI(path), path: path, version: 1, text: []byte(deskSource)}}
	opts := withDefaults(testOptions())
	cache := new(loadCache)
	rechecks := 0
	for i := 0; i <= maxUses+1; i++ {
		res, err := analyze(context.Background(), &opts, cache, docs, path, encUTF16)
		if err != nil {
			t.Fatal(err)
		}
		if res.rechecked {
			rechecks++
		} else if i != 0 && i != maxUses+1 {
			t.Fatalf("analysis %d loaded afresh", i)
		}
	}
	if rechecks != maxUses {
		t.Errorf("%d re-checks, want %d", rechecks, maxUses)
	}
}

// TestCacheReleases checks that the cache lets go of what it drops: the
// packages of closed files on forget, and an evicted entry, which the
// backing array of the entry list must not keep reachable.
func TestCacheReleases(t *testing.T) {
	pkg := func(name string) *packages.Package {
		file := filepath.Join(t.TempDir(), name+".go")
		return &packages.Package{ID: name, GoFiles: []string{file}, CompiledGoFiles: []string{file}, Types: types.NewPackage(name, name)}
	}
	cache := new(loadCache)
	var all []*packages.Package
	for _, name := range []string{"a", "b", "c", "d"} {
		p := pkg(name)
		all = append(all, p)
		cache.add(p, nil)
	}
	if len(cache.entries) != maxCached {
		t.Fatalf("%d entries, want %d", len(cache.entries), maxCached)
	}
	for _, e := range cache.entries[len(cache.entries):cap(cache.entries)] {
		if e != nil {
			t.Errorf("evicted entry %s still reachable from the entry list", e.pkg.ID)
		}
	}
	open := all[2].CompiledGoFiles[0] // c's file is open
	if !cache.forget(func(p string) bool { return p == open }) {
		t.Error("forget dropped nothing")
	}
	if len(cache.entries) != 1 || cache.entries[0].pkg.ID != "c" {
		t.Errorf("after forget: %d entries, want c's alone", len(cache.entries))
	}
	for _, e := range cache.entries[len(cache.entries):cap(cache.entries)] {
		if e != nil {
			t.Errorf("dropped entry %s still reachable from the entry list", e.pkg.ID)
		}
	}
	if cache.forget(func(p string) bool { return p == open }) {
		t.Error("a second forget dropped something")
	}
}
