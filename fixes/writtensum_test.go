package fixes_test

// The harbour's queueing sums, terms written out on each trip as a
// power over a float factorial function's value, with bounded counts:
// past a ≈ 10^(308/c) the power is +Inf while the term, and the value
// read after the loop, fit. The fix carries terms, sum and the term
// read beside it in log space (fixes/runsumterms.go).
func init() {
	fixPackages = append(fixPackages, "fixwrittensum")
	diffCases = append(diffCases,
		diffCase{pkg: "fixwrittensum", fn: "Turnaway", loops: []string{"a := 1; a <= 3000; a += 97", "c := 0; c <= 150; c += 7"}, args: "float64(a), c", typ: "float64", ref: refErlangB},
		// λ ≤ 700: the reference takes e^−λ from math.Exp (refPoisson).
		diffCase{pkg: "fixwrittensum", fn: "Arrivals", loops: []string{"l := 50; l <= 700; l += 65", "n := 0; n <= 120; n += 7"}, args: "float64(l), n", typ: "float64", ref: refPoissonCDF},
	)
}
