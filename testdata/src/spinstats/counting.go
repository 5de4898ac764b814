package spinstats

import (
	"math"
	"math/big"
	"math/bits"
)

// Level is a number of single-particle states.
type Level int64

func fact64(n int64) int64 { // want fact64:`factorial of parameter 0,`
	out := int64(1)
	for ; n > 1; n-- { // want `factorial of n in int64 wraps for`
		out *= n
	}
	return out
}

// BoseEinsteinStates counts the ways to put particles bosons in g states.
func BoseEinsteinStates(particles int64, g Level) int64 { // want BoseEinsteinStates:`value Γ\(p0 \+ p1\)/\(Γ\(p0` BoseEinsteinStates:`wrong for some particles or some g`
	return fact64(particles+int64(g)-1) / (fact64(particles) * fact64(int64(g)-1)) // want `binomial coefficient as a ratio of factorials`
}

// FermiDiracStates counts the ways to put particles fermions in g
// states; ok is false when the count does not fit.
func FermiDiracStates(particles, g int) (count uint64, ok bool) {
	if particles < 0 || g < 0 || particles > g {
		return 0, true
	}
	c := new(big.Int).Binomial(int64(g), int64(particles))
	if !c.IsUint64() {
		return 0, false
	}
	return c.Uint64(), true
}

// LatticeGasStates is the number of ways to fill sites with particles,
// by Pascal's rule with an overflow check.
func LatticeGasStates(sites, particles uint) (uint64, bool) {
	if particles > sites {
		return 0, true
	}
	row := make([]uint64, particles+1)
	row[0] = 1
	for s := uint(1); s <= sites; s++ {
		for j := min(s, particles); j >= 1; j-- {
			sum, carry := bits.Add64(row[j], row[j-1], 0)
			if carry != 0 {
				return 0, false
			}
			row[j] = sum
		}
	}
	return row[particles], true
}

// BoseGasCount is BoseEinsteinStates as a float from log-gamma values.
func BoseGasCount(particles, levels int) float64 { // want BoseGasCount:`value Γ\(p0 \+ p1\)/\(Γ\(p0`
	a, _ := math.Lgamma(float64(particles + levels))
	b, _ := math.Lgamma(float64(particles + 1))
	c, _ := math.Lgamma(float64(levels))
	return math.Exp(a - b - c) // want `math\.Exp of log-gamma values computes C\(particles \+`
}
