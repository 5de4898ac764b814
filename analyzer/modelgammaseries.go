package analyzer

import (
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
	"math"
	"math/big"

	"github.com/overfact/overfact/analyzer/thresholds"
	vm "github.com/overfact/overfact/analyzer/valuemodel"
)

// The series of the lower incomplete gamma function,
//
//	γ(a, x) = x^a·e^(−x) · Σ_k x^k/(a(a+1)…(a+k))
//
// (DLMF 8.7.1, from memory; Numerical Recipes' gser is this loop),
// summed from a running term and scaled after the loop,
//
//	del, sum := 1/a, 1/a
//	for n := 1; n < 100; n++ { del *= x / (a + float64(n)); sum += del }
//	return math.Exp(-x+a*math.Log(x)) * sum
//
// is wrong where x is large, although the value read, at most Γ(a) (or
// 1 for the regularised P(a, x)), is not: e^(−x) is 0 from x ≈ 745
// while the sum is not small, and the sum of a loop that runs past
// k ≈ x is near e^x·x^(−a)·Γ(a+1), +Inf from x ≈ 709 on: 0 times the sum,
// or 0·(+Inf) = NaN, is returned where the value is finite. The loop is
// written with a fixed number of trips and an exit once the terms no
// longer change the sum, which the rule for x^k/k! leaves alone; here
// the term itself says the series is meant to be summed, and a code
// that compares x with anything before the loop (x < a+1 before the
// series, the continued fraction elsewhere: P(a, x) is then at most a
// small multiple of the scale factor) is left alone. The fix is
// ShapeRunSum's: the running term as a Product, the sum as a Sum.

// gammaSeriesSums reports the float64 sums of loop l whose term is
// x^k·Γ(a)/Γ(a+k+c), read after the loop scaled by an exponential of −x.
func (fc *fnCtx) gammaSeriesSums(res *vm.Result, l *vm.Loop) {
	if c, ok := l.Count.At(nil); ok && c.Cmp(big.NewRat(2, 1)) < 0 {
		return
	}
	for _, s := range l.Sums {
		t, ok := fc.c.numOf(s.Obj.Type())
		if !ok || !t.Float || t.Num.Bits != 64 || fc.c.reportedWithin(s.Stmt) {
			continue
		}
		base, a, ok := gammaSeriesTerm(s.Sum.Term, s.Sum.Iter)
		if !ok {
			continue
		}
		x, ok := plainVar(base)
		if !ok || x.Obj == nil || x.Field != nil || fc.comparedBefore(x.Obj, l.Stmt) {
			continue
		}
		scaled := fc.scaledRead(res, l.Stmt, s, func(e ast.Expr) bool { return fc.expOfNegated(e, x.Obj) })
		if scaled == nil || fc.checksNonFinite(scaled) {
			continue
		}
		sub, zero := thresholds.ExpUnderflow(t.Num)
		if math.IsInf(zero, 1) {
			continue
		}
		name := x.Name()
		j := decideName(name, fc.symRange(res, x, l.Stmt), int64(math.Ceil(zero)))
		if j.silent {
			continue
		}
		msg := fmt.Sprintf("%s sums the running term %s on trip t (from 0), a power over a rising factorial of %s (the incomplete gamma series), in %s, and %s reads the sum after the loop through a factor e^(−%s): that factor loses its digits for %s > %s and is 0 for %s ≥ %s, while the sum is not small (near e^%s once the loop runs past k ≈ %s, +Inf from about there too), so that the value read, which stays finite, is 0 or 0·(+Inf) = NaN there",
			s.Obj.Name(), s.Sum.Term, a, t.typeName(), src(scaled), name, name, fmtFloat(sub), name, fmtFloat(zero), name, name)
		fc.report(finding{node: s.Stmt, cat: catPowOverFac, msg: msg + j.clause, match: fc.runSumMatch(s, scaled)})
	}
}

