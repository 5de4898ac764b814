// Package fixphase is the phase model of a radio receiver's local
// oscillator: sine and hyperbolic-sine series whose terms divide a
// power by a factorial kept in a running product. Its .golden file
// shows each term taken from the helper in log space, the loop kept.
package fixphase

import "math"

// Sine is sin x by its Taylor series, the factorial (2k+1)! updated
// on every trip but the first.
func Sine(x float64, terms int) float64 { // want Sine:`wrong for some terms`
	sum, fact, sign := 0.0, 1.0, 1.0
	for k := 0; k < terms; k++ {
		if k > 0 {
			fact *= float64(2*k) * float64(2*k+1)
		}
		sum += sign * math.Pow(x, float64(2*k+1)) / fact // want `fact holds \(2\*k \+ 1\)!, which overflows to \+Inf once 2\*k \+ 1 ≥ 171`
		sign = -sign
	}
	return sum
}

// Sinh is sinh x by its Taylor series from the second term on.
func Sinh(x float64, terms int) float64 { // want Sinh:`wrong for some terms`
	sum := x
	fact := 1.0
	for k := 1; k < terms; k++ { // want `running factorial fact computes \(2\*k \+ 1\)! inside the sum that divides by it: in float64 it overflows to \+Inf from k = 85`
		fact = fact * float64(2*k) * float64(2*k+1)
		sum += math.Pow(x, float64(2*k+1)) / fact
	}
	return sum
}

// SinhTail also returns the last factorial, which no helper call can
// stand for: the factorial is carried in log space, read back where it
// is returned.
func SinhTail(x float64, terms int) (float64, float64) { // want SinhTail:`wrong for some terms`
	sum := x
	fact := 1.0
	for k := 1; k < terms; k++ { // want `running factorial fact computes \(2\*k \+ 1\)! inside the sum that divides by it`
		fact = fact * float64(2*k) * float64(2*k+1)
		sum += math.Pow(x, float64(2*k+1)) / fact
	}
	return sum, fact
}
