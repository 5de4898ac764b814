package signcurve

import "math"

// Ramp fades the paint of a long banner from one end to the other by a
// Bernstein polynomial whose weights are kept in a slice of the ramp.
type Ramp struct {
	weights []float64
	shade   []float64
}

// NewRamp sets the weights C(n−1, i) one ratio at a time; every ratio
// is a binomial, but the running weight passes C(n−1, ⌊(n−1)/2⌋).
func NewRamp(shade []float64) *Ramp {
	n := len(shade)
	r := &Ramp{weights: make([]float64, n), shade: shade}
	w := 1.0
	r.weights[0] = w
	for i := 1; i < n; i++ { // want `running product w computes C\(len\(shade\) - 1, i\) one ratio at a time in float64`
		w *= float64(n-i) / float64(i)
		r.weights[i] = w
	}
	return r
}

// Level is the paint level at t along the banner, 0 ≤ t ≤ 1.
func (r *Ramp) Level(t float64) float64 { // want Level:`wrong for some r`
	n := len(r.weights) - 1
	s := 0.0
	for i := 0; i <= n; i++ {
		s += r.weights[i] * math.Pow(t, float64(i)) * math.Pow(1-t, float64(n-i)) * r.shade[i] // want `r.weights\[i\] holds the binomial weight C\(len\(shade\) - 1, i\) that w forms one ratio at a time in NewRamp, \+Inf for the central points once len\(shade\) ≥ 1031; multiplied here by math.Pow\(t, float64\(i\)\), a power of t`
	}
	return s
}

// Scaled multiplies every weight by a constant gain: no power.
func (r *Ramp) Scaled(gain float64) float64 {
	s := 0.0
	for i := range r.weights {
		s += r.weights[i] * gain
	}
	return s
}