// gammaSeriesTerm recognises c·x^(k+e)·Γ(a)/Γ(a+k+d) on the trip k of
// iter: one power of a base that does not change in the loop, its
// exponent growing by one a trip, over a rising factorial of an a that
// is no constant (a constant a is x^k/k!'s rule). It returns x and a.
func gammaSeriesTerm(t *vm.Term, iter vm.Sym) (vm.Affine, vm.Affine, bool) {
	if t == nil || t.SqrtPi != 0 || t.Coef.Sign() <= 0 || !t.Exp.Equal(vm.Int(0)) || len(t.Pows) != 1 || len(t.Gamma) != 2 {
		return vm.Affine{}, vm.Affine{}, false
	}
	p := t.Pows[0]
	if p.Base.IsConst() || p.Base.Has(iter) || p.Exp.Coef(iter).Cmp(big.NewRat(1, 1)) != 0 {
		return vm.Affine{}, vm.Affine{}, false
	}
	num, den := t.Gamma[0], t.Gamma[1]
	if num.Pow < 0 {
		num, den = den, num
	}
	if num.Pow != 1 || den.Pow != -1 || num.Arg.IsConst() || num.Arg.Has(iter) {
		return vm.Affine{}, vm.Affine{}, false
	}
	d := den.Arg.Sub(num.Arg)
	if d.Coef(iter).Cmp(big.NewRat(1, 1)) != 0 || !d.Sub(vm.Var(iter)).IsConst() {
		return vm.Affine{}, vm.Affine{}, false
	}
	return p.Base, num.Arg, true
}

// expOfNegated reports whether e is, or holds as a factor or in a
// quotient's numerator, math.Exp of an argument with the term −x:
// math.Exp(-x), math.Exp(a*math.Log(x) - x), math.Exp(-x + …).
func (fc *fnCtx) expOfNegated(e ast.Expr, x types.Object) bool {
	switch e := ast.Unparen(e).(type) {
	case *ast.CallExpr:
		return fc.c.isMathFunc(e, "Exp") && len(e.Args) == 1 && fc.negatedTerm(e.Args[0], x, false)
	case *ast.BinaryExpr:
		switch e.Op {
		case token.MUL:
			return fc.expOfNegated(e.X, x) || fc.expOfNegated(e.Y, x)
		case token.QUO:
			return fc.expOfNegated(e.X, x)
		}
	}
	return false
}

// negatedTerm reports whether the sum e (negated where neg) has x among
// its terms with the sign −.
func (fc *fnCtx) negatedTerm(e ast.Expr, x types.Object, neg bool) bool {
	switch e := ast.Unparen(e).(type) {
	case *ast.Ident:
		return neg && fc.c.objOf(e) == x
	case *ast.UnaryExpr:
		return e.Op == token.SUB && fc.negatedTerm(e.X, x, !neg)
	case *ast.BinaryExpr:
		switch e.Op {
		case token.ADD:
			return fc.negatedTerm(e.X, x, neg) || fc.negatedTerm(e.Y, x, neg)
		case token.SUB:
			return fc.negatedTerm(e.X, x, neg) || fc.negatedTerm(e.Y, x, !neg)
		}
	}
	return false
}

// comparedBefore reports whether the function compares x (<, <=, >, >=)
// anywhere before the loop ends: a bound the range analysis does not
// follow for floats, such as the x < a+1 that sends the other inputs to
// a continued fraction.
func (fc *fnCtx) comparedBefore(x types.Object, loop ast.Stmt) bool {
	found := false
	ast.Inspect(funcBody(fc.node), func(n ast.Node) bool {
		if found || n == nil || n.Pos() >= loop.End() {
			return false
		}
		if b, ok := n.(*ast.BinaryExpr); ok {
			switch b.Op {
			case token.LSS, token.LEQ, token.GTR, token.GEQ:
				found = mentions(fc.c.pass.TypesInfo, b, x)
			}
		}
		return !found
	})
	return found
}
