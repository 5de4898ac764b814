package lgamma

import (
	"math"
	"testing"
)

// One benchmark per exported function (go test -bench . -run '^$').
// Arguments are spread over a table so no single branch is measured.
// BenchmarkLgammaBaseline is the math.Lgamma(float64(n)+1) that
// LogFactorial replaces; scripts/numerics-report.sh prints the ratio.

var (
	sinkF float64
	sinkI int64
	sinkU uint64
	sinkB bool
	sinkS int
)

// smallN are factorial arguments below 1024, where LogFactorial is a
// table lookup. The array length is a power of two so that picking an
// argument (i & 255) costs no division, which would otherwise dominate
// the time of the lookup being measured.
var smallN = func() (s [256]int) {
	for i := range s {
		s[i] = (i*389 + 7) % 1024
	}
	return s
}()

var largeN = []int{1500, 40000, 123456, 1e6, 7654321, 1e9}

func BenchmarkLogFactorialSmall(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkF = LogFactorial(smallN[i&255])
	}
}

func BenchmarkLgammaBaseline(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkF, _ = math.Lgamma(float64(smallN[i&255]) + 1)
	}
}

func BenchmarkLogFactorialLarge(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkF = LogFactorial(largeN[i%len(largeN)])
	}
}

func BenchmarkFactorial(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkF = Factorial(i % 171)
	}
}

func BenchmarkFactorialInt64(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkI, sinkB = FactorialInt64(int64(i % 21))
	}
}

func BenchmarkMustFactorialInt64(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkI = MustFactorialInt64(int64(i % 21))
	}
}

func BenchmarkFactorialUint64(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkU, sinkB = FactorialUint64(uint64(i % 21))
	}
}

func BenchmarkMustFactorialUint64(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkU = MustFactorialUint64(uint64(i % 21))
	}
}

var gammaArgs = []float64{0.25, 1.5, 3.7, 9.99, 17.5, 123.456, 1e5 + 0.3, 2.5e9, -2.5}

func BenchmarkLogGamma(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkF = LogGamma(gammaArgs[i%len(gammaArgs)])
	}
}

func BenchmarkGammaSign(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkS = GammaSign(gammaArgs[i%len(gammaArgs)])
	}
}

// chooseArgs mix small tables, mid-size n and n near 10⁹.
var chooseArgs = [][2]int{{10, 3}, {52, 5}, {100, 50}, {1000, 10}, {5000, 2500}, {1e6, 7}, {1e9, 12}, {1e9, 5e8}}

func BenchmarkLogChoose(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := chooseArgs[i%len(chooseArgs)]
		sinkF = LogChoose(a[0], a[1])
	}
}

func BenchmarkChoose(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := chooseArgs[i%len(chooseArgs)]
		sinkF = Choose(a[0], a[1])
	}
}

var chooseIntArgs = [][2]int64{{10, 3}, {52, 5}, {66, 33}, {1000, 6}, {1e9, 2}, {70, 35}}

func BenchmarkChooseInt64(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := chooseIntArgs[i%len(chooseIntArgs)]
		sinkI, sinkB = ChooseInt64(a[0], a[1])
	}
}

func BenchmarkMustChooseInt64(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := chooseIntArgs[i%(len(chooseIntArgs)-1)] // all fit
		sinkI = MustChooseInt64(a[0], a[1])
	}
}

func BenchmarkChooseUint64(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := chooseIntArgs[i%len(chooseIntArgs)]
		sinkU, sinkB = ChooseUint64(uint64(a[0]), uint64(a[1]))
	}
}

func BenchmarkMustChooseUint64(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := chooseIntArgs[i%(len(chooseIntArgs)-1)]
		sinkU = MustChooseUint64(uint64(a[0]), uint64(a[1]))
	}
}

var fallingArgs = [][2]int{{10, 3}, {100, 20}, {1000, 500}, {1e6, 7}, {1e9, 12}, {1e9, 1e6}}

func BenchmarkLogFalling(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := fallingArgs[i%len(fallingArgs)]
		sinkF = LogFalling(a[0], a[1])
	}
}

func BenchmarkFalling(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := fallingArgs[i%len(fallingArgs)]
		sinkF = Falling(a[0], a[1])
	}
}

var fallingIntArgs = [][2]int64{{10, 3}, {20, 20}, {1000, 6}, {1e9, 2}}

func BenchmarkFallingInt64(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := fallingIntArgs[i%len(fallingIntArgs)]
		sinkI, sinkB = FallingInt64(a[0], a[1])
	}
}

func BenchmarkMustFallingInt64(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := fallingIntArgs[i%len(fallingIntArgs)]
		sinkI = MustFallingInt64(a[0], a[1])
	}
}

func BenchmarkFallingUint64(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := fallingIntArgs[i%len(fallingIntArgs)]
		sinkU, sinkB = FallingUint64(uint64(a[0]), uint64(a[1]))
	}
}

func BenchmarkMustFallingUint64(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := fallingIntArgs[i%len(fallingIntArgs)]
		sinkU = MustFallingUint64(uint64(a[0]), uint64(a[1]))
	}
}

