package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"math"
	"math/big"
	"strings"

	"github.com/overfact/overfact/analyzer/ranges"
	"github.com/overfact/overfact/analyzer/thresholds"
	vm "github.com/overfact/overfact/analyzer/valuemodel"
	"github.com/overfact/overfact/fixes"
)

// A series summed in float64 from a running term, whose sum a small
// prefactor or a ratio brings back after the loop,
//
//	term, sum := 1.0, 1.0
//	for i := 1; i <= n; i++ { term *= lt / float64(i); sum += term }
//	return math.Exp(-lt) * sum                 // Poisson CDF
//
//	for i := 0; i <= k; i++ { p += c; c = c * float64(n-i) / float64(i+1) }
//	return 2 * p * math.Pow(0.5, float64(n))   // binomial tail
//
//	pw := last / (sum + last)                  // Erlang C
//
// is wrong where the terms or the sum pass float64 although the value
// read after the loop does not: e^−λ is 0 where Σ λ^k/k! (about e^λ) is
// +Inf, and 0·(+Inf) is NaN; a ratio of two infinities is NaN too. The
// sum alone returned as it is overflows only where the true sum does
// and is not reported here: only a sum read after its loop as a factor
// of a product with an exponential or a power, or in the denominator of
// a ratio, is.

// modelRunningSum reports the sums of a loop whose term is x^k/k! or
// C(n, k) on each trip, read after the loop as a scaled sum or a ratio.
func (fc *fnCtx) modelRunningSum(res *vm.Result) {
	for _, l := range res.Loops {
		if l.Counter != nil && !fc.c.reportedAs(l.Stmt.Pos(), catPowOverFac) {
			fc.gammaSeriesSums(res, l)
		}
		// A loop of a constant number of trips sums a truncated
		// series for small arguments: precision first, it is not judged.
		// A loop reported already for a running factorial inside the
		// sum is left to that finding, whose fix may fold the prefactor
		// in; a running binomial's fix leaves the sum as it is.
		if l.Counter == nil || l.Exits || l.Count.IsConst() || fc.c.reportedAs(l.Stmt.Pos(), catPowOverFac) {
			continue
		}
		for _, s := range l.Sums {
			t, ok := fc.c.numOf(s.Obj.Type())
			if !ok || !t.Float || t.Num.Bits != 64 || fc.c.reportedWithin(s.Stmt) {
				continue
			}
			scaled := fc.scaledRead(res, l.Stmt, s, fc.scaleFactor)
			if scaled == nil || fc.checksNonFinite(scaled) {
				continue
			}
			fc.reportRunningSum(res, l, s, t, scaled)
		}
	}
}

// reportRunningSum judges one sum whose term is a power series term
// x^k/k! (x a product or ratio of powers) or a binomial coefficient,
// read as scaled.
func (fc *fnCtx) reportRunningSum(res *vm.Result, l *vm.Loop, s *vm.SumAcc, t numType, scaled ast.Expr) {
	var growth, form, name string
	var first int64
	var r ranges.Interval
	trips := fc.affineRange(res, l.Count, l.Stmt)
	if x, base, ok := powerSeriesTerm(s.Sum.Term); ok {
		// Σ x^k/k! over the loop's terms (at least trips − 1 after the
		// first) passes float64 from PowerSeriesFirstBad on: about
		// e^x's ln MaxFloat64 for a loop that runs past k ≈ x, more
		// for fewer terms. A bounded loop of a sum of a product or
		// ratio of variables is not judged: its x is bounded by guards
		// the range analysis does not follow (a < servers ≤ 60).
		v, plain := plainVar(base)
		if trips.IsEmpty() || trips.Hi < 2 || !plain && trips.Hi < powerSeriesTerms {
			return
		}
		bad := thresholds.PowerSeriesFirstBad(t.Num, trips.Hi-1)
		if bad > 1e15 {
			return
		}
		first = int64(math.Ceil(bad))
		name, form = x, groupText(x)+"^k/k!"
		growth = fmt.Sprintf("the sum (e^%s for a loop past k ≈ %s) is +Inf for %s ≥ %s", groupText(x), x, x, fmtFloat(bad))
		if trips.Hi < powerSeriesTerms {
			growth = fmt.Sprintf("the sum of its first %d terms is +Inf for %s ≥ %s", trips.Hi, x, fmtFloat(bad))
		}
		r = ranges.Top()
		if plain {
			r = fc.symRange(res, v, l.Stmt)
		}
	} else if f := vm.Recognise(s.Sum.Term); f.Kind == vm.Binomial {
		central := thresholds.CentralBinomial(t.Num)
		first = central.FirstBad
		// The terms reach the central one only once the loop runs to
		// k ≈ n/2.
		if trips.Hi < first/2 {
			return
		}
		name, form = f.Args[0].String(), f.String()
		growth = fmt.Sprintf("the terms reach C(%s, ⌊%s/2⌋), +Inf for %s ≥ %d (C(%d, %d) ≈ %s is the largest central one that fits)", name, groupText(name), name, first, first-1, (first-1)/2, central.LastGoodApprox())
		r = fc.affineRange(res, f.Args[0], l.Stmt)
	} else {
		return
	}
	j := decideName(name, r, first)
	if j.silent {
		return
	}
	forms := "0·(+Inf) = NaN or +Inf"
	if b, ok := scaled.(*ast.BinaryExpr); ok && b.Op == token.QUO {
		forms = "+Inf/(+Inf) = NaN or 0"
	}
	msg := fmt.Sprintf("%s sums the running term %s in %s: %s, while %s, which reads the sum after the loop, stays finite; there it is %s%s",
		s.Obj.Name(), form, t.typeName(), growth, src(scaled), forms, j.clause)
	cat := catPowOverFac
	if _, _, ok := powerSeriesTerm(s.Sum.Term); !ok {
		cat = catBinomLoop
	}
	fc.report(finding{node: s.Stmt, cat: cat, definite: j.definite, msg: msg, match: fc.runSumMatch(s, scaled)})
}

