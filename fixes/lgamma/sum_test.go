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

// TestSumProductBinomialTail: the two-sided sign test's tail,
// 2·Σ_{i<m} C(n, i)·0.5^n, the binomial running product c = c·(n−i)/(i+1)
// summed as code forms it and scaled after the loop. Past C(1030, 515)
// the float64 sum is +Inf and the scaled value NaN or +Inf; carried as a
// Sum, the sum's Product times PowProduct(0.5, n) is within 1e-12
// relative of the exact tail (math/big: the sum of the integer
// binomials, each from the one before, times 2^(1−n), exact in a
// big.Float), and bit for bit the float64 value where the sum stays
// finite.
func TestSumProductBinomialTail(t *testing.T) {
	for _, c := range []struct{ n, m int64 }{{20, 6}, {100, 40}, {600, 100}, {1100, 500}, {2000, 1000}, {5000, 2400}} {
		s, c64, plain := SumOf(0), ProductOf(1), 0.0
		cf := 1.0
		exact, ck := new(big.Int), big.NewInt(1)
		for i := int64(0); i < c.m; i++ {
			s = s.Add(c64)
			plain += cf
			exact.Add(exact, ck)
			c64 = c64.MulFloat(float64(c.n - i)).QuoFloat(float64(i + 1))
			cf = cf * float64(c.n-i) / float64(i+1)
			ck.Mul(ck, big.NewInt(c.n-i)).Quo(ck, big.NewInt(i+1))
		}
		got := ProductOf(2).Mul(s.Product()).Mul(PowProduct(0.5, float64(c.n))).Float64()
		e := new(big.Float).SetPrec(200).SetInt(exact)
		want, _ := e.SetMantExp(e, int(1-c.n)).Float64()
		if math.Abs(got-want) > 1e-12*want {
			t.Errorf("n=%d m=%d: tail %v, exact %v", c.n, c.m, got, want)
		}
		if p := 2 * plain * math.Pow(0.5, float64(c.n)); !math.IsInf(plain, 0) && got != p {
			t.Errorf("n=%d m=%d: finite sum: %v, float64 arithmetic %v", c.n, c.m, got, p)
		}
	}
}

// TestSumProductRatio: Erlang's C formula's ratio last/(sum + last), the
// terms a^k/k! carried as one running Product (t = t·a/(k+1)) and summed,
// against the same running term and sum in 300-bit big.Float (the ratio
// itself near 1 where a is near c). Where the float64 running term
// passes float64 (a = 800, c = 720) the ratio is NaN in float64 and
// within 1e-12 of the exact one here; where it stays in range the value
// is the float64 arithmetic's own, bit for bit.
func TestSumProductRatio(t *testing.T) {
	for _, c := range []struct {
		a float64
		c int
	}{{5, 8}, {60, 70}, {150, 160}, {800, 720}, {1000, 1200}, {3000, 2900}} {
		s, term, plain, tf := SumOf(0), ProductOf(1), 0.0, 1.0
		bs, bt := new(big.Float).SetPrec(300), new(big.Float).SetPrec(300).SetInt64(1)
		ba := new(big.Float).SetPrec(300).SetFloat64(c.a)
		for k := 0; k < c.c; k++ {
			s = s.Add(term)
			plain += tf
			bs.Add(bs, bt)
			term = term.Mul(ProductOf(c.a / float64(k+1)))
			tf *= c.a / float64(k+1)
			bt.Mul(bt, ba).Quo(bt, new(big.Float).SetPrec(300).SetInt64(int64(k+1)))
		}
		got := term.Quo(s.Add(term).Product()).Float64()
		den := new(big.Float).SetPrec(300).Add(bs, bt)
		want, _ := new(big.Float).SetPrec(300).Quo(bt, den).Float64()
		// The helper multiplies by the rounded a/(k+1) as the code does;
		// the reference divides exactly: 1e-12 covers c roundings.
		if math.Abs(got-want) > 1e-12*want {
			t.Errorf("a=%v c=%d: ratio %v, exact %v", c.a, c.c, got, want)
		}
		if p := tf / (plain + tf); !math.IsInf(plain+tf, 0) && !math.IsNaN(p) && got != p {
			t.Errorf("a=%v c=%d: finite sum: %v, float64 arithmetic %v", c.a, c.c, got, p)
		}
	}
}

// TestSumProductSpecialCases: the empty sum, a sum with a negative term
// (the float64 sum alone), and a normal sum (its float64 value).
func TestSumProductSpecialCases(t *testing.T) {
	if got := (Sum{}).Product().Float64(); got != 0 {
		t.Errorf("empty sum: %v, want 0", got)
	}
	neg := SumOf(-1).Add(PowProduct(10, 400))
	if got := neg.Product().QuoFloat(1e300).Float64(); !math.IsInf(got, 1) {
		t.Errorf("−1 + 10^400 over 1e300 (a negative term): %v, want +Inf as the float64 sum gives", got)
	}
	a, b := 0.1, 0.2
	if got := SumOf(a).AddFloat(b).Product().MulFloat(3).Float64(); got != (a+b)*3 {
		t.Errorf("(0.1 + 0.2)·3 = %v, want %v", got, (a+b)*3)
	}
}
