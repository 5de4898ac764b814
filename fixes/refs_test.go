package fixes_test

import (
	"math"
	"math/big"
	"testing"
)

// Reference values for the differential tests, computed with math/big
// from the defining formulas (common practice; DLMF 26.3.1 for C(n,k),
// 26.4.2 for multinomials, 5.4.1 for Γ(n) = (n−1)! and 5.12.1 for
// B(a,b) = Γ(a)Γ(b)/Γ(a+b)), never from the helper module. Integers are
// exact; the 2000-bit floats carry far more digits than float64 needs.
const refPrec = 2000

func bf(x *big.Int) *big.Float { return new(big.Float).SetPrec(refPrec).SetInt(x) }

func fl(x float64) *big.Float { return new(big.Float).SetPrec(refPrec).SetFloat64(x) }

func quo(a, b *big.Float) *big.Float { return new(big.Float).SetPrec(refPrec).Quo(a, b) }

func mul(a, b *big.Float) *big.Float { return new(big.Float).SetPrec(refPrec).Mul(a, b) }

func factorialBig(n int64) *big.Int {
	if n < 2 {
		return big.NewInt(1)
	}
	return new(big.Int).MulRange(1, n)
}

func chooseBig(n, k int64) *big.Int {
	if k < 0 || k > n {
		return big.NewInt(0)
	}
	return new(big.Int).Binomial(n, k)
}

func fallingBig(n, k int64) *big.Int {
	switch {
	case k == 0:
		return big.NewInt(1)
	case k > n:
		return big.NewInt(0)
	}
	return new(big.Int).MulRange(n-k+1, n)
}

// powBig is x^k for a float64 x, exactly (x is a dyadic rational).
func powBig(x float64, k int64) *big.Float {
	r := fl(1)
	for i := int64(0); i < k; i++ {
		r = mul(r, fl(x))
	}
	return r
}

func refChoose(x []float64) *big.Float { return bf(chooseBig(int64(x[0]), int64(x[1]))) }

// refProductDown is n(n−1)…(n−k+1), the k factors down from n, for a
// whole n of either sign and k ≥ 0, multiplied out in math/big.
func refProductDown(x []float64) *big.Float {
	n, k := int64(x[0]), int64(x[1])
	r := big.NewInt(1)
	for i := int64(0); i < k; i++ {
		r.Mul(r, big.NewInt(n-i))
	}
	return bf(r)
}

func refFalling(x []float64) *big.Float { return bf(fallingBig(int64(x[0]), int64(x[1]))) }

func refFactorial(x []float64) *big.Float { return bf(factorialBig(int64(x[0]))) }

func refMultinomial(x []float64) *big.Float {
	var sum int64
	den := big.NewInt(1)
	for _, v := range x {
		sum += int64(v)
		den.Mul(den, factorialBig(int64(v)))
	}
	return bf(new(big.Int).Quo(factorialBig(sum), den))
}

func refCatalan(x []float64) *big.Float {
	n := int64(x[0])
	return bf(new(big.Int).Quo(chooseBig(2*n, n), big.NewInt(n+1)))
}

// refPowFact is a^k/k! for (a, k).
func refPowFact(x []float64) *big.Float {
	return quo(powBig(x[0], int64(x[1])), bf(factorialBig(int64(x[1]))))
}

// refPoisson is λ^k e^(−λ)/k! for (k, λ); e^(−λ) comes from math.Exp,
// whose error (under 1 ulp) is far inside the tests' tolerance.
func refPoisson(x []float64) *big.Float {
	k, lambda := int64(x[0]), x[1]
	return mul(quo(powBig(lambda, k), bf(factorialBig(k))), fl(math.Exp(-lambda)))
}

// refPoissonLoop is refPoisson for k ≥ 0, and e^−λ for k < 0, where a
// power loop of k trips and a factorial loop from 2 to k leave 1.
func refPoissonLoop(x []float64) *big.Float {
	if x[0] < 0 {
		return fl(math.Exp(-x[1]))
	}
	return refPoisson(x)
}

// powSigned is x^k for a whole k of either sign, in math/big.
func powSigned(x float64, k int64) *big.Float {
	if k < 0 {
		return quo(fl(1), powBig(x, -k))
	}
	return powBig(x, k)
}

