package lgamma

import (
	"math"
	"math/big"
	"math/rand"
	"testing"
)

// TestProductKeepsFloat64 checks the contract that a product whose
// float64 steps stay normal is the float64 arithmetic itself, bit for
// bit: random chains of products and quotients of moderate factors.
func TestProductKeepsFloat64(t *testing.T) {
	r := rand.New(rand.NewSource(7))
	for i := 0; i < 2000; i++ {
		x := (r.Float64()*2 - 1) * math.Pow(10, float64(r.Intn(20)-10))
		p, v := ProductOf(x), x
		for j := 0; j < 20; j++ {
			y := (r.Float64()*2 - 1) * math.Pow(10, float64(r.Intn(8)-4))
			if r.Intn(2) == 0 {
				p, v = p.MulFloat(y), v*y
			} else {
				p, v = p.QuoFloat(y), v/y
			}
		}
		if got := p.Float64(); math.Float64bits(got) != math.Float64bits(v) && math.Abs(v) >= 0x1p-1022 {
			t.Fatalf("chain %d: Float64() = %v, float64 arithmetic gives %v", i, got, v)
		}
	}
	// The specials as IEEE arithmetic forms them: −1·0 is −0, and 1/−0
	// is −Inf (IEEE 754 §6.3, common practice); 0·Inf is NaN.
	if got := ProductOf(-1).MulFloat(0); !(got.Float64() == 0 && math.Signbit(got.Float64())) {
		t.Errorf("ProductOf(-1).MulFloat(0) = %v, want -0", got.Float64())
	}
	if got := ProductOf(1).Quo(ProductOf(-1).MulFloat(0)).Float64(); !math.IsInf(got, -1) {
		t.Errorf("1/(-1·0) = %v, want -Inf", got)
	}
	if got := ProductOf(0).MulFloat(math.Inf(1)).Float64(); !math.IsNaN(got) {
		t.Errorf("0·Inf = %v, want NaN", got)
	}
	// Below the normal range where the exact product is too, the
	// float64 value is kept, subnormal bits and all; brought back into
	// the range, it is not.
	if got, want := ProductOf(1e-200).MulFloat(1e-120).Float64(), 1e-200*v1e120(); math.Float64bits(got) != math.Float64bits(want) {
		t.Errorf("1e-200·1e-120 = %v, want the float64 product %v", got, want)
	}
	if got := ProductOf(1e-200).MulFloat(1e-120).MulFloat(1e300).Float64(); math.Abs(got-1e-20) > 1e-35 {
		t.Errorf("1e-200·1e-120·1e300 = %v, want 1e-20", got)
	}
	if got := PowProduct(-2, 0.5).Float64(); !math.IsNaN(got) {
		t.Errorf("PowProduct(-2, 0.5) = %v, want NaN as math.Pow", got)
	}
	if got := PowProduct(-3, 501).QuoFloat(1e200).QuoFloat(1e200).Float64(); !(got < 0) {
		t.Errorf("(-3)^501/1e400 = %v, want a negative value", got)
	}
}

