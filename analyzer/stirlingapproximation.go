package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"math"
	"math/big"
	"sort"

	"github.com/overfact/overfact/analyzer/thresholds"
	vm "github.com/overfact/overfact/analyzer/valuemodel"
	"github.com/overfact/overfact/fixes"
	"github.com/overfact/overfact/internal/astpath"
)

// Stirling's leading term √(2πn)(n/e)^n, written by hand where n! is
// meant, in whatever arrangement (math.Sqrt(2*math.Pi*n) *
// math.Pow(n/math.E, n), math.Pow(n, n) * math.Exp(-n) * …, the log
// form n*math.Log(n) - n + 0.5*math.Log(2*math.Pi*n), through locals),
// is recognised from its value in the value model: the product is
// brought to normal form and its logarithm compared with
// (n+½)·ln n − n + ½·ln 2π. The exponents must match exactly; the
// constants (written as math.Pi and math.E, or as decimals) within
// stirlingConstTol, so that 3.14159 still counts.
//
// Two things are wrong with it where n! is expected:
//
//   - its own error: it falls short of n! by 1 − e^(−δ(n)), about
//     1/(12n) (thresholds.StirlingRelError: 7.79% at n = 1, 0.83% at
//     n = 10). It is reported when the smallest n the code allows is
//     below the point where that error drops under stirlingTolerance
//     (thresholds.StirlingRelErrorBelow), that is, nearly always; code
//     that wants the approximation says so with //overfact:approx and a
//     reason, which silences this part only. Code that tests n before
//     it reaches the formula (if n < len(table) { return table[n] } or
//     if n <= 20 { return exact }, or the formula under if n > 1000)
//     chose the approximation for the n it lets through: the error is
//     not reported there either.
//   - overflow before n!: math.Pow(n, n) (or n^(n±½)) leaves float64
//     from n = 144 (thresholds.SelfPower) while 170! fits; reported
//     where n's range reaches it.

// stirlingTolerance is the relative error above which an approximation
// of n! is reported: the default tolerance of the log-gamma categories,
// four orders above float64 rounding and far below any error a user
// would accept silently in a factorial.
const stirlingTolerance = 1e-12

// stirlingConstTol is how far the logarithm of the constant factor, and
// the coefficient of −n, may be from ½·ln 2π and 1: written constants
// with five digits (3.14159, 2.71828) pass.
const stirlingConstTol = 1e-3

// stirlingHit is an expression whose value is Stirling's term of base!.
type stirlingHit struct {
	e    ast.Expr
	base vm.Affine
	log  bool
}

// checkStirling reports hand-written Stirling approximations.
func (fc *fnCtx) checkStirling(model func() *vm.Result) {
	if !fc.mayHoldStirling() {
		return
	}
	res := model()
	var hits []stirlingHit
	collect := func(m map[ast.Expr]*vm.Term, log bool) {
		for e, t := range m {
			if _, isID := e.(*ast.Ident); isID {
				continue // a variable holding the value: its definition is the finding
			}
			if b, ok := stirlingBase(t); ok {
				hits = append(hits, stirlingHit{e, b, log})
			}
		}
	}
	collect(res.Values, false)
	collect(res.Logs, true)
	sort.Slice(hits, func(i, j int) bool {
		if hits[i].e.Pos() != hits[j].e.Pos() {
			return hits[i].e.Pos() < hits[j].e.Pos()
		}
		return hits[i].e.End() > hits[j].e.End()
	})
	var outer []stirlingHit
	for _, h := range hits {
		if len(outer) > 0 && h.e.End() <= outer[len(outer)-1].e.End() {
			continue // inside a larger expression of the same value
		}
		outer = append(outer, h)
	}
	for _, h := range outer {
		fc.judgeStirling(res, h)
	}
}

// mayHoldStirling is the cheap test before the value model runs: the
// function names math.Pi or math.E, or writes a float constant.
func (fc *fnCtx) mayHoldStirling() bool {
	found := false
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		switch x := n.(type) {
		case *ast.BasicLit:
			found = x.Kind == token.FLOAT
		case *ast.SelectorExpr:
			if c, ok := fc.c.pass.TypesInfo.Uses[x.Sel].(*types.Const); ok && c.Pkg() != nil && c.Pkg().Path() == "math" {
				found = c.Name() == "Pi" || c.Name() == "E"
			}
		}
		return !found
	})
	return found
}

