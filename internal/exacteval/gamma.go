package exacteval

import (
	"math/big"
	"sync"
)

// Γ at Prec bits.
//
// Integer and half-integer arguments up to exactLimit are exact
// products: Γ(n) = (n−1)!, Γ(n+½) = (2n)!·√π/(4^n·n!) and, below zero,
// Γ(½−n) = (−4)^n·n!·√π/(2n)! (DLMF 5.4.6 and the reflection 5.5.3).
// Elsewhere the argument is shifted up to z ≥ stirlingFrom by the
// recurrence Γ(z+1) = z·Γ(z) (DLMF 5.5.1) and ln Γ(z) is Stirling's
// series (DLMF 5.11.1) with stirlingTerms terms: for real z > 0 its
// remainder is smaller in magnitude than the first term left out
// (DLMF 5.11.10 with K = 1 on the real axis). With |B₆₂| < 2·62!/(2π)^62
// (DLMF 24.9.8), that term, |B₆₂|/(62·61·z^61), is below 2^−250 for
// z ≥ 64: the series is good to the precision the evaluator keeps.

const (
	exactLimit    = 3000
	stirlingFrom  = 64
	stirlingTerms = 30
)

var (
	bernOnce sync.Once
	bern     []*big.Rat // bern[k] = B_{2k}
)

// bernoulli computes B_0 … B_{2·stirlingTerms} by the Akiyama–Tanigawa
// algorithm (common practice), exactly. analyzer/thresholds has its own
// copy: a reference must not share code with what it checks.
func bernoulli() []*big.Rat {
	bernOnce.Do(func() {
		n := 2 * stirlingTerms
		a := make([]*big.Rat, n+1)
		b := make([]*big.Rat, n+1) // b[m] = B_m (with B_1 = +½)
		for m := 0; m <= n; m++ {
			a[m] = big.NewRat(1, int64(m+1))
			for j := m; j >= 1; j-- {
				d := new(big.Rat).Sub(a[j-1], a[j])
				a[j-1] = d.Mul(d, big.NewRat(int64(j), 1))
			}
			b[m] = new(big.Rat).Set(a[0])
		}
		for k := 0; 2*k <= n; k++ {
			bern = append(bern, b[2*k])
		}
	})
	return bern
}

// lnGammaStirling is ln Γ(z) for z ≥ stirlingFrom.
func lnGammaStirling(z *big.Float) *big.Float {
	initConsts()
	lz, _ := Log(z)
	lz.SetPrec(work)
	half := big.NewFloat(0.5)
	r := newFloat().Sub(z, half)
	r.Mul(r, lz)
	r.Sub(r, z)
	twoPi := new(big.Float).SetPrec(constPrec).Mul(piConst, big.NewFloat(2))
	l2p, _ := Log(twoPi)
	r.Add(r, newFloat().Mul(l2p, half))
	b := bernoulli()
	zinv := newFloat().Quo(big.NewFloat(1), z)
	z2 := newFloat().Mul(zinv, zinv)
	pow := newFloat().Set(zinv) // z^−(2k−1)
	for k := 1; k <= stirlingTerms; k++ {
		c := new(big.Rat).Quo(b[k], big.NewRat(int64(2*k*(2*k-1)), 1))
		term := newFloat().SetRat(c)
		term.Mul(term, pow)
		r.Add(r, term)
		pow.Mul(pow, z2)
	}
	return r
}

// halfInt reports whether x is n or n+½ for an integer n of at most
// exactLimit in magnitude, with 2x.
func halfInt(x *big.Float) (twice int64, ok bool) {
	t := newFloat().SetMantExp(x, 1)
	if !t.IsInt() {
		return 0, false
	}
	n, acc := t.Int64()
	if acc != big.Exact || n > 2*exactLimit || n < -2*exactLimit {
		return 0, false
	}
	return n, true
}

func factorial(n int64) *big.Int { return new(big.Int).MulRange(1, n) }

