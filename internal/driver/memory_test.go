package driver

import (
	"go/ast"
	"os"
	"path/filepath"
	"runtime/debug"
	"testing"

	"golang.org/x/tools/go/analysis"
)

// TestRunLimitsMemory checks that a run sets the soft heap limit while it
// analyses, restores the previous one after, and leaves GOMEMLIMIT's
// alone; and that the syntax it analyses is parsed without go/ast's
// object resolution, which nothing reads.
func TestRunLimitsMemory(t *testing.T) {
	dir := t.TempDir()
	for name, text := range map[string]string{
		"go.mod": "module example.com/m\n\ngo 1.21\n",
		"m.go":   "package m\n\nfunc F(n int) int { return n }\n",
	} {
		if err := os.WriteFile(filepath.Join(dir, name), []byte(text), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	var during int64
	var resolved bool
	a := &analysis.Analyzer{
		Name: "memprobe",
		Doc:  "records the heap limit",
		Run: func(pass *analysis.Pass) (any, error) {
			during = debug.SetMemoryLimit(-1)
			for _, f := range pass.Files {
				ast.Inspect(f, func(n ast.Node) bool {
					if id, ok := n.(*ast.Ident); ok && id.Obj != nil {
						resolved = true
					}
					return true
				})
			}
			return nil, nil
		},
	}
	run := func() int64 {
		t.Helper()
		before := debug.SetMemoryLimit(-1)
		var out, errs nopWriter
		if code := Run(a, []string{"."}, Options{Dir: dir, Stdout: out, Stderr: errs}); code != ExitClean {
			t.Fatalf("exit %d", code)
		}
		if after := debug.SetMemoryLimit(-1); after != before {
			t.Errorf("limit after the run %d, before %d", after, before)
		}
		return before
	}
	run()
	if during != memoryLimit {
		t.Errorf("limit during the run %d; want %d", during, int64(memoryLimit))
	}
	if resolved {
		t.Error("the analysed syntax carries go/ast object resolution")
	}
	t.Setenv("GOMEMLIMIT", "off")
	if before := run(); during != before {
		t.Errorf("with GOMEMLIMIT set, limit during the run %d; want the environment's %d", during, before)
	}
}

type nopWriter struct{}

func (nopWriter) Write(p []byte) (int, error) { return len(p), nil }
