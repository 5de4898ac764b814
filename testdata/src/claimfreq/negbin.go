// Package claimfreq models the number of claims a motor portfolio
// files: Poisson and negative binomial frequencies, and the
// Beta-binomial lapse model used beside them.
package claimfreq

import "math"

// NegBin is a negative binomial claim-count distribution: the number
// of claims before the R-th "success" with success probability P.
type NegBin struct {
	R float64
	P float64
}

// PMF returns the probability of exactly k claims.
func (d NegBin) PMF(k int) float64 { // want PMF:`wrong for k ≥ 170\.624377 \(PMF, claimfreq/negbin\.go:18\)` PMF:`value Γ\(p0 \+ recv\.R\)·\(recv\.P\)\^\(recv\.R\)·\(-recv\.P \+ 1\)\^\(p0\)/\(Γ\(recv\.R\)·Γ\(p0 \+ 1\)\), wrong once p0 \+ recv\.R ≥ 171\.`
	kf := float64(k)
	coef := math.Gamma(kf+d.R) / (math.Gamma(d.R) * math.Gamma(kf+1)) // want `ratio of math\.Gamma values in float64: math\.Gamma\(kf \+ d\.R\) is \+Inf for arguments ≥ 171\.624377`
	return coef * math.Pow(d.P, d.R) * math.Pow(1-d.P, kf)
}

// LogPMF returns the logarithm of the probability of exactly k claims.
func (d NegBin) LogPMF(k int) float64 {
	kf := float64(k)
	a, _ := math.Lgamma(kf + d.R)
	b, _ := math.Lgamma(d.R)
	c, _ := math.Lgamma(kf + 1)
	return a - b - c + d.R*math.Log(d.P) + kf*math.Log1p(-d.P)
}

// CDF returns the probability of at most k claims, summing the
// probabilities by their ratio p(i)/p(i-1) = (i-1+R)/i * (1-P).
func (d NegBin) CDF(k int) float64 { // want CDF:`wrong for some d or some k \(CDF, claimfreq/negbin\.go:36\)`
	p := math.Pow(d.P, d.R)
	s := p
	for i := 1; i <= k; i++ { // want `running product p computes the probabilities C\(i \+ d\.R - 1, i\)·d\.P\^d\.R·\(1−d\.P\)\^i one factor at a time from \(d\.P\)\^\(d\.R\), which in float64 loses its digits for d\.R ≥ 1023 and is 0 for d\.R ≥ 1075`
		p *= (float64(i) - 1 + d.R) / float64(i) * (1 - d.P)
		s += p
	}
	return s
}

// Mean is the expected claim count.
func (d NegBin) Mean() float64 { return d.R * (1 - d.P) / d.P }

// FitMoments fits a negative binomial to a sample mean and variance;
// ok is false when the sample is not over-dispersed.
func FitMoments(mean, variance float64) (d NegBin, ok bool) {
	if variance <= mean || mean <= 0 {
		return NegBin{}, false
	}
	p := mean / variance
	return NegBin{R: mean * p / (1 - p), P: p}, true
}

// Allocations is the number of ways n identical claims can fall on k
// policies, C(n+k-1, k-1).
func Allocations(n, k int64) int64 {
	f := func(m int64) int64 {
		r := int64(1)
		for ; m > 1; m-- { // want `factorial of m in int64 wraps for m ≥ 21`
			r *= m
		}
		return r
	}
	return f(n+k-1) / (f(k-1) * f(n))
}

// Fact is n! in the caller's numeric type.
func Fact[T ~int | ~int64 | ~uint64 | ~float64](n T) T { // want Fact:`factorial of parameter 0, breaks from 21`
	var r T = 1
	for i := T(2); i <= n; i++ { // want `factorial of n in int \(the narrowest type in the constraint of T\) wraps for n ≥ 21`
		r *= i
	}
	return r
}

// PoissonProb is the Poisson probability of k claims at rate lambda.
func PoissonProb(k int, lambda float64) float64 { // want PoissonProb:`value \(p1\)\^\(p0\)·exp\(-p1\)/Γ\(p0 \+ 1\), wrong once p0 ≥ 21` PoissonProb:`wrong for k ≥ 21 \(PoissonProb, claimfreq/negbin\.go:80\)`
	return math.Exp(-lambda) * math.Pow(lambda, float64(k)) / Fact(float64(k)) // want `Poisson-style term lambda\^k·e\^\(−lambda\)/\(float64\(k\)\)! in float64: the divisor`
}
