package ranges

import (
	"go/ast"
	"go/token"
	"go/types"
)

// eval returns the range of e in state s, recording it (and the ranges
// of its operands) on a recording pass. Non-numeric expressions are Top
// but their operands are still evaluated.
func (w *walker) eval(s state, e ast.Expr) Interval {
	if e == nil || !s.live {
		return Top()
	}
	tv, typed := w.f.info.Types[e]
	if typed && tv.IsType() {
		return Top()
	}
	w.depth++
	defer func() { w.depth-- }()
	if w.depth > maxDepth {
		return Top()
	}
	var r Interval
	if typed && tv.Value != nil {
		r = constRange(tv.Value)
	} else {
		r = w.evalNode(s, e)
	}
	k := notNumber
	if typed {
		k = kindOf(tv.Type)
	}
	if !k.ok {
		return Top()
	}
	r = r.Meet(k.top)
	if w.rec {
		if old, ok := w.f.exprs[e]; ok {
			r = r.Join(old)
		}
		w.f.exprs[e] = r
	}
	return r
}

func (w *walker) evalNode(s state, e ast.Expr) Interval {
	switch e := e.(type) {
	case *ast.Ident:
		return w.f.get(s, w.f.objOf(e), e)
	case *ast.ParenExpr:
		return w.eval(s, e.X)
	case *ast.UnaryExpr:
		return w.unary(s, e)
	case *ast.BinaryExpr:
		return w.binary(s, e)
	case *ast.CallExpr:
		return w.call(s, e)
	case *ast.FuncLit:
		w.funcLit(e)
		return Top()
	case *ast.SelectorExpr:
		if v, ok := w.f.fieldOf(e); ok {
			return w.f.get(s, v, e)
		}
	}
	w.children(s, e)
	return Top()
}

// children evaluates the direct sub-expressions of e.
func (w *walker) children(s state, e ast.Expr) {
	ast.Inspect(e, func(n ast.Node) bool {
		if n == e {
			return true
		}
		if x, ok := n.(ast.Expr); ok {
			if sel, ok := e.(*ast.SelectorExpr); ok && x == sel.Sel {
				return false
			}
			w.eval(s, x)
		}
		return false
	})
}

func (w *walker) kind(e ast.Expr) numKind {
	if tv, ok := w.f.info.Types[e]; ok {
		return kindOf(tv.Type)
	}
	return notNumber
}

func (w *walker) unary(s state, e *ast.UnaryExpr) Interval {
	if e.Op == token.AND {
		if _, ok := ast.Unparen(e.X).(*ast.Ident); ok {
			return Top() // the escape scan handles &x
		}
	}
	x := w.eval(s, e.X)
	k := w.kind(e)
	switch e.Op {
	case token.ADD:
		return x
	case token.SUB:
		return arith(token.SUB, Point(0), x, k, w.f.opts.NoWrap)
	case token.XOR:
		switch {
		case k.float || !k.ok:
			return Top()
		case k.safe.Lo < 0: // ^x = −1 − x in two's complement
			return arith(token.SUB, Point(-1), x, k, w.f.opts.NoWrap)
		case !k.u64: // ^x = max − x for unsigned
			return arith(token.SUB, Point(k.safe.Hi), x, k, w.f.opts.NoWrap)
		}
	}
	return Top()
}

func (w *walker) binary(s state, e *ast.BinaryExpr) Interval {
	switch e.Op {
	case token.LAND, token.LOR:
		// The right operand runs only when the left one lets it.
		w.eval(s, e.X)
		t, f := w.refine2(s, e.X)
		if e.Op == token.LAND {
			w.eval(t, e.Y)
		} else {
			w.eval(f, e.Y)
		}
		return Top()
	}
	x := w.eval(s, e.X)
	y := w.eval(s, e.Y)
	switch e.Op {
	case token.EQL, token.NEQ, token.LSS, token.LEQ, token.GTR, token.GEQ:
		return Top()
	}
	k := w.kind(e)
	r := arith(e.Op, x, y, k, w.f.opts.NoWrap)
	if e.Op == token.SUB {
		if d, ok := w.difference(s, e, x, y, k); ok {
			// Both are sound; an empty meet can only come from
			// unreachable code, where d is as good as anything.
			if r = r.Meet(d); r.IsEmpty() {
				r = d
			}
		}
	}
	return r
}

func (w *walker) call(s state, e *ast.CallExpr) Interval {
	if w.rec {
		w.f.snaps[e] = s.facts
	}
	fun := ast.Unparen(e.Fun)
	if tv, ok := w.f.info.Types[fun]; ok && tv.IsType() {
		if len(e.Args) != 1 {
			return Top()
		}
		x := w.eval(s, e.Args[0])
		return convert(x, w.kind(e.Args[0]), kindOf(tv.Type))
	}
	if id, ok := fun.(*ast.Ident); ok {
		if b, ok := w.f.info.Uses[id].(*types.Builtin); ok {
			return w.builtin(s, b.Name(), e)
		}
	}
	w.eval(s, e.Fun)
	for _, a := range e.Args {
		w.eval(s, a)
	}
	return Top()
}

func (w *walker) builtin(s state, name string, e *ast.CallExpr) Interval {
	args := make([]Interval, len(e.Args))
	for i, a := range e.Args {
		args[i] = w.eval(s, a)
	}
	switch name {
	case "len", "cap":
		if len(e.Args) == 1 {
			if n, ok := w.arrayLen(e.Args[0]); ok {
				return Point(n)
			}
		}
		if v, ok := w.f.lenOf(e); ok && name == "len" {
			return w.f.get(s, v, e).Meet(Interval{0, posInf})
		}
		return Interval{0, posInf}
	case "copy":
		return Interval{0, posInf}
	case "min", "max":
		if len(args) == 0 || !w.kind(e).ok {
			return Top()
		}
		r := args[0]
		for _, a := range args[1:] {
			if name == "min" {
				r = r.Min(a)
			} else {
				r = r.Max(a)
			}
		}
		return r
	}
	return Top()
}

// arrayLen returns the length of an array or pointer-to-array operand.
func (w *walker) arrayLen(e ast.Expr) (int64, bool) {
	tv, ok := w.f.info.Types[e]
	if !ok || tv.Type == nil {
		return 0, false
	}
	t := tv.Type.Underlying()
	if p, ok := t.(*types.Pointer); ok {
		t = p.Elem().Underlying()
	}
	if a, ok := t.(*types.Array); ok {
		return a.Len(), true
	}
	return 0, false
}

// funcLit analyses a closure body on its own, once, on a recording
// pass: it may run at any time, so it starts knowing nothing about the
// variables it captures.
func (w *walker) funcLit(lit *ast.FuncLit) {
	if !w.rec || w.f.lits[lit] || lit.Body == nil {
		return
	}
	w.f.lits[lit] = true
	sub := &walker{f: w.f, rec: true, depth: w.depth}
	s := w.f.zeroResults(state{live: true}, lit.Type)
	sub.stmt(s, lit.Body)
}
