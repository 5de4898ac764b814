package fixes_test

// fixcalls: probabilities over a float64 binomial helper, rewritten at
// the return into one helper call. The grids cross n = 171, where the
// helper's factorial overflows, and the originals are wrong past it.
func init() {
	fixPackages = append(fixPackages, "fixcalls")
	diffCases = append(diffCases,
		diffCase{pkg: "fixcalls", fn: "Sprouted", loops: []string{"n := 10; n <= 1000; n *= 3", "k := 0; k <= n; k += 1 + n/11"}, args: "k, n, 0.125", typ: "float64", ref: refBinomialPMF},
		diffCase{pkg: "fixcalls", fn: "Tainted", loops: []string{"total := 60; total <= 300; total += 60", "k := 0; k <= 30; k += 2"}, args: "k, total, 30, 40", typ: "float64", ref: refHypergeometric},
	)
}
