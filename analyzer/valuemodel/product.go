package valuemodel

import "math/big"

// ProductOver returns ∏_{t=0}^{n−1} f(t), the value a loop of n trips
// multiplies in when it multiplies by f(t) on trip t, as a closed term;
// nil when no closed form of the algebra holds it.
//
// A factor of f that does not depend on t contributes its n-th power;
// a power (αt+β)^e with e a constant integer contributes
// (α^n·Γ(n+β/α)/Γ(β/α))^e for α > 0 (the rising factorial of β/α over
// n factors) and (|α|^n·Γ(β/|α|+1)/Γ(β/|α|−n+1))^e for α < 0 (the
// falling one). Γ factors and exponentials of f must not depend on t,
// and n must be a constant where an exponent is not.
func ProductOver(f *Term, t Sym, n Affine) *Term {
	if f == nil {
		return nil
	}
	out := One()
	// The coefficient: c^n.
	if !isOne(f.Coef) {
		c := new(big.Rat).Abs(f.Coef)
		if f.Coef.Sign() < 0 {
			if !n.IsConst() {
				return nil // the sign alternates with the count
			}
			if n.c().IsInt() && n.c().Num().Bit(0) == 1 {
				out = out.Neg()
			}
		}
		if !isOne(c) {
			out = out.Mul(powN(Const(c), Int(1), n))
		}
	}
	if f.SqrtPi != 0 {
		if !n.IsConst() {
			return nil
		}
		out = out.Mul(&Term{Coef: rat(1), SqrtPi: f.SqrtPi * int(n.c().Num().Int64()), Exp: Int(0)})
	}
	for _, g := range f.Gamma {
		if g.Arg.Has(t) {
			return nil
		}
		if !n.IsConst() || !n.c().IsInt() {
			return nil
		}
		out = out.Mul(&Term{Coef: rat(1), Gamma: []GammaPow{{g.Arg, g.Pow * int(n.c().Num().Int64())}}, Exp: Int(0)})
	}
	if f.Exp.Has(t) {
		return nil
	}
	if !(f.Exp.IsConst() && f.Exp.c().Sign() == 0) {
		e := mulAffine(f.Exp, n)
		if e == nil {
			return nil
		}
		out = out.Mul(ExpOf(*e))
	}
	for _, p := range f.Pows {
		if p.Exp.Has(t) {
			return nil
		}
		if !p.Base.Has(t) {
			out = out.Mul(powN(p.Base, p.Exp, n))
			continue
		}
		if !p.Exp.IsConst() || !p.Exp.c().IsInt() {
			return nil
		}
		e := p.Exp.c().Num().Int64()
		alpha := p.Base.Coef(t)
		beta := p.Base.Sub(Var(t).Scale(alpha))
		var r *Term
		if alpha.Sign() > 0 {
			x := beta.Scale(new(big.Rat).Inv(alpha))
			r = GammaOf(x.Add(n)).Div(GammaOf(x))
			if !isOne(alpha) {
				r = r.Mul(powN(Const(alpha), Int(1), n))
			}
		} else {
			a := new(big.Rat).Neg(alpha)
			x := beta.Scale(new(big.Rat).Inv(a))
			r = GammaOf(x.Shift(1)).Div(GammaOf(x.Shift(1).Sub(n)))
			if !isOne(a) {
				r = r.Mul(powN(Const(a), Int(1), n))
			}
		}
		out = out.Mul(r.PowInt(e))
	}
	return out
}

// powN returns (b^e)^n, nil when e·n is not affine.
func powN(b, e, n Affine) *Term {
	x := mulAffine(e, n)
	if x == nil {
		return nil
	}
	return PowOf(b, *x)
}

// mulAffine returns a·b when one of them is constant.
func mulAffine(a, b Affine) *Affine {
	switch {
	case a.IsConst():
		x := b.Scale(a.c())
		return &x
	case b.IsConst():
		x := a.Scale(b.c())
		return &x
	}
	return nil
}
