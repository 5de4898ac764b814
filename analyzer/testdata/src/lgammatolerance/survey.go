// Package lgammatolerance is a survey office's sampling sheet, analysed
// with -lgamma-tolerance=1e-6: only binomials past the first n where the
// error bound of exp of log-gamma differences reaches 1e-6 are reported.
package lgammatolerance

import "math"

func lnGamma(x float64) float64 {
	v, _ := math.Lgamma(x)
	return v
}

// Samples counts the samples of k households from a census of n.
func Samples(n, k int) float64 { // want Samples:`value Γ\(p0 \+ 1\)/\(Γ\(p1 \+ 1\)·Γ\(p0 - p1 \+ 1\)\)`
	return math.Exp(lnGamma(float64(n)+1) - lnGamma(float64(k)+1) - lnGamma(float64(n-k)+1)) // want `passes the tolerance 1e-06 from n = \d+ `
}

// DistrictSamples serves districts of at most a million households:
// past 1e-12, within 1e-6.
func DistrictSamples(n, k int) float64 { // want DistrictSamples:`value Γ\(p0 \+ 1\)/\(Γ\(p1 \+ 1\)·Γ\(p0 - p1 \+ 1\)\)`
	if n < 0 || n > 1000000 {
		return 0
	}
	return math.Exp(lnGamma(float64(n)+1) - lnGamma(float64(k)+1) - lnGamma(float64(n-k)+1))
}
