package thresholds

import (
	"go/types"
	"math"
	"math/big"
	"testing"
)

func TestLookupSizes(t *testing.T) {
	// Widths of int, uint and uintptr per target: gc uses 8 bytes on
	// amd64 and 4 bytes on 386 (common practice; go/types SizesFor).
	tests := []struct {
		arch string
		name string
		bits int
	}{
		{"amd64", "int", 64}, {"amd64", "uint", 64}, {"amd64", "uintptr", 64},
		{"386", "int", 32}, {"386", "uint", 32}, {"386", "uintptr", 32},
		{"386", "int64", 64}, {"386", "float64", 64}, {"amd64", "int8", 8},
		{"amd64", "byte", 8}, {"amd64", "rune", 32}, {"amd64", "float32", 32},
	}
	for _, tt := range tests {
		n, ok := Named(tt.name, types.SizesFor("gc", tt.arch))
		if !ok || n.Bits != tt.bits {
			t.Errorf("Named(%q, %s) = %+v, %v; want %d bits", tt.name, tt.arch, n, ok, tt.bits)
		}
	}
	if n, _ := Named("byte", nil); n.Name != "uint8" || n.Signed {
		t.Errorf("Named(byte) = %+v, want unsigned uint8", n)
	}
	if n, _ := Named("int", nil); n.Bits != 64 {
		t.Errorf("nil sizes: int has %d bits, want 64 (amd64)", n.Bits)
	}
}

func TestLookupRejects(t *testing.T) {
	tp := types.NewTypeParam(types.NewTypeName(0, nil, "T", nil), types.NewInterfaceType(nil, nil))
	named := types.NewNamed(types.NewTypeName(0, nil, "Count", nil), types.Typ[types.Uint16], nil)
	tests := []struct {
		t    types.Type
		want bool
	}{
		{types.Typ[types.UntypedInt], false},
		{types.Typ[types.UntypedFloat], false},
		{types.Typ[types.Complex128], false},
		{types.Typ[types.String], false},
		{types.Typ[types.Bool], false},
		{types.NewSlice(types.Typ[types.Int]), false},
		{tp, false},
		{named, true},
		{types.Typ[types.Float64], true},
	}
	for _, tt := range tests {
		if _, ok := Lookup(tt.t, nil); ok != tt.want {
			t.Errorf("Lookup(%v) ok = %v, want %v", tt.t, ok, tt.want)
		}
	}
	if n, _ := Lookup(named, nil); n.Name != "uint16" || n.Bits != 16 {
		t.Errorf("Lookup(named uint16) = %+v", n)
	}
	if _, ok := Named("complex64", nil); ok {
		t.Error("Named(complex64) accepted")
	}
}

func TestAllOrder(t *testing.T) {
	want := []string{"int8", "int16", "int32", "int64", "int", "uint8", "uint16", "uint32", "uint64", "uint", "uintptr", "float32", "float64"}
	all := All(nil)
	if len(all) != len(want) {
		t.Fatalf("All has %d types, want %d", len(all), len(want))
	}
	for i, n := range all {
		if n.Name != want[i] || n.String() != want[i] {
			t.Errorf("All[%d] = %v, want %s", i, n, want[i])
		}
	}
}

func TestMaxInt(t *testing.T) {
	// The limits are the math package's constants (Go specification).
	tests := []struct {
		name string
		want *big.Int
	}{
		{"int8", big.NewInt(math.MaxInt8)},
		{"int16", big.NewInt(math.MaxInt16)},
		{"int32", big.NewInt(math.MaxInt32)},
		{"int64", big.NewInt(math.MaxInt64)},
		{"uint8", big.NewInt(math.MaxUint8)},
		{"uint16", big.NewInt(math.MaxUint16)},
		{"uint32", big.NewInt(math.MaxUint32)},
		{"uint64", new(big.Int).SetUint64(math.MaxUint64)},
		{"float32", bigOf(math.MaxFloat32)},
		{"float64", bigOf(math.MaxFloat64)},
	}
	for _, tt := range tests {
		n, _ := Named(tt.name, nil)
		got := n.MaxInt()
		if got.Cmp(tt.want) != 0 {
			t.Errorf("%s.MaxInt() = %v, want %v", tt.name, got, tt.want)
		}
		got.SetInt64(0) // the caller owns the copy
		if n.MaxInt().Cmp(tt.want) != 0 {
			t.Errorf("%s.MaxInt() changed by its caller", tt.name)
		}
	}
	// (2 − 2^−52)·2^1023 = (2^53 − 1)·2^971 (IEEE 754 binary64).
	want := new(big.Int).Lsh(big.NewInt(1<<53-1), 971)
	if f, _ := Named("float64", nil); f.MaxInt().Cmp(want) != 0 {
		t.Error("float64 max is not (2^53−1)·2^971")
	}
}

func bigOf(f float64) *big.Int {
	z, _ := new(big.Float).SetFloat64(f).Int(nil)
	return z
}

// mustNamed returns the predeclared type called name on sizes.
func mustNamed(t testing.TB, name string, sizes types.Sizes) Num {
	t.Helper()
	n, ok := Named(name, sizes)
	if !ok {
		t.Fatalf("Named(%q) failed", name)
	}
	return n
}
