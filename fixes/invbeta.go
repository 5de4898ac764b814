package fixes

import "fmt"

// The inverse Beta function 1/B(a,b) = Γ(a+b)/(Γ(a)Γ(b)) (DLMF 5.12.1)
// normalises the Beta density. It becomes 1/lgamma.Beta(a, b) rather
// than math.Exp(-lgamma.LogBeta(a, b)): while 1/B fits float64, B is at
// least 1/MaxFloat64, at most two bits into the subnormal range, so the
// reciprocal keeps nearly full precision, and where B underflows to 0 the
// true 1/B is past MaxFloat64 and +Inf is right. The exponential instead
// scales the rounding of ln B (up to 709) into the result and overflows
// where ln(1/B) rounds above ln MaxFloat64. TestInverseBetaForm measures
// both against math/big where 1/B is largest. The replaced
// expression is itself a quotient, so the quotient 1/… fits wherever it
// stood.
func buildInverseBeta(b *builder) error {
	if classOf(b.m.Result) != classFloat {
		return fmt.Errorf("inverse beta function with non-float result %s", b.m.Result)
	}
	if err := b.covered(); err != nil {
		return err
	}
	if err := b.checkShape(); err != nil {
		return err
	}
	text, err := b.call(shapes[ShapeInverseBeta].helpers.float, b.m.Args, b.m.Result)
	if err != nil {
		return err
	}
	b.shown = "1/" + text
	// Below zero Γ is finite where lgamma.Beta is NaN: the expression as
	// written runs there (domain.go).
	if text, err = b.keepOutsideDomain(b.shown, b.m.Args); err != nil {
		return err
	}
	b.replace(b.m.Node.Pos(), b.m.Node.End(), text)
	for _, d := range b.absorbed {
		b.deleteStmt(d)
	}
	b.message = b.rewriteMessage()
	return nil
}
