package outbreak

import "math"

// factCache holds k! for the k computed so far.
var factCache = []float64{1}

// fact returns k! from the cache, growing it as needed.
func fact(k int) float64 { // want fact:`factorial of parameter 0, breaks from 171`
	for len(factCache) <= k {
		n := len(factCache)
		factCache = append(factCache, factCache[n-1]*float64(n))
	}
	return factCache[k]
}

// PoissonPMF is the probability of k cases when lambda are expected.
func PoissonPMF(k int, lambda float64) float64 { // want PoissonPMF:`value \(p1\)\^\(p0\)·exp\(-p1\)/Γ\(p0 \+ 1\), wrong once p0 ≥ 171` PoissonPMF:`wrong for k ≥ 171`
	return math.Pow(lambda, float64(k)) * math.Exp(-lambda) / fact(k) // want `Poisson-style term lambda\^k·e\^\(−lambda\)/k! in float64:`
}

// maxCases bounds the counts the log-space pmf accepts.
const maxCases = 1 << 20

// PoissonPMFLog is PoissonPMF formed in log space; NaN above maxCases.
func PoissonPMFLog(k int, lambda float64) float64 {
	if k < 0 || k > maxCases {
		return math.NaN()
	}
	if lambda == 0 {
		if k == 0 {
			return 1
		}
		return 0
	}
	lf, _ := math.Lgamma(float64(k + 1))
	return math.Exp(float64(k)*math.Log(lambda) - lambda - lf)
}

// PoissonCDF is P(X <= k) summed from the pmf.
func PoissonCDF(k int, lambda float64) float64 { // want PoissonCDF:`wrong for some k`
	s := 0.0
	for i := 0; i <= k; i++ {
		s += PoissonPMF(i, lambda) // want `PoissonCDF computes lambda\^i·e\^\(−lambda\)/i! in float64, which fits where PoissonPMF\(i, lambda\) already is \+Inf or NaN from i = 171`
	}
	return s
}

// PoissonCDFRecur is P(X <= k) with each term from the one before.
func PoissonCDFRecur(k int, lambda float64) float64 { // want PoissonCDFRecur:`wrong for some k`
	term := math.Exp(-lambda)
	s := term
	for i := 1; i <= k; i++ { // want `running product term computes the Poisson terms`
		term *= lambda / float64(i)
		s += term
	}
	return s
}

// PoissonCDFScaled is P(X <= k) summed outward from the mode in units of
// the mode's probability, which is taken in log space at the end. It
// returns NaN for lambda above maxCases.
func PoissonCDFScaled(k int, lambda float64) float64 {
	if k < 0 {
		return 0
	}
	if lambda <= 0 {
		return 1
	}
	if lambda > maxCases {
		return math.NaN()
	}
	mode := int(lambda)
	total, below := 1.0, 0.0
	if k >= mode {
		below = 1
	}
	t := 1.0
	for i := mode; i > 0; i-- { // downward: p(i−1) = p(i)·i/λ
		t *= float64(i) / lambda
		total += t
		if i-1 <= k {
			below += t
		}
	}
	t = 1.0
	for i := mode + 1; ; i++ { // upward: p(i) = p(i−1)·λ/i
		t *= lambda / float64(i)
		total += t
		if i <= k {
			below += t
		}
		if t < 1e-18*total {
			break
		}
	}
	return below / total
}
