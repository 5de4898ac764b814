package thresholds

import "math"

// LogRange returns the natural logarithms of the smallest and the largest
// magnitude a value of t holds without leaving its range: for a float
// type the smallest positive normal number and the largest finite one
// (a smaller value keeps fewer digits), for an integer type 1 and the
// largest value. The value model compares ln |value| of a formula with
// them to judge whether a true result fits.
//
// Special cases are:
//
//	LogRange(t) = 0, 0 for an unknown type
func LogRange(t Num) (lo, hi float64) {
	switch {
	case t.Float && t.Bits == 32:
		return math.Log(0x1p-126), math.Log(math.MaxFloat32)
	case t.Float:
		return math.Log(0x1p-1022), math.Log(math.MaxFloat64)
	case t.Bits > 0:
		bits := t.Bits
		if t.Signed {
			bits--
		}
		// ln(2^bits − 1), to well within the margin a caller keeps.
		return 0, float64(bits) * math.Ln2
	}
	return 0, 0
}
