package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"math"

	"github.com/overfact/overfact/analyzer/thresholds"
	"github.com/overfact/overfact/fixes"
)

// The gamma-ratio category: ratios and products of math.Gamma values (the
// Beta function, the Student-t constant) that overflow in a Gamma call
// although the result is finite.

// specialConst returns the value of math.Inf(c) and math.NaN() with a
// constant c, which the type checker does not fold: a Gamma argument
// written so is a constant like 1e308.
func (fc *fnCtx) specialConst(e ast.Expr) (float64, bool) {
	call, ok := ast.Unparen(e).(*ast.CallExpr)
	if !ok {
		return 0, false
	}
	switch {
	case fc.c.isMathFunc(call, "NaN") && len(call.Args) == 0:
		return math.NaN(), true
	case fc.c.isMathFunc(call, "Inf") && len(call.Args) == 1:
		if s, ok := fc.intConst(call.Args[0]); ok {
			if s >= 0 {
				return math.Inf(1), true
			}
			return math.Inf(-1), true
		}
	}
	return 0, false
}

// gammaRatioFinite reports whether the true value of the Gamma part of a
// ratio is known to be finite where a Gamma in it first overflows, which
// is what makes its +Inf (or NaN) wrong rather than the right answer:
//
//   - the Beta function Γ(a)Γ(b)/Γ(a+b) of finite arguments (it is at most
//     1 for a, b ≥ 1; DLMF 5.12.1);
//   - constant arguments whose log-gamma values (math.Lgamma) are finite
//     and sum to less than ln of the largest float64;
//   - as many Gamma calls above the line as below, whose arguments move
//     with the same variables at the same rates, so that their offsets
//     differ by a constant Δ: the ratio then grows like x^Δ, which at the
//     overflow point x ≈ 171.6 is finite while |Δ|·ln x is below ln of the
//     largest float64 (Γ(x+Δ)/Γ(x) ~ x^Δ, DLMF 5.11.12).
//
// A NaN or infinite argument, or one that is not an affine form, makes
// the claim unknown: Γ(+Inf)/Γ(3) is +Inf in truth, and Γ(1e308)/Γ(1e307)
// is far past float64.
func (fc *fnCtx) gammaRatioFinite(p *product, m *fixes.Match, first float64) bool {
	var num, den []affine
	for i, side := range [][]factor{p.num, p.den} {
		for _, f := range side {
			if f.math != "Gamma" {
				continue
			}
			a, ok := fc.affineOf(f.arg, 0)
			if !ok || a.v == nil && (math.IsNaN(a.b()) || math.IsInf(a.b(), 0)) {
				return false
			}
			if i == 0 {
				num = append(num, a)
			} else {
				den = append(den, a)
			}
		}
	}
	if m.Shape == fixes.ShapeBeta {
		return true
	}
	constant := true
	for _, a := range append(append([]affine{}, num...), den...) {
		constant = constant && a.v == nil
	}
	maxLog := math.Log(math.MaxFloat64)
	if constant {
		sum := 0.0
		for i, side := range [][]affine{num, den} {
			for _, a := range side {
				lg, _ := math.Lgamma(a.b())
				if math.IsInf(lg, 0) || math.IsNaN(lg) {
					return false
				}
				if i == 0 {
					sum += lg
				} else {
					sum -= lg
				}
			}
		}
		return math.Abs(sum) < maxLog
	}
	if len(num) != len(den) {
		return false
	}
	// Per variable, the total rate above and below the line must match;
	// the offsets then differ by the constant delta.
	rate := make(map[any]float64)
	delta := 0.0
	for i, side := range [][]affine{num, den} {
		sign := 1.0
		if i == 1 {
			sign = -1
		}
		for _, a := range side {
			delta += sign * a.b()
			if a.v != nil {
				var key any = src(a.v)
				if obj := fc.c.objOf(a.v); obj != nil {
					key = obj
				}
				rate[key] += sign * a.a()
			}
		}
	}
	for _, r := range rate {
		if r != 0 {
			return false
		}
	}
	return math.Abs(delta)*math.Log(first) < maxLog
}

