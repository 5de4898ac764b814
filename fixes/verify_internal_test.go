package fixes

import (
	"go/ast"
	"go/parser"
	"go/token"
	"go/types"
	"strings"
	"testing"

	"golang.org/x/tools/go/analysis"
)

// TestVerifyRejects checks the last line of defence on its own: edits
// that leave a variable unused or call something undefined are refused
// with the type checker's reason, and a sound edit passes.
func TestVerifyRejects(t *testing.T) {
	const src = `package p

func f(n int) int {
	b := n
	return b
}
`
	tests := []struct {
		name, old, new, want string // want: "" for a fix that must pass
	}{
		{"unused", "return b", "return n", "declared and not used"},
		{"undefined", "return b", "return lgammaX.Choose(n, n)", "undefined"},
		{"sound", "return b", "return b + 0", ""},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			b := fakeBuilder(t, src)
			off := strings.Index(src, tt.old)
			b.replace(b.tok.Pos(off), b.tok.Pos(off+len(tt.old)), tt.new)
			err := b.verify()
			switch {
			case tt.want == "" && err != nil:
				t.Errorf("verify = %v; want nil", err)
			case tt.want != "" && (err == nil || !strings.Contains(err.Error(), tt.want)):
				t.Errorf("verify = %v; want an error containing %q", err, tt.want)
			}
		})
	}
}

func fakeBuilder(t *testing.T, src string) *builder {
	t.Helper()
	fset := token.NewFileSet()
	f, err := parser.ParseFile(fset, "p.go", src, parser.ParseComments)
	if err != nil {
		t.Fatal(err)
	}
	info := &types.Info{Types: map[ast.Expr]types.TypeAndValue{}, Defs: map[*ast.Ident]types.Object{},
		Uses: map[*ast.Ident]types.Object{}, Implicits: map[ast.Node]types.Object{}, Scopes: map[ast.Node]*types.Scope{}}
	pkg, err := new(types.Config).Check("p", fset, []*ast.File{f}, info)
	if err != nil {
		t.Fatal(err)
	}
	pass := &analysis.Pass{
		Fset: fset, Files: []*ast.File{f}, Pkg: pkg, TypesInfo: info,
		TypesSizes: types.SizesFor("gc", "amd64"),
		ReadFile:   func(string) ([]byte, error) { return []byte(src), nil },
	}
	b, err := newBuilder(NewFixer(pass), Match{File: f, Node: f.Name})
	if err != nil {
		t.Fatal(err)
	}
	return b
}
