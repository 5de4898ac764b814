package lgamma

import (
	"math"
	"math/big"
	"strings"
	"testing"
)

// Bad and boundary input: every special case listed in the doc comments.
// Where a mathematical value exists it is the math package convention
// (math.Lgamma, math.Pow) or the definition of the function; the rest
// are domain errors reported as NaN.

var (
	nan  = math.NaN()
	inf  = math.Inf(1)
	ninf = math.Inf(-1)
)

func same(got, want float64) bool {
	if math.IsNaN(want) {
		return math.IsNaN(got)
	}
	return got == want && math.Signbit(got) == math.Signbit(want) || got == want && want == 0
}

func refFloat(x *big.Float) float64 {
	f, _ := x.Float64()
	return f
}

func TestSpecialCases(t *testing.T) {
	tests := []struct {
		name      string
		got, want float64
	}{
		{"LogFactorial(-1)", LogFactorial(-1), nan},
		{"LogFactorial(0)", LogFactorial(0), 0},
		{"LogFactorial(1)", LogFactorial(1), 0},
		{"Factorial(-1)", Factorial(-1), nan},
		{"Factorial(0)", Factorial(0), 1},
		{"Factorial(171)", Factorial(171), inf},
		{"LogGamma(+Inf)", LogGamma(inf), inf},
		{"LogGamma(-Inf)", LogGamma(ninf), ninf},
		{"LogGamma(NaN)", LogGamma(nan), nan},
		{"LogGamma(0)", LogGamma(0), inf},
		{"LogGamma(-0)", LogGamma(math.Copysign(0, -1)), inf},
		{"LogGamma(-3)", LogGamma(-3), inf},
		{"LogGamma(1)", LogGamma(1), 0},
		{"LogGamma(MaxFloat64)", LogGamma(math.MaxFloat64), inf},              // x(ln x − 1) overflows, as in math.Lgamma
		{"LogGamma(1e305)", LogGamma(1e305), refFloat(refLnGamma(bf(1e305)))}, // math.Lgamma is 1 ulp above here
		{"GammaRatio(MaxFloat64, MaxFloat64)", GammaRatio(math.MaxFloat64, math.MaxFloat64), 1},
		{"LogBeta(MaxFloat64, MaxFloat64)", LogBeta(math.MaxFloat64, math.MaxFloat64), ninf}, // −2·MaxFloat64·ln 2
		{"LogGamma(2)", LogGamma(2), 0},
		{"LogChoose(-1, 0)", LogChoose(-1, 0), 0},
		{"LogChoose(5, -1)", LogChoose(5, -1), ninf},
		{"LogChoose(5, 6)", LogChoose(5, 6), ninf},
		{"LogChoose(5, 0)", LogChoose(5, 0), 0},
		{"LogChoose(5, 5)", LogChoose(5, 5), 0},
		{"Choose(-1, 0)", Choose(-1, 0), 1},
		{"Choose(-3, -1)", Choose(-3, -1), 0},
		{"Choose(5, -1)", Choose(5, -1), 0},
		{"Choose(5, 6)", Choose(5, 6), 0},
		{"Choose(0, 0)", Choose(0, 0), 1},
		{"Choose(2000, 1000)", Choose(2000, 1000), inf},
		{"LogFalling(-1, 0)", LogFalling(-1, 0), nan},
		{"LogFalling(5, -1)", LogFalling(5, -1), nan},
		{"LogFalling(5, 6)", LogFalling(5, 6), ninf},
		{"LogFalling(5, 0)", LogFalling(5, 0), 0},
		{"Falling(-1, 0)", Falling(-1, 0), 1},
		{"Falling(-3, 2)", Falling(-3, 2), 12},
		{"Falling(5, -1)", Falling(5, -1), nan},
		{"Falling(5, 6)", Falling(5, 6), 0},
		{"Falling(5, 0)", Falling(5, 0), 1},
		{"Falling(1000, 500)", Falling(1000, 500), inf},
		{"LogRising(2, -1)", LogRising(2, -1), nan},
		{"LogRising(NaN, 2)", LogRising(nan, 2), nan},
		{"LogRising(2, 0)", LogRising(2, 0), 0},
		{"LogRising(-3, 5)", LogRising(-3, 5), ninf},
		{"LogRising(+Inf, 2)", LogRising(inf, 2), inf},
		{"LogRising(-Inf, 3)", LogRising(ninf, 3), inf},
		{"Rising(2, -1)", Rising(2, -1), nan},
		{"Rising(NaN, 2)", Rising(nan, 2), nan},
		{"Rising(NaN, 0)", Rising(nan, 0), nan},
		{"Rising(2, 0)", Rising(2, 0), 1},
		{"Rising(-3, 5)", Rising(-3, 5), 0},
		{"Rising(-3, 3)", Rising(-3, 3), -6},
		{"Rising(0, 1)", Rising(0, 1), 0},
		{"Rising(-Inf, 3)", Rising(ninf, 3), ninf},
		{"Rising(+Inf, 3)", Rising(inf, 3), inf},
		{"LogMultinomial()", LogMultinomial(), 0},
		{"LogMultinomial(3, -1)", LogMultinomial(3, -1), nan},
		{"Multinomial()", Multinomial(), 1},
		{"Multinomial(3, -1)", Multinomial(3, -1), nan},
		{"Multinomial(0, 0)", Multinomial(0, 0), 1},
		{"Multinomial(1000, 1000)", Multinomial(1000, 1000), inf},
		{"Catalan(-1)", Catalan(-1), nan},
		{"Catalan(0)", Catalan(0), 1},
		{"Catalan(520)", Catalan(520), inf}, // C₅₁₉ ≈ 1.40e308 is the last finite (math/big, TestCatalanOverflow)
		{"Catalan(MaxInt)", Catalan(math.MaxInt), inf},
		{"LogPowOverFactorial(2, -1)", LogPowOverFactorial(2, -1), nan},
		{"LogPowOverFactorial(NaN, 1)", LogPowOverFactorial(nan, 1), nan},
		{"LogPowOverFactorial(0, 0)", LogPowOverFactorial(0, 0), 0},
		{"LogPowOverFactorial(0, 3)", LogPowOverFactorial(0, 3), ninf},
		{"LogPowOverFactorial(-Inf, 3)", LogPowOverFactorial(ninf, 3), inf},
		{"PowOverFactorial(2, -1)", PowOverFactorial(2, -1), nan},
		{"PowOverFactorial(NaN, 0)", PowOverFactorial(nan, 0), nan},
		{"PowOverFactorial(0, 0)", PowOverFactorial(0, 0), 1},
		{"PowOverFactorial(0, 3)", PowOverFactorial(0, 3), 0},
		{"PowOverFactorial(-Inf, 3)", PowOverFactorial(ninf, 3), ninf},
		{"PowOverFactorial(-2, 3)", PowOverFactorial(-2, 3), -8.0 / 6},
		{"PowOverFactorial(1e300, 2)", PowOverFactorial(1e300, 2), inf},
		{"PoissonPMF(-1, 2)", PoissonPMF(-1, 2), 0},
		{"PoissonPMF(2, -1)", PoissonPMF(2, -1), nan},
		{"PoissonPMF(2, NaN)", PoissonPMF(2, nan), nan},
		{"PoissonPMF(2, +Inf)", PoissonPMF(2, inf), nan},
		{"PoissonPMF(0, 0)", PoissonPMF(0, 0), 1},
		{"PoissonPMF(3, 0)", PoissonPMF(3, 0), 0},
		{"PoissonLogPMF(0, 2.5)", PoissonLogPMF(0, 2.5), -2.5},
		{"PoissonLogPMF(-1, 2)", PoissonLogPMF(-1, 2), ninf},
		{"PoissonLogPMF(2, -1)", PoissonLogPMF(2, -1), nan},
		{"PoissonLogPMF(3, 0)", PoissonLogPMF(3, 0), ninf},
		{"BinomialPMF(-1, 5, 0.5)", BinomialPMF(-1, 5, 0.5), 0},
		{"BinomialPMF(6, 5, 0.5)", BinomialPMF(6, 5, 0.5), 0},
		{"BinomialPMF(1, -5, 0.5)", BinomialPMF(1, -5, 0.5), nan},
		{"BinomialPMF(1, 5, -0.1)", BinomialPMF(1, 5, -0.1), nan},
		{"BinomialPMF(1, 5, 1.1)", BinomialPMF(1, 5, 1.1), nan},
		{"BinomialPMF(1, 5, NaN)", BinomialPMF(1, 5, nan), nan},
		{"BinomialPMF(0, 5, 0)", BinomialPMF(0, 5, 0), 1},
		{"BinomialPMF(1, 5, 0)", BinomialPMF(1, 5, 0), 0},
		{"BinomialPMF(5, 5, 1)", BinomialPMF(5, 5, 1), 1},
		{"BinomialPMF(4, 5, 1)", BinomialPMF(4, 5, 1), 0},
		{"BinomialPMF(0, 0, 0.3)", BinomialPMF(0, 0, 0.3), 1},
		{"BinomialLogPMF(6, 5, 0.5)", BinomialLogPMF(6, 5, 0.5), ninf},
		{"BinomialLogPMF(1, 5, 2)", BinomialLogPMF(1, 5, 2), nan},
		{"BinomialLogPMF(0, 5, 0)", BinomialLogPMF(0, 5, 0), 0},
		{"HypergeometricPMF(0, -1, 0, 0)", HypergeometricPMF(0, -1, 0, 0), nan},
		{"HypergeometricPMF(0, 10, 11, 2)", HypergeometricPMF(0, 10, 11, 2), nan},
		{"HypergeometricPMF(0, 10, -1, 2)", HypergeometricPMF(0, 10, -1, 2), nan},
		{"HypergeometricPMF(0, 10, 3, 11)", HypergeometricPMF(0, 10, 3, 11), nan},
		{"HypergeometricPMF(0, 10, 3, -1)", HypergeometricPMF(0, 10, 3, -1), nan},
		{"HypergeometricPMF(-1, 10, 3, 2)", HypergeometricPMF(-1, 10, 3, 2), 0},
		{"HypergeometricPMF(3, 10, 3, 2)", HypergeometricPMF(3, 10, 3, 2), 0},
		{"HypergeometricPMF(0, 10, 8, 5)", HypergeometricPMF(0, 10, 8, 5), 0},
		{"HypergeometricPMF(0, 0, 0, 0)", HypergeometricPMF(0, 0, 0, 0), 1},
		{"HypergeometricPMF(2, 10, 2, 10)", HypergeometricPMF(2, 10, 2, 10), 1},
		{"HypergeometricLogPMF(3, 10, 3, 2)", HypergeometricLogPMF(3, 10, 3, 2), ninf},
		{"HypergeometricLogPMF(0, 10, 11, 2)", HypergeometricLogPMF(0, 10, 11, 2), nan},
		{"GammaRatio(NaN, 1)", GammaRatio(nan, 1), nan},
		{"GammaRatio(1, NaN)", GammaRatio(1, nan), nan},
		{"GammaRatio(-Inf, 1)", GammaRatio(ninf, 1), nan},
		{"GammaRatio(+Inf, 2)", GammaRatio(inf, 2), inf},
		{"GammaRatio(+Inf, -0.5)", GammaRatio(inf, -0.5), ninf},
		{"GammaRatio(2, +Inf)", GammaRatio(2, inf), 0},
		{"GammaRatio(2, -3)", GammaRatio(2, -3), nan}, // math.Gamma(-3) is NaN
		{"GammaRatio(-3, 2)", GammaRatio(-3, 2), nan},
		{"GammaRatio(-3, -3)", GammaRatio(-3, -3), nan},
		{"GammaRatio(+Inf, +Inf)", GammaRatio(inf, inf), nan},
		{"GammaRatio(5, 3)", GammaRatio(5, 3), 12},
		{"GammaRatio(-0.5, 0.5)", GammaRatio(-0.5, 0.5), -2},
		{"GammaRatio(500, 300)", GammaRatio(500, 300), inf},
		{"LogGammaRatio(+Inf, 2)", LogGammaRatio(inf, 2), inf},
		{"LogGammaRatio(2, +Inf)", LogGammaRatio(2, inf), ninf},
		{"LogGammaRatio(2, 0)", LogGammaRatio(2, 0), ninf},
		{"LogGammaRatio(0, 2)", LogGammaRatio(0, 2), inf}, // math.Lgamma(0) is +Inf
		{"LogGammaRatio(3, 3)", LogGammaRatio(3, 3), 0},
		{"LogBeta(-1, 2)", LogBeta(-1, 2), nan},
		{"LogBeta(NaN, 2)", LogBeta(nan, 2), nan},
		{"LogBeta(0, 2)", LogBeta(0, 2), inf},
		{"LogBeta(+Inf, 2)", LogBeta(inf, 2), ninf},
		{"LogBeta(1, 1)", LogBeta(1, 1), 0},
		{"Beta(-1, 2)", Beta(-1, 2), nan},
		{"Beta(2, NaN)", Beta(2, nan), nan},
		{"Beta(0, 2)", Beta(0, 2), inf},
		{"Beta(2, +Inf)", Beta(2, inf), 0},
		{"Beta(1, 1)", Beta(1, 1), 1},
		{"Beta(2, 3)", Beta(2, 3), 1.0 / 12},
		{"StirlingRemainder(-1)", StirlingRemainder(-1), nan},
		{"StirlingRemainder(NaN)", StirlingRemainder(nan), nan},
		{"StirlingRemainder(0)", StirlingRemainder(0), inf},
		{"StirlingRemainder(+Inf)", StirlingRemainder(inf), 0},
	}
	for _, tt := range tests {
		if !same(tt.got, tt.want) {
			t.Errorf("%s = %g, want %g", tt.name, tt.got, tt.want)
		}
	}
}