// checkGammaRatio judges ratios of math.Gamma calls, such as the Beta
// function B(a,b) = Γ(a)Γ(b)/Γ(a+b) (DLMF 5.12.1) and the Student-t
// constant Γ((ν+1)/2)/(√(νπ)Γ(ν/2)) (common practice; DLMF section
// from memory): the ratio is
// finite where a Gamma in it is already +Inf.
func (fc *fnCtx) checkGammaRatio(root ast.Expr, p *product) {
	var worst *gammaBound
	var worstCall *ast.CallExpr
	for _, f := range p.num {
		if f.math != "Gamma" {
			continue
		}
		g, ok := fc.gammaBoundOf(f.arg)
		if !ok {
			g = gammaBound{first: thresholds.GammaFirstBad(floatNum(fc.c.pass.TypesSizes)), hi: math.Inf(1), reachable: true}
		}
		if g.reachable && (worst == nil || g.certain) {
			worst, worstCall = &g, f.call
		}
	}
	if worst == nil {
		return
	}
	what := "ratio of math.Gamma values"
	m := fc.gammaMatch(root, p)
	if m.Shape == fixes.ShapeBeta {
		what = "Beta function as Γ(a)Γ(b)/Γ(a+b)"
	}
	if m.Shape == fixes.ShapeNone {
		// Γ(a)/Γ(b)·x^k: the ratio may be grouped apart from the other
		// factors, as the AST of a left-to-right product often does.
		if sub, sp := fc.exactPart(root, gammaOnly(p)); sub != nil {
			if sm := fc.gammaMatch(sub, sp); sm.Shape != fixes.ShapeNone {
				m = sm
			}
		}
	}
	if m.Shape == fixes.ShapeNone {
		m = fc.gammaRatioAmong(root, p)
	}
	if m.Shape == fixes.ShapeNone {
		if pm := fc.productChain(worstCall); pm != nil {
			m = pm
		}
	}
	although := ""
	if fc.gammaRatioFinite(p, m, worst.first) {
		although = ", although the result itself is finite"
	}
	msg := fmt.Sprintf("%s in float64: %s%s%s", what, worst.describe("math.Gamma("+src(worstCall.Args[0])+")"), although, worst.clause())
	if n := gammaCount(p.num); n >= 2 && !worst.certain {
		// Γ(a)·Γ(b) passes the largest float64 once ln Γ(a) + ln Γ(b)
		// does, which can be well before either argument reaches the
		// single-Γ limit (a = b = 100 already does): the limit above
		// is where the first Γ alone breaks, not the first bad input.
		msg += fmt.Sprintf("; the product of the %d Γ values above the line can overflow first, before any one of them is +Inf", n)
	}
	at := fc.valueHolding(root, worstCall)
	fc.c.gammaLines().note(fc.c.lineOf(root))
	fc.c.gammaLines().note(fc.c.lineOf(at))
	fc.report(finding{node: at, cat: catGammaRatio, definite: worst.certain, msg: msg, match: p.fix(m)})
}

// gammaCount counts the math.Gamma factors among fs.
func gammaCount(fs []factor) int {
	n := 0
	for _, f := range fs {
		if f.math == "Gamma" {
			n++
		}
	}
	return n
}

// gammaMatch describes a product of Gamma calls that is exactly one of
// the shapes the fixes package rewrites, with root as its node; its Shape
// is ShapeNone otherwise.
func (fc *fnCtx) gammaMatch(root ast.Expr, p *product) *fixes.Match {
	m := &fixes.Match{Node: root, Result: fc.c.pass.TypesInfo.TypeOf(root)}
	if a, b, ok := fc.betaArgs(p.num, p.den, p.other); ok {
		m.Shape, m.Args = fixes.ShapeBeta, []ast.Expr{a, b}
	} else if a, b, ok := fc.betaArgs(p.den, p.num, p.other); ok {
		m.Shape, m.Args = fixes.ShapeInverseBeta, []ast.Expr{a, b}
	} else if len(p.num) == 1 && len(p.den) == 1 && p.num[0].math == "Gamma" && p.den[0].math == "Gamma" && p.other == 0 {
		m.Shape, m.Args = fixes.ShapeGammaRatio, []ast.Expr{p.num[0].arg, p.den[0].arg}
	}
	return m
}

