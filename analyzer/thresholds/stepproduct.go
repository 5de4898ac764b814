package thresholds

import (
	"math"
	"math/big"
)

// stepScanMax caps the counts StepProduct tries: a value that still
// fits an integer type there grows too slowly for its step product to
// matter.
const stepScanMax = 4096

// StepSeq is one integer sequence StepProduct reads at a count n: its
// natural logarithm, cheap, to screen, and its exact value, to decide.
// ok is false where the value is not known (not a whole number).
type StepSeq struct {
	Log   func(n int64) (float64, bool)
	Exact func(n int64) (*big.Int, bool)
}

// StepProduct looks, for a running product acc = acc·x/y in integer
// type t whose value after n trips is value(n) and whose product
// formed before the division on the last trip is step(n) (value(n)
// times that trip's divisor), for the first n ≥ from at which step(n)
// leaves t while value(n) still fits: the code wraps there although its
// result fits. It returns that n and the last n at which value fits
// (valueLast); ok is false when no n up to value's own limit (or
// stepScanMax) is one. The two logarithms screen each count, and the
// exact values decide every count within a margin of t's limit.
func StepProduct(t Num, from int64, value, step StepSeq) (first, valueLast int64, ok bool) {
	if t.Float {
		return 0, 0, false
	}
	lim, logMax := t.maxInt(), t.logMax()
	// fits decides whether the sequence fits t at n: false, known, when
	// it does not or is not known.
	fits := func(s StepSeq, n int64) (bool, bool) {
		if l, ok := s.Log(n); ok && !math.IsNaN(l) {
			switch {
			case l < logMax-1:
				return true, true
			case l > logMax+1:
				return false, true
			}
		}
		v, ok := s.Exact(n)
		if !ok {
			return false, false
		}
		return v.CmpAbs(lim) <= 0, true
	}
	first = -1
	for n := max(from, 0); n <= stepScanMax; n++ {
		vf, known := fits(value, n)
		if !known {
			return 0, 0, false
		}
		if !vf {
			valueLast = n - 1
			break
		}
		if first < 0 {
			sf, known := fits(step, n)
			if !known {
				return 0, 0, false
			}
			if !sf {
				first = n
			}
		}
		if n == stepScanMax {
			return 0, 0, false
		}
	}
	return first, valueLast, first >= 0
}
