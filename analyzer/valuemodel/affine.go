package valuemodel

import (
	"fmt"
	"go/ast"
	"go/types"
	"math/big"
	"strings"

	"github.com/overfact/overfact/internal/linform"
)

// Sym is a variable of the function: a local or parameter (Obj), a
// numeric field of one (Obj.Field), the iteration index of a loop
// (Loop, counting trips from 0), or the value a local got from an
// assignment the algebra cannot evaluate (Obj with Def, that
// assignment), which is a variable of its own until the next one, or
// the number of trips of a loop that runs until a condition of its
// own (Def alone, the loop), or the length of a slice variable that
// keeps one length (Obj the builtin len, Field the variable).
type Sym struct {
	Obj   types.Object
	Field types.Object
	Loop  ast.Node
	Def   ast.Node
}

// Name renders the variable as code names it.
func (s Sym) Name() string {
	switch {
	case s.Def != nil && s.Obj == nil:
		return "trips"
	case s.isLen():
		return "len(" + s.Field.Name() + ")"
	case s.Loop != nil:
		return "t"
	case s.Obj == nil:
		return "?"
	case s.Field != nil:
		return s.Obj.Name() + "." + s.Field.Name()
	}
	return s.Obj.Name()
}

// Before orders variables by position, ties broken by kind, so that
// two different variables never compare equal (the order of the terms
// of an Affine).
func (s Sym) Before(t Sym) bool {
	if p, q := s.pos(), t.pos(); p != q {
		return p < q
	}
	if s == t {
		return false
	}
	return s.rank() < t.rank()
}

// rank breaks ties of pos between distinct variables at one position
// (a variable and a loop starting there).
func (s Sym) rank() int {
	switch {
	case s.isLen():
		return 4
	case s.Def != nil:
		return 3
	case s.Loop != nil:
		return 2
	case s.Field != nil:
		return 1
	}
	return 0
}

func (s Sym) pos() int {
	switch {
	case s.Def != nil && s.Obj == nil:
		return int(s.Def.Pos()) << 21
	case s.Def != nil:
		// The assignment first, then the variable among those it
		// assigns (close together, within 2^20 of one another).
		return int(s.Def.Pos())<<21 | int(s.Obj.Pos())&(1<<20-1)
	case s.Loop != nil:
		return int(s.Loop.Pos()) << 1
	case s.Obj != nil:
		p := int(s.Obj.Pos()) << 1
		if s.Field != nil {
			p += int(s.Field.Pos()) + 1
		}
		return p
	}
	return 0
}

// isLen reports whether s is len(Field) of a slice variable.
func (s Sym) isLen() bool {
	_, ok := s.Obj.(*types.Builtin)
	return ok && s.Field != nil
}

// form is the shared implementation of linear forms over the value
// model's variables, with exact rational coefficients.
type form = linform.Form[Sym, *big.Rat, linform.Rat]

// Affine is C + Σ K·Sym with rational coefficients, terms sorted by
// the position of their variable and no zero coefficient. Its
// arithmetic is internal/linform's; the methods below convert.
type Affine form

var ratDomain linform.Rat

// rat returns n as a new rational. SetInt64 rather than big.NewRat(n,
// 1): NewRat reduces the fraction by a GCD of its operands, allocating
// four integers for a denominator that is 1 anyway.
func rat(n int64) *big.Rat { return new(big.Rat).SetInt64(n) }

// shared returns n as a rational the caller must not modify.
func shared(n int64) *big.Rat { return linform.SharedInt(n) }

var ratOne = shared(1)

// isOne reports whether r is 1, as r.Cmp(ratOne) == 0 does without its
// allocations (Cmp scales both operands into new integers): the model
// asks it of every coefficient and exponent it normalises.
func isOne(r *big.Rat) bool { return r.IsInt() && r.Num().IsInt64() && r.Num().Int64() == 1 }

// isUnit reports whether r is 1 or -1, without allocating.
func isUnit(r *big.Rat) bool {
	return r.IsInt() && r.Num().IsInt64() && (r.Num().Int64() == 1 || r.Num().Int64() == -1)
}

