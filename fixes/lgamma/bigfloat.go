package lgamma

// A math/big evaluation of ln Γ for the rare arguments where a
// double-double result is too close to zero to be rounded correctly:
// LogBeta on the curve B(a,b) = 1 and LogGammaRatio on Γ(a) = Γ(b), where
// three or two log-gammas of size 1 cancel to a result near 1e-16 and
// even the double-double's 1e-30 is tens of ulps. It is used for
// arguments up to bigMax, where bigPrec bits hold a+b exactly and leave
// an absolute error below 2^-180. The method is the one of the rest of
// the package: the argument is shifted to z ≥ 40 by Γ(x) =
// Γ(x+n)/(x(x+1)…(x+n−1)) (DLMF 5.5.1), where twenty terms of Stirling's
// series (DLMF 5.11.1) leave an error below 2^-190, and the logarithm is
// 2·atanh((m−1)/(m+1)) on the mantissa m in [1/√2, √2] plus e·ln 2.

import (
	"math"
	"math/big"
	"sync"
)

const (
	bigPrec = 256
	bigMax  = 0x1p40
)

type bigConstants struct {
	ln2, halfLn2Pi *big.Float
	coef           []*big.Float
}

var bigC = sync.OnceValue(func() bigConstants {
	var c bigConstants
	c.ln2, _, _ = big.ParseFloat(bigLn2, 10, bigPrec, big.ToNearestEven)
	c.halfLn2Pi, _, _ = big.ParseFloat(bigHalfLn2Pi, 10, bigPrec, big.ToNearestEven)
	for _, s := range stirlingRat {
		r, _ := new(big.Rat).SetString(s)
		c.coef = append(c.coef, bigNew().SetRat(r))
	}
	return c
})

func bigNew() *big.Float { return new(big.Float).SetPrec(bigPrec) }

// bigLog returns ln x for x > 0.
func bigLog(x *big.Float) *big.Float {
	m := bigNew()
	e := x.MantExp(m) // x = m·2^e, m in [½, 1)
	if m.Cmp(big.NewFloat(math.Sqrt2/2)) < 0 {
		m.SetMantExp(m, 1)
		e--
	}
	num := bigNew().Sub(m, big.NewFloat(1))
	s := num.Quo(num, bigNew().Add(m, big.NewFloat(1)))
	s2 := bigNew().Mul(s, s)
	sum := bigNew().Set(s)
	pow := bigNew().Set(s)
	eps := new(big.Float).SetMantExp(big.NewFloat(1), -bigPrec-8)
	for k := int64(3); ; k += 2 {
		pow.Mul(pow, s2)
		t := bigNew().Quo(pow, bigNew().SetInt64(k))
		sum.Add(sum, t)
		if t.Sign() == 0 || new(big.Float).Abs(t).Cmp(eps) < 0 {
			break
		}
	}
	sum.Mul(sum, big.NewFloat(2))
	return sum.Add(sum, bigNew().Mul(bigC().ln2, bigNew().SetInt64(int64(e))))
}

// bigLnGamma returns ln Γ(x) for x > 0.
func bigLnGamma(x *big.Float) *big.Float {
	c := bigC()
	z := bigNew().Set(x)
	p := bigNew().SetInt64(1)
	forty := big.NewFloat(40)
	for z.Cmp(forty) < 0 {
		p.Mul(p, z)
		z.Add(z, big.NewFloat(1))
	}
	lz := bigLog(z)
	r := bigNew().Sub(z, big.NewFloat(0.5))
	r.Mul(r, lz).Sub(r, z).Add(r, c.halfLn2Pi)
	inv := bigNew().Quo(big.NewFloat(1), z)
	inv2 := bigNew().Mul(inv, inv)
	pow := bigNew().Set(inv)
	for _, k := range c.coef {
		r.Add(r, bigNew().Mul(k, pow))
		pow.Mul(pow, inv2)
	}
	return r.Sub(r, bigLog(p))
}

// bigFloat returns the float64 nearest to x.
func bigFloat(x *big.Float) float64 {
	f, _ := x.Float64()
	return f
}

// bigLnGammaSum returns Σ sᵢ·ln Γ(xᵢ) rounded to float64, xᵢ > 0.
func bigLnGammaSum(xs []*big.Float, signs []int) float64 {
	r := bigNew()
	for i, x := range xs {
		g := bigLnGamma(x)
		if signs[i] < 0 {
			r.Sub(r, g)
		} else {
			r.Add(r, g)
		}
	}
	if r.MantExp(nil) < -150 {
		// Below the evaluation's error: the true sum is taken to be 0,
		// as for ln B(1, 1) or ln Γ(1)/Γ(2). A nonzero sum this small
		// would need float64 arguments within about 2^-100 (relative)
		// of the curve; the sweep's closest came to about 2^-70.
		return 0
	}
	return bigFloat(r)
}
