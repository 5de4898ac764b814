package ranges

import (
	"fmt"
	"go/ast"
	"strings"
	"testing"
)

// Variables declared in a block are dropped from the state when the
// block ends; what is declared outside it is kept, and ranges read
// inside the block are unchanged. The expected ranges follow from Go's
// scoping rules and the guards as written.
func TestScopeEnds(t *testing.T) {
	checkMarkers(t, `package p
func rounds(n int) int {
	total := 0
	if n < 0 || n > 10 {
		return 0
	}
	{
		k := n + 1
		total += k/*@range [1, 11]*/
	}
	for i := 0; i < 3; i++ {
		m := i * 2
		total += m/*@range [0, 4]*/
	}
	switch j := n; {
	case j > 5:
		total += j/*@range [6, 10]*/
	}
	return n/*@range [0, 10]*/
}`, Options{})
}

// TestScopeStateStaysSmall walks a function of many blocks, each with
// its own variables, and checks that the state after the last block
// holds only the variables of the function's own scope.
func TestScopeStateStaysSmall(t *testing.T) {
	var b strings.Builder
	b.WriteString("package p\n\nfunc shifts(n int) int {\n\ttotal := 0\n")
	for i := range 200 {
		fmt.Fprintf(&b, "\t{\n\t\tf%d := n %% 7\n\t\tfor i := 0; i < f%d; i++ {\n\t\t\ttotal += i\n\t\t}\n\t}\n", i, i)
	}
	b.WriteString("\treturn total\n}\n")
	p := check(t, b.String())
	fd := p.fn(t, "shifts")
	f := Analyze(p.info, fd, Options{})
	ret := fd.Body.List[len(fd.Body.List)-1].(*ast.ReturnStmt)
	snap, reached := f.locate(ret)
	if !reached || snap == nil {
		t.Fatal("return statement not reached")
	}
	// n and total are the only variables in scope at the return; total
	// is unbounded (a sum over 200 loops), so at most n's fact remains
	// (n is unbounded too: a missing key).
	if got := size(*snap); got > 2 {
		t.Errorf("state at the return holds %d facts, want at most 2 (the function's own variables)", got)
	}
}

func size(t *facts) int {
	if t == nil {
		return 0
	}
	return 1 + size(t.left) + size(t.right)
}
