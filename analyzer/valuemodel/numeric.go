package valuemodel

import (
	"math"
	"math/big"
)

// LogAbs returns ln |t| at the variables' values val, with Γ through
// math.Lgamma, so that a caller can compare a term with a direct
// computation; ok is false when a variable has no value or a Γ
// argument is a pole.
func (t *Term) LogAbs(val map[Sym]float64) (float64, bool) {
	if t == nil {
		return 0, false
	}
	at := func(a Affine) (float64, bool) {
		v, _ := a.c().Float64()
		for _, l := range a.Terms {
			x, ok := val[l.Sym]
			if !ok {
				return 0, false
			}
			k, _ := l.K.Float64()
			v += k * x
		}
		return v, true
	}
	c, _ := t.Coef.Float64()
	if c == 0 {
		return math.Inf(-1), true
	}
	out := math.Log(math.Abs(c)) + float64(t.SqrtPi)*0.5*math.Log(math.Pi)
	for _, g := range t.Gamma {
		x, ok := at(g.Arg)
		if !ok || x <= 0 && x == math.Trunc(x) {
			return 0, false
		}
		lg, _ := math.Lgamma(x)
		out += float64(g.Pow) * lg
	}
	for _, p := range t.Pows {
		b, ok1 := at(p.Base)
		e, ok2 := at(p.Exp)
		if !ok1 || !ok2 {
			return 0, false
		}
		out += e * math.Log(math.Abs(b))
	}
	x, ok := at(t.Exp)
	if !ok {
		return 0, false
	}
	return out + x, true
}

// RatAt returns the exact value of t at val: Γ of positive whole
// numbers as factorials, Γ(m + 1/2) = (2m)!·√π/(4^m·m!) (DLMF 5.5.5,
// the duplication formula at a whole m, from memory) with the √π
// factors cancelling, powers with whole exponents, and no exponential.
// ok is false where the value is not one of those.
func (t *Term) RatAt(val map[Sym]*big.Rat) (*big.Rat, bool) {
	if t == nil {
		return nil, false
	}
	at := func(a Affine) (*big.Rat, bool) { return a.At(val) }
	if x, ok := at(t.Exp); !ok || x.Sign() != 0 {
		return nil, false
	}
	const maxArg = 1 << 16
	fact := func(m int64) *big.Int { return new(big.Int).MulRange(1, m) }
	sqrtPi := t.SqrtPi
	out := new(big.Rat).Set(t.Coef)
	for _, g := range t.Gamma {
		x, ok := at(g.Arg)
		if !ok || x.Sign() <= 0 || !x.Num().IsInt64() || x.Num().Int64() > 2*maxArg {
			return nil, false
		}
		var f *big.Rat
		switch {
		case x.IsInt():
			f = new(big.Rat).SetInt(fact(x.Num().Int64() - 1))
		case x.Denom().Cmp(big.NewInt(2)) == 0:
			m := (x.Num().Int64() - 1) / 2
			den := new(big.Int).Lsh(fact(m), uint(2*m))
			f = new(big.Rat).SetFrac(fact(2*m), den)
			sqrtPi += g.Pow
		default:
			return nil, false
		}
		out.Mul(out, ratPow(f, int64(g.Pow)))
	}
	if sqrtPi != 0 {
		return nil, false
	}
	for _, p := range t.Pows {
		b, ok1 := at(p.Base)
		e, ok2 := at(p.Exp)
		if !ok1 || !ok2 || !e.IsInt() || !e.Num().IsInt64() || e.Num().Int64() > maxArg || e.Num().Int64() < -maxArg {
			return nil, false
		}
		r := ratPow(b, e.Num().Int64())
		if r == nil {
			return nil, false
		}
		out.Mul(out, r)
	}
	return out, true
}
