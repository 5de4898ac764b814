package linebroaden

import "math"

// Line is one absorption line in a gas cell.
type Line struct {
	Density float64 // mean collisions per lifetime
	Width   float64
}

func collisionCount(n float64) float64 { // want collisionCount:`factorial of parameter 0`
	r := 1.0
	for i := n; i > 1; i-- {
		r *= i
	}
	return r
}

// PressureTerm is the weight of the k-collision component of the profile.
func (l Line) PressureTerm(k int) float64 { // want PressureTerm:`value \(recv\.Density\)\^\(p0\)·exp\(-recv\.Density\)/Γ\(p0 \+ 1\), wrong once p0 ≥ 171` PressureTerm:`wrong for k ≥ 171`
	return math.Pow(l.Density, float64(k)) / collisionCount(float64(k)) * math.Exp(-l.Density) // want `term with l\.Density\^k over \(float64\(k\)\)! in float64: the divisor \(floa`
}

// PressureTermLog is the same weight computed through log-gamma.
func (l Line) PressureTermLog(k int) float64 {
	lg, _ := math.Lgamma(float64(k + 1))
	return math.Exp(float64(k)*math.Log(l.Density) - l.Density - lg)
}

// dampingSum evaluates the odd damping series sum a^(2k+1)/(2k+1)! with a fixed term count.
func dampingSum(a float64, terms int) float64 {
	s := 0.0
	for k := 0; k < terms; k++ {
		n := 2*k + 1
		s += math.Pow(a, float64(n)) / collisionCount(float64(n)) // want `power-over-factorial term a\^n/\(float64\(n\)\)! in float64: the divisor \(f`
	}
	return s
}
