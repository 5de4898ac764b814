package thresholds

import (
	"math"
	"math/big"
	"strings"
)

// Limit is the first argument at which a shape stops fitting a type.
type Limit struct {
	// FirstBad is the smallest argument whose result does not fit, or
	// math.MaxInt64 if every argument below 2^62 fits.
	FirstBad int64
	// LastGood is the exact result of the shape at FirstBad−1, the
	// largest that fits; nil when FirstBad is math.MaxInt64.
	LastGood *big.Int
	// Peak is the largest intermediate the computation forms at
	// FirstBad−1 (the numerator n! of a ratio, b*(n-k+i) of a loop). It
	// equals LastGood for shapes whose only intermediate is the result.
	Peak *big.Int
}

// None reports whether no argument below 2^62 breaks the shape.
func (l Limit) None() bool { return l.FirstBad == math.MaxInt64 }

// LastGoodApprox formats LastGood with 3 significant digits, as in
// "2.43e18"; values below 1000 are written in full, and "none" stands
// for a missing LastGood.
func (l Limit) LastGoodApprox() string { return approx(l.LastGood) }

// Approx formats v as LastGoodApprox does.
func Approx(v *big.Int) string { return approx(v) }

func approx(v *big.Int) string {
	if v == nil {
		return "none"
	}
	if v.CmpAbs(big.NewInt(1000)) < 0 {
		return v.String()
	}
	s := new(big.Float).SetInt(v).Text('e', 2) // "2.43e+18"
	mant, exp, _ := strings.Cut(s, "e")
	exp = strings.TrimLeft(strings.TrimPrefix(exp, "+"), "0")
	return mant + "e" + exp
}

// clone returns l with private copies of its big integers, so that a
// caller cannot change the cached value.
func (l Limit) clone() Limit {
	return Limit{FirstBad: l.FirstBad, LastGood: copyInt(l.LastGood), Peak: copyInt(l.Peak)}
}

func copyInt(x *big.Int) *big.Int {
	if x == nil {
		return nil
	}
	return new(big.Int).Set(x)
}
