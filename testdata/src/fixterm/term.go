// Package fixterm is a bottling line's sampling plan and a support desk's
// arrival model, with probability terms that overflow; its .golden file
// shows them in log space.
package fixterm

import "math"

func factF(n int) float64 { // want factF:"factorial of parameter 0"
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

func choose(n, k int) float64 { // want choose:"binomial of parameter 0"
	return factF(n) / (factF(k) * factF(n-k)) // want "binomial coefficient"
}

// Arrivals is the chance of exactly k calls in an hour averaging lambda.
func Arrivals(k int, lambda float64) float64 { // want Arrivals:`value \(p1\)\^\(p0\)·exp\(-p1\)/Γ\(p0 \+ 1\), wrong once p0 ≥ 171` Arrivals:`wrong for k ≥ 171`
	return math.Pow(lambda, float64(k)) * math.Exp(-lambda) / factF(k) // want "Poisson"
}

// Load is the Erlang-style term a^k/k! of an offered load a.
func Load(a float64, k int) float64 { // want Load:`value \(p0\)\^\(p1\)/Γ\(p1 \+ 1\), wrong once p1 ≥ 171` Load:`wrong for k ≥ 171`
	return math.Pow(a, float64(k)) / factF(k) // want "power-over-factorial"
}

// Lot is the chance of k faulty bottles when n are drawn from a lot of
// total holding bad faulty ones.
func Lot(k, total, bad, n int) float64 { // want Lot:`wrong for total ≥ 171` Lot:`value Γ\(p2 \+ 1\)·Γ\(p1 - p2 \+ 1\)·Γ\(p3 \+ 1\)·Γ\(p1 - p3 \+ 1\)/\(Γ\(p0 \+ 1\)·Γ\(-p0 \+ p2 \+ 1\)·Γ\(-p0 \+ p3 \+ 1\)·Γ\(p0 \+ p1 - p2 - p3 \+ 1\)·Γ\(p1 \+ 1\)\), wrong once p2 ≥ 171 or p1 - p2 ≥ 171 or p1 ≥ 171`
	return choose(bad, k) * choose(total-bad, n-k) / choose(total, n) // want "hypergeometric"
}

// Spread is a gamma ratio of a fill-level model.
func Spread(a, b float64) float64 { // want Spread:`value Γ\(p0\)/Γ\(p1\), wrong once p0 ≥ 171\.624377` Spread:`wrong for a ≥ 171\.624377 or b ≥ 171\.624377`
	return math.Gamma(a) / math.Gamma(b) // want "ratio of math.Gamma"
}

// Mix is the beta function of the same model.
func Mix(a, b float64) float64 { // want Mix:`value Γ\(p0\)·Γ\(p1\)/Γ\(p0 \+ p1\), wrong once p0 ≥ 171\.624377`
	return math.Gamma(a) * math.Gamma(b) / math.Gamma(a+b) // want "Beta function"
}

// Blocking is the Erlang B chance that a call finds all c lines busy at
// offered load a: the last term over the sum of all terms. The term is
// grouped apart from the sum, so it is rewritten on its own.
func Blocking(a float64, c int) float64 { // want Blocking:`wrong for some c`
	sum := 0.0
	for k := 0; k <= c; k++ {
		sum += math.Pow(a, float64(k)) / factF(k) // want "power-over-factorial"
	}
	return math.Pow(a, float64(c)) / factF(c) / sum // want "power-over-factorial"
}

// NextLoad is a^(k+1)/k!, which is no a^k/k!: it is reported with its
// real exponent and taken in log space as it is written (a product of
// Products), not as lgamma.PowOverFactorial.
func NextLoad(a float64, k int) float64 { // want NextLoad:`value \(p0\)\^\(p1 \+ 1\)/Γ\(p1 \+ 1\), wrong once p1 ≥ 171` NextLoad:`wrong for k ≥ 171`
	return math.Pow(a, float64(k+1)) / factF(k) // want `term with a\^\(k \+ 1\) over k! in float64`
}

// PairArrivals has e^(−2λ) where a Poisson term has e^(−λ): no
// Poisson term, so the product is taken in log space as it is written.
func PairArrivals(k int, lambda float64) float64 { // want PairArrivals:`value \(p1\)\^\(p0\)·exp\(-2\*p1\)/Γ\(p0 \+ 1\), wrong once p0 ≥ 171` PairArrivals:`wrong for k ≥ 171`
	return math.Pow(lambda, float64(k)) * math.Exp(-2*lambda) / factF(k) // want `term with lambda\^k over k! in float64`
}

// Scaled is a gamma ratio with the scale v between its factors: the
// syntax does not group the ratio apart from v, so the numerator's call
// takes the ratio, the divisor's goes, and v stays where it is.
func Scaled(a, b, v float64) float64 { // want Scaled:`value Γ\(p0\)·\(p2\)/Γ\(p1\), wrong once p0 ≥ 171\.624377` Scaled:`wrong for a ≥ 171\.624377 or b ≥ 171\.624377`
	return math.Gamma(a) * v / math.Gamma(b) // want "ratio of math.Gamma"
}

// FillMoment is the k-th moment factor of a fill-level model: the gamma
// ratio is grouped apart from the power, and the product of the two is
// taken as one Product chain, which is 0 for s = 0 where Γ overflows.
func FillMoment(k int, s float64) float64 { // want FillMoment:`value 2·Γ\(1/2\*p0 \+ 3/2\)·\(p1\)\^\(p0\)/√π, wrong once 1/2\*p0 \+ 3/2 ≥ 171\.624377` FillMoment:`wrong for k ≥ 340\.248754`
	return math.Gamma(float64(k+3)/2) / math.Gamma(1.5) * math.Pow(s, float64(k)) // want "ratio of math.Gamma"
}

// FillDensity is the Beta density of a fill share x: its normalising
// constant 1/B(a,b) is grouped apart from the powers.
func FillDensity(a, b, x float64) float64 { // want FillDensity:`value Γ\(p0 \+ p1\)·\(p2\)\^\(p0 - 1\)·\(-p2 \+ 1\)\^\(p1 - 1\)/\(Γ\(p0\)·Γ\(p1\)\), wrong once p0 \+ p1 ≥ 171\.624377`
	return math.Gamma(a+b) / (math.Gamma(a) * math.Gamma(b)) * math.Pow(x, a-1) * math.Pow(1-x, b-1) // want "ratio of math.Gamma"
}

// Drift is the k-step growth of a fill model, Γ(k+b)/Γ(b)·g^k: the
// product is taken as one Product chain, and stays finite when Γ(k+b)
// is not.
func Drift(k int, b, g float64) float64 { // want Drift:`value Γ\(p0 \+ p1\)·\(p2\)\^\(p0\)/Γ\(p1\), wrong once p0 \+ p1 ≥ 171\.624377` Drift:`wrong for b ≥ 171\.624377`
	return math.Gamma(float64(k)+b) / math.Gamma(b) * math.Pow(g, float64(k)) // want "ratio of math.Gamma"
}

// Walkins is Arrivals with the power of lambda multiplied up by a loop:
// the loop's product is lambda^k where the term reads it.
func Walkins(k int, lambda float64) float64 { // want Walkins:`value \(p1\)\^\(p0\)·exp\(-p1\)/Γ\(p0 \+ 1\), wrong once p0 ≥ 171` Walkins:`wrong for k ≥ 171`
	pw := 1.0
	for i := 1; i <= k; i++ {
		pw *= lambda
	}
	return pw * math.Exp(-lambda) / factF(k) // want "Poisson"
}

// Tally is Load over a power its loop forms, counted down from k: the
// term itself does not read a, so no helper call can stand for it.
func Tally(a float64, k int) float64 { // want Tally:`value \(p0\)\^\(p1\)/Γ\(p1 \+ 1\), wrong once p1 ≥ 171` Tally:`wrong for k ≥ 171`
	pw := 1.0
	for j := k; j > 0; j-- {
		pw *= a
	}
	return pw / factF(k) // want "power-over-factorial"
}

// clicks16 is n! on the support desk's hand-held tally counter, whose
// registers hold 16 bits.
func clicks16(n uint16) uint16 { // want clicks16:"factorial of parameter 0, breaks from 9"
	r := uint16(1)
	for n > 1 { // want "factorial of n in uint16 wraps"
		r *= n
		n--
	}
	return r
}

// Clicks is the chance of exactly k clicks in a minute averaging
// lambda, the count handed to the counter's factorial as a register
// value: for k < 0 uint16(k) wraps, and the term keeps its power over
// the empty product instead.
func Clicks(k int, lambda float64) float64 { // want Clicks:`value \(p1\)\^\(p0\)·exp\(-p1\)/Γ\(p0 \+ 1\), wrong once p0 ≥ 9` Clicks:`wrong for k ≥ 9`
	return math.Pow(lambda, float64(k)) * math.Exp(-lambda) / float64(clicks16(uint16(k))) // want "Poisson"
}

// Spread16 is Load over the counter's factorial.
func Spread16(a float64, k int) float64 { // want Spread16:`value \(p0\)\^\(p1\)/Γ\(p1 \+ 1\), wrong once p1 ≥ 9` Spread16:`wrong for k ≥ 9`
	return math.Pow(a, float64(k)) / float64(clicks16(uint16(k))) // want "power-over-factorial"
}
