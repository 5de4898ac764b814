package fixes_test

import "math/big"

// The sonar array's Bessel series: a power over a product of
// factorials, each computed on its own.
func init() {
	fixPackages = append(fixPackages, "fixbessel")
	diffCases = append(diffCases,
		// Past k = 170 each factorial is +Inf, past k ≈ 220 (x = 10) the
		// power too, and the original's sum is NaN; the exact finite
		// sum is J_n(x) to rounding. x stays at most 10, where the
		// series' cancellation costs less than 1e-12 relative.
		diffCase{pkg: "fixbessel", fn: "Beam", loops: []string{"n := 0; n <= 3; n++", "xi := 1; xi <= 20; xi += 3", "terms := 20; terms <= 300; terms += 70"}, args: "n, float64(xi)/2, terms", typ: "float64", ref: refBesselSeries},
	)
}

// refBesselSeries is Σ_{k<terms} (−1)^k (x/2)^(2k+n) / (k!·(k+n)!) in
// math/big (the series of J_n, DLMF 10.2.2, read as a finite sum).
func refBesselSeries(a []float64) *big.Float {
	n, x, terms := int(a[0]), a[1], int(a[2])
	sum := new(big.Float).SetPrec(refPrec)
	half := new(big.Float).SetPrec(refPrec).SetFloat64(x / 2)
	for k := 0; k < terms; k++ {
		t := new(big.Float).SetPrec(refPrec).SetInt64(1)
		for i := 0; i < 2*k+n; i++ {
			t.Mul(t, half)
		}
		t.Quo(t, new(big.Float).SetPrec(refPrec).SetInt(new(big.Int).MulRange(1, int64(k))))
		t.Quo(t, new(big.Float).SetPrec(refPrec).SetInt(new(big.Int).MulRange(1, int64(k+n))))
		if k%2 == 1 {
			t.Neg(t)
		}
		sum.Add(sum, t)
	}
	return sum
}
