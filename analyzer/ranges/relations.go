package ranges

import (
	"go/ast"
	"go/token"
	"go/types"
)

// A few difference facts x − y ≤ c ride along with the intervals. They
// come only from guards comparing two integer variables (each possibly
// plus a constant), so they are not closed transitively like a
// difference-bound matrix (Miné, "A new numerical abstract domain based
// on difference-bound matrices", PADO 2001); they serve the binomial
// shapes: after "if k > n { return }" and "if n > 20 { return }", k ≤
// 20 and n−k ≥ 0. The differences are of the mathematical values.

// rel is the fact x − y ≤ c between two variable ids.
type rel struct {
	x, y int32
	c    int64
}

// maxRels caps the facts one state carries.
const maxRels = 16

func findRel(rs []rel, x, y int32) int {
	for i, r := range rs {
		if r.x == x && r.y == y {
			return i
		}
	}
	return -1
}

// joinRels keeps the facts both sides have, with the looser constant.
func joinRels(a, b []rel) []rel {
	if len(a) == 0 || len(b) == 0 {
		return nil
	}
	var out []rel
	for _, r := range a {
		if i := findRel(b, r.x, r.y); i >= 0 {
			out = append(out, rel{r.x, r.y, max(r.c, b[i].c)})
		}
	}
	return out
}

// widenRels drops the facts whose constant grew.
func widenRels(old, next []rel) []rel {
	var out []rel
	for _, r := range old {
		if i := findRel(next, r.x, r.y); i >= 0 && next[i].c <= r.c {
			out = append(out, r)
		}
	}
	return out
}

func equalRels(a, b []rel) bool {
	if len(a) != len(b) {
		return false
	}
	for _, r := range a {
		if i := findRel(b, r.x, r.y); i < 0 || b[i].c != r.c {
			return false
		}
	}
	return true
}

// addRel returns rs with x − y ≤ c added; rs is never changed in place.
func addRel(rs []rel, x, y int32, c int64) []rel {
	if i := findRel(rs, x, y); i >= 0 {
		if rs[i].c <= c {
			return rs
		}
		out := append([]rel(nil), rs...)
		out[i].c = c
		return out
	}
	if len(rs) >= maxRels {
		return rs
	}
	return append(append(make([]rel, 0, len(rs)+1), rs...), rel{x, y, c})
}

// killRels drops the facts about id, which is being assigned.
func killRels(rs []rel, id int32) []rel {
	keep := true
	for _, r := range rs {
		if r.x == id || r.y == id {
			keep = false
			break
		}
	}
	if keep {
		return rs
	}
	var out []rel
	for _, r := range rs {
		if r.x != id && r.y != id {
			out = append(out, r)
		}
	}
	return out
}

// term reads e as a tracked integer variable plus a constant.
func (w *walker) term(e ast.Expr, at ast.Node) (obj types.Object, off int64, ok bool) {
	switch t := ast.Unparen(e).(type) {
	case *ast.Ident:
		obj = w.f.objOf(t)
		if obj == nil || !w.f.tracked(obj) || w.f.escapedAt(obj, at) {
			return nil, 0, false
		}
		if k := kindOf(obj.Type()); k.float || k.u64 {
			return nil, 0, false
		}
		return obj, 0, true
	case *ast.BinaryExpr:
		if t.Op != token.ADD && t.Op != token.SUB {
			return nil, 0, false
		}
		c, cok := w.constOf(t.Y)
		if !cok || c == negInf {
			return nil, 0, false
		}
		obj, off, ok = w.term(t.X, at)
		if !ok {
			return nil, 0, false
		}
		if t.Op == token.SUB {
			c = -c
		}
		sum, fits := addB(off, c, false, 0)
		return obj, sum, fits
	}
	return nil, 0, false
}