// stirlingBase returns B when ln t is (B+½)·ln B − B + ½·ln 2π, B a monic
// affine form (its first coefficient 1).
func stirlingBase(t *vm.Term) (vm.Affine, bool) {
	var none vm.Affine
	if t == nil || len(t.Gamma) > 0 || t.Coef.Sign() <= 0 {
		return none, false
	}
	konst := ratLog(t.Coef) + float64(t.SqrtPi)/2*math.Log(math.Pi)
	lin := make(map[vm.Sym]float64)
	add := func(a vm.Affine, f float64) {
		konst += ratFloat(a.C) * f
		for _, l := range a.Terms {
			lin[l.Sym] += ratFloat(l.K) * f
		}
	}
	add(t.Exp, 1)
	var base vm.Affine
	have := false
	a, c := new(big.Rat), new(big.Rat) // ln t = a·B·ln B + c·ln B + …
	for _, p := range t.Pows {
		if p.Base.IsConst() {
			if p.Base.C.Sign() <= 0 {
				return none, false
			}
			add(p.Exp, ratLog(p.Base.C))
			continue
		}
		lead := p.Base.Terms[0].K
		if lead.Sign() <= 0 {
			return none, false
		}
		m := p.Base.Scale(new(big.Rat).Inv(lead))
		add(p.Exp, ratLog(lead))
		if have && !m.Equal(base) {
			return none, false
		}
		base, have = m, true
		k := p.Exp.Coef(m.Terms[0].Sym)
		rest := p.Exp.Sub(m.Scale(k))
		if !rest.IsConst() {
			return none, false
		}
		a.Add(a, k)
		c.Add(c, restConst(rest))
	}
	if !have || a.Cmp(big.NewRat(1, 1)) != 0 || c.Cmp(big.NewRat(1, 2)) != 0 {
		return none, false
	}
	// The rest must be d·B + ½·ln 2π with d = −1.
	d := lin[base.Terms[0].Sym]
	for s, v := range lin {
		if math.Abs(v-d*ratFloat(base.Coef(s))) > stirlingConstTol {
			return none, false
		}
	}
	konst -= d * ratFloat(base.C)
	if math.Abs(d+1) > stirlingConstTol || math.Abs(konst-0.5*math.Log(2*math.Pi)) > stirlingConstTol {
		return none, false
	}
	return base, true
}

func restConst(a vm.Affine) *big.Rat {
	if a.C == nil {
		return new(big.Rat)
	}
	return a.C
}

func ratFloat(r *big.Rat) float64 {
	if r == nil {
		return 0
	}
	f, _ := r.Float64()
	return f
}

// ratLog returns ln r for r > 0, also where r's numerator or denominator
// alone is beyond float64.
func ratLog(r *big.Rat) float64 {
	mn, md := new(big.Float), new(big.Float)
	en := new(big.Float).SetInt(r.Num()).MantExp(mn)
	ed := new(big.Float).SetInt(r.Denom()).MantExp(md)
	fn, _ := mn.Float64()
	fd, _ := md.Float64()
	return math.Log(fn) - math.Log(fd) + float64(en-ed)*math.Ln2
}

// baseVar is the variable of a Stirling base B = v + c and where the
// code reads it.
type baseVar struct {
	obj    types.Object
	id     *ast.Ident
	off    float64 // c
	isInt  bool
	lo, hi float64 // range of B
}

// stirlingRange finds the variable of base and the range of base.
func (fc *fnCtx) stirlingRange(res *vm.Result, h stirlingHit) baseVar {
	bv := baseVar{off: ratFloat(h.base.C), lo: math.Inf(-1), hi: math.Inf(1)}
	if len(h.base.Terms) != 1 || h.base.Terms[0].Sym.Field != nil || h.base.Terms[0].Sym.Obj == nil && h.base.Terms[0].Sym.Loop == nil {
		return bv
	}
	obj := h.base.Terms[0].Sym.Obj
	if sym := h.base.Terms[0].Sym; sym.Loop != nil {
		// The trip index of a loop: name the loop's counter instead.
		obj = nil
		for _, l := range res.Loops {
			cv := l.From.Add(vm.Var(sym).Scale(l.Step))
			if l.Iter == sym && l.Counter != nil && h.base.Sub(cv).IsConst() {
				obj, bv.off = l.Counter, ratFloat(h.base.Sub(cv).C)
			}
		}
		if obj == nil {
			return bv
		}
	}
	bv.obj = obj
	bv.id = fc.identOf(h.e, obj, 0)
	if bv.id == nil {
		if x, ok := res.Exprs[h.base.Terms[0].Sym].(*ast.Ident); ok {
			bv.id = x
		}
	}
	if bv.id == nil {
		return bv
	}
	t, ok := fc.c.numOf(obj.Type())
	bv.isInt = ok && !t.Float
	vlo, vhi := math.Inf(-1), math.Inf(1)
	if bv.isInt {
		r := fc.rangeOf(bv.id)
		if r.IsEmpty() {
			return bv
		}
		if !typeLimit(-r.Lo) && r.Lo != math.MinInt64 {
			vlo = float64(r.Lo)
		}
		if !typeLimit(r.Hi) {
			vhi = float64(r.Hi)
		}
	} else {
		vlo, vhi = fc.floatBounds(bv.id)
	}
	bv.lo, bv.hi = vlo+bv.off, vhi+bv.off
	return bv
}

