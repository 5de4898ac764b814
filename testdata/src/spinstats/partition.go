package spinstats

import "math"

// RotorZ is the rotational partition function of a rigid rotor.
func RotorZ(jmax int, beta float64) float64 {
	z := 0.0
	for j := 0; j <= jmax; j++ {
		z += float64(2*j+1) * math.Exp(-beta*float64(j*(j+1)))
	}
	return z
}

// IdealGasZ is z1^N/N! for N indistinguishable particles.
func IdealGasZ(n int, z1 float64) float64 { // want IdealGasZ:`value \(p1\)\^\(p0\)/Γ\(p0 \+ 1\),`
	return math.Pow(z1, float64(n)) / math.Gamma(float64(n+1)) // want `math\.Gamma overflows: math\.Gamma\(float64\(n \+ 1\)\) is \+Inf`
}

// IdealGasLogZ is the logarithm of IdealGasZ.
func IdealGasLogZ(n int, z1 float64) float64 {
	g, _ := math.Lgamma(float64(n + 1))
	return float64(n)*math.Log(z1) - g
}

// HeatBath holds the Boltzmann weights of a ladder of levels.
type HeatBath struct {
	Beta    float64
	Spacing float64
	weights []float64
}

// Occupation is the mean number of quanta of a truncated oscillator.
func (h *HeatBath) Occupation(levels int) float64 {
	if len(h.weights) < levels {
		h.weights = make([]float64, levels)
		for i := range h.weights {
			h.weights[i] = math.Exp(-h.Beta * h.Spacing * float64(i))
		}
	}
	num, den := 0.0, 0.0
	for i := 0; i < levels; i++ {
		num += float64(i) * h.weights[i]
		den += h.weights[i]
	}
	return num / den
}
