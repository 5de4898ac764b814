package fixes

import (
	"errors"
	"fmt"
)

// Float counts. Code that keeps counts in float64 (spreadsheet formulas,
// a factorial loop over a float counter) passes them to the shapes'
// helpers, whose counts are ints. The value is the shape's only where
// every such operand holds an integer and the operands lie in the
// shape's domain (0 ≤ k ≤ n for C(n, k)); elsewhere the original's own
// arithmetic defines it (a float factorial loop computes ⌊x⌋! for a
// fraction x, and n!/k! for k > n), and no helper computes that. So the
// rewritten expression calls the helper where the counts are integers in
// the domain, and keeps the original expression for the other inputs:
//
//	func() float64 {
//		if float64(int(n)) == n && float64(int(k)) == k && 0 <= int(k) && int(k) <= int(n) {
//			return lgamma.Choose(int(n), int(k))
//		}
//		//overfact:allow counts that are not integers in the shape's domain keep the original arithmetic
//		return fact(n) / (fact(k) * fact(n-k))
//	}()
//
// float64(int(x)) == x holds exactly for a float x that is an integer
// an int represents (NaN, ±Inf and fractions fail it; common practice).
// The directive keeps the fix idempotent: the kept expression is right
// wherever the helper branch does not run, or wrong there as before.

// floatCounts collects the float operands of one helper call.
type floatCounts struct {
	floats []countOperand
}

type countOperand struct {
	text    string // the operand's source
	conv    string // the operand converted to the helper's integer parameter
	primary bool   // the operand needs no parentheses (a name, field, call)
}

// countsKept is the reason the allow directive of a kept branch gives.
const countsKept = "counts that are not integers in the shape's domain keep the original arithmetic"

// countConds returns the tests, joined by &&, under which the call of
// the helper name on the converted operands args computes the value:
// every float count holds an integer (float64(int(k)) == k) and the
// operands lie in the helper's domain.
func (b *builder) countConds(name string, args []string) ([]string, error) {
	d, ok := domainOf(name, len(args))
	if !ok {
		return nil, fmt.Errorf("%s takes no counts", name)
	}
	if len(b.absorbed) > 0 {
		return nil, errors.New("float counts: the kept expression reads locals the rewrite deletes")
	}
	var conds []string
	seen := map[string]bool{}
	for _, c := range b.counts.floats {
		if seen[c.text] {
			continue
		}
		seen[c.text] = true
		x := c.text
		if !c.primary {
			x = "(" + x + ")"
		}
		conds = append(conds, fmt.Sprintf("float64(%s) == %s", c.conv, x))
	}
	bounds := d.bounds
	switch {
	case b.countBounds != nil:
		bounds = b.countBounds
	case d.counts != nil:
		bounds = d.counts
	}
	ops := make([]any, len(args))
	for i, a := range args {
		ops[i] = a
	}
	for _, bd := range bounds {
		conds = append(conds, bd.inside(ops))
	}
	return conds, nil
}
