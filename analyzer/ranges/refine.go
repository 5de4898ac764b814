package ranges

import (
	"go/ast"
	"go/constant"
	"go/token"
	"go/types"

	"github.com/overfact/overfact/internal/tokenop"
)

// refine2 returns the states in which cond holds and fails, both from
// one pass over cond so that && and || chains stay linear.
//
// Float comparisons are refined as if no operand were NaN.
func (w *walker) refine2(s state, cond ast.Expr) (t, f state) {
	if !s.live || cond == nil {
		return s, s
	}
	if tv, ok := w.f.info.Types[cond]; ok && tv.Value != nil && tv.Value.Kind() == constant.Bool {
		if constant.BoolVal(tv.Value) {
			return s, dead
		}
		return dead, s
	}
	w.depth++
	defer func() { w.depth-- }()
	if w.depth > maxDepth {
		return s, s
	}
	switch c := cond.(type) {
	case *ast.ParenExpr:
		return w.refine2(s, c.X)
	case *ast.UnaryExpr:
		if c.Op == token.NOT {
			t, f = w.refine2(s, c.X)
			return f, t
		}
	case *ast.BinaryExpr:
		switch c.Op {
		case token.LAND:
			xt, xf := w.refine2(s, c.X)
			yt, yf := w.refine2(xt, c.Y)
			return yt, xf.join(yf)
		case token.LOR:
			xt, xf := w.refine2(s, c.X)
			yt, yf := w.refine2(xf, c.Y)
			return xt.join(yt), yf
		case token.EQL, token.NEQ, token.LSS, token.LEQ, token.GTR, token.GEQ:
			return w.compare(s, c.X, c.Op, c.Y), w.compare(s, c.X, tokenop.Negate(c.Op), c.Y)
		}
	}
	return s, s
}

// compare returns s restricted to the states where x op y holds.
func (w *walker) compare(s state, x ast.Expr, op token.Token, y ast.Expr) state {
	if !s.live {
		return s
	}
	xr, yr := w.quiet(s, x), w.quiet(s, y)
	if !possible(xr, op, yr) {
		return dead
	}
	s = w.narrow(s, x, op, yr)
	s = w.narrow(s, y, tokenop.Flip(op), xr)
	s = w.relate(s, x, op, y)
	return w.propagate(s, x)
}

// quiet evaluates e without recording anything.
func (w *walker) quiet(s state, e ast.Expr) Interval {
	rec := w.rec
	w.rec = false
	r := w.eval(s, e)
	w.rec = rec
	return r
}

// possible reports whether x op y can hold for some values of the ranges.
func possible(x Interval, op token.Token, y Interval) bool {
	switch op {
	case token.LSS:
		return x.Lo < y.Hi
	case token.LEQ:
		return x.Lo <= y.Hi
	case token.GTR:
		return x.Hi > y.Lo
	case token.GEQ:
		return x.Hi >= y.Lo
	case token.EQL:
		return !x.Meet(y).IsEmpty()
	case token.NEQ:
		return !(x.Lo == x.Hi && y.Lo == y.Hi && x.Lo == y.Lo)
	}
	return true
}

