package valuemodel

import (
	"cmp"
	"math"
	"math/big"
	"slices"
	"strings"
)

// GammaPow is Γ(Arg)^Pow.
type GammaPow struct {
	Arg Affine
	Pow int
}

// Power is Base^Exp.
type Power struct {
	Base Affine
	Exp  Affine
}

// Term is Coef · √π^SqrtPi · ∏ Γ(Gamma[i].Arg)^Gamma[i].Pow ·
// ∏ Pows[j].Base^Pows[j].Exp · exp(Exp). The zero value is not a term;
// build terms with One, Num, FromAffine or GammaOf. Terms, their forms
// and their rationals are never modified once built: operations return
// new terms, which may share parts with their operands.
type Term struct {
	Coef   *big.Rat
	SqrtPi int
	Gamma  []GammaPow
	Pows   []Power
	Exp    Affine
}

// maxFactors caps the factors of one term; a larger product is
// unknown (nil).
const maxFactors = 24

// One returns the term 1.
func One() *Term { return &Term{Coef: ratOne, Exp: Int(0)} }

// Num returns the constant term c.
func Num(c *big.Rat) *Term { return &Term{Coef: new(big.Rat).Set(c), Exp: Int(0)} }

// FromAffine returns the term a: a constant, or a power a^1.
func FromAffine(a Affine) *Term {
	if a.IsConst() {
		return Num(a.c())
	}
	t := One()
	t.Pows = []Power{{a, Int(1)}}
	return t.norm()
}

// GammaOf returns Γ(a).
func GammaOf(a Affine) *Term {
	t := One()
	t.Gamma = []GammaPow{{a, 1}}
	return t.norm()
}

// Factorial returns n! as Γ(n+1).
func Factorial(n Affine) *Term { return GammaOf(n.Shift(1)) }

// PowOf returns b^e.
func PowOf(b, e Affine) *Term {
	t := One()
	t.Pows = []Power{{b, e}}
	return t.norm()
}

// ExpOf returns exp(x).
func ExpOf(x Affine) *Term {
	t := One()
	t.Exp = x
	return t
}

func (t *Term) clone() *Term {
	out := &Term{Coef: t.Coef, SqrtPi: t.SqrtPi, Exp: t.Exp}
	out.Gamma = append([]GammaPow(nil), t.Gamma...)
	out.Pows = append([]Power(nil), t.Pows...)
	return out
}

// Mul returns t·u; nil if either is unknown or the product is too
// large to keep.
func (t *Term) Mul(u *Term) *Term {
	if t == nil || u == nil {
		return nil
	}
	// The factors of both, each list allocated once at its full length
	// (a clone of t grown by u's would allocate twice).
	out := &Term{Coef: mulRat(t.Coef, u.Coef), SqrtPi: t.SqrtPi + u.SqrtPi, Exp: t.Exp.Add(u.Exp)}
	out.Gamma = concat(t.Gamma, u.Gamma)
	out.Pows = concat(t.Pows, u.Pows)
	return out.norm()
}

// concat returns a new slice holding a's elements then b's, nil when
// both are empty (as appending them to a nil slice gives).
func concat[E any](a, b []E) []E {
	if len(a)+len(b) == 0 {
		return nil
	}
	return append(append(make([]E, 0, len(a)+len(b)), a...), b...)
}

// Inv returns 1/t; nil for an unknown or zero term.
func (t *Term) Inv() *Term {
	if t == nil || t.Coef.Sign() == 0 {
		return nil
	}
	out := &Term{Coef: new(big.Rat).Inv(t.Coef), SqrtPi: -t.SqrtPi, Exp: t.Exp.Scale(shared(-1))}
	for _, g := range t.Gamma {
		out.Gamma = append(out.Gamma, GammaPow{g.Arg, -g.Pow})
	}
	for _, p := range t.Pows {
		out.Pows = append(out.Pows, Power{p.Base, p.Exp.Scale(shared(-1))})
	}
	return out
}

// Div returns t/u.
func (t *Term) Div(u *Term) *Term { return t.Mul(u.Inv()) }

// Neg returns −t.
func (t *Term) Neg() *Term {
	if t == nil {
		return nil
	}
	out := t.clone()
	out.Coef = new(big.Rat).Neg(out.Coef)
	return out
}

// PowInt returns t^e for an integer e; nil when t is unknown.
func (t *Term) PowInt(e int64) *Term {
	if t == nil || (e < 0 && t.Coef.Sign() == 0) || e > 64 || e < -64 {
		return nil
	}
	out := One()
	for i := int64(0); i < abs64(e); i++ {
		out = out.Mul(t)
	}
	if e < 0 {
		out = out.Inv()
	}
	return out
}

