package germtrial

import "math"

// lowerGamma is the lower incomplete gamma function by its series, with a
// fixed number of terms.
func lowerGamma(s, x float64) float64 {
	sum := 0.0
	for k := 0; k < 500; k++ {
		num := math.Pow(x, float64(k))
		den := 1.0
		for j := 0; j <= k; j++ { // want `rising factorial of k\+1 factors from s in float64 overflows to \+Inf fo`
			den *= s + float64(j)
		}
		sum += num / den // want `series term num / den computes Γ\(s\)·\(x\)\^\(k\)/Γ\(s \+ k \+ 1\) on the trip o`
	}
	return math.Pow(x, s) * math.Exp(-x) * sum
}

// regGammaP is the regularised lower incomplete gamma P(s, x) with the term ratio.
func regGammaP(s, x float64) float64 {
	ap := s
	del := 1.0 / s
	sum := del
	for n := 0; n < 1000; n++ {
		ap++
		del *= x / ap
		sum += del // want `sum sums the running term Γ\(s\)·\(x\)\^\(t \+ 1\)/Γ\(s \+ t \+ 2\) on trip t \(from 0\), a power over a rising factorial of s \(the incomplete gamma series\), in float64, and sum \* math\.Exp\(-x\+s\*math\.Log\(x\)-lg\) reads the sum after the loop through a factor e\^\(−x\)`
		if math.Abs(del) < math.Abs(sum)*1e-16 {
			break
		}
	}
	lg, _ := math.Lgamma(s)
	return sum * math.Exp(-x+s*math.Log(x)-lg) // want `the sign of Γ\(s\) from math\.Lgamma is dropped`
}

var factCache = []float64{1}

func cachedFact(n int) float64 { // want cachedFact:`factorial of parameter 0, breaks from 171`
	for len(factCache) <= n {
		m := len(factCache)
		factCache = append(factCache, factCache[m-1]*float64(m))
	}
	return factCache[n]
}

// germinationPoisson is the chance that k seedlings emerge in a plot with the given mean.
func germinationPoisson(mean float64, k int) float64 {
	return math.Exp(-mean) * math.Pow(mean, float64(k)) / cachedFact(k) // want `Poisson-style term mean\^k·e\^\(−mean\)/k! in float64: the divisor k! overflows to \+Inf for k ≥ 171`
}