// runSumMatch describes the sum for the fixer (ShapeRunSum): the read
// after the loop, the sum, and the float64 locals the added term
// multiplies, the running terms the fixer carries; nil where the sum's
// statement adds nothing it can name.
func (fc *fnCtx) runSumMatch(s *vm.SumAcc, scaled ast.Expr) *fixes.Match {
	as, ok := s.Stmt.(*ast.AssignStmt)
	if !ok {
		return nil
	}
	term := addedTo(fc.c.pass.TypesInfo, as, s.Obj)
	if term == nil {
		return nil
	}
	if m := fc.runSumTermsMatch(s, scaled, term); m != nil {
		return m
	}
	var args []ast.Expr
	ast.Inspect(term, func(n ast.Node) bool {
		if id, ok := n.(*ast.Ident); ok {
			if v, ok := fc.c.pass.TypesInfo.Uses[id].(*types.Var); ok && !v.IsField() && v.Parent() != fc.c.pass.Pkg.Scope() && !isParam(fc.signature(), v) {
				args = append(args, id)
			}
		}
		return true
	})
	if len(args) == 0 {
		return nil
	}
	return &fixes.Match{Shape: fixes.ShapeRunSum, Node: scaled, Acc: s.Obj, Args: args, Result: fc.c.pass.TypesInfo.TypeOf(scaled), Func: fc.node}
}

// powerSeriesTerm recognises c·x^k/k! where x is a product or ratio of
// powers sharing the exponent k (λ·t from lt := lambda*t, λ/μ from
// a := lambda/mu): it returns x as a message writes it, and the one
// base when x is a single variable.
func powerSeriesTerm(t *vm.Term) (string, vm.Affine, bool) {
	if t == nil || t.SqrtPi != 0 || t.Coef.Sign() <= 0 || !t.Exp.Equal(vm.Int(0)) || len(t.Gamma) != 1 || t.Gamma[0].Pow != -1 || len(t.Pows) == 0 {
		return "", vm.Affine{}, false
	}
	k := t.Gamma[0].Arg.Shift(-1)
	if k.IsConst() {
		return "", vm.Affine{}, false
	}
	var up, down []string
	for _, p := range t.Pows {
		switch {
		case p.Exp.Equal(k):
			up = append(up, groupText(p.Base.String()))
		case p.Exp.Equal(k.Scale(big.NewRat(-1, 1))):
			down = append(down, groupText(p.Base.String()))
		default:
			return "", vm.Affine{}, false
		}
	}
	if len(up) == 0 {
		return "", vm.Affine{}, false
	}
	x := strings.Join(up, "·")
	if len(down) > 0 {
		x += "/" + strings.Join(down, "/")
	}
	if len(t.Pows) == 1 {
		return x, t.Pows[0].Base, true
	}
	return x, vm.Affine{}, true
}

// powerSeriesTerms is where a loop counts as unbounded for a power
// series: past 4000 terms the partial sum is e^x to float64's precision
// wherever e^x is near its range (PowerSeriesFirstBad).
const powerSeriesTerms = 4000

// reportedAs reports whether a finding of category cat starts at pos.
func (c *checker) reportedAs(pos token.Pos, cat string) bool {
	return c.reported[reportKey{pos, cat}] || c.reported[reportKey{pos, cat + definiteSuffix}]
}

// groupText wraps s in parentheses when it is more than one operand.
func groupText(s string) string {
	if strings.ContainsAny(s, " +-*/·") {
		return "(" + s + ")"
	}
	return s
}