// refPoissonSigned is λ^k e^(−λ)/k! for (k, λ) with k! the empty
// product 1 below 2 (factorialBig), so that for k < 0 it is λ^k e^(−λ),
// the power math.Pow takes for a negative exponent.
func refPoissonSigned(x []float64) *big.Float {
	k, lambda := int64(x[0]), x[1]
	return mul(quo(powSigned(lambda, k), bf(factorialBig(k))), fl(math.Exp(-lambda)))
}

// refPowFactSigned is a^k/k! for (a, k), k! as in refPoissonSigned.
func refPowFactSigned(x []float64) *big.Float {
	return quo(powSigned(x[0], int64(x[1])), bf(factorialBig(int64(x[1]))))
}

// refBinomialPMF is C(n,k) p^k (1−p)^(n−k) for (k, n, p), with 1−p exact.
func refBinomialPMF(x []float64) *big.Float {
	k, n, p := int64(x[0]), int64(x[1]), x[2]
	q := new(big.Float).SetPrec(refPrec).Sub(fl(1), fl(p))
	r := mul(bf(chooseBig(n, k)), powBig(p, k))
	for i := int64(0); i < n-k; i++ {
		r = mul(r, q)
	}
	return r
}

// refHypergeometric is C(K,k) C(N−K,n−k) / C(N,n) for (k, N, K, n).
// Its cases take inputs where each binomial is in its domain (n − k ≤
// N − K among them): outside, the rewritten code keeps the expression
// as written, whose own arithmetic (a binomial over factorial loops is
// not 0 past its domain) the after-fix differential judges.
func refHypergeometric(x []float64) *big.Float {
	k, total, bad, n := int64(x[0]), int64(x[1]), int64(x[2]), int64(x[3])
	num := new(big.Int).Mul(chooseBig(bad, k), chooseBig(total-bad, n-k))
	return quo(bf(num), bf(chooseBig(total, n)))
}

// refGammaRatio is Γ(a)/Γ(b) = (a−1)!/(b−1)! for positive integers.
func refGammaRatio(x []float64) *big.Float {
	return quo(bf(factorialBig(int64(x[0])-1)), bf(factorialBig(int64(x[1])-1)))
}

// refBeta is (a−1)!(b−1)!/(a+b−1)! for positive integers.
func refBeta(x []float64) *big.Float {
	a, b := int64(x[0]), int64(x[1])
	num := new(big.Int).Mul(factorialBig(a-1), factorialBig(b-1))
	return quo(bf(num), bf(factorialBig(a+b-1)))
}

// scaled is c times the reference ref, for a shape inside a product with
// a constant.
func scaled(c int64, ref func([]float64) *big.Float) func([]float64) *big.Float {
	return func(x []float64) *big.Float { return mul(fl(float64(c)), ref(x)) }
}

// refErlangB is the Erlang B formula (a^c/c!) / Σ_{k=0..c} a^k/k! for
// (a, c) (common practice; the queueing handbooks' loss formula).
func refErlangB(x []float64) *big.Float {
	a, c := x[0], int64(x[1])
	sum := fl(0)
	for k := int64(0); k <= c; k++ {
		sum = new(big.Float).SetPrec(refPrec).Add(sum, refPowFact([]float64{a, float64(k)}))
	}
	return quo(refPowFact([]float64{a, float64(c)}), sum)
}

// refDoubleFactorial is n!! = n(n−2)(n−4)… down to 1 or 2, exactly
// (the definition, common practice; OEIS A006882).
func refDoubleFactorial(x []float64) *big.Float {
	r := big.NewInt(1)
	for i := int64(x[0]); i > 1; i -= 2 {
		r.Mul(r, big.NewInt(i))
	}
	return bf(r)
}

// refFillMoment is Γ((k+3)/2)/Γ(3/2)·s^k for even k: with j = k/2 the
// ratio is (3/2)(5/2)…(j+1/2), by Γ(x+1) = xΓ(x) (DLMF 5.5.1).
func refFillMoment(x []float64) *big.Float {
	k, s := int64(x[0]), x[1]
	r := powBig(s, k)
	for i := int64(0); i < k/2; i++ {
		r = mul(r, fl(1.5+float64(i)))
	}
	return r
}

