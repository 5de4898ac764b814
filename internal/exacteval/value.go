package exacteval

import (
	"go/constant"
	"go/types"
	"math/big"
)

// Values the evaluator holds, by Go type:
//
//	integers        *big.Int (never wrapped)
//	floats          *big.Float at Prec bits (never mutated once made)
//	booleans        bool
//	strings         string
//	structs         Struct (a value: copied on load and store)
//	arrays          array
//	slices          slice
//	pointers        *any
//	functions       *closure
//	a float NaN     NaN
//	results of fmt, errors and strconv calls: opaque
type (
	// Struct is a struct value, one element per field.
	Struct []any
	array  []any
	slice  struct {
		arr           []any
		off, len, cap int
	}
	tuple   []any
	closure struct {
		fn   any // *ssa.Function
		env  []any
		recv any // a bound method's receiver, if any
	}
	opaque struct{}
	// NaN is a float with no real value: math.NaN(), 0/0, ∞−∞, the log
	// of a negative, Γ at a pole; what IEEE 754 arithmetic gives there too.
	NaN struct{}
)

// Int returns an integer argument.
func Int(v int64) *big.Int { return big.NewInt(v) }

// Float returns a float argument.
func Float(v float64) *big.Float { return new(big.Float).SetPrec(Prec).SetFloat64(v) }

// Pointer returns a pointer to v, for a pointer receiver.
func Pointer(v any) *any { return &v }

// zero is the zero value of t.
func zero(t types.Type) any {
	switch u := t.Underlying().(type) {
	case *types.Basic:
		switch {
		case u.Info()&types.IsInteger != 0:
			return new(big.Int)
		case u.Info()&types.IsFloat != 0:
			return new(big.Float).SetPrec(Prec)
		case u.Info()&types.IsBoolean != 0:
			return false
		case u.Info()&types.IsString != 0:
			return ""
		}
		return nil
	case *types.Struct:
		s := make(Struct, u.NumFields())
		for i := range s {
			s[i] = zero(u.Field(i).Type())
		}
		return s
	case *types.Array:
		a := make(array, u.Len())
		for i := range a {
			a[i] = zero(u.Elem())
		}
		return a
	}
	return nil
}

// clone copies a composite value, so that a stored struct or array is
// not shared with the one it was copied from.
func clone(v any) any {
	switch v := v.(type) {
	case Struct:
		c := make(Struct, len(v))
		for i, e := range v {
			c[i] = clone(e)
		}
		return c
	case array:
		c := make(array, len(v))
		for i, e := range v {
			c[i] = clone(e)
		}
		return c
	}
	return v
}

// store writes v into the cell p. A struct or array already in the
// cell is overwritten in place, so that pointers to its fields and
// elements see the new value, as in Go.
func store(p *any, v any) {
	switch old := (*p).(type) {
	case Struct:
		if nv, ok := v.(Struct); ok && len(nv) == len(old) {
			for i := range old {
				storeElem(&old[i], nv[i])
			}
			return
		}
	case array:
		if nv, ok := v.(array); ok && len(nv) == len(old) {
			for i := range old {
				storeElem(&old[i], nv[i])
			}
			return
		}
	}
	*p = clone(v)
}

func storeElem(p *any, v any) { store(p, v) }

func isInteger(t types.Type) bool {
	b, ok := t.Underlying().(*types.Basic)
	return ok && b.Info()&types.IsInteger != 0
}

func isFloat(t types.Type) bool {
	b, ok := t.Underlying().(*types.Basic)
	return ok && b.Info()&types.IsFloat != 0
}

func isUnsigned(t types.Type) bool {
	b, ok := t.Underlying().(*types.Basic)
	return ok && b.Info()&types.IsUnsigned != 0
}

// constValue converts a constant of type t.
func constValue(v constant.Value, t types.Type) (any, error) {
	if v == nil {
		return zero(t), nil
	}
	switch {
	case isInteger(t):
		i := constant.ToInt(v)
		if i.Kind() != constant.Int {
			return nil, skipf("constant %s", v)
		}
		switch x := constant.Val(i).(type) {
		case int64:
			return big.NewInt(x), nil
		case *big.Int:
			return new(big.Int).Set(x), nil
		}
	case isFloat(t):
		f := constant.ToFloat(v)
		switch x := constant.Val(f).(type) {
		case int64:
			return new(big.Float).SetPrec(Prec).SetInt64(x), nil
		case *big.Rat:
			return new(big.Float).SetPrec(Prec).SetRat(x), nil
		case *big.Float:
			return new(big.Float).SetPrec(Prec).Set(x), nil
		}
	}
	switch v.Kind() {
	case constant.Bool:
		return constant.BoolVal(v), nil
	case constant.String:
		return constant.StringVal(v), nil
	}
	return nil, skipf("constant %s of type %s", v, t)
}
