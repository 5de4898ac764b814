package ranges

import (
	"fmt"
	"go/ast"
	"go/parser"
	"go/token"
	"go/types"
	"math/rand"
	"strings"
	"testing"
)

// oddSources are valid or nearly valid functions in unusual shapes.
var oddSources = []string{
	`package p
func f(n int) int {
L1:
	for i := 0; i < n; i++ {
		goto L2
	L2:
		if i > 3 {
			continue L1
		}
		switch {
		case i == 2:
			fallthrough
		case i == 3:
			break L1
		}
	}
	goto L3
L3:
	return n
}`,
	`package p
func f(n int) (r int) {
	defer func() {
		if recover() != nil {
			r = -1
		}
	}()
	g := func(k int) int {
		n := k
		n++
		return n
	}
	go func() { r++ }()
	var ch chan int
	select {
	case v := <-ch:
		n = v
	case ch <- n:
	default:
	}
	return g(n)
}`,
	`package p
func f(x any, n int) int {
	switch y := x.(type) {
	case int:
		n += y
	case nil:
	}
	n := n
	{
		n := n * 2
		_ = n
	}
	for range 3 {
	}
	for n := range n {
		_ = n
	}
	return n
}`,
	`package p
type T[E ~int8 | ~uint16] struct{ v E }
func f[E ~int8 | ~uint16](t T[E], n E) E {
	var z E
	for i := E(0); i < n; i++ {
		z += i * t.v
	}
	return z >> 1
}`,
	`package p
import "unsafe"
func f(a [4]float32, p *[3]int, s string) uintptr {
	x := len(a) + cap(p) + len(s)
	var u uint64 = 1 << 63
	u = u*2 + 1
	y := ^u
	var f32 float32 = 1e38
	f32 *= f32
	_ = complex(1, 2)
	return unsafe.Sizeof(x) + uintptr(y) + uintptr(f32)
}`,
	`package p
func f(n int) int {
	for {
		for {
			for {
				for {
					for {
						for {
							n--
							if n < 0 {
								return n
							}
						}
					}
				}
			}
		}
	}
}`,
	// Not type-correct: the analysis must cope with holes in info.
	`package p
func f(n int) int {
	m := undefined(n)
	if m > 3 {
		return q
	}
	for i := 0; i < m; i++ {
		n += i.x
	}
	return n + "s"
}`,
	`package p
func f(n int) int {
	x := []int{1, 2, n}
	m := map[int]int{n: 1}
	x[n%3], m[0] = m[1], x[0]
	p := &x[0]
	*p = 4
	var a [5]int
	a[n&3]++
	return x[0] + m[n] + a[0] + func() int { return n }()
}`,
}

// noImports fails every import, leaving the code partially typed and
// the fuzzer's time for the analysis rather than for loading packages.
type noImports struct{}

func (noImports) Import(path string) (*types.Package, error) {
	return nil, fmt.Errorf("no imports here: %s", path)
}

// analyseAll type-checks src (tolerating errors), analyses every
// function and closure, and asks every question of the API at every
// node. It fails only on a panic.
func analyseAll(t testing.TB, src string, realImports bool) {
	fset := token.NewFileSet()
	file, err := parser.ParseFile(fset, "odd.go", src, parser.SkipObjectResolution)
	if file == nil {
		return
	}
	_ = err
	info := &types.Info{
		Types:      map[ast.Expr]types.TypeAndValue{},
		Defs:       map[*ast.Ident]types.Object{},
		Uses:       map[*ast.Ident]types.Object{},
		Selections: map[*ast.SelectorExpr]*types.Selection{},
		Scopes:     map[ast.Node]*types.Scope{},
	}
	var im types.Importer = noImports{}
	if realImports {
		importOnce.Do(func() { imp = importerForTests() })
		im = imp
	}
	conf := types.Config{Importer: im, Error: func(error) {}}
	conf.Check("p", fset, []*ast.File{file}, info)
	var objs []types.Object
	for _, o := range info.Defs {
		if o != nil {
			objs = append(objs, o)
		}
	}
	ast.Inspect(file, func(n ast.Node) bool {
		var f *Func
		switch fn := n.(type) {
		case *ast.FuncDecl:
			f = Analyze(info, fn, Options{Entry: entryFor(info, fn)})
		case *ast.FuncLit:
			f = Analyze(info, fn, Options{MaxVisits: 1})
		default:
			return true
		}
		ast.Inspect(n, func(m ast.Node) bool {
			if m == nil {
				return false
			}
			if e, ok := m.(ast.Expr); ok {
				f.Of(e)
			}
			f.Reachable(m)
			if _, ok := m.(ast.Stmt); ok {
				for _, o := range objs {
					f.At(o, m)
				}
			}
			return true
		})
		return true
	})
}

func entryFor(info *types.Info, fd *ast.FuncDecl) map[types.Object]Interval {
	out := map[types.Object]Interval{}
	if fd.Type.Params == nil {
		return out
	}
	for _, fl := range fd.Type.Params.List {
		for _, id := range fl.Names {
			if o := info.Defs[id]; o != nil {
				out[o] = Span(-3, 40)
			}
		}
	}
	return out
}

func TestOddCodeDoesNotPanic(t *testing.T) {
	for _, src := range oddSources {
		analyseAll(t, src, true)
	}
}

// TestShuffledCodeDoesNotPanic splices statement lines of the odd
// sources into random orders: mostly ill-typed, sometimes not even
// parseable, which is the point.
func TestShuffledCodeDoesNotPanic(t *testing.T) {
	var lines []string
	for _, src := range oddSources {
		for _, l := range strings.Split(src, "\n") {
			if l != "" && !strings.HasPrefix(l, "package") && !strings.HasPrefix(l, "import") {
				lines = append(lines, l)
			}
		}
	}
	rng := rand.New(rand.NewSource(6))
	for trial := 0; trial < 300; trial++ {
		var b strings.Builder
		b.WriteString("package p\nfunc f(n int) (r int) {\n")
		for i := 0; i < 25; i++ {
			b.WriteString(lines[rng.Intn(len(lines))] + "\n")
		}
		b.WriteString("}\n")
		analyseAll(t, b.String(), false)
	}
}

func FuzzAnalyze(f *testing.F) {
	for _, src := range oddSources {
		f.Add(src)
	}
	for _, c := range guardCases {
		f.Add(c.src)
	}
	for _, c := range loopCases {
		f.Add(c.src)
	}
	f.Fuzz(func(t *testing.T, src string) {
		analyseAll(t, src, false)
	})
}
