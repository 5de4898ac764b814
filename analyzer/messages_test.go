package analyzer

import (
	"go/ast"
	"go/parser"
	"go/printer"
	"go/token"
	"strings"
	"testing"
)

// TestPlainSrcAsPrinter checks src's shortcut against go/printer, the
// reference it stands in for: every expression the shortcut renders must
// read exactly as the printer prints it with no line information, and
// what it declines still goes to the printer.
func TestPlainSrcAsPrinter(t *testing.T) {
	exprs := []string{
		"n", "s.n", "math.Gamma", "f(n)", "f(n, k)", "pkg.F(x, s.y)",
		"f()", "f(\n\tn,\n\tk,\n)", "f(g(n))", "f(n...)", "f(n)(k)",
		"f(n+1)", "f(1)", "s.t.u", "a[i]", "(n)", "x.f(n)", "float64(n)",
		"f(0X1F)", "f(1E3)",
	}
	for _, text := range exprs {
		e, err := parser.ParseExpr(text)
		if err != nil {
			t.Fatalf("%q: %v", text, err)
		}
		var b strings.Builder
		if err := printer.Fprint(&b, token.NewFileSet(), e); err != nil {
			t.Fatal(err)
		}
		if got, ok := plainSrc(e); ok && got != b.String() {
			t.Errorf("plainSrc(%q) = %q; the printer gives %q", text, got, b.String())
		}
		if got := src(e); got != b.String() {
			t.Errorf("src(%q) = %q; the printer gives %q", text, got, b.String())
		}
	}
	// The shortcut must take the common operands, or it saves nothing.
	for _, text := range []string{"n", "s.n", "f(n, k)"} {
		e, _ := parser.ParseExpr(text)
		if _, ok := plainSrc(e.(ast.Expr)); !ok {
			t.Errorf("plainSrc(%q) declined", text)
		}
	}
}