// gammaSpecials are the arguments of the special cases the math
// package's documentation lists for Gamma (Gamma(+Inf) = +Inf,
// Gamma(+0) = +Inf, Gamma(-0) = -Inf, Gamma(x) = NaN for integer x < 0,
// Gamma(-Inf) = NaN, Gamma(NaN) = NaN) and for Lgamma (Lgamma(+Inf) =
// +Inf, Lgamma(0) = +Inf, Lgamma(-integer) = +Inf, Lgamma(-Inf) = -Inf,
// Lgamma(NaN) = NaN).
var gammaSpecials = []float64{inf, 0, math.Copysign(0, -1), -1, -2, -3, -170, ninf, nan}

// gammaRegulars are points where Γ is a nonzero float64: positive,
// negative of both signs of Γ (Γ(-0.5) < 0, Γ(-1.5) > 0), and 30, where
// Γ(30) = 29! is finite.
var gammaRegulars = []float64{0.5, 1, 2, 5.5, 30, -0.5, -1.5, -2.5}

// identical reports whether got and want are the same float64, the sign
// of a zero included; any NaN is the same as any other.
func identical(got, want float64) bool {
	if math.IsNaN(want) || math.IsNaN(got) {
		return math.IsNaN(want) && math.IsNaN(got)
	}
	return got == want && math.Signbit(got) == math.Signbit(want)
}