// addRat returns x+y, shared when both are small integers.
func addRat(x, y *big.Rat) *big.Rat { return ratDomain.Add(x, y) }

// mulRat returns x·y, shared when both are small integers.
func mulRat(x, y *big.Rat) *big.Rat { return ratDomain.Mul(x, y) }

// Const returns the constant form c.
func Const(c *big.Rat) Affine { return Affine{C: new(big.Rat).Set(c)} }

// Int returns the constant form n.
func Int(n int64) Affine { return Affine{C: shared(n)} }

// Var returns the form 1·s.
func Var(s Sym) Affine { return Affine(linform.Single[Sym, *big.Rat, linform.Rat](s)) }

// c returns the constant of a, which the caller must not modify.
func (a Affine) c() *big.Rat {
	if a.C == nil {
		return shared(0)
	}
	return a.C
}

// Add returns a+b.
func (a Affine) Add(b Affine) Affine { return Affine(form(a).Add(form(b))) }

// Scale returns r·a.
func (a Affine) Scale(r *big.Rat) Affine { return Affine(form(a).Scale(r)) }

// Sub returns a−b.
func (a Affine) Sub(b Affine) Affine { return Affine(form(a).Sub(form(b))) }

// Shift returns a+n.
func (a Affine) Shift(n int64) Affine { return Affine(form(a).Shift(n)) }

// IsConst reports whether a has no variable.
func (a Affine) IsConst() bool { return form(a).IsConst() }

// Coef returns the coefficient of s (0 when absent).
func (a Affine) Coef(s Sym) *big.Rat {
	if k, ok := form(a).Coef(s); ok {
		return k
	}
	return new(big.Rat)
}

// Has reports whether a depends on s.
func (a Affine) Has(s Sym) bool { return a.Coef(s).Sign() != 0 }

// Equal reports whether a and b are the same form.
func (a Affine) Equal(b Affine) bool { return form(a).Equal(form(b)) }

// Subst replaces s by v in a.
func (a Affine) Subst(s Sym, v Affine) Affine { return Affine(form(a).Subst(s, form(v))) }

// Integral reports whether every coefficient and the constant are
// integers.
func (a Affine) Integral() bool {
	if !a.c().IsInt() {
		return false
	}
	for _, l := range a.Terms {
		if !l.K.IsInt() {
			return false
		}
	}
	return true
}

// Syms returns the variables of a.
func (a Affine) Syms() []Sym { return form(a).Syms() }

// String renders a as code would: "2*k + 1", "n - k".
func (a Affine) String() string {
	var b strings.Builder
	for i, l := range a.Terms {
		k := l.K
		neg := k.Sign() < 0
		abs := new(big.Rat).Abs(k)
		switch {
		case i == 0 && neg:
			b.WriteString("-")
		case i > 0 && neg:
			b.WriteString(" - ")
		case i > 0:
			b.WriteString(" + ")
		}
		if abs.Cmp(rat(1)) != 0 {
			b.WriteString(ratString(abs) + "*")
		}
		b.WriteString(l.Sym.Name())
	}
	c := a.c()
	switch {
	case len(a.Terms) == 0:
		return ratString(c)
	case c.Sign() > 0:
		b.WriteString(" + " + ratString(c))
	case c.Sign() < 0:
		b.WriteString(" - " + ratString(new(big.Rat).Neg(c)))
	}
	return b.String()
}

func ratString(r *big.Rat) string {
	if r.IsInt() {
		return r.Num().String()
	}
	return fmt.Sprintf("%s/%s", r.Num(), r.Denom())
}

// At evaluates a with the variables given by val; ok is false when a
// variable has no value.
func (a Affine) At(val map[Sym]*big.Rat) (*big.Rat, bool) {
	out := new(big.Rat).Set(a.c())
	for _, l := range a.Terms {
		v, ok := val[l.Sym]
		if !ok {
			return nil, false
		}
		out.Add(out, new(big.Rat).Mul(l.K, v))
	}
	return out, true
}
