package fixes_test

import (
	"bytes"
	"go/ast"
	"go/format"
	"go/parser"
	"go/token"
	"os"
	"path/filepath"
	"sort"
	"strconv"
	"strings"
	"testing"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/analysis/analysistest"
	"golang.org/x/tools/go/ast/astutil"
	"golang.org/x/tools/go/packages"
)

// quiet is an analysistest.Testing that ignores expectation mismatches:
// the tests here apply fixes and judge the result, not the // want lines.
type quiet struct{}

func (quiet) Errorf(string, ...any) {}

// fileEdit is one edit of one fix, by byte offset.
type fileEdit struct {
	start, end int
	text       string
}

// applyFirstFixes applies the first fix of every diagnostic a reports on
// pkgs of the GOPATH tree dir, in place, the way go vet -fix does: fixes
// are merged in order, a fix overlapping an earlier one is skipped (and
// counted), identical edits (the same import added twice) coalesce, and
// imports the merged result no longer uses are dropped. It returns the
// number of fixes applied and skipped.
func applyFirstFixes(t *testing.T, dir string, a *analysis.Analyzer, pkgs ...string) (applied, skipped int) {
	return applyFirstFixesSeen(t, dir, a, nil, pkgs...)
}

// applyFirstFixesSeen is applyFirstFixes that also shows each
// diagnostic, fixed or not, to seen, with its package's files.
func applyFirstFixesSeen(t *testing.T, dir string, a *analysis.Analyzer, seen func(*token.FileSet, []*ast.File, analysis.Diagnostic), pkgs ...string) (applied, skipped int) {
	t.Helper()
	return applyResults(t, analysistest.Run(quiet{}, dir, a, pkgs...), seen)
}

// applyResults applies the first fixes of an analysistest run in place.
func applyResults(t *testing.T, results []*analysistest.Result, seenEach func(*token.FileSet, []*ast.File, analysis.Diagnostic)) (applied, skipped int) {
	t.Helper()
	edits := make(map[string][]fileEdit)
	seen := make(map[string]bool)
	for _, r := range results {
		fset := r.Action.Package.Fset
		for _, d := range r.Diagnostics {
			if seenEach != nil {
				seenEach(fset, r.Action.Package.Syntax, d)
			}
			if len(d.SuggestedFixes) == 0 {
				continue
			}
			fix := d.SuggestedFixes[0]
			key := fset.Position(d.Pos).String() + fix.Message
			if seen[key] { // the same file in a package and its test variant
				continue
			}
			seen[key] = true
			if merge(fset, edits, fix) {
				applied++
			} else {
				skipped++
			}
		}
	}
	for name, es := range edits {
		src, err := os.ReadFile(name)
		if err != nil {
			t.Fatal(err)
		}
		out := applyEdits(src, es)
		out, err = dropUnusedImports(out)
		if err != nil {
			t.Errorf("%s: fixed file does not parse: %v\n%s", name, err, out)
			continue
		}
		if err := os.WriteFile(name, out, 0o644); err != nil {
			t.Fatal(err)
		}
	}
	return applied, skipped
}

// merge adds the edits of fix to edits unless one overlaps an edit
// already there; identical edits coalesce.
func merge(fset *token.FileSet, edits map[string][]fileEdit, fix analysis.SuggestedFix) bool {
	add := make(map[string][]fileEdit)
	for _, e := range fix.TextEdits {
		f := fset.File(e.Pos)
		fe := fileEdit{f.Offset(e.Pos), f.Offset(e.End), string(e.NewText)}
		dup := false
		for _, old := range edits[f.Name()] {
			if old == fe {
				dup = true
				break
			}
			if overlap(fe, old) {
				return false
			}
		}
		if !dup {
			add[f.Name()] = append(add[f.Name()], fe)
		}
	}
	for name, es := range add {
		edits[name] = append(edits[name], es...)
	}
	return true
}

// overlap reports whether two different edits conflict, by the rule of
// the x/tools merge: deletions may not overlap, nor may an insertion fall
// strictly inside a deletion; insertions at one point are kept in order.
func overlap(x, y fileEdit) bool {
	if x.start == x.end || y.start == y.end {
		ins, del := x, y
		if y.start == y.end {
			ins, del = y, x
		}
		return del.start < ins.start && ins.start < del.end
	}
	return x.start < y.end && y.start < x.end
}

func applyEdits(src []byte, es []fileEdit) []byte {
	sort.SliceStable(es, func(i, j int) bool { return es[i].start < es[j].start })
	var out []byte
	last := 0
	for _, e := range es {
		out = append(out, src[last:e.start]...)
		out = append(out, e.text...)
		last = e.end
	}
	return append(out, src[last:]...)
}

// dropUnusedImports removes imports whose name the file no longer uses
// and formats the file, as the fix drivers of x/tools do after merging.
func dropUnusedImports(src []byte) ([]byte, error) {
	fset := token.NewFileSet()
	f, err := parser.ParseFile(fset, "fixed.go", src, parser.ParseComments)
	if err != nil {
		return src, err
	}
	used := make(map[string]bool)
	ast.Inspect(f, func(n ast.Node) bool {
		if sel, ok := n.(*ast.SelectorExpr); ok {
			if id, ok := sel.X.(*ast.Ident); ok {
				used[id.Name] = true
			}
		}
		return true
	})
	// DeleteNamedImport shortens f.Imports in place: range over a copy.
	for _, spec := range append([]*ast.ImportSpec(nil), f.Imports...) {
		path, _ := strconv.Unquote(spec.Path.Value)
		name := filepath.Base(path)
		if spec.Name != nil {
			name = spec.Name.Name
		}
		if name != "_" && name != "." && !used[name] {
			astutil.DeleteNamedImport(fset, f, importName(spec), path)
		}
	}
	var buf bytes.Buffer
	if err := format.Node(&buf, fset, f); err != nil {
		return src, err
	}
	return buf.Bytes(), nil
}

func importName(spec *ast.ImportSpec) string {
	if spec.Name != nil {
		return spec.Name.Name
	}
	return ""
}

// typeCheck loads pkgs from the GOPATH tree dir and reports every parse
// and type error.
func typeCheck(t *testing.T, dir string, pkgs ...string) {
	t.Helper()
	cfg := loadConfig(dir)
	loaded, err := packages.Load(cfg, pkgs...)
	if err != nil {
		t.Fatal(err)
	}
	packages.Visit(loaded, nil, func(p *packages.Package) {
		for _, e := range p.Errors {
			t.Errorf("after fixes, %s: %v", p.PkgPath, e)
		}
	})
}

// compiling returns the patterns whose packages type-check without error.
func compiling(t *testing.T, dir string, patterns []string) []string {
	t.Helper()
	loaded, err := packages.Load(loadConfig(dir), patterns...)
	if err != nil {
		t.Fatal(err)
	}
	bad := make(map[string]bool)
	for _, p := range loaded {
		if len(p.Errors) > 0 {
			first, _, _ := strings.Cut(p.PkgPath, "/")
			bad[first] = true
		}
	}
	var ok []string
	for _, p := range patterns {
		first, _, _ := strings.Cut(p, "/")
		if !bad[first] {
			ok = append(ok, p)
		}
	}
	return ok
}

func loadConfig(dir string) *packages.Config {
	return &packages.Config{
		Mode:  packages.NeedName | packages.NeedTypes | packages.NeedSyntax | packages.NeedTypesInfo,
		Dir:   dir,
		Tests: true,
		Env:   append(os.Environ(), "GOPATH="+dir, "GO111MODULE=off", "GOWORK=off"),
	}
}