// TestGammaRatioSpecialCases: wherever a or b is one of math.Gamma's
// special cases and the other's Γ is a float64, GammaRatio(a, b) is
// math.Gamma(a)/math.Gamma(b) and LogGammaRatio(a, b) is
// math.Lgamma(a) − math.Lgamma(b), the values the code these helpers
// replace computes there (reference: the math package, whose special
// cases are documented above).
func TestGammaRatioSpecialCases(t *testing.T) {
	args := append(append([]float64{}, gammaSpecials...), gammaRegulars...)
	for _, a := range args {
		for _, b := range args {
			if !gammaSpecial(a) && !gammaSpecial(b) {
				continue
			}
			if want := math.Gamma(a) / math.Gamma(b); !identical(GammaRatio(a, b), want) {
				t.Errorf("GammaRatio(%g, %g) = %g, math.Gamma's quotient is %g", a, b, GammaRatio(a, b), want)
			}
			la, _ := math.Lgamma(a)
			lb, _ := math.Lgamma(b)
			if want := la - lb; !identical(LogGammaRatio(a, b), want) {
				t.Errorf("LogGammaRatio(%g, %g) = %g, math.Lgamma's difference is %g", a, b, LogGammaRatio(a, b), want)
			}
		}
	}
}

// TestGammaRatioSpecialLimits: where the other argument's Γ leaves
// float64 (Γ(200) = 199! ≈ 3.9e372, computed below with math/big), the
// quotient of math.Gamma's values is Inf/Inf = NaN, but Γ(200) is a
// positive real number (Γ has no zeros, DLMF 5.2.1), so the ratio with
// a special case is the limit: ±Inf over it, ±0 under it.
func TestGammaRatioSpecialLimits(t *testing.T) {
	f := new(big.Int).MulRange(1, 199)
	if f.BitLen() <= 1024 {
		t.Fatalf("199! has %d bits: it fits float64, the test needs one that does not", f.BitLen())
	}
	tests := []struct {
		name      string
		got, want float64
	}{
		{"GammaRatio(+Inf, 200)", GammaRatio(inf, 200), inf},
		{"GammaRatio(+0, 200)", GammaRatio(0, 200), inf},
		{"GammaRatio(-0, 200)", GammaRatio(math.Copysign(0, -1), 200), ninf},
		{"GammaRatio(200, +Inf)", GammaRatio(200, inf), 0},
		{"GammaRatio(200, +0)", GammaRatio(200, 0), 0},
		{"GammaRatio(200, -0)", GammaRatio(200, math.Copysign(0, -1)), math.Copysign(0, -1)},
		{"GammaRatio(200, -2)", GammaRatio(200, -2), nan}, // math.Gamma(-2) is NaN
		{"GammaRatio(-2, 200)", GammaRatio(-2, 200), nan},
		{"LogGammaRatio(200, -2)", LogGammaRatio(200, -2), ninf}, // math.Lgamma(-2) is +Inf
		{"LogGammaRatio(-2, 200)", LogGammaRatio(-2, 200), inf},
	}
	for _, tt := range tests {
		if !identical(tt.got, tt.want) {
			t.Errorf("%s = %g, want %g", tt.name, tt.got, tt.want)
		}
	}
}

