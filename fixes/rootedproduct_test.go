package fixes_test

import "math/big"

// The lens maker's mode shapes and draw odds (testdata/src/fixroot):
// square roots of products and ratios of float factorials, a ratio
// whose numerator sits in a local, and a permutation count over a
// power, each carried in log space (lgamma.Product, Product.Sqrt) and
// checked against math/big.
func init() {
	fixPackages = append(fixPackages, "fixroot")
	diffCases = append(diffCases,
		// 3^n·n! leaves float64 at n = 141 (mpmath), its root only past
		// n = 250: the original's 1/√(+Inf) is 0 there.
		diffCase{pkg: "fixroot", fn: "ModeScale", loops: []string{"n := 0; n <= 250; n += 3"}, args: "n", typ: "float64", ref: refModeScale},
		// Past 170! the divisor is +Inf (the quotient 0, then NaN); the
		// quotient itself below float64 (n = 100, a = 150) while its
		// root is not.
		diffCase{pkg: "fixroot", fn: "ModeOverlap", loops: []string{"n := 0; n <= 400; n += 23", "a := 0; a <= 300; a += 17"}, args: "n, a", typ: "float64", ref: refModeOverlap},
		diffCase{pkg: "fixroot", fn: "Pairings", loops: []string{"a := 0; a <= 200; a += 13", "b := 0; b <= 200; b += 11"}, args: "a, b", typ: "float64", ref: refPairings},
		diffCase{pkg: "fixroot", fn: "AllDistinct", loops: []string{"m := 1; m <= 400; m += 19", "k := 0; k <= m; k += 1 + m/7"}, args: "k, m", typ: "float64", ref: refAllDistinct},
	)
}

// refModeScale is 1/√(3^n·n!) for (n), in math/big.
func refModeScale(x []float64) *big.Float {
	n := int64(x[0])
	sq := bf(new(big.Int).Mul(new(big.Int).Exp(big.NewInt(3), big.NewInt(n), nil), factorialBig(n)))
	return quo(fl(1), new(big.Float).SetPrec(refPrec).Sqrt(sq))
}

// refModeOverlap is √(n!/(n+a)!) for (n, a), in math/big.
func refModeOverlap(x []float64) *big.Float {
	n, a := int64(x[0]), int64(x[1])
	return new(big.Float).SetPrec(refPrec).Sqrt(quo(bf(factorialBig(n)), bf(factorialBig(n+a))))
}

// refPairings is (2a)!·(2b)!/(a!·b!·(a+b)!) for (a, b), in math/big.
func refPairings(x []float64) *big.Float {
	a, b := int64(x[0]), int64(x[1])
	num := new(big.Int).Mul(factorialBig(2*a), factorialBig(2*b))
	den := new(big.Int).Mul(factorialBig(a), factorialBig(b))
	den.Mul(den, factorialBig(a+b))
	return quo(bf(num), bf(den))
}

// refAllDistinct is m!/((m−k)!·m^k) for (k, m), 0 for k > m, in
// math/big.
func refAllDistinct(x []float64) *big.Float {
	k, m := int64(x[0]), int64(x[1])
	if k > m {
		return fl(0)
	}
	den := new(big.Int).Mul(factorialBig(m-k), new(big.Int).Exp(big.NewInt(m), big.NewInt(k), nil))
	return quo(bf(factorialBig(m)), bf(den))
}
