// Package lgammasign is a materials lab's toolkit for fractional
// calculus and power-law fits, where Γ meets negative non-integer
// arguments: the derivative of order alpha of t^k is
// Γ(k+1)/Γ(k+1−alpha)·t^(k−alpha), and k+1−alpha is negative for the
// singular power laws the lab fits.
package lgammasign

import "math"

// PowerLawDerivative returns the Riemann–Liouville derivative of order
// alpha of t^k at t; num is Γ(k+1), from the lab's table of exponents.
func PowerLawDerivative(num, k, alpha, t float64) float64 {
	den, _ := math.Lgamma(k + 1 - alpha)
	return num / math.Exp(den) * math.Pow(t, k-alpha) // want `the sign of Γ\(k \+ 1 - alpha\) from math.Lgamma is dropped, and math.Exp\(den\) uses \|Γ\(k \+ 1 - alpha\)\| for Γ\(k \+ 1 - alpha\).*as at k \+ 1 - alpha = -0.5, where Γ is -3.545; the argument is not bounded here`
}

// RelaxationWeight is the weight Γ(s) of a stretched relaxation mode;
// the shift s is a fitted parameter, negative for creep.
func RelaxationWeight(s float64) float64 {
	lg, _ := math.Lgamma(s)
	w := lg - math.Log(2)
	return math.Exp(w) // want `the sign of Γ\(s\) from math.Lgamma is dropped, and math.Exp\(w\) uses \|Γ\(s\)\|.*s is not bounded below here`
}

// ShellVolume is the volume of the unit ball in d dimensions,
// π^(d/2)/Γ(d/2+1); dimensional continuation uses negative d.
func ShellVolume(d int) float64 { // want ShellVolume:`wrong for some d`
	lg, _ := math.Lgamma(float64(d)/2 + 1)
	v := math.Exp(-lg) // want `Γ\(float64\(d\)/2 \+ 1\) from math.Lgamma is dropped.*d is not bounded below here`
	return math.Pow(math.Pi, float64(d)/2) * v
}

// HalfStep is the derivative of order ½ of t^k at 1, for k just below
// a pole: k + ½ lies in (−1, −½).
func HalfStep(k float64) float64 {
	if k < -1.5 || k > -1 {
		return math.NaN()
	}
	lg, _ := math.Lgamma(k + 0.5)
	return math.Exp(lg) // want `.*the argument is always there`
}
