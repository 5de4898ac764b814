package lgamma

// The deviance term bd0(x, M) = x·ln(x/M) + M − x of Loader (2000),
// "Fast and accurate computation of binomial probabilities". Loader sums
// a series when x is near M to avoid cancellation; evaluating the direct
// form in double-double avoids it as well and also covers x far from M,
// where the float64 direct form loses digits to terms of size x.

// tinyMean is the M below which x/M could overflow; ln(x/M) is then
// taken as ln x − ln M.
const tinyMean = 1e-290

// bd0 returns x·ln(x/M) + M − x for x > 0 and M > 0 in double-double.
// It is summed as x·ln(1 + h/M) − h with h = x − M exact: both terms are
// of the size of h, so the sum loses nothing to an intermediate of the
// size of M, which for M near 1e18 would cost more than the result's ulp.
func bd0(x, m dd) dd {
	if m.hi < tinyMean {
		return x.mul(ddLog(x).sub(ddLog(m))).add(m).sub(x)
	}
	h := x.sub(m)
	return x.mul(ddLog1p(h.div(m))).sub(h)
}