func abs64(x int64) int64 {
	if x < 0 {
		return -x
	}
	return x
}

// IsConst reports whether t is a rational constant, returning it.
func (t *Term) IsConst() (*big.Rat, bool) {
	if t == nil || t.SqrtPi != 0 || len(t.Gamma) > 0 || len(t.Pows) > 0 || !t.Exp.IsConst() || t.Exp.c().Sign() != 0 {
		return nil, false
	}
	return t.Coef, true
}

// Affine returns t as an affine form when it is one: a constant, or
// c·b^1 with b affine.
func (t *Term) Affine() (Affine, bool) {
	if t == nil || t.SqrtPi != 0 || len(t.Gamma) > 0 || !t.Exp.IsConst() || t.Exp.c().Sign() != 0 {
		return Affine{}, false
	}
	switch len(t.Pows) {
	case 0:
		return Const(t.Coef), true
	case 1:
		p := t.Pows[0]
		if p.Exp.IsConst() && isOne(p.Exp.c()) {
			return p.Base.Scale(t.Coef), true
		}
	}
	return Affine{}, false
}

// Subst replaces s by v everywhere in t.
func (t *Term) Subst(s Sym, v Affine) *Term {
	if t == nil {
		return nil
	}
	out := t.clone()
	out.Exp = out.Exp.Subst(s, v)
	for i := range out.Gamma {
		out.Gamma[i].Arg = out.Gamma[i].Arg.Subst(s, v)
	}
	for i := range out.Pows {
		out.Pows[i] = Power{out.Pows[i].Base.Subst(s, v), out.Pows[i].Exp.Subst(s, v)}
	}
	return out.norm()
}

// norm brings t into normal form: powers over one base merged and
// constant ones folded into the coefficient, every base made monic
// (its first coefficient 1, or positive constant), Γ factors merged,
// x·Γ(x) folded into Γ(x+1) and Legendre's duplication applied.
func (t *Term) norm() *Term {
	if t == nil {
		return nil
	}
	if !t.normPows() {
		return nil
	}
	t.Gamma = mergeGamma(t.Gamma)
	t.foldShift()
	t.duplicate()
	t.foldConstGamma()
	if !t.normPows() {
		return nil
	}
	if len(t.Gamma)+len(t.Pows) > maxFactors {
		return nil
	}
	// By falling power, stably; slices' sort allocates nothing (sort's
	// SliceStable did, for every term the model normalises).
	slices.SortStableFunc(t.Gamma, func(a, b GammaPow) int { return cmp.Compare(b.Pow, a.Pow) })
	return t
}

func mergeGamma(gs []GammaPow) []GammaPow {
	var out []GammaPow
	for _, g := range gs {
		merged := false
		for i := range out {
			if out[i].Arg.Equal(g.Arg) {
				out[i].Pow += g.Pow
				merged = true
				break
			}
		}
		if !merged {
			out = append(out, g)
		}
	}
	kept := out[:0]
	for _, g := range out {
		if g.Pow != 0 {
			kept = append(kept, g)
		}
	}
	return kept
}

// foldShift applies Γ(x+1) = x·Γ(x) with x = λ·b for a power b^e of
// a monic base b beside Γ(λb)^±1 or Γ(λb+1)^±1: λb·Γ(λb) = Γ(λb+1).
func (t *Term) foldShift() {
	for changed, guard := true, 0; changed && guard < 64; guard++ {
		changed = false
		for i, p := range t.Pows {
			e, ok := smallInt(p.Exp)
			if !ok || e == 0 || p.Base.IsConst() {
				continue
			}
			for j, g := range t.Gamma {
				if g.Pow != 1 && g.Pow != -1 {
					continue
				}
				var lam *big.Rat
				var shift int64
				if l, ok := ratioOf(g.Arg, p.Base); ok && sameSign(e, int64(g.Pow)) {
					lam, shift = l, 1 // b·Γ(λb) = Γ(λb+1)/λ
				} else if l, ok := ratioOf(g.Arg.Shift(-1), p.Base); ok && sameSign(e, -int64(g.Pow)) {
					lam, shift = l, -1 // b/Γ(λb+1) = 1/(λ·Γ(λb))
				} else {
					continue
				}
				t.Gamma[j].Arg = g.Arg.Shift(shift)
				if e > 0 {
					t.Coef = new(big.Rat).Quo(t.Coef, lam)
				} else {
					t.Coef = mulRat(t.Coef, lam)
				}
				step := int64(1)
				if e < 0 {
					step = -1
				}
				t.Pows[i].Exp = Int(e - step)
				if e-step == 0 {
					t.Pows = append(t.Pows[:i], t.Pows[i+1:]...)
				}
				t.Gamma = mergeGamma(t.Gamma)
				changed = true
				break
			}
			if changed {
				break
			}
		}
	}
}

