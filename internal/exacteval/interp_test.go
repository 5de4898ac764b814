package exacteval

import (
	"errors"
	"go/ast"
	"go/importer"
	"go/parser"
	"go/token"
	"go/types"
	"math"
	"math/big"
	"testing"

	"golang.org/x/tools/go/ssa"
	"golang.org/x/tools/go/ssa/ssautil"
)

const src = `package p

import (
	"errors"
	"math"
)

func Fact(n int64) int64 {
	f := int64(1)
	for i := int64(2); i <= n; i++ {
		f *= i
	}
	return f
}

func FactF(n float64) float64 {
	v := 1.0
	for i := 2.0; i <= n; i++ {
		v *= i
	}
	return v
}

func Choose(n, k int) int {
	r := 1
	for d := 1; d <= k; d++ {
		r = r * (n - k + d) / d
	}
	return r
}

func Rec(n int32) int32 {
	if n <= 1 {
		return 1
	}
	return n * Rec(n-1)
}

type Desk struct{ N, K int64 }

func (d Desk) Tickets() int64 { return Fact(d.N) / (Fact(d.K) * Fact(d.N-d.K)) }

func (d *Desk) Grow() int64 { d.N++; return d.N }

var table = [...]int64{1, 1, 2, 6, 24}

func Table(n int) int64 { return table[n] }

func Sum(n int) float64 {
	xs := make([]float64, 0)
	for i := 0; i < n; i++ {
		xs = append(xs, float64(i))
	}
	s := 0.0
	for _, x := range xs {
		s += x
	}
	return s
}

func Guarded(n int) int {
	if n < 0 {
		panic(errors.New("negative"))
	}
	return n / (n - 3)
}

func Pmf(k int, lambda float64) float64 {
	lg, _ := math.Lgamma(float64(k) + 1)
	return math.Exp(float64(k)*math.Log(lambda) - lambda - lg)
}

func Closure(n int) int {
	acc := 0
	add := func(x int) { acc += x }
	for i := 1; i <= n; i++ {
		add(i)
	}
	return acc
}

func Near(x float64) bool { return x*3 == 1 }

func Spin(n int) int {
	for {
		n++
	}
}

func Counts(n int) int {
	m := map[int]int{}
	m[n]++
	return m[n]
}

func Gen[T int64 | float64](n T) T {
	f := T(1)
	for i := T(2); i <= n; i++ {
		f *= i
	}
	return f
}

func UseGen(n int64) int64 { return Gen(n) }

func GammaAbs(x float64) float64 {
	lg, _ := math.Lgamma(x)
	return math.Exp(lg)
}

func GammaSigned(x float64) float64 {
	lg, sign := math.Lgamma(x)
	return float64(sign) * math.Exp(lg)
}
`

func build(t *testing.T) *ssa.Package {
	t.Helper()
	fset := token.NewFileSet()
	f, err := parser.ParseFile(fset, "p.go", src, 0)
	if err != nil {
		t.Fatal(err)
	}
	pkg, _, err := ssautil.BuildPackage(&types.Config{Importer: importer.Default()}, fset,
		types.NewPackage("p", "p"), []*ast.File{f}, ssa.SanityCheckFunctions|ssa.InstantiateGenerics)
	if err != nil {
		t.Fatal(err)
	}
	return pkg
}

func method(pkg *ssa.Package, typ, name string, ptr bool) *ssa.Function {
	var t types.Type = pkg.Type(typ).Type()
	if ptr {
		t = types.NewPointer(t)
	}
	ms := pkg.Prog.MethodSets.MethodSet(t)
	return pkg.Prog.MethodValue(ms.Lookup(pkg.Pkg, name))
}

