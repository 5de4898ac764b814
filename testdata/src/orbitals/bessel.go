package orbitals

import "math"

// BesselJ sums the power series of J_n(x) to sixty terms.
func BesselJ(n int, x float64) float64 { // want BesselJ:`wrong for some n`
	sum := 0.0
	for k := 0; k < 60; k++ {
		term := math.Pow(x/2, float64(2*k+n)) / (factorial(k) * factorial(k+n)) // want `term with \(x / 2\)\^\(2\*k \+ n\) over k!·\(k \+ n\)! in`
		if k%2 == 1 {
			term = -term
		}
		sum += term
	}
	return sum
}

// BesselJLog sums the series of J_n(x) with each term formed in log
// space, for 0 <= x <= 12 (NaN outside: larger arguments cancel too much
// for a power series).
func BesselJLog(n int, x float64) float64 {
	if n < 0 || x < 0 || x > 12 {
		return math.NaN()
	}
	if x == 0 {
		if n == 0 {
			return 1
		}
		return 0
	}
	lh := math.Log(x / 2)
	sum := 0.0
	for k := 0; k < 200; k++ {
		a, _ := math.Lgamma(float64(k + 1))
		b, _ := math.Lgamma(float64(k + n + 1))
		term := math.Exp(float64(2*k+n)*lh - a - b)
		if k%2 == 1 {
			term = -term
		}
		sum += term
		if k > 10 && math.Abs(term) < 1e-17*math.Abs(sum) {
			break
		}
	}
	return sum
}
