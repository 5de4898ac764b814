package spinstats

import "math"

// MaxwellBoltzmannMultiplicity is N!/(n1! n2! ...) for the occupations.
func MaxwellBoltzmannMultiplicity(occ []int) float64 {
	n := 0
	den := 1.0
	for _, k := range occ {
		n += k
		den *= math.Gamma(float64(k + 1)) // want `math\.Gamma overflows: math\.Gamma\(float64\(k \+ 1\)\) is \+Inf`
	}
	return math.Gamma(float64(n+1)) / den // want `math\.Gamma overflows: math\.Gamma\(float64\(n \+ 1\)\) is \+Inf`
}

// LogMultiplicity is the logarithm of MaxwellBoltzmannMultiplicity.
func LogMultiplicity(occ []int) float64 {
	n := 0
	s := 0.0
	for _, k := range occ {
		n += k
		g, _ := math.Lgamma(float64(k + 1))
		s -= g
	}
	g, _ := math.Lgamma(float64(n + 1))
	return s + g
}

// Oscillators is an Einstein solid of N oscillators sharing Quanta quanta.
type Oscillators struct {
	N      int
	Quanta int
}

// Multiplicity is C(Quanta+N-1, Quanta), as a running product.
func (o Oscillators) Multiplicity() float64 { // want Multiplicity:`value Γ\(recv\.N \+ recv\.Quanta\)/\(Γ\(recv\.N\)·Γ\(recv\.Quanta \+ 1\)\), a running product`
	w := 1.0
	for i := 1; i <= o.Quanta; i++ {
		w *= float64(o.N-1+i) / float64(i)
	}
	return w
}

// Entropy is ln of the multiplicity, in units of k_B.
func (o Oscillators) Entropy() float64 { // want Entropy:`value ln Γ\(recv\.N \+ recv\.Quanta\)/\(Γ\(recv\.N\)·Γ\(recv\.Quanta \+ 1\)\)`
	return math.Log(o.Multiplicity()) // want `math\.Log of o\.Multiplicity\(\), whose value is C\(o\.N \+ o\.Quanta - 1, o\.N - 1\): it overflows to \+Inf for o\.N \+ o\.Quanta - 1 ≥ 1030 at o\.N - 1 = \(o\.N \+ o\.Quanta - 1\)/2 \(C\(1029, 514\) ≈ 1\.43e308 is the largest central one that fits\)`
}
