package sparecheck

import "math"

// AcceptProb is the chance that a lot of size lot holding defectives bad
// items passes a single sampling plan: a sample of size sample with at
// most accept bad items in it.
func AcceptProb(lot, defectives, sample, accept int) float64 { // want AcceptProb:`wrong for some lot or some defectives or some sample or some accept`
	total := float64(chooseU(uint64(lot), uint64(sample)))
	p := 0.0
	for x := 0; x <= accept && x <= defectives; x++ {
		good := chooseU(uint64(lot-defectives), uint64(sample-x))
		bad := chooseU(uint64(defectives), uint64(x))
		p += float64(good) * float64(bad) / total // want `hypergeometric probability from three binomial coefficients in`
	}
	return p
}

// SinglePlan is a single sampling plan against a binomial stream.
type SinglePlan struct {
	SampleSize int
	AcceptNum  int
}

// OC is the operating characteristic at fraction defective q.
func (s SinglePlan) OC(q float64) float64 { // want OC:`wrong for some s`
	n := s.SampleSize
	pa := 0.0
	for i := 0; i <= s.AcceptNum; i++ {
		pa += chooseGamma(n, i) * math.Pow(q, float64(i)) * math.Pow(1-q, float64(n-i)) // want `OC computes C\(s\.SampleSize, i\)·q\^i·\(1−q\)\^\(-i \+ s\.SampleSize\) in`
	}
	return pa
}

func poissonTerm(k int, m float64) float64 {
	return math.Pow(m, float64(k)) * math.Exp(-m) / float64(factU(uint64(k))) // want `Poisson-style term m\^k·e\^\(−m\)/\(uint64\(k\)\)! in uint64: the divisor`
}

// DoublePlan accepts on the first sample at AcceptFirst defects or fewer.
type DoublePlan struct {
	AcceptFirst int
}

// AcceptProb is the Poisson approximation of the first-sample acceptance
// at a mean m of defects per sample.
func (d DoublePlan) AcceptProb(m float64) float64 { // want AcceptProb:`wrong for some d`
	p := 0.0
	for k := d.AcceptFirst; k >= 0; k-- {
		p += poissonTerm(k, m) // want `AcceptProb computes m\^k·e\^\(−m\)/k! in float64, which fits where poissonTerm\(k, m\) already is wrong from k = 21 \(its factU\(uint64\(k\)\) breaks first\)`
	}
	return p
}
