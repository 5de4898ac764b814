// Package repairshop sizes the repair crew of a machine shop with the
// finite-source (machine interference) queue: N machines that break
// down at rate Lambda each, R mechanics that repair at rate Mu each.
package repairshop

import (
	"errors"
	"math"
)

// Shop describes one machine shop.
type Shop struct {
	Machines  int
	Mechanics int
	Lambda    float64
	Mu        float64
}

// ErrNoCrew is returned for a shop without mechanics.
var ErrNoCrew = errors.New("repairshop: no mechanics")

func factorial(n int) float64 { // want factorial:`factorial of parameter 0, breaks from 171`
	p := 1.0
	for i := n; i > 1; i-- {
		p *= float64(i)
	}
	return p
}

// weight is the unnormalised stationary weight of n machines down.
func (s Shop) weight(n int) float64 {
	rho := s.Lambda / s.Mu
	N, r := s.Machines, s.Mechanics
	w := factorial(N) / factorial(N-n) * math.Pow(rho, float64(n)) // want `weight computes Γ\(s\.Machines \+ 1\)·\(s\.Lambda\)\^\(n\)/\(Γ\(-n \+ s\.Machines \+ 1\)·\(s\.Mu\)\^\(n\)\) in float64, which fits wh`
	if n <= r {
		return w / factorial(n) // want `ratio of factorials in float64: the numerator N! overflows to \+Inf for N ≥ 171 before the division`
	}
	return w / (factorial(r) * math.Pow(float64(r), float64(n-r))) // want `ratio of factorials in float64: the numerator N! overflows to \+Inf for N ≥ 171 before the division`
}

// Distribution returns the stationary probabilities of 0..N machines
// being down.
func (s Shop) Distribution() ([]float64, error) { // want Distribution:`wrong for some s`
	if s.Mechanics < 1 {
		return nil, ErrNoCrew
	}
	p := make([]float64, s.Machines+1)
	total := 0.0
	for n := range p {
		p[n] = s.weight(n) // want `Distribution builds its result from s\.weight\(n\), which is wrong for some inputs \(reported at repairshop/interference\.go:36\); s is not bounded here`
		total += p[n]
	}
	for n := range p {
		p[n] /= total
	}
	return p, nil
}

// MeanDown is the expected number of machines out of service.
func (s Shop) MeanDown() (float64, error) { // want MeanDown:`wrong for some s`
	p, err := s.Distribution() // want `MeanDown builds its result from s\.Distribution\(\), which is wrong for some inputs \(through weight, reported at repairshop/interference\.go:36\)`
	if err != nil {
		return 0, err
	}
	m := 0.0
	for n, v := range p {
		m += float64(n) * v
	}
	return m, nil
}

// DistributionStable computes the same probabilities from the
// birth-death balance p(n+1) = p(n) * birth(n) / death(n+1), rescaling
// whenever the running weight grows large.
func (s Shop) DistributionStable() []float64 {
	N := s.Machines
	p := make([]float64, N+1)
	p[0] = 1
	for n := 0; n < N; n++ {
		birth := float64(N-n) * s.Lambda
		death := float64(min(n+1, s.Mechanics)) * s.Mu
		p[n+1] = p[n] * birth / death
		if p[n+1] > 1e250 {
			for i := 0; i <= n+1; i++ {
				p[i] /= 1e250
			}
		}
	}
	total := 0.0
	for _, v := range p {
		total += v
	}
	for i := range p {
		p[i] /= total
	}
	return p
}

// Utilisation is the share of mechanics busy.
func (s Shop) Utilisation() float64 {
	p := s.DistributionStable()
	busy := 0.0
	for n, v := range p {
		busy += float64(min(n, s.Mechanics)) * v
	}
	return busy / float64(s.Mechanics)
}
