package analyzer

import (
	"go/types"

	"github.com/overfact/overfact/analyzer/thresholds"
)

// numType is the fixed-size numeric type a factorial is computed in.
// For a type parameter it is the member of the constraint's type set
// that overflows first, and via names the parameter.
type numType struct {
	thresholds.Num
	via string // "T" when the type came from a constraint
}

// typeName returns the type as messages name it.
func (t numType) typeName() string {
	if t.via != "" {
		return t.Name + " (the narrowest type in the constraint of " + t.via + ")"
	}
	return t.Name
}

// numOf describes t, or reports false for types the analyzer does not
// handle (math/big, complex, strings, unknown types).
//
// A type parameter is described by the type in its constraint whose n!
// breaks first: an instantiation with that type is the first to
// overflow, so it decides whether the generic code is safe.
func (c *checker) numOf(t types.Type) (numType, bool) { return c.queries().numOf(t) }

// numOf returns the fixed-size numeric type of t (see checker.numOf).
func (q typeQueries) numOf(t types.Type) (numType, bool) {
	if t == nil {
		return numType{}, false
	}
	if n, ok := thresholds.Lookup(t, q.sizes); ok {
		return numType{Num: n}, true
	}
	tp, ok := types.Unalias(t).(*types.TypeParam)
	if !ok {
		return numType{}, false
	}
	iface, ok := tp.Constraint().Underlying().(*types.Interface)
	if !ok {
		return numType{}, false
	}
	var best numType
	found := false
	eachTerm(iface, 0, func(t types.Type) {
		n, ok := thresholds.Lookup(t, q.sizes)
		if !ok {
			return
		}
		if !found || thresholds.Factorial(n).FirstBad < thresholds.Factorial(best.Num).FirstBad {
			best, found = numType{Num: n, via: tp.Obj().Name()}, true
		}
	})
	return best, found
}

// eachTerm calls f for each type in the union terms of an interface and
// of the interfaces it embeds.
func eachTerm(iface *types.Interface, depth int, f func(types.Type)) {
	if depth > maxDepth {
		return
	}
	for i := 0; i < iface.NumEmbeddeds(); i++ {
		switch e := types.Unalias(iface.EmbeddedType(i)).(type) {
		case *types.Union:
			for j := 0; j < e.Len(); j++ {
				if sub, ok := e.Term(j).Type().Underlying().(*types.Interface); ok {
					eachTerm(sub, depth+1, f)
					continue
				}
				f(e.Term(j).Type())
			}
		default:
			if sub, ok := e.Underlying().(*types.Interface); ok {
				eachTerm(sub, depth+1, f)
				continue
			}
			f(e)
		}
	}
}

// verb says what going past the limit does in t.
func verb(t numType) string {
	if t.Float {
		return "overflows to +Inf"
	}
	return "wraps"
}
