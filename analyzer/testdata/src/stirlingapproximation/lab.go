package stirlingapprox

import "math"

// DropletCount estimates the arrangements of x droplets, a real-valued
// size from the lab's fit, as Γ(x+1) by Stirling's formula.
func DropletCount(x float64) float64 {
	return math.Sqrt(2*math.Pi*x) * math.Pow(x/math.E, x) // want `hand-written Stirling approximation √\(2πn\)\(n/e\)\^n of x!: it is 7.79% below x! at x = 1.*; x is not bounded here`
}

// DropletEntropy is ln Γ(x+1) for the same fit, in log form.
func DropletEntropy(x float64) float64 {
	return x*math.Log(x) - x + 0.5*math.Log(2*math.Pi*x) // want `of x! in log form: it is 7.79% below x! at x = 1`
}

// ChartScale is only drawn on a log axis.
//
//overfact:approx the chart's axis is logarithmic; 1/(12n) does not show
func ChartScale(n int) float64 {
	x := float64(n)
	return math.Sqrt(2*math.Pi*x) * math.Pow(x/math.E, x)
}
