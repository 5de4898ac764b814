package lsp

import (
	"context"
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
	return fmt.Sprintf("%.3g agents", math.Gamma(n+1))
}
`

// BenchmarkAnalyze measures one analysis of a buffer, the latency a user
// waits after the debounce: go list, parsing and type-checking the package
// and its dependencies, and running the analyzers.
//
//	go test -run '^$' -bench Analyze -benchtime 5x ./internal/lsp
func BenchmarkAnalyze(b *testing.B) {
	for _, bc := range []struct {
		name string
		src  string
	}{
		{"math", deskSource},
		{"fmt", staffingSource},
	} {
		b.Run(bc.name, func(b *testing.B) {
			dir := b.TempDir()
			writeFiles(b, dir, map[string]string{"go.mod": "module example.com/desk\n\ngo 1.21\n", "desk.go": bc.src})
			path := filepath.Join(dir, "desk.go")
			docs := map[string]*document{path: {uri: pathToURI(path), path: path, version: 1, text: []byte(bc.src)}}
			opts := withDefaults(testOptions())
			b.ResetTimer()
			for i := 0; i < b.N; i++ {
				res, err := analyze(context.Background(), &opts, docs, path, encUTF16)
				if err != nil || len(res.findings[path]) != 1 {
					b.Fatalf("analyze: %v, %+v", err, res)
				}
			}
		})
	}
}
