package fixes

import (
	"errors"
	"fmt"
	"go/ast"
	"go/types"
)

// The logarithm of a float factorial or binomial function's value,
//
//	return math.Log(fact(n))      // +Inf from n = 171, where ln n! is about 710
//	return math.Log2(choose(n, k)) // +Inf once C(n, k) passes float64
//
// takes the call's value as the Product that carries its logarithm
// beside it (FactorialProduct, ChooseProduct: the code's own value, and
// ln n! or ln C(n, k)):
//
//	return lgamma.FactorialProduct(fact(n), float64(n)).Log()
//
// Product.Log is math.Log of the value wherever the value is a normal
// positive float64, so nothing right changes; outside the counts where
// the function is n! or C(n, k) (fractions, k > n) the product holds
// the value alone and Log is math.Log of it, as before.
func buildLogOfValue(b *builder) error {
	call, fn := b.callOf(asExpr(b.m.Node))
	if call == nil || len(call.Args) != 1 || !(isMath(fn, "Log") || isMath(fn, "Log2") || isMath(fn, "Log10")) {
		return errors.New("log-of-value match lacks its math.Log call")
	}
	if len(b.m.Factorials)+len(b.m.Binomials) != 1 {
		return errors.New("log-of-value match lacks its factorial or binomial call")
	}
	lp := &logProducts{b: b, set: map[types.Object]bool{}, pkg: b.helper(call.Pos()), calls: true}
	arg := ast.Unparen(call.Args[0])
	if c, ok := arg.(*ast.CallExpr); ok {
		if in := lp.sameTypeConv(c); in != nil {
			arg = ast.Unparen(in)
		}
	}
	if lp.factorialCall(arg) == nil && lp.binomialCall(arg) == nil {
		return errors.New("math.Log does not take the factorial or binomial call itself")
	}
	if !types.Identical(b.pass.TypesInfo.TypeOf(arg), types.Typ[types.Float64]) {
		return fmt.Errorf("the call's value is a %s, not a float64", b.pass.TypesInfo.TypeOf(arg))
	}
	if err := b.plainBinomials(); err != nil {
		return err
	}
	for _, f := range b.m.Factorials {
		if !b.plain(f.Arg) {
			return errors.New("the factorial's operand has effects the rewrite would repeat")
		}
	}
	if b.commentIn(call) {
		return errors.New("a comment inside the logarithm's call")
	}
	b.replace(call.Pos(), call.End(), lp.leaf(arg)+"."+fn.Name()+"()")
	b.message = fmt.Sprintf("Take the logarithm from the value's Product (%s.Product), finite where the value passes float64 (imports %s)", lp.pkg, HelperPath)
	return nil
}
