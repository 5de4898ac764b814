package lgamma

import (
	"math"
	"math/big"
	"testing"
)

// Exact integer results against math/big and OEIS.

func TestFactorialExact(t *testing.T) {
	// OEIS A000142: 20! = 2432902008176640000, the last in int64 and uint64.
	if got := MustFactorialInt64(20); got != 2432902008176640000 {
		t.Errorf("20! = %d, want 2432902008176640000 (OEIS A000142)", got)
	}
	for n := int64(0); n <= 25; n++ {
		want := new(big.Int).MulRange(1, n) // math/big reference
		if n == 0 {
			want.SetInt64(1)
		}
		got, ok := FactorialInt64(n)
		if fits := want.IsInt64(); ok != fits || (ok && got != want.Int64()) {
			t.Errorf("FactorialInt64(%d) = %d, %v; want %v, fits %v", n, got, ok, want, fits)
		}
		gotU, okU := FactorialUint64(uint64(n))
		if fits := want.IsUint64(); okU != fits || (okU && gotU != want.Uint64()) {
			t.Errorf("FactorialUint64(%d) = %d, %v; want %v, fits %v", n, gotU, okU, want, fits)
		}
	}
	// Factorial is n! correctly rounded for every n ≤ 170 (math/big).
	f := big.NewInt(1)
	for n := 0; n <= 171; n++ {
		if n > 1 {
			f.Mul(f, big.NewInt(int64(n)))
		}
		want, _ := new(big.Float).SetInt(f).Float64()
		if got := Factorial(n); got != want {
			t.Errorf("Factorial(%d) = %g, want %g", n, got, want)
		}
	}
}

func TestChooseExact(t *testing.T) {
	// Every C(n,k) with n ≤ 70 against big.Int.Binomial: the exact forms
	// must be right when the result fits and report false when not, and
	// Choose must be the correctly rounded value.
	for n := int64(0); n <= 70; n++ {
		for k := int64(-1); k <= n+1; k++ {
			want := new(big.Int).Binomial(n, k)
			if k < 0 || k > n {
				want.SetInt64(0)
			}
			got, ok := ChooseInt64(n, k)
			if fits := want.IsInt64(); ok != fits || (ok && got != want.Int64()) {
				t.Errorf("ChooseInt64(%d, %d) = %d, %v; want %v", n, k, got, ok, want)
			}
			if k >= 0 {
				gotU, okU := ChooseUint64(uint64(n), uint64(k))
				if fits := want.IsUint64(); okU != fits || (okU && gotU != want.Uint64()) {
					t.Errorf("ChooseUint64(%d, %d) = %d, %v; want %v", n, k, gotU, okU, want)
				}
			}
			wf, _ := new(big.Float).SetInt(want).Float64()
			if got := Choose(int(n), int(k)); got != wf {
				t.Errorf("Choose(%d, %d) = %g, want %g", n, k, got, wf)
			}
		}
	}
	// Large n, small k, where the intermediate r·(n−k+i) exceeds 64 bits
	// although the result fits.
	for _, c := range [][2]int64{{1 << 62, 1}, {3037000499, 2}, {4294967296, 2}, {2097151, 3}, {1 << 32, 3}, {100000, 5}, {5000, 8}} {
		want := new(big.Int).Binomial(c[0], c[1])
		got, ok := ChooseInt64(c[0], c[1])
		if fits := want.IsInt64(); ok != fits || (ok && got != want.Int64()) {
			t.Errorf("ChooseInt64(%d, %d) = %d, %v; want %v", c[0], c[1], got, ok, want)
		}
	}
}

func TestFallingExact(t *testing.T) {
	for _, n := range []int64{0, 1, 5, 20, 21, 30, 100, 3037000499, 1 << 40} {
		for k := int64(0); k <= 25 && k <= n+1; k++ {
			want := big.NewInt(0)
			if k <= n {
				want.MulRange(n-k+1, n) // math/big reference
				if k == 0 {
					want.SetInt64(1)
				}
			}
			got, ok := FallingInt64(n, k)
			if fits := want.IsInt64(); ok != fits || (ok && got != want.Int64()) {
				t.Errorf("FallingInt64(%d, %d) = %d, %v; want %v", n, k, got, ok, want)
			}
			gotU, okU := FallingUint64(uint64(n), uint64(k))
			if fits := want.IsUint64(); okU != fits || (okU && gotU != want.Uint64()) {
				t.Errorf("FallingUint64(%d, %d) = %d, %v; want %v", n, k, gotU, okU, want)
			}
			if n < 1<<31 {
				wf, _ := new(big.Float).SetInt(want).Float64()
				if got := Falling(int(n), int(k)); got != wf {
					t.Errorf("Falling(%d, %d) = %g, want %g", n, k, got, wf)
				}
			}
		}
	}
}

