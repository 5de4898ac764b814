package analyzer

import (
	"go/ast"

	vm "github.com/overfact/overfact/analyzer/valuemodel"
	"github.com/overfact/overfact/fixes"
)

// expPMFMatch offers the helper call for a binomial or negative binomial
// probability whose coefficient the code takes as math.Exp of log-gamma
// values itself, written in the product or as the one value of a local:
//
//	return math.Exp(a-b-c) * math.Pow(p, k) * math.Pow(1-p, n-k)
//	c := math.Exp(lg(k+r) - lg(k+1) - lg(r)); return c * math.Pow(p, r) * math.Pow(1-p, k)
//
// The exponential is no call of a function the fixer can check as the
// binomial, so the analyzer vouches for it (Match.Vouched) where the
// model reads it as the form's own coefficient: C(n, k) for a binomial
// probability, C(f+s−1, f) or C(f+s−1, s−1) for a negative binomial one.
// Inside the helper's domain the product becomes the helper's call;
// outside it the fixer keeps the expression as written, in log space
// (the exponential is then a plain factor). nil where the coefficient is
// not such an exponential or not the form's.
func (fc *fnCtx) expPMFMatch(res *vm.Result, e ast.Expr, f vm.Form, coef ast.Expr) *fixes.Match {
	if coef == nil || !fc.expFormed(coef) {
		return nil
	}
	c := vm.Recognise(res.Values[coef])
	if c.Kind != vm.Binomial || len(c.Args) != 2 || !pmfCoefficient(f, c) {
		return nil
	}
	m := fc.readIn(fc.callRootMatch(res, e, f), e)
	if m == nil {
		return nil
	}
	m.Vouched = ast.Unparen(coef)
	return m
}

// pmfCoefficient reports whether c, a binomial coefficient, is the one
// of the probability f.
func pmfCoefficient(f, c vm.Form) bool {
	switch {
	case f.Kind == vm.BinomialPMF && len(f.Args) >= 2:
		return c.Args[0].Equal(f.Args[0]) && c.Args[1].Equal(f.Args[1])
	case f.Kind == vm.NegBinomialPMF && len(f.Args) >= 2:
		n := f.Args[0].Add(f.Args[1]).Shift(-1)
		return c.Args[0].Equal(n) && (c.Args[1].Equal(f.Args[0]) || c.Args[1].Equal(f.Args[1].Shift(-1)))
	}
	return false
}