// TestGammaRatioRegular: at regular points next to the special cases
// the ratio is still the quotient of factorials: Γ(30)/Γ(20) = 29!/19!
// from math/big, and Γ(-0.5)/Γ(0.5) = −2 (Γ(½) = √π and
// Γ(−½) = −2√π, DLMF 5.4.6 and 5.5.1).
func TestGammaRatioRegular(t *testing.T) {
	q := new(big.Float).SetPrec(200).SetInt(new(big.Int).MulRange(20, 29))
	if got := GammaRatio(30, 20); ulpsOff(got, q) > 1 {
		t.Errorf("GammaRatio(30, 20) = %v, 29!/19! is %v", got, q)
	}
	if got := GammaRatio(-0.5, 0.5); got != -2 {
		t.Errorf("GammaRatio(-0.5, 0.5) = %v, want -2", got)
	}
}

func TestGammaSign(t *testing.T) {
	tests := []struct {
		x    float64
		want int
	}{
		{inf, 1}, {ninf, 0}, {nan, 0}, {0, 0}, {math.Copysign(0, -1), 0}, {-1, 0}, {-2, 0}, {-1e300, 0},
		{0.5, 1}, {1e300, 1}, {-0.5, -1}, {-1.5, 1}, {-2.5, -1}, {-3.5, 1},
	}
	for _, tt := range tests {
		if got := GammaSign(tt.x); got != tt.want {
			t.Errorf("GammaSign(%g) = %d, want %d", tt.x, got, tt.want)
		}
		// Away from the poles, math.Lgamma agrees on the sign.
		if tt.want != 0 {
			if _, s := math.Lgamma(tt.x); s != tt.want {
				t.Errorf("math.Lgamma(%g) sign %d, GammaSign %d", tt.x, s, tt.want)
			}
		}
	}
}

