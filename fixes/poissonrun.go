package fixes

import (
	"errors"
	"fmt"
	"go/ast"
	"go/token"
	"go/types"
)

// A running Poisson product, started at e^(−λ) and multiplied by λ/k on
// each trip,
//
//	p := math.Exp(-lambda)
//	sum := p
//	for k := 1; k <= n; k++ {
//		p *= lambda / float64(k)
//		sum += p
//	}
//
// is 0 from the start once e^(−λ) underflows (λ ≥ 745.13 in float64),
// although the terms near k = λ are not small. The update becomes the
// term itself, λ^k·e^(−λ)/k! taken from the helper in log space
// (lgamma.PoissonTerm, which also keeps a negative λ's alternating
// terms), and the loop keeps every other use of p:
//
//	p := math.Exp(-lambda)
//	sum := p
//	for k := 1; k <= n; k++ {
//		p = lgamma.PoissonTerm(k, lambda)
//		sum += p
//	}
//
// The start stays: it is the term at k = 0, right wherever it fits.
// The analyzer vouches for what only the model knows
// (ShapeModelPoissonRun in match.go): after the update on every trip, p
// is λ^k·e^(−λ)/k! for the loop's counter k, a whole number. This
// builder checks the update itself: one assignment to p whose right
// side calls nothing and holds no comment.
func buildModelPoissonRun(b *builder) error {
	m := b.m
	as, ok := m.Node.(*ast.AssignStmt)
	if !ok || m.Acc == nil || len(m.Args) != 2 || len(as.Lhs) != 1 || len(as.Rhs) != 1 || !b.isObj(as.Lhs[0], m.Acc) {
		return errors.New("running Poisson match lacks its update, accumulator or operands")
	}
	if classOf(m.Result) != classFloat {
		return fmt.Errorf("running Poisson product of non-float type %s", m.Result)
	}
	switch as.Tok {
	case token.MUL_ASSIGN, token.QUO_ASSIGN:
	case token.ASSIGN:
		if !b.mentionsObj(as.Rhs[0], m.Acc) {
			return fmt.Errorf("the update does not read %s", m.Acc.Name())
		}
	default:
		return fmt.Errorf("%s is updated by %s", m.Acc.Name(), as.Tok)
	}
	if !b.plain(as.Rhs[0]) || b.commentIn(as) {
		return errors.New("the update calls out, may panic or holds a comment")
	}
	k := m.Args[0]
	var kText string
	if classOf(b.pass.TypesInfo.TypeOf(k)) == classFloat {
		// A whole-numbered float counter (the analyzer vouches).
		kText = "int(" + b.copyText(k) + ")"
	} else {
		t, err := b.arg(k, types.Typ[types.Int])
		if err != nil {
			return err
		}
		kText = t
	}
	lText, err := b.arg(m.Args[1], types.Typ[types.Float64])
	if err != nil {
		return err
	}
	call, err := b.result(b.helper(as.Pos())+".PoissonTerm("+kText+", "+lText+")", types.Typ[types.Float64], m.Result)
	if err != nil {
		return err
	}
	b.replace(as.Pos(), as.End(), b.copyText(as.Lhs[0])+" = "+call)
	b.shown = call
	b.message = b.rewriteMessage() + " in place of the running update of " + m.Acc.Name()
	return nil
}
