package fixes

import (
	"go/ast"
	"go/importer"
	"go/parser"
	"go/token"
	"go/types"
	"strings"
	"testing"

	"golang.org/x/tools/go/analysis"
)

// TestFunctionCheck checks fixes edited by hand with both checks: the
// check of the edited functions must refuse what the whole package's
// check refuses, including fixes that break a function they do not edit,
// and take the whole package's check where it cannot judge.
func TestFunctionCheck(t *testing.T) {
	const p = `package p

import (
	"math"
	"strconv"
)

var table = []float64{math.Pi}

var start = h(1)

type bitsT uint

func init() { table[0] = math.E }

func first[T any](xs []T) T { return xs[0] }

type counter int

func (c counter) twice() int { v := int(c); return v * 2 }

func (c *counter) bump() { *c += counter(c.twice()) }

func f(n int) float64 {
	b := n
	return float64(b) * math.Sqrt(2)
}

func g(n int) string { return strconv.Itoa(n) }

func h(x float64) float64 { return f(int(x)) + math.Log(x) }
`
	const q = `package p

import "math/big"

func k(n int64) *big.Int { return big.NewInt(n) }
`
	tests := []struct {
		name     string
		edits    [][2]string // old, new: each replaces the first old after the previous edit
		want     string      // "" for a fix that must pass, else part of the refusal
		wantFull bool        // the whole package's check is expected
	}{
		{"sound", [][2]string{{"return float64(b)", "return float64(b + 0)"}}, "", false},
		{"unused variable", [][2]string{{"return float64(b)", "return float64(n)"}}, "declared and not used", false},
		{"undefined", [][2]string{{"math.Sqrt(2)", "lgammaX.Sqrt(2)"}}, "undefined", false},
		{"import left unused", [][2]string{{"strconv.Itoa(n)", "string(rune(n))"}}, `"strconv" imported and not used`, false},
		{"import still used elsewhere", [][2]string{{"* math.Sqrt(2)", "* 1.4142135623730951"}}, "", false},
		{"import removed but used elsewhere", [][2]string{{"\t\"math\"\n", ""}, {"* math.Sqrt(2)", "* 1.4142135623730951"}}, "undefined: math", true},
		{"new import clashes with a declaration", [][2]string{{"\t\"strconv\"\n", "\t\"strconv\"\n\tbitsT \"math/bits\"\n"}, {"return float64(b)", "return float64(bitsT.Len(uint(b)))"}}, "", false},
		{"signature breaks a caller", [][2]string{{"func f(n int) float64", "func f(n int) int"}, {"return float64(b) * math.Sqrt(2)", "return b"}}, "", true},
		{"new reference to a variable", [][2]string{{"return float64(b)", "return float64(int(start) + b)"}}, "initialization cycle", true},
		{"method", [][2]string{{"return v * 2", "return v + v"}}, "", false},
		{"method left broken", [][2]string{{"return v * 2", "return c * 2"}}, "cannot use c * 2", false},
		{"generic function", [][2]string{{"return xs[0]", "return xs[len(xs)-1]"}}, "", false},
		{"two functions", [][2]string{{"return float64(b)", "return float64(b + 0)"}, {"math.Log(x)", "math.Log(x+0)"}}, "", false},
		// The excerpt places each function at its line in the fixed file:
		// an import added above moves the error a line down, a line
		// added inside the first function moves the second's.
		{"error below an added import", [][2]string{{"\t\"strconv\"\n", "\t\"strconv\"\n\t\"math/big\"\n"}, {"return float64(b)", "return float64(big.NewInt(int64(n)).BitLen())"}}, "declared and not used", false},
		{"error below an edited function", [][2]string{{"return float64(b)", "_ = b\n\treturn float64(b)"}, {"math.Log(x)", "math.Log(y)"}}, "undefined: y", false},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			b := twoFileBuilder(t, p, q)
			src := p
			at := 0
			for _, e := range tt.edits {
				off := strings.Index(src[at:], e[0])
				if off < 0 {
					t.Fatalf("%q not in the source", e[0])
				}
				off += at
				b.replace(b.tok.Pos(off), b.tok.Pos(off+len(e[0])), e[1])
				at = off + len(e[0])
			}
			var cheap bool
			var full error
			checkHook = func(b *builder, fixed []byte, c bool, err error) {
				cheap, full = c, b.checkPackage(fixed)
			}
			defer func() { checkHook = nil }()
			err := b.verify()
			if (err == nil) != (full == nil) {
				t.Errorf("verify = %v; the whole package's check says %v", err, full)
			} else if err != nil && err.Error() != full.Error() {
				// The excerpt keeps the fixed file's lines and columns.
				t.Errorf("verify = %v; the whole package's check says %v", err, full)
			}
			if cheap == tt.wantFull {
				t.Errorf("checked the edited functions alone: %v; want %v", cheap, !tt.wantFull)
			}
			want := tt.want
			if tt.name == "new import clashes with a declaration" || tt.name == "signature breaks a caller" {
				// Outcomes decided by go/types (a name declared twice,
				// a caller that no longer compiles): the full check's.
				if full == nil {
					t.Fatalf("the whole package's check accepts %s", tt.name)
				}
				want = "does not type-check"
			}
			switch {
			case want == "" && err != nil:
				t.Errorf("verify = %v; want nil", err)
			case want != "" && (err == nil || !strings.Contains(err.Error(), want)):
				t.Errorf("verify = %v; want an error containing %q", err, want)
			}
		})
	}
}

// twoFileBuilder returns a builder for the first of a package's two files.
func twoFileBuilder(t *testing.T, src1, src2 string) *builder {
	t.Helper()
	fset := token.NewFileSet()
	f1, err := parser.ParseFile(fset, "p.go", src1, parser.ParseComments)
	if err != nil {
		t.Fatal(err)
	}
	f2, err := parser.ParseFile(fset, "q.go", src2, parser.ParseComments)
	if err != nil {
		t.Fatal(err)
	}
	info := &types.Info{Types: map[ast.Expr]types.TypeAndValue{}, Defs: map[*ast.Ident]types.Object{},
		Uses: map[*ast.Ident]types.Object{}, Implicits: map[ast.Node]types.Object{}, Scopes: map[ast.Node]*types.Scope{}}
	conf := types.Config{Importer: importer.Default()}
	pkg, err := conf.Check("p", fset, []*ast.File{f1, f2}, info)
	if err != nil {
		t.Fatal(err)
	}
	pass := &analysis.Pass{
		Fset: fset, Files: []*ast.File{f1, f2}, Pkg: pkg, TypesInfo: info,
		TypesSizes: types.SizesFor("gc", "amd64"),
		ReadFile: func(name string) ([]byte, error) {
			if name == "q.go" {
				return []byte(src2), nil
			}
			return []byte(src1), nil
		},
	}
	b, err := newBuilder(NewFixer(pass), Match{File: f1, Node: f1.Name})
	if err != nil {
		t.Fatal(err)
	}
	return b
}
