package outbreak

import "math"

// choose64 is C(n, k) by the multiplicative formula in int64.
func choose64(n, k int) int64 { // want choose64:`binomial of parameter 0, breaks from 62`
	if k < 0 || k > n {
		return 0
	}
	r := int64(1)
	for j := 0; j < k; j++ { // want `multiplicative binomial loop in int64: the product r \*`
		r = r * int64(n-j) / int64(j+1)
	}
	return r
}

// ChainProb is the Reed–Frost chain-binomial probability that c of s
// susceptibles are infected in one generation by i infectives, each
// contact escaping infection with probability q.
func ChainProb(s, i, c int, q float64) float64 { // want ChainProb:`wrong for s ≥ 62`
	esc := math.Pow(q, float64(i))
	return float64(choose64(s, c)) * math.Pow(1-esc, float64(c)) * math.Pow(esc, float64(s-c)) // want `binomial probability C\(s, c\)·\(1 - esc\)\^c·\(1−\(1 -`
}

// SusceptibleWays counts the ways to pick c infected among s, by the
// recursion C(s, c) = C(s−1, c−1)·s/c.
func SusceptibleWays(s, c uint64) uint64 { // want SusceptibleWays:`binomial of parameter 0, breaks from 63` SusceptibleWays:`wrong for some s or some c`
	if c == 0 || c == s {
		return 1
	}
	if c > s {
		return 0
	}
	return SusceptibleWays(s-1, c-1) * s / c // want `multiplicative binomial recursion in uint64: the`
}

// BirthdayCollision is the probability that among n people some two
// share one of days equally likely days.
func BirthdayCollision(n, days int) float64 {
	if n > days {
		return 1
	}
	p := 1.0
	for i := 0; i < n; i++ {
		p *= float64(days-i) / float64(days)
	}
	return 1 - p
}

// BirthdayDirect is BirthdayCollision from the closed form
// 1 − days!/((days−n)!·days^n).
func BirthdayDirect(n, days int) float64 { // want BirthdayDirect:`wrong for days ≥ 171`
	if n > days {
		return 1
	}
	return 1 - fact(days)/(fact(days-n)*math.Pow(float64(days), float64(n))) // want `permutation count days!/\(days - n\)! as a ratio of`
}

// NegBinomPMF is the Poisson–gamma mixture probability of k cases,
// Γ(k+r)/(k! Γ(r))·p^r·(1−p)^k.
func NegBinomPMF(k int, r, p float64) float64 { // want NegBinomPMF:`value Γ\(p0 \+ p1\)·\(p2\)\^\(p1\)·\(-p2 \+ 1\)\^\(p0\)/\(Γ\(p0 \+` NegBinomPMF:`wrong for k ≥ 170\.624377 or r ≥ 171\.624377`
	c := math.Gamma(float64(k)+r) / (math.Gamma(float64(k)+1) * math.Gamma(r)) // want `ratio of math\.Gamma values in float64:`
	return c * math.Pow(p, r) * math.Pow(1-p, float64(k))
}

// NegBinomPMFLog is NegBinomPMF with the Gamma ratio accumulated as a
// sum of logarithms, Σ ln((r+j)/(j+1)) over j < k.
func NegBinomPMFLog(k int, r, p float64) float64 {
	if k < 0 {
		return 0
	}
	if p == 1 {
		if k == 0 {
			return 1
		}
		return 0
	}
	lc := 0.0
	for j := 0; j < k; j++ {
		lc += math.Log1p((r - 1) / float64(j+1))
	}
	return math.Exp(lc + r*math.Log(p) + float64(k)*math.Log1p(-p))
}

// Surveillance holds weekly case counts against a Poisson baseline.
type Surveillance struct {
	Counts   []int
	Baseline float64
}

// Expected is the number of cases the baseline predicts over the record.
func (s *Surveillance) Expected() float64 {
	return s.Baseline * float64(len(s.Counts))
}

// Anomaly is the smallest upper-tail p-value P(X >= c) over the weeks.
func (s *Surveillance) Anomaly() float64 { // want Anomaly:`wrong for some s`
	best := 1.0
	for _, c := range s.Counts {
		if c == 0 {
			continue
		}
		pv := 1 - PoissonCDF(c-1, s.Baseline) // want `Anomaly builds its result from PoissonCDF\(c-1, s\.Baseline\), which is wrong for some values of k`
		if pv < best {
			best = pv
		}
	}
	return best
}
