package valuemodel

import (
	"go/ast"
	"go/importer"
	"go/parser"
	"go/token"
	"go/types"
	"math"
	"math/big"
	"strings"
	"testing"
)

// load type-checks src (package p, importing math) and returns the
// function called name with its type information.
func load(t *testing.T, src, name string) (*types.Info, *ast.FuncDecl) {
	t.Helper()
	fset := token.NewFileSet()
	f, err := parser.ParseFile(fset, "p.go", "package p\n\nimport \"math\"\n\nvar _ = math.Pi\n\n"+src, 0)
	if err != nil {
		t.Fatal(err)
	}
	info := &types.Info{
		Types:      make(map[ast.Expr]types.TypeAndValue),
		Defs:       make(map[*ast.Ident]types.Object),
		Uses:       make(map[*ast.Ident]types.Object),
		Selections: make(map[*ast.SelectorExpr]*types.Selection),
	}
	conf := types.Config{Importer: importer.ForCompiler(fset, "source", nil)}
	if _, err := conf.Check("p", fset, []*ast.File{f}, info); err != nil {
		t.Fatal(err)
	}
	for _, d := range f.Decls {
		if fd, ok := d.(*ast.FuncDecl); ok && fd.Name.Name == name {
			return info, fd
		}
	}
	t.Fatalf("no func %s", name)
	return nil, nil
}

// returned is the value of the function's last return statement.
func returned(res *Result, fd *ast.FuncDecl) *Term {
	var ret *ast.ReturnStmt
	ast.Inspect(fd.Body, func(n ast.Node) bool {
		if r, ok := n.(*ast.ReturnStmt); ok {
			ret = r
		}
		return true
	})
	if ret == nil || len(ret.Results) == 0 {
		return nil
	}
	return res.Values[ret.Results[0]]
}

