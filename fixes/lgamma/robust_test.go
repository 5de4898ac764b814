package lgamma

import (
	"math"
	"math/rand"
	"testing"
)

// Valid arguments, including extreme ones, never give NaN, and
// probabilities stay in [0, 1] (their definition).
func TestValidInputNoNaN(t *testing.T) {
	rng := rand.New(rand.NewSource(15))
	ints := []int{0, 1, 2, 15, 16, 17, 1023, 1024, 1025, 1 << 31, 1 << 53, 1<<53 + 1, math.MaxInt - 1, math.MaxInt}
	floats := []float64{math.SmallestNonzeroFloat64, 1e-310, 1e-300, 1e-20, 0.5, 1, 1.5, 2, 15.999, 16, 16.0001, 1e15, 1e300, math.MaxFloat64}
	pickI := func() int {
		if rng.Intn(2) == 0 {
			return ints[rng.Intn(len(ints))]
		}
		return int(math.Exp(rng.Float64() * 43))
	}
	pickF := func() float64 {
		if rng.Intn(2) == 0 {
			return floats[rng.Intn(len(floats))]
		}
		return math.Exp(rng.Float64()*1400 - 700)
	}
	prob := func(name string, v float64, args ...any) {
		if math.IsNaN(v) || v < 0 || v > 1 {
			t.Errorf("%s%v = %g, not a probability", name, args, v)
		}
	}
	noNaN := func(name string, v float64, args ...any) {
		if math.IsNaN(v) {
			t.Errorf("%s%v = NaN", name, args)
		}
	}
	for i := 0; i < 3000; i++ {
		n, k := pickI(), pickI()
		if k > n {
			n, k = k, n
		}
		x, y := pickF(), pickF()
		p := rng.Float64()
		if i%5 == 0 {
			p = []float64{0, 1, 1e-300, 1 - 1e-16, 0.5}[i%25/5]
		}
		noNaN("LogFactorial", LogFactorial(n), n)
		noNaN("Factorial", Factorial(n), n)
		noNaN("LogChoose", LogChoose(n, k), n, k)
		noNaN("Choose", Choose(n, k), n, k)
		noNaN("LogFalling", LogFalling(n, k), n, k)
		noNaN("Falling", Falling(n, k), n, k)
		noNaN("LogMultinomial", LogMultinomial(k, n-k), k, n-k)
		noNaN("Catalan", Catalan(k), k)
		noNaN("LogGamma", LogGamma(x), x)
		noNaN("LogGamma", LogGamma(-x), -x)
		noNaN("StirlingRemainder", StirlingRemainder(x), x)
		noNaN("LogPowOverFactorial", LogPowOverFactorial(x, k), x, k)
		noNaN("PowOverFactorial", PowOverFactorial(-x, k), -x, k)
		noNaN("LogGammaRatio", LogGammaRatio(x, y), x, y)
		noNaN("GammaRatio", GammaRatio(x, y), x, y)
		noNaN("LogBeta", LogBeta(x, y), x, y)
		noNaN("Beta", Beta(x, y), x, y)
		noNaN("LogRising", LogRising(x, k%100000), x, k%100000)
		noNaN("Rising", Rising(-x, k%100000), -x, k%100000)
		if x < 1e300 {
			prob("PoissonPMF", PoissonPMF(k, x), k, x)
			noNaN("PoissonLogPMF", PoissonLogPMF(k, x), k, x)
		}
		prob("BinomialPMF", BinomialPMF(k, n, p), k, n, p)
		noNaN("BinomialLogPMF", BinomialLogPMF(k, n, p), k, n, p)
		s, d := pickI()%(n+1), pickI()%(n+1)
		prob("HypergeometricPMF", HypergeometricPMF(k%(d+1), n, s, d), k%(d+1), n, s, d)
	}
}
