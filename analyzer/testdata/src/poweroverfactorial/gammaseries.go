package poweroverfactorial

import "math"

// The lower incomplete gamma function's series, x^a·e^(−x)·Σ x^k/(a(a+1)…(a+k)),
// summed from a running term and scaled after the loop.

// rainGamma is the lower incomplete gamma γ(a, x) of a rainfall
// model's gamma distribution, with a fixed number of trips and an exit
// once the term no longer changes the sum.
func rainGamma(a, x float64) float64 {
	ap, del := a, 1/a
	sum := del
	for n := 0; n < 400; n++ {
		ap++
		del *= x / ap
		sum += del // want `sum sums the running term Γ\(a\)·\(x\)\^\(t \+ 1\)/Γ\(a \+ t \+ 2\) on trip t \(from 0\), a power over a rising factorial of a \(the incomplete gamma series\), in float64, and sum \* math\.Exp\(-x\+a\*math\.Log\(x\)\) reads the sum after the loop through a factor e\^\(−x\): that factor loses its digits for x > 708\.396 and is 0 for x ≥ 745\.133, .*; x is not bounded here`
		if math.Abs(del) < math.Abs(sum)*1e-15 {
			break
		}
	}
	return sum * math.Exp(-x+a*math.Log(x))
}

// dwellShare is k·γ(k, hours) = hours^k·e^(−hours)·Σ hours^i/((k+1)…(k+i)),
// for a job of gamma-distributed length with shape k, from the first
// terms of the series.
func dwellShare(k, hours float64, terms int) float64 {
	term, sum := 1.0, 0.0
	for i := 1; i <= terms; i++ {
		sum += term // want `sum sums the running term Γ\(k \+ 1\)·\(hours\)\^\(t\)/Γ\(k \+ t \+ 1\) on trip t \(from 0\), a power over a rising factorial of k \+ 1 \(the incomplete gamma series\), in float64, and math\.Pow\(hours, k\) \* math\.Exp\(-hours\) \* sum reads the sum after the loop through a factor e\^\(−hours\): .* hours is not bounded here`
		term *= hours / (k + float64(i))
	}
	return math.Pow(hours, k) * math.Exp(-hours) * sum
}

// The functions below stay silent.

// rainGammaSplit takes the series only below x = a+1 and the
// continued fraction above: below, the sum is at most a small multiple
// of its first term, and the scale factor underflows only where γ(a, x)
// does.
func rainGammaSplit(a, x float64) float64 {
	if x >= a+1 {
		return rainFraction(a, x)
	}
	ap, del := a, 1/a
	sum := del
	for n := 0; n < 400; n++ {
		ap++
		del *= x / ap
		sum += del
		if math.Abs(del) < math.Abs(sum)*1e-15 {
			break
		}
	}
	return sum * math.Exp(-x+a*math.Log(x))
}

// rainFraction stands in for the continued fraction of the inputs
// above a+1.
func rainFraction(a, x float64) float64 { return a / x }

// rainSum returns the sum itself, unscaled: it overflows where the sum
// does.
func rainSum(a, x float64) float64 {
	del := 1 / a
	sum := del
	for n := 1; n < 400; n++ {
		del *= x / (a + float64(n))
		sum += del
	}
	return sum
}

// expTail is e^(−x)·Σ x^k/k! over a fixed 30 terms: the rising
// factorial starts at the constant 1, the exponential series' own rule.
func expTail(x float64) float64 {
	term, sum := 1.0, 1.0
	for k := 1; k < 30; k++ {
		term *= x / float64(k)
		sum += term
	}
	return math.Exp(-x) * sum
}

// halfShare scales by a factor with no e^(−x): the exponent's x is
// added, not taken away.
func halfShare(a, x float64) float64 {
	del := 1 / a
	sum := del
	for n := 1; n < 400; n++ {
		del *= x / (a + float64(n))
		sum += del
	}
	return math.Exp(x-2*a) * sum
}
