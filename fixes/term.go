package fixes

import "fmt"

// Probability terms and gamma ratios are float quantities: each maps to
// the helper that evaluates it in log space, where x^k/k!, λ^k e^(−λ)/k!,
// C(n,k) p^k (1−p)^(n−k) and Γ(a)/Γ(b) stay finite long after their
// factors overflow (common practice; DLMF 5.2.1 and 5.12.1 for Γ and B).
// The match's operands are already in the helpers' parameter order; the
// helper is the row's float one in shapes.go.
func buildTerm(b *builder) error {
	helper := shapes[b.m.Shape].helpers.float
	if classOf(b.m.Result) != classFloat {
		// An integer x^k/k! truncates at each division; no helper
		// reproduces that.
		return fmt.Errorf("%s term with non-float result %s", helper, b.m.Result)
	}
	if b.m.Shape == ShapePowOverFactorial {
		// A term of e^−λ·Σ λ^k/k! takes e^−λ in (poissonsum.go).
		if err := b.poissonSum(); err != errNoPoissonSum {
			return err
		}
	}
	if err := b.rewrite(helper, b.m.Args); err != nil {
		return err
	}
	b.rewriteCoefficientLoop()
	return nil
}

// rewriteCoefficientLoop rewrites, with the expression, the binomial
// loop that forms its coefficient (Match.CoefficientLoop), which the
// expression as written still reads outside the helper's domain: left
// as it was, that loop would be the next finding, and one fix would not
// leave the code settled. Where the loop's own rewrite is refused, the
// fix goes without it.
func (b *builder) rewriteCoefficientLoop() {
	lm := b.m.CoefficientLoop
	if lm == nil || !b.keptAsWritten {
		return
	}
	m, edits, message, shown := b.m, len(b.edits), b.message, b.shown
	b.m = *lm
	if err := buildModelLoop(b); err != nil {
		b.edits = b.edits[:edits]
	}
	b.m, b.message, b.shown = m, message, shown
}