var risingArgs = []struct {
	x float64
	n int
}{{2.5, 3}, {0.1, 30}, {-7.5, 12}, {3.25, 200}, {1e6 + 0.5, 1000}, {-40.5, 100}}

func BenchmarkLogRising(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := risingArgs[i%len(risingArgs)]
		sinkF = LogRising(a.x, a.n)
	}
}

func BenchmarkRising(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := risingArgs[i%len(risingArgs)]
		sinkF = Rising(a.x, a.n)
	}
}

var multiArgs = [][]int{{3, 4, 5}, {10, 10, 10, 10}, {1000, 2000, 3000}, {1e6, 5, 17}}

func BenchmarkLogMultinomial(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkF = LogMultinomial(multiArgs[i%len(multiArgs)]...)
	}
}

func BenchmarkMultinomial(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkF = Multinomial(multiArgs[i%len(multiArgs)]...)
	}
}

var multiIntArgs = [][]int64{{3, 4, 5}, {10, 10, 10}, {5, 5, 5, 5, 5}, {20, 20, 20}}

func BenchmarkMultinomialInt64(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkI, sinkB = MultinomialInt64(multiIntArgs[i%len(multiIntArgs)]...)
	}
}

func BenchmarkMustMultinomialInt64(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkI = MustMultinomialInt64(multiIntArgs[i%(len(multiIntArgs)-1)]...)
	}
}

func BenchmarkCatalanInt64(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkI, sinkB = CatalanInt64(int64(i % 37))
	}
}

func BenchmarkMustCatalanInt64(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkI = MustCatalanInt64(int64(i % 36))
	}
}

func BenchmarkCatalan(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkF = Catalan(i % 600)
	}
}

var powArgs = []struct {
	x float64
	k int
}{{0.5, 3}, {2.5, 20}, {-7, 15}, {1e3, 400}, {123.4, 5000}}

func BenchmarkLogPowOverFactorial(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := powArgs[i%len(powArgs)]
		sinkF = LogPowOverFactorial(a.x, a.k)
	}
}

func BenchmarkPowOverFactorial(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := powArgs[i%len(powArgs)]
		sinkF = PowOverFactorial(a.x, a.k)
	}
}

var poissonArgs = []struct {
	k      int
	lambda float64
}{{0, 3.5}, {3, 2.5}, {17, 20}, {1000, 1020.5}, {99990, 1e5}, {1e8, 1e8 + 3e4}}

func BenchmarkPoissonPMF(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := poissonArgs[i%len(poissonArgs)]
		sinkF = PoissonPMF(a.k, a.lambda)
	}
}

func BenchmarkPoissonLogPMF(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := poissonArgs[i%len(poissonArgs)]
		sinkF = PoissonLogPMF(a.k, a.lambda)
	}
}

var binomialArgs = []struct {
	k, n int
	p    float64
}{{0, 10, 0.3}, {3, 10, 0.3}, {40, 200, 0.2}, {5000, 10000, 0.5}, {2e7, 1e8, 0.2}}

func BenchmarkBinomialPMF(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := binomialArgs[i%len(binomialArgs)]
		sinkF = BinomialPMF(a.k, a.n, a.p)
	}
}

func BenchmarkBinomialLogPMF(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := binomialArgs[i%len(binomialArgs)]
		sinkF = BinomialLogPMF(a.k, a.n, a.p)
	}
}

var hyperArgs = [][4]int{{2, 20, 7, 5}, {30, 1000, 300, 100}, {5000, 1e6, 1e5, 5e4}}

func BenchmarkHypergeometricPMF(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := hyperArgs[i%len(hyperArgs)]
		sinkF = HypergeometricPMF(a[0], a[1], a[2], a[3])
	}
}

func BenchmarkHypergeometricLogPMF(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := hyperArgs[i%len(hyperArgs)]
		sinkF = HypergeometricLogPMF(a[0], a[1], a[2], a[3])
	}
}

var ratioArgs = [][2]float64{{10.5, 10}, {3.25, 0.75}, {1e6 + 0.5, 1e6}, {200, 150.5}, {-2.5, 4}}

func BenchmarkGammaRatio(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := ratioArgs[i%len(ratioArgs)]
		sinkF = GammaRatio(a[0], a[1])
	}
}

func BenchmarkLogGammaRatio(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := ratioArgs[i%len(ratioArgs)]
		sinkF = LogGammaRatio(a[0], a[1])
	}
}

var betaArgs = [][2]float64{{2, 3}, {0.5, 0.5}, {30.5, 12.25}, {1e5, 3.5}, {1e9, 1e9}}

func BenchmarkLogBeta(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := betaArgs[i%len(betaArgs)]
		sinkF = LogBeta(a[0], a[1])
	}
}

func BenchmarkBeta(b *testing.B) {
	for i := 0; i < b.N; i++ {
		a := betaArgs[i%len(betaArgs)]
		sinkF = Beta(a[0], a[1])
	}
}

var stirlingArgs = []float64{3, 7.5, 15.25, 16, 1000, 1e9}

func BenchmarkStirlingRemainder(b *testing.B) {
	for i := 0; i < b.N; i++ {
		sinkF = StirlingRemainder(stirlingArgs[i%len(stirlingArgs)])
	}
}
