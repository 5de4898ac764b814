package repairshop

import "math"

// BirthDeath is a birth-death chain on 0..len(Birth) with birth rate
// Birth[i] out of state i and death rate Death[i] out of state i+1.
type BirthDeath struct {
	Birth []float64
	Death []float64
}

// Stationary returns the chain's stationary distribution from the
// products of its rates.
func (c BirthDeath) Stationary() []float64 {
	n := len(c.Birth)
	pi := make([]float64, n+1)
	num, den := 1.0, 1.0
	pi[0] = 1
	total := 1.0
	for i := 0; i < n; i++ {
		num *= c.Birth[i]
		den *= c.Death[i]
		pi[i+1] = num / den
		total += pi[i+1]
	}
	for i := range pi {
		pi[i] /= total
	}
	return pi
}

// StationaryLog is Stationary with the products kept as sums of
// logarithms.
func (c BirthDeath) StationaryLog() []float64 {
	n := len(c.Birth)
	lw := make([]float64, n+1)
	top := 0.0
	for i := 0; i < n; i++ {
		lw[i+1] = lw[i] + math.Log(c.Birth[i]) - math.Log(c.Death[i])
		top = math.Max(top, lw[i+1])
	}
	pi := make([]float64, n+1)
	total := 0.0
	for i, l := range lw {
		pi[i] = math.Exp(l - top)
		total += pi[i]
	}
	for i := range pi {
		pi[i] /= total
	}
	return pi
}

// MMInfinity returns the first n+1 stationary probabilities of an
// M/M/inf repair pool at offered load a, e^-a a^k / k!.
func MMInfinity(n int, a float64) []float64 { // want MMInfinity:`wrong for some n`
	p := make([]float64, n+1)
	pw, kf := 1.0, 1.0
	for k := 0; k <= n; k++ {
		if k > 0 {
			pw *= a
			kf *= float64(k)
		}
		p[k] = math.Exp(-a) * pw / kf // want `series term math\.Exp\(-a\) \* pw / kf computes`
	}
	return p
}

// SpareCount is the number of ways to choose which s of n spare
// machines are kept warm, in int.
func SpareCount(n, s int) int { // want SpareCount:`wrong for some n or some s \(SpareCount, repairshop/chain\.go:76\)`
	if s < 0 || s > n {
		return 0
	}
	num, den := 1, 1
	for i := 0; i < s; i++ { // want `falling factorial of s factors from n down in int wraps: when s = n it is n!, which wraps for n ≥ 21`
		num *= n - i
		den *= i + 1
	}
	return num / den
}

// CrewOrderings is the number of orders in which r mechanics can be
// assigned to k distinct jobs, r!/(r-k)!, for crews of at most 20.
func CrewOrderings(r, k int) int64 {
	if r > 20 || k > r || k < 0 {
		return 0
	}
	var p int64 = 1
	for i := r - k + 1; i <= r; i++ {
		p *= int64(i)
	}
	return p
}

// RepairTimeTail is the probability that an Erlang-k repair of rate mu
// per phase takes longer than t, by its closed form as a ratio of
// the regularised upper incomplete Gamma written out as a sum.
func RepairTimeTail(k int, mu, t float64) float64 { // want RepairTimeTail:`wrong for some k \(RepairTimeTail, repairshop/chain\.go:103\)`
	x := mu * t
	s := 0.0
	for i := 0; i < k; i++ {
		s += math.Pow(x, float64(i)) / math.Gamma(float64(i+1)) // want `math\.Gamma overflows: math\.Gamma\(float64\(i \+ 1\)\) is \+Inf for i ≥ 171` `series term math\.Pow\(x, float64\(i\)\) / math\.Gamma\(float64\(i\+1\)\) computes`
	}
	return math.Exp(-x) * s
}

// MeanRepairs is the mean of a Poisson count of repairs.
func MeanRepairs(rate, hours float64) float64 { return rate * hours }
