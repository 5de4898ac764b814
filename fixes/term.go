package fixes

import "fmt"

// Probability terms and gamma ratios are float quantities: each maps to
// the helper that evaluates it in log space, where x^k/k!, λ^k e^(−λ)/k!,
// C(n,k) p^k (1−p)^(n−k) and Γ(a)/Γ(b) stay finite long after their
// factors overflow (common practice; DLMF 5.2.1 and 5.12.1 for Γ and B).
// The match's operands are already in the helpers' parameter order.
var termHelpers = map[Shape]string{
	ShapePowOverFactorial: "PowOverFactorial", // x, k
	ShapePoisson:          "PoissonPMF",       // k, lambda
	ShapeBinomialPMF:      "BinomialPMF",      // k, n, p
	ShapeHypergeometric:   "HypergeometricPMF",
	ShapeGammaRatio:       "GammaRatio", // a, b
	ShapeBeta:             "Beta",       // a, b

	ShapeNegBinomialPMF: "NegativeBinomialPMF", // f, s, p
}

func buildTerm(b *builder) error {
	if classOf(b.m.Result) != classFloat {
		// An integer x^k/k! truncates at each division; no helper
		// reproduces that.
		return fmt.Errorf("%s term with non-float result %s", termHelpers[b.m.Shape], b.m.Result)
	}
	return b.rewrite(termHelpers[b.m.Shape], b.m.Args)
}