// narrow restricts the variable behind target to the values for which
// target op b can hold. Targets are a variable, a value-preserving
// conversion of one, or one plus or minus a constant that cannot wrap.
func (w *walker) narrow(s state, target ast.Expr, op token.Token, b Interval) state {
	if !s.live || b.IsEmpty() {
		return s
	}
	switch t := ast.Unparen(target).(type) {
	case *ast.Ident:
		return w.narrowVar(s, w.f.objOf(t), t, op, b)
	case *ast.SelectorExpr:
		if v, ok := w.f.fieldOf(t); ok {
			return w.narrowVar(s, v, t, op, b)
		}
	case *ast.CallExpr:
		if v, ok := w.f.lenOf(t); ok {
			return w.narrowVar(s, v, t, op, b)
		}
		tv, ok := w.f.info.Types[ast.Unparen(t.Fun)]
		if !ok || !tv.IsType() || len(t.Args) != 1 {
			return s
		}
		from, to := w.kind(t.Args[0]), kindOf(tv.Type)
		if !from.ok || from.float || !to.ok {
			return s
		}
		x := w.quiet(s, t.Args[0])
		if convert(x, from, to) != x || (to.float && !within(b, to.mant)) {
			return s
		}
		return w.narrow(s, t.Args[0], op, b)
	case *ast.BinaryExpr:
		if t.Op != token.ADD && t.Op != token.SUB {
			return s
		}
		k := w.kind(t)
		if !k.ok || k.float {
			return s
		}
		if c, ok := w.constOf(t.Y); ok {
			if arith(t.Op, w.quiet(s, t.X), Point(c), k, w.f.opts.NoWrap) == k.top {
				return s // may wrap
			}
			inv := token.SUB
			if t.Op == token.SUB {
				inv = token.ADD
			}
			return w.narrow(s, t.X, op, shiftBy(b, inv, c))
		}
		if c, ok := w.constOf(t.X); ok && t.Op == token.ADD {
			if arith(t.Op, Point(c), w.quiet(s, t.Y), k, w.f.opts.NoWrap) == k.top {
				return s
			}
			return w.narrow(s, t.Y, op, shiftBy(b, token.SUB, c))
		}
	}
	return s
}

// within reports whether b's finite bounds are exact in a float of mant bits.
func within(b Interval, mant uint) bool {
	lim := int64(1) << mant
	ok := func(v int64) bool { return isInf(v) || (-lim <= v && v <= lim) }
	return ok(b.Lo) && ok(b.Hi)
}

func shiftBy(b Interval, op token.Token, c int64) Interval {
	if op == token.SUB {
		return b.Sub(Point(c))
	}
	return b.Add(Point(c))
}

func (w *walker) constOf(e ast.Expr) (int64, bool) {
	tv, ok := w.f.info.Types[e]
	if !ok || tv.Value == nil || tv.Value.Kind() != constant.Int {
		return 0, false
	}
	return constant.Int64Val(tv.Value)
}

// narrowVar restricts variable obj, read at id, to the values for
// which obj op b can hold.
func (w *walker) narrowVar(s state, obj types.Object, id ast.Expr, op token.Token, b Interval) state {
	if obj == nil || !w.f.tracked(obj) || w.f.escapedAt(obj, id) {
		return s
	}
	cur := w.f.get(s, obj, id)
	k := kindOf(obj.Type())
	float := k.float
	// For 64-bit unsigned types +inf covers every value past MaxInt64.
	inf := w.f.opts.NoWrap || k.u64
	var c Interval
	switch op {
	case token.LSS:
		c = Interval{negInf, b.Hi}
		if !float {
			c.Hi = strictBelow(b.Hi, inf)
		}
	case token.LEQ:
		c = Interval{negInf, b.Hi}
	case token.GTR:
		c = Interval{b.Lo, posInf}
		if !float {
			c.Lo = strictAbove(b.Lo, inf)
		}
	case token.GEQ:
		c = Interval{b.Lo, posInf}
	case token.EQL:
		c = b
	case token.NEQ:
		c = Top()
		if b.Lo == b.Hi && !float && !isInf(b.Lo) {
			switch b.Lo {
			case cur.Lo:
				c.Lo = b.Lo + 1
			case cur.Hi:
				c.Hi = b.Hi - 1
			}
		}
	default:
		return s
	}
	return w.f.put(s, obj, cur.Meet(c))
}

// strictBelow is the largest integer below bound v. The extreme
// bounds are exact values unless noWrap reads them as infinities (a
// comparison against −inf was already found impossible).
func strictBelow(v int64, noWrap bool) int64 {
	if v == negInf || (noWrap && v == posInf) {
		return v
	}
	return v - 1
}

// strictAbove is the smallest integer above bound v.
func strictAbove(v int64, noWrap bool) int64 {
	if v == posInf || (noWrap && v == negInf) {
		return v
	}
	return v + 1
}