// gammaExact is Γ(x) for x = twice/2, an integer or half-integer, or
// errNaN at a pole (x ≤ 0 an integer; math.Gamma's NaN for negatives,
// and +Inf at zero, which the caller handles).
func gammaExact(twice int64) (*big.Float, error) {
	if twice%2 == 0 {
		n := twice / 2
		if n <= 0 {
			return nil, errNaN
		}
		return round(newFloat().SetInt(factorial(n - 1))), nil
	}
	sqrtPi := newFloat().Sqrt(newFloat().Set(piConstInit()))
	if twice > 0 { // x = n + ½
		n := (twice - 1) / 2
		num := newFloat().SetInt(factorial(2 * n))
		den := new(big.Int).Lsh(factorial(n), uint(2*n))
		num.Quo(num, newFloat().SetInt(den))
		return round(num.Mul(num, sqrtPi)), nil
	}
	n := (1 - twice) / 2 // x = ½ − n
	num := new(big.Int).Lsh(factorial(n), uint(2*n))
	if n%2 == 1 {
		num.Neg(num)
	}
	r := newFloat().SetInt(num)
	r.Quo(r, newFloat().SetInt(factorial(2*n)))
	return round(r.Mul(r, sqrtPi)), nil
}

func piConstInit() *big.Float { initConsts(); return piConst }

// shifted returns, for x not a pole, z = x + N ≥ stirlingFrom and the
// product x(x+1)…(x+N−1) that Γ(x) = Γ(z)/product divides by.
func shifted(x *big.Float) (z, prod *big.Float) {
	z = newFloat().Set(x)
	prod = newFloat().SetInt64(1)
	lim := big.NewFloat(stirlingFrom)
	for z.Cmp(lim) < 0 {
		prod.Mul(prod, z)
		z.Add(z, big.NewFloat(1))
	}
	return z, prod
}

// Gamma returns Γ(x).
//
// Special cases are (as math.Gamma's):
//
//	Gamma(+Inf) = +Inf
//	Gamma(0) = +Inf (the sign of zero is not kept)
//	Gamma(x) for x a negative integer or −Inf is errNaN
func Gamma(x *big.Float) (*big.Float, error) {
	if x.IsInf() {
		if x.Sign() > 0 {
			return new(big.Float).SetPrec(Prec).SetInf(false), nil
		}
		return nil, errNaN
	}
	if x.Sign() == 0 {
		return new(big.Float).SetPrec(Prec).SetInf(false), nil
	}
	if x.IsInt() && x.Sign() < 0 {
		return nil, errNaN
	}
	if t, ok := halfInt(x); ok {
		return gammaExact(t)
	}
	z, prod := shifted(x)
	g := Exp(lnGammaStirling(z))
	if g.IsInf() {
		return g, nil
	}
	return round(newFloat().Quo(g, prod)), nil
}

// Lgamma returns ln|Γ(x)| and the sign of Γ(x).
//
// Special cases are (as math.Lgamma's):
//
//	Lgamma(+Inf) = +Inf
//	Lgamma(0) = +Inf
//	Lgamma(x) = +Inf for x a negative integer
//	Lgamma(−Inf) = −Inf
func Lgamma(x *big.Float) (*big.Float, int, error) {
	if x.IsInf() {
		return new(big.Float).SetPrec(Prec).SetInf(x.Sign() < 0), 1, nil
	}
	if x.IsInt() && x.Sign() <= 0 {
		return new(big.Float).SetPrec(Prec).SetInf(false), 1, nil
	}
	if t, ok := halfInt(x); ok {
		g, err := gammaExact(t)
		if err != nil {
			return nil, 0, err
		}
		sign := g.Sign()
		l, err := Log(newFloat().Abs(g))
		return l, sign, err
	}
	z, prod := shifted(x)
	sign := prod.Sign()
	l := lnGammaStirling(z)
	lp, err := Log(newFloat().Abs(prod))
	if err != nil {
		return nil, 0, err
	}
	return round(l.Sub(l, lp)), sign, nil
}
