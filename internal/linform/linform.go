// Package linform is the one implementation of linear forms
// c + Σ kᵢ·vᵢ that the analyzer, its value model and the fixer share.
//
// A Form is generic in two things: what a variable is (a types.Object,
// the value model's symbols) and the number domain of its coefficients.
// There are three domains, because the code that reads forms needs three
// kinds of arithmetic:
//
//   - Rat, exact rationals: the value model's algebra and the fixer's
//     identities (1.0/6 stays 1/6, so 1 − 1.0/6 and 5.0/6 compare equal);
//   - Int64, machine integers: factorial arguments compared as n, n−k and
//     2n, whose constants meet the int64 intervals of analyzer/ranges;
//   - Float64, IEEE arithmetic as the analysed code does it, NaN and
//     ±Inf included: the arguments of math.Gamma, such as (nu+1)/2.
//
// Every form keeps its terms sorted by the variables' order (Var.Before)
// with no zero coefficient, so that two forms are equal exactly when
// their difference has no term and a zero constant.
package linform

import (
	"go/types"
	"math/big"
)

// A Var is a variable of a form: comparable, and ordered by Before, a
// strict total order.
type Var[V any] interface {
	comparable
	Before(V) bool
}

// A Domain is the arithmetic of a form's coefficients. Its zero value
// is ready to use.
type Domain[N any] interface {
	Int(n int64) N
	Add(x, y N) N
	Mul(x, y N) N
	// Sign is -1, 0 or +1; a value that is not a number (a float NaN)
	// is not zero.
	Sign(x N) int
}

// Term is one term K·Sym of a form.
type Term[V any, N any] struct {
	Sym V
	K   N
}

// Form is C + Σ K·Sym over the domain D.
type Form[V Var[V], N any, D Domain[N]] struct {
	C     N
	Terms []Term[V, N]
}

// Single returns the form 1·v.
func Single[V Var[V], N any, D Domain[N]](v V) Form[V, N, D] {
	var d D
	return Form[V, N, D]{C: d.Int(0), Terms: []Term[V, N]{{v, d.Int(1)}}}
}

// Add returns f+g, merging the two sorted term lists.
func (f Form[V, N, D]) Add(g Form[V, N, D]) Form[V, N, D] {
	var d D
	out := Form[V, N, D]{C: d.Add(f.C, g.C)}
	if len(f.Terms)+len(g.Terms) > 0 {
		out.Terms = make([]Term[V, N], 0, len(f.Terms)+len(g.Terms))
	}
	i, j := 0, 0
	for i < len(f.Terms) || j < len(g.Terms) {
		switch {
		case j == len(g.Terms) || i < len(f.Terms) && f.Terms[i].Sym.Before(g.Terms[j].Sym):
			out.Terms = append(out.Terms, f.Terms[i])
			i++
		case i == len(f.Terms) || g.Terms[j].Sym.Before(f.Terms[i].Sym):
			out.Terms = append(out.Terms, g.Terms[j])
			j++
		default: // the same variable
			if k := d.Add(f.Terms[i].K, g.Terms[j].K); d.Sign(k) != 0 {
				out.Terms = append(out.Terms, Term[V, N]{f.Terms[i].Sym, k})
			}
			i++
			j++
		}
	}
	return out
}

// Scale returns k·f.
func (f Form[V, N, D]) Scale(k N) Form[V, N, D] {
	var d D
	out := Form[V, N, D]{C: d.Mul(f.C, k)}
	if d.Sign(k) == 0 {
		return out
	}
	for _, t := range f.Terms {
		out.Terms = append(out.Terms, Term[V, N]{t.Sym, d.Mul(t.K, k)})
	}
	return out
}

// Neg returns −f.
func (f Form[V, N, D]) Neg() Form[V, N, D] {
	var d D
	return f.Scale(d.Int(-1))
}

// Sub returns f−g.
func (f Form[V, N, D]) Sub(g Form[V, N, D]) Form[V, N, D] { return f.Add(g.Neg()) }

// Shift returns f+n.
func (f Form[V, N, D]) Shift(n int64) Form[V, N, D] {
	var d D
	return f.Add(Form[V, N, D]{C: d.Int(n)})
}

// IsConst reports whether f has no variable.
func (f Form[V, N, D]) IsConst() bool { return len(f.Terms) == 0 }

// Coef returns the coefficient of v, and whether f has v.
func (f Form[V, N, D]) Coef(v V) (N, bool) {
	for _, t := range f.Terms {
		if t.Sym == v {
			return t.K, true
		}
	}
	var d D
	return d.Int(0), false
}

