package ranges

import "go/ast"

// Test-only exports: queries the tests ask of an analysis and interval
// operations they check by brute force, which the analyzer does not use.

// Reachable reports whether n can execute.
func (f *Func) Reachable(n ast.Node) bool {
	if n == nil || f.body == nil {
		return true
	}
	if e, ok := n.(ast.Expr); ok {
		if _, ok := f.exprs[e]; ok {
			return true
		}
	}
	_, reached := f.locate(n)
	return reached
}

// Div returns {x/y : x ∈ r, y ∈ s, y ≠ 0} with Go's truncating
// division, saturating.
//
// Special cases are:
//
//	r.Div([0, 0]) = empty (division by zero panics)
func (r Interval) Div(s Interval) Interval {
	q, _ := divideOK(r, s, true)
	return q
}

// Rem returns {x%y : x ∈ r, y ∈ s, y ≠ 0} with Go's truncated remainder.
//
// Special cases are:
//
//	r.Rem([0, 0]) = empty (division by zero panics)
func (r Interval) Rem(s Interval) Interval { return remainder(r, s) }
