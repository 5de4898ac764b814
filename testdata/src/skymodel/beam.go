// Package skymodel is the signal model of a small radio-telescope
// array: antenna beam patterns from Bessel series, the receiver's
// noise statistics from incomplete-gamma series, each summed term by
// term with the parts of the term kept in running products of their
// own.
package skymodel

import "math"

// Aperture is one dish of the array.
type Aperture struct {
	Order int     // the Bessel order of the illumination taper
	Scale float64 // wavenumber times radius
}

// BesselI is the modified Bessel function I_n(x) by its power series,
// with (x/2)^(n+2k), k! and (n+k)! each kept in a running product.
func BesselI(n int, x float64) float64 { // want BesselI:`wrong for some n`
	if n < 0 {
		return 0
	}
	half := x / 2
	pw := math.Pow(half, float64(n))
	f1 := 1.0
	for i := 2; i <= n; i++ { // want `factorial of n in float64 overflows to \+Inf for n ≥ 171`
		f1 *= float64(i)
	}
	f2 := 1.0
	sum := pw / f1
	for k := 1; k < 200; k++ {
		pw *= half * half
		f1 *= float64(n + k)
		f2 *= float64(k)
		sum += pw / (f1 * f2) // want `series term pw / \(f1 \* f2\) computes .* on the trip of k, from parts formed apart that each grow with the trips: pw holds .*; f1 holds \(n \+ k\)!, which overflows to \+Inf once n \+ k ≥ 171 .*; f2 holds k!, which overflows to \+Inf once k ≥ 171`
	}
	return sum
}

// Taper is the beam taper of a dish: J_n by its alternating series,
// stopped when a term no longer changes the sum or after 100 terms.
func (a Aperture) Taper() float64 { // want Taper:`wrong for some a`
	x1 := math.Pow(a.Scale/2, float64(a.Order))
	x2 := a.Scale * a.Scale / 4
	n1, n2, n3, n4 := 1.0, 1.0, 0.0, float64(a.Order)
	for i := 2; i <= a.Order; i++ { // want `factorial of a.Order in float64 overflows`
		n1 *= float64(i)
	}
	result, prev := x1/n1, 0.0
	left, sign := 100, -1.0
	for result != prev && left != 0 {
		x1 *= x2
		n3++
		n2 *= n3
		n4++
		n1 *= n4
		prev = result
		result += sign * x1 / n1 / n2 // want `series term sign \* x1 / n1 / n2 computes .* on trip t \(from 0\), from parts formed apart .*x1 holds .*, which overflows to \+Inf once it passes the largest float64.*; the loop may stop early`
		sign = -sign
		left--
	}
	return result
}

// LowerGamma is the lower incomplete gamma function γ(a, x) by its
// series x^a e^(−x) Σ x^n/(a(a+1)…(a+n)), the power and the rising
// factorial in running products.
func LowerGamma(a, x float64) float64 {
	sum, num, den := 0.0, 1.0, a
	for n := 0; n < 100; n++ {
		sum += num / den // want `series term num / den computes Γ\(a\)·\(x\)\^\(n\)/Γ\(a \+ n \+ 1\) on the trip of n, from parts formed apart that each grow with the trips: num holds \(x\)\^\(n\), which overflows to \+Inf on the loop's last trip, at x\^99, for \|x\| ≥ 1299.22`
		num *= x
		den *= a + float64(n) + 1
	}
	return math.Exp(-x+a*math.Log(x)) * sum
}

// NoiseTail is the same series with the rising factorial rebuilt by an
// inner loop for every term.
func NoiseTail(a, x float64) float64 {
	total := 0.0
	for n := 0; n <= 32; n++ {
		divisor := a
		for i := 1; i <= n; i++ {
			divisor *= a + float64(i)
		}
		total += math.Pow(x, float64(n)) / divisor // want `series term math.Pow\(x, float64\(n\)\) / divisor computes Γ\(a\)·\(x\)\^\(n\)/Γ\(a \+ n \+ 1\) on the trip of n.*at x\^32, for \|x\| ≥ 4.29497e\+09`
	}
	return math.Exp(a*math.Log(x)-x) * total
}

// Coherence is the array's coherence factor e^x by its series, summed
// until a term no longer changes the sum: the power and the factorial
// run apart, with no bound on the trips.
func Coherence(x float64) float64 {
	sum, pw, fact, term := 1.0, 1.0, 1.0, 1.0
	k := 0
	for math.Abs(term) > 1e-16*math.Abs(sum) {
		k++
		pw *= x
		fact *= float64(k)
		term = pw / fact // want `series term pw / fact computes \(x\)\^\(t \+ 1\)/Γ\(t \+ 2\) on trip t \(from 0\), from parts formed apart that each grow with the trips: pw holds .*; fact holds \(t \+ 1\)!, which overflows to \+Inf once t \+ 1 ≥ 171 .*the loop may stop early`
		sum += term
	}
	return sum
}

// LowerGammaRatio keeps the term itself, x/(a+n) at a time: no part
// grows on its own, but e^(−x)·x^a is 0 from x ≈ 745 while a hundred
// terms of the sum are far from small (at a = 7, x = 1030 the value,
// as internal/exacteval computes it in math/big, is about 7.6e-296).
func LowerGammaRatio(a, x float64) float64 {
	del := 1 / a
	sum := del
	for n := 1; n < 100; n++ {
		del *= x / (a + float64(n))
		sum += del // want `sum sums the running term Γ\(a\)·\(x\)\^\(t \+ 1\)/Γ\(a \+ t \+ 2\) on trip t \(from 0\), a power over a rising factorial of a \(the incomplete gamma series\), in float64, and math\.Exp\(-x\+a\*math\.Log\(x\)\) \* sum reads the sum after the loop through a factor e\^\(−x\): that factor loses its digits for x > 708\.396 and is 0 for x ≥ 745\.133`
	}
	return math.Exp(-x+a*math.Log(x)) * sum
}

// The functions below stay silent.

// CoherenceRatio builds each term from the one before, until it no
// longer changes the sum.
func CoherenceRatio(x float64) float64 {
	sum, term := 1.0, 1.0
	k := 0
	for math.Abs(term) > 1e-16*math.Abs(sum) {
		k++
		term *= x / float64(k)
		sum += term
	}
	return sum
}


// PhaseRatio forms each term from the one before, x²/((2k)(2k+1)) at
// a time: no part grows on its own.
func PhaseRatio(x float64, terms int) float64 {
	term, sum := x, x
	for k := 1; k < terms; k++ {
		term *= -x * x / (float64(2*k) * float64(2*k+1))
		sum += term
	}
	return sum
}

// Binary sums 2^k/k! over 20 terms: neither part comes near the range.
func Binary() float64 {
	sum, pw, fact := 0.0, 1.0, 1.0
	for k := 1; k <= 20; k++ {
		pw *= 2
		fact *= float64(k)
		sum += pw / fact
	}
	return sum
}

// BesselLog sums the Bessel terms in log space.
func BesselLog(n int, x float64) float64 {
	sum := 0.0
	for k := 0; k < 200; k++ {
		lk, _ := math.Lgamma(float64(k + 1))
		lnk, _ := math.Lgamma(float64(n + k + 1))
		sum += math.Exp(float64(n+2*k)*math.Log(x/2) - lk - lnk)
	}
	return sum
}
