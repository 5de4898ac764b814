package fixes

import "errors"

// Ratios of factorials become the helper function computing the same
// quantity: in log space for float results (so that n!/(k!(n-k)!) with
// n! = +Inf no longer yields NaN), and exactly for integer results, where
// the Must helpers panic instead of wrapping when the true value does not
// fit. The identities are common practice: C(n,k) = n!/(k!(n-k)!),
// n!/(n-k)! = n(n-1)...(n-k+1), the multinomial n!/(k1!...km!) with
// n = k1+...+km, and the Catalan number (2n)!/((n+1)!n!).
var ratioFamilies = map[Shape]family{
	ShapeBinomial:    {"Choose", "MustChooseInt64", "MustChooseUint64"},
	ShapePermutation: {"Falling", "MustFallingInt64", "MustFallingUint64"},
	ShapeMultinomial: {"Multinomial", "MustMultinomialInt64", ""},
	ShapeCatalan:     {"Catalan", "MustCatalanInt64", ""},
}

func buildRatio(b *builder) error {
	if b.m.Shape == ShapeMultinomial && len(b.m.Extra) > 0 && !b.sumIs(b.m.Extra[0], b.m.Args) {
		// n!/(k1!...km!) is a multinomial only if n = k1+...+km.
		return errors.New("multinomial whose n is not visibly the sum of its parts")
	}
	name, err := b.pick(ratioFamilies[b.m.Shape], b.m.Result)
	if err != nil {
		return err
	}
	return b.rewrite(name, b.m.Args)
}