// The forms below are the textbook identities of each computation
// (common practice): a loop multiplying 2·3·…·n is n!, the
// multiplicative formula ∏(n−k+i)/i is C(n, k), and so on. Each case
// writes one of them the way Go code in the wild does.
func TestEvaluateReturns(t *testing.T) {
	tests := []struct {
		name, src, want string
	}{
		{"float counter", `func f(n float64) float64 {
	v := 1.0
	for i := 2.0; i <= n; i++ {
		v *= i
	}
	return v
}`, "n!"},
		{"down counter", `func f(n int) float64 {
	v := 1.0
	for i := n; i > 1; i-- {
		v = v * float64(i)
	}
	return v
}`, "n!"},
		{"while", `func f(n int) int {
	f := 1
	for n > 1 {
		f *= n
		n--
	}
	return f
}`, "n!"},
		{"range", `func f(n int) float64 {
	v := 1.0
	for i := range n {
		v *= float64(i + 1)
	}
	return v
}`, "n!"},
		{"binomial up", `func f(n, k int) float64 {
	r := 1.0
	for d := 1; d <= k; d++ {
		r = r * float64(n-k+d) / float64(d)
	}
	return r
}`, "C(n, k)"},
		{"binomial stepped", `func f(n, k int) float64 {
	r := 1.0
	m := float64(n)
	for d := 1; d <= k; d++ {
		r *= m
		r /= float64(d)
		m--
	}
	return r
}`, "C(n, k)"},
		{"binomial ratio", `func f(n, k int) float64 {
	v := 1.0
	for c := 1; c <= k; c++ {
		v *= float64(n+1-c) / float64(c)
	}
	return v
}`, "C(n, k)"},
		{"binomial fields", `type pool struct{ N, K int64 }
func f(p pool) int64 {
	r := int64(1)
	for i := int64(1); i <= p.K; i++ {
		r = r * (p.N - p.K + i) / i
	}
	return r
}`, "C(p.N, p.K)"},
		{"two loops", `func f(n, k int) float64 {
	num := 1.0
	for i := 0; i < k; i++ {
		num *= float64(n - i)
	}
	den := 1.0
	for i := 2; i <= k; i++ {
		den *= float64(i)
	}
	return num / den
}`, "C(n, k)"},
		{"conditional factor", `func f(n, k int) float64 {
	all, occ := 1.0, 1.0
	for i := 1; i <= n; i++ {
		all *= float64(i)
		if i <= k {
			occ *= float64(i)
		}
	}
	return all / occ
}`, "n!/k!"},
		{"one loop binomial", `func f(n, k int) float64 {
	num, den := 1.0, 1.0
	for i := 1; i <= n; i++ {
		num *= float64(i)
		if i <= k {
			den *= float64(i)
		}
		if i <= n-k {
			den *= float64(i)
		}
	}
	return num / den
}`, "C(n, k)"},
		{"affine argument", `func f(k int) float64 {
	d := 1.0
	for j := 1; j <= 2*k+1; j++ {
		d *= float64(j)
	}
	return d
}`, "(2*k + 1)!"},
		{"two factors a trip", `func f(k int) float64 {
	d := 1.0
	for j := 1; j <= k; j++ {
		d *= float64(2*j) * float64(2*j+1)
	}
	return d
}`, "(2*k + 1)!"},
		{"rising", `func f(x float64, n int) float64 {
	p := 1.0
	for i := 0; i < n; i++ {
		p *= x + float64(i)
	}
	return p
}`, "rising(x, n)"},
		{"exp lgamma", `func f(n, k float64) float64 {
	a, _ := math.Lgamma(n + 1)
	b, _ := math.Lgamma(k + 1)
	c, _ := math.Lgamma(n - k + 1)
	return math.Exp(a - b - c)
}`, "C(n, k)"},
		{"beta", `func f(a, b float64) float64 {
	return math.Gamma(b) * math.Gamma(a) / math.Gamma(a+b)
}`, "B(b, a)"},
		{"inverse binomial", `func f(n, k float64) float64 {
	return math.Gamma(k+1) * math.Gamma(n-k+1) / math.Gamma(n+1)
}`, "1/C(n, k)"},
		{"catalan", `func f(n float64) float64 {
	return math.Gamma(2*n+1) / (math.Gamma(n+2) * math.Gamma(n+1))
}`, "Catalan(n)"},
		{"multinomial", `func f(a, b, c float64) float64 {
	return math.Gamma(a+b+c+1) / (math.Gamma(a+1) * math.Gamma(b+1) * math.Gamma(c+1))
}`, "multinomial(a + b + c; a, b, c)"},
		{"power over factorial", `func f(x float64, k int) float64 {
	f := 1.0
	for i := 2; i <= k; i++ {
		f *= float64(i)
	}
	return math.Pow(x, float64(k)) / f
}`, "x^k/k!"},
		{"poisson", `func f(lambda float64, k int) float64 {
	p := math.Exp(-lambda)
	for i := 1; i <= k; i++ {
		p *= lambda / float64(i)
	}
	return p
}`, "lambda^k·e^(−lambda)/k!"},
		{"binomial pmf", `func f(n, k int, p float64) float64 {
	c := 1.0
	for j := 1; j <= k; j++ {
		c *= float64(n+1-j) / float64(j)
	}
	return c * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k))
}`, "C(n, k)·p^k·(1−p)^(n - k)"},
		{"n times gamma", `func f(n float64) float64 {
	return n * math.Gamma(n)
}`, "n!"},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			info, fd := load(t, tc.src, "f")
			res := Evaluate(info, fd, Options{})
			v := returned(res, fd)
			if got := Recognise(v).String(); got != tc.want {
				t.Errorf("got %s (value %v), want %s", got, v, tc.want)
			}
		})
	}
}

// The intermediates of a multiplicative binomial loop, trip by trip,
// against the loop run in math/big: after r*(n−k+d) on trip t the
// product is (t+1)·C(n−k+t+1, t+1) (common practice).
func TestLoopIntermediates(t *testing.T) {
	info, fd := load(t, `func f(n, k int) float64 {
	r := 1.0
	for d := 1; d <= k; d++ {
		r = r * float64(n-k+d) / float64(d)
	}
	return r
}`, "f")
	res := Evaluate(info, fd, Options{})
	if len(res.Loops) != 1 || len(res.Loops[0].Accs) != 1 {
		t.Fatalf("loops %d", len(res.Loops))
	}
	l := res.Loops[0]
	a := l.Accs[0]
	if len(a.Ops) != 2 || !a.Ops[0].Mul || a.Ops[1].Mul {
		t.Fatalf("ops %+v, want × then ÷", a.Ops)
	}
	syms := map[string]Sym{}
	for s := range res.Exprs {
		syms[s.Name()] = s
	}
	n, k := int64(40), int64(20)
	r := big.NewInt(1)
	for d := int64(1); d <= k; d++ {
		r.Mul(r, big.NewInt(n-k+d))
		val := map[Sym]float64{syms["n"]: float64(n), syms["k"]: float64(k), l.Iter: float64(d - 1)}
		want, _ := new(big.Float).SetInt(r).Float64()
		closeLog(t, "after ×", a.Ops[0].After, val, math.Log(want))
		r.Quo(r, big.NewInt(d))
	}
}