// TestProductOutOfRange checks products whose parts leave float64 while
// the product does not, against math/big: a running power over two
// running factorials (the terms of the Bessel series I_n), a power and
// a Gamma value each past float64, and a product whose float64 steps
// underflow.
func TestProductOutOfRange(t *testing.T) {
	// (x/2)^(n+2k)/((n+k)!·k!) for n = 5, x = 200, k = 400, formed as
	// the series forms it: factor by factor.
	n, half, k := 5, 100.0, 400
	pw, f1, f2 := PowProduct(half, float64(n)), ProductOf(1), ProductOf(1)
	want := new(big.Float).SetPrec(refPrec).SetFloat64(math.Pow(half, float64(n)))
	wantDen := bf(1)
	for i := 2; i <= n; i++ {
		f1 = f1.MulFloat(float64(i))
		wantDen.Mul(wantDen, bf(float64(i)))
	}
	for j := 1; j <= k; j++ {
		pw = pw.MulFloat(half * half)
		f1 = f1.MulFloat(float64(n + j))
		f2 = f2.MulFloat(float64(j))
		want.Mul(want, bf(half*half))
		wantDen.Mul(wantDen, bf(float64(n+j)))
		wantDen.Mul(wantDen, bf(float64(j)))
	}
	want.Quo(want, wantDen)
	if off := relOff(pw.Quo(f1.Mul(f2)).Float64(), want); off > 1e-14 {
		t.Errorf("Bessel term k = %d: %v, want %s (math/big), relative error %.3g", k, pw.Quo(f1.Mul(f2)).Float64(), want.Text('g', 17), off)
	}
	// 1500^400/Γ(500.5): both past float64, the quotient about 1.3e146.
	l := bnew().Mul(bf(400), refLog(bf(1500)))
	wantPG := refExp(l.Sub(l, refLnGamma(bf(500.5))))
	if got := PowProduct(1500, 400).Quo(GammaProduct(500.5)).Float64(); relOff(got, wantPG) > 1e-14 {
		t.Errorf("1500^400/Γ(500.5) = %v, want %s (math/big)", got, wantPG.Text('g', 17))
	}
	// Γ(−170.5)·Γ(171.5) = −π (reflection, DLMF 5.5.3): Γ(−170.5) is
	// subnormal in float64, Γ(171.5) is +Inf.
	if got := GammaProduct(-170.5).Mul(GammaProduct(171.5)).Float64(); math.Abs(got+math.Pi) > 4e-15*math.Pi {
		t.Errorf("Γ(-170.5)·Γ(171.5) = %v, want -π (DLMF 5.5.3)", got)
	}
	// 1e-200 · 1e-200 · 1e300 · 1e150 = 1e50: the second step underflows.
	wantU := bf(1e-200)
	for _, y := range []float64{1e-200, 1e300, 1e150} {
		wantU.Mul(wantU, bf(y))
	}
	if got := ProductOf(1e-200).MulFloat(1e-200).MulFloat(1e300).MulFloat(1e150).Float64(); relOff(got, wantU) > 1e-15 {
		t.Errorf("1e-200·1e-200·1e300·1e150 = %v, want %s (math/big)", got, wantU.Text('g', 17))
	}
	// e^-750·e^700·1e30: the first factor underflows to 0 alone; the
	// product is e^-50·1e30.
	wantE := refExp(bf(-50))
	wantE.Mul(wantE, bf(1e30))
	if got := ExpProduct(-750).Mul(ExpProduct(700)).MulFloat(1e30).Float64(); relOff(got, wantE) > 1e-15 {
		t.Errorf("e^-750·e^700·1e30 = %v, want %s (math/big)", got, wantE.Text('g', 17))
	}
	// A product that is past float64 is +Inf, one below it 0.
	if got := PowProduct(10, 400).Float64(); !math.IsInf(got, 1) {
		t.Errorf("10^400 = %v, want +Inf", got)
	}
	if got := PowProduct(-10, 401).QuoFloat(1e10).Float64(); !math.IsInf(got, -1) {
		t.Errorf("(-10)^401/1e10 = %v, want -Inf", got)
	}
	if got := ProductOf(1e-300).MulFloat(1e-300).Float64(); got != 0 {
		t.Errorf("1e-300·1e-300 = %v, want 0", got)
	}
}

// TestProductBesselSeries sums I_n(x) = Σ (x/2)^(n+2k)/(k!(n+k)!) (DLMF
// 10.25.2) with its parts in running Products, as the rewritten series
// of the fixer does, against mpmath's besseli at 30 digits
// (python3 -c "import mpmath; mpmath.mp.dps=30; print(mpmath.besseli(5,200))"
// and likewise for the others): where the powers and factorials leave
// float64, the sum keeps its value.
func TestProductBesselSeries(t *testing.T) {
	for _, c := range []struct {
		n    int
		x    float64
		want float64 // mpmath.besseli(n, x)
	}{
		{5, 200, 1.91581410152368694542527678232e+85},
		{10, 20, 3540200.20901952109905289138245},
		{34, 150.5, 1.61230414974119794160610867116e+62},
		{150, 34.5, 4.09112749128605370070613330426e-77}, // 150! alone is +Inf
	} {
		half := c.x / 2
		pw := PowProduct(half, float64(c.n))
		f1 := ProductOf(1)
		for i := 2; i <= c.n; i++ {
			f1 = f1.MulFloat(float64(i))
		}
		f2 := ProductOf(1)
		sum := pw.Quo(f1).Float64()
		for k := 1; k < 400; k++ {
			pw = pw.MulFloat(half * half)
			f1 = f1.MulFloat(float64(c.n + k))
			f2 = f2.MulFloat(float64(k))
			sum += pw.Quo(f1.Mul(f2)).Float64()
		}
		if off := math.Abs(sum-c.want) / c.want; off > 1e-13 {
			t.Errorf("I_%d(%g) = %v, want %v (mpmath), relative error %.3g", c.n, c.x, sum, c.want, off)
		}
	}
}