func TestEvaluate(t *testing.T) {
	pkg := build(t)
	ev := New()
	call := func(name string, args ...any) (any, error) {
		return ev.Call(pkg.Func(name), args)
	}
	// Integers are exact: 30! from math/big, where int64 would wrap.
	if v, err := call("Fact", Int(30)); err != nil || v.(*big.Int).Cmp(new(big.Int).MulRange(1, 30)) != 0 {
		t.Errorf("Fact(30) = %v, %v; want 30! (math/big MulRange)", v, err)
	}
	if v, err := call("Rec", Int(25)); err != nil || v.(*big.Int).Cmp(new(big.Int).MulRange(1, 25)) != 0 {
		t.Errorf("Rec(25) = %v, %v; want 25!", v, err)
	}
	if v, err := call("UseGen", Int(22)); err != nil || v.(*big.Int).Cmp(new(big.Int).MulRange(1, 22)) != 0 {
		t.Errorf("UseGen(22) = %v, %v; want 22!", v, err)
	}
	// 200! as a float, past float64's range, agrees with math/big.
	v, err := call("FactF", Float(200))
	want := new(big.Float).SetInt(new(big.Int).MulRange(1, 200))
	if err != nil || !within200(v.(*big.Float), want) {
		t.Errorf("FactF(200) = %v, %v; want 200!", v, err)
	}
	if v, err := call("Choose", Int(100), Int(50)); err != nil || v.(*big.Int).Cmp(new(big.Int).Binomial(100, 50)) != 0 {
		t.Errorf("Choose(100, 50) = %v, %v; want math/big Binomial", v, err)
	}
	tickets := method(pkg, "Desk", "Tickets", false)
	if v, err := ev.Call(tickets, []any{Struct{Int(70), Int(35)}}); err != nil || v.(*big.Int).Cmp(new(big.Int).Binomial(70, 35)) != 0 {
		t.Errorf("Desk{70, 35}.Tickets() = %v, %v; want C(70, 35)", v, err)
	}
	grow := method(pkg, "Desk", "Grow", true)
	if v, err := ev.Call(grow, []any{Pointer(Struct{Int(4), Int(0)})}); err != nil || v.(*big.Int).Int64() != 5 {
		t.Errorf("(&Desk{4, 0}).Grow() = %v, %v; want 5", v, err)
	}
	if v, err := call("Table", Int(4)); err != nil || v.(*big.Int).Int64() != 24 {
		t.Errorf("Table(4) = %v, %v; want 24", v, err)
	}
	var pe *PanicError
	if _, err := call("Table", Int(5)); !errors.As(err, &pe) {
		t.Errorf("Table(5): %v, want an index panic", err)
	}
	if v, err := call("Sum", Int(10)); err != nil || v.(*big.Float).Cmp(big.NewFloat(45)) != 0 {
		t.Errorf("Sum(10) = %v, %v; want 45", v, err)
	}
	if _, err := call("Guarded", Int(-1)); !errors.As(err, &pe) {
		t.Errorf("Guarded(-1): %v, want a panic", err)
	}
	if _, err := call("Guarded", Int(3)); !errors.As(err, &pe) {
		t.Errorf("Guarded(3): %v, want a division panic", err)
	}
	if v, err := call("Closure", Int(100)); err != nil || v.(*big.Int).Int64() != 5050 {
		t.Errorf("Closure(100) = %v, %v; want 5050", v, err)
	}
	// Poisson pmf e^−λ·λ^k/k! at k = 200, λ = 150 through math.Lgamma,
	// against math/big: 150^200/200! times e^−150.
	v, err = call("Pmf", Int(200), Float(150))
	num := new(big.Float).SetPrec(400).SetInt(new(big.Int).Exp(big.NewInt(150), big.NewInt(200), nil))
	num.Quo(num, new(big.Float).SetPrec(400).SetInt(new(big.Int).MulRange(1, 200)))
	num.Mul(num, Exp(Float(-150)))
	if err != nil || !within200(v.(*big.Float), num) {
		t.Errorf("Pmf(200, 150) = %v, %v; want %s", v, err, num.Text('g', 20))
	}
	var se *SkipError
	for _, c := range []struct {
		name string
		arg  any
	}{
		{"Near", Float(1.0 / 3)}, // x·3 is within 2^−40 of 1
		{"Spin", Int(0)},         // the step bound
		{"Counts", Int(1)},       // maps
	} {
		if _, err := call(c.name, c.arg); !errors.As(err, &se) {
			t.Errorf("%s: %v, want skipped", c.name, err)
		} else {
			t.Logf("%s skipped: %s", c.name, se.Reason)
		}
	}
}