// refFillDensity is x^(a−1)(1−x)^(b−1)/B(a,b) for positive integers a, b,
// with 1/B(a,b) = (a+b−1)!/((a−1)!(b−1)!) (DLMF 5.12.1 and 5.4.1).
func refFillDensity(x []float64) *big.Float {
	a, b, p := int64(x[0]), int64(x[1]), x[2]
	inv := quo(bf(factorialBig(a+b-1)), bf(new(big.Int).Mul(factorialBig(a-1), factorialBig(b-1))))
	return mul(inv, mul(powBig(p, a-1), powBig(1-p, b-1)))
}

// refDrift is Γ(k+b)/Γ(b)·g^k = (k+b−1)!/(b−1)!·g^k for a positive
// integer b (DLMF 5.4.1).
func refDrift(x []float64) *big.Float {
	k, b, g := int64(x[0]), int64(x[1]), x[2]
	return mul(quo(bf(factorialBig(k+b-1)), bf(factorialBig(b-1))), powBig(g, k))
}

// refDecay is a^(k+1)/k! for (a, k), exactly.
func refDecay(x []float64) *big.Float {
	return quo(powBig(x[0], int64(x[1])+1), bf(factorialBig(int64(x[1]))))
}

// refExpSeries is the partial sum of the series of e^x (DLMF 4.2.19),
// the sum of x^k/k! for k = 0 … n, for (x, n).
func refExpSeries(x []float64) *big.Float {
	sum := fl(0)
	for k := int64(0); k <= int64(x[1]); k++ {
		sum = new(big.Float).SetPrec(refPrec).Add(sum, refPowFact([]float64{x[0], float64(k)}))
	}
	return sum
}

// refTail is 1/n!.
func refTail(x []float64) *big.Float {
	return quo(fl(1), bf(factorialBig(int64(x[0]))))
}

// refModeNorm is 1/√(2^n·n!·√π), the normaliser of the n-th Hermite
// function (DLMF 18.3, Table 18.3.1: h_n = √π·2^n·n!), with √π as the
// float64 math.Sqrt(math.Pi) the code multiplies by.
func refModeNorm(x []float64) *big.Float {
	sq := bf(factorialBig(int64(x[0])))
	sq.SetMantExp(sq, int(x[0]))
	sq.Mul(sq, fl(math.Sqrt(math.Pi)))
	return quo(fl(1), new(big.Float).SetPrec(refPrec).Sqrt(sq))
}

// refPoissonCDF is the sum of λ^k e^(−λ)/k! for k = 0 … n, for (λ, n)
// (DLMF 8.4.10 relates it to the incomplete gamma function; the sum is
// the definition).
func refPoissonCDF(x []float64) *big.Float {
	sum := fl(0)
	for k := int64(0); k <= int64(x[1]); k++ {
		sum = new(big.Float).SetPrec(refPrec).Add(sum, refPoisson([]float64{float64(k), x[0]}))
	}
	return sum
}

// refFactorialTo returns the reference min(n, m)!: a product loop over
// 1..n that some exit stops after its m-th factor (math/big).
func refFactorialTo(m int64) func([]float64) *big.Float {
	return func(x []float64) *big.Float { return bf(factorialBig(min(int64(x[0]), m))) }
}

// refThirty is the product 1·2·…·min(30, stop−1) of a loop over 1..30
// that returns on reaching stop, for stop ≥ 1 (math/big).
func refThirty(x []float64) *big.Float { return bf(factorialBig(min(30, int64(x[0])-1))) }

// refCapped is the product 1·2·…·i over i ≤ n, stopped as soon as it
// passes 1000 (math/big).
func refCapped(x []float64) *big.Float {
	r := big.NewInt(1)
	for i := int64(1); i <= int64(x[0]); i++ {
		r.Mul(r, big.NewInt(i))
		if r.Cmp(big.NewInt(1000)) > 0 {
			break
		}
	}
	return bf(r)
}

// refOddProduct is the product of the odd numbers up to n: n!! for odd n,
// (n−1)!! for even n (OEIS A006882).
func refOddProduct(x []float64) *big.Float {
	n := int64(x[0])
	if n%2 == 0 {
		n--
	}
	return refDoubleFactorial([]float64{float64(n)})
}

