package analyzer

import (
	"fmt"
	"go/ast"
	"math"
	"strings"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/analyzer/thresholds"
	vm "github.com/overfact/overfact/analyzer/valuemodel"
)

// lgammaTolerance is the relative error above which an exponential of
// log-gamma values is reported (flag -lgamma-tolerance).
var lgammaTolerance = 1e-12

func init() {
	Analyzer.Flags.Float64Var(&lgammaTolerance, "lgamma-tolerance", lgammaTolerance,
		"relative error above which math.Exp of log-gamma sums and differences is reported (category lgamma-digits)")
}

// lgGroup is a product or quotient of exponentials of log-gamma values
// (one exponential alone is a group of one).
type lgGroup struct {
	root ast.Expr
	exps []*lgExp
}

// checkLgammaDigits reports exponentials of log-gamma sums, alone or
// multiplied together, whose relative error bound (thresholds,
// ExpLogGammaError) exceeds the tolerance somewhere in the range of
// their arguments: C(n, k) as exp(lgamma(n+1) − lgamma(k+1) −
// lgamma(n−k+1)) keeps about 53 − log2(2·ln n!) bits.
func (fc *fnCtx) checkLgammaDigits(res *vm.Result, exps []*lgExp, done map[ast.Node]bool) {
	var groups []*lgGroup
	byRoot := make(map[ast.Expr]*lgGroup)
	for _, x := range exps {
		root := fc.productRoot(x.call)
		g := byRoot[root]
		if g == nil {
			g = &lgGroup{root: root}
			byRoot[root] = g
			groups = append(groups, g)
		}
		g.exps = append(g.exps, x)
	}
	for _, g := range groups {
		if done[g.root] {
			continue
		}
		fc.lgammaDigitsOf(res, g)
	}
}

// lgForm is one p·ln Γ(aff) of an exponent, its argument an affine
// form of the function's variables.
type lgForm struct {
	p   float64
	aff vm.Affine
}

// lgForms returns the terms of x with their arguments as affine forms: a
// log-gamma call of this function is one term, a call of a function
// that returns a log-gamma sum is that sum's terms in the caller's
// variables (Result.Logs), and rest reports that such a sum also holds
// something other than log-gamma values (a ln x).
func lgForms(res *vm.Result, x *lgExp) (forms []lgForm, rest, ok bool) {
	for _, t := range x.terms {
		if t.call == nil {
			a, ok := affineArg(res, t.arg)
			if !ok {
				return nil, false, false
			}
			forms = append(forms, lgForm{t.p, a})
			continue
		}
		lt := res.Logs[t.call]
		if lt == nil || len(lt.Gamma) == 0 {
			return nil, false, false
		}
		for _, g := range lt.Gamma {
			forms = append(forms, lgForm{t.p * float64(g.Pow), g.Arg})
		}
		rest = rest || len(lt.Pows) > 0 || !lt.Exp.IsConst()
	}
	return forms, rest, true
}

