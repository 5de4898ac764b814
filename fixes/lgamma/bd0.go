package lgamma

// The deviance term bd0(x, M) = x·ln(x/M) + M − x of Loader (2000),
// "Fast and accurate computation of binomial probabilities". As Loader
// does, a series is summed when x is near M; elsewhere the direct form
// is evaluated in double-double, which also covers x far from M, where
// the float64 direct form loses digits to terms of size x.

import "math"

// tinyMean is the M below which x/M could overflow; ln(x/M) is then
// taken as ln x − ln M.
const tinyMean = 1e-290

// bd0 returns x·ln(x/M) + M − x for x > 0 and M > 0 in double-double,
// to about 2^-64 relative. With t = (x−M)/M (x−M exact) it is
// M·φ(t), φ(t) = (1+t)ln(1+t) − t:
//
//   - for |t| ≤ 1/32, Loader's series φ(t) = t²/2 − t³/6 + t⁴/12 − … =
//     Σ (−1)ᵏtᵏ/(k(k−1)) (k ≥ 2), the first two terms in double-double;
//   - otherwise x·ln(1+t) − (x−M): both terms are of the size of x−M,
//     so nothing of the size of M is formed (for means near 1e18 that
//     would cost more than the result's ulp), and φ(t) > t²/2.3 bounds
//     the magnification of the logarithm's error by 33.
func bd0(x, m dd) dd {
	if m.hi < tinyMean {
		return x.mul(ddLog(x).sub(ddLog(m))).add(m).sub(x)
	}
	h := x.sub(m)
	t := h.div(m)
	if math.Abs(t.hi) > 1.0/32 {
		return x.mul(ddLogFast(t.addF(1))).sub(h)
	}
	// φ(t) = t²·(1/2 − t/6 + t²·Σ (−1)ᵏt^(k−4)/(k(k−1)), k ≥ 4); the
	// float64 sum is at most 2^-11 of φ. Thirteen terms: t¹⁴/182 is
	// below 2^-70·t²/2 at |t| = 1/32.
	u := t.hi
	s := 0.0
	for i := len(phiCoef) - 1; i >= 0; i-- {
		s = s*u + phiCoef[i]
	}
	t2 := t.mul(t)
	phi := t2.mul(dd{0.5, 0}.sub(t.mul(inv6)).addF(t2.hi * s))
	return m.mul(phi)
}

// phiCoef[i] is (−1)ᵏ/(k(k−1)) for k = i+4, the coefficients of φ.
var phiCoef = func() (c [11]float64) {
	for i := range c {
		k := float64(i + 4)
		c[i] = 1 / (k * (k - 1))
		if i%2 == 1 {
			c[i] = -c[i]
		}
	}
	return c
}()
