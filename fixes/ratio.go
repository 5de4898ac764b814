package fixes

import "errors"

// Ratios of factorials become the helper function computing the same
// quantity (the row's helpers in shapes.go): in log space for float
// results (so that n!/(k!(n-k)!) with n! = +Inf no longer yields NaN),
// and exactly for integer results, where the Must helpers panic instead
// of wrapping when the true value does not fit.
func buildRatio(b *builder) error {
	if b.m.Shape == ShapeMultinomial && len(b.m.Extra) > 0 && !b.sumIs(b.m.Extra[0], b.m.Args) {
		// n!/(k1!...km!) is a multinomial only if n = k1+...+km.
		return errors.New("multinomial whose n is not visibly the sum of its parts")
	}
	name, err := b.pick(shapes[b.m.Shape].helpers, b.m.Result)
	if err != nil {
		return err
	}
	return b.rewrite(name, b.m.Args)
}
