package analyzer

import (
	"fmt"
	"go/ast"
	"go/types"
	"math"
	"runtime"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/analyzer/thresholds"
	vm "github.com/overfact/overfact/analyzer/valuemodel"
)

// checkLgammaOverflow reports math.Exp of a sum of log-gamma values,
// all added, that is +Inf for arguments the code allows while the value
// meets arithmetic: math.Exp(lgamma(n+1)) is n! rebuilt from its
// logarithm and +Inf from n = 171, where n!/x^n or C(n, k) formed from it
// is finite. It is the log-space twin of gamma-overflow and keeps its
// rules: silent where ranges keep the argument below the first bad value,
// and silent where the +Inf is only returned, stored, compared or
// passed on (gammaEscapes), where it is the honest float result.
func (fc *fnCtx) checkLgammaOverflow(res *vm.Result, exps []*lgExp, done map[ast.Node]bool) {
	for _, x := range exps {
		if x.rest {
			continue
		}
		sym, ok := oneSym(res, x.terms)
		if !ok || sym.Field != nil {
			continue
		}
		if !fc.gammaEscapes(x.call) {
			continue
		}
		sp, ok := fc.spanOf(res, sym, x.call)
		if !ok {
			continue
		}
		env := map[types.Object]float64{}
		eval := func(v float64) float64 {
			env[sym.Obj] = v
			r, ok := fc.floatEval(x.call, env, 0)
			if !ok {
				return math.NaN()
			}
			return r
		}
		var firstText string
		var definite bool
		var clause string
		if sp.isInt {
			from, to := max(int64(sp.lo), firstPositive(res, x.terms, sym)), int64(math.MaxInt32)
			if !math.IsInf(sp.hi, 1) {
				to = int64(sp.hi)
			}
			first, ok := thresholds.ExpLgammaFirstBad(func(v int64) float64 { return eval(float64(v)) }, from, to)
			if !ok {
				continue
			}
			iv := ranges.Interval{Lo: math.MinInt64, Hi: math.MaxInt64}
			if sp.loKnown {
				iv.Lo = from
			}
			if !math.IsInf(sp.hi, 1) {
				iv.Hi = to
			}
			clause, definite = verdict(sp.name, iv, first)
			firstText = fmt.Sprintf("%d", first)
		} else {
			to := sp.hi
			if math.IsInf(to, 1) {
				to = math.MaxFloat64 / 2
			}
			first, ok := thresholds.ExpLgammaFirstBadFloat(eval, math.Max(sp.lo, 1), to)
			if !ok {
				continue
			}
			definite = sp.loKnown && first == sp.lo
			clause = fmt.Sprintf("; %s is not bounded here", sp.name)
			if !math.IsInf(sp.hi, 1) {
				clause = fmt.Sprintf("; %s may reach %.10g here", sp.name, sp.hi)
			}
			if definite {
				clause = fmt.Sprintf("; %s is at least %.10g here", sp.name, sp.lo)
			}
			firstText = fmt.Sprintf("%.10g", first)
		}
		root := fc.productRoot(x.call)
		node := ast.Node(x.call)
		m := fc.lgammaMatch(res, root)
		if m != nil {
			node = root
		}
		msg := fmt.Sprintf("%s is +Inf for %s ≥ %s: its exponent passes %.10g, past which math.Exp returns +Inf on %s (ln of the largest float64 is %.10g), although the expression it feeds can be finite; combine the log-gamma terms before math.Exp%s",
			src(x.call), sp.name, firstText, thresholds.ExpMaxArg(), runtime.GOARCH, math.Log(math.MaxFloat64), clause)
		done[root], done[x.call] = true, true
		fc.report(finding{node: node, cat: catLgammaOverflow, definite: definite, msg: msg, match: m})
	}
}

// oneSym returns the one variable the log-gamma arguments move with.
func oneSym(res *vm.Result, terms []lgTerm) (vm.Sym, bool) {
	var sym vm.Sym
	found := false
	for _, t := range terms {
		if t.p <= 0 {
			return sym, false
		}
		a, ok := affineArg(res, t.arg)
		if !ok {
			return sym, false
		}
		for _, l := range a.Terms {
			if found && l.Sym != sym {
				return sym, false
			}
			sym, found = l.Sym, true
		}
	}
	return sym, found
}

// firstPositive returns the smallest integer value of sym at which
// every log-gamma argument is at least 1, past the pole of Γ at 0 and
// where ln Γ grows with its argument.
func firstPositive(res *vm.Result, terms []lgTerm, sym vm.Sym) int64 {
	from := int64(math.MinInt32)
	for _, t := range terms {
		a, _ := affineArg(res, t.arg)
		k := floatOf(a.Coef(sym))
		if k > 0 {
			from = max(from, int64(math.Ceil((1-floatOf(a.C))/k)))
		}
	}
	return from
}
