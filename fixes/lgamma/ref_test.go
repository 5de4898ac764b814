package lgamma

// High-precision references for the tests, written independently of the
// code under test: they use math/big at refPrec bits, a Taylor-series
// exponential with argument halving, a logarithm by Halley's iteration on
// that exponential, π by the Gauss–Legendre (AGM) iteration, and ln Γ by
// Stirling's series (DLMF 5.11.1) with Bernoulli numbers from the exact
// recurrence Σ_{j≤m} C(m+1,j)·B_j = 0 (DLMF 24.5.3) summed to 30 terms
// after shifting the argument to at least 60. None of the package's
// double-double code, tables or series coefficients is used here.

import (
	"math"
	"math/big"
	"sync"
)

const refPrec = 256

func bf(x float64) *big.Float { return new(big.Float).SetPrec(refPrec).SetFloat64(x) }

func bi(x int64) *big.Float { return new(big.Float).SetPrec(refPrec).SetInt64(x) }

func bnew() *big.Float { return new(big.Float).SetPrec(refPrec) }

// refExp returns e^x: x is halved s times to below 2^-20, the Taylor
// series is summed, and the result squared s times. Extra guard bits
// cover the squarings.
func refExp(x *big.Float) *big.Float {
	const work = refPrec + 96
	y := new(big.Float).SetPrec(work).Set(x)
	s := 0
	if e := y.MantExp(nil); e > -20 {
		s = e + 20
		y.SetMantExp(y, -s)
	}
	sum := new(big.Float).SetPrec(work).SetInt64(1)
	term := new(big.Float).SetPrec(work).SetInt64(1)
	eps := new(big.Float).SetPrec(work).SetMantExp(big.NewFloat(1), -work)
	for n := int64(1); ; n++ {
		term.Mul(term, y)
		term.Quo(term, new(big.Float).SetPrec(work).SetInt64(n))
		sum.Add(sum, term)
		if new(big.Float).Abs(term).Cmp(eps) < 0 {
			break
		}
	}
	for i := 0; i < s; i++ {
		sum.Mul(sum, sum)
	}
	return bnew().Set(sum)
}

// refLog returns ln x for x > 0 by Halley's iteration
// y ← y + 2(x − e^y)/(x + e^y), which triples the correct digits per step.
func refLog(x *big.Float) *big.Float {
	m := bnew()
	e := x.MantExp(m)
	mf, _ := m.Float64()
	y := bf(math.Log(mf) + float64(e)*math.Ln2)
	for i := 0; i < 3; i++ { // 53 → 159 → 477 bits, one step to spare
		ey := refExp(y)
		num := bnew().Sub(x, ey)
		den := bnew().Add(x, ey)
		num.Quo(num, den)
		y.Add(y, num.Mul(num, bi(2)))
	}
	return y
}

// refPi returns π by the Gauss–Legendre iteration.
var refPi = sync.OnceValue(func() *big.Float {
	a, b := bi(1), bnew().Sqrt(bf(0.5))
	t, p := bf(0.25), bi(1)
	for i := 0; i < 10; i++ {
		an := bnew().Add(a, b)
		an.Quo(an, bi(2))
		b = bnew().Sqrt(bnew().Mul(a, b))
		d := bnew().Sub(a, an)
		t.Sub(t, bnew().Mul(bnew().Mul(d, d), p))
		p.Mul(p, bi(2))
		a = an
	}
	s := bnew().Add(a, b)
	s.Mul(s, s)
	return s.Quo(s, t.Mul(t, bi(4)))
})

// refBernoulli returns the even Bernoulli numbers B_2, B_4, …, B_60.
var refBernoulli = sync.OnceValue(func() []*big.Rat {
	const m = 60
	b := make([]*big.Rat, m+1)
	b[0] = big.NewRat(1, 1)
	for n := 1; n <= m; n++ {
		sum := new(big.Rat)
		for j := 0; j < n; j++ {
			c := new(big.Rat).SetInt(new(big.Int).Binomial(int64(n+1), int64(j)))
			sum.Add(sum, c.Mul(c, b[j]))
		}
		b[n] = sum.Neg(sum.Quo(sum, big.NewRat(int64(n+1), 1)))
	}
	var even []*big.Rat
	for k := 2; k <= m; k += 2 {
		even = append(even, b[k])
	}
	return even
})

// refHalfLn2Pi is ½ln 2π.
var refHalfLn2Pi = sync.OnceValue(func() *big.Float {
	h := refLog(bnew().Mul(refPi(), bi(2)))
	return h.Quo(h, bi(2))
})

// refLnGamma returns ln Γ(x) for x > 0.
func refLnGamma(x *big.Float) *big.Float {
	z := bnew().Set(x)
	prod := bi(1)
	for z.Cmp(bi(60)) < 0 {
		prod.Mul(prod, z)
		z.Add(z, bi(1))
	}
	// (z−½)ln z − z + ½ln 2π + Σ B₂ₖ/(2k(2k−1)z^(2k−1))
	r := bnew().Sub(z, bf(0.5))
	r.Mul(r, refLog(z))
	r.Sub(r, z)
	r.Add(r, refHalfLn2Pi())
	zinv := bnew().Quo(bi(1), z)
	zinv2 := bnew().Mul(zinv, zinv)
	pow := bnew().Set(zinv)
	for i, b := range refBernoulli() {
		k := int64(i + 1)
		c := bnew().SetRat(b)
		c.Quo(c, bi(2*k*(2*k-1)))
		r.Add(r, c.Mul(c, pow))
		pow.Mul(pow, zinv2)
	}
	if prod.Cmp(bi(1)) != 0 {
		r.Sub(r, refLog(prod))
	}
	return r
}

// refLnFact returns ln n!; exact n! through refLog below 3000, Stirling's
// series above.
func refLnFact(n int64) *big.Float {
	if n < 3000 {
		f := new(big.Int).MulRange(1, n)
		if n == 0 {
			f.SetInt64(1)
		}
		return refLog(bnew().SetInt(f))
	}
	return refLnGamma(bi(n + 1))
}

// ulpsOff returns |got − want| in units of the float64 spacing at want.
func ulpsOff(got float64, want *big.Float) float64 {
	w, _ := want.Float64()
	if got == w {
		return 0
	}
	if w == 0 {
		return math.Inf(1)
	}
	ulp := math.Nextafter(math.Abs(w), math.Inf(1)) - math.Abs(w)
	d := bnew().Sub(bf(got), want)
	df, _ := d.Float64()
	return math.Abs(df) / ulp
}

// relOff returns |got − want|/|want|.
func relOff(got float64, want *big.Float) float64 {
	if want.Sign() == 0 {
		if got == 0 {
			return 0
		}
		return math.Inf(1)
	}
	if math.IsInf(got, 0) || math.IsNaN(got) {
		return math.Inf(1)
	}
	d := bnew().Sub(bf(got), want)
	d.Quo(d, want)
	f, _ := d.Float64()
	return math.Abs(f)
}
