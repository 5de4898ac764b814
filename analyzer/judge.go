package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"math"
	"strconv"

	"github.com/overfact/overfact/analyzer/ranges"
)

// A judgement is what the range of the value that decides an overflow
// says about the first value at which the arithmetic breaks: every
// category asks judge (or decide, with a range it already has) and
// reports nothing when silent.
type judgement struct {
	silent   bool   // no value of the range reaches the first bad value
	definite bool   // every value does: the overflow is certain
	clause   string // the range against it, for the message: "; n may reach 30 here"
}

// judge compares the range of arg where it is evaluated with first.
func (fc *fnCtx) judge(arg ast.Expr, first int64) judgement {
	j := decide(arg, fc.rangeOf(arg), first)
	fc.noteJudged(arg, first, j)
	return j
}

// judgeCall judges a call of a function that carries a fact, against
// the first bad value the fact states; a function that bounds its own
// parameter (or a call with no fact) is silent.
func (fc *fnCtx) judgeCall(f factor) (judgement, int64) {
	if f.fact == nil || f.fact.Safe {
		return judgement{silent: true}, 0
	}
	return fc.judge(f.arg, f.fact.FirstBad), f.fact.FirstBad
}

// decide compares r, the range of arg, with first. A nil arg or an
// integer literal is shown by no name: the message states its value.
func decide(arg ast.Expr, r ranges.Interval, first int64) judgement {
	return decideName(shownName(arg), r, first)
}

// decideName compares r, the range of the variable name, with first; an
// empty name stands for a constant. The value model's rules judge
// variables of the model, which have a name and no expression.
func decideName(name string, r ranges.Interval, first int64) judgement {
	j := judgement{silent: r.IsEmpty() || r.Hi < first}
	if !j.silent {
		j.clause, j.definite = verdict(name, r, first)
	}
	return j
}

// shownName returns how a verdict names arg: its source, or nothing for
// a nil arg or an integer literal, whose value the message states.
func shownName(arg ast.Expr) string {
	if _, lit := intLiteral(arg); arg == nil || lit {
		return ""
	}
	return src(arg)
}

// verdict says how the range of name relates to its first bad value and
// whether the overflow is certain; an empty name stands for a constant.
func verdict(name string, iv ranges.Interval, firstBad int64) (string, bool) {
	switch {
	case name == "":
		return "", iv.Lo >= firstBad
	case iv.Lo >= firstBad && iv.Lo != math.MinInt64:
		return fmt.Sprintf("; %s is at least %d here", name, iv.Lo), true
	case typeLimit(iv.Hi):
		return fmt.Sprintf("; %s is not bounded here", name), false
	}
	return fmt.Sprintf("; %s may reach %d here", name, iv.Hi), false
}

// intLiteral returns the value of an integer literal, signed or not,
// as written in the source (not through parentheses).
func intLiteral(e ast.Expr) (int64, bool) {
	sign := ""
	if u, ok := e.(*ast.UnaryExpr); ok && (u.Op == token.SUB || u.Op == token.ADD) {
		sign, e = u.Op.String(), u.X
	}
	lit, ok := e.(*ast.BasicLit)
	if !ok || lit.Kind != token.INT {
		return 0, false
	}
	v, err := strconv.ParseInt(sign+lit.Value, 0, 64)
	return v, err == nil
}

// shownFactorial returns how a message names the factorial of arg+off:
// the name and offset, or, for a literal argument, no name and the
// value.
func shownFactorial(arg ast.Expr, off int64) (string, int64) {
	if arg == nil {
		return "", off
	}
	if v, ok := intLiteral(arg); ok {
		return "", v + off
	}
	return src(arg), off
}

// entryGuardHolds reports whether a guard at the function's entry may
// test parameter p against first when the function assigns p before
// site, a statement of the function's body itself where the product is
// formed and p's value decides it: clamped, if n > 30 { n = 30 }, the
// value at site is not the caller's, and a guard there would name a
// value the caller never passed. The guard p ≥ first at entry is exact
// when two range analyses from entry, with p ≥ first and with p < first,
// show that the first reaches site on every path (no earlier return
// runs) with p at first or above there, and the second never does. A
// clamp to a floor past the limit (if n < 40 { n = 40 }) fails the
// second: every call is wrong, and no guard tells a right one from a
// wrong one.
func (fc *fnCtx) entryGuardHolds(p types.Object, site ast.Stmt, first int64) bool {
	d, ok := fc.node.(*ast.FuncDecl)
	if !ok || d.Body == nil || first == math.MinInt64 {
		return false
	}
	atTop := false
	for _, s := range d.Body.List {
		atTop = atTop || s == site
	}
	if !atTop {
		return false
	}
	with := func(iv ranges.Interval) *fnCtx {
		entry := fc.c.ownEntry(d)
		if old, ok := entry[p]; ok {
			iv = iv.Meet(old)
		}
		entry[p] = iv
		return fc.c.newCtx(d, entry)
	}
	past, below := with(ranges.Interval{Lo: first, Hi: math.MaxInt64}), with(ranges.Interval{Lo: math.MinInt64, Hi: first - 1})
	reached := true
	ast.Inspect(d.Body, func(n ast.Node) bool {
		if ret, ok := n.(*ast.ReturnStmt); ok && ret.Pos() < site.Pos() && !past.ranges().At(p, ret).IsEmpty() {
			reached = false
		}
		_, lit := n.(*ast.FuncLit)
		return reached && !lit && n != nil && n.Pos() < site.Pos()
	})
	hi, lo := past.entryRange(p, site), below.entryRange(p, site)
	return reached && !hi.IsEmpty() && hi.Lo >= first && (lo.IsEmpty() || lo.Hi < first)
}
