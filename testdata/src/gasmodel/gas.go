// Package gasmodel is a toy ideal-gas model: partition functions of N
// particles in a box, the volume of the momentum hypersphere, and the
// distributions used to fit measured speeds.
package gasmodel

import (
	"math"

	"mathkit"
)

// BallVolume returns the volume of the unit ball in d dimensions,
// π^(d/2)/Γ(d/2+1).
func BallVolume(d int) float64 { // want BallVolume:`value \(884279719003555/281474976710656\)\^\(1/2\*p0\)/Γ\(1/2\*p0 \+ 1\), wrong once 1/2\*p0 \+ 1 ≥ 171\.624377`
	return math.Pow(math.Pi, float64(d)/2) / math.Gamma(float64(d)/2+1) // want `math.Gamma overflows: math.Gamma\(float64\(d\)/2 \+ 1\) is \+Inf for d ≥ 342`
}

// MixingWeight returns the Beta function B(a, b) = Γ(a)Γ(b)/Γ(a+b).
func MixingWeight(a, b float64) float64 { // want MixingWeight:`value Γ\(p0\)·Γ\(p1\)/Γ\(p0 \+ p1\), wrong once p0 ≥ 171\.624377`
	return math.Gamma(a) * math.Gamma(b) / math.Gamma(a+b) // want `Beta function as Γ\(a\)Γ\(b\)/Γ\(a\+b\) in float64: math.Gamma\(a\) is \+Inf for a ≥ 171.62.*; the product of the 2 Γ values above the line can overflow first, before any one of them is \+Inf`
}

// ContinuationFactor is Γ(c)Γ(c−a−b)/(Γ(c−a)Γ(c−b)), the value at 1 of
// the model's hypergeometric partition series (Gauss's summation, DLMF
// 15.4.20). Its numerator passes the largest float64 before Γ(c) alone
// does: with a = 1.3 and b = 2.7, at c = 170.5 the two numerator values
// are about 5.6e305 and 7.0e296 (Γ(170.5) and Γ(166.5), from
// ln Γ via math.Lgamma), whose product is +Inf.
func ContinuationFactor(a, b, c float64) float64 { // want ContinuationFactor:`value Γ\(p2\)·Γ\(-p0 - p1 \+ p2\)/\(Γ\(-p0 \+ p2\)·Γ\(-p1 \+ p2\)\), wrong once p2 ≥ 171\.624377` ContinuationFactor:`wrong for c ≥ 171\.624377`
	d := c - a - b
	return math.Gamma(c) * math.Gamma(d) / (math.Gamma(c-a) * math.Gamma(c-b)) // want `ratio of math.Gamma values in float64: math.Gamma\(c\) is \+Inf for c ≥ 171.62.*; the product of the 2 Γ values above the line can overflow first`
}

// StudentNorm returns the normalising constant of Student's t density
// with nu degrees of freedom.
func StudentNorm(nu int) float64 { // want StudentNorm:`value Γ\(1/2\*p0 \+ 1/2\)/\(Γ\(1/2\*p0\)·\(884279719003555/281474976710656\)\^\(1/2\)·\(p0\)\^\(1/2\)\), wrong once 1/2\*p0 \+ 1/2 ≥ 171\.624377 or 1/2\*p0 ≥ 171\.624377` StudentNorm:`wrong for nu ≥ 342\.248754`
	v := float64(nu)
	return math.Gamma((v+1)/2) / (math.Sqrt(v*math.Pi) * math.Gamma(v/2)) // want `ratio of math.Gamma values in float64: math.Gamma\(\(v \+ 1\) / 2\) is \+Inf for nu ≥ 343 .* although the result itself is finite; nu is not bounded here`
}

// StudentNormTable is StudentNorm for the fitted range of 1 to 120
// degrees of freedom.
func StudentNormTable(nu int) float64 {
	if nu < 1 || nu > 120 {
		return math.NaN()
	}
	v := float64(nu)
	return math.Gamma((v+1)/2) / (math.Sqrt(v*math.Pi) * math.Gamma(v/2))
}

