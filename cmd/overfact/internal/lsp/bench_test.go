package lsp

import (
	"context"
	"fmt"
	"path/filepath"
	"testing"
)

// staffingSource imports fmt as most real files do, so loading it type-checks
// a few dozen standard packages from source.
const staffingSource = `package desk

import (
	"fmt"
	"math"
)

// Report prints the staffing table entry for n callers.
func Report(n float64) string {
	return fmt.Sprintf("%.3g operators", math.Gamma(n+1))
}
`

// BenchmarkAnalyze measures one analysis of a buffer, the latency a user
// waits after the debounce. "cold" loads the package and its dependencies
// with go/packages; "warm" is the next analysis after an edit of the same
// package, served by re-checking it against the dependencies kept in
// memory. "overfact" runs overfact's analyzer, whose facts make it run on
// every dependency when cold and replay its outcomes on them when warm;
// "nofacts" a test analyzer that runs on the edited package alone. All run
// in one invocation, so their ratios are measured under the same machine
// load:
//
//	go test -run '^$' -bench Analyze -benchtime 5x ./cmd/overfact/internal/lsp
func BenchmarkAnalyze(b *testing.B) {
	for _, bc := range []struct {
		name string
		src  string
	}{
		{"math", deskSource},
		{"fmt", staffingSource},
	} {
		for _, ac := range []struct {
			name string
			opts Options
		}{
			{"nofacts", testOptions()},
			{"overfact", Options{}},
		} {
			for _, warm := range []bool{false, true} {
				name := bc.name + "/" + ac.name + "/cold"
				if warm {
					name = bc.name + "/" + ac.name + "/warm"
				}
				bench(b, name, bc.src, ac.opts, warm)
			}
		}
	}
}

func bench(b *testing.B, name, src string, opts Options, warm bool) {
	b.Run(name, func(b *testing.B) {
		dir := b.TempDir()
		writeFiles(b, dir, map[string]string{"go.mod": "module example.com/desk\n\ngo 1.21\n", "desk.go": src})
		path := filepath.Join(dir, "desk.go")
		opts := withDefaults(opts)
		cache := new(loadCache)
		run := func(i int) {
			// Each run sees a different buffer, as after a keystroke.
			text := fmt.Sprintf("%s// edit %d\n", src, i)
			docs := map[string]*document{path: {uri: pathToURI(path), path: path, version: int32(i), text: []byte(text)}}
			if !warm {
				cache = new(loadCache)
			}
			res, err := analyze(context.Background(), &opts, cache, docs, path, encUTF16)
			if err != nil || len(res.findings[path]) == 0 {
				b.Fatalf("analyze: %v, %+v", err, res)
			}
			if i >= 0 && res.rechecked != warm {
				b.Fatalf("run %d re-checked = %v, want %v", i, res.rechecked, warm)
			}
		}
		run(-1)
		b.ResetTimer()
		for i := 0; i < b.N; i++ {
			run(i)
		}
	})
}
