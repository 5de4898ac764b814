// Package fixgammaseries holds a hydrology desk's lower incomplete gamma
// function, its series summed from a running term and scaled after the
// loop.
package fixgammaseries

import "math"

// StormGamma is γ(a, x) = x^a·e^(−x)·Σ x^n/(a(a+1)…(a+n)), the term
// taken x/(a+n) at a time, until it no longer changes the sum.
func StormGamma(a, x float64) float64 {
	ap, del := a, 1/a
	sum := del
	for n := 0; n < 2000; n++ {
		ap++
		del *= x / ap
		sum += del // want `sum sums the running term Γ\(a\)·\(x\)\^\(t \+ 1\)/Γ\(a \+ t \+ 2\) on trip t \(from 0\), a power over a rising factorial of a \(the incomplete gamma series\)`
		if math.Abs(del) < math.Abs(sum)*1e-15 {
			break
		}
	}
	return sum * math.Exp(-x+a*math.Log(x))
}
