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
func bd0(x, m dd) dd {
	var l dd
	if m.hi < tinyMean {
		l = ddLog(x).sub(ddLog(m))
	} else {
		// ln(x/M) = ln(1 + (x−M)/M) with x−M exact: for x near M the
		// rounding of x/M would be magnified by the factor x.
		l = ddLog1p(x.sub(m).div(m))
	}
	return x.mul(l).add(m).sub(x)
}