// Partition returns V^N/N! for N indistinguishable particles in a box of
// volume V (in units of the thermal volume).
func Partition(V float64, N int) float64 { // want Partition:`value \(p0\)\^\(p1\)/Γ\(p1 \+ 1\), wrong once p1 ≥ 171` Partition:`wrong for N ≥ 171`
	return math.Pow(V, float64(N)) / mathkit.FactorialFloat(N) // want `power-over-factorial term V\^N/N! in float64: the divisor N! overflows`
}

// SmallBox is Partition for the demo's box of 40 particles.
func SmallBox(V float64) float64 {
	return math.Pow(V, 40) / mathkit.FactorialFloat(40)
}

// Chi2Norm is 1/(2^(k/2) Γ(k/2)) for k up to 200 degrees of freedom.
func Chi2Norm(k int) float64 {
	if k > 200 {
		k = 200
	}
	return 1 / (math.Pow(2, float64(k)/2) * math.Gamma(float64(k)/2))
}

// HalfIntegerGamma is Γ(5.5), a constant.
func HalfIntegerGamma() float64 {
	return math.Gamma(5.5)
}

// Furnace is Γ(200), which is always +Inf: returned as it is, that is
// the honest float64 value of a number past the range.
func Furnace() float64 {
	return math.Gamma(200)
}

// FurnaceShare divides by Γ(200), which is always +Inf, so the share is
// always 0 although its true value is not.
func FurnaceShare(heat float64) float64 {
	return heat / math.Gamma(200) // want `math.Gamma overflows: math.Gamma\(200\) is \+Inf for arguments ≥ 171.62.*; the argument is always past it here`
}

// SpeedRatio is Γ(n+1/2)/Γ(n) for the speed moments, with n from the
// moment table of at most 60 entries.
func SpeedRatio(n int) float64 {
	if n < 1 || n > 60 {
		return 0
	}
	return math.Gamma(float64(n)+0.5) / math.Gamma(float64(n))
}

// Occupancy is n!/k! written with Gamma.
func Occupancy(n, k int) float64 { // want Occupancy:`value Γ\(p0 \+ 1\)/Γ\(p1 \+ 1\), wrong once p0 \+ 1 ≥ 171\.624377` Occupancy:`wrong for n ≥ 170\.624377 or k ≥ 170\.624377`
	return math.Gamma(float64(n+1)) / math.Gamma(float64(k+1)) // want `ratio of math.Gamma values in float64: math.Gamma\(float64\(n \+ 1\)\) is \+Inf for n ≥ 171`
}

// FixedRatio is a ratio of Gamma values at constants.
func FixedRatio() float64 {
	return math.Gamma(7.5) / math.Gamma(3.5)
}

// Shape is Γ(x) of a fitted shape parameter that nothing bounds,
// returned as it is: +Inf where Γ(x) exceeds float64 is the right value.
func Shape(x float64) float64 { // want Shape:`value Γ\(p0\), wrong once p0 ≥ 171\.624377`
	return math.Gamma(x)
}

// ShapeWeight divides by Γ(x) of that parameter: past x ≈ 171.62 the
// weight is 0 although its true value is not.
func ShapeWeight(w, x float64) float64 { // want ShapeWeight:`value \(p0\)/Γ\(p1\), wrong once p1 ≥ 171\.624377`
	return w / math.Gamma(x) // want `math.Gamma overflows: math.Gamma\(x\) is \+Inf for x ≥ 171.62.*; x is not bounded here`
}

// Levels is Γ(n+1) for the 170 energy levels of the model.
func Levels(n int) float64 { // want Levels:`factorial of parameter 0, safe for \[0, 170\]`
	if n < 0 || n > 170 {
		return math.NaN()
	}
	return math.Gamma(float64(n) + 1)
}

