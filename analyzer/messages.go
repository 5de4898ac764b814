package analyzer

import (
	"fmt"
	"go/ast"
	"go/printer"
	"go/token"
	"go/types"
	"math"
	"strings"
)

// Every number in a message comes from the thresholds package or from the
// range of the code; none is typed here.

// src renders an expression as messages show it: as gofmt prints it on
// one line (d/2 + 1, not d / 2 + 1), without its comments.
func src(e ast.Expr) string {
	if e == nil {
		return ""
	}
	if s, ok := plainSrc(e); ok {
		return s
	}
	var b strings.Builder
	if err := printer.Fprint(&b, emptyFset, e); err != nil {
		return types.ExprString(e)
	}
	return b.String()
}

// plainSrc renders the expressions the printer shows exactly as
// written, names, selections of names and calls of them on names
// (n, s.n, f(n, k), pkg.F(x)), without the printer and the tab writer it
// allocates for every expression: messages name such operands by the
// thousand in a large package.
func plainSrc(e ast.Expr) (string, bool) {
	switch e := e.(type) {
	case *ast.Ident:
		return e.Name, true
	case *ast.SelectorExpr:
		if x, ok := e.X.(*ast.Ident); ok {
			return x.Name + "." + e.Sel.Name, true
		}
	case *ast.CallExpr:
		if e.Ellipsis.IsValid() {
			return "", false
		}
		fun, ok := plainSrc(e.Fun)
		if !ok {
			return "", false
		}
		if _, isCall := e.Fun.(*ast.CallExpr); isCall {
			return "", false
		}
		var b strings.Builder
		b.WriteString(fun)
		b.WriteByte('(')
		for i, a := range e.Args {
			switch a.(type) {
			case *ast.Ident, *ast.SelectorExpr:
			default:
				return "", false
			}
			s, ok := plainSrc(a)
			if !ok {
				return "", false
			}
			if i > 0 {
				b.WriteString(", ")
			}
			b.WriteString(s)
		}
		b.WriteByte(')')
		return b.String(), true
	}
	return "", false
}

// emptyFset gives the printer no line information, so that an
// expression written over several lines is shown on one.
var emptyFset = token.NewFileSet()

// plus renders name+off, or the constant off when name is empty.
func plus(name string, off int64) string {
	switch {
	case name == "":
		return fmt.Sprint(off)
	case off > 0:
		return fmt.Sprintf("%s+%d", name, off)
	case off < 0:
		return fmt.Sprintf("%s-%d", name, -off)
	}
	return name
}

// factorialLimitText describes where a factorial of name+off breaks in t:
// "factorial of n in int64 wraps for n ≥ 21 (20! ≈ 2.43e18 is the
// largest that fits)".
func factorialLimitText(kind facKind, name string, off int64, t numType) string {
	first := firstBadOf(kind, t)
	what := "factorial"
	if kind == kindDouble {
		what = "double factorial"
	}
	if name == "" {
		return fmt.Sprintf("%s of %d in %s %s (%s)", what, off, t.typeName(), verb(t), largestFits(kind, t))
	}
	return fmt.Sprintf("%s of %s in %s %s for %s ≥ %d (%s)", what, plus(name, off), t.typeName(), verb(t), name, first-off, largestFits(kind, t))
}

// factorialConstText describes a factorial whose largest factor is the
// constant written as text, up to which the loop runs.
func factorialConstText(kind facKind, text string, t numType) string {
	what := "factorial"
	if kind == kindDouble {
		what = "double factorial"
	}
	return fmt.Sprintf("%s up to %s in %s %s (%s)", what, text, t.typeName(), verb(t), largestFits(kind, t))
}

// largestFits names the largest value of the kind that fits t:
// "20! ≈ 2.43e18 is the largest that fits".
func largestFits(kind facKind, t numType) string {
	bang := "!"
	if kind == kindDouble {
		bang = "!!"
	}
	return fmt.Sprintf("%d%s ≈ %s is the largest that fits", firstBadOf(kind, t)-1, bang, lastGoodApprox(kind, t))
}

// typeLimit reports whether v is the largest value of an integer type,
// which is what the range of an unconstrained variable ends at, or so
// large (past 2^32) that naming it would only hide that nothing bounds
// the value in practice.
func typeLimit(v int64) bool {
	if v >= 1<<32 {
		return true
	}
	switch v {
	case math.MaxInt8, math.MaxUint8, math.MaxInt16, math.MaxUint16,
		math.MaxInt32, math.MaxUint32, math.MaxInt64:
		return true
	}
	return false
}