func TestIntegerDomain(t *testing.T) {
	if _, ok := FactorialInt64(-1); ok {
		t.Error("FactorialInt64(-1) ok")
	}
	if v, ok := ChooseInt64(-1, 0); !ok || v != 1 {
		t.Errorf("ChooseInt64(-1, 0) = %d, %v; want 1, true", v, ok)
	}
	if v, ok := ChooseInt64(5, -1); !ok || v != 0 {
		t.Errorf("ChooseInt64(5, -1) = %d, %v; want 0, true", v, ok)
	}
	if v, ok := ChooseInt64(5, 7); !ok || v != 0 {
		t.Errorf("ChooseInt64(5, 7) = %d, %v; want 0, true", v, ok)
	}
	if _, ok := FallingInt64(5, -1); ok {
		t.Error("FallingInt64(5, -1) ok")
	}
	if v, ok := FallingInt64(-5, 1); !ok || v != -5 {
		t.Errorf("FallingInt64(-5, 1) = %d, %v; want -5, true (the one factor)", v, ok)
	}
	if v, ok := FallingUint64(3, 5); !ok || v != 0 {
		t.Errorf("FallingUint64(3, 5) = %d, %v; want 0, true", v, ok)
	}
	if _, ok := MultinomialInt64(2, -1); ok {
		t.Error("MultinomialInt64(2, -1) ok")
	}
	if _, ok := MultinomialInt64(math.MaxInt64, 1); ok {
		t.Error("MultinomialInt64(MaxInt64, 1) ok")
	}
	if v, ok := MultinomialInt64(); !ok || v != 1 {
		t.Errorf("MultinomialInt64() = %d, %v", v, ok)
	}
	if _, ok := CatalanInt64(-1); ok {
		t.Error("CatalanInt64(-1) ok")
	}
}

