package analyzer

import (
	"bytes"
	"fmt"
	"go/ast"
	"go/parser"
	"go/token"
	"go/types"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"
)

// writePkg writes one package into a fresh GOPATH-style testdata tree.
func writePkg(t *testing.T, name, src string) string {
	dir := t.TempDir()
	pkg := filepath.Join(dir, "src", name)
	if err := os.MkdirAll(pkg, 0o755); err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(filepath.Join(pkg, name+".go"), []byte(src), 0o644); err != nil {
		t.Fatal(err)
	}
	return dir
}

// TestStress runs the analyzer over a huge function, deep nesting and
// deep parentheses; every finding it must make is written as a want.
func TestStress(t *testing.T) {
	var b strings.Builder
	b.WriteString("package stress\n\nfunc huge(n int) int64 {\n\tf := int64(1)\n")
	const loops = 100
	for i := 0; i < loops; i++ {
		b.WriteString("\tf = 1\n\tfor i := 2; i <= n; i++ { // want `factorial of n in int64 wraps for n ≥ 21`\n\t\tf *= int64(i)\n\t}\n")
	}
	b.WriteString("\treturn f * 2\n}\n\n")

	// Deep guards: a loop under 100 nested ifs always reaches past 20!.
	const depth = 100
	b.WriteString("func nested(n int) int64 {\n\tf := int64(1)\n")
	for i := 0; i < depth; i++ {
		fmt.Fprintf(&b, "if n > %d {\n", i)
	}
	b.WriteString("for i := 2; i <= n; i++ { // want `factorial of n in int64 wraps for n ≥ 21 .*; n is at least 100 here`\nf *= int64(i)\n}\n")
	b.WriteString(strings.Repeat("}\n", depth))
	b.WriteString("\treturn f * 2\n}\n\n")

	// Deep parentheses and a long product chain.
	fmt.Fprintf(&b, "func parens(n int) int {\n\treturn %sn%s * %s2%s\n}\n\n", strings.Repeat("(", 500), strings.Repeat(")", 500), strings.Repeat("(", 500), strings.Repeat(")", 500))
	fmt.Fprintf(&b, "func chain(n int) int {\n\treturn n%s\n}\n", strings.Repeat(" * n / 2", 2000))
	analysistest.Run(t, writePkg(t, "stress", b.String()), Analyzer, "stress")
}

// TestPanicIsSkipped makes the checks of one function fail and expects
// the function to be skipped, the others reported, and the debug log to
// name the skipped one.
func TestPanicIsSkipped(t *testing.T) {
	src := `package boom

func explode(n int) int64 {
	f := int64(1)
	for i := 2; i <= n; i++ {
		f *= int64(i)
	}
	return f * 2
}

func fine(n int) int64 {
	f := int64(1)
	for i := 2; i <= n; i++ { // want ` + "`factorial of n in int64 wraps`" + `
		f *= int64(i)
	}
	return f * 2
}
`
	if Analyzer.Flags.Lookup("debug") == nil {
		t.Fatal("no -debug flag")
	}
	var log bytes.Buffer
	oldOut, oldDebug := debugOut, debug
	debugOut, debug = &log, true
	testHook = func(n ast.Node) {
		if d, ok := n.(*ast.FuncDecl); ok && d.Name.Name == "explode" {
			panic("injected failure")
		}
	}
	defer func() { debugOut, debug, testHook = oldOut, oldDebug, nil }()
	analysistest.Run(t, writePkg(t, "boom", src), Analyzer, "boom")
	if !strings.Contains(log.String(), "skipped function after internal error: injected failure (in analyzer.") {
		t.Errorf("debug log = %q", log.String())
	}
}

// TestZeroConstKinds: a bool constant beside numeric ones (found :=
// false, next to sum := 0.0) is not asked for its sign; gonum's lapack
// and graph packages lost eleven functions to that panic.
func TestZeroConstKinds(t *testing.T) {
	fset := token.NewFileSet()
	f, err := parser.ParseFile(fset, "z.go", "package z\nvar a, b, c, d, e = false, 0, 0.0, 1, \"\"\n", 0)
	if err != nil {
		t.Fatal(err)
	}
	info := &types.Info{Types: make(map[ast.Expr]types.TypeAndValue)}
	if _, err := new(types.Config).Check("z", fset, []*ast.File{f}, info); err != nil {
		t.Fatal(err)
	}
	vals := f.Decls[0].(*ast.GenDecl).Specs[0].(*ast.ValueSpec).Values
	for i, want := range []bool{false, true, true, false, false} {
		if got := isZeroConst(info, vals[i]); got != want {
			t.Errorf("isZeroConst(%s) = %v", types.ExprString(vals[i]), got)
		}
	}
}