// relate records the difference fact implied by x op y holding, for
// x and y variables plus constants. Offsets are exact: x+a op y+b is a
// statement about the wrapped sums, so it is used only when neither sum
// can wrap.
func (w *walker) relate(s state, x ast.Expr, op token.Token, y ast.Expr) state {
	if !s.live {
		return s
	}
	xo, a, ok1 := w.term(x, x)
	yo, b, ok2 := w.term(y, y)
	if !ok1 || !ok2 || xo == yo {
		return s
	}
	if (a != 0 && w.quiet(s, x) == kindOf(xo.Type()).top) || (b != 0 && w.quiet(s, y) == kindOf(yo.Type()).top) {
		return s // the sum may have wrapped
	}
	d, fits := subB(b, a, false, 0) // x − y op b − a
	if !fits {
		return s
	}
	xi, yi := w.f.id(xo), w.f.id(yo)
	switch op {
	case token.LSS:
		s.rels = addRel(s.rels, xi, yi, d-1)
	case token.LEQ:
		s.rels = addRel(s.rels, xi, yi, d)
	case token.GTR:
		s.rels = addRel(s.rels, yi, xi, -d-1)
	case token.GEQ:
		s.rels = addRel(s.rels, yi, xi, -d)
	case token.EQL:
		s.rels = addRel(addRel(s.rels, xi, yi, d), yi, xi, -d)
	}
	return s
}

// propagate narrows intervals through the difference facts, once:
// x ≤ hi(y) + c and y ≥ lo(x) − c. Facts about a variable that may
// have changed out of sight by at are skipped.
func (w *walker) propagate(s state, at ast.Node) state {
	for _, r := range s.rels {
		if !s.live {
			return s
		}
		xo, yo := w.f.objs[r.x], w.f.objs[r.y]
		if w.f.escapedAt(xo, at) || w.f.escapedAt(yo, at) {
			continue
		}
		xr, yr := w.f.fact(s, r.x), w.f.fact(s, r.y)
		if yr.Hi != posInf {
			if hi, ok := addB(yr.Hi, r.c, false, 0); ok && hi < xr.Hi {
				s = w.f.put(s, xo, xr.Meet(Interval{negInf, hi}))
			}
		}
		if xr.Lo != negInf && s.live {
			if lo, ok := subB(xr.Lo, r.c, false, 0); ok && lo > yr.Lo {
				s = w.f.put(s, yo, yr.Meet(Interval{lo, posInf}))
			}
		}
	}
	return s
}

// difference bounds x − y by the facts, for x − y in Go: when the
// mathematical difference provably fits the type, no wrap occurs and
// the bound holds for the computed value too.
func (w *walker) difference(s state, e *ast.BinaryExpr, xr, yr Interval, k numKind) (Interval, bool) {
	if len(s.rels) == 0 || k.float || k.u64 || !k.ok {
		return Interval{}, false
	}
	xo, a, ok1 := w.term(e.X, e)
	yo, b, ok2 := w.term(e.Y, e)
	if !ok1 || !ok2 || a != 0 || b != 0 || xo == yo {
		return Interval{}, false
	}
	xi, yi := w.f.id(xo), w.f.id(yo)
	r := Interval{negInf, posInf}
	if xr.Bounded() && yr.Bounded() {
		lo, ok1 := subB(xr.Lo, yr.Hi, false, 0)
		hi, ok2 := subB(xr.Hi, yr.Lo, false, 0)
		if ok1 && ok2 {
			r = Interval{lo, hi}
		}
	} else if xr.Hi != posInf && yr.Lo != negInf {
		if hi, ok := subB(xr.Hi, yr.Lo, false, 0); ok {
			r.Hi = hi
		}
	}
	if i := findRel(s.rels, xi, yi); i >= 0 {
		r.Hi = min(r.Hi, s.rels[i].c)
	}
	if i := findRel(s.rels, yi, xi); i >= 0 && s.rels[i].c != negInf {
		r.Lo = max(r.Lo, -s.rels[i].c)
	}
	if isInf(r.Lo) || isInf(r.Hi) || r.Lo < k.safe.Lo || r.Hi > k.safe.Hi {
		return Interval{}, false
	}
	return r, true
}
