package orbitals

import "math"

// hermiteH evaluates the physicists' Hermite polynomial H_n(x).
func hermiteH(n int, x float64) float64 {
	if n == 0 {
		return 1
	}
	h0, h1 := 1.0, 2*x
	for k := 1; k < n; k++ {
		h0, h1 = h1, 2*x*h1-2*float64(k)*h0
	}
	return h1
}

// HermiteNorm is the normalisation 1/sqrt(2^n n! √π) of the nth
// harmonic-oscillator eigenfunction in natural units.
func HermiteNorm(n int) float64 { // want HermiteNorm:`wrong for n ≥ 151`
	return 1 / math.Sqrt(math.Pow(2, float64(n))*factorial(n)*math.Sqrt(math.Pi)) // want `product of factorials and powers under math\.Sqrt in float64: the intermediate 2\^n·n! overflows to \+Inf first, at n = 151 on that line of inputs, while the square root the code keeps still fits`
}

// OscillatorPsi is the nth eigenfunction ψ_n(x) of the quantum harmonic
// oscillator, written as the textbook product.
func OscillatorPsi(n int, x float64) float64 { // want OscillatorPsi:`wrong for n ≥ 151`
	return HermiteNorm(n) * hermiteH(n, x) * math.Exp(-x*x/2) // want `OscillatorPsi builds its result from HermiteNorm\(n\), which is wrong from n = 151`
}

// OscillatorPsiStable evaluates ψ_n(x) by the normalised three-term
// recurrence. Outside |x| <= 30 it returns NaN.
func OscillatorPsiStable(n int, x float64) float64 {
	if n < 0 || math.Abs(x) > 30 {
		return math.NaN()
	}
	psi0 := math.Pow(math.Pi, -0.25) * math.Exp(-x*x/2)
	if n == 0 {
		return psi0
	}
	psi1 := math.Sqrt2 * x * psi0
	for k := 1; k < n; k++ {
		next := math.Sqrt(2/float64(k+1))*x*psi1 - math.Sqrt(float64(k)/float64(k+1))*psi0
		psi0, psi1 = psi1, next
	}
	return psi1
}

// Atom is a hydrogen-like atom of nuclear charge Z.
type Atom struct {
	Z       int
	Rydberg float64 // energy unit, eV
}

// Energy is the level energy −Z²R/n².
func (a Atom) Energy(n int) float64 {
	z := float64(a.Z)
	return -z * z * a.Rydberg / float64(n*n)
}

// RadialNorm is the normalisation of the radial function R_nl in Bohr
// radii: sqrt((2Z/n)³ (n−l−1)! / (2n (n+l)!)).
func (a Atom) RadialNorm(n, l int) float64 { // want RadialNorm:`wrong for some n or some l`
	rho := 2 * float64(a.Z) / float64(n)
	return math.Sqrt(rho * rho * rho * factorial(n-l-1) / (2 * float64(n) * factorial(n+l))) // want `ratio of factorials in float64: the divisor \(n \+ l\)! overflows to \+Inf for n \+ l ≥ 171, no later than`
}
