package analyzer

import (
	"go/ast"
	"math"

	"github.com/overfact/overfact/fixes"
)

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
			if !ok || a.v == nil && (math.IsNaN(a.b) || math.IsInf(a.b, 0)) {
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
				lg, _ := math.Lgamma(a.b)
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
			delta += sign * a.b
			if a.v != nil {
				var key any = src(a.v)
				if obj := fc.c.objOf(a.v); obj != nil {
					key = obj
				}
				rate[key] += sign * a.a
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
