package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"math"

	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/internal/linform"
)

// Bounds of Gamma arguments, shared by the two Gamma categories: the
// affine form of an argument and the range it gives.

// affine is x = a·v + b with v a single variable (an integer converted to
// float, or a float), as Gamma arguments are written: float64(n)+1,
// (nu+1)/2. The form is internal/linform's in IEEE float64 arithmetic,
// as the code computes it (NaN and ±Inf included); v is the variable as
// written, for its range and for messages.
type affine struct {
	form  floatForm // at most one term, the variable of v
	v     ast.Expr  // nil for a constant
	isInt bool      // v is an integer variable
}

type floatForm = linform.Form[linform.Obj, float64, linform.Float64]

// a returns the coefficient of the variable (0 for a constant).
func (x affine) a() float64 {
	if len(x.form.Terms) == 0 {
		return 0
	}
	return x.form.Terms[0].K
}

// b returns the constant.
func (x affine) b() float64 { return x.form.C }

func constAffine(b float64) affine { return affine{form: floatForm{C: b}} }

// affineOf returns the affine form of a float expression.
func (fc *fnCtx) affineOf(e ast.Expr, depth int) (affine, bool) {
	if depth > maxDepth {
		return affine{}, false
	}
	e = ast.Unparen(e)
	if v, ok := fc.floatConst(e); ok {
		return constAffine(v), true
	}
	if v, ok := fc.specialConst(e); ok {
		return constAffine(v), true
	}
	switch x := e.(type) {
	case *ast.CallExpr:
		if len(x.Args) == 1 && fc.isConversion(x) {
			return fc.affineOf(x.Args[0], depth+1)
		}
	case *ast.Ident:
		obj := fc.c.objOf(x)
		if obj == nil {
			return affine{}, false
		}
		if def := fc.singleDef(x); def != nil {
			if a, ok := fc.affineOf(def, depth+1); ok {
				return a, true
			}
		}
		t, ok := fc.c.numOf(fc.c.pass.TypesInfo.TypeOf(x))
		one := linform.Single[linform.Obj, float64, linform.Float64](linform.Obj{Object: obj})
		return affine{form: one, v: x, isInt: ok && !t.Float}, ok
	case *ast.BinaryExpr:
		l, ok1 := fc.affineOf(x.X, depth+1)
		r, ok2 := fc.affineOf(x.Y, depth+1)
		if !ok1 || !ok2 || (l.v != nil && r.v != nil) {
			// Two variables: only n+n style sums of the same one would
			// do, and those are rare enough to leave.
			return affine{}, false
		}
		out := affine{v: l.v, isInt: l.isInt}
		if out.v == nil {
			out.v, out.isInt = r.v, r.isInt
		}
		switch x.Op {
		case token.ADD:
			out.form = l.form.Add(r.form)
			return out, true
		case token.SUB:
			out.form = l.form.Sub(r.form)
			return out, true
		case token.MUL:
			if l.v == nil {
				out.form = r.form.Scale(l.b())
			} else {
				out.form = l.form.Scale(r.b())
			}
			return out, true
		case token.QUO:
			if r.v == nil && r.b() != 0 {
				// Divided, not scaled by 1/d: x/3 and x·(1/3) round
				// differently, and the code divides.
				out.form = floatForm{C: l.b() / r.b()}
				for _, t := range l.form.Terms {
					out.form.Terms = append(out.form.Terms, linform.Term[linform.Obj, float64]{Sym: t.Sym, K: t.K / r.b()})
				}
				return out, true
			}
		}
	}
	return affine{}, false
}

// gammaBound says where math.Gamma(arg) first returns +Inf: at the
// variable's value firstV (an integer when the variable is one). The
// range of the argument follows from the variable's range.
type gammaBound struct {
	aff       affine
	first     float64 // first bad argument
	firstV    float64 // first bad value of the variable
	lo, hi    float64 // range of the argument
	certain   bool    // lo ≥ first
	reachable bool    // hi ≥ first
}

func (fc *fnCtx) gammaBoundOf(arg ast.Expr) (gammaBound, bool) {
	aff, ok := fc.affineOf(arg, 0)
	if !ok {
		return gammaBound{}, false
	}
	g := gammaBound{aff: aff, first: thresholds.GammaFirstBad(floatNum(fc.c.pass.TypesSizes))}
	vlo, vhi := math.Inf(-1), math.Inf(1)
	if aff.v != nil && aff.isInt {
		r := fc.rangeOf(aff.v)
		if r.IsEmpty() {
			return g, false
		}
		// An end at or near a type limit (k < n gives k ≤ MaxInt64−1 for
		// an unbounded n) bounds nothing in practice.
		if !typeLimit(-r.Lo) && r.Lo != math.MinInt64 {
			vlo = float64(r.Lo)
		}
		if !typeLimit(r.Hi) {
			vhi = float64(r.Hi)
		}
	}
	if id, ok := aff.v.(*ast.Ident); ok && !aff.isInt {
		vlo, vhi = fc.floatBounds(id)
	}
	if aff.v == nil {
		vlo, vhi = 0, 0
	}
	g.lo, g.hi = aff.a()*vlo+aff.b(), aff.a()*vhi+aff.b()
	if aff.a() < 0 {
		g.lo, g.hi = g.hi, g.lo
	}
	if aff.v == nil {
		g.lo, g.hi = aff.b(), aff.b()
	}
	g.certain = g.lo >= g.first
	g.reachable = g.hi >= g.first
	if aff.a() > 0 {
		g.firstV = (g.first - aff.b()) / aff.a()
		if aff.isInt {
			g.firstV = math.Ceil(g.firstV)
		}
	}
	return g, true
}

func floatNum(sizes types.Sizes) thresholds.Num {
	n, _ := thresholds.Lookup(types.Typ[types.Float64], sizes)
	return n
}

// describe renders where the Gamma call breaks, in terms of its variable.
func (g gammaBound) describe(call string) string {
	if g.aff.v == nil || g.aff.a() <= 0 {
		return fmt.Sprintf("%s is +Inf for arguments ≥ %.10g", call, g.first)
	}
	return fmt.Sprintf("%s is +Inf for %s ≥ %.10g (Γ(x) overflows float64 from x = %.10g)", call, src(g.aff.v), g.firstV, g.first)
}

func (g gammaBound) clause() string {
	switch {
	case g.certain:
		return "; the argument is always past it here"
	case g.aff.v == nil:
		return ""
	case math.IsInf(g.hi, 1):
		return fmt.Sprintf("; %s is not bounded here", src(g.aff.v))
	}
	return fmt.Sprintf("; the argument may reach %.10g here", g.hi)
}
