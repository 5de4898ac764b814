package fixes_test

import (
	"math"
	"math/big"

	"github.com/overfact/overfact/internal/exacteval"
)

// The pharmacy's Poisson probabilities, built one factor at a time from
// e^(−λ): the update becomes the term itself.
func init() {
	fixPackages = append(fixPackages, "fixpoisson")
	diffCases = append(diffCases,
		// Past λ ≈ 745 the original's start is 0 and so is every term;
		// the sum itself is near 1 around k = λ.
		diffCase{pkg: "fixpoisson", fn: "AtMostArrivals", loops: []string{"l := 50; l <= 1300; l += 250", "n := 0; n <= 1500; n += 150"}, args: "float64(l), n", typ: "float64", ref: refPoissonSum},
		diffCase{pkg: "fixpoisson", fn: "ExactArrivals", loops: []string{"l := 100; l <= 1300; l += 300", "n := 0; n <= 1500; n += 125"}, args: "float64(l), float64(n)", typ: "float64", ref: refPoissonSwapped},
		diffCase{pkg: "fixpoisson", fn: "Refills", loops: []string{"l := 100; l <= 1300; l += 300", "n := 0; n <= 1500; n += 125"}, args: "float64(l), int32(n)", typ: "float64", ref: refPoissonSwapped},
		// Small and negative rates: the original is right, and so must
		// the fix be (the negative rate's terms alternate in sign).
		diffCase{pkg: "fixpoisson", fn: "AtMostArrivals", loops: []string{"l := -12; l <= 30; l += 6", "n := 0; n <= 200; n += 19"}, args: "float64(l) / 4, n", typ: "float64", ref: refPoissonSum, noBreak: true},
		diffCase{pkg: "fixpoisson", fn: "Refills", loops: []string{"l := -12; l <= 30; l += 6", "n := 0; n <= 200; n += 19"}, args: "float64(l) / 4, int32(n)", typ: "float64", ref: refPoissonSwapped, noBreak: true},
	)
}

// refPoissonSwapped is λ^n·e^(−λ)/n! for the arguments (λ, n), with
// e^(−λ) from math/big (exacteval.Exp, checked against mpmath in its
// package): refPoisson's float64 e^(−λ) is 0 past λ ≈ 745.
func refPoissonSwapped(x []float64) *big.Float { return refPoissonTerms(x[0], int64(x[1]), false) }

// refPoissonSum is Σ_{k≤n} λ^k·e^(−λ)/k! for the arguments (λ, n).
func refPoissonSum(x []float64) *big.Float { return refPoissonTerms(x[0], int64(x[1]), true) }

func refPoissonTerms(lambda float64, n int64, sum bool) *big.Float {
	e := exacteval.Exp(new(big.Float).SetPrec(refPrec).SetFloat64(-lambda))
	total, term := fl(0), fl(1)
	for k := int64(0); k <= n; k++ {
		if k > 0 {
			term = quo(mul(term, fl(lambda)), fl(float64(k)))
		}
		if sum || k == n {
			total = new(big.Float).SetPrec(refPrec).Add(total, mul(term, e))
		}
	}
	return total
}

// The boiler plant's series, summed until a term is below rounding:
// the exit comes after the term, so the term takes the helper.
func init() {
	fixPackages = append(fixPackages, "fixconverge")
	diffCases = append(diffCases,
		// Past a = 170 the original's factorial is +Inf while the terms
		// still grow: the sum is NaN or +Inf, e^a (less its tail) fits.
		diffCase{pkg: "fixconverge", fn: "Steady", loops: []string{"a := 10; a <= 700; a += 90", "c := 0; c <= 1500; c += 250"}, args: "float64(a), float64(c)", typ: "float64", ref: refConverged},
		diffCase{pkg: "fixconverge", fn: "Warmup", loops: []string{"a := 10; a <= 700; a += 90", "c := 0; c <= 1500; c += 250"}, args: "float64(a), c", typ: "float64", ref: refConverged},
	)
}

// refConverged is Σ_{k=0}^{⌊c⌋} a^k/k! in math/big for a ≥ 0: the
// loops stop once a term is below 1e-16 of the sum, which changes the
// float64 result by less than 2e-16 relative (the tail after a term
// below 1e-16·sum, with k past a, is at most that term times a
// geometric factor), far inside the tests' 1e-12.
func refConverged(x []float64) *big.Float {
	a, c := x[0], int64(x[1])
	sum, term := fl(1), fl(1)
	for k := int64(1); k <= c; k++ {
		term = quo(mul(term, fl(a)), fl(float64(k)))
		sum = new(big.Float).SetPrec(refPrec).Add(sum, term)
	}
	return sum
}

