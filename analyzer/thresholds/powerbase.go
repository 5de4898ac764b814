package thresholds

import (
	"math"
)

// PowerBaseFirstBad returns the smallest float64 x > 1 for which x^k
// does not fit t: the first base at which the running power x^k of a
// series term leaves the type on its k-th factor. It inverts
// PowerFirstBad: PowerFirstBad(t, x) ≤ k exactly from this x on.
//
// Special cases are:
//
//	PowerBaseFirstBad(t, k) = +Inf for k ≤ 0
func PowerBaseFirstBad(t Num, k int64) float64 {
	if k <= 0 {
		return math.Inf(1)
	}
	bits := memo(cacheKey{shape: "powbase", t: t, a: k}, func() uint64 {
		max := t.maxInt()
		// x^k is increasing in x > 1, and so are the bit patterns of
		// positive floats: bisect on the patterns, lo fitting and hi
		// not. hi starts past e^(ln max/k), doubled until it breaks.
		lo := math.Float64bits(1)
		h := math.Exp(t.logMax()/float64(k)) * 2
		for powerFits(h, k, max) {
			h *= 2
		}
		hi := math.Float64bits(h)
		for hi-lo > 1 {
			mid := lo + (hi-lo)/2
			if powerFits(math.Float64frombits(mid), k, max) {
				lo = mid
			} else {
				hi = mid
			}
		}
		return hi
	})
	return math.Float64frombits(bits)
}
