package fixes

// A factorial converted to another numeric type after it was computed,
// float64(fact(n)) of an integer fact or int64(factF(n)) of a float one,
// has already broken in its own type where the target type would still
// hold it (an int64 n! wraps at 21, a float64 holds n! up to 170). The
// conversion and the call together become the helper that computes n!
// in the target type: lgamma.Factorial for a float (exact up to 22!, the
// correctly rounded float64 beyond, +Inf from 171! on, as the target
// type itself would give), and the Must helpers for integers, which
// panic where the true n! does not fit. Where the original was right
// (below the wrap of the inner type) the value is the same: the exact n!
// converted. The helpers are the row's in shapes.go.

func buildValue(b *builder) error {
	name, err := b.pick(shapes[ShapeFactorialValue].helpers, b.m.Result)
	if err != nil {
		return err
	}
	return b.rewrite(name, b.m.Args)
}
