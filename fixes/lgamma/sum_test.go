package lgamma

import (
	"math"
	"math/big"
	"testing"
)

// naiveChoose is the multiplicative binomial as code in the wild writes
// it, r *= n; r /= d; n--: +Inf once r·n passes float64.
func naiveChoose(n, k float64) float64 {
	if k > n {
		return 0
	}
	r := 1.0
	for d := 1.0; d <= k; d++ {
		r *= n
		r /= d
		n--
	}
	return r
}

// log2Big returns log2 of a positive big.Int to float64 accuracy:
// x = m·2^e with m in [0.5, 1).
func log2Big(x *big.Int) float64 {
	m, _ := new(big.Float).SetInt(x).Float64()
	if !math.IsInf(m, 0) {
		return math.Log2(m)
	}
	f := new(big.Float).SetPrec(200).SetInt(x)
	mant := new(big.Float)
	e := f.MantExp(mant)
	mf, _ := mant.Float64()
	return float64(e) + math.Log2(mf)
}

// TestSumLogOfBinomials: log2 of Σ C(n, i) for i ≤ m, the number of
// ways to pick at most m of n, summed term by term as code does, against
// the exact sum in math/big. Past C(1030, 515) the float64 sum is +Inf;
// the Sum's Log2 stays within 1e-13 relative of the exact log2 (the
// bound the carried logarithm's few ulps allow on values near 1000),
// and where the float64 sum is finite it is math.Log2 of that sum, bit
// for bit.
func TestSumLogOfBinomials(t *testing.T) {
	for _, c := range []struct{ n, m int64 }{{20, 10}, {100, 50}, {1000, 500}, {1029, 514}, {1200, 600}, {1200, 3}, {5000, 2500}} {
		s, plain := SumOf(0), 0.0
		exact := new(big.Int)
		for i := int64(0); i <= c.m; i++ {
			v := naiveChoose(float64(c.n), float64(i))
			s = s.Add(ChooseProduct(v, float64(c.n), float64(i)))
			plain += v
			exact.Add(exact, new(big.Int).Binomial(c.n, i))
		}
		want := log2Big(exact)
		got := s.Log2()
		if math.Abs(got-want) > 1e-13*math.Abs(want) {
			t.Errorf("n=%d m=%d: Log2 %v, exact %v", c.n, c.m, got, want)
		}
		if !math.IsInf(plain, 0) && got != math.Log2(plain) {
			t.Errorf("n=%d m=%d: finite sum %v: Log2 %v, math.Log2 %v", c.n, c.m, plain, got, math.Log2(plain))
		}
		if ln := s.Log(); math.Abs(ln-want*math.Ln2) > 1e-13*math.Abs(want) {
			t.Errorf("n=%d m=%d: Log %v, exact %v", c.n, c.m, ln, want*math.Ln2)
		}
		if l10 := s.Log10(); math.Abs(l10-want*math.Log10(2)) > 1e-13*math.Abs(want) {
			t.Errorf("n=%d m=%d: Log10 %v, exact %v", c.n, c.m, l10, want*math.Log10(2))
		}
	}
}

// TestSumSpecialCases: the empty and zero sums, a negative term (no
// logarithm carried: the float64 sum's, as math.Log gives it), and the
// float64 value formed as the code forms it.
func TestSumSpecialCases(t *testing.T) {
	if got := (Sum{}).Log(); !math.IsInf(got, -1) {
		t.Errorf("empty sum: Log %v, want -Inf", got)
	}
	if got := SumOf(0).Log2(); !math.IsInf(got, -1) {
		t.Errorf("zero sum: Log2 %v, want -Inf", got)
	}
	s := SumOf(5).AddFloat(-2)
	if got := s.Log(); got != math.Log(3) {
		t.Errorf("5 − 2: Log %v, want %v", got, math.Log(3))
	}
	neg := SumOf(-1).Add(PowProduct(10, 400))
	if got := neg.Log10(); !math.IsInf(got, 1) {
		t.Errorf("−1 + 10^400 (a negative term): Log10 %v, want +Inf as math.Log10 of the float64 sum", got)
	}
	a, b := 0.1, 0.2
	if got := SumOf(a).AddFloat(b).Float64(); got != a+b {
		t.Errorf("Float64 %v, want %v", got, a+b)
	}
	// 10^400 + 10^400 = 2·10^400: log10 is 400 + log10 2.
	big2 := SumOf(0).Add(PowProduct(10, 400)).Add(PowProduct(10, 400))
	if got, want := big2.Log10(), 400+math.Log10(2); math.Abs(got-want) > 1e-13*want {
		t.Errorf("2·10^400: Log10 %v, want %v", got, want)
	}
}

