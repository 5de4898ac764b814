package lsp

import (
	"context"
	"path/filepath"
	"reflect"
	"strings"
	"testing"
)

// TestMemoMatchesFullLoad runs overfact's own analyzer, whose facts cross
// packages, through edits of one package: the findings of a re-check that
// replays the analyzer's outcomes on the dependencies must equal those of a
// fresh load that runs it everywhere, the reference.
func TestMemoMatchesFullLoad(t *testing.T) {
	dir := writeModule(t, map[string]string{"combin/combin.go": combinSource, "rota.go": rotaSource})
	path := filepath.Join(dir, "rota.go")
	more := strings.Replace(rotaSource, "\n}\n", "\n}\n\n// Pairs counts pairs of operators.\nfunc Pairs(n int) int {\n\treturn combin.Fact(n) / (2 * combin.Fact(n-2))\n}\n", 1)
	opts := withDefaults(Options{})
	cache := new(loadCache)
	for i, text := range []string{rotaSource, more, rotaSource + "\n// edited\n", more} {
		docs := map[string]*document{path: {uri: pathToURI(path), path: path, version: int32(i), text: []byte(text)}}
		warm, err := analyze(context.Background(), &opts, cache, docs, path, encUTF16)
		if err != nil {
			t.Fatal(err)
		}
		cold, err := analyze(context.Background(), &opts, new(loadCache), docs, path, encUTF16)
		if err != nil {
			t.Fatal(err)
		}
		if warm.rechecked != (i > 0) {
			t.Errorf("edit %d: re-checked = %v", i, warm.rechecked)
		}
		if len(cold.findings[path]) == 0 {
			t.Errorf("edit %d: no findings at all; the comparison would be empty", i)
		}
		if !reflect.DeepEqual(warm.findings, cold.findings) {
			t.Errorf("edit %d: replayed\n%+v\nfresh\n%+v", i, warm.findings, cold.findings)
		}
	}
	e := cache.entries[0]
	if e.facts.replayed() == 0 {
		t.Error("no outcome was replayed: the dependencies were analysed every time")
	}
}
