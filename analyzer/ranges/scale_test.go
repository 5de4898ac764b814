package ranges

import (
	"fmt"
	"go/ast"
	"go/parser"
	"go/token"
	"go/types"
	"strings"
	"testing"
	"time"
)

// genHuge writes one function of at least lines lines: rolling blocks
// of guards, counting loops, switches and accumulations over fresh
// variables, like generated table code for a reliability test plan. It
// also returns the names of the variables declared as n % 17.
func genHuge(lines int) (string, map[string]bool) {
	var b strings.Builder
	mods := map[string]bool{}
	b.WriteString("package p\n\nfunc fact(n int) int { return n }\n\nfunc plan(n int) int {\n\tacc := 0\n")
	n := 6
	for i := 0; n < lines; i++ {
		v := fmt.Sprintf("v%d", i)
		var s string
		switch i % 5 {
		case 0:
			s = fmt.Sprintf("\t%s := n %% 17\n\tif %s > 12 {\n\t\t%s = 12\n\t}\n\tacc += fact(%s)\n", v, v, v, v)
			mods[v] = true
		case 1:
			s = fmt.Sprintf("\t%s := 0\n\tfor i := 2; i <= 9; i++ {\n\t\t%s += fact(i)\n\t}\n", v, v)
		case 2:
			s = fmt.Sprintf("\t%s := 3\n\tswitch {\n\tcase n > 100:\n\t\t%s = 5\n\tcase n < 0:\n\t\t%s = 1\n\t}\n\tacc += %s\n", v, v, v, v)
		case 3:
			s = fmt.Sprintf("\t%s := acc\n\tif %s < 0 || %s > 1000 {\n\t\t%s = 0\n\t}\n\tacc = %s\n", v, v, v, v, v)
		case 4:
			s = fmt.Sprintf("\tfor %s := range 7 {\n\t\tif %s > n {\n\t\t\tbreak\n\t\t}\n\t\tacc += fact(%s)\n\t}\n", v, v, v)
		}
		b.WriteString(s)
		n += strings.Count(s, "\n")
	}
	b.WriteString("\treturn acc\n}\n")
	return b.String(), mods
}

// TestHugeFunction analyses a generated 50,000-line function and logs
// the time; the walk is linear, so this is a smoke test for blow-ups,
// with a correctness check on a late statement.
func TestHugeFunction(t *testing.T) {
	if testing.Short() {
		t.Skip("long input")
	}
	src, mods := genHuge(50000)
	p := check(t, src)
	fd := p.fn(t, "plan")
	start := time.Now()
	f := Analyze(p.info, fd, Options{})
	elapsed := time.Since(start)
	t.Logf("%d lines, %d statements in the body: Analyze took %v", strings.Count(src, "\n"), len(fd.Body.List), elapsed)
	// The last fact(vK) of a case-0 block sees vK in [-16, 12]: n % 17
	// of any int is in [-16, 16], clamped above by the guard.
	var last *ast.CallExpr
	ast.Inspect(fd.Body, func(n ast.Node) bool {
		if c, ok := n.(*ast.CallExpr); ok {
			if id, ok := c.Args[0].(*ast.Ident); ok && strings.HasPrefix(id.Name, "v") {
				if mods[id.Name] {
					last = c
				}
			}
		}
		return true
	})
	if last == nil {
		t.Fatal("no case-0 call found")
	}
	if got := f.Of(last.Args[0]); got != Span(-16, 12) {
		t.Errorf("late fact argument: %v, want [-16, 12]", got)
	}
}

// TestDeepNesting checks that nesting far past the recursion cap is
// handled: blocks beyond it are opaque, and expressions beyond it Top.
func TestDeepNesting(t *testing.T) {
	const depth = 3000
	var b strings.Builder
	b.WriteString("package p\nfunc deep(n int) int {\n\tk := 1\n")
	for i := 0; i < depth; i++ {
		b.WriteString("if n > 0 {\n")
	}
	b.WriteString("k = 2\n")
	for i := 0; i < depth; i++ {
		b.WriteString("}\n")
	}
	b.WriteString("\treturn k + ")
	b.WriteString(strings.Repeat("(", depth) + "n" + strings.Repeat("+1)", depth))
	b.WriteString("\n}\n")
	fset := token.NewFileSet()
	file, err := parser.ParseFile(fset, "deep.go", b.String(), parser.SkipObjectResolution)
	if err != nil {
		t.Fatal(err)
	}
	info := &types.Info{Types: map[ast.Expr]types.TypeAndValue{}, Defs: map[*ast.Ident]types.Object{}, Uses: map[*ast.Ident]types.Object{}}
	if _, err := (&types.Config{}).Check("p", fset, []*ast.File{file}, info); err != nil {
		t.Fatal(err)
	}
	fd := file.Decls[0].(*ast.FuncDecl)
	f := Analyze(info, fd, Options{})
	ret := fd.Body.List[len(fd.Body.List)-1].(*ast.ReturnStmt)
	k := ret.Results[0].(*ast.BinaryExpr).X
	// k is 1 or 2 in truth; the opaque block forgets k, so Top is the
	// sound answer — but it must not be a wrong point.
	if got := f.Of(k); !got.Contains(1) || !got.Contains(2) {
		t.Errorf("k after deep nesting: %v, want it to hold 1 and 2", got)
	}
	if !f.Reachable(ret) {
		t.Error("return after deep nesting unreachable")
	}
}

// TestNestedLoopsStayCheap nests twelve counting loops; without the
// depth rule the work would be (MaxVisits+2)^12 trips of the body. The
// time is logged. Inside four or more enclosing loops, and once the work budget
// of the function is spent (which this nest does), a loop forgets what
// it assigns instead of iterating, so the counters keep only the upper
// bound their conditions give.
func TestNestedLoopsStayCheap(t *testing.T) {
	const depth = 12
	var b strings.Builder
	b.WriteString("package p\nfunc grid(n int) int {\n\ts := 0\n")
	for i := 0; i < depth; i++ {
		fmt.Fprintf(&b, "for i%d := 0; i%d < 4; i%d++ {\n", i, i, i)
	}
	fmt.Fprintf(&b, "s += i%d/*@range (-inf, 3]*/\ns += i1/*@range (-inf, 3]*/\n", depth-1)
	for i := 0; i < depth; i++ {
		b.WriteString("}\n")
	}
	b.WriteString("\treturn s\n}\n")
	start := time.Now()
	checkMarkers(t, b.String(), Options{})
	t.Logf("%d nested loops: %v", depth, time.Since(start))
}
