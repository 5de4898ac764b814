package microstates

import (
	"math"
	"math/big"
)

// LogZIdeal returns ln Z for n indistinguishable ideal-gas particles
// whose one-particle partition function is z1 = V/λ³.
func LogZIdeal(n int, z1 float64) float64 { // want LogZIdeal:`wrong for n ≥ 171 \(LogZIdeal, microstates/gas\.go:11\)`
	z := math.Pow(z1, float64(n)) / fact(n) // want `power-over-factorial term z1\^n/n! in float64: the divisor n! overflows to \+Inf for n ≥`
	return math.Log(z)
}

var logFact = map[int]float64{0: 0}

func lnFact(n int) float64 {
	if v, ok := logFact[n]; ok {
		return v
	}
	v := lnFact(n-1) + math.Log(float64(n))
	logFact[n] = v
	return v
}

// LogZIdealStable is LogZIdeal kept in log space throughout.
func LogZIdealStable(n int, z1 float64) float64 {
	return float64(n)*math.Log(z1) - lnFact(n)
}

// OscillatorZ returns the partition function of a quantum harmonic
// oscillator at inverse temperature beta (units of ħω), summed over the
// first levels levels.
func OscillatorZ(beta float64, levels int) float64 {
	z := 0.0
	for n := 0; n < levels; n++ {
		z += math.Exp(-beta * (float64(n) + 0.5))
	}
	return z
}

// RotationalZ returns the rotational partition function of a linear
// molecule with rotational temperature thetaR at temperature t.
func RotationalZ(thetaR, t float64, jmax int) float64 {
	z := 0.0
	for j := 0; j <= jmax; j++ {
		fj := float64(j)
		z += (2*fj + 1) * math.Exp(-fj*(fj+1)*thetaR/t)
	}
	return z
}

// Populations returns the Boltzmann occupation of levels with the given
// energies and degeneracies at inverse temperature beta.
func Populations(energies []float64, g []int, beta float64) []float64 {
	emin := math.Inf(1)
	for _, e := range energies {
		emin = math.Min(emin, e)
	}
	p := make([]float64, len(energies))
	z := 0.0
	for i, e := range energies {
		p[i] = float64(g[i]) * math.Exp(-beta*(e-emin))
		z += p[i]
	}
	for i := range p {
		p[i] /= z
	}
	return p
}

// Weight returns the number of microstates N!/∏ n_i! of distinguishable
// particles with the level occupations occ.
func Weight(occ []int) float64 {
	n := 0
	for _, k := range occ {
		n += k
	}
	w := math.Gamma(float64(n + 1)) // want `math\.Gamma overflows: math\.Gamma\(float64\(n \+ 1\)\) is \+Inf for n ≥ 171 \(Γ\(x\) overflows`
	for _, k := range occ {
		w /= math.Gamma(float64(k + 1)) // want `math\.Gamma overflows: math\.Gamma\(float64\(k \+ 1\)\) is \+Inf for k ≥ 171 \(Γ\(x\) overflows`
	}
	return w
}

// WeightExact is Weight as an exact integer.
func WeightExact(occ []int) *big.Int {
	w := big.NewInt(1)
	n := int64(0)
	for _, k := range occ {
		for i := int64(1); i <= int64(k); i++ {
			n++
			w.Mul(w, big.NewInt(n))
			w.Quo(w, big.NewInt(i))
		}
	}
	return w
}