func TestCatalanExact(t *testing.T) {
	// OEIS A000108, first terms (from memory), then math/big C(2n,n)/(n+1).
	a000108 := []int64{1, 1, 2, 5, 14, 42, 132, 429, 1430, 4862, 16796, 58786, 208012, 742900, 2674440, 9694845}
	for n, want := range a000108 {
		if got := MustCatalanInt64(int64(n)); got != want {
			t.Errorf("CatalanInt64(%d) = %d, want %d (OEIS A000108)", n, got, want)
		}
	}
	for n := int64(0); n <= 40; n++ {
		want := new(big.Int).Binomial(2*n, n)
		want.Quo(want, big.NewInt(n+1))
		got, ok := CatalanInt64(n)
		if fits := want.IsInt64(); ok != fits || (ok && got != want.Int64()) {
			t.Errorf("CatalanInt64(%d) = %d, %v; want %v, fits %v", n, got, ok, want, fits)
		}
		wf, _ := new(big.Float).SetInt(want).Float64()
		if got := Catalan(int(n)); got != wf {
			t.Errorf("Catalan(%d) = %g, want %g", n, got, wf)
		}
	}
	// C₃₅ = 3116285494907301262 is the last that fits (checked above with
	// math/big); C₃₆ must be refused.
	if v, ok := CatalanInt64(35); !ok || v != 3116285494907301262 {
		t.Errorf("CatalanInt64(35) = %d, %v", v, ok)
	}
	if _, ok := CatalanInt64(36); ok {
		t.Errorf("CatalanInt64(36) reported a fit")
	}
}

func TestMultinomialExact(t *testing.T) {
	cases := [][]int64{{}, {0}, {5}, {1, 1, 1}, {3, 4, 5}, {10, 10, 10}, {2, 0, 3, 7}, {20, 1}, {12, 12, 12}, {7, 7, 7, 7}, {1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1}, {1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1}}
	for _, ks := range cases {
		// math/big reference: (Σk)!/∏k!.
		var s int64
		den := big.NewInt(1)
		for _, k := range ks {
			s += k
			den.Mul(den, new(big.Int).MulRange(1, max(k, 1)))
		}
		want := new(big.Int).MulRange(1, max(s, 1))
		want.Quo(want, den)
		got, ok := MultinomialInt64(ks...)
		if fits := want.IsInt64(); ok != fits || (ok && got != want.Int64()) {
			t.Errorf("MultinomialInt64(%v) = %d, %v; want %v", ks, got, ok, want)
		}
		ints := make([]int, len(ks))
		for i, k := range ks {
			ints[i] = int(k)
		}
		wf, _ := new(big.Float).SetInt(want).Float64()
		if got := Multinomial(ints...); got != wf {
			t.Errorf("Multinomial(%v) = %g, want %g", ks, got, wf)
		}
		if got, w := LogMultinomial(ints...), math.Log(wf); math.Abs(got-w) > 1e-15*math.Max(1, math.Abs(w)) {
			t.Errorf("LogMultinomial(%v) = %g, want %g", ks, got, w)
		}
	}
}

func TestCatalanOverflow(t *testing.T) {
	// The last finite float64 Catalan number, located with math/big.
	last := -1
	for n := int64(500); n < 530; n++ {
		c := new(big.Int).Binomial(2*n, n)
		c.Quo(c, big.NewInt(n+1))
		if f, _ := new(big.Float).SetInt(c).Float64(); !math.IsInf(f, 0) {
			last = int(n)
		}
	}
	if !math.IsInf(Catalan(last+1), 1) || math.IsInf(Catalan(last), 0) {
		t.Errorf("Catalan overflow at %d: Catalan(%d) = %g, Catalan(%d) = %g", last+1, last, Catalan(last), last+1, Catalan(last+1))
	}
}

// TestChooseLoopAgainstBig runs the multiplicative loop the helper
// stands for in math/big (no wrapping, Go's truncating division) and
// compares its value, rounded to float64 by math/big, with ChooseLoop's:
// within one ulp, as Choose is.
func TestChooseLoopAgainstBig(t *testing.T) {
	loop := func(n, k int64) *big.Int {
		c := big.NewInt(1)
		for i := int64(1); i <= k; i++ {
			c.Mul(c, big.NewInt(n-k+i))
			c.Quo(c, big.NewInt(i))
		}
		return c
	}
	for _, n := range []int64{-700, -155, -67, -30, -3, -1, 0, 1, 2, 5, 20, 21, 62, 67, 100, 171, 1030} {
		for _, k := range []int64{-5, -1, 0, 1, 2, 3, 10, 30, 34, 66, 67, 100, 171, 500} {
			want, _ := new(big.Float).SetInt(loop(n, k)).Float64()
			got := ChooseLoop(int(n), int(k))
			if got != want && !(math.Abs(got-want) <= math.Abs(want)*0x1p-52) {
				t.Errorf("ChooseLoop(%d, %d) = %g; the loop in math/big gives %g", n, k, got, want)
			}
		}
	}
}

// TestChooseOrZeroAgainstBig compares ChooseOrZero with the function it
// stands for run in math/big: 0 outside 0 ≤ k ≤ n, and there C(n, k)
// from math/big's Binomial, rounded to float64 by math/big (correctly
// rounded, as the integer converted by float64(…) is, below 2^64).
func TestChooseOrZeroAgainstBig(t *testing.T) {
	for _, n := range []int64{-700, -67, -3, -1, 0, 1, 2, 5, 20, 30, 62, 66, 67, 100, 200, 1029, 1030, 1100} {
		for _, k := range []int64{-5, -1, 0, 1, 2, 3, 10, 30, 33, 34, 66, 67, 100, 171, 500, 515, 550} {
			want := 0.0
			if 0 <= k && k <= n {
				want, _ = new(big.Float).SetInt(new(big.Int).Binomial(n, k)).Float64()
			}
			got := ChooseOrZero(int(n), int(k))
			// Below 2^64 the value must be the correctly rounded one (what
			// float64 of the exact integer gives); beyond, within one ulp.
			if got != want && (want < 0x1p64 || math.Abs(got-want) > want*0x1p-52) {
				t.Errorf("ChooseOrZero(%d, %d) = %g; math/big gives %g", n, k, got, want)
			}
		}
	}
}
