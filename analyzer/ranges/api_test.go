package ranges

import (
	"go/ast"
	"go/types"
	"testing"
)

// findCall returns the first call of the named function inside fd.
func findCall(fd *ast.FuncDecl, name string) *ast.CallExpr {
	var out *ast.CallExpr
	ast.Inspect(fd, func(n ast.Node) bool {
		if c, ok := n.(*ast.CallExpr); ok && out == nil {
			if id, ok := c.Fun.(*ast.Ident); ok && id.Name == name {
				out = c
			}
		}
		return out == nil
	})
	return out
}

func paramObj(p *program, fd *ast.FuncDecl, i int) types.Object {
	k := 0
	for _, f := range fd.Type.Params.List {
		for _, id := range f.Names {
			if k == i {
				return p.info.Defs[id]
			}
			k++
		}
	}
	return nil
}

func TestEntryAndAt(t *testing.T) {
	p := check(t, `package p
func fact(n int) int { return n }
func lots(batch int) int {
	x := fact(batch)
	batch = batch * 2
	y := fact(batch)
	for i := 0; i < batch; i++ {
		fact(i)
	}
	return x + y
}`)
	fd := p.fn(t, "lots")
	batch := paramObj(p, fd, 0)
	f := Analyze(p.info, fd, Options{Entry: map[types.Object]Interval{batch: Span(1, 8)}})
	var calls []*ast.CallExpr
	ast.Inspect(fd.Body, func(n ast.Node) bool {
		if c, ok := n.(*ast.CallExpr); ok {
			calls = append(calls, c)
		}
		return true
	})
	tests := []struct {
		got, want Interval
		what      string
	}{
		{f.At(batch, calls[0]), Span(1, 8), "batch at first call"},
		{f.At(batch, calls[1]), Span(2, 16), "batch at second call"},
		{f.Of(calls[2].Args[0]), Span(0, 15), "i in loop"},
		{f.At(batch, fd.Body.List[0]), Span(1, 8), "batch at first statement"},
	}
	for _, tt := range tests {
		if tt.got != tt.want {
			t.Errorf("%s: %v, want %v", tt.what, tt.got, tt.want)
		}
	}
	// Without Entry the parameter is unknown.
	g := Analyze(p.info, fd, Options{})
	if got := g.At(batch, calls[0]); !got.IsTop() {
		t.Errorf("no entry: %v, want top", got)
	}
}

func TestEntryIgnoresPackageVariables(t *testing.T) {
	p := check(t, `package p
var stock int
func order() int {
	return stock
}`)
	fd := p.fn(t, "order")
	stock := p.pkg.Scope().Lookup("stock")
	f := Analyze(p.info, fd, Options{Entry: map[types.Object]Interval{stock: Span(0, 5)}})
	ret := fd.Body.List[0].(*ast.ReturnStmt).Results[0]
	if got := f.Of(ret); !got.IsTop() {
		t.Errorf("package variable: %v, want top (other goroutines may change it)", got)
	}
}

func TestEmptyEntryIsUnreachable(t *testing.T) {
	p := check(t, `package p
func order(n int) int {
	return n
}`)
	fd := p.fn(t, "order")
	f := Analyze(p.info, fd, Options{Entry: map[types.Object]Interval{paramObj(p, fd, 0): Empty()}})
	if f.Reachable(fd.Body.List[0]) {
		t.Error("return reachable under an empty entry range")
	}
}

func TestReachable(t *testing.T) {
	p := check(t, `package p
func fact(n int) int { return n }
func stock(n int) int {
	if n > 10 {
		return fact(n)
	}
	if n > 20 {
		return fact(n)
	}
	return 0
}`)
	fd := p.fn(t, "stock")
	f := Analyze(p.info, fd, Options{})
	first := fd.Body.List[0].(*ast.IfStmt).Body.List[0]
	second := fd.Body.List[1].(*ast.IfStmt).Body.List[0]
	if !f.Reachable(first) {
		t.Error("first return unreachable")
	}
	if f.Reachable(second) {
		t.Error("second return reachable although n > 10 returned already")
	}
	call := second.(*ast.ReturnStmt).Results[0].(*ast.CallExpr)
	if got := f.Of(call.Args[0]); !got.IsEmpty() {
		t.Errorf("Of in unreachable code = %v, want empty", got)
	}
	if got := f.At(paramObj(p, fd, 0), call); !got.IsEmpty() {
		t.Errorf("At in unreachable code = %v, want empty", got)
	}
	if got := f.Of(findCall(fd, "fact").Args[0]); got != Span(11, posInf) {
		t.Errorf("Of in first branch = %v, want [11, +inf)", got)
	}
}

func TestFuncLitRoot(t *testing.T) {
	p := check(t, `package p
var f = func(n int) int {
	if n > 5 {
		return 0
	}
	return n
}`)
	var lit *ast.FuncLit
	ast.Inspect(p.file, func(n ast.Node) bool {
		if l, ok := n.(*ast.FuncLit); ok {
			lit = l
		}
		return lit == nil
	})
	f := Analyze(p.info, lit, Options{})
	ret := lit.Body.List[1].(*ast.ReturnStmt).Results[0]
	if got := f.Of(ret); got != Span(negInf, 5) {
		t.Errorf("Of = %v, want (-inf, 5]", got)
	}
}

func TestMissingInfo(t *testing.T) {
	p := check(t, `package p
func stock(n int) int {
	if n > 10 {
		return 0
	}
	return n
}`)
	fd := p.fn(t, "stock")
	for _, info := range []*types.Info{nil, {}} {
		f := Analyze(info, fd, Options{})
		ret := fd.Body.List[1].(*ast.ReturnStmt).Results[0]
		if got := f.Of(ret); !got.IsTop() {
			t.Errorf("no type info: %v, want top", got)
		}
	}
}
