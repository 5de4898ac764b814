package exacteval

import (
	"errors"
	"math"
	"math/big"
	"sync"
)

// Prec is the precision, in bits, of every float the evaluator keeps.
// Transcendental functions work at Prec+64 bits and round once, so that
// their results are good to Prec bits less a few (the tests ask for
// 200). big.Float's exponent is an int32: nothing a Go function computes
// at these sizes (the largest is a factorial of a few thousand) comes
// near its range.
const Prec = 256

const work = Prec + 64

// errNaN marks a value that has no real result (0/0, ∞−∞, log of a
// negative, a pole of Γ at a negative integer): the evaluator skips the
// input rather than guess.
var errNaN = errors.New("NaN")

func newFloat() *big.Float { return new(big.Float).SetPrec(work) }

// round returns x rounded to Prec bits, as a new value.
func round(x *big.Float) *big.Float { return new(big.Float).SetPrec(Prec).Set(x) }

// constants at 640 bits, computed once.
var (
	constOnce sync.Once
	ln2Const  *big.Float
	piConst   *big.Float
)

const constPrec = 640

func initConsts() {
	constOnce.Do(func() {
		// ln 2 = 2·atanh(1/3) (common practice: atanh(x) = ½ ln((1+x)/(1−x))).
		ln2Const = new(big.Float).SetPrec(constPrec).Mul(big.NewFloat(2).SetPrec(constPrec), atanhInv(3, constPrec))
		// Machin's formula: π = 16·atan(1/5) − 4·atan(1/239).
		a := new(big.Float).SetPrec(constPrec).Mul(big.NewFloat(16), atanInv(5, constPrec))
		b := new(big.Float).SetPrec(constPrec).Mul(big.NewFloat(4), atanInv(239, constPrec))
		piConst = a.Sub(a, b)
	})
}

// atanhInv is atanh(1/n) = Σ 1/((2k+1)·n^(2k+1)) at prec bits.
func atanhInv(n int64, prec uint) *big.Float { return arcInv(n, prec, false) }

// atanInv is atan(1/n) = Σ (−1)^k/((2k+1)·n^(2k+1)) at prec bits.
func atanInv(n int64, prec uint) *big.Float { return arcInv(n, prec, true) }

func arcInv(n int64, prec uint, alternate bool) *big.Float {
	p := prec + 32
	sum := new(big.Float).SetPrec(p)
	pow := new(big.Float).SetPrec(p).Quo(big.NewFloat(1), big.NewFloat(float64(n))) // 1/n^(2k+1)
	n2 := new(big.Float).SetPrec(p).SetInt64(n * n)
	eps := new(big.Float).SetMantExp(big.NewFloat(1), -int(p)-8)
	term := new(big.Float).SetPrec(p)
	for k := int64(0); ; k++ {
		term.Quo(pow, new(big.Float).SetInt64(2*k+1))
		if alternate && k%2 == 1 {
			sum.Sub(sum, term)
		} else {
			sum.Add(sum, term)
		}
		if term.Cmp(eps) < 0 {
			break
		}
		pow.Quo(pow, n2)
	}
	return sum.SetPrec(prec)
}

// Pi returns π at Prec bits.
func Pi() *big.Float { initConsts(); return round(piConst) }

func ln2() *big.Float { initConsts(); return ln2Const }

// Exp returns e^x.
//
// Special cases are:
//
//	Exp(x) = +Inf for x past 2^30·ln 2 (beyond big.Float's exponent range)
//	Exp(x) = 0 for x below −2^30·ln 2
//	Exp(±Inf) = +Inf, 0
//
// Method (common practice): x = k·ln 2 + r with |r| ≤ ½ ln 2, then
// e^r = (e^(r/2^20))^(2^20) with the Taylor series of the small
// argument; squaring twenty times costs twenty bits of the 320 worked
// with.
func Exp(x *big.Float) *big.Float {
	if x.IsInf() {
		if x.Sign() > 0 {
			return new(big.Float).SetPrec(Prec).SetInf(false)
		}
		return new(big.Float).SetPrec(Prec)
	}
	if x.Sign() == 0 {
		return new(big.Float).SetPrec(Prec).SetInt64(1)
	}
	const limit = float64(1<<30) * math.Ln2
	if xf, _ := x.Float64(); xf > limit {
		return new(big.Float).SetPrec(Prec).SetInf(false)
	} else if xf < -limit {
		return new(big.Float).SetPrec(Prec)
	}
	l2 := ln2()
	q := new(big.Float).SetPrec(constPrec).Quo(x, l2)
	kf, _ := q.Float64()
	k := int64(math.Round(kf))
	r := new(big.Float).SetPrec(constPrec).Mul(new(big.Float).SetPrec(constPrec).SetInt64(k), l2)
	r.Sub(new(big.Float).SetPrec(constPrec).Set(x), r)
	const halvings = 20
	r.SetPrec(work)
	r.SetMantExp(r, -halvings)
	sum := newFloat().SetInt64(1)
	term := newFloat().SetInt64(1)
	eps := new(big.Float).SetMantExp(big.NewFloat(1), -int(work)-8)
	for n := int64(1); ; n++ {
		term.Mul(term, r)
		term.Quo(term, new(big.Float).SetInt64(n))
		sum.Add(sum, term)
		if new(big.Float).Abs(term).Cmp(eps) < 0 {
			break
		}
	}
	for i := 0; i < halvings; i++ {
		sum.Mul(sum, sum)
	}
	sum.SetMantExp(sum, int(k))
	return round(sum)
}