// loopChooseBig is what the multiplicative loop b = b*(n−k+i)/i over
// i = 1..k computes without overflow: 1 for k ≤ 0 (no trip), and the
// generalised binomial coefficient n(n−1)…(n−k+1)/k! otherwise, which is
// C(n, k) for n ≥ 0 and (−1)^k·C(k−n−1, k) for n < 0 (common practice;
// every partial product is such a coefficient, so each division is
// exact).
func loopChooseBig(n, k int64) *big.Int {
	switch {
	case k <= 0:
		return big.NewInt(1)
	case n >= 0:
		return chooseBig(n, k)
	}
	r := new(big.Int).Binomial(k-n-1, k)
	if k%2 == 1 {
		r.Neg(r)
	}
	return r
}

func refLoopChoose(x []float64) *big.Float { return bf(loopChooseBig(int64(x[0]), int64(x[1]))) }

// refRoutes is the loop r = r·(a+u−i)/(i+1) over i = 0..a−1: the same
// generalised coefficient, C(a+u, a), with 1 for a ≤ 0 (no trip).
func refRoutes(x []float64) *big.Float { return bf(loopChooseBig(int64(x[0]+x[1]), int64(x[0]))) }

// refTable is a 2×2 table's probability with its margins fixed,
// (a+b)!(c+d)!(a+c)!(b+d)!/(n!·a!·b!·c!·d!), n = a+b+c+d (common
// practice: the hypergeometric term of Fisher's exact test), over
// factorials that are 1 below 2, as a loop from 2 computes them.
func refTable(x []float64) *big.Float {
	a, b, c, d := int64(x[0]), int64(x[1]), int64(x[2]), int64(x[3])
	num := new(big.Int).Mul(factorialBig(a+b), factorialBig(c+d))
	num.Mul(num, factorialBig(a+c)).Mul(num, factorialBig(b+d))
	den := new(big.Int).Mul(factorialBig(a+b+c+d), factorialBig(a))
	den.Mul(den, factorialBig(b)).Mul(den, factorialBig(c)).Mul(den, factorialBig(d))
	return quo(bf(num), bf(den))
}

// refCheckedChoose is a binomial loop behind "if k < 0 { return 0 }".
func refCheckedChoose(x []float64) *big.Float {
	if x[1] < 0 {
		return fl(0)
	}
	return refLoopChoose(x)
}

// refLoopFalling is what p *= n − i over i = 0..k−1 computes: 1 for
// k ≤ 0 (no trip), n(n−1)…(n−k+1) otherwise.
func refLoopFalling(x []float64) *big.Float {
	if x[1] <= 0 {
		return fl(1)
	}
	return refFalling(x)
}

// TestLoopChooseReference checks the reference of the binomial loop
// against the loop itself, run where nothing overflows, and against
// values worked by hand from the generalised definition: C(−3, 2) =
// (−3)(−4)/2 = 6, C(−1, 3) = (−1)(−2)(−3)/6 = −1.
func TestLoopChooseReference(t *testing.T) {
	for n := int64(-15); n <= 15; n++ {
		for k := int64(-3); k <= 15; k++ {
			b := int64(1)
			for i := int64(1); i <= k; i++ {
				b = b * (n - k + i) / i
			}
			if got := loopChooseBig(n, k); got.Cmp(big.NewInt(b)) != 0 {
				t.Errorf("loopChooseBig(%d, %d) = %v, the loop gives %d", n, k, got, b)
			}
		}
	}
	for _, c := range []struct{ n, k, want int64 }{{-3, 2, 6}, {-1, 3, -1}, {5, -1, 1}} {
		if got := loopChooseBig(c.n, c.k); got.Int64() != c.want {
			t.Errorf("loopChooseBig(%d, %d) = %v, want %d", c.n, c.k, got, c.want)
		}
	}
}

// refRatioChoose is fact(n)/(fact(k)·fact(n−k)) with a factorial loop's
// value (factorialBig: the empty product, 1, below 2) and
// Go's truncated integer division, for every n and k: C(n, k) on
// 0 ≤ k ≤ n, and what the code computes outside it.
func refRatioChoose(x []float64) *big.Float {
	n, k := int64(x[0]), int64(x[1])
	den := new(big.Int).Mul(factorialBig(k), factorialBig(n-k))
	return bf(new(big.Int).Quo(factorialBig(n), den))
}

