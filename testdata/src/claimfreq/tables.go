package claimfreq

import (
	"math"
	"math/big"
)

// PoissonTable returns P(N = k) for k = 0..maxK by the recurrence
// p(k) = p(k-1) * lambda / k. Rates above 500 are refused.
func PoissonTable(maxK int, lambda float64) []float64 {
	if lambda < 0 || lambda > 500 {
		return nil
	}
	t := make([]float64, maxK+1)
	p := math.Exp(-lambda)
	for k := 0; k <= maxK; k++ {
		if k > 0 {
			p = p * lambda / float64(k)
		}
		t[k] = p
	}
	return t
}

// PoissonCDF returns P(N <= k) at rate lambda.
func PoissonCDF(k int, lambda float64) float64 { // want PoissonCDF:`wrong for some k \(PoissonCDF, claimfreq/tables\.go:29\)`
	term := math.Exp(-lambda)
	sum := term
	for i := 1; i <= k; i++ { // want `running product term computes the Poisson terms lambda\^k·e\^\(−lambda\)/k! from math\.Exp\(-lambda\), which in float`
		term = term * lambda / float64(i)
		sum += term
	}
	return sum
}

// ExcessProb is the probability that a year produces more than k
// claims.
func ExcessProb(k int, lambda float64) float64 { // want ExcessProb:`wrong for some k \(PoissonCDF, claimfreq/tables\.go:29\)`
	return 1 - PoissonCDF(k, lambda) // want `ExcessProb builds its result from PoissonCDF\(k, lambda\), which is wrong for some values of k`
}

// Lapse is a Beta-binomial model of how many of N policies lapse
// when the lapse rate is Beta(A, B).
type Lapse struct {
	N    int
	A, B float64
}

func beta(a, b float64) float64 {
	return math.Gamma(a) * math.Gamma(b) / math.Gamma(a+b) // want `Beta function as Γ\(a\)Γ\(b\)/Γ\(a\+b\) in float64: math\.Gamma\(a\) is \+Inf for a ≥ 171\.624377`
}

// Prob is the probability that exactly k policies lapse.
func (l Lapse) Prob(k int) float64 { // want Prob:`wrong for some l or some k \(Prob, claimfreq/tables\.go:56\)` Prob:`value Γ\(recv\.N \+ 1\)·Γ\(p0 \+ recv\.A\)·Γ\(-p0 \+ recv\.N \+ recv\.B\)·Γ\(recv\.A \+ recv\.B\)/\(Γ\(-p0 \+ recv\.N \+ 1\)·Γ\(p0 \+ 1\)·`
	c := 1.0
	for i := 1; i <= k; i++ { // want `multiplicative binomial loop computes C\(l\.N, k\) in float64: the product c\*\(float64\(l\.N - k \+ i\)\) overflows to `
		c = c * float64(l.N-k+i) / float64(i)
	}
	return c * beta(float64(k)+l.A, float64(l.N-k)+l.B) / beta(l.A, l.B) // want `Prob computes Γ\(l\.N \+ 1\)·Γ\(k \+ l\.A\)·Γ\(-k \+ l\.N \+ l\.B\)·Γ\(l\.A \+ l\.B\)/\(Γ\(-k \+ l\.N \+ 1\)·Γ\(k \+ 1\)·Γ\(l\.N \+ l\.A \+ l\.B`
}

// LogProb is the logarithm of Prob.
func (l Lapse) LogProb(k int) float64 {
	lb := func(a, b float64) float64 {
		x, _ := math.Lgamma(a)
		y, _ := math.Lgamma(b)
		z, _ := math.Lgamma(a + b)
		return x + y - z
	}
	n, kf := float64(l.N), float64(k)
	ln, _ := math.Lgamma(n + 1)
	lk, _ := math.Lgamma(kf + 1)
	lnk, _ := math.Lgamma(n - kf + 1)
	return ln - lk - lnk + lb(kf+l.A, n-kf+l.B) - lb(l.A, l.B)
}

// ExactPoisson returns P(N = k) at an integer rate m as an exact
// rational e^-m m^k / k!, rounded to float64 at the end.
func ExactPoisson(k int, m int64) float64 {
	num := new(big.Int).Exp(big.NewInt(m), big.NewInt(int64(k)), nil)
	den := new(big.Int).MulRange(1, int64(k))
	if k == 0 {
		den.SetInt64(1)
	}
	r := new(big.Float).SetPrec(200).Quo(new(big.Float).SetInt(num), new(big.Float).SetInt(den))
	f, _ := r.Float64()
	return f * math.Exp(-float64(m))
}

// DispersionIndex is variance over mean of a claim-count sample.
func DispersionIndex(counts []int) float64 {
	if len(counts) == 0 {
		return math.NaN()
	}
	var s, ss float64
	for _, c := range counts {
		s += float64(c)
		ss += float64(c) * float64(c)
	}
	n := float64(len(counts))
	m := s / n
	return (ss/n - m*m) / m
}