// v1e120 keeps 1e-120 a float64 variable, so that 1e-200*v1e120() is
// float64 arithmetic, not an exact constant expression.
func v1e120() float64 { return 1e-120 }

// TestFactorialProduct checks the product of a factorial the code formed
// itself: where v is n! as float64 forms it the product keeps v bit for
// bit; past 170! (v = +Inf) a quotient that fits takes the logarithms
// (math/big: 200!/(100!·100!) = C(200, 100) ≈ 9.05e58); for a fraction or
// a negative count the product holds v alone.
func TestFactorialProduct(t *testing.T) {
	fact := func(n int) float64 {
		r := 1.0
		for i := 2; i <= n; i++ {
			r *= float64(i)
		}
		return r
	}
	for n := 0; n <= 170; n += 17 {
		if got := FactorialProduct(fact(n), float64(n)).Float64(); got != fact(n) {
			t.Errorf("FactorialProduct(%d!, %d) = %v, want the code's own %v", n, n, got, fact(n))
		}
	}
	q := FactorialProduct(fact(200), 200).Quo(FactorialProduct(fact(100), 100).Mul(FactorialProduct(fact(100), 100))).Float64()
	want := new(big.Float).SetPrec(refPrec).SetInt(new(big.Int).Binomial(200, 100))
	if off := relOff(q, want); off > 1e-14 {
		t.Errorf("200!/(100!·100!) = %v, want %s (math/big), relative error %.3g", q, want.Text('g', 17), off)
	}
	for _, n := range []float64{-1, 2.5, math.Inf(1)} {
		if got := FactorialProduct(7, n).Float64(); got != 7 {
			t.Errorf("FactorialProduct(7, %v) = %v, want 7, the value alone", n, got)
		}
	}
	if got := FactorialProduct(math.NaN(), 3).Float64(); !math.IsNaN(got) {
		t.Errorf("FactorialProduct(NaN, 3) = %v, want NaN", got)
	}
}

