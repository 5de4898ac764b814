package linkbudget

import "math"

// BlockErrorProb is the chance that a block of n bits has more than t bit errors.
func BlockErrorProb(n, t int, p float64) float64 { // want BlockErrorProb:`wrong for n ≥ 171`
	ok := 0.0
	for k := 0; k <= t; k++ {
		ok += choose(n, k) * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k)) // want `binomial probability C\(n`
	}
	return 1 - ok
}

// BitErrorLog is the probability of exactly k errors in n bits.
func BitErrorLog(n, k int, p float64) float64 {
	return math.Exp(logChoose(n, k) + float64(k)*math.Log(p) + float64(n-k)*math.Log1p(-p)) // want `math.Exp of log-gamma values computes a product of Γ values from 3 log-gamma values`
}

// Burst models bursts of errors arriving at a constant rate.
type Burst struct {
	Rate   float64
	Window float64
}

// ProbAtMost is the chance of at most k bursts in one window.
func (b Burst) ProbAtMost(k int) float64 { // want ProbAtMost:`wrong for some k`
	lam := b.Rate * b.Window
	s := 0.0
	for i := 0; i <= k; i++ {
		s += math.Pow(lam, float64(i)) / fact(i) // want `power-over-factorial term lam\^i/i! in float64: the divisor i! overflow`
	}
	return s * math.Exp(-lam)
}

// codewordWeights is the number of words of weight w in an n-bit code.
func codewordWeights(n, w int) int { // want codewordWeights:`binomial of parameter 0`
	return factInt(n) / (factInt(w) * factInt(n-w)) // want `binomial coefficient as a ratio of factorials in int: the numerator n!`
}

// rainFadeBessel evaluates I0(x) by its power series with a fixed number of terms.
func rainFadeBessel(x float64, terms int) float64 {
	sum := 0.0
	for k := 0; k < terms; k++ {
		g := math.Gamma(float64(k + 1))              // want `math\.Gamma overflows: math\.Gamma\(float64\(k \+ 1\)\) is \+Inf for k ≥ 171 \(`
		sum += math.Pow(x/2, float64(2*k)) / (g * g) // want `series term math\.Pow\(x/2`
	}
	return sum
}

// besselI0 evaluates I0(x) with the term ratio, stopping once terms are negligible.
func besselI0(x float64) float64 {
	q := x * x / 4
	term, sum := 1.0, 1.0
	for k := 1.0; term > sum*1e-17; k++ {
		term *= q / (k * k)
		sum += term
	}
	return sum
}