// gammaRatioAmong describes Γ(a)/Γ(b) among other factors that are
// neither Gamma values nor factorials, Γ((ν+1)/2)/(√(νπ)·Γ(ν/2)): the
// fixer replaces the two calls by one GammaRatio and keeps the others
// where they are. Its Shape is ShapeNone for any other product.
func (fc *fnCtx) gammaRatioAmong(root ast.Expr, p *product) *fixes.Match {
	m := &fixes.Match{Node: root, Result: fc.c.pass.TypesInfo.TypeOf(root)}
	var num, den *factor
	for i, side := range [][]factor{p.num, p.den} {
		for j := range side {
			f := &side[j]
			switch {
			case f.kind != kindNone:
				return m
			case f.math != "Gamma":
			case i == 0 && num == nil:
				num = f
			case i == 1 && den == nil:
				den = f
			default:
				return m
			}
		}
	}
	if num == nil || den == nil {
		return m
	}
	m.Shape = fixes.ShapeGammaRatioAmong
	m.Args = []ast.Expr{num.arg, den.arg}
	m.Extra = []ast.Expr{num.call, den.call}
	return m
}

// gammaOnly returns the Gamma factors of p, with the others counted as
// unknown, for exactPart to find the sub-expression that holds just them.
func gammaOnly(p *product) *product {
	q := &product{other: p.other}
	for _, f := range p.num {
		if f.math == "Gamma" {
			q.num = append(q.num, f)
		} else {
			q.other++
		}
	}
	for _, f := range p.den {
		if f.math == "Gamma" {
			q.den = append(q.den, f)
		} else {
			q.other++
		}
	}
	return q
}

// betaArgs matches Γ(a)Γ(b)/Γ(a+b) with two, the Γ(a)Γ(b), and one, the
// Γ(a+b); swapped, it matches the inverse 1/B(a,b) = Γ(a+b)/(Γ(a)Γ(b)).
func (fc *fnCtx) betaArgs(two, one []factor, other int) (a, b ast.Expr, ok bool) {
	if len(two) != 2 || len(one) != 1 || other != 0 {
		return nil, nil, false
	}
	for _, f := range append(append([]factor{}, two...), one...) {
		if f.math != "Gamma" {
			return nil, nil, false
		}
	}
	la, ok1 := fc.affineOf(two[0].arg, 0)
	lb, ok2 := fc.affineOf(two[1].arg, 0)
	ls, ok3 := fc.affineOf(one[0].arg, 0)
	if ok1 && ok2 && ok3 && (la.v == nil || lb.v == nil || sameVar(fc, la.v, lb.v)) {
		if la.a()+lb.a() == ls.a() && la.b()+lb.b() == ls.b() {
			return two[0].arg, two[1].arg, true
		}
	}
	// Γ(a)Γ(b)/Γ(a+b) with a, b separate variables: compare the syntax.
	if s, ok := ast.Unparen(one[0].arg).(*ast.BinaryExpr); ok && s.Op == token.ADD {
		if src(s.X) == src(two[0].arg) && src(s.Y) == src(two[1].arg) || src(s.Y) == src(two[0].arg) && src(s.X) == src(two[1].arg) {
			return two[0].arg, two[1].arg, true
		}
	}
	return nil, nil, false
}

func sameVar(fc *fnCtx, x, y ast.Expr) bool {
	return x != nil && y != nil && fc.c.objOf(x) == fc.c.objOf(y)
}
