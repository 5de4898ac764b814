package lsp

import (
	"context"
	"path/filepath"
	"reflect"
	"strings"
	"testing"
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
		before := cache.reused
		warm, werr := analyze(context.Background(), &opts, cache, docs, path, encUTF16)
		if got := cache.reused > before; got != e.reused {
			t.Errorf("%s: served from the cache = %v, want %v", e.name, got, e.reused)
		}
		cold, cerr := analyze(context.Background(), &opts, new(loadCache), docs, path, encUTF16)
		if (werr == nil) != (cerr == nil) {
			t.Errorf("%s: cached error %v, fresh error %v", e.name, werr, cerr)
			continue
		}
		if werr == nil && warm.rechecked != e.reused {
			t.Errorf("%s: result says rechecked = %v", e.name, warm.rechecked)
		}
		if werr == nil && (!reflect.DeepEqual(warm.findings, cold.findings) || !reflect.DeepEqual(warm.versions, cold.versions)) {
			t.Errorf("%s: cached result\n%+v\nfresh result\n%+v", e.name, warm, cold)
		}
	}
}
