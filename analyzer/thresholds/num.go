package thresholds

import (
	"go/types"
	"math"
	"math/big"
	"sync"
)

// Num describes a fixed-size numeric type as the target sees it.
type Num struct {
	Name   string // "int8" … "uint64", "int", "uint", "uintptr", "float32", "float64"
	Bits   int
	Signed bool // false for unsigned; true for floats
	Float  bool
}

// defaultSizes is used when a caller passes nil sizes; amd64 is the
// common target of go vet.
var defaultSizes = types.SizesFor("gc", "amd64")

// allKinds lists the 13 fixed-size numeric kinds in the order of All.
var allKinds = []types.BasicKind{
	types.Int8, types.Int16, types.Int32, types.Int64, types.Int,
	types.Uint8, types.Uint16, types.Uint32, types.Uint64, types.Uint, types.Uintptr,
	types.Float32, types.Float64,
}

// Lookup describes the underlying basic type of t. It reports false for
// type parameters, untyped constants, complex, boolean, string and
// non-basic types. The widths of int, uint and uintptr come from sizes,
// the sizes of the target; nil sizes means gc on amd64.
func Lookup(t types.Type, sizes types.Sizes) (Num, bool) {
	if t == nil {
		return Num{}, false
	}
	if _, ok := types.Unalias(t).(*types.TypeParam); ok {
		return Num{}, false
	}
	b, ok := t.Underlying().(*types.Basic)
	if !ok {
		return Num{}, false
	}
	return fromKind(b.Kind(), sizes)
}

// Named describes the predeclared numeric type called name ("int64",
// "byte", "float32", …).
func Named(name string, sizes types.Sizes) (Num, bool) {
	obj, ok := types.Universe.Lookup(name).(*types.TypeName)
	if !ok {
		return Num{}, false
	}
	return Lookup(obj.Type(), sizes)
}

// All describes the 13 fixed-size numeric types int8 int16 int32 int64
// int uint8 uint16 uint32 uint64 uint uintptr float32 float64, in that
// order.
func All(sizes types.Sizes) []Num {
	out := make([]Num, 0, len(allKinds))
	for _, k := range allKinds {
		n, _ := fromKind(k, sizes)
		out = append(out, n)
	}
	return out
}

func fromKind(k types.BasicKind, sizes types.Sizes) (Num, bool) {
	if sizes == nil {
		sizes = defaultSizes
	}
	// The universe types carry the canonical names: byte and rune become
	// uint8 and int32.
	b := types.Typ[k]
	var n Num
	switch k {
	case types.Int8, types.Int16, types.Int32, types.Int64, types.Int:
		n = Num{Signed: true}
	case types.Uint8, types.Uint16, types.Uint32, types.Uint64, types.Uint, types.Uintptr:
		n = Num{}
	case types.Float32, types.Float64:
		n = Num{Signed: true, Float: true}
	default:
		return Num{}, false
	}
	n.Name = b.Name()
	n.Bits = int(8 * sizes.Sizeof(b))
	return n, true
}

// String returns the type's name.
func (t Num) String() string { return t.Name }

// MaxInt returns the largest value of t as an integer: 2^(Bits−1)−1 or
// 2^Bits−1 for integer types, the largest finite value for floats. The
// result is a fresh copy the caller may modify.
func (t Num) MaxInt() *big.Int {
	return new(big.Int).Set(t.maxInt())
}

var maxCache sync.Map // Num -> *big.Int

// maxInt returns the largest value of t as an integer: 2^(Bits−1)−1 or
// 2^Bits−1 for integer types, the largest finite value for floats. It is
// shared: callers must not modify it.
func (t Num) maxInt() *big.Int {
	if v, ok := maxCache.Load(t); ok {
		return v.(*big.Int)
	}
	v, _ := maxCache.LoadOrStore(t, computeMax(t))
	return v.(*big.Int)
}

func computeMax(t Num) *big.Int {
	if t.Float {
		m, _ := new(big.Float).SetFloat64(maxFloat(t)).Int(nil)
		return m
	}
	bits := uint(t.Bits)
	if t.Signed {
		bits--
	}
	one := big.NewInt(1)
	return new(big.Int).Sub(new(big.Int).Lsh(one, bits), one)
}

// maxFloat is the largest finite value of a float type; types other than
// float32 are treated as float64.
func maxFloat(t Num) float64 {
	if t.Bits == 32 {
		return math.MaxFloat32
	}
	return math.MaxFloat64
}

// mantBits is the number of significant bits of a float type, counting
// the implicit leading bit (IEEE 754 binary32 and binary64).
func mantBits(t Num) int {
	if t.Bits == 32 {
		return 24
	}
	return 53
}

// logMax returns ln(MaxInt(t)).
func (t Num) logMax() float64 {
	if t.Float {
		return math.Log(maxFloat(t))
	}
	return logBig(t.maxInt())
}
