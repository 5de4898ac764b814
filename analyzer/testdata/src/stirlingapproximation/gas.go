package stirlingapprox

import "math"

// MixingEntropy is ln N! for the Gibbs correction of an ideal gas of
// particles, in units of k_B.
func MixingEntropy(particles int) float64 {
	n := float64(particles)
	return n*math.Log(n) - n + 0.5*math.Log(2*math.Pi*n) // want `hand-written Stirling approximation \(n\+½\)·ln n − n \+ ½·ln 2π of particles! in log form: it is 7.79% below particles! at particles = 1`
}

// Microstates is ln W for the lab's two-level toy model, the log form
// written with decimal constants and locals.
func Microstates(n int) float64 {
	x := float64(n)
	logX := math.Log(x)
	half := (x + 0.5) * logX
	return half - x + 0.9189385332 // want `.* of n! in log form: it is 7.79% below n! at n = 1 and 0.83% at n = 10.*; n is not bounded here`
}

// LargeSystem is the textbook n ln n − n, without the ½ln(2πn) term:
// a coarser formula, not Stirling's term, and not reported.
func LargeSystem(particles int) float64 {
	n := float64(particles)
	return n*math.Log(n) - n
}

// EntropyTable is ln n! from a table below tableSize and by Stirling's
// formula above it: the lab chose the formula for large n, where its
// error is 1/(12n) in ln n!, and the test on n says so.
func EntropyTable(n int) float64 {
	if n < len(lnFactTable) {
		return lnFactTable[n]
	}
	x := float64(n)
	return (x+0.5)*math.Log(x) - x + 0.5*math.Log(2*math.Pi)
}

var lnFactTable = make([]float64, 256)
