package lgammasign

import "math"

// BallVolume is ShellVolume for real dimensions only: d ≥ 0 keeps
// d/2 + 1 at 1 or above, where Γ is positive.
func BallVolume(d int) float64 { // want BallVolume:`wrong for some d`
	if d < 0 {
		return 0
	}
	lg, _ := math.Lgamma(float64(d)/2 + 1)
	return math.Pow(math.Pi, float64(d)/2) / math.Exp(lg) // want `math\.Exp\(lg\) is \+Inf for d ≥ 342: its exponent passes 709\.4361393, past which math\.Exp ret`
}

// Arrangements counts orderings of n samples as Γ(n+1); n is unsigned,
// so the argument is a positive integer.
func Arrangements(n uint) float64 {
	lg, _ := math.Lgamma(float64(n) + 1)
	return math.Exp(lg)
}

// SignedWeight keeps the sign: right for every s.
func SignedWeight(s float64) float64 {
	lg, sign := math.Lgamma(s)
	return float64(sign) * math.Exp(lg) // want `math\.Exp\(lg\) is \+Inf for s ≥ 171\.556979: its exponent passes 709\.4361393, past which math\.`
}

// ShapeFactor is Γ(a) for a shape parameter checked to be positive.
func ShapeFactor(a float64) float64 {
	if a <= 0 {
		panic("shape must be positive")
	}
	lg, _ := math.Lgamma(a)
	return math.Exp(lg)
}

// SquaredWeight is Γ(s)², which has no sign to lose.
func SquaredWeight(s float64) float64 {
	lg, _ := math.Lgamma(s)
	return math.Exp(2 * lg)
}

// Between is Γ on (−2, −1), where it is positive.
func Between(x float64) float64 {
	if x <= -2 || x >= -1 {
		return math.NaN()
	}
	lg, _ := math.Lgamma(x)
	return math.Exp(lg)
}

// DefectOdds is the binomial probability of k defects among n samples,
// with counts held in floats: a ratio of Γ values whose arguments are
// counts, positive by their domain, so the dropped signs are all +1.
func DefectOdds(n, k, p float64) float64 {
	a, _ := math.Lgamma(n + 1)
	b, _ := math.Lgamma(k + 1)
	c, _ := math.Lgamma(n - k + 1)
	return math.Exp(a - b - c + k*math.Log(p) + (n-k)*math.Log1p(-p)) // want `math\.Exp of log-gamma values computes a product of Γ values from 3 log-gamma values whose `
}

// Tail is the same ratio where the lab's code lets k go below zero,
// for the reflected series, and checks it: k ≥ −0.75 puts k + 1 in
// [0.25, ∞), and n − k + 1 and n + 1 are counts.
func Tail(n, k, p float64) float64 { // want Tail:`value Γ\(p0 \+ 1\)/\(Γ\(p1 \+ 1\)·Γ\(p0 - p1 \+ 1\)\)`
	if k < -0.75 {
		return 0
	}
	a, _ := math.Lgamma(n + 1)
	b, _ := math.Lgamma(k + 1)
	c, _ := math.Lgamma(n - k + 1)
	return math.Exp(a - b - c) // want `math\.Exp of log-gamma values computes C\(n, k\) from 3 log-gamma values whose rounding error`
}

// Reflected lets k reach −1.5 for the reflected series: k + 1 can be
// −0.5, where Γ is negative, and the code shows it.
func Reflected(n, k float64) float64 {
	if k < -1.5 {
		return 0
	}
	a, _ := math.Lgamma(n + 1)
	b, _ := math.Lgamma(k + 1)
	return math.Exp(a - b) // want `the sign of Γ\(k \+ 1\) from math.Lgamma is dropped.*as at k \+ 1 = -0.25, where Γ is -4.90\d; the argument may be as low as -0.5 here` `math\.Exp of log-gamma values computes n!/k! from 2 log-gamma values whose rounding errors `
}