// Arrangements is C(n, k) over Γ-based factorials in float64.
func Arrangements(n, k int) float64 { // want Arrangements:`binomial of parameter 0, breaks from 171`
	return mathkit.GammaFactorial(n) / (mathkit.GammaFactorial(k) * mathkit.GammaFactorial(n-k)) // want `binomial coefficient as a ratio of factorials in float64: the numerator n! overflows to \+Inf for n ≥ 171, although C\(n, n/2\) itself fits up to n = \d+`
}

// Reports uses the int64 wrapper from another package.
func Reports(n int) float64 { // want Reports:`value Γ\(p0 \+ 1\), wrong once p0 ≥ 21` Reports:`wrong for n ≥ 21`
	return float64(mathkit.Factorial64(n)) // want `n! is computed in int64, which wraps for n ≥ 21`
}

// WeibullVariance is the variance of a Weibull fit with scale lambda and
// shape k: several Gamma calls on one line make one finding.
func WeibullVariance(lambda, k float64) float64 {
	return lambda * lambda * (math.Gamma(1+2/k) - math.Gamma(1+1/k)*math.Gamma(1+1/k)) // want `math.Gamma overflows: math.Gamma\(1 \+ 2/k\) is \+Inf for arguments ≥ 171.62.*; of the 3 math.Gamma calls on this line over 1/k, it overflows first`
}

// WeibullKurtosis is the excess kurtosis of a Weibull fit with shape k,
// from the raw moments Γ(1+i/k), i = 1…4 (common practice). Of its
// Gamma calls, Γ(1+4/k) reaches +Inf first as k falls: at k = 0.02 it
// is Γ(201) = 200!, past float64, while Γ(1+2/k) = Γ(101) = 100! ≈
// 9.33e157 is not (OEIS A000142). The finding names that call, not the
// first one written.
func WeibullKurtosis(k float64) float64 {
	return (-6*math.Pow(math.Gamma(1+1/k), 4) + 12*math.Pow(math.Gamma(1+1/k), 2)*math.Gamma(1+2/k) - 3*math.Pow(math.Gamma(1+2/k), 2) - 4*math.Gamma(1+1/k)*math.Gamma(1+3/k) + math.Gamma(1+4/k)) / math.Pow(math.Gamma(1+2/k)-math.Pow(math.Gamma(1+1/k), 2), 2) // want `math.Gamma overflows: math.Gamma\(1 \+ 4/k\) is \+Inf for arguments ≥ 171.62.*; of the 9 math.Gamma calls on this line over 1/k, it overflows first`
}

// WeibullSpread mixes terms: only calls over the same term are compared,
// so the first written, over 1/k, is named.
func WeibullSpread(k, m float64) float64 {
	return math.Gamma(1+1/k) * math.Gamma(1+m) // want `math.Gamma overflows: math.Gamma\(1 \+ 1/k\) is \+Inf for arguments ≥ 171.62\d*; the argument is not bounded here$`
}

// VolumeSeries sums the unit-ball volumes of dimensions 0 to dims-1, a
// check the model runs on its integration grid.
func VolumeSeries(dims int) float64 {
	s := 0.0
	for d := 0; d < dims; d++ {
		s += math.Pow(math.Pi, float64(d)/2) / math.Gamma(float64(d)/2+1) // want `math.Gamma overflows: math.Gamma\(float64\(d\)/2 \+ 1\) is \+Inf for d ≥ 342 .*; d is not bounded here`
	}
	return s
}

// ScaledWeight rescales a tabulated weight w by Γ(c)Γ(b−a)/(Γ(b)Γ(c−a)),
// the factor of a continuation of the model's partition series.
func ScaledWeight(a, b, c, z float64) float64 {
	w := math.Exp(-z)
	w *= math.Gamma(c) / math.Gamma(b) * math.Gamma(b-a) / math.Gamma(c-a) // want `ratio of math.Gamma values in float64: math.Gamma\(c\) is \+Inf for c ≥ 171.62`
	return w
}
