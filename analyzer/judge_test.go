package analyzer

import (
	"go/ast"
	"go/parser"
	"math"
	"testing"

	"github.com/overfact/overfact/analyzer/ranges"
)

// TestDecide checks the one decision every category makes, against the
// first bad value of n! in int64, 21 (OEIS A000142: 20! < 2^63 ≤ 21!).
func TestDecide(t *testing.T) {
	const first = 21
	tests := []struct {
		arg      string
		r        ranges.Interval
		silent   bool
		definite bool
		clause   string
	}{
		{"n", ranges.Span(0, 20), true, false, ""},
		{"n", ranges.Empty(), true, false, ""},
		{"n", ranges.Span(0, 30), false, false, "; n may reach 30 here"},
		{"n", ranges.Span(0, math.MaxInt64), false, false, "; n is not bounded here"},
		{"n", ranges.Span(0, math.MaxInt32), false, false, "; n is not bounded here"},
		{"n+1", ranges.Span(25, 40), false, true, "; n + 1 is at least 25 here"},
		{"25", ranges.Point(25), false, true, ""}, // a literal states its value itself
		{"-5", ranges.Point(-5), true, false, ""}, // below any first bad value
		{"(25)", ranges.Point(25), false, true, "; (25) is at least 25 here"},
	}
	for _, tt := range tests {
		e, err := parser.ParseExpr(tt.arg)
		if err != nil {
			t.Fatal(err)
		}
		j := decide(e, tt.r, first)
		if j.silent != tt.silent || j.definite != tt.definite || j.clause != tt.clause {
			t.Errorf("decide(%s, %v, %d) = %+v, want silent %v, definite %v, clause %q", tt.arg, tt.r, first, j, tt.silent, tt.definite, tt.clause)
		}
	}
	if j := decide(nil, ranges.Point(0), 0); !j.definite || j.clause != "" {
		t.Errorf("decide(nil) with a constant bound past the limit = %+v, want definite with no clause", j)
	}
}

// TestShownFactorial checks that a literal argument is folded into the
// offset from its token, and an expression keeps its name.
func TestShownFactorial(t *testing.T) {
	for _, tt := range []struct {
		arg  string
		off  int64
		name string
		val  int64
	}{
		{"25", 0, "", 25},
		{"0x10", 1, "", 17},
		{"-3", 2, "", -1},
		{"n", 1, "n", 1},
		{"(25)", 0, "(25)", 0},
	} {
		e, _ := parser.ParseExpr(tt.arg)
		if name, v := shownFactorial(e, tt.off); name != tt.name || v != tt.val {
			t.Errorf("shownFactorial(%s, %d) = %q, %d; want %q, %d", tt.arg, tt.off, name, v, tt.name, tt.val)
		}
	}
	var none ast.Expr
	if name, v := shownFactorial(none, 7); name != "" || v != 7 {
		t.Errorf("shownFactorial(nil, 7) = %q, %d", name, v)
	}
}
