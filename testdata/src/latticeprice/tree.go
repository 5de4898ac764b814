package latticeprice

import (
	"math"
	"math/bits"
)

// Tree is a recombining binomial tree.
type Tree struct {
	Steps int
	Up    float64 // up factor per step
	Down  float64 // down factor per step
	Rate  float64 // risk-free rate per step, continuously compounded
}

// riskNeutral is the up probability that makes the tree arbitrage-free.
func (t Tree) riskNeutral() float64 {
	return (math.Exp(t.Rate) - t.Down) / (t.Up - t.Down)
}

// NodeProb is the risk-neutral probability of ending at node k (k ups).
func (t Tree) NodeProb(k int) float64 { // want NodeProb:`wrong for some t or some k`
	p := t.riskNeutral()
	n := float64(t.Steps)
	c := math.Gamma(n+1) / (math.Gamma(float64(k)+1) * math.Gamma(n-float64(k)+1)) // want `ratio of math\.Gamma values in float64: math\.Gamma\(n \+`
	return c * math.Pow(p, float64(k)) * math.Pow(1-p, n-float64(k))
}

// Backward prices an option by backward induction, early exercise
// allowed when american is set.
func (t *Tree) Backward(S, K float64, call, american bool) float64 {
	p := t.riskNeutral()
	disc := math.Exp(-t.Rate)
	v := make([]float64, t.Steps+1)
	for k := 0; k <= t.Steps; k++ {
		v[k] = payoff(S*math.Pow(t.Up, float64(k))*math.Pow(t.Down, float64(t.Steps-k)), K, call)
	}
	for step := t.Steps - 1; step >= 0; step-- {
		for k := 0; k <= step; k++ {
			v[k] = disc * (p*v[k+1] + (1-p)*v[k])
			if american {
				ex := payoff(S*math.Pow(t.Up, float64(k))*math.Pow(t.Down, float64(step-k)), K, call)
				v[k] = math.Max(v[k], ex)
			}
		}
	}
	return v[0]
}

// TrinomialWeight is the number of paths of a trinomial tree with i ups,
// j downs and n−i−j flat steps, n!/(i! j! (n−i−j)!).
func TrinomialWeight(n, i, j int) float64 {
	fact := func(m int) float64 {
		f := 1.0
		for x := 2; x <= m; x++ { // want `factorial of m in float64 overflows to \+Inf for m ≥ 171`
			f *= float64(x)
		}
		return f
	}
	return fact(n) / (fact(i) * fact(j) * fact(n-i-j))
}

// PathCount is C(n, k), the number of paths reaching node k after n
// steps, with false when it does not fit in uint64.
func PathCount(n, k int) (uint64, bool) {
	if k < 0 || k > n {
		return 0, true
	}
	if k > n-k {
		k = n - k
	}
	r := uint64(1)
	for i := 1; i <= k; i++ {
		hi, lo := bits.Mul64(r, uint64(n-k+i))
		if hi >= uint64(i) {
			return 0, false
		}
		r, _ = bits.Div64(hi, lo, uint64(i))
	}
	return r, true
}
