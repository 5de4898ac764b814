package ranges

import (
	"math"
	"strconv"
)

// The extreme int64 values stand for the infinities of the domain.
const (
	negInf = math.MinInt64
	posInf = math.MaxInt64
)

// Interval is a closed interval of integer values; Lo > Hi means empty
// (unreachable). math.MinInt64 and math.MaxInt64 stand for −∞ and +∞;
// the arithmetic methods saturate.
type Interval struct{ Lo, Hi int64 }

// Top returns the interval of all values.
func Top() Interval { return Interval{negInf, posInf} }

// Empty returns the canonical empty interval.
func Empty() Interval { return Interval{1, 0} }

// Point returns the interval holding only v.
func Point(v int64) Interval { return Interval{v, v} }

// Span returns [lo, hi], or Empty when lo > hi.
func Span(lo, hi int64) Interval {
	if lo > hi {
		return Empty()
	}
	return Interval{lo, hi}
}

// IsEmpty reports whether r holds no value.
func (r Interval) IsEmpty() bool { return r.Lo > r.Hi }

// IsTop reports whether r is unbounded on both sides.
func (r Interval) IsTop() bool { return r.Lo == negInf && r.Hi == posInf }

// Bounded reports whether r is non-empty with both ends finite.
func (r Interval) Bounded() bool { return !r.IsEmpty() && r.Lo != negInf && r.Hi != posInf }

// Join returns the smallest interval containing r and s.
func (r Interval) Join(s Interval) Interval {
	switch {
	case r.IsEmpty():
		return s.norm()
	case s.IsEmpty():
		return r
	}
	return Interval{min(r.Lo, s.Lo), max(r.Hi, s.Hi)}
}

// Meet returns the intersection of r and s.
func (r Interval) Meet(s Interval) Interval {
	return Span(max(r.Lo, s.Lo), min(r.Hi, s.Hi))
}

// Contains reports whether v lies in r.
func (r Interval) Contains(v int64) bool { return r.Lo <= v && v <= r.Hi }

// String formats r as "[2, 20]", "[21, +inf)", "(-inf, +inf)" or "empty".
func (r Interval) String() string {
	if r.IsEmpty() {
		return "empty"
	}
	lo, hi := "(-inf", "+inf)"
	if r.Lo != negInf {
		lo = "[" + strconv.FormatInt(r.Lo, 10)
	}
	if r.Hi != posInf {
		hi = strconv.FormatInt(r.Hi, 10) + "]"
	}
	return lo + ", " + hi
}

func (r Interval) norm() Interval {
	if r.IsEmpty() {
		return Empty()
	}
	return r
}

// Neg returns {−x : x ∈ r}, saturating.
func (r Interval) Neg() Interval {
	if r.IsEmpty() {
		return Empty()
	}
	return Interval{negB(r.Hi), negB(r.Lo)}
}

// Add returns {x+y : x ∈ r, y ∈ s}, saturating.
func (r Interval) Add(s Interval) Interval {
	if r.IsEmpty() || s.IsEmpty() {
		return Empty()
	}
	return Interval{satAdd(r.Lo, s.Lo, negInf), satAdd(r.Hi, s.Hi, posInf)}
}

// Sub returns {x−y : x ∈ r, y ∈ s}, saturating.
func (r Interval) Sub(s Interval) Interval { return r.Add(s.Neg()) }

// Mul returns {x·y : x ∈ r, y ∈ s}, saturating.
func (r Interval) Mul(s Interval) Interval {
	return r.corners(s, func(a, b int64) (int64, bool) { return mulB(a, b, true) })
}

// Min returns {min(x, y) : x ∈ r, y ∈ s}.
func (r Interval) Min(s Interval) Interval {
	if r.IsEmpty() || s.IsEmpty() {
		return Empty()
	}
	return Interval{min(r.Lo, s.Lo), min(r.Hi, s.Hi)}
}

// Max returns {max(x, y) : x ∈ r, y ∈ s}.
func (r Interval) Max(s Interval) Interval {
	if r.IsEmpty() || s.IsEmpty() {
		return Empty()
	}
	return Interval{max(r.Lo, s.Lo), max(r.Hi, s.Hi)}
}

// corners applies op to the four corner pairs of r×s and returns their
// hull; a corner that overflows saturates towards the sign of its exact value.
func (r Interval) corners(s Interval, op func(a, b int64) (int64, bool)) Interval {
	if r.IsEmpty() || s.IsEmpty() {
		return Empty()
	}
	out := Empty()
	for _, a := range [2]int64{r.Lo, r.Hi} {
		for _, b := range [2]int64{s.Lo, s.Hi} {
			v, ok := op(a, b)
			if !ok {
				v = posInf
				if (a < 0) != (b < 0) {
					v = negInf
				}
			}
			out = out.Join(Point(v))
		}
	}
	return out
}
