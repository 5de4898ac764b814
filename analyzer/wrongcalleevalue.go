package analyzer

import (
	"go/ast"
	"go/types"
)

// What a wrong callee's value becomes in its callers, beside
// wrongcallee.go: which functions' values are wrong only where they
// leave their type, and which calls carry a value into a string.

// valueLeaves reports whether a finding of cat in fn makes fn's value
// wrong only where the true value leaves the result type too: a product
// loop or recursion (leavesType), or any finding of a factorial-valued
// function but a ratio of factorials, whose numerator is larger than its
// value (n!/(k!(n−k)!) wraps from n = 21 where C(n, k) fits up to n = 66
// at k = n/2) and whose finding states the first bad value of each
// argument. A multiplicative loop's product passes its value too, but
// its finding states no threshold of k, which a caller could not rule
// out: it is left as leaving its type.
func (c *checker) valueLeaves(fn *types.Func, cat string) bool {
	if leavesType(cat) {
		return true
	}
	return c.funcs[fn] != nil && cat != catRatio
}

// formatsValue reports whether call renders its arguments as text, as
// they are: fmt's Sprint family and strconv's formatting of one number.
// A wrong number shows as the same wrong number in the string.
func (c *checker) formatsValue(call *ast.CallExpr) bool {
	fn := c.calleeOf(call)
	if fn == nil || fn.Pkg() == nil {
		return false
	}
	switch fn.Pkg().Path() + "." + fn.Name() {
	case "fmt.Sprintf", "fmt.Sprint", "fmt.Sprintln", "strconv.Itoa", "strconv.FormatInt", "strconv.FormatUint", "strconv.FormatFloat":
		return true
	}
	return false
}

// carriesFormatted reports whether a formatting call renders call's
// value, or a carrier's, among its arguments.
func (f *resultFlow) carriesFormatted(e *ast.CallExpr, call *ast.CallExpr, vars map[types.Object]bool) bool {
	if !f.fc.c.formatsValue(e) {
		return false
	}
	for _, a := range e.Args {
		if f.carries(a, call, vars) {
			return true
		}
	}
	return false
}

// storedRoot returns the variable a store to l writes into: the root of
// a field selection (out.X), as ranges.RootIdent finds it, or of an
// element of a slice, array or map (p[n], out.W[i]), which holds the
// value stored as the variable returned does.
func storedRoot(l ast.Expr) (*ast.Ident, bool) {
	for {
		switch x := ast.Unparen(l).(type) {
		case *ast.IndexExpr:
			l = x.X
		case *ast.SelectorExpr:
			l = x.X
		case *ast.Ident:
			return x, true
		default:
			return nil, false
		}
	}
}