// TestLgammaSignLost: where Γ < 0 and the code drops math.Lgamma's sign,
// the code means |Γ| or Γ and no value of it is the reference: skipped.
// Γ(5/2) = 3√π/4 and Γ(−1/2) = −2√π (DLMF 5.4.6 with 5.5.1).
func TestLgammaSignLost(t *testing.T) {
	pkg := build(t)
	ev := New()
	sqrtPi := math.Sqrt(math.Pi)
	near := func(v any, want float64) bool {
		f, ok := v.(*big.Float)
		if !ok {
			return false
		}
		got, _ := f.Float64()
		return math.Abs(got-want) <= 1e-15*math.Abs(want)
	}
	if v, err := ev.Call(pkg.Func("GammaAbs"), []any{Float(2.5)}); err != nil || !near(v, 0.75*sqrtPi) {
		t.Errorf("GammaAbs(2.5) = %v, %v; want 3√π/4", v, err)
	}
	var se *SkipError
	if _, err := ev.Call(pkg.Func("GammaAbs"), []any{Float(-0.5)}); !errors.As(err, &se) {
		t.Errorf("GammaAbs(-0.5): %v, want skipped (the sign of Γ(−1/2) < 0 dropped)", err)
	}
	if v, err := ev.Call(pkg.Func("GammaSigned"), []any{Float(-0.5)}); err != nil || !near(v, -2*sqrtPi) {
		t.Errorf("GammaSigned(-0.5) = %v, %v; want −2√π", v, err)
	}
}

// NaN as IEEE 754 arithmetic has it (common practice): 0/0 is NaN, NaN
// compares unequal to itself, math.IsNaN sees it, Pow(NaN, 0) = 1.
func TestNaN(t *testing.T) {
	const nanSrc = `package q

import "math"

func Ratio(a, b float64) float64 { return a / b }

func Same(x float64) bool { y := x / x; return y == y }

func Checked(x float64) float64 {
	if math.IsNaN(math.Log(x)) {
		return -1
	}
	return math.Pow(math.NaN(), 0)
}
`
	fset := token.NewFileSet()
	f, err := parser.ParseFile(fset, "q.go", nanSrc, 0)
	if err != nil {
		t.Fatal(err)
	}
	pkg, _, err := ssautil.BuildPackage(&types.Config{Importer: importer.Default()}, fset,
		types.NewPackage("q", "q"), []*ast.File{f}, ssa.SanityCheckFunctions)
	if err != nil {
		t.Fatal(err)
	}
	ev := New()
	if v, err := ev.Call(pkg.Func("Ratio"), []any{Float(0), Float(0)}); err != nil || v != (NaN{}) {
		t.Errorf("Ratio(0, 0) = %v, %v; want NaN", v, err)
	}
	if v, err := ev.Call(pkg.Func("Same"), []any{Float(0)}); err != nil || v != false {
		t.Errorf("Same(0) = %v, %v; want false", v, err)
	}
	if v, err := ev.Call(pkg.Func("Checked"), []any{Float(-2)}); err != nil || v.(*big.Float).Cmp(big.NewFloat(-1)) != 0 {
		t.Errorf("Checked(-2) = %v, %v; want -1", v, err)
	}
	if v, err := ev.Call(pkg.Func("Checked"), []any{Float(2)}); err != nil || v.(*big.Float).Cmp(big.NewFloat(1)) != 0 {
		t.Errorf("Checked(2) = %v, %v; want 1", v, err)
	}
}