// ratioOf returns λ > 0 with a = λ·b, for b not constant.
func ratioOf(a, b Affine) (*big.Rat, bool) {
	if b.IsConst() || len(a.Terms) != len(b.Terms) {
		return nil, false
	}
	lam := new(big.Rat).Quo(a.Terms[0].K, b.Terms[0].K)
	if lam.Sign() <= 0 || !a.Equal(b.Scale(lam)) {
		return nil, false
	}
	return lam, true
}

func sameSign(a, b int64) bool { return a > 0 && b > 0 || a < 0 && b < 0 }

// ratHalf is ½, never modified.
var ratHalf = big.NewRat(1, 2)

// duplicate applies Γ(z)·Γ(z+½) = 2^(1−2z)·√π·Γ(2z) to pairs of equal
// powers.
func (t *Term) duplicate() {
	if len(t.Gamma) < 2 {
		return // no pair: most terms, and the rule is asked of every one
	}
	for i := 0; i < len(t.Gamma); i++ {
		// Γ(z)'s partner argument z+½, made once per z and only read.
		var above Affine
		made := false
		for j := 0; j < len(t.Gamma); j++ {
			gi, gj := t.Gamma[i], t.Gamma[j]
			if i == j || gi.Pow != gj.Pow {
				continue
			}
			if !made {
				above, made = gi.Arg.Add(Affine{C: ratHalf}), true
			}
			if !gj.Arg.Equal(above) {
				continue
			}
			z, p := gi.Arg, gi.Pow
			rest := []GammaPow{{z.Scale(shared(2)), p}}
			for k, g := range t.Gamma {
				if k != i && k != j {
					rest = append(rest, g)
				}
			}
			t.Gamma = mergeGamma(rest)
			t.SqrtPi += p
			// 2^(p(1−2z))
			e := Int(1).Sub(z.Scale(shared(2))).Scale(rat(int64(p)))
			t.Pows = append(t.Pows, Power{Int(2), e})
			if e.IsConst() && e.c().IsInt() {
				t.Pows = t.Pows[:len(t.Pows)-1]
				t.Coef = mulRat(t.Coef, ratPow(rat(2), e.c().Num().Int64()))
			}
			i = -1
			break
		}
	}
}

// ratPow returns r^e, or nil for 0 to a negative power.
func ratPow(r *big.Rat, e int64) *big.Rat {
	if e < 0 {
		if r.Sign() == 0 {
			return nil
		}
		return ratPow(new(big.Rat).Inv(r), -e)
	}
	num := new(big.Int).Exp(r.Num(), big.NewInt(e), nil)
	den := new(big.Int).Exp(r.Denom(), big.NewInt(e), nil)
	return new(big.Rat).SetFrac(num, den)
}

// String renders t for debugging and tests: "Γ(n + 1)/(Γ(k + 1)·Γ(n - k + 1))".
func (t *Term) String() string {
	if t == nil {
		return "?"
	}
	var num, den []string
	if !isOne(t.Coef) || (len(t.Gamma) == 0 && len(t.Pows) == 0 && t.SqrtPi == 0) {
		num = append(num, ratString(t.Coef))
	}
	// put writes s^k above the line for k > 0 and s^−k below it.
	put := func(s string, k int64) {
		if abs64(k) != 1 {
			s += "^" + ratString(rat(abs64(k)))
		}
		if k > 0 {
			num = append(num, s)
		} else {
			den = append(den, s)
		}
	}
	if t.SqrtPi != 0 {
		put("√π", int64(t.SqrtPi))
	}
	for _, g := range t.Gamma {
		put("Γ("+g.Arg.String()+")", int64(g.Pow))
	}
	for _, p := range t.Pows {
		e := p.Exp
		neg := e.IsConst() && e.c().Sign() < 0 || !e.IsConst() && e.Terms[0].K.Sign() < 0 && e.c().Sign() <= 0
		if neg {
			e = e.Scale(shared(-1))
		}
		s := "(" + p.Base.String() + ")"
		if !(e.IsConst() && isOne(e.c())) {
			s += "^(" + e.String() + ")"
		}
		if neg {
			den = append(den, s)
		} else {
			num = append(num, s)
		}
	}
	if !(t.Exp.IsConst() && t.Exp.c().Sign() == 0) {
		num = append(num, "exp("+t.Exp.String()+")")
	}
	out := strings.Join(num, "·")
	if out == "" {
		out = "1"
	}
	if len(den) > 0 {
		d := strings.Join(den, "·")
		if len(den) > 1 {
			d = "(" + d + ")"
		}
		out += "/" + d
	}
	return out
}

