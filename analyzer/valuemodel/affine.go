package valuemodel

import (
	"fmt"
	"go/ast"
	"go/types"
	"math/big"
	"strings"
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

// before orders variables by position, ties broken by kind, so that
// two different variables never compare equal.
func (s Sym) before(t Sym) bool {
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

// Lin is one term k·Sym of an affine form.
type Lin struct {
	Sym Sym
	K   *big.Rat
}

// Affine is C + Σ K·Sym with rational coefficients, terms sorted by
// the position of their variable and no zero coefficient.
type Affine struct {
	C     *big.Rat
	Terms []Lin
}

func rat(n int64) *big.Rat { return big.NewRat(n, 1) }

// smallRats holds the integers −64…64 as rationals that are only ever
// read: forms share them instead of allocating.
var smallRats = func() (out [129]*big.Rat) {
	for i := range out {
		out[i] = big.NewRat(int64(i-64), 1)
	}
	return out
}()

// shared returns n as a rational the caller must not modify.
func shared(n int64) *big.Rat {
	if n >= -64 && n <= 64 {
		return smallRats[n+64]
	}
	return big.NewRat(n, 1)
}

var ratOne = shared(1)

// smallInt64 returns r as an int64 when it is an integer of at most
// 2^30 in size, where sums and products of two stay exact in int64.
func smallInt64(r *big.Rat) (int64, bool) {
	if !r.IsInt() || !r.Num().IsInt64() {
		return 0, false
	}
	v := r.Num().Int64()
	return v, v >= -1<<30 && v <= 1<<30
}

// addRat returns x+y, shared when both are small integers.
func addRat(x, y *big.Rat) *big.Rat {
	if a, ok := smallInt64(x); ok {
		if b, ok := smallInt64(y); ok {
			return shared(a + b)
		}
	}
	return new(big.Rat).Add(x, y)
}

// mulRat returns x·y, shared when both are small integers.
func mulRat(x, y *big.Rat) *big.Rat {
	if a, ok := smallInt64(x); ok {
		if b, ok := smallInt64(y); ok {
			return shared(a * b)
		}
	}
	return new(big.Rat).Mul(x, y)
}

// Const returns the constant form c.
func Const(c *big.Rat) Affine { return Affine{C: new(big.Rat).Set(c)} }

// Int returns the constant form n.
func Int(n int64) Affine { return Affine{C: shared(n)} }

// Var returns the form 1·s.
func Var(s Sym) Affine { return Affine{C: shared(0), Terms: []Lin{{s, ratOne}}} }

// c returns the constant of a, which the caller must not modify.
func (a Affine) c() *big.Rat {
	if a.C == nil {
		return shared(0)
	}
	return a.C
}

// Add returns a+b, merging the two sorted term lists.
func (a Affine) Add(b Affine) Affine {
	out := Affine{C: addRat(a.c(), b.c())}
	if len(a.Terms)+len(b.Terms) > 0 {
		out.Terms = make([]Lin, 0, len(a.Terms)+len(b.Terms))
	}
	i, j := 0, 0
	for i < len(a.Terms) || j < len(b.Terms) {
		switch {
		case j == len(b.Terms) || i < len(a.Terms) && a.Terms[i].Sym.before(b.Terms[j].Sym):
			out.Terms = append(out.Terms, a.Terms[i])
			i++
		case i == len(a.Terms) || b.Terms[j].Sym.before(a.Terms[i].Sym):
			out.Terms = append(out.Terms, b.Terms[j])
			j++
		default: // the same variable
			if k := addRat(a.Terms[i].K, b.Terms[j].K); k.Sign() != 0 {
				out.Terms = append(out.Terms, Lin{a.Terms[i].Sym, k})
			}
			i++
			j++
		}
	}
	return out
}

// Scale returns r·a.
func (a Affine) Scale(r *big.Rat) Affine {
	out := Affine{C: mulRat(a.c(), r)}
	if r.Sign() == 0 {
		return out
	}
	for _, l := range a.Terms {
		out.Terms = append(out.Terms, Lin{l.Sym, mulRat(l.K, r)})
	}
	return out
}

// Sub returns a−b.
func (a Affine) Sub(b Affine) Affine { return a.Add(b.Scale(shared(-1))) }

// Shift returns a+n.
func (a Affine) Shift(n int64) Affine { return a.Add(Int(n)) }

// IsConst reports whether a has no variable.
func (a Affine) IsConst() bool { return len(a.Terms) == 0 }

// Coef returns the coefficient of s (0 when absent).
func (a Affine) Coef(s Sym) *big.Rat {
	for _, l := range a.Terms {
		if l.Sym == s {
			return l.K
		}
	}
	return new(big.Rat)
}

// Has reports whether a depends on s.
func (a Affine) Has(s Sym) bool { return a.Coef(s).Sign() != 0 }

// Equal reports whether a and b are the same form.
func (a Affine) Equal(b Affine) bool {
	d := a.Sub(b)
	return d.IsConst() && d.c().Sign() == 0
}

// Subst replaces s by v in a.
func (a Affine) Subst(s Sym, v Affine) Affine {
	k := a.Coef(s)
	if k.Sign() == 0 {
		return a
	}
	return a.Sub(Var(s).Scale(k)).Add(v.Scale(k))
}

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
func (a Affine) Syms() []Sym {
	var out []Sym
	for _, l := range a.Terms {
		out = append(out, l.Sym)
	}
	return out
}

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
