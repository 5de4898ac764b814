package fixes_test

import "math/big"

// The running binomials of a glyph rasteriser: one ratio per step.
func init() { fixPackages = append(fixPackages, "fixbinompeak") }

// The phase model's series: terms over running factorials of 2k+1.
func init() {
	fixPackages = append(fixPackages, "fixphase")
	diffCases = append(diffCases,
		// All terms of one sign: past k = 85 the original's power or
		// factorial is +Inf while the sum is finite (x = 200: the terms
		// peak near 1e86).
		diffCase{pkg: "fixphase", fn: "Sinh", loops: []string{"xi := -8; xi <= 12; xi += 1", "terms := 1; terms <= 181; terms += 18"}, args: "float64(xi*xi*xi)/4, terms", typ: "float64", ref: refSinhSeries},
		// Small arguments: the original is right on every trip (its
		// terms past k = 85 are below rounding), and so must the fix be.
		diffCase{pkg: "fixphase", fn: "Sine", loops: []string{"xi := -4; xi <= 4; xi++", "terms := 1; terms <= 121; terms += 12"}, args: "float64(xi)/2, terms", typ: "float64", ref: refSineSeries, noBreak: true},
	)
}

// refSinhSeries is Σ_{k<terms} x^(2k+1)/(2k+1)! in math/big (the
// Taylor series of sinh, DLMF 4.33.3 read as a finite sum).
func refSinhSeries(a []float64) *big.Float { return refOddSeries(a[0], int(a[1]), false) }

// refSineSeries is Σ_{k<terms} (−1)^k x^(2k+1)/(2k+1)! (DLMF 4.19.1).
func refSineSeries(a []float64) *big.Float { return refOddSeries(a[0], int(a[1]), true) }

func refOddSeries(x float64, terms int, alternate bool) *big.Float {
	sum := new(big.Float).SetPrec(refPrec)
	bx := new(big.Float).SetPrec(refPrec).SetFloat64(x)
	for k := 0; k < terms; k++ {
		p := new(big.Float).SetPrec(refPrec).SetInt64(1)
		for i := 0; i < 2*k+1; i++ {
			p.Mul(p, bx)
		}
		p.Quo(p, new(big.Float).SetPrec(refPrec).SetInt(new(big.Int).MulRange(1, int64(2*k+1))))
		if alternate && k%2 == 1 {
			p.Neg(p)
		}
		sum.Add(sum, p)
	}
	return sum
}
