package thresholds

import (
	"go/types"
	"math/big"
	"testing"
)

// a000142 holds 0! … 20!, OEIS A000142 (from memory; each entry is
// also checked against math/big below).
var a000142 = []string{
	"1", "1", "2", "6", "24", "120", "720", "5040", "40320", "362880",
	"3628800", "39916800", "479001600", "6227020800", "87178291200",
	"1307674368000", "20922789888000", "355687428096000",
	"6402373705728000", "121645100408832000", "2432902008176640000",
}

func TestFactorialValues(t *testing.T) {
	for n, s := range a000142 {
		want, _ := new(big.Int).SetString(s, 10)
		if got := factorial(int64(n)); got.Cmp(want) != 0 {
			t.Errorf("%d! = %v, want %s (OEIS A000142)", n, got, s)
		}
		// big.Int.MulRange is the standard library's own product.
		if mr := new(big.Int).MulRange(1, int64(n)); n > 0 && mr.Cmp(want) != 0 {
			t.Errorf("MulRange(1, %d) = %v, want %s", n, mr, s)
		}
	}
}

func TestFactorialThresholds(t *testing.T) {
	// Largest n with n! fitting each type: checked with math/big in
	// TestFactorialAgainstBig; the numbers are common practice
	// (20! < 2^63 < 21!, 170! < MaxFloat64 < 171!).
	tests := []struct {
		name     string
		arch     string
		firstBad int64
	}{
		{"int8", "amd64", 6}, {"uint8", "amd64", 6},
		{"int16", "amd64", 8}, {"uint16", "amd64", 9},
		{"int32", "amd64", 13}, {"uint32", "amd64", 13},
		{"int64", "amd64", 21}, {"uint64", "amd64", 21},
		{"int", "amd64", 21}, {"uint", "amd64", 21}, {"uintptr", "amd64", 21},
		{"int", "386", 13}, {"uint", "386", 13}, {"uintptr", "386", 13},
		{"float32", "amd64", 35}, {"float64", "amd64", 171},
	}
	for _, tt := range tests {
		n := mustNamed(t, tt.name, types.SizesFor("gc", tt.arch))
		l := Factorial(n)
		if l.FirstBad != tt.firstBad {
			t.Errorf("Factorial(%s/%s).FirstBad = %d, want %d", tt.name, tt.arch, l.FirstBad, tt.firstBad)
		}
	}
}

// TestFactorialAgainstBig checks the defining property of each limit
// with math/big: (FirstBad−1)! ≤ max < FirstBad!.
func TestFactorialAgainstBig(t *testing.T) {
	for _, arch := range []string{"amd64", "386"} {
		for _, n := range All(types.SizesFor("gc", arch)) {
			l := Factorial(n)
			max := n.MaxInt()
			below := new(big.Int).MulRange(1, l.FirstBad-1)
			at := new(big.Int).MulRange(1, l.FirstBad)
			if below.Cmp(max) > 0 || at.Cmp(max) <= 0 {
				t.Errorf("%s/%s: (%d)! = %v, (%d)! = %v, max %v", n, arch, l.FirstBad-1, below, l.FirstBad, at, max)
			}
			if l.LastGood.Cmp(below) != 0 {
				t.Errorf("%s: LastGood = %v, want %v", n, l.LastGood, below)
			}
		}
	}
}

func TestLastGoodApprox(t *testing.T) {
	// 20! = 2432902008176640000 (OEIS A000142); 5! = 120; 7! = 5040.
	tests := []struct {
		name string
		want string
	}{
		{"int64", "2.43e18"},
		{"int8", "120"},
		{"int16", "5.04e3"},
		{"float64", "7.26e306"}, // 170! ≈ 7.257415615e306 (common practice)
	}
	for _, tt := range tests {
		if got := Factorial(mustNamed(t, tt.name, nil)).LastGoodApprox(); got != tt.want {
			t.Errorf("Factorial(%s).LastGoodApprox() = %q, want %q", tt.name, got, tt.want)
		}
	}
	if got := (Limit{}).LastGoodApprox(); got != "none" {
		t.Errorf("empty Limit approx = %q", got)
	}
}

func TestLimitIsCopied(t *testing.T) {
	n := mustNamed(t, "int64", nil)
	l := Factorial(n)
	l.LastGood.SetInt64(0)
	if Factorial(n).LastGood.Sign() == 0 {
		t.Error("caller changed the cached LastGood")
	}
}

// a006882 holds 0!! … 15!!, OEIS A006882 (from memory).
var a006882 = []int64{1, 1, 2, 3, 8, 15, 48, 105, 384, 945, 3840, 10395, 46080, 135135, 645120, 2027025}

func TestDoubleFactorial(t *testing.T) {
	for n, want := range a006882 {
		if got := doubleFactorial(int64(n)); got.Int64() != want {
			t.Errorf("%d!! = %v, want %d (OEIS A006882)", n, got, want)
		}
	}
	// 33!! = 6332659870762850625 < 2^63−1 < 34!! (math/big, checked by
	// the brute-force test as well).
	if got := DoubleFactorial(mustNamed(t, "int64", nil)).FirstBad; got != 34 {
		t.Errorf("DoubleFactorial(int64) = %d, want 34", got)
	}
}

func TestFloatExact(t *testing.T) {
	// A float represents n! exactly when the odd part of n! has at most
	// 53 (float64) or 24 (float32) bits (IEEE 754 significand widths).
	// 22! = 2^19 · 2143861251406875 (51 bits), 23! adds a factor 23.
	tests := []struct {
		name string
		want int64
	}{
		{"float64", 23},
		{"float32", 14},
		{"int64", 21},
		{"int8", 6},
	}
	for _, tt := range tests {
		if got := FloatExact(mustNamed(t, tt.name, nil)).FirstBad; got != tt.want {
			t.Errorf("FloatExact(%s) = %d, want %d", tt.name, got, tt.want)
		}
	}
	// The same property by conversion: float64(n!) converts back to n!
	// exactly below the limit and not at it.
	f64 := mustNamed(t, "float64", nil)
	for n := int64(1); n <= 30; n++ {
		x := new(big.Int).MulRange(1, n)
		f, _ := new(big.Float).SetInt(x).Float64()
		back, _ := new(big.Float).SetFloat64(f).Int(nil)
		exact := back.Cmp(x) == 0
		if want := n < FloatExact(f64).FirstBad; exact != want {
			t.Errorf("float64(%d!) exact = %v, want %v", n, exact, want)
		}
	}
}
