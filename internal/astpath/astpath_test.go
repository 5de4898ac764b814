package astpath

import (
	"go/ast"
	"go/parser"
	"go/token"
	"os"
	"path/filepath"
	"runtime"
	"testing"

	"golang.org/x/tools/go/ast/astutil"
)

// TestEnclosingMatchesAstutil compares Enclosing with
// astutil.PathEnclosingInterval on real Go code (files of the installed
// standard library, and this package's own source) for the interval of
// every node, the empty interval at its start and end, and a few
// intervals that straddle declarations.
func TestEnclosingMatchesAstutil(t *testing.T) {
	files := []string{"astpath.go"}
	for _, f := range []string{"go/ast/ast.go", "go/parser/parser.go", "math/big/nat.go", "fmt/print.go"} {
		files = append(files, filepath.Join(runtime.GOROOT(), "src", filepath.FromSlash(f)))
	}
	compared := 0
	for _, name := range files {
		src, err := os.ReadFile(name)
		if err != nil {
			t.Fatal(err)
		}
		fset := token.NewFileSet()
		f, err := parser.ParseFile(fset, name, src, parser.ParseComments)
		if err != nil {
			t.Fatal(err)
		}
		check := func(start, end token.Pos) {
			want, wantExact := astutil.PathEnclosingInterval(f, start, end)
			got, gotExact := Enclosing(f, start, end)
			compared++
			if gotExact != wantExact || len(got) != len(want) {
				t.Fatalf("%s: [%d,%d): got %d nodes (exact %v), want %d (exact %v)", fset.Position(start), start, end, len(got), gotExact, len(want), wantExact)
			}
			for i := range want {
				if got[i] != want[i] {
					t.Fatalf("%s: [%d,%d): node %d is %T, want %T", fset.Position(start), start, end, i, got[i], want[i])
				}
			}
		}
		ast.Inspect(f, func(n ast.Node) bool {
			if n == nil {
				return false
			}
			check(n.Pos(), n.End())
			check(n.Pos(), n.Pos())
			check(n.End(), n.End())
			return true
		})
		for i := 1; i < len(f.Decls); i++ {
			check(f.Decls[i-1].End()-1, f.Decls[i].Pos()+1)
			check(f.Decls[i-1].End(), f.Decls[i].Pos())
		}
	}
	if compared < 10000 {
		t.Fatalf("compared %d intervals; want the many nodes of the files read", compared)
	}
}