// Log returns the natural logarithm of x > 0.
//
// Special cases are:
//
//	Log(+Inf) = +Inf
//	Log(0) = −Inf
//	Log(x < 0) is errNaN
//
// Method (common practice): x = m·2^e with m in [1/√2, √2), then
// ln x = e·ln 2 + 2·atanh((m−1)/(m+1)), |(m−1)/(m+1)| < 0.172.
func Log(x *big.Float) (*big.Float, error) {
	switch {
	case x.Sign() < 0:
		return nil, errNaN
	case x.Sign() == 0:
		return new(big.Float).SetPrec(Prec).SetInf(true), nil
	case x.IsInf():
		return new(big.Float).SetPrec(Prec).SetInf(false), nil
	}
	m := newFloat()
	e := x.MantExp(m) // m in [0.5, 1)
	if m.Cmp(big.NewFloat(math.Sqrt2/2)) < 0 {
		m.SetMantExp(m, 1)
		e--
	}
	one := newFloat().SetInt64(1)
	t := newFloat().Sub(m, one)
	t.Quo(t, newFloat().Add(m, one))
	t2 := newFloat().Mul(t, t)
	sum := newFloat().Set(t)
	pow := newFloat().Set(t)
	eps := new(big.Float).SetMantExp(big.NewFloat(1), -int(work)-8)
	for k := int64(1); ; k++ {
		pow.Mul(pow, t2)
		term := newFloat().Quo(pow, new(big.Float).SetInt64(2*k+1))
		sum.Add(sum, term)
		if new(big.Float).Abs(term).Cmp(eps) < 0 {
			break
		}
	}
	sum.SetMantExp(sum, 1)
	el := new(big.Float).SetPrec(constPrec).Mul(new(big.Float).SetPrec(constPrec).SetInt64(int64(e)), ln2())
	sum.Add(sum, el)
	return round(sum), nil
}

// Log1p returns ln(1+x) without losing the digits of a small x: the
// series x − x²/2 + x³/3 − … below 2^−20, ln at twice the precision
// above.
func Log1p(x *big.Float) (*big.Float, error) {
	if x.IsInf() || new(big.Float).Abs(x).Cmp(new(big.Float).SetMantExp(big.NewFloat(1), -20)) >= 0 {
		s := new(big.Float).SetPrec(2 * work).SetInt64(1)
		s.Add(s, x)
		return Log(s)
	}
	sum := newFloat()
	pow := newFloat().SetInt64(1)
	eps := new(big.Float).SetMantExp(big.NewFloat(1), -int(work)-8)
	for k := int64(1); ; k++ {
		pow.Mul(pow, x)
		term := newFloat().Quo(pow, new(big.Float).SetInt64(k))
		if k%2 == 0 {
			sum.Sub(sum, term)
		} else {
			sum.Add(sum, term)
		}
		if x.Sign() == 0 || new(big.Float).Abs(term).Cmp(new(big.Float).Mul(eps, new(big.Float).Abs(sum))) < 0 {
			break
		}
	}
	return round(sum), nil
}

// Expm1 returns e^x − 1 without losing the digits of a small x.
func Expm1(x *big.Float) *big.Float {
	if x.IsInf() || new(big.Float).Abs(x).Cmp(new(big.Float).SetMantExp(big.NewFloat(1), -20)) >= 0 {
		e := Exp(x)
		if e.IsInf() {
			return e
		}
		return round(newFloat().Sub(e, big.NewFloat(1)))
	}
	sum := newFloat()
	term := newFloat().SetInt64(1)
	eps := new(big.Float).SetMantExp(big.NewFloat(1), -int(work)-8)
	for k := int64(1); ; k++ {
		term.Mul(term, x)
		term.Quo(term, new(big.Float).SetInt64(k))
		sum.Add(sum, term)
		if x.Sign() == 0 || new(big.Float).Abs(term).Cmp(new(big.Float).Mul(eps, new(big.Float).Abs(sum))) < 0 {
			break
		}
	}
	return round(sum)
}

// Pow returns x^y: by repeated squaring when y is an integer of at most
// 2^20 in magnitude (exact to Prec bits), as e^(y·ln x) otherwise.
//
// Special cases are (as math.Pow's):
//
//	Pow(x, 0) = 1 for any x
//	Pow(0, y) = +Inf for y < 0, 0 for y > 0
//	Pow(x < 0, y) for y not an integer is errNaN
func Pow(x, y *big.Float) (*big.Float, error) {
	if y.Sign() == 0 {
		return new(big.Float).SetPrec(Prec).SetInt64(1), nil
	}
	if x.Sign() == 0 {
		if y.Sign() < 0 {
			return new(big.Float).SetPrec(Prec).SetInf(false), nil
		}
		return new(big.Float).SetPrec(Prec), nil
	}
	if y.IsInt() && !y.IsInf() {
		n, acc := y.Int64()
		if acc == big.Exact && n >= -(1<<20) && n <= 1<<20 {
			return powInt(x, n), nil
		}
	}
	if x.Sign() < 0 {
		return nil, errNaN
	}
	l, err := Log(x)
	if err != nil {
		return nil, err
	}
	return Exp(newFloat().Mul(l, y)), nil
}

func powInt(x *big.Float, n int64) *big.Float {
	neg := n < 0
	if neg {
		n = -n
	}
	r := newFloat().SetInt64(1)
	b := newFloat().Set(x)
	for n > 0 {
		if n&1 == 1 {
			r.Mul(r, b)
		}
		n >>= 1
		if n > 0 {
			b.Mul(b, b)
		}
	}
	if neg {
		if r.IsInf() {
			return new(big.Float).SetPrec(Prec)
		}
		r.Quo(newFloat().SetInt64(1), r)
	}
	return round(r)
}
