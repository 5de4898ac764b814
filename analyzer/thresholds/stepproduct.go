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
	fits := func(s StepSeq, n int64) (bool, bool) { return seqFits(t, s, n) }
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

// seqFits decides whether the sequence s fits integer type t at n: the
// logarithm screens, the exact value decides within a margin of t's
// limit. known is false where neither is known.
func seqFits(t Num, s StepSeq, n int64) (fits, known bool) {
	if l, ok := s.Log(n); ok && !math.IsNaN(l) {
		switch logMax := t.logMax(); {
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
	return v.CmpAbs(t.maxInt()) <= 0, true
}

// ProductFirstBad returns the first count n ≥ from at which an integer
// running product of whole factors, whose value after n trips is
// value(n), leaves integer type t, and value(n − 1), the largest value
// that fits. Every factor is at least 1 in magnitude (or 0, which makes
// the product right again), so no intermediate of the first n − 1 trips
// leaves t where value(n − 1) fits: n is where the code first goes
// wrong. ok is false for a float type, where a value is not known, or
// where no count up to stepScanMax leaves t.
func ProductFirstBad(t Num, from int64, value StepSeq) (first int64, last *big.Int, ok bool) {
	if t.Float {
		return 0, nil, false
	}
	for n := max(from, 0); n <= stepScanMax; n++ {
		fits, known := seqFits(t, value, n)
		if !known {
			return 0, nil, false
		}
		if fits {
			continue
		}
		if n == max(from, 0) {
			return 0, nil, false // wrong from the loop's first count: no line to draw
		}
		last, known := value.Exact(n - 1)
		return n, last, known
	}
	return 0, nil, false
}
