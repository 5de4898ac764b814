package exacttest

import (
	"errors"
	"math"
)

// BesselI0 is the modified Bessel function I0 from its power series.
func BesselI0(x float64) float64 {
	half := x / 2
	sum, f := 0.0, 1.0
	for k := 0; k < 500; k++ {
		term := math.Pow(half, float64(2*k)) / (f * f) // want `series term math\.Pow\(half, float64\(2\*k\)\) / \(f \*`
		if k > 0 && term < 1e-17*sum {
			break
		}
		sum += term
		f *= float64(k + 1)
	}
	return sum
}

// LowerGammaP is the regularized lower incomplete gamma P(s, x) from its series.
func LowerGammaP(s, x float64) float64 {
	sum, term := 0.0, 1.0
	for k := 1; k < 1000; k++ {
		sum += term // want `sum sums the running term Γ\(s \+ 1\)·\(x\)\^\(t\)/Γ\(s \+ t \+ 1\) on trip t \(from 0\), a power over a rising factorial of s \+ 1 \(the incomplete gamma series\), in float64, and math\.Pow\(x, s\) \* math\.Exp\(-x\) / math\.Gamma\(s\+1\) \* sum reads the sum after the loop`
		term *= x / (s + float64(k))
		if term < 1e-16*sum {
			break
		}
	}
	return math.Pow(x, s) * math.Exp(-x) / math.Gamma(s+1) * sum // want `math\.Gamma overflows: math\.Gamma\(s \+ 1\) is \+Inf`
}

var errDomain = errors.New("exacttest: argument out of range")

// RegularizedP is P(s, x), by the series below s+1 and the continued
// fraction above, each with its prefactor in log space.
func RegularizedP(s, x float64) (float64, error) {
	if s <= 0 || x < 0 || s > 1e4 || x > 1e5 {
		return 0, errDomain
	}
	if x == 0 {
		return 0, nil
	}
	lg, _ := math.Lgamma(s)
	pre := s*math.Log(x) - x - lg
	if x < s+1 {
		ap, del := s, 1/s
		sum := del
		for i := 0; i < 100000; i++ {
			ap++
			del *= x / ap
			sum += del
			if math.Abs(del) < math.Abs(sum)*1e-15 {
				break
			}
		}
		return sum * math.Exp(pre), nil
	}
	const tiny = 1e-300
	b := x + 1 - s
	c := 1 / tiny
	d := 1 / b
	h := d
	for i := 1; i < 100000; i++ {
		an := -float64(i) * (float64(i) - s)
		b += 2
		d = an*d + b
		if math.Abs(d) < tiny {
			d = tiny
		}
		c = b + an/c
		if math.Abs(c) < tiny {
			c = tiny
		}
		d = 1 / d
		del := d * c
		h *= del
		if math.Abs(del-1) < 1e-15 {
			break
		}
	}
	return 1 - math.Exp(pre)*h, nil
}