// TestProductSqrt checks the square root of a product against math/big's
// Float.Sqrt: where the product's float64 steps stay normal it is
// math.Sqrt of them, bit for bit; where the product leaves float64 and
// its root does not, the root of the exact product of the factors.
func TestProductSqrt(t *testing.T) {
	r := rand.New(rand.NewSource(11))
	for i := 0; i < 500; i++ {
		x, y := r.Float64()*1e150, r.Float64()*1e-100+1e-120
		if got, want := ProductOf(x).MulFloat(y).Sqrt().Float64(), math.Sqrt(x*y); math.Float64bits(got) != math.Float64bits(want) {
			t.Fatalf("√(%v·%v) = %v, math.Sqrt gives %v", x, y, got, want)
		}
	}
	fact := func(n int) float64 {
		f := 1.0
		for i := 2; i <= n; i++ {
			f *= float64(i)
		}
		return f
	}
	// 1/√(2^n·n!·√π), the normaliser of the n-th Hermite function
	// (DLMF 18.3, Table 18.3.1's h_n = √π·2^n·n!): past float64 from
	// n = 151 on in its square, not in itself (n = 151 from Python's
	// math.lgamma).
	for _, n := range []int{10, 150, 151, 170, 171, 200, 250} {
		p := ProductOf(1).Quo(PowProduct(2, float64(n)).Mul(FactorialProduct(fact(n), float64(n))).MulFloat(math.Sqrt(math.Pi)).Sqrt())
		sq := new(big.Float).SetPrec(refPrec).SetInt(new(big.Int).MulRange(1, int64(n)))
		sq.SetMantExp(sq, n)
		sq.Mul(sq, bf(math.Sqrt(math.Pi)))
		want := bnew().Quo(bf(1), bnew().Sqrt(sq))
		if off := relOff(p.Float64(), want); off > 1e-14 {
			t.Errorf("1/√(2^%d·%d!·√π) = %v, want %s (math/big), relative error %.3g", n, n, p.Float64(), want.Text('g', 17), off)
		}
	}
	// 1e-200·1e-200 underflows to 0; its root, 1e-200, does not.
	if got := ProductOf(1e-200).MulFloat(1e-200).Sqrt().Float64(); relOff(got, bnew().Sqrt(bnew().Mul(bf(1e-200), bf(1e-200)))) > 1e-15 {
		t.Errorf("√(1e-200·1e-200) = %v, want 1e-200 (math/big)", got)
	}
	// A root past float64 is +Inf: √(10^400·10^400).
	if got := PowProduct(10, 400).Mul(PowProduct(10, 400)).Sqrt().Float64(); !math.IsInf(got, 1) {
		t.Errorf("√(10^800) = %v, want +Inf", got)
	}
	if got := ProductOf(-4).Sqrt().Float64(); !math.IsNaN(got) {
		t.Errorf("√-4 = %v, want NaN (as math.Sqrt)", got)
	}
	// −1/(200!) and −1e-200·1e-200 are negative where float64 gives −0
	// (the divisor +Inf, the product below the range): their roots are
	// NaN, as math/big's Sqrt refuses a negative operand and math.Sqrt
	// answers NaN for one.
	for _, p := range []Product{ProductOf(-1).Quo(FactorialProduct(fact(200), 200)), ProductOf(-1e-200).MulFloat(1e-200)} {
		if got := p.Sqrt().Float64(); !math.IsNaN(got) {
			t.Errorf("√ of a negative product past float64 (float64 value %v) = %v, want NaN", p.v, got)
		}
	}
	// √(500!·3/500!) is √3 where float64 forms +Inf/+Inf = NaN
	// (math/big: the factorials cancel exactly).
	if got := FactorialProduct(fact(500), 500).MulFloat(3).Quo(FactorialProduct(fact(500), 500)).Sqrt().Float64(); relOff(got, bnew().Sqrt(bf(3))) > 1e-14 {
		t.Errorf("√(500!·3/500!) = %v, want √3 (math/big)", got)
	}
	if got := ProductOf(math.NaN()).MulFloat(2).Sqrt().Float64(); !math.IsNaN(got) {
		t.Errorf("√(NaN·2) = %v, want NaN", got)
	}
	if got := ProductOf(-1).MulFloat(0).Sqrt().Float64(); !(got == 0 && math.Signbit(got)) {
		t.Errorf("√-0 = %v, want -0 (as math.Sqrt)", got)
	}
}

// TestCountProductZero forms a binomial probability with a zero count,
// C(s, c)·(1 − e)^c·e^(s−c) with e = q^i and c > s, the way a rewrite
// kept as written forms it: e is math.Pow(q, i), ±Inf where q^i leaves
// float64, and the true value, computed with math/big from the exact
// q^i, is 0 with the sign of the powers. Float64 must be that zero
// where the float64 product is NaN (0·Inf); a nonzero count changes
// nothing (ProductOf's value).
func TestCountProductZero(t *testing.T) {
	for _, c := range []struct {
		s, i, c int
		q       float64
	}{{5, 1100, 100, -2.5}, {7, 200, 200, 170}, {13, 170, 1030, 171}, {3, 500, 7, -3}, {2, 3, 5, 0.5}} {
		e := math.Pow(c.q, float64(c.i))
		got := CountProduct(0).Mul(PowProduct(1-e, float64(c.c))).Mul(PowProduct(e, float64(c.s-c.c))).Float64()
		// math/big: the sign of (1 − q^i)^c·(q^i)^(s−c), both bases exact.
		be := new(big.Float).SetPrec(0).SetFloat64(1)
		for j := 0; j < c.i; j++ {
			be.Mul(be, big.NewFloat(c.q))
		}
		one := new(big.Float).Sub(big.NewFloat(1), be)
		neg := one.Sign() < 0 && c.c%2 != 0 != (be.Sign() < 0 && (c.s-c.c)%2 != 0)
		if got != 0 || math.Signbit(got) != neg {
			t.Errorf("s=%d i=%d c=%d q=%g: CountProduct(0)·powers = %g; math/big gives %s0", c.s, c.i, c.c, c.q, got, map[bool]string{true: "-", false: "+"}[neg])
		}
	}
	if got := CountProduct(0).Mul(ProductOf(math.NaN())).Float64(); !math.IsNaN(got) {
		t.Errorf("CountProduct(0)·NaN = %g; want NaN", got)
	}
	if got, want := CountProduct(6).Mul(PowProduct(0.5, 3)).Float64(), 0.75; got != want {
		t.Errorf("CountProduct(6)·0.5³ = %g; want %g (exact)", got, want)
	}
}