// The Must forms panic with a message naming the function, the arguments
// and the reason.
func TestMustPanics(t *testing.T) {
	tests := []struct {
		call func()
		want string
	}{
		{func() { MustFactorialInt64(21) }, "lgamma: MustFactorialInt64(21): result does not fit in int64"},
		{func() { MustFactorialInt64(-2) }, "lgamma: MustFactorialInt64(-2): n = -2 is negative"},
		{func() { MustFactorialUint64(21) }, "lgamma: MustFactorialUint64(21): result does not fit in uint64"},
		{func() { MustChooseInt64(70, 35) }, "lgamma: MustChooseInt64(70, 35): result does not fit in int64"},
		{func() { MustChooseInt64(-70, 35) }, "lgamma: MustChooseInt64(-70, 35): result does not fit in int64"},
		{func() { MustChooseUint64(70, 35) }, "lgamma: MustChooseUint64(70, 35): result does not fit in uint64"},
		{func() { MustFallingInt64(30, 20) }, "lgamma: MustFallingInt64(30, 20): result does not fit in int64"},
		{func() { MustFallingInt64(3, -1) }, "lgamma: MustFallingInt64(3, -1): k = -1 is negative"},
		{func() { MustFallingUint64(30, 20) }, "lgamma: MustFallingUint64(30, 20): result does not fit in uint64"},
		{func() { MustMultinomialInt64(20, 20, 20) }, "lgamma: MustMultinomialInt64(20, 20, 20): result does not fit in int64"},
		{func() { MustMultinomialInt64(2, -3) }, "lgamma: MustMultinomialInt64(2, -3): argument 2 = -3 is negative"},
		{func() { MustCatalanInt64(36) }, "lgamma: MustCatalanInt64(36): result does not fit in int64"},
		{func() { MustCatalanInt64(-1) }, "lgamma: MustCatalanInt64(-1): n = -1 is negative"},
	}
	for _, tt := range tests {
		got := func() (msg string) {
			defer func() { msg, _ = recover().(string) }()
			tt.call()
			return ""
		}()
		if got != tt.want {
			t.Errorf("panic %q, want %q", got, tt.want)
		}
		if !strings.HasPrefix(got, "lgamma: Must") {
			t.Errorf("panic %q does not name the function", got)
		}
	}
	if MustChooseUint64(67, 33) != 14226520737620288370 { // big.Int.Binomial(67, 33)
		t.Error("MustChooseUint64(67, 33)")
	}
}
