package ranges

import (
	"fmt"
	"go/ast"
	"go/importer"
	"go/parser"
	"go/token"
	"go/types"
	"strconv"
	"strings"
	"sync"
	"testing"
)

// The tests type-check small functions and compare the computed range
// at marked expressions with a range derived by hand from Go's
// semantics. A marker comment /*@range [2, 20]*/ placed right after an
// expression names the expected range of the outermost expression that
// ends there.

var (
	importOnce sync.Once
	imp        types.Importer
	impFset    = token.NewFileSet()
)

// importerForTests reads imported packages from source, so the tests
// need no export data.
func importerForTests() types.Importer { return importer.ForCompiler(impFset, "source", nil) }

// program is a type-checked test source.
type program struct {
	fset *token.FileSet
	file *ast.File
	info *types.Info
	pkg  *types.Package
}

func check(t testing.TB, src string) *program {
	t.Helper()
	importOnce.Do(func() { imp = importerForTests() })
	fset := impFset
	f, err := parser.ParseFile(fset, "case.go", src, parser.ParseComments)
	if err != nil {
		t.Fatalf("parse: %v\n%s", err, src)
	}
	info := &types.Info{
		Types:      make(map[ast.Expr]types.TypeAndValue),
		Defs:       make(map[*ast.Ident]types.Object),
		Uses:       make(map[*ast.Ident]types.Object),
		Selections: make(map[*ast.SelectorExpr]*types.Selection),
		Implicits:  make(map[ast.Node]types.Object),
		Scopes:     make(map[ast.Node]*types.Scope),
	}
	conf := types.Config{Importer: imp}
	pkg, err := conf.Check("p", fset, []*ast.File{f}, info)
	if err != nil {
		t.Fatalf("type-check: %v\n%s", err, src)
	}
	return &program{fset, f, info, pkg}
}

func (p *program) fn(t testing.TB, name string) *ast.FuncDecl {
	t.Helper()
	for _, d := range p.file.Decls {
		if fd, ok := d.(*ast.FuncDecl); ok && fd.Name.Name == name {
			return fd
		}
	}
	t.Fatalf("no func %s", name)
	return nil
}

// marker is an expected range at an expression.
type marker struct {
	expr ast.Expr
	want Interval
	line int
	text string
}

func (p *program) markers(t testing.TB) []marker {
	t.Helper()
	var out []marker
	for _, cg := range p.file.Comments {
		for _, c := range cg.List {
			body, ok := strings.CutPrefix(c.Text, "/*@range ")
			if !ok {
				continue
			}
			body = strings.TrimSuffix(body, "*/")
			want, err := parseInterval(body)
			if err != nil {
				t.Fatalf("%s: %v", p.fset.Position(c.Pos()), err)
			}
			e := p.exprEndingAt(c.Pos())
			if e == nil {
				t.Fatalf("%s: no expression ends at marker", p.fset.Position(c.Pos()))
			}
			out = append(out, marker{e, want, p.fset.Position(c.Pos()).Line, body})
		}
	}
	return out
}

func (p *program) exprEndingAt(pos token.Pos) ast.Expr {
	var best ast.Expr
	ast.Inspect(p.file, func(n ast.Node) bool {
		if e, ok := n.(ast.Expr); ok && e.End() == pos {
			if best == nil || e.Pos() < best.Pos() {
				best = e
			}
		}
		return true
	})
	return best
}

// parseInterval reads the String form of an Interval.
func parseInterval(s string) (Interval, error) {
	s = strings.TrimSpace(s)
	if s == "empty" {
		return Empty(), nil
	}
	if len(s) < 2 {
		return Interval{}, fmt.Errorf("bad interval %q", s)
	}
	lo, hi, ok := strings.Cut(s[1:len(s)-1], ",")
	if !ok {
		return Interval{}, fmt.Errorf("bad interval %q", s)
	}
	bound := func(x string) (int64, error) {
		switch x = strings.TrimSpace(x); x {
		case "-inf":
			return negInf, nil
		case "+inf":
			return posInf, nil
		}
		return strconv.ParseInt(x, 10, 64)
	}
	l, err := bound(lo)
	if err != nil {
		return Interval{}, err
	}
	h, err := bound(hi)
	if err != nil {
		return Interval{}, err
	}
	return Interval{l, h}, nil
}

// checkMarkers analyses every function of src and compares each marker.
func checkMarkers(t *testing.T, src string, opts Options) {
	t.Helper()
	p := check(t, src)
	funcs := map[*ast.FuncDecl]*Func{}
	for _, d := range p.file.Decls {
		if fd, ok := d.(*ast.FuncDecl); ok {
			funcs[fd] = Analyze(p.info, fd, opts)
		}
	}
	ms := p.markers(t)
	if len(ms) == 0 {
		t.Fatalf("no markers in\n%s", src)
	}
	for _, m := range ms {
		var got Interval
		found := false
		for fd, f := range funcs {
			if fd.Pos() <= m.expr.Pos() && m.expr.End() <= fd.End() {
				got, found = f.Of(m.expr), true
			}
		}
		if !found {
			t.Errorf("line %d: marker outside any function", m.line)
			continue
		}
		if got != m.want {
			t.Errorf("line %d: Of(%s) = %v, want %v", m.line, exprString(p, m.expr), got, m.want)
		}
	}
}

func exprString(p *program, e ast.Expr) string {
	return types.ExprString(e)
}
