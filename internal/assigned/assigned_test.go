package assigned

import (
	"go/ast"
	"go/importer"
	"go/parser"
	"go/token"
	"go/types"
	"sort"
	"strings"
	"testing"
)

// The cases are the ways the Go specification lets a statement change a
// variable (assignments, IncDec statements, range clauses) and the
// address operator, after which any statement may.
const src = `package p

func f(xs []int) {
	var a, b, c, d, e, g, h, k, u int
	a = 1
	b += 2
	c++
	for d = range xs {
	}
	for _, e = range xs {
	}
	p := &g
	_ = p
	h, _ = 1, 2
	for i, v := range xs {
		_, _ = i, v
	}
	func() { k = 1 }()
	var s struct{ f int }
	s.f = 1
	_ = u
}
`

func load(t *testing.T) (*types.Info, *ast.FuncDecl) {
	fset := token.NewFileSet()
	f, err := parser.ParseFile(fset, "p.go", src, 0)
	if err != nil {
		t.Fatal(err)
	}
	info := &types.Info{Defs: map[*ast.Ident]types.Object{}, Uses: map[*ast.Ident]types.Object{}}
	// The fixture declares variables only to change them: unused ones are
	// no error here.
	conf := &types.Config{Importer: importer.Default(), Error: func(error) {}}
	conf.Check("p", fset, []*ast.File{f}, info)
	return info, f.Decls[0].(*ast.FuncDecl)
}

func TestEach(t *testing.T) {
	info, fn := load(t)
	seen := map[string]bool{}
	Each(info, fn.Body, nil, func(v types.Object, _ ast.Node) bool {
		seen[v.Name()] = true
		return true
	})
	var got []string
	for n := range seen {
		got = append(got, n)
	}
	sort.Strings(got)
	// p, s, i and v are declared by := or var and count too: a
	// declaration sets its variable.
	if want := "a b c d e g h i k p v"; strings.Join(got, " ") != want {
		t.Errorf("changed variables = %s, want %s", strings.Join(got, " "), want)
	}
}

func TestInWithSkip(t *testing.T) {
	info, fn := load(t)
	var k, u types.Object
	for id, obj := range info.Defs {
		switch id.Name {
		case "k":
			k = obj
		case "u":
			u = obj
		}
	}
	if !In(info, fn.Body, k, nil) {
		t.Error("k, assigned in a closure, not found")
	}
	closures := func(n ast.Node) bool { _, ok := n.(*ast.FuncLit); return ok }
	if In(info, fn.Body, k, closures) {
		t.Error("k found although closures are skipped")
	}
	if In(info, fn.Body, u, nil) {
		t.Error("u is only read, but was found assigned")
	}
}

// TestEachTarget checks that the written expressions are visited as
// written, field selectors and blank identifiers included, in source
// order, and that the walk stops when f returns false.
func TestEachTarget(t *testing.T) {
	_, fn := load(t)
	var got []string
	EachTarget(fn.Body, nil, func(e ast.Expr, _ ast.Node) bool {
		got = append(got, types.ExprString(e))
		return true
	})
	want := "a b c d _ e p g _ h _ i v _ _ k s.f _"
	if strings.Join(got, " ") != want {
		t.Errorf("targets = %s, want %s", strings.Join(got, " "), want)
	}
	n := 0
	EachTarget(fn.Body, nil, func(ast.Expr, ast.Node) bool { n++; return n < 3 })
	if n != 3 {
		t.Errorf("walk went on to %d targets after f returned false at the third", n)
	}
}

// TestRoot reads written targets as the Go specification builds them
// (selectors, index expressions, pointer indirections) back to the
// variable they start from.
func TestRoot(t *testing.T) {
	for _, c := range []struct{ expr, want string }{
		{"x", "x"}, {"x.f", "x"}, {"x[i]", "x"}, {"*x", "x"},
		{"(*x).f[i].g", "x"}, {"(x)", "x"}, {"f().g", ""}, {"T{}.f", ""},
	} {
		e, err := parser.ParseExpr(c.expr)
		if err != nil {
			t.Fatal(err)
		}
		got := ""
		if id := Root(e); id != nil {
			got = id.Name
		}
		if got != c.want {
			t.Errorf("Root(%s) = %q, want %q", c.expr, got, c.want)
		}
	}
}
