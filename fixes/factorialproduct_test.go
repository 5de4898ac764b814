package fixes_test

import (
	"math"
	"math/big"
)

// The sonar array's Bessel series, a power over a product of
// factorials each computed on its own, and the ferry's boarding orders,
// a multinomial whose divisor is a running product of factorials: float
// factorial functions carried in log space (lgamma.FactorialProduct).
func init() {
	fixPackages = append(fixPackages, "fixbessel", "fixparts")
	diffCases = append(diffCases,
		// Past k = 170 each factorial is +Inf, past k ≈ 220 (x = 10) the
		// power too, and the original's sum is NaN; the exact finite
		// sum is J_n(x) to rounding. x stays at most 10, where the
		// series' cancellation costs less than 1e-12 relative.
		// Terms with one float factorial function that no other row
		// rewrites, taken in log space as written: a^(k+1)/k! and
		// λ^k·e^(−2λ)/k!.
		diffCase{pkg: "fixterm", fn: "NextLoad", loops: []string{"a := 1; a <= 200; a *= 4", "k := 0; k <= 260; k += 5"}, args: "float64(a) / 2, k", typ: "float64", ref: refShiftedPowFact},
		diffCase{pkg: "fixseries", fn: "Decay", loops: []string{"a := 1; a <= 200; a *= 4", "k := 0; k <= 260; k += 5"}, args: "float64(a) / 2, k", typ: "float64", ref: refShiftedPowFact},
		diffCase{pkg: "fixterm", fn: "PairArrivals", loops: []string{"k := 0; k <= 260; k += 4", "l := 1; l <= 200; l *= 3"}, args: "k, float64(l) / 2", typ: "float64", ref: refPairPoisson},
		// A multinomial over a loop's parts, its divisor a running
		// product of float factorials: past 170 parts in all, fact(total)
		// is +Inf while the coefficient may fit.
		diffCase{pkg: "fixparts", fn: "Boardings", loops: []string{"a := 0; a <= 300; a += 37", "b := 0; b <= 200; b += 41", "c := 0; c <= 60; c += 13"}, args: "float64(a), float64(b), float64(c)", typ: "float64", ref: refMultinomial},
		// The same with the total and the divisor each in a loop of its own.
		diffCase{pkg: "fixparts", fn: "BoardingsTwoPass", loops: []string{"a := 0; a <= 300; a += 37", "b := 0; b <= 200; b += 41", "c := 0; c <= 60; c += 13"}, args: "float64(a), float64(b), float64(c)", typ: "float64", ref: refMultinomial},
		diffCase{pkg: "fixbessel", fn: "Beam", loops: []string{"n := 0; n <= 3; n++", "xi := 1; xi <= 20; xi += 3", "terms := 20; terms <= 300; terms += 70"}, args: "n, float64(xi)/2, terms", typ: "float64", ref: refBesselSeries},
	)
}

// refBesselSeries is Σ_{k<terms} (−1)^k (x/2)^(2k+n) / (k!·(k+n)!) in
// math/big (the series of J_n, DLMF 10.2.2, read as a finite sum).
func refBesselSeries(a []float64) *big.Float {
	n, x, terms := int(a[0]), a[1], int(a[2])
	sum := new(big.Float).SetPrec(refPrec)
	half := new(big.Float).SetPrec(refPrec).SetFloat64(x / 2)
	for k := 0; k < terms; k++ {
		t := new(big.Float).SetPrec(refPrec).SetInt64(1)
		for i := 0; i < 2*k+n; i++ {
			t.Mul(t, half)
		}
		t.Quo(t, new(big.Float).SetPrec(refPrec).SetInt(new(big.Int).MulRange(1, int64(k))))
		t.Quo(t, new(big.Float).SetPrec(refPrec).SetInt(new(big.Int).MulRange(1, int64(k+n))))
		if k%2 == 1 {
			t.Neg(t)
		}
		sum.Add(sum, t)
	}
	return sum
}

// refShiftedPowFact is a^(k+1)/k! for (a, k).
func refShiftedPowFact(x []float64) *big.Float {
	return mul(refPowFact(x), fl(x[0]))
}

// refPairPoisson is λ^k·e^(−2λ)/k! for (k, λ); e^(−2λ) comes from
// math.Exp, whose error (under 1 ulp) is far inside the tests'
// tolerance, and underflows to 0 where the exact term is below
// float64's range anyway.
func refPairPoisson(x []float64) *big.Float {
	k, lambda := int64(x[0]), x[1]
	return mul(quo(powBig(lambda, k), bf(factorialBig(k))), fl(math.Exp(-2*lambda)))
}