// A sum's term is read with the running accumulators it uses.
func TestSumTerms(t *testing.T) {
	info, fd := load(t, `func f(a float64, c int) float64 {
	fact, sum := 1.0, 1.0
	for k := 1; k <= c; k++ {
		fact *= float64(k)
		sum += math.Pow(a, float64(k)) / fact
	}
	return sum
}`, "f")
	res := Evaluate(info, fd, Options{})
	if len(res.Loops) != 1 || len(res.Loops[0].Sums) != 1 {
		t.Fatalf("want one loop with one sum")
	}
	if f := Recognise(res.Loops[0].Sums[0].Sum.Term); f.Kind != PowOverFact {
		t.Errorf("term %v, want a^k/k!", res.Loops[0].Sums[0].Sum.Term)
	}
	// The sum itself is unknown past the loop.
	if v := returned(res, fd); v != nil {
		t.Errorf("sum after the loop = %v, want unknown", v)
	}
}

// Huge functions stop at the cap and say so; bad input never panics.
func TestBounded(t *testing.T) {
	var b strings.Builder
	b.WriteString("func f(n int) int {\n\tv := 1\n")
	for i := 0; i < 3000; i++ {
		b.WriteString("\tv = v*n + 1\n")
	}
	b.WriteString("\treturn v\n}")
	info, fd := load(t, b.String(), "f")
	res := Evaluate(info, fd, Options{MaxNodes: 500})
	if !res.Capped {
		t.Error("not capped")
	}
	res = Evaluate(&types.Info{}, fd, Options{})
	if len(res.Loops) != 0 {
		t.Error("loops found without type information")
	}
	if res := Evaluate(info, &ast.FuncDecl{}, Options{}); res == nil {
		t.Error("nil result for an empty declaration")
	}
	// An internal failure (here a caller's callee hook that panics)
	// leaves the function unmodelled and says why.
	info, fd = load(t, "func g(n int) int { return n }\nfunc f(n int) int { return g(n) * 2 }", "f")
	res = Evaluate(info, fd, Options{Callee: func(*ast.CallExpr, []*Term) *Term { panic("hook failed") }})
	if !res.Capped || res.Failed != "hook failed" || len(res.Values) != 0 {
		t.Errorf("failed evaluation: capped %v, failed %q, %d values", res.Capped, res.Failed, len(res.Values))
	}
}

// A loop that can stop early is marked, so that its trip count is
// read as an upper bound only.
func TestExits(t *testing.T) {
	for src, want := range map[string]bool{
		`func f(n int) float64 { v := 1.0; for i := 1; i <= n; i++ { v *= float64(i); if v > 1e300 { break } }; return v }`:                         true,
		`func f(n int) float64 { v := 1.0; for i := 1; i <= n; i++ { v *= float64(i); if v > 1e300 { return 0 } }; return v }`:                      true,
		`func f(n int) float64 { v := 1.0; for i := 1; i <= n; i++ { v *= float64(i); for j := 0; j < 3; j++ { if j == 1 { break } } }; return v }`: false,
		`func f(n int) float64 { v := 1.0; for i := 1; i <= n; i++ { switch { case i > 2: break }; v *= float64(i) }; return v }`:                   false,
		`func f(n int) float64 { v := 1.0; for i := 1; i <= n; i++ { if i%2 == 0 { continue }; v *= float64(i) }; return v }`:                       true,
		`func f(n int) float64 { v := 1.0; for i := 1; i <= n; i++ { if v > 1e300 { panic("too big") }; v *= float64(i) }; return v }`:              true,
	} {
		info, fd := load(t, src, "f")
		res := Evaluate(info, fd, Options{})
		if len(res.Loops) == 0 {
			t.Errorf("%s: no loop", src)
			continue
		}
		if got := res.Loops[len(res.Loops)-1].Exits; got != want {
			t.Errorf("%s: Exits = %v, want %v", src, got, want)
		}
	}
}

// A loop whose body also moves its counter is not summarised.
func TestCounterMovedInBody(t *testing.T) {
	info, fd := load(t, `func f(n float64) float64 {
	v := 1.0
	for i := 2.0; i <= n; i++ {
		v *= i
		i++
	}
	return v
}`, "f")
	res := Evaluate(info, fd, Options{})
	if len(res.Loops) != 0 {
		t.Errorf("summarised %d loops", len(res.Loops))
	}
	if v := returned(res, fd); v != nil {
		t.Errorf("value %v, want unknown", v)
	}
}

