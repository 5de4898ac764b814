package thresholds

import (
	"math"
	"math/big"
	"testing"

	"gonum.org/v1/gonum/stat/combin"
)

// fallingRef returns n(n−1)…(n−k+1) by plain multiplication.
func fallingRef(n, k int64) *big.Int {
	p := big.NewInt(1)
	for i := int64(0); i < k; i++ {
		p.Mul(p, big.NewInt(n-i))
	}
	return p
}

func TestFallingFirstBad(t *testing.T) {
	for _, name := range []string{"int8", "uint8", "int16", "int32", "int64", "uint64", "float32", "float64"} {
		typ := mustNamed(t, name, nil)
		max := typ.MaxInt()
		for k := int64(1); k <= Factorial(typ).FirstBad+2; k++ {
			got := FallingFirstBad(typ, k)
			if got == math.MaxInt64 {
				// Nothing below 2^62 breaks: the product at 2^62 fits.
				if fallingRef(1<<62, k).Cmp(max) > 0 {
					t.Errorf("%s, k = %d: no limit reported, but (2^62)_k overflows", name, k)
				}
				continue
			}
			if got < k || fallingRef(got, k).Cmp(max) <= 0 || (got > k && fallingRef(got-1, k).Cmp(max) > 0) {
				t.Errorf("%s, k = %d: FallingFirstBad = %d fails the defining property", name, k, got)
			}
		}
	}
	i64 := mustNamed(t, "int64", nil)
	// n(n−1) ≤ 2^63−1 up to n = 3037000499·… : floor(√(2^63)) = 3037000499
	// (common practice: √(2^63) ≈ 3.037e9); n = 3037000500 gives
	// 9223372033963249500 and fits; 3037000501 does not.
	if got := FallingFirstBad(i64, 2); got != 3037000501 {
		t.Errorf("FallingFirstBad(int64, 2) = %d, want 3037000501", got)
	}
	if FallingFirstBad(i64, 1) != math.MaxInt64 || FallingFirstBad(i64, 0) != math.MaxInt64 {
		t.Error("k ≤ 1 must never break int64 below 2^62")
	}
	if got := FallingFirstBad(i64, 25); got != 25 {
		t.Errorf("FallingFirstBad(int64, 25) = %d, want 25 (25! does not fit)", got)
	}
}

// TestFallingAgainstGonum uses gonum's combin.NumPermutations, real Go
// code that multiplies n−k+1 … n in int: its result is right exactly
// when FallingFits says the product fits.
func TestFallingAgainstGonum(t *testing.T) {
	it := mustNamed(t, "int", nil)
	if it.Bits != 64 {
		t.Skip("host int is not 64-bit")
	}
	for _, nk := range [][2]int64{{20, 20}, {21, 21}, {30, 12}, {30, 13}, {30, 14}, {3037000500, 2}, {3037000501, 2}, {2097153, 3}, {2097154, 3}} {
		n, k := nk[0], nk[1]
		got := big.NewInt(int64(combin.NumPermutations(int(n), int(k))))
		if right := got.Cmp(fallingRef(n, k)) == 0; right != FallingFits(it, n, k) {
			t.Errorf("(%d)_%d: gonum right = %v, FallingFits = %v", n, k, right, FallingFits(it, n, k))
		}
	}
}

func TestRisingFirstBad(t *testing.T) {
	for _, name := range []string{"int8", "int32", "int64", "uint64", "float64"} {
		typ := mustNamed(t, name, nil)
		max := typ.MaxInt()
		for _, x := range []int64{1, 2, 3, 7, 100, 12345, 1 << 31, 1 << 40} {
			got := RisingFirstBad(typ, x)
			rising := func(n int64) *big.Int { return fallingRef(x+n-1, n) }
			if got == math.MaxInt64 {
				t.Errorf("%s, x = %d: no limit", name, x)
				continue
			}
			if rising(got).Cmp(max) <= 0 || (got > 1 && rising(got-1).Cmp(max) > 0) {
				t.Errorf("%s, x = %d: RisingFirstBad = %d fails the defining property", name, x, got)
			}
		}
	}
	i64 := mustNamed(t, "int64", nil)
	if got := RisingFirstBad(i64, 1); got != 21 {
		t.Errorf("RisingFirstBad(int64, 1) = %d, want 21 (the factorial)", got)
	}
	// x = −30: magnitudes 30, 30·29, …; 30!/16! ≈ 1.27e19 > 2^63−1 ≥ 30!/17!.
	if got := RisingFirstBad(i64, -30); got != 14 {
		t.Errorf("RisingFirstBad(int64, -30) = %d, want 14", got)
	}
	if RisingFirstBad(i64, -10) != math.MaxInt64 || RisingFirstBad(i64, 0) != math.MaxInt64 {
		t.Error("10! fits and zero products fit")
	}
}

