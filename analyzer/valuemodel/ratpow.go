package valuemodel

import "math/big"

// Powers of a term to a rational or affine exponent, as √x, x^0.5 and
// ½·ln x read in log space give them: t^r multiplies every exponent of t
// by r. A coefficient that is no perfect power stays a power of a
// constant base (√(2π) is (2π)^(1/2), π being the rational value of the
// constant math.Pi), so a √π^s or Γ power that r would leave fractional
// makes the result unknown.

// PowRat returns t^r; nil when t is unknown, its coefficient is not
// positive (for a fractional r), or a Γ or √π power of t would not stay
// an integer.
func (t *Term) PowRat(r *big.Rat) *Term {
	if t == nil {
		return nil
	}
	if r.IsInt() && r.Num().IsInt64() {
		return t.PowInt(r.Num().Int64())
	}
	return t.PowAffine(Const(r))
}

// PowAffine returns t^k for an affine k: nil when t is unknown, its
// coefficient is not positive (unless k is an integer constant), or an
// exponent of t times k would leave the algebra (a Γ factor or a √π
// power to a variable or fractional exponent, a power whose exponent is
// not constant raised to a variable one).
func (t *Term) PowAffine(k Affine) *Term {
	if t == nil {
		return nil
	}
	if k.IsConst() && k.c().IsInt() && k.c().Num().IsInt64() {
		return t.PowInt(k.c().Num().Int64())
	}
	if t.Coef.Sign() <= 0 {
		return nil
	}
	out := One()
	if !isOne(t.Coef) {
		out.Pows = append(out.Pows, Power{Const(t.Coef), k})
	}
	if t.SqrtPi != 0 || len(t.Gamma) > 0 {
		if !k.IsConst() {
			return nil
		}
		s := new(big.Rat).Mul(rat(int64(t.SqrtPi)), k.c())
		if !s.IsInt() {
			return nil
		}
		out.SqrtPi = int(s.Num().Int64())
		for _, g := range t.Gamma {
			p := new(big.Rat).Mul(rat(int64(g.Pow)), k.c())
			if !p.IsInt() {
				return nil
			}
			out.Gamma = append(out.Gamma, GammaPow{g.Arg, int(p.Num().Int64())})
		}
	}
	for _, p := range t.Pows {
		switch {
		case p.Exp.IsConst():
			out.Pows = append(out.Pows, Power{p.Base, k.Scale(p.Exp.c())})
		case k.IsConst():
			out.Pows = append(out.Pows, Power{p.Base, p.Exp.Scale(k.c())})
		default:
			return nil
		}
	}
	switch {
	case t.Exp.IsConst():
		out.Exp = k.Scale(t.Exp.c())
	case k.IsConst():
		out.Exp = t.Exp.Scale(k.c())
	default:
		return nil
	}
	return out.norm()
}
