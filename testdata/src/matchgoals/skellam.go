package matchgoals

import "math"

// SkellamPMF returns the probability that the home side wins by d goals
// (d < 0: loses) when the sides score with means mu1 and mu2.
func SkellamPMF(d int, mu1, mu2 float64) float64 {
	ad := d
	if ad < 0 {
		ad = -ad
	}
	x := 2 * math.Sqrt(mu1*mu2)
	bessel := 0.0
	for m := 0; m < 200; m++ {
		bessel += math.Pow(x/2, float64(2*m+ad)) /
			(math.Gamma(float64(m+1)) * math.Gamma(float64(m+ad+1))) // want `math\.Gamma overflows: math\.Gamma\(float64\(m \+ 1\)\) is \+Inf for m ≥ 171 \(Γ\(x\) overflows float64 from x = 171\.624377\); the argument may reach 200 here; where \|x / 2\| ≥ 8\.0655 at ad = 0 the power \(x / 2\)\^\(2\*m \+ ad\) overflows to \+Inf first, before m reaches 171`
	}
	return math.Exp(-(mu1 + mu2)) * math.Pow(mu1/mu2, float64(d)/2) * bessel
}

// SkellamLogPMF is SkellamPMF with the Bessel series summed in log space
// relative to its largest term.
func SkellamLogPMF(d int, mu1, mu2 float64) float64 {
	ad := d
	if ad < 0 {
		ad = -ad
	}
	lx := math.Log(math.Sqrt(mu1 * mu2))
	terms := make([]float64, int(2*math.Sqrt(mu1*mu2))+ad+100)
	top := math.Inf(-1)
	for m := range terms {
		a, _ := math.Lgamma(float64(m + 1))
		b, _ := math.Lgamma(float64(m + ad + 1))
		terms[m] = float64(2*m+ad)*lx - a - b
		top = math.Max(top, terms[m])
	}
	s := 0.0
	for _, t := range terms {
		s += math.Exp(t - top)
	}
	return math.Exp(-(mu1 + mu2) + float64(d)/2*math.Log(mu1/mu2) + top + math.Log(s))
}
