package ranges

import (
	"go/ast"
	"go/types"
	"testing"
)

// Ranges over tables of constants. Each expected range is the join of
// the constants written in the table (and 0 where an element or field
// is left at its zero value), as Go's range and composite literal rules
// give it; where the table can change, nothing is known.
var tableCases = []struct {
	name, src string
}{
	{"struct table ranged directly", `package p
func fact(n int) int { return n }
func check() int {
	s := 0
	for _, tc := range []struct{ n, k int }{{5, 2}, {12, 3}, {7, 1}} {
		s += fact(tc.n/*@range [5, 12]*/)
		s += tc.k/*@range [1, 3]*/
	}
	return s
}`},
	{"local table of numbers, keyed fields and a left-out field", `package p
type sizes struct{ crates, bottles int }
func plan() int {
	cases := []sizes{{crates: 4, bottles: 24}, {crates: 10}}
	s := 0
	for i, c := range cases {
		s += i/*@range [0, 1]*/
		s += c.crates/*@range [4, 10]*/
		s += c.bottles/*@range [0, 24]*/
	}
	for _, n := range []int{3, 9, 6} {
		s += n/*@range [3, 9]*/
	}
	return s + len(cases)
}`},
	{"sparse array: the zero value joins", `package p
func sparse() int {
	s := 0
	for _, n := range [5]int{1: 7, 3: 9} {
		s += n/*@range [0, 9]*/
	}
	return s
}`},
	{"an array longer than its list runs its whole length", `package p
func padded() int {
	s := 0
	for i, n := range [4]int{6, 8} {
		s += i/*@range [0, 3]*/
		s += n/*@range [0, 8]*/
	}
	return s
}`},
	{"a map table's keys are not indices", `package p
func byName() int {
	s := 0
	for k, n := range map[int]int{10: 2, 20: 5} {
		s += k/*@range (-inf, +inf)*/
		s += n/*@range [2, 5]*/
	}
	return s
}`},
	{"a table passed to a function may change", `package p
func touch([]int) {}
func passed() int {
	t := []int{1, 2}
	touch(t)
	s := 0
	for _, n := range t {
		s += n/*@range (-inf, +inf)*/
	}
	return s
}`},
	{"a table element assigned", `package p
func assigned(k int) int {
	t := []int{1, 2}
	t[0] = k
	s := 0
	for _, n := range t {
		s += n/*@range (-inf, +inf)*/
	}
	return s
}`},
	{"a table re-assigned", `package p
func reassigned(more []int) int {
	t := []int{1, 2}
	t = append(t, more...)
	s := 0
	for _, n := range t {
		s += n/*@range (-inf, +inf)*/
	}
	return s
}`},
	{"an element that is not a constant", `package p
func notConst(k int) int {
	s := 0
	for _, n := range []int{1, k} {
		s += n/*@range (-inf, +inf)*/
	}
	return s
}`},
	{"the value changed in the body", `package p
func bumped() int {
	s := 0
	for _, tc := range []struct{ n int }{{2}, {4}} {
		tc.n *= 10
		s += tc.n/*@range [20, 40]*/
	}
	return s
}`},
	{"an empty table never runs its body", `package p
func empty() int {
	s := 1
	for _, n := range []int{} {
		s = n
	}
	return s/*@range [1, 1]*/
}`},
}

func TestTables(t *testing.T) {
	for _, tc := range tableCases {
		t.Run(tc.name, func(t *testing.T) { checkMarkers(t, tc.src, Options{}) })
	}
}

// A package-level table counts only when the caller vouches for it in
// Options.Tables: a function alone cannot see the package's other uses.
func TestPackageTables(t *testing.T) {
	src := `package p
var plans = []struct{ n int }{{3}, {8}}
func sum() int {
	s := 0
	for _, p := range plans {
		s += p.n
	}
	return s
}`
	p := check(t, src)
	fd := p.fn(t, "sum")
	var use *ast.SelectorExpr
	ast.Inspect(fd, func(n ast.Node) bool {
		if sel, ok := n.(*ast.SelectorExpr); ok {
			use = sel
		}
		return true
	})
	obj := p.pkg.Scope().Lookup("plans")
	lit := p.file.Decls[0].(*ast.GenDecl).Specs[0].(*ast.ValueSpec).Values[0].(*ast.CompositeLit)
	if got := Analyze(p.info, fd, Options{}).Of(use); got != Top() {
		t.Errorf("without Tables: Of(p.n) = %v, want unknown", got)
	}
	opts := Options{Tables: map[types.Object]*ast.CompositeLit{obj: lit}}
	if got := Analyze(p.info, fd, opts).Of(use); got != Span(3, 8) {
		t.Errorf("with Tables: Of(p.n) = %v, want [3, 8]", got)
	}
}