// identOf finds an identifier of obj in e or in the definitions of the
// locals e reads.
func (fc *fnCtx) identOf(e ast.Expr, obj types.Object, depth int) *ast.Ident {
	var out *ast.Ident
	ast.Inspect(e, func(n ast.Node) bool {
		id, ok := n.(*ast.Ident)
		if !ok || out != nil {
			return out == nil
		}
		switch o := fc.c.pass.TypesInfo.Uses[id]; {
		case o == obj:
			out = id
		case depth < 3:
			if def := fc.singleDef(id); def != nil {
				out = fc.identOf(def, obj, depth+1)
			}
		}
		return out == nil
	})
	return out
}

// selfPowers finds the math.Pow calls in e (and the definitions of the
// locals it reads) that form base^(base+h/2), h in {−1, 0, 1}.
func (fc *fnCtx) selfPowers(res *vm.Result, e ast.Expr, base vm.Affine, depth int, out map[*ast.CallExpr]int64) {
	ast.Inspect(e, func(n ast.Node) bool {
		switch x := n.(type) {
		case *ast.CallExpr:
			if fc.c.isMathFunc(x, "Pow") {
				if h, ok := selfPower(res.Values[x], base); ok {
					out[x] = h
				}
			}
		case *ast.Ident:
			if depth < 3 {
				if def := fc.singleDef(x); def != nil {
					fc.selfPowers(res, def, base, depth+1, out)
				}
			}
		}
		return true
	})
}

// selfPower reports whether t is base^(base+h/2).
func selfPower(t *vm.Term, base vm.Affine) (int64, bool) {
	if t == nil || len(t.Gamma) > 0 || t.SqrtPi != 0 || len(t.Pows) != 1 || !t.Exp.IsConst() || ratFloat(t.Exp.C) != 0 {
		return 0, false
	}
	p := t.Pows[0]
	if !p.Base.Equal(base) {
		return 0, false
	}
	d := p.Exp.Sub(base)
	if !d.IsConst() {
		return 0, false
	}
	h := new(big.Rat).Mul(restConst(d), big.NewRat(2, 1))
	if !h.IsInt() || h.Num().Int64() < -1 || h.Num().Int64() > 1 {
		return 0, false
	}
	return h.Num().Int64(), true
}

// judgeStirling reports one Stirling approximation.
func (fc *fnCtx) judgeStirling(res *vm.Result, h stirlingHit) {
	bv := fc.stirlingRange(res, h)
	if bv.hi < 1 {
		return // never reached with a positive n
	}
	if fc.corrected(res, h) {
		return
	}
	name := h.base.String()
	if bv.obj != nil {
		name = bv.obj.Name()
		switch {
		case bv.off > 0:
			name += fmt.Sprintf(" + %g", bv.off)
		case bv.off < 0:
			name += fmt.Sprintf(" - %g", -bv.off)
		}
	}
	fact := name + "!"
	if bv.off != 0 || bv.obj == nil && len(h.base.Terms) > 1 {
		fact = "(" + name + ")!"
	}
	f64 := floatNum(fc.c.pass.TypesSizes)
	var parts []string
	definite := false
	// The approximation's own error, from the smallest n the code allows.
	fi := fc.c.fileOf(h.e.Pos())
	approx := fi != nil && fi.dirs.approx.covers(fc.c.pass.Fset, h.e.Pos()) || bv.obj != nil && fc.dispatched(h.e, bv.obj)
	below := thresholds.StirlingRelErrorBelow(stirlingTolerance)
	low := int64(1)
	if bv.lo > 1 && bv.lo < float64(math.MaxInt64/16) {
		low = int64(math.Ceil(bv.lo))
	}
	if !approx && low < below {
		what := "√(2πn)(n/e)^n"
		if h.log {
			what = "(n+½)·ln n − n + ½·ln 2π"
		}
		msg := fmt.Sprintf("hand-written Stirling approximation %s of %s%s: it is %.3g%% below %s at %s = %d",
			what, fact, map[bool]string{true: " in log form", false: ""}[h.log], 100*thresholds.StirlingRelError(low), fact, name, low)
		if next := 10 * low; float64(next) <= bv.hi {
			msg += fmt.Sprintf(" and %.3g%% at %s = %d", 100*thresholds.StirlingRelError(next), name, next)
		}
		msg += fmt.Sprintf(" (about 1/(12n) relative; above %g up to n = %d), where a factorial is expected exactly", stirlingTolerance, below-1)
		parts = append(parts, msg)
		definite = bv.hi < float64(below)
	}
	// Overflow of a power n^n before n! itself.
	if !h.log {
		pows := make(map[*ast.CallExpr]int64)
		fc.selfPowers(res, h.e, h.base, 0, pows)
		var worst *ast.CallExpr
		for call, hh := range pows {
			if worst == nil || thresholds.SelfPower(f64, hh) < thresholds.SelfPower(f64, pows[worst]) || call.Pos() < worst.Pos() && thresholds.SelfPower(f64, hh) == thresholds.SelfPower(f64, pows[worst]) {
				worst = call
			}
		}
		if worst != nil {
			first := float64(thresholds.SelfPower(f64, pows[worst]))
			if bv.hi >= first {
				fits := thresholds.Factorial(f64).FirstBad - 1
				parts = append(parts, fmt.Sprintf("%s is +Inf for %s ≥ %g, although %s fits float64 up to %s = %d", src(worst), name, first-bv.off, fact, name, fits-int64(bv.off)))
				definite = definite || bv.lo >= first
			}
		}
	}
	if len(parts) == 0 {
		return
	}
	msg := parts[0]
	if len(parts) > 1 {
		msg += "; and " + parts[1]
	} else if !h.log && approx {
		msg = "hand-written Stirling approximation of " + fact + ": " + msg
	}
	msg += fc.stirlingClause(bv, name)
	m := &fixes.Match{Shape: fixes.ShapeStirling, Node: h.e, Result: fc.c.pass.TypesInfo.TypeOf(h.e), Func: fc.node}
	if h.log {
		m.Shape = fixes.ShapeLogStirling
	}
	if bv.id != nil && bv.off == 0 && bv.obj == fc.c.objOf(bv.id) {
		m.Args = []ast.Expr{bv.id}
	} else {
		m.Shape = fixes.ShapeNone
	}
	fc.report(finding{node: h.e, cat: catStirling, definite: definite, msg: msg, match: m})
}