// Equal reports whether f and g are the same form.
func (f Form[V, N, D]) Equal(g Form[V, N, D]) bool {
	var d D
	diff := f.Sub(g)
	return diff.IsConst() && d.Sign(diff.C) == 0
}

// Subst replaces v by g in f.
func (f Form[V, N, D]) Subst(v V, g Form[V, N, D]) Form[V, N, D] {
	k, ok := f.Coef(v)
	if !ok {
		return f
	}
	return f.Sub(Single[V, N, D](v).Scale(k)).Add(g.Scale(k))
}

// Without returns f with the term of v removed.
func (f Form[V, N, D]) Without(v V) Form[V, N, D] {
	k, ok := f.Coef(v)
	if !ok {
		return f
	}
	return f.Sub(Single[V, N, D](v).Scale(k))
}

// Syms returns the variables of f, in order.
func (f Form[V, N, D]) Syms() []V {
	var out []V
	for _, t := range f.Terms {
		out = append(out, t.Sym)
	}
	return out
}

// Obj is a variable of the analysed code as the type checker names it,
// ordered by its position.
type Obj struct{ types.Object }

// Before orders objects by position; objects at one position (from
// export data, whose positions are coarse) by name and package.
func (o Obj) Before(p Obj) bool {
	if a, b := o.Pos(), p.Pos(); a != b {
		return a < b
	}
	if a, b := o.Name(), p.Name(); a != b {
		return a < b
	}
	return pkgPath(o.Object) < pkgPath(p.Object)
}

func pkgPath(o types.Object) string {
	if o.Pkg() == nil {
		return ""
	}
	return o.Pkg().Path()
}

// Int64 is the domain of machine integers.
type Int64 struct{}

func (Int64) Int(n int64) int64    { return n }
func (Int64) Add(x, y int64) int64 { return x + y }
func (Int64) Mul(x, y int64) int64 { return x * y }
func (Int64) Sign(x int64) int     { return sign(x) }
func sign[T int64 | float64](x T) int {
	switch {
	case x > 0:
		return 1
	case x < 0:
		return -1
	case x == 0:
		return 0
	}
	return 1 // NaN
}

// Float64 is the domain of IEEE doubles, NaN and infinities included.
type Float64 struct{}

func (Float64) Int(n int64) float64      { return float64(n) }
func (Float64) Add(x, y float64) float64 { return x + y }
func (Float64) Mul(x, y float64) float64 { return x * y }
func (Float64) Sign(x float64) int       { return sign(x) }

// Rat is the domain of exact rationals. A nil *big.Rat is zero. Its
// results may be shared values (the small integers): callers never
// modify a coefficient in place.
type Rat struct{}

func (Rat) Int(n int64) *big.Rat { return SharedInt(n) }

// Add returns x+y, shared when both are small integers.
func (Rat) Add(x, y *big.Rat) *big.Rat {
	x, y = orZero(x), orZero(y)
	if a, ok := smallInt64(x); ok {
		if b, ok := smallInt64(y); ok {
			return SharedInt(a + b)
		}
	}
	return new(big.Rat).Add(x, y)
}

// Mul returns x·y, shared when both are small integers.
func (Rat) Mul(x, y *big.Rat) *big.Rat {
	x, y = orZero(x), orZero(y)
	if a, ok := smallInt64(x); ok {
		if b, ok := smallInt64(y); ok {
			return SharedInt(a * b)
		}
	}
	return new(big.Rat).Mul(x, y)
}

func (Rat) Sign(x *big.Rat) int { return orZero(x).Sign() }

func orZero(x *big.Rat) *big.Rat {
	if x == nil {
		return SharedInt(0)
	}
	return x
}

// smallRats holds the integers −64…64 as rationals that are only ever
// read: forms share them instead of allocating.
var smallRats = func() (out [129]*big.Rat) {
	for i := range out {
		out[i] = big.NewRat(int64(i-64), 1)
	}
	return out
}()

// SharedInt returns n as a rational the caller must not modify.
func SharedInt(n int64) *big.Rat {
	if n >= -64 && n <= 64 {
		return smallRats[n+64]
	}
	return new(big.Rat).SetInt64(n) // no GCD, which big.NewRat(n, 1) computes
}

// smallInt64 returns r as an int64 when it is an integer of at most
// 2^30 in size, where sums and products of two stay exact in int64.
func smallInt64(r *big.Rat) (int64, bool) {
	if !r.IsInt() || !r.Num().IsInt64() {
		return 0, false
	}
	v := r.Num().Int64()
	return v, v >= -1<<30 && v <= 1<<30
}
