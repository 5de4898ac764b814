package ranges

import (
	"go/constant"
	"go/types"
	"math"
)

// numKind describes how a Go type holds numbers.
type numKind struct {
	ok    bool
	float bool
	// safe is the range every value of the type fits without wrapping;
	// top is the hull of all values of the type. They differ only for
	// type parameters, whose instantiation is unknown.
	safe, top Interval
	// u64 marks 64-bit unsigned types, whose values above MaxInt64 are
	// all folded into +inf.
	u64 bool
	// mant is the number of mantissa bits of a float type.
	mant uint
}

// notNumber is the kind of a type that holds no number the analysis
// tracks, such as a type parameter with integers and floats in its type
// set: any value is possible (top is the whole line, not the zero
// interval of an unset numKind) and no range is safe from wrapping.
var notNumber = numKind{safe: Empty(), top: Top()}

// kindOf classifies t; it never panics on nil or invalid types.
func kindOf(t types.Type) numKind {
	if t == nil {
		return notNumber
	}
	if tp, ok := types.Unalias(t).(*types.TypeParam); ok {
		return paramKind(tp)
	}
	b, ok := t.Underlying().(*types.Basic)
	if !ok {
		return notNumber
	}
	return basicKind(b.Kind())
}

func basicKind(k types.BasicKind) numKind {
	signed := func(bits uint) numKind {
		r := Interval{-1 << (bits - 1), 1<<(bits-1) - 1}
		return numKind{ok: true, safe: r, top: r}
	}
	unsigned := func(bits uint) numKind {
		r := Interval{0, 1<<bits - 1}
		return numKind{ok: true, safe: r, top: r}
	}
	u64 := numKind{ok: true, safe: Interval{0, posInf}, top: Interval{0, posInf}, u64: true}
	switch k {
	case types.Int8:
		return signed(8)
	case types.Int16:
		return signed(16)
	case types.Int32:
		return signed(32)
	case types.Int, types.Int64, types.UntypedInt, types.UntypedRune:
		return numKind{ok: true, safe: Top(), top: Top()}
	case types.Uint8:
		return unsigned(8)
	case types.Uint16:
		return unsigned(16)
	case types.Uint32:
		return unsigned(32)
	case types.Uint, types.Uint64, types.Uintptr:
		return u64
	case types.Float32:
		return numKind{ok: true, float: true, safe: Top(), top: Top(), mant: 24}
	case types.Float64, types.UntypedFloat:
		return numKind{ok: true, float: true, safe: Top(), top: Top(), mant: 53}
	}
	return notNumber
}

// paramKind treats a type parameter whose type set holds only integer
// (or only float) types as a number: it may wrap as early as its
// narrowest term and reach as far as its widest.
func paramKind(tp *types.TypeParam) numKind {
	iface, ok := tp.Constraint().Underlying().(*types.Interface)
	if !ok {
		return notNumber
	}
	var terms []types.Type
	for i := 0; i < iface.NumEmbeddeds(); i++ {
		switch e := iface.EmbeddedType(i).(type) {
		case *types.Union:
			for j := 0; j < e.Len(); j++ {
				terms = append(terms, e.Term(j).Type())
			}
		default:
			terms = append(terms, e)
		}
	}
	if len(terms) == 0 {
		return notNumber
	}
	var out numKind
	for i, t := range terms {
		k := kindOf(t)
		if !k.ok || (i > 0 && k.float != out.float) {
			return notNumber
		}
		if i == 0 {
			out = k
			continue
		}
		out.safe = out.safe.Meet(k.safe)
		out.top = out.top.Join(k.top)
		out.u64 = out.u64 || k.u64
		out.mant = min(out.mant, k.mant)
	}
	return out
}

// constRange returns the range of a constant value: exact for integers
// that fit in int64, rounded outwards for floats, Top for the rest.
func constRange(v constant.Value) Interval {
	switch v.Kind() {
	case constant.Int:
		if x, exact := constant.Int64Val(v); exact {
			return Point(x)
		}
		if constant.Sign(v) > 0 {
			return Point(posInf)
		}
		return Point(negInf)
	case constant.Float:
		f, _ := constant.Float64Val(v)
		return Interval{floorB(f), ceilB(f)}
	}
	return Top()
}

// floorB and ceilB round a float outwards to an int64 bound; values
// beyond int64 and NaN become infinities.
func floorB(f float64) int64 {
	switch {
	case math.IsNaN(f):
		return negInf
	case f <= -(1 << 63):
		return negInf
	case f >= 1<<63:
		return posInf
	}
	return int64(math.Floor(f))
}

func ceilB(f float64) int64 {
	switch {
	case math.IsNaN(f):
		return posInf
	case f <= -(1 << 63):
		return negInf
	case f >= 1<<63:
		return posInf
	}
	c := math.Ceil(f)
	if c >= 1<<63 {
		return posInf
	}
	return int64(c)
}

// toFloat converts a bound to float64, infinities included.
func toFloat(v int64) float64 {
	switch v {
	case negInf:
		return math.Inf(-1)
	case posInf:
		return math.Inf(1)
	}
	return float64(v)
}