// The survey tool's normalising constants: a Gamma ratio among other
// factors takes GammaRatio and keeps the others.
func init() {
	fixPackages = append(fixPackages, "fixgammaamong")
	diffCases = append(diffCases,
		// Past ν = 343 both Gamma values are +Inf and the constant NaN;
		// it is near 1/√(2π) there.
		diffCase{pkg: "fixgammaamong", fn: "StudentConst", loops: []string{"nu := 1; nu <= 3000; nu += 73"}, args: "nu", typ: "float64", ref: refStudentConst},
		diffCase{pkg: "fixgammaamong", fn: "ChiMean", loops: []string{"k := 1; k <= 3000; k += 83"}, args: "float64(k)", typ: "float64", ref: refChiMean},
		// Past k = 343 the normaliser is +Inf, and past x^(k/2−1) ≈
		// 1e308 the numerator too: the density is 0 or NaN where it is
		// near its peak, 1/√(4πk) at x ≈ k.
		diffCase{pkg: "fixgammaamong", fn: "ChiSquareDensity", loops: []string{"k := 2; k <= 1400; k += 46", "x := 1; x <= 1400; x += 97"}, args: "float64(k), float64(x)", typ: "float64", ref: refChiSquareDensity},
	)
}

// refChiSquareDensity is x^(k/2−1)·e^(−x/2)/(2^(k/2)·Γ(k/2)) (common
// practice), for (k, x), with the exponential, the powers and the Gamma
// value by exacteval (checked against mpmath in its package).
func refChiSquareDensity(x []float64) *big.Float {
	k, at := x[0], x[1]
	num, err := exacteval.Pow(fl(at), fl(k/2-1))
	if err != nil {
		panic(err)
	}
	num = mul(num, exacteval.Exp(fl(-at/2)))
	two, err := exacteval.Pow(fl(2), fl(k/2))
	if err != nil {
		panic(err)
	}
	g, err := exacteval.Gamma(fl(k / 2))
	if err != nil {
		panic(err)
	}
	return quo(num, mul(two, g))
}

// refStudentConst is Γ((ν+1)/2)/(√(νπ)·Γ(ν/2)) in math/big with the
// float64 π the code multiplies by; the Gamma values by exacteval.Gamma
// (checked against mpmath in its package).
func refStudentConst(x []float64) *big.Float {
	v := x[0]
	s := new(big.Float).SetPrec(refPrec).Mul(fl(v), fl(math.Pi))
	return quo(refGammaQuo((v+1)/2, v/2), new(big.Float).SetPrec(refPrec).Sqrt(s))
}

// refChiMean is √2·Γ((k+1)/2)/Γ(k/2) in math/big, with the float64
// √2 the code multiplies by.
func refChiMean(x []float64) *big.Float {
	k := x[0]
	return mul(fl(math.Sqrt2), refGammaQuo((k+1)/2, k/2))
}

// refBetaGamma is Γ(a)Γ(b)/Γ(a+b) (DLMF 5.12.1) for any a and b off
// the poles, negative ones included, with the Gamma values from
// exacteval.Gamma (checked against mpmath in its package).
func refBetaGamma(x []float64) *big.Float {
	g := func(v float64) *big.Float {
		r, err := exacteval.Gamma(fl(v))
		if err != nil {
			panic(err)
		}
		return r
	}
	return quo(mul(g(x[0]), g(x[1])), g(x[0]+x[1]))
}

func refGammaQuo(a, b float64) *big.Float {
	ga, err := exacteval.Gamma(fl(a))
	if err != nil {
		panic(err)
	}
	gb, err := exacteval.Gamma(fl(b))
	if err != nil {
		panic(err)
	}
	return quo(ga, gb)
}

// The simulator's powers over Gamma values: math.Pow(x, p)/math.Gamma(a)
// takes PowOverGamma.
func init() {
	fixPackages = append(fixPackages, "fixpowgamma")
	diffCases = append(diffCases,
		// Past d = 341 the original is NaN; the volume is tiny but
		// normal up to d ≈ 1300.
		diffCase{pkg: "fixpowgamma", fn: "UnitBall", loops: []string{"d := 1; d <= 1290; d += 43"}, args: "float64(d) / 2", typ: "float64", ref: refUnitBall},
		// Past k = 171.6 Γ(k) is +Inf: the weight is 0 or NaN where it
		// is not small for x near k.
		diffCase{pkg: "fixpowgamma", fn: "Weight", loops: []string{"x := 1; x <= 400; x += 66", "k := 1; k <= 400; k += 26"}, args: "float64(x), float64(k) / 2", typ: "float64", ref: refWeight},
	)
}

// refUnitBall is π^(d/2)/Γ(d/2+1) in math/big, with the float64 π and
// exponent the code passes to math.Pow: exp((d/2)·ln π − ln Γ(d/2+1))
// with exacteval's logarithm and log-gamma (checked against mpmath in
// their package).
func refUnitBall(x []float64) *big.Float { return refPowOverGamma(math.Pi, x[0]/2, x[0]/2+1) }

// refWeight is x^(k−1)/Γ(k) in math/big.
func refWeight(x []float64) *big.Float { return refPowOverGamma(x[0], x[1]-1, x[1]) }

func refPowOverGamma(x, p, a float64) *big.Float {
	lg, _, err := exacteval.Lgamma(fl(a))
	if err != nil {
		panic(err)
	}
	ln, err := exacteval.Log(fl(x))
	if err != nil {
		panic(err)
	}
	l := mul(fl(p), ln)
	return exacteval.Exp(new(big.Float).SetPrec(refPrec).Sub(l, lg))
}
