package fixes_test

import "math/big"

// fixcalls: probabilities over a float64 binomial helper, rewritten at
// the return into one helper call. The grids cross n = 171, where the
// helper's factorial overflows, and the originals are wrong past it.
func init() {
	fixPackages = append(fixPackages, "fixcalls")
	diffCases = append(diffCases,
		diffCase{pkg: "fixcalls", fn: "Sprouted", loops: []string{"n := 10; n <= 1000; n *= 3", "k := 0; k <= n; k += 1 + n/11"}, args: "k, n, 0.125", typ: "float64", ref: refBinomialPMF},
		diffCase{pkg: "fixcalls", fn: "Misses", loops: []string{"f := 0; f <= 900; f += 37", "s := 1; s <= 60; s += 7"}, args: "f, s, 0.25", typ: "float64", ref: refNegBinomial},
		diffCase{pkg: "fixcalls", fn: "Tainted", loops: []string{"total := 70; total <= 310; total += 60", "k := 0; k <= 30; k += 2"}, args: "k, total, 30, 40", typ: "float64", ref: refHypergeometric},
	)
}

// refNegBinomial is C(f+s−1, f)·p^s·(1−p)^f for (f, s, p), the negative
// binomial probability (common practice).
func refNegBinomial(x []float64) *big.Float {
	f, s, p := int64(x[0]), int64(x[1]), x[2]
	q := new(big.Float).SetPrec(refPrec).Sub(fl(1), fl(p))
	r := mul(bf(chooseBig(f+s-1, f)), powBig(p, s))
	for i := int64(0); i < f; i++ {
		r = mul(r, q)
	}
	return r
}