func TestRisingHugeBase(t *testing.T) {
	// x = MaxInt64: x itself fits int64, x(x+1) does not; in float64
	// (max ≈ 2^1024) the products of x ≈ 2^63 fit up to 16 factors,
	// since 2^(63·16) < 2^1024 < 2^(63·17) (common practice).
	i64, f64 := mustNamed(t, "int64", nil), mustNamed(t, "float64", nil)
	if got := RisingFirstBad(i64, math.MaxInt64); got != 2 {
		t.Errorf("RisingFirstBad(int64, MaxInt64) = %d, want 2", got)
	}
	if got := RisingFirstBad(f64, math.MaxInt64); got != 17 {
		t.Errorf("RisingFirstBad(float64, MaxInt64) = %d, want 17", got)
	}
}

func TestFallingFitsBeyondCap(t *testing.T) {
	// (2^63−1)^16 < 2^1008 fits float64; n(n−1) for n = 2^63−1 does not
	// fit uint64 (≈ 2^126).
	f64, u64 := mustNamed(t, "float64", nil), mustNamed(t, "uint64", nil)
	if !FallingFits(f64, math.MaxInt64, 16) {
		t.Error("(MaxInt64)_16 judged not to fit float64")
	}
	if FallingFits(u64, math.MaxInt64, 2) || !FallingFits(u64, math.MaxInt64, 1) {
		t.Error("uint64 falling products near MaxInt64 misjudged")
	}
	want := fallingRef(math.MaxInt64, 16).Cmp(f64.MaxInt()) <= 0
	if !want {
		t.Error("reference: (MaxInt64)_16 exceeds MaxFloat64")
	}
}

// affineRef scans v upward by plain big.Int multiplication of the
// factors (a·v+b)(a·v+b−1)…, independent of the package's search.
func affineRef(max *big.Int, a, b, c, d, from int64) int64 {
	for v := from; v < from+5000; v++ {
		p := big.NewInt(1)
		for i := int64(0); i < c*v+d; i++ {
			p.Mul(p, big.NewInt(a*v+b-i))
		}
		if p.CmpAbs(max) > 0 {
			return v
		}
	}
	return math.MaxInt64
}

func TestFallingAffineFirstBad(t *testing.T) {
	i64 := mustNamed(t, "int64", nil)
	// (2n)!/n! = (n+1)…(2n): at n = 14 it is 3497296636753920000 and at
	// n = 15 202843204931727360000 > 2^63−1 (math/big, checked by hand
	// with the reference below).
	if got := FallingAffineFirstBad(i64, 2, 0, 1, 0); got != 15 {
		t.Errorf("int64, (n+1)…(2n): got %d, want 15", got)
	}
	tests := []struct {
		a, b, c, d int64
		from       int64 // first v with at least one factor, all positive
	}{
		{2, 0, 1, 0, 1},  // (n+1)…(2n), (2n)!/n!
		{2, 1, 1, 0, 1},  // (n+2)…(2n+1)
		{1, 0, 1, 0, 1},  // n!: the factorial itself
		{3, 0, 2, 0, 1},  // (n+1)…(3n), (3n)!/n!
		{2, 0, 2, -1, 1}, // 2…(2n), (2n)!
		{1, 5, 1, 0, 1},  // 6…(n+5), (n+5)!/5!
		{3, -2, 1, 1, 2}, // lowest factor 2n−2 ≥ 1 from n = 2
	}
	for _, tt := range tests {
		// The start is derived by hand in the table: the first v with
		// c·v+d ≥ 1 and (a−c)·v+b−d+1 ≥ 1.
		if got := FallingAffineStart(tt.a, tt.b, tt.c, tt.d); got != tt.from {
			t.Errorf("start of top %d·v%+d, count %d·v%+d: got %d, want %d", tt.a, tt.b, tt.c, tt.d, got, tt.from)
		}
	}
	for _, name := range []string{"int8", "uint8", "int16", "int32", "int64", "uint64", "float32", "float64"} {
		typ := mustNamed(t, name, nil)
		for _, tt := range tests {
			want := affineRef(typ.MaxInt(), tt.a, tt.b, tt.c, tt.d, tt.from)
			if got := FallingAffineFirstBad(typ, tt.a, tt.b, tt.c, tt.d); got != want {
				t.Errorf("%s, top %d·v%+d, count %d·v%+d: got %d, want %d", name, tt.a, tt.b, tt.c, tt.d, got, want)
			}
		}
	}
	// The first n with (n)! too large for int64 is 21 (OEIS A000142).
	if got := FallingAffineFirstBad(i64, 1, 0, 1, 0); got != 21 {
		t.Errorf("int64, n!: got %d, want 21", got)
	}
	for _, tt := range []struct{ a, b, c, d int64 }{{1, 0, 2, 0}, {1, 0, 0, 3}, {1, -1, 1, 0}} {
		if got := FallingAffineFirstBad(i64, tt.a, tt.b, tt.c, tt.d); got != math.MaxInt64 {
			t.Errorf("int64, top %d·v%+d, count %d·v%+d: got %d, want no limit", tt.a, tt.b, tt.c, tt.d, got)
		}
	}
}
