package lgamma

import (
	"math"
	"math/big"
	"testing"
)

// Identities and bounds from the literature, each checked at many points.

// Γ(n+½) = (2n)!√π/(4ⁿn!) (DLMF 5.4.6), with the factorials exact.
func TestLogGammaHalfIntegers(t *testing.T) {
	lnSqrtPi := refLog(refPi())
	lnSqrtPi.Quo(lnSqrtPi, bi(2))
	for n := int64(0); n <= 400; n++ {
		num := new(big.Int).MulRange(1, max(2*n, 1))
		den := new(big.Int).Lsh(new(big.Int).MulRange(1, max(n, 1)), uint(2*n))
		want := bnew().Sub(refLog(bnew().SetInt(num)), refLog(bnew().SetInt(den)))
		want.Add(want, lnSqrtPi)
		x := float64(n) + 0.5
		if f, _ := want.Float64(); math.Abs(f) < 0.1 {
			continue // ulps are no measure near a zero of ln Γ
		}
		if u := ulpsOff(LogGamma(x), want); u > 1 {
			t.Errorf("LogGamma(%g) off by %.2f ulp (DLMF 5.4.6)", x, u)
		}
	}
}

// 1/(12n+1) < δ(n) < 1/(12n) for integers n ≥ 1 (Robbins 1955, "A remark
// on Stirling's formula").
func TestStirlingRobbinsBounds(t *testing.T) {
	for n := 1; n < 5000; n++ {
		d := StirlingRemainder(float64(n))
		if lo, hi := 1/(12*float64(n)+1), 1/(12*float64(n)); !(d > lo && d < hi) {
			t.Errorf("δ(%d) = %g outside Robbins' (%g, %g)", n, d, lo, hi)
		}
	}
}

// The first Stirling coefficients are B₂ₖ/(2k(2k−1)) = 1/12, −1/360,
// 1/1260, −1/1680 (DLMF 5.11.1). The test derives them from the
// reference's Bernoulli numbers and checks that the package's series has
// the same leading behaviour.
func TestStirlingCoefficients(t *testing.T) {
	want := []*big.Rat{big.NewRat(1, 12), big.NewRat(-1, 360), big.NewRat(1, 1260), big.NewRat(-1, 1680)}
	for i, b := range refBernoulli()[:4] {
		k := int64(i + 1)
		c := new(big.Rat).Quo(b, big.NewRat(2*k*(2*k-1), 1))
		if c.Cmp(want[i]) != 0 {
			t.Errorf("coefficient %d from Bernoulli numbers = %v, want %v (DLMF 5.11.1)", k, c, want[i])
		}
	}
	// z·δ(z) → 1/12 and z³(δ(z) − 1/(12z)) → −1/360 as z grows.
	z := 1 << 20
	d := stirlingSeries(float64(z))
	if got := d * float64(z); math.Abs(got-1.0/12) > 1e-12 {
		t.Errorf("z·δ(z) = %g, want 1/12", got)
	}
	z = 1 << 10
	d = stirlingSeries(float64(z))
	if got := (d - 1/(12*float64(z))) * math.Pow(float64(z), 3); math.Abs(got+1.0/360) > 1e-8 {
		t.Errorf("z³(δ(z) − 1/12z) = %g, want −1/360", got)
	}
}

