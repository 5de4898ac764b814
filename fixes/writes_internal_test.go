package fixes

import (
	"go/ast"
	"go/types"
	"testing"
)

// TestWritesCountEveryChange checks that the fixer counts every way Go
// changes a variable (the language spec's assignments, IncDec statements,
// range clauses, and &x, after which anything may): the running-series
// fixes require an exact count, and a range clause that was not counted
// let a fix drop a change.
func TestWritesCountEveryChange(t *testing.T) {
	const src = `package p

func f(xs []float64) float64 {
	acc := 1.0
	acc = acc * 2
	acc++
	for _, acc = range xs {
	}
	p := &acc
	_ = p
	return acc
}
`
	b := fakeBuilder(t, src)
	acc := objNamed(t, b, "acc")
	if got := b.writes(acc); got != 5 { // :=, =, ++, range, &
		t.Errorf("writes(acc) = %d, want 5", got)
	}
}

// TestAliasNeedsOneWrite checks that a conversion alias (c :=
// float64(n)) whose address is taken, or that a range clause sets, is no
// alias: either may change it after its definition.
func TestAliasNeedsOneWrite(t *testing.T) {
	for _, tt := range []struct {
		name, body string
		want       bool
	}{
		{"alias", "c := float64(n)\n\treturn c", true},
		{"address", "c := float64(n)\n\tp := &c\n\t*p = 2\n\treturn c", false},
		{"range", "c := float64(n)\n\tfor _, c = range []float64{3} {\n\t}\n\treturn c", false},
	} {
		t.Run(tt.name, func(t *testing.T) {
			src := "package p\n\nfunc f(n int) float64 {\n\t" + tt.body + "\n}\n"
			b := fakeBuilder(t, src)
			b.m.Func = b.file.Decls[0].(*ast.FuncDecl)
			n, c := objNamed(t, b, "n"), objNamed(t, b, "c")
			if got := b.aliasOf(c, map[types.Object]bool{n: true}); got != tt.want {
				t.Errorf("aliasOf(c) = %v, want %v", got, tt.want)
			}
		})
	}
}

func objNamed(t *testing.T, b *builder, name string) types.Object {
	t.Helper()
	for id, obj := range b.pass.TypesInfo.Defs {
		if id.Name == name && obj != nil {
			return obj
		}
	}
	t.Fatalf("no variable %s", name)
	return nil
}
