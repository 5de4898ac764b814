package analyzer

import (
	"math"

	"github.com/overfact/overfact/analyzer/ranges"
)

// Saturating shifts of ranges: an unbounded end stays unbounded.

// shift adds d to both ends of an interval, saturating at the unbounded
// ends.
//
// Special cases are:
//
//	shift(empty, d) = empty
//	shift([−∞, hi], d) = [−∞, hi+d], and likewise for +∞
func shift(iv ranges.Interval, d int64) ranges.Interval {
	if iv.IsEmpty() {
		return iv
	}
	return ranges.Interval{Lo: addSat(iv.Lo, d), Hi: addSat(iv.Hi, d)}
}

// addSat returns x+d, clamped to the int64 range.
//
// Special cases are:
//
//	addSat(math.MinInt64, d) = math.MinInt64 (−∞ stays −∞)
//	addSat(math.MaxInt64, d) = math.MaxInt64 (+∞ stays +∞)
func addSat(x, d int64) int64 {
	switch {
	case x == math.MinInt64 || x == math.MaxInt64:
		return x
	case d > 0 && x > math.MaxInt64-d:
		return math.MaxInt64
	case d < 0 && x < math.MinInt64-d:
		return math.MinInt64
	}
	return x + d
}

// lowLimit reports whether v, the low end of a range, is the least value
// of a signed integer type (or below int32's), where the range says
// nothing about how low the value goes.
func lowLimit(v int64) bool {
	return v <= math.MinInt32 || v == math.MinInt8 || v == math.MinInt16
}