// affineRange returns the range of an affine form of the model's
// variables with integer coefficients, each variable's range at node
// at; Top where a coefficient or the constant is no integer.
func (fc *fnCtx) affineRange(res *vm.Result, a vm.Affine, at ast.Node) ranges.Interval {
	if !a.C.IsInt() || !a.C.Num().IsInt64() {
		return ranges.Top()
	}
	r := ranges.Point(a.C.Num().Int64())
	for _, term := range a.Terms {
		if !term.K.IsInt() || !term.K.Num().IsInt64() {
			return ranges.Top()
		}
		r = r.Add(ranges.Point(term.K.Num().Int64()).Mul(fc.symRange(res, term.Sym, at)))
	}
	return r
}

// scaledRead returns the expression after loop, in the statements that
// follow it, that reads the sum s as a factor of a product with a factor
// scale accepts (math.Exp or math.Pow, scaleFactor), or in the
// denominator of a quotient (alone or plus other terms); nil if there is
// none.
func (fc *fnCtx) scaledRead(res *vm.Result, loop ast.Stmt, s *vm.SumAcc, scale func(ast.Expr) bool) ast.Expr {
	c := fc.c
	isSum := func(e ast.Expr) bool { return c.objOf(ast.Unparen(e)) == s.Obj }
	var found ast.Expr
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		if found != nil || n == nil {
			return false
		}
		if _, ok := n.(*ast.FuncLit); ok {
			return false
		}
		b, ok := n.(*ast.BinaryExpr)
		if !ok || b.Pos() < loop.End() {
			return true
		}
		switch b.Op {
		case token.MUL:
			if hasFactor(b.X, isSum) && scale(b.Y) || hasFactor(b.Y, isSum) && scale(b.X) ||
				hasFactor(b, isSum) && (scale(b.X) || scale(b.Y)) {
				found = b
			}
		case token.QUO:
			if termOf(b.Y, isSum) && !mentions(c.pass.TypesInfo, b.X, s.Obj) && largeLike(res, b.X, b.Y) {
				found = b
			}
		}
		return true
	})
	return found
}

// largeLike reports whether num, the numerator of a ratio over a sum,
// can grow with the sum: it is a term of the denominator too
// (last/(sum + last)), or the model holds it as a power or a Γ value
// (a^c/c!). A numerator that cannot (1/sum) makes a ratio that is
// below float64 where the sum is above it, and 0 is its value there.
func largeLike(res *vm.Result, num, den ast.Expr) bool {
	text := types.ExprString(ast.Unparen(num))
	if termOf(den, func(e ast.Expr) bool { return types.ExprString(ast.Unparen(e)) == text }) {
		return true
	}
	v := res.Values[num]
	return v != nil && (len(v.Pows) > 0 || len(v.Gamma) > 0)
}

// hasFactor reports whether e is a product with a factor isSum accepts.
func hasFactor(e ast.Expr, isSum func(ast.Expr) bool) bool {
	if isSum(e) {
		return true
	}
	b, ok := ast.Unparen(e).(*ast.BinaryExpr)
	return ok && b.Op == token.MUL && (hasFactor(b.X, isSum) || hasFactor(b.Y, isSum))
}

// termOf reports whether e is a sum with a term isSum accepts.
func termOf(e ast.Expr, isSum func(ast.Expr) bool) bool {
	if isSum(e) {
		return true
	}
	b, ok := ast.Unparen(e).(*ast.BinaryExpr)
	return ok && b.Op == token.ADD && (termOf(b.X, isSum) || termOf(b.Y, isSum))
}

// scaleFactor reports whether e is, or multiplies, a small factor that
// brings the sum back into range: math.Exp of a negated operand
// (math.Exp(-lt)), or math.Pow of a constant base between 0 and 1
// (math.Pow(0.5, n)) or to a negated exponent.
func (fc *fnCtx) scaleFactor(e ast.Expr) bool {
	switch e := ast.Unparen(e).(type) {
	case *ast.CallExpr:
		negated := func(x ast.Expr) bool {
			u, ok := ast.Unparen(x).(*ast.UnaryExpr)
			return ok && u.Op == token.SUB
		}
		switch {
		case fc.c.isMathFunc(e, "Exp") && len(e.Args) == 1:
			return negated(e.Args[0])
		case fc.c.isMathFunc(e, "Pow") && len(e.Args) == 2:
			if b, ok := fc.floatConst(e.Args[0]); ok && b > 0 && b < 1 {
				return true
			}
			return negated(e.Args[1])
		}
	case *ast.BinaryExpr:
		return e.Op == token.MUL && (fc.scaleFactor(e.X) || fc.scaleFactor(e.Y))
	}
	return false
}
