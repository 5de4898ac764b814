package main

import (
	"go/ast"
	"go/importer"
	"go/parser"
	"go/token"
	"go/types"
	"strings"
	"testing"
)

// typeCheck parses and type-checks one generated file against the
// standard library, which is what the scale measurements rely on.
func typeCheck(t *testing.T, src string) *ast.File {
	t.Helper()
	fset := token.NewFileSet()
	f, err := parser.ParseFile(fset, "gen.go", src, 0)
	if err != nil {
		t.Fatalf("generated code does not parse: %v", err)
	}
	conf := types.Config{Importer: importer.ForCompiler(fset, "source", nil)}
	if _, err := conf.Check("gen", fset, []*ast.File{f}, nil); err != nil {
		t.Fatalf("generated code does not type-check: %v", err)
	}
	return f
}

func TestBigFunc(t *testing.T) {
	for _, lines := range []int{40, 3125} {
		src := bigFunc(lines)
		n := strings.Count(src, "\n")
		// A block is at most 8 lines, so the function overshoots by less.
		if n < lines || n > lines+8 {
			t.Errorf("bigFunc(%d) has %d lines", lines, n)
		}
		f := typeCheck(t, src)
		if got := len(f.Decls); got != 3 { // import, helper, estimator
			t.Errorf("bigFunc(%d): %d declarations, want 3", lines, got)
		}
	}
}

func TestManyFuncs(t *testing.T) {
	for _, n := range []int{1, 7, 125} {
		f := typeCheck(t, manyFuncs(n))
		funcs := 0
		for _, d := range f.Decls {
			if _, ok := d.(*ast.FuncDecl); ok {
				funcs++
			}
		}
		if funcs != n {
			t.Errorf("manyFuncs(%d) declares %d functions", n, funcs)
		}
	}
}