// TestProductLess checks Less, and Abs before it, against the exact
// comparison of the products in math/big: the float64 factors are
// multiplied exactly (big.Float at 2000 bits holds a product of a few
// 53-bit factors without rounding), so the reference is the comparison
// the code means, not the one float64 arithmetic makes.
func TestProductLess(t *testing.T) {
	inf := math.Inf(1)
	cases := []struct {
		name       string
		p, q       []float64 // the factors, multiplied left to right
		absP, absQ bool
	}{
		{"normal values", []float64{2}, []float64{3}, false, false},
		{"normal values, reversed", []float64{3}, []float64{2}, false, false},
		{"equal values", []float64{0.1, 3}, []float64{0.1, 3}, false, false},
		{"a term below a sum past float64 scaled back", []float64{1e305}, []float64{1e300, 1e20, 1e-16}, false, false},
		{"a term past float64 below a scaled sum past it", []float64{1e300, 1e10}, []float64{1e300, 1e30, 1e-16}, false, false},
		{"both past float64", []float64{1e300, 1e300}, []float64{1e300, 1e305}, false, false},
		{"both past float64, reversed", []float64{1e300, 1e305}, []float64{1e300, 1e300}, false, false},
		{"below the normal range", []float64{1e-200, 1e-200}, []float64{1e-200, 1e-190}, false, false},
		{"zero below a product that underflows", []float64{0}, []float64{1e-200, 1e-200}, false, false},
		{"negative past float64 below one", []float64{-1e300, 1e300}, []float64{1}, false, false},
		{"one below a negative past float64", []float64{1}, []float64{-1e300, 1e300}, false, false},
		{"two negatives past float64", []float64{-1e300, 1e305}, []float64{-1e300, 1e300}, false, false},
		{"the magnitude of a negative past float64", []float64{-1e300, 1e300}, []float64{1e300, 1e305}, true, false},
		{"a negative term's magnitude against a sum", []float64{-1e305}, []float64{1e300, 1e20, 1e-16}, true, true},
		{"infinite factors", []float64{inf}, []float64{1e300, 1e300}, false, false},
	}
	product := func(fs []float64, abs bool) (Product, *big.Float) {
		p, x := ProductOf(fs[0]), new(big.Float).SetPrec(2000)
		x.SetFloat64(fs[0])
		for _, f := range fs[1:] {
			p = p.MulFloat(f)
			x.Mul(x, new(big.Float).SetPrec(2000).SetFloat64(f))
		}
		if abs {
			p = p.Abs()
			x.Abs(x)
		}
		return p, x
	}
	for _, c := range cases {
		p, x := product(c.p, c.absP)
		q, y := product(c.q, c.absQ)
		if got, want := p.Less(q), x.Cmp(y) < 0; got != want {
			t.Errorf("%s: Less = %v, math/big says %v", c.name, got, want)
		}
	}
	// Where both values are normal float64s, Less is the float64
	// comparison itself; a NaN compares false either way.
	nan := ProductOf(math.NaN())
	if nan.Less(ProductOf(1)) || ProductOf(1).Less(nan) {
		t.Error("a NaN product compares less")
	}
	r := rand.New(rand.NewSource(11))
	for i := 0; i < 1000; i++ {
		a, b := (r.Float64()*2-1)*1e10, (r.Float64()*2-1)*1e10
		if got := ProductOf(a).Less(ProductOf(b)); got != (a < b) {
			t.Fatalf("ProductOf(%v).Less(ProductOf(%v)) = %v, want %v", a, b, got, a < b)
		}
	}
}
