package ranges

// Bound arithmetic. Each function works in one of two modes: with inf
// set, the sentinels negInf and posInf are infinities and absorb finite
// values; with inf clear they are the exact int64 values they hold. The
// boolean result is false when an exact result does not fit in int64.

func isInf(v int64) bool { return v == negInf || v == posInf }

// negB negates a bound, mapping each infinity to the other.
func negB(v int64) int64 {
	switch v {
	case negInf:
		return posInf
	case posInf:
		return negInf
	}
	return -v
}

// satAdd adds two bounds treating sentinels as infinities; tie picks the
// infinity used for ∞−∞ (outwards for the end being computed).
func satAdd(a, b, tie int64) int64 {
	v, ok := addB(a, b, true, tie)
	if !ok {
		if a > 0 {
			return posInf
		}
		return negInf
	}
	return v
}

func addB(a, b int64, inf bool, tie int64) (int64, bool) {
	if inf && (isInf(a) || isInf(b)) {
		switch {
		case isInf(a) && isInf(b) && a != b:
			return tie, true
		case isInf(a):
			return a, true
		}
		return b, true
	}
	s := a + b
	if (a > 0 && b > 0 && s < 0) || (a < 0 && b < 0 && s >= 0) {
		return 0, false
	}
	return s, true
}

func subB(a, b int64, inf bool, tie int64) (int64, bool) {
	if inf && (isInf(a) || isInf(b)) {
		return addB(a, negB(b), true, tie)
	}
	d := a - b
	if (b < 0 && d < a) || (b > 0 && d > a) {
		return 0, false
	}
	return d, true
}

func mulB(a, b int64, inf bool) (int64, bool) {
	if a == 0 || b == 0 {
		return 0, true
	}
	if inf && (isInf(a) || isInf(b)) {
		if (a < 0) != (b < 0) {
			return negInf, true
		}
		return posInf, true
	}
	p := a * b
	if p/b != a || (a == -1 && b == negInf) || (b == -1 && a == negInf) {
		return 0, false
	}
	return p, true
}

// divB divides with truncation; b is never zero.
func divB(a, b int64, inf bool) (int64, bool) {
	if inf {
		switch {
		case isInf(b):
			return 0, true
		case isInf(a):
			if (a < 0) != (b < 0) {
				return negInf, true
			}
			return posInf, true
		}
	}
	if a == negInf && b == -1 {
		return 0, false
	}
	return a / b, true
}

// divideOK returns the hull of x/y over y ≠ 0; ok is false when an
// exact-mode corner overflows (MinInt64 / −1). Truncated division is
// monotone in each argument on a box where the divisor keeps its sign,
// so the extremes sit at corners.
func divideOK(x, y Interval, inf bool) (Interval, bool) {
	if x.IsEmpty() || y.IsEmpty() {
		return Empty(), true
	}
	out := Empty()
	for _, part := range [2]Interval{y.Meet(Interval{negInf, -1}), y.Meet(Interval{1, posInf})} {
		if part.IsEmpty() {
			continue
		}
		for _, a := range [2]int64{x.Lo, x.Hi} {
			for _, b := range [2]int64{part.Lo, part.Hi} {
				v, ok := divB(a, b, inf)
				if !ok {
					if !inf {
						return Empty(), false
					}
					v = posInf
				}
				out = out.Join(Point(v))
			}
		}
	}
	return out, true
}

// remainder bounds x%y: the sign follows x and |x%y| < |y|.
func remainder(x, y Interval) Interval {
	if x.IsEmpty() || y.IsEmpty() {
		return Empty()
	}
	if y.Lo == 0 && y.Hi == 0 {
		return Empty()
	}
	var m int64 // largest possible |x%y|
	switch {
	case y.Lo == negInf || y.Hi == posInf:
		m = posInf
	default:
		m = max(abs64(y.Lo), abs64(y.Hi)) - 1
	}
	minAbs := int64(0) // smallest |y| when y keeps its sign
	if y.Lo > 0 {
		minAbs = y.Lo
	} else if y.Hi < 0 && y.Hi != negInf {
		minAbs = -y.Hi
	}
	switch {
	case x.Lo >= 0 && x.Hi < minAbs:
		return x
	case x.Lo >= 0:
		return Interval{0, min(x.Hi, m)}
	case x.Hi <= 0 && x.Lo != negInf && -x.Lo < minAbs:
		return x
	case x.Hi <= 0:
		return Interval{max(x.Lo, negB(m)), 0}
	}
	return Interval{max(x.Lo, negB(m)), min(x.Hi, m)}
}

func abs64(v int64) int64 {
	if v == negInf {
		return posInf
	}
	if v < 0 {
		return -v
	}
	return v
}