// normPows makes every power's base monic (first coefficient 1) or a
// constant that is no perfect power, merges powers of one base and
// folds constant powers into the coefficient; false when a power of a
// non-positive constant does not fold.
func (t *Term) normPows() bool {
	if len(t.Pows) == 0 {
		return true
	}
	pows := make([]Power, 0, len(t.Pows)) // merging only shortens the list
	for _, p := range t.Pows {
		b, e := p.Base, p.Exp
		switch {
		case b.IsConst() && b.c().Sign() > 0 && b.c().IsInt():
			r, m := intRoot(b.c().Num())
			b, e = Const(new(big.Rat).SetInt(r)), e.Scale(rat(m))
		case !b.IsConst() && !isUnit(b.Terms[0].K):
			// (k·x + c)^e = |k|^e · (x·k/|k| + c/|k|)^e, kept exact when
			// e is a small integer; the sign stays in the base, where
			// it keeps the base positive.
			if small, ok := smallInt(e); ok {
				lead := new(big.Rat).Abs(b.Terms[0].K)
				t.Coef = mulRat(t.Coef, ratPow(lead, small))
				b = b.Scale(new(big.Rat).Inv(lead))
			}
		}
		merged := false
		for i := range pows {
			if pows[i].Base.Equal(b) {
				pows[i].Exp = pows[i].Exp.Add(e)
				merged = true
				break
			}
		}
		if !merged {
			pows = append(pows, Power{b, e})
		}
	}
	t.Pows = t.Pows[:0]
	for _, p := range pows {
		if p.Exp.IsConst() && p.Exp.c().Sign() == 0 {
			continue
		}
		if p.Base.IsConst() {
			if e, ok := smallInt(p.Exp); ok {
				v := ratPow(p.Base.c(), e)
				if v == nil {
					return false
				}
				t.Coef = mulRat(t.Coef, v)
				continue
			}
			if p.Base.c().Sign() <= 0 {
				return false
			}
		}
		t.Pows = append(t.Pows, p)
	}
	return true
}

// smallInt returns a constant integer exponent of at most 64 in size.
func smallInt(e Affine) (int64, bool) {
	if !e.IsConst() || !e.c().IsInt() || !e.c().Num().IsInt64() {
		return 0, false
	}
	v := e.c().Num().Int64()
	return v, abs64(v) <= 64
}

// intRoot returns the smallest r with r^m = n, and m.
func intRoot(n *big.Int) (*big.Int, int64) {
	for m := int64(n.BitLen()); m >= 2; m-- {
		r := new(big.Int).Sqrt(n)
		if m > 2 {
			// integer m-th root by Newton's method on a float guess,
			// then checked exactly
			f, _ := new(big.Float).SetInt(n).Float64()
			g := big.NewInt(int64(math.Round(math.Pow(f, 1/float64(m)))))
			r = g
		}
		if r.Sign() > 0 && new(big.Int).Exp(r, big.NewInt(m), nil).Cmp(n) == 0 {
			return r, m
		}
	}
	return n, 1
}

// foldConstGamma replaces Γ of a positive integer or half-integer
// constant of at most 64 by its value: Γ(m) = (m−1)! and
// Γ(m+½) = (2m)!/(4^m·m!)·√π (DLMF 5.4.1 and 5.4.6, from memory).
func (t *Term) foldConstGamma() {
	kept := t.Gamma[:0]
	for _, g := range t.Gamma {
		a := g.Arg
		if !a.IsConst() || a.c().Sign() <= 0 || a.c().Cmp(rat(64)) > 0 {
			kept = append(kept, g)
			continue
		}
		var v *big.Rat
		sqrtPi := 0
		switch c := a.c(); {
		case c.IsInt():
			v = new(big.Rat).SetInt(new(big.Int).MulRange(1, c.Num().Int64()-1))
		case c.Denom().Cmp(big.NewInt(2)) == 0:
			m := new(big.Rat).Sub(c, big.NewRat(1, 2)).Num().Int64()
			num := new(big.Int).MulRange(1, 2*m)
			den := new(big.Int).Mul(new(big.Int).Exp(big.NewInt(4), big.NewInt(m), nil), new(big.Int).MulRange(1, m))
			v, sqrtPi = new(big.Rat).SetFrac(num, den), 1
		default:
			kept = append(kept, g)
			continue
		}
		t.Coef = mulRat(t.Coef, ratPow(v, int64(g.Pow)))
		t.SqrtPi += sqrtPi * g.Pow
	}
	t.Gamma = kept
}
