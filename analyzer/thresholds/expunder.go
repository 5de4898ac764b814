package thresholds

import "math"

// ExpUnderflow returns, for float64, the smallest x > 0 at which
// math.Exp(−x) is subnormal (below 2^−1022, where its significant
// digits start to fall away: about 708.40) and the smallest at which it
// is 0 (about 745.13). Both are located by bisection over the float64
// values with math.Exp itself, since the code under analysis calls it.
// The weight e^(−λ) of a Poisson term is then wrong in every digit or
// lost although λ^k·e^(−λ)/k! near k = λ is not small.
//
// Special cases are:
//
//	ExpUnderflow(t) = (+Inf, +Inf) for any type but float64
func ExpUnderflow(t Num) (subnormal, zero float64) {
	if !t.Float || t.Bits != 64 {
		return math.Inf(1), math.Inf(1)
	}
	type pair struct{ a, b float64 }
	p := memo(cacheKey{shape: "expunder", t: t}, func() pair {
		// e^(−700) is normal and e^(−800) is 0 (DLMF 4.2.19 bounds the
		// exponent range, from memory); bisection needs only that.
		sub := bisect64(700, 800, func(x float64) bool { return math.Exp(-x) < 0x1p-1022 })
		zero := bisect64(700, 800, func(x float64) bool { return math.Exp(-x) == 0 })
		return pair{sub, zero}
	})
	return p.a, p.b
}