// refRatioFalling is fact(n)/fact(n−k) the same way.
func refRatioFalling(x []float64) *big.Float {
	n, k := int64(x[0]), int64(x[1])
	return bf(new(big.Int).Quo(factorialBig(n), factorialBig(n-k)))
}

// refProductFrom returns the reference a·(a+1)·…·n, the empty product 1
// for n < a (math/big).
func refProductFrom(a int64) func([]float64) *big.Float {
	return func(x []float64) *big.Float {
		if n := int64(x[0]); n >= a {
			return bf(new(big.Int).MulRange(a, n))
		}
		return bf(big.NewInt(1))
	}
}

// refRisingFrom returns the reference x(x+1)…(x+n−1) for a fixed x, the
// rising factorial of n factors (DLMF 5.2.5, from memory), 1 for n ≤ 0
// (math/big).
func refRisingFrom(x int64) func([]float64) *big.Float {
	return func(v []float64) *big.Float {
		return refProductFrom(x)([]float64{float64(x + int64(v[0]) - 1)})
	}
}

// powZBig is x^e for any integer e, in math/big.
func powZBig(x float64, e int64) *big.Float {
	if e < 0 {
		return quo(fl(1), powBig(x, -e))
	}
	return powBig(x, e)
}

// keptPMF is count·p^k·(1−p)^(n−k) for (n, k, p), count being what the
// code's binomial function computes for (n, k) without wrapping: the
// expression a binomial probability keeps as written for p outside
// [0, 1] and k outside 0..n.
func keptPMF(count func(n, k int64) *big.Int) func([]float64) *big.Float {
	return func(x []float64) *big.Float {
		n, k, p := int64(x[0]), int64(x[1]), x[2]
		return mul(mul(bf(count(n, k)), powZBig(p, k)), powZBig(1-p, n-k))
	}
}

// refKeptPMFSum is Σ_{k=0}^{c} C(n, k)·p^k·(1−p)^(n−k) for (n, c, p),
// each count the multiplicative loop's (loopChooseBig), in math/big.
func refKeptPMFSum(x []float64) *big.Float {
	n, c, p := int64(x[0]), int64(x[1]), x[2]
	sum := fl(0)
	for k := int64(0); k <= c; k++ {
		sum = new(big.Float).SetPrec(refPrec).Add(sum, keptPMF(loopChooseBig)([]float64{float64(n), float64(k), p}))
	}
	return sum
}

// ratioChooseBig is n!/(k!(n−k)!) over factorials that are 1 below 2,
// rounded toward zero, as Go's integer division rounds.
func ratioChooseBig(n, k int64) *big.Int {
	d := new(big.Int).Mul(factorialBig(k), factorialBig(n-k))
	return new(big.Int).Quo(factorialBig(n), d)
}

// refKeptHypergeometric is C(K,k)·C(N−K,n−k)/C(N,n) for (N, K, n, k)
// with each binomial the multiplicative loop's value (loopChooseBig),
// the generalised coefficient where N − K < 0.
func refKeptHypergeometric(x []float64) *big.Float {
	total, bad, n, k := int64(x[0]), int64(x[1]), int64(x[2]), int64(x[3])
	num := new(big.Int).Mul(loopChooseBig(bad, k), loopChooseBig(total-bad, n-k))
	return quo(bf(num), bf(loopChooseBig(total, n)))
}

// refBinomialPMFnk is refBinomialPMF with the operands in the order
// (n, k, p).
func refBinomialPMFnk(x []float64) *big.Float { return refBinomialPMF([]float64{x[1], x[0], x[2]}) }

// zeroChooseBig is what a binomial function that returns 0 outside
// 0 ≤ k ≤ n computes without wrapping: C(n, k) from math/big there, 0
// elsewhere.
func zeroChooseBig(n, k int64) *big.Int {
	if k < 0 || k > n {
		return big.NewInt(0)
	}
	return chooseBig(n, k)
}

// refMissAll is C(lot − bad, drawn)/C(lot, drawn) for (lot, bad, drawn),
// each count zeroChooseBig's, in math/big.
func refMissAll(x []float64) *big.Float {
	lot, bad, drawn := int64(x[0]), int64(x[1]), int64(x[2])
	return quo(bf(zeroChooseBig(lot-bad, drawn)), bf(zeroChooseBig(lot, drawn)))
}