func (fc *fnCtx) lgammaDigitsOf(res *vm.Result, g *lgGroup) {
	// The variables, in order of first appearance, and each term's
	// argument as an affine form over them.
	var spans []symSpan
	index := make(map[vm.Sym]int)
	var forms [][]lgForm
	count, rest := 0, false
	for _, x := range g.exps {
		ft, r, ok := lgForms(res, x)
		if !ok {
			return
		}
		rest = rest || r || x.rest
		for _, f := range ft {
			for _, l := range f.aff.Terms {
				if _, seen := index[l.Sym]; seen {
					continue
				}
				sp, ok := fc.spanOf(res, l.Sym, g.root)
				if !ok {
					return
				}
				index[l.Sym] = len(spans)
				spans = append(spans, sp)
			}
		}
		count += len(ft)
		forms = append(forms, ft)
	}
	if count < 2 {
		// One value alone: exp(ln Γ(x)) is +Inf before it errs by
		// 1e-12. Beside powers (k·ln λ − λ − ln Γ(k+1), the Poisson pmf
		// in log space, the form a rewrite is advised to take) its
		// error is that of any exponential of a sum of terms of that
		// size, not a loss of this form: left to the caller's
		// judgement (docs/patterns.md, lgamma-digits).
		return
	}
	if len(spans) == 0 || len(spans) > 6 {
		return // constants only, or more corners than worth trying
	}
	exps := make([][]thresholds.LogGammaTerm, len(forms))
	for e, ft := range forms {
		for _, f := range ft {
			lt := thresholds.LogGammaTerm{P: f.p, C: floatOf(f.aff.C), K: make([]float64, len(spans))}
			lt.Rounded = !f.aff.C.IsInt()
			for _, l := range f.aff.Terms {
				j := index[l.Sym]
				lt.K[j] = floatOf(l.K)
				lt.Rounded = lt.Rounded || !spans[j].isInt || !l.K.IsInt()
			}
			exps[e] = append(exps[e], lt)
		}
	}
	d := drivingVar(spans, exps)
	bound := func(t float64) (float64, bool) {
		lo, hi := make([]float64, len(spans)), make([]float64, len(spans))
		for j, sp := range spans {
			switch {
			case j == d:
				lo[j], hi[j] = t, t
			case math.IsInf(sp.hi, 1):
				lo[j], hi[j] = sp.lo, math.Max(sp.lo, t)
			default:
				lo[j], hi[j] = sp.lo, sp.hi
			}
		}
		return thresholds.ExpLogGammaError(exps, lo, hi)
	}
	dv := spans[d]
	from, to := int64(math.Ceil(dv.lo)), int64(1)<<40
	if !math.IsInf(dv.hi, 1) {
		to = int64(math.Floor(dv.hi))
	}
	first, ok := thresholds.ExpLogGammaFirst(bound, from, to, lgammaTolerance)
	if !ok {
		return
	}
	at, _ := bound(float64(first))
	iv := ranges.Interval{Lo: math.MinInt64, Hi: math.MaxInt64}
	if dv.loKnown {
		iv.Lo = from
	}
	if !math.IsInf(dv.hi, 1) {
		iv.Hi = to
	}
	clause, definite := verdict(dv.name, iv, first)
	what := "a product of Γ values"
	if f := vm.Recognise(res.Values[g.root]); f.Kind != vm.Unknown && f.Kind != vm.GammaRatio {
		what = f.String()
	} else if t := res.Values[g.root]; t != nil && f.Kind == vm.GammaRatio {
		what = "Γ ratio " + t.String()
	}
	var others []string
	for j, sp := range spans {
		if j != d && math.IsInf(sp.hi, 1) {
			others = append(others, sp.name)
		}
	}
	with := ""
	if len(others) > 0 {
		with = fmt.Sprintf(" with %s between %s and %s", strings.Join(others, ", "), lowerEnds(spans, others), dv.name)
	}
	exp := "math.Exp of log-gamma values"
	if len(g.exps) > 1 {
		exp = fmt.Sprintf("a product of %d math.Exp calls of log-gamma values", len(g.exps))
	}
	msg := fmt.Sprintf("%s computes %s from %d log-gamma values whose rounding errors add up: the bound on its relative error passes the tolerance %g from %s = %d%s, where it is %.4g",
		exp, what, count, lgammaTolerance, dv.name, first, with, at)
	// The bound further on: at the top of the range, or at 10⁹ where
	// nothing bounds the variable.
	far := float64(to)
	if math.IsInf(dv.hi, 1) {
		far = 1e9
	}
	if top, ok := bound(far); ok && top > at && far > float64(first) {
		msg += fmt.Sprintf(", and %.2g at %s = %g", top, dv.name, far)
	}
	if rest {
		msg += "; the exponent's other terms add rounding errors of their own, not counted in the bound"
	}
	msg += clause
	fc.report(finding{node: g.root, cat: catLgammaDigits, definite: definite, msg: msg, match: fc.lgammaMatch(res, g.root)})
}

// lowerEnds names the lower ends of the named variables, assumed 0
// where nothing bounds them below.
func lowerEnds(spans []symSpan, names []string) string {
	lo := math.Inf(1)
	for _, sp := range spans {
		for _, n := range names {
			if sp.name == n {
				lo = math.Min(lo, sp.lo)
			}
		}
	}
	return fmt.Sprintf("%g", lo)
}

// drivingVar picks the variable the message names and the search
// moves: the n of ln Γ(n+1), a variable of a term added to the exponent,
// preferring one nothing bounds above; else the first variable nothing
// bounds above; else the first. The others stay within their ranges,
// and those nothing bounds above within [lo, n], as k of C(n, k) does.
func drivingVar(spans []symSpan, exps [][]thresholds.LogGammaTerm) int {
	for _, unbounded := range []bool{true, false} {
		for _, terms := range exps {
			for _, t := range terms {
				for j, k := range t.K {
					if k > 0 && t.P > 0 && (!unbounded || math.IsInf(spans[j].hi, 1)) {
						return j
					}
				}
			}
		}
	}
	for j, sp := range spans {
		if math.IsInf(sp.hi, 1) {
			return j
		}
	}
	return 0
}
