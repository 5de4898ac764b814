// Package gas is the toy gas model of the desk's training course:
// particles in d dimensions, Maxwell-Boltzmann speeds, and a Beta
// distribution for the share of energy in one degree of freedom.
package gas

import "math"

// BallVolume is the volume of the unit ball in d dimensions,
// π^(d/2)/Γ(d/2+1), used to count states below an energy.
func BallVolume(d float64) float64 {
	return math.Pow(math.Pi, d/2) / math.Gamma(d/2+1)
}

// EnergyShareDensity is the Beta(a, b) density at x, the share of the
// energy held by a subsystem with 2a of the 2(a+b) degrees of freedom.
func EnergyShareDensity(x, a, b float64) float64 {
	return math.Gamma(a+b) / (math.Gamma(a) * math.Gamma(b)) * math.Pow(x, a-1) * math.Pow(1-x, b-1)
}

// SpeedMoment is the mean of v^k for Maxwell-Boltzmann speeds in three
// dimensions with thermal speed s: Γ((k+3)/2) / Γ(3/2) · s^k.
func SpeedMoment(k int, s float64) float64 {
	return math.Gamma(float64(k+3)/2) / math.Gamma(1.5) * math.Pow(s, float64(k))
}

// TaylorExp sums 1 + x + x^2/2! + ... up to the term x^terms/terms!,
// the series of e^x, as the course's first exercise does.
func TaylorExp(x float64, terms int) float64 {
	sum, fact := 1.0, 1.0
	for k := 1; k <= terms; k++ {
		fact *= float64(k)
		sum += math.Pow(x, float64(k)) / fact
	}
	return sum
}

// StandardVolume is the volume of the ball in three dimensions, 4π/3:
// Γ(5/2) of a constant argument far below where Gamma overflows.
func StandardVolume() float64 {
	return math.Pow(math.Pi, 1.5) / math.Gamma(2.5)
}