// TestLnConstants checks the low parts of ln 2 and ln 10 against their
// values to 40 digits (mpmath, mp.dps = 50: ln 2 =
// 0.6931471805599453094172321214581765680755, ln 10 =
// 2.302585092994045684017991454684364207601).
func TestLnConstants(t *testing.T) {
	for _, c := range []struct {
		digits string
		hi, lo float64
	}{
		{"0.6931471805599453094172321214581765680755", math.Ln2, lnTwoLo},
		{"2.302585092994045684017991454684364207601", math.Ln10, lnTenLo},
	} {
		x, _, err := big.ParseFloat(c.digits, 10, 200, big.ToNearestEven)
		if err != nil {
			t.Fatal(err)
		}
		lo, _ := new(big.Float).Sub(x, new(big.Float).SetFloat64(c.hi)).Float64()
		if lo != c.lo {
			t.Errorf("%s: low part %v, want %v", c.digits, c.lo, lo)
		}
	}
}

// TestChooseProduct: C(n, k) carried beside a value that passed
// float64, against math/big, and v alone outside 0 ≤ k ≤ n.
func TestChooseProduct(t *testing.T) {
	p := ChooseProduct(math.Inf(1), 1100, 550).QuoFloat(1e300)
	exact, _ := new(big.Float).Quo(new(big.Float).SetInt(new(big.Int).Binomial(1100, 550)), big.NewFloat(1e300)).Float64()
	if got := p.Float64(); math.Abs(got-exact) > 1e-13*exact {
		t.Errorf("C(1100, 550)/1e300 = %v, exact %v", got, exact)
	}
	if got := ChooseProduct(7, 3, 5).Float64(); got != 7 {
		t.Errorf("k > n: %v, want the value as given", got)
	}
	if got := ChooseProduct(2.5, 4.5, 2).Float64(); got != 2.5 {
		t.Errorf("fractional n: %v, want the value as given", got)
	}
}

// TestProductLog: the logarithm of n! and of C(n, k) carried beside a
// float64 value that passed the range, against math/big (log2 of the
// exact integer), and math.Log of the value, bit for bit, where the
// value is a normal positive float64.
func TestProductLog(t *testing.T) {
	fact := func(n int64) float64 {
		r := 1.0
		for i := int64(2); i <= n; i++ {
			r *= float64(i)
		}
		return r
	}
	for _, n := range []int64{0, 1, 20, 170, 171, 500, 3000} {
		p := FactorialProduct(fact(n), float64(n))
		want := log2Big(new(big.Int).MulRange(1, max(n, 1)))
		if n == 0 {
			want = 0
		}
		if got := p.Log2(); math.Abs(got-want) > 1e-13*math.Max(1, want) {
			t.Errorf("log2 %d! = %v, exact %v", n, got, want)
		}
		if got := p.Log(); math.Abs(got-want*math.Ln2) > 1e-13*math.Max(1, want) {
			t.Errorf("ln %d! = %v, exact %v", n, got, want*math.Ln2)
		}
		if v := fact(n); !math.IsInf(v, 0) && p.Log10() != math.Log10(v) {
			t.Errorf("log10 %d!: %v, math.Log10 %v", n, p.Log10(), math.Log10(v))
		}
	}
	for _, c := range []struct{ n, k int64 }{{10, 3}, {1100, 550}, {5000, 17}, {5000, 2500}} {
		p := ChooseProduct(naiveChoose(float64(c.n), float64(c.k)), float64(c.n), float64(c.k))
		want := log2Big(new(big.Int).Binomial(c.n, c.k))
		if got := p.Log2(); math.Abs(got-want) > 1e-13*want {
			t.Errorf("log2 C(%d, %d) = %v, exact %v", c.n, c.k, got, want)
		}
	}
	if got := ProductOf(-2).Log(); !math.IsNaN(got) {
		t.Errorf("log of −2: %v, want NaN", got)
	}
	if got := ProductOf(0).Log(); !math.IsInf(got, -1) {
		t.Errorf("log of 0: %v, want −Inf", got)
	}
}
