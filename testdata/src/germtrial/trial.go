package germtrial

import "math"

// Trial is one germination trial: a tray of seeds with a germination rate.
type Trial struct {
	Seeds int
	Rate  float64
}

// ProbExactly is the chance that exactly k seeds of the tray germinate.
func (t *Trial) ProbExactly(k int) float64 { // want ProbExactly:`value Γ\(recv\.Seeds \+ 1\)·\(recv\.Rate\)\^\(p0\)/\(Γ\(p0 \+ 1\)·Γ\(-p0 \+ recv\.Seeds \+ 1\)·\(-recv\.Rate \+ 1\)\^\(p0 - recv\.Seeds\)\), wrong once recv\.Seeds \+ 1 ≥ 171\.624377` ProbExactly:`wrong for k ≥ 170\.624377`
	c := math.Gamma(float64(t.Seeds+1)) / (math.Gamma(float64(k+1)) * math.Gamma(float64(t.Seeds-k+1))) // want `ratio of math\.Gamma values in float64: math\.Gamma\(float64\(t\.Seeds \+ 1\)`
	return c * math.Pow(t.Rate, float64(k)) * math.Pow(1-t.Rate, float64(t.Seeds-k))
}

// LogLikelihood is the log of ProbExactly, for fitting the rate.
func (t *Trial) LogLikelihood(k int) float64 {
	a, _ := math.Lgamma(float64(t.Seeds + 1))
	b, _ := math.Lgamma(float64(k + 1))
	c, _ := math.Lgamma(float64(t.Seeds - k + 1))
	return a - b - c + float64(k)*math.Log(t.Rate) + float64(t.Seeds-k)*math.Log1p(-t.Rate)
}

// betaPrior is the Beta function B(a, b) that normalises the rate prior.
func betaPrior(a, b float64) float64 {
	return math.Gamma(a) * math.Gamma(b) / math.Gamma(a+b) // want `Beta function as Γ\(a\)Γ\(b\)/Γ\(a\+b\) in float64: math\.Gamma\(a\) is \+Inf for`
}

func ratio(num, den float64) float64 {
	return num / den
}

// betaNorm is 1/B(a, b), the prior density's constant.
func betaNorm(a, b float64) float64 {
	return ratio(math.Gamma(a+b), math.Gamma(a)*math.Gamma(b)) // want `math\.Gamma overflows: math\.Gamma\(a\) is \+Inf for a ≥ 171\.624377 \(Γ\(x\) o`
}
