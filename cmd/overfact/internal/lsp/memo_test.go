package lsp

import (
	"context"
	"go/ast"
	"path/filepath"
	"reflect"
	"strings"
	"testing"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/passes/inspect"
	"golang.org/x/tools/go/ast/inspector"
	"golang.org/x/tools/go/types/typeutil"
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

// callsGamma marks a function that calls math.Gamma, directly or through
// other marked functions.
type callsGamma struct{}

func (*callsGamma) AFact() {}

// gammaReach is a fact-producing test analyzer: it reports calls of marked
// functions of other packages, so its findings depend on facts that cross
// packages transitively.
var gammaReach = &analysis.Analyzer{
	Name:      "gammareach",
	Doc:       "report calls of functions that reach math.Gamma (test analyzer)",
	Requires:  []*analysis.Analyzer{inspect.Analyzer},
	FactTypes: []analysis.Fact{new(callsGamma)},
	Run: func(pass *analysis.Pass) (any, error) {
		ins := pass.ResultOf[inspect.Analyzer].(*inspector.Inspector)
		ins.Preorder([]ast.Node{(*ast.FuncDecl)(nil)}, func(n ast.Node) {
			fd := n.(*ast.FuncDecl)
			if fd.Body == nil {
				return
			}
			reaches := false
			ast.Inspect(fd.Body, func(n ast.Node) bool {
				call, ok := n.(*ast.CallExpr)
				if !ok {
					return true
				}
				fn := typeutil.StaticCallee(pass.TypesInfo, call)
				switch {
				case fn == nil:
				case fn.FullName() == "math.Gamma":
					reaches = true
				case pass.ImportObjectFact(fn, new(callsGamma)):
					reaches = true
					if fn.Pkg() != pass.Pkg {
						pass.Reportf(call.Pos(), "%s reaches math.Gamma", fn.Name())
					}
				}
				return true
			})
			if reaches {
				pass.ExportObjectFact(pass.TypesInfo.Defs[fd.Name], new(callsGamma))
			}
		})
		return nil, nil
	},
}

// gammaReachUser requires gammaReach, so gammaReach must not be replaced by
// a copy declaring the same fact type.
var gammaReachUser = &analysis.Analyzer{
	Name:     "gammareachuser",
	Doc:      "require gammareach (test analyzer)",
	Requires: []*analysis.Analyzer{gammaReach},
	Run:      func(*analysis.Pass) (any, error) { return nil, nil },
}

// TestMemoTransitiveFacts checks replay with facts that depend on the facts
// of a dependency's own dependencies (desk -> mid -> peak), and that an
// analyzer required by another is left alone.
func TestMemoTransitiveFacts(t *testing.T) {
	peak := "package peak\n\nimport \"math\"\n\nfunc Peak(x float64) float64 { return math.Gamma(x) }\n"
	mid := "package mid\n\nimport \"example.com/desk/peak\"\n\nfunc Mid(x float64) float64 { return peak.Peak(x) + 1 }\n"
	desk := "package desk\n\nimport \"example.com/desk/mid\"\n\nfunc Load(x float64) float64 { return mid.Mid(x) }\n"
	dir := writeModule(t, map[string]string{"peak/peak.go": peak, "mid/mid.go": mid, "desk.go": desk})
	path := filepath.Join(dir, "desk.go")
	for _, as := range [][]*analysis.Analyzer{{gammaReach}, {gammaReach, gammaReachUser}} {
		opts := withDefaults(Options{Analyzers: as})
		cache := new(loadCache)
		for i, text := range []string{desk, desk + "\n// edited\n"} {
			docs := map[string]*document{path: {uri: pathToURI(path), path: path, version: int32(i), text: []byte(text)}}
			warm, err := analyze(context.Background(), &opts, cache, docs, path, encUTF16)
			if err != nil {
				t.Fatalf("%d analyzers, edit %d: %v", len(as), i, err)
			}
			cold, err := analyze(context.Background(), &opts, new(loadCache), docs, path, encUTF16)
			if err != nil {
				t.Fatal(err)
			}
			if warm.rechecked != (i > 0) {
				t.Errorf("%d analyzers, edit %d: re-checked = %v", len(as), i, warm.rechecked)
			}
			if n := len(cold.findings[path]); n != 1 {
				t.Fatalf("fresh load found %d calls reaching math.Gamma, want 1 (mid.Mid)", n)
			}
			if !reflect.DeepEqual(warm.findings, cold.findings) {
				t.Errorf("%d analyzers, edit %d: replayed\n%+v\nfresh\n%+v", len(as), i, warm.findings, cold.findings)
			}
		}
	}
}
