package fixes

import (
	"fmt"
	"go/ast"
	"go/types"
)

// An integer binomial function's value converted to float64,
// float64(choose(n, k)), says the caller computes in float64: the
// function's own fix (the exact helper, MustChooseInt64) panics where
// C(n, k) leaves the integer type, which float64 still holds up to
// C(1029, 514), and the caller may not even need the value there
// (C(30, 66)/C(200, 66) is 0 whatever the denominator). So the
// conversion and the call together become the float helper of the
// function's form (Match.IntBinomials): the value the function computes
// in integers that do not wrap, converted. Where the function was right
// (its value fits its type) that is the same number as before, float64
// of an integer below 2^64 rounded once; elsewhere it is the true
// count, +Inf only where float64 cannot hold it. A float32 target is
// left alone: float32 of the float64 helper would round twice where
// float32 of the integer rounds once.

// binomialFormHelpers are the float helpers of the binomial functions'
// forms: each computes what a function of that form computes without
// wrapping, for every n and k.
var binomialFormHelpers = map[BinomialForm]string{
	FormFactorials: "ChooseFactorials",
	FormLoop:       "ChooseLoop",
	FormZero:       "ChooseOrZero",
}

func buildBinomialValue(b *builder) error {
	conv, ok := b.m.Node.(*ast.CallExpr)
	if !ok || !b.isNumericConversion(conv) || !types.Identical(b.m.Result, types.Typ[types.Float64]) &&
		!types.Identical(b.m.Result.Underlying(), types.Typ[types.Float64]) {
		return fmt.Errorf("not a conversion to float64")
	}
	call, _ := ast.Unparen(conv.Args[0]).(*ast.CallExpr)
	bin, ok := b.m.IntBinomials[call]
	if !ok {
		return fmt.Errorf("the converted value is no binomial function's call of known form")
	}
	return b.replaceByCall(binomialFormHelpers[bin.Form], []ast.Expr{bin.N, bin.K})
}