// The generated tables carry ln n! to double-double precision and n!
// correctly rounded; the reduction tables of ddLog and ddExp and the
// constants likewise.
func TestTables(t *testing.T) {
	f := big.NewInt(1)
	for n := int64(0); n < int64(len(lnFactTable)); n++ {
		if n > 1 {
			f.Mul(f, big.NewInt(n))
		}
		want := refLog(bnew().SetInt(f))
		if n > 1 && ddRel(lnFactTable[n], want) > 1e-31 {
			t.Errorf("lnFactTable[%d] off by %g relative", n, ddRel(lnFactTable[n], want))
		}
		if w, _ := want.Float64(); lnFactTable[n].hi != w {
			t.Errorf("lnFactTable[%d].hi = %v, want %v", n, lnFactTable[n].hi, w)
		}
	}
	for i := range logTable {
		want := refLog(bnew().Quo(bi(int64(512+i)), bi(512)))
		if d := bnew().Sub(ddValue(logTable[i]), want); d.Sign() != 0 {
			if f, _ := d.Float64(); math.Abs(f) > 1e-32 {
				t.Errorf("logTable[%d] off by %g", i, f)
			}
		}
	}
	for j := range exp2Table {
		want := refExp(bnew().Mul(refLog(bi(2)), bf(float64(j)/64)))
		if r := ddRel(exp2Table[j], want); r > 1e-32 {
			t.Errorf("exp2Table[%d] off by %g relative", j, r)
		}
	}
	if r := ddRel(ln2, refLog(bi(2))); r > 1e-32 {
		t.Errorf("ln2 off by %g", r)
	}
	if r := ddRel(halfLn2Pi, refHalfLn2Pi()); r > 1e-32 {
		t.Errorf("halfLn2Pi off by %g", r)
	}
	if r := ddRel(lnPiDD, refLog(refPi())); r > 1e-32 {
		t.Errorf("lnPiDD off by %g", r)
	}
	if r := ddRel(piDD, refPi()); r > 1e-32 {
		t.Errorf("piDD off by %g", r)
	}
	for n, c := range map[float64]dd{6: inv6, 24: inv24, 120: inv120} {
		if r := ddRel(c, bnew().Quo(bi(1), bf(n))); r > 1e-32 {
			t.Errorf("1/%v off by %g", n, r)
		}
	}
	// The generated Stirling coefficients B₂ₖ/(2k(2k−1)) against the
	// exact Bernoulli numbers of ref_test.go.
	for i, c := range stirlingCoef {
		k := int64(i + 1)
		w := bnew().SetRat(refBernoulli()[i])
		w.Quo(w, bi(2*k*(2*k-1)))
		if r := ddRel(c, w); r > 1e-31 {
			t.Errorf("stirlingCoef[%d] off by %g", i, r)
		}
	}
}

// Pascal's rule C(n,k) = C(n−1,k−1) + C(n−1,k) holds to rounding on
// the float64 forms, far beyond where exact checks are affordable
// (common practice).
func TestChoosePascal(t *testing.T) {
	for _, n := range []int{1000, 54321, 1e6, 1e9} {
		for _, k := range []int{1, 2, 7, 11} {
			a, b, c := Choose(n, k), Choose(n-1, k-1), Choose(n-1, k)
			if math.Abs(a-(b+c)) > 4e-16*a {
				t.Errorf("Pascal's rule at C(%d,%d): %g vs %g", n, k, a, b+c)
			}
		}
	}
}

// Σₖ P(X = k) = 1 for each distribution (common practice), summed over
// the whole support for moderate parameters.
func TestPMFsSumToOne(t *testing.T) {
	sum := func(f func(k int) float64, hi int) float64 {
		s := 0.0
		for k := 0; k <= hi; k++ {
			s += f(k)
		}
		return s
	}
	tests := []struct {
		name string
		s    float64
	}{
		{"Poisson(37.5)", sum(func(k int) float64 { return PoissonPMF(k, 37.5) }, 400)},
		{"Binomial(500, 0.23)", sum(func(k int) float64 { return BinomialPMF(k, 500, 0.23) }, 500)},
		{"Hypergeometric(1000, 300, 150)", sum(func(k int) float64 { return HypergeometricPMF(k, 1000, 300, 150) }, 150)},
	}
	for _, tt := range tests {
		if math.Abs(tt.s-1) > 1e-13 {
			t.Errorf("%s sums to %.17g", tt.name, tt.s)
		}
	}
}

// For negative x the reflection formula (DLMF 5.5.3) is used; away from
// the zeros of ln|Γ| it agrees with math.Lgamma, which uses the same
// formula with its own ln Γ.
func TestLogGammaNegative(t *testing.T) {
	for x := -170.75; x < 0; x += 0.37 {
		if x == math.Trunc(x) {
			continue
		}
		want, sign := math.Lgamma(x)
		if math.Abs(want) < 0.5 {
			continue
		}
		if got := LogGamma(x); math.Abs(got-want) > 1e-13*math.Abs(want) {
			t.Errorf("LogGamma(%g) = %.17g, math.Lgamma %.17g", x, got, want)
		}
		if GammaSign(x) != sign {
			t.Errorf("GammaSign(%g) = %d, math.Lgamma sign %d", x, GammaSign(x), sign)
		}
	}
}
