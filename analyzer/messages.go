package analyzer

import (
	"fmt"
	"go/ast"
	"go/types"
	"math"

	"github.com/overfact/overfact/analyzer/ranges"
)

// Every number in a message comes from the thresholds package or from the
// range of the code; none is typed here.

// src renders an expression as messages show it.
func src(e ast.Expr) string {
	if e == nil {
		return ""
	}
	return types.ExprString(e)
}

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

// verdict says how the range of name relates to its first bad value and
// whether the overflow is certain.
func verdict(name string, iv ranges.Interval, firstBad int64) (string, bool) {
	switch {
	case name == "":
		return "", iv.Lo >= firstBad
	case iv.Lo >= firstBad && iv.Lo != math.MinInt64:
		return fmt.Sprintf("; %s is at least %d here", name, iv.Lo), true
	case iv.Hi == math.MaxInt64:
		return fmt.Sprintf("; %s is not bounded here", name), false
	}
	return fmt.Sprintf("; %s may reach %d here", name, iv.Hi), false
}

// factorialLimitText describes where a factorial of name+off breaks in t:
// "factorial of n in int64 wraps for n ≥ 21 (20! ≈ 2.43e18 is the
// largest that fits)".
func factorialLimitText(kind facKind, name string, off int64, t numType) string {
	first := firstBadOf(kind, t)
	last := lastGoodApprox(kind, t)
	bang := "!"
	what := "factorial"
	if kind == kindDouble {
		bang, what = "!!", "double factorial"
	}
	if name == "" {
		return fmt.Sprintf("%s of %d in %s %s (%d%s ≈ %s is the largest that fits)", what, off, t.typeName(), verb(t), first-1, bang, last)
	}
	return fmt.Sprintf("%s of %s in %s %s for %s ≥ %d (%d%s ≈ %s is the largest that fits)", what, plus(name, off), t.typeName(), verb(t), name, first-off, first-1, bang, last)
}
