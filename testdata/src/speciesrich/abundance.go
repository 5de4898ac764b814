package speciesrich

import (
	"math"
	"math/big"
)

// NegBinAbundance returns the probability that a species is represented
// by k individuals when abundances follow a negative binomial with
// clumping parameter r and probability p.
func NegBinAbundance(k int, r, p float64) float64 { // want NegBinAbundance:`wrong for some k \(NegBinAbundance, speciesrich/abundance\.go:13\)`
	g := func(x float64) float64 { return math.Gamma(x) }
	coef := g(float64(k)+r) / (g(r) * g(float64(k)+1)) // want `ratio of math\.Gamma values in float64: math\.Gamma\(float64\(k\) \+ r\) is \+Inf for arguments ≥ 171\.624377`
	return coef * math.Pow(p, r) * math.Pow(1-p, float64(k))
}

// QuadratFreq returns the expected number of quadrats, out of q, that
// hold exactly k individuals when individuals fall at random with mean
// density lambda per quadrat.
func QuadratFreq(q int, lambda float64, k int) float64 { // want QuadratFreq:`value \(p0\)·\(p1\)\^\(p2\)·exp\(-p1\)/Γ\(p2 \+ 1\), wrong once p2 ≥ 171` QuadratFreq:`wrong for k ≥ 171 \(QuadratFreq, speciesrich/abundance\.go:21\)`
	pk := math.Pow(lambda, float64(k)) / fact(k) * math.Exp(-lambda) // want `Poisson-style term lambda\^k·e\^\(−lambda\)/k! in float64: the divisor k! overflows to \+Inf`
	return float64(q) * pk
}

// ExpectedQuadrats returns the expected number of quadrats holding 0, 1,
// …, kmax individuals under random placement. Densities above 500 per
// quadrat are outside the model's use and return nil.
func ExpectedQuadrats(q int, lambda float64, kmax int) []float64 {
	if lambda > 500 {
		return nil
	}
	out := make([]float64, kmax+1)
	term := math.Exp(-lambda)
	for k := 0; k <= kmax; k++ {
		if k > 0 {
			term *= lambda / float64(k)
		}
		out[k] = float64(q) * term
	}
	return out
}

func factU(n int) uint64 { // want factU:`factorial of parameter 0, breaks from 21`
	var f uint64 = 1
	for i := uint64(2); i <= uint64(n); i++ { // want `factorial of uint64\(n\) in uint64 wraps for uint64\(n\) ≥ 21 \(20! ≈ 2\.43e18 is the largest`
		f *= i
	}
	return f
}

// Arrangements returns the number of distinct orders in which the
// individuals of the sample could have been recorded, species being
// indistinguishable within themselves.
func (s Sample) Arrangements() uint64 { // want Arrangements:`wrong for`
	w := factU(s.Total())
	for _, c := range s.Counts { // want `Arrangements divides w = factU\(s\.Total\(\)\) by factorials over a loop in uint64: the quotient fits where they cancel most of it, but factU\(s\.Total\(\)\) already wraps from s\.Total\(\) = 21`
		w /= factU(c)
	}
	return w
}

// ArrangementsBig is Arrangements in arbitrary precision.
func (s Sample) ArrangementsBig() *big.Int {
	w := new(big.Int).MulRange(1, int64(s.Total()))
	for _, c := range s.Counts {
		w.Quo(w, new(big.Int).MulRange(1, int64(c)))
	}
	return w
}