// A logarithm inside a loop body is evaluated in the loop's dry trip
// too: the incomplete gamma series returns sum·exp(a·ln x − x) from
// inside its loop, and its prefactor is x^a·e^(−x) (the series form of
// the lower incomplete gamma function, DLMF 8.7.1, from memory), not a
// function the model gave up on.
func TestLogInsideLoop(t *testing.T) {
	info, fd := load(t, `func f(a, x float64) float64 {
	ap, del := a, 1/a
	sum := del
	for n := 0; n < 200; n++ {
		ap++
		del *= x / ap
		sum += del
		if math.Abs(del) < math.Abs(sum)*3e-14 {
			return sum * math.Exp(-x+a*math.Log(x))
		}
	}
	return math.NaN()
}`, "f")
	res := Evaluate(info, fd, Options{})
	if res.Capped {
		t.Fatal("capped")
	}
	var exp *ast.CallExpr
	ast.Inspect(fd.Body, func(n ast.Node) bool {
		if c, ok := n.(*ast.CallExpr); ok {
			if sel, ok := c.Fun.(*ast.SelectorExpr); ok && sel.Sel.Name == "Exp" {
				exp = c
			}
		}
		return true
	})
	got := res.Values[exp]
	if got == nil || len(got.Gamma) != 0 || len(got.Pows) != 1 ||
		got.Pows[0].Base.String() != "x" || got.Pows[0].Exp.String() != "a" || got.Exp.String() != "-x" {
		t.Errorf("exp(a·ln x − x) = %v, want x^a·e^(−x)", got)
	}
}

// A variable moved to the other end of a symmetric range, k ↦ n − k,
// leaves C(n, k) = C(n, n − k) as it was (the symmetry of Pascal's
// triangle, common practice): the returned value is read in the
// parameter k itself whatever the condition, and a value that the move
// changes keeps the fresh variable.
func TestReflection(t *testing.T) {
	tests := []struct {
		name, src, want string
		param           bool // the value reads the parameter k, not the moved one
	}{
		{"condition", `func f(n, k int) float64 {
	if k > n-k {
		k = n - k
	}
	c := 1.0
	for i := 1; i <= k; i++ {
		c *= float64(n-k+i) / float64(i)
	}
	return c
}`, "C(n, k)", true},
		{"half", `func f(n, k int) float64 {
	if 2*k > n {
		k = n - k
	}
	c := 1.0
	for i := 0; i < k; i++ {
		c = c * float64(n-i) / float64(i+1)
	}
	return c
}`, "C(n, k)", true},
		{"min", `func f(n, k int) float64 {
	k = min(k, n-k)
	c := 1.0
	for i := 0; i < k; i++ {
		c = c * float64(n-i) / float64(i+1)
	}
	return c
}`, "C(n, k)", true},
		{"up", `func f(n, k float64) float64 {
	if k < n-k {
		k = n - k
	}
	c := 1.0
	for i := 1.0; i <= k; i++ {
		c *= (n - k + i) / i
	}
	return c
}`, "C(n, k)", true},
		{"falling changes", `func f(n, k int) float64 {
	if k > n-k {
		k = n - k
	}
	c := 1.0
	for i := 0; i < k; i++ {
		c *= float64(n-i)
	}
	return c
}`, "n!/(n - k)!", false},
		{"off by one", `func f(n, k int) float64 {
	if k > n-k {
		k = n - k - 1
	}
	c := 1.0
	for i := 1; i <= k; i++ {
		c *= float64(n-k+i) / float64(i)
	}
	return c
}`, "C(n, k)", false},
	}
	for _, tc := range tests {
		t.Run(tc.name, func(t *testing.T) {
			info, fd := load(t, tc.src, "f")
			res := Evaluate(info, fd, Options{})
			v := returned(res, fd)
			f := Recognise(v)
			if got := f.String(); got != tc.want {
				t.Fatalf("got %s (value %v), want %s", got, v, tc.want)
			}
			moved := false
			for _, a := range f.Args {
				for _, s := range a.Syms() {
					moved = moved || s.Def != nil
				}
			}
			if moved == tc.param {
				t.Errorf("value %v reads the moved variable: %v, want %v", v, moved, !tc.param)
			}
			// Every move above but the last takes k to the smaller half.
			if len(res.Reflections) != 1 || res.Reflections[0].Low != (tc.name != "off by one" && tc.name != "up") {
				t.Errorf("reflections %+v", res.Reflections)
			}
		})
	}
}