// stirlingClause says what the code allows of the base.
func (fc *fnCtx) stirlingClause(bv baseVar, name string) string {
	switch {
	case bv.id == nil || math.IsInf(bv.lo, -1) && math.IsInf(bv.hi, 1):
		return fmt.Sprintf("; %s is not bounded here", name)
	case math.IsInf(bv.hi, 1):
		return fmt.Sprintf("; %s is at least %g here", name, bv.lo)
	}
	return fmt.Sprintf("; %s may reach %g here", name, bv.hi)
}

// corrected reports whether h is a factor or a term of a larger
// expression that adds a correction the model does not read, such as
// the series' next term: √(2πn)(n/e)^n·(1 + 1/(12n)) or
// … + 1/(12*n) in log form. That is a closer formula, written on
// purpose.
func (fc *fnCtx) corrected(res *vm.Result, h stirlingHit) bool {
	if fc.file == nil {
		return false
	}
	path, _ := astpath.Enclosing(fc.file.file, h.e.Pos(), h.e.End())
	for _, n := range path[1:] {
		switch p := n.(type) {
		case *ast.ParenExpr:
			continue
		case *ast.BinaryExpr:
			other := p.X
			if ast.Unparen(other) == ast.Unparen(h.e) || other.Pos() <= h.e.Pos() && h.e.End() <= other.End() {
				other = p.Y
			}
			ops := p.Op == token.MUL || p.Op == token.QUO
			if h.log {
				ops = p.Op == token.ADD || p.Op == token.SUB
			}
			if !ops || res.Values[other] != nil || res.Logs[other] != nil {
				return false
			}
			for _, l := range h.base.Terms {
				if l.Sym.Obj != nil && fc.identOf(other, l.Sym.Obj, 0) != nil {
					return true
				}
			}
			return false
		}
		return false
	}
	return false
}

// dispatched reports whether e is reached only past a test of obj: an
// if without else before it that leaves the function, or an if whose
// branch holds e, whose condition reads obj. Such code picks the
// approximation for the values of obj it lets through.
func (fc *fnCtx) dispatched(e ast.Expr, obj types.Object) bool {
	if fc.file == nil {
		return false
	}
	reads := func(cond ast.Expr) bool { return fc.identOf(cond, obj, 0) != nil }
	path, _ := astpath.Enclosing(fc.file.file, e.Pos(), e.End())
	for i := 1; i < len(path); i++ {
		child := path[i-1]
		switch p := path[i].(type) {
		case *ast.FuncDecl, *ast.FuncLit:
			return false
		case *ast.IfStmt:
			if (child == p.Body || child == p.Else) && reads(p.Cond) {
				return true
			}
		case *ast.BlockStmt:
			for _, st := range p.List {
				if st.Pos() >= child.Pos() {
					break
				}
				if s, ok := st.(*ast.IfStmt); ok && s.Else == nil && fc.exits(s.Body) && reads(s.Cond) {
					return true
				}
			}
		}
	}
	return false
}
