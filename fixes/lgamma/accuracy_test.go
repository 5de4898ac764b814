package lgamma

import (
	"fmt"
	"math"
	"math/big"
	"math/rand"
	"os"
	"strings"
	"testing"
)

// Accuracy against the math/big references of ref_test.go. TestAccuracy
// prints one table row per function (go test -v -run TestAccuracy) and
// fails if any bound is exceeded. The default run samples each domain;
// LGAMMA_LONG=1 widens the sweeps (every n ≤ 10⁵ for LogFactorial, ten
// times the samples elsewhere) and takes a few minutes.

var long = os.Getenv("LGAMMA_LONG") != ""

// scale returns n, or 10n for the long run.
func scale(n int) int {
	if long {
		return 10 * n
	}
	return n
}

type accRow struct {
	name, domain string
	samples      int
	worst        float64
	worstAt      string
	unit         string // "ulp" or "rel"
	bound        float64
	naive        float64 // the same measure for the textbook formula, if any
}

func (r *accRow) add(err float64, at string) {
	r.samples++
	if err > r.worst || math.IsNaN(err) {
		r.worst, r.worstAt = err, at
	}
}

func TestAccuracy(t *testing.T) {
	rows := []*accRow{
		accLogFactorial(t),
		accLogFactorialLarge(t),
		accChoose(t),
		accLogChoose(t),
		accPoisson(t),
		accBinomial(t),
		accHypergeometric(t),
		accLogGamma(t),
		accGammaRatio(t),
		accBeta(t),
		accRising(t),
		accFalling(t),
		accPowOverFactorial(t),
		accStirling(t),
		accMultinomial(t),
	}
	var b strings.Builder
	fmt.Fprintf(&b, "\n%-22s %-36s %7s %10s %-4s %8s %10s  %s\n", "function", "domain", "samples", "worst", "unit", "bound", "naive", "worst at")
	for _, r := range rows {
		naive := "-"
		if r.naive > 0 {
			naive = fmt.Sprintf("%.3g", r.naive)
		}
		fmt.Fprintf(&b, "%-22s %-36s %7d %10.3g %-4s %8.3g %10s  %s\n", r.name, r.domain, r.samples, r.worst, r.unit, r.bound, naive, r.worstAt)
		if !(r.worst <= r.bound) {
			t.Errorf("%s: worst error %g %s at %s exceeds %g", r.name, r.worst, r.unit, r.worstAt, r.bound)
		}
	}
	t.Log(b.String())
}

// lgammaNaive is the textbook log factorial the package replaces.
func lgammaNaive(x float64) float64 {
	v, _ := math.Lgamma(x)
	return v
}

func accLogFactorial(t *testing.T) *accRow {
	// Every n ≤ 10⁴ (10⁵ long) against ln of the exact n! from
	// math/big below 3000 and the big Stirling series above.
	r := &accRow{name: "LogFactorial", unit: "ulp", bound: 1}
	top := int64(10000)
	if long {
		top = 100000
	}
	r.domain = fmt.Sprintf("every n ≤ %d", top)
	f := big.NewInt(1)
	for n := int64(0); n <= top; n++ {
		var want *big.Float
		if n < 3000 {
			if n > 1 {
				f.Mul(f, big.NewInt(n))
			}
			want = refLog(bnew().SetInt(f))
		} else {
			want = refLnGamma(bi(n + 1))
		}
		r.add(ulpsOff(LogFactorial(int(n)), want), fmt.Sprint("n=", n))
		r.naive = math.Max(r.naive, ulpsOff(lgammaNaive(float64(n)+1), want))
	}
	return r
}

func accLogFactorialLarge(t *testing.T) *accRow {
	// Log-uniform sample of n in (10⁴, 10⁷], plus a few up to 2^62.
	r := &accRow{name: "LogFactorial", domain: "sample 1e4 < n ≤ 1e7, some to 2^62", unit: "ulp", bound: 1}
	rng := rand.New(rand.NewSource(1))
	ns := []int64{10001, 1 << 20, 9999999, 10000000, 1 << 40, 1 << 53, 1<<53 + 1, 1 << 62}
	for i := 0; i < scale(400); i++ {
		ns = append(ns, int64(math.Exp(rng.Float64()*math.Log(1e3)+math.Log(1e4))))
	}
	for _, n := range ns {
		want := refLnGamma(bi(n + 1))
		r.add(ulpsOff(LogFactorial(int(n)), want), fmt.Sprint("n=", n))
		r.naive = math.Max(r.naive, ulpsOff(lgammaNaive(float64(n)+1), want))
	}
	return r
}

func accChoose(t *testing.T) *accRow {
	// C(n,k) ≤ 1e100 for n up to 10⁹, exact values from big.Int.Binomial.
	r := &accRow{name: "Choose", domain: "C(n,k) ≤ 1e100, n ≤ 1e9", unit: "rel", bound: 1e-13}
	rng := rand.New(rand.NewSource(2))
	limit := new(big.Int).Exp(big.NewInt(10), big.NewInt(100), nil)
	var ns []int64
	for _, n := range []int64{10, 50, 100, 333, 1000, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9} {
		ns = append(ns, n)
	}
	for i := 0; i < scale(40); i++ {
		ns = append(ns, int64(math.Exp(rng.Float64()*math.Log(1e9))))
	}
	for _, n := range ns {
		for k := int64(1); k <= n/2; k++ {
			want := new(big.Int).Binomial(n, k)
			if want.Cmp(limit) > 0 {
				break
			}
			if k > 40 && k%7 != 0 && !long {
				continue
			}
			wf := bnew().SetInt(want)
			r.add(relOff(Choose(int(n), int(k)), wf), fmt.Sprintf("n=%d k=%d", n, k))
			naive := math.Exp(lgammaNaive(float64(n)+1) - lgammaNaive(float64(k)+1) - lgammaNaive(float64(n-k)+1))
			r.naive = math.Max(r.naive, relOff(naive, wf))
		}
	}
	return r
}

func accLogChoose(t *testing.T) *accRow {
	// ln C(n,k) over the whole range of k, including C far above 1e308.
	r := &accRow{name: "LogChoose", domain: "n ≤ 1e9, any k", unit: "ulp", bound: 1}
	rng := rand.New(rand.NewSource(3))
	for i := 0; i < scale(200); i++ {
		n := int64(math.Exp(rng.Float64() * math.Log(1e9)))
		k := rng.Int63n(n + 1)
		want := bnew().Sub(refLnFact(n), refLnFact(k))
		want.Sub(want, refLnFact(n-k))
		if want.Sign() == 0 {
			continue
		}
		r.add(ulpsOff(LogChoose(int(n), int(k)), want), fmt.Sprintf("n=%d k=%d", n, k))
	}
	return r
}

// refPoissonLog returns k ln λ − λ − ln k!.
func refPoissonLog(k int64, lambda float64) *big.Float {
	l := bf(lambda)
	want := bnew().Mul(bi(k), refLog(l))
	want.Sub(want, l)
	return want.Sub(want, refLnFact(k))
}

func accPoisson(t *testing.T) *accRow {
	// pmf ≥ 1e-300 for λ up to 10⁸: k on a grid of standard deviations
	// around λ and near 0.
	r := &accRow{name: "PoissonPMF", domain: "pmf ≥ 1e-300, λ ≤ 1e8", unit: "rel", bound: 1e-13}
	rng := rand.New(rand.NewSource(4))
	for i := 0; i < scale(60); i++ {
		lambda := math.Exp(rng.Float64()*math.Log(1e11) - math.Log(1e3))
		sd := math.Sqrt(lambda)
		ks := map[int64]bool{0: true, 1: true, 2: true, 7: true}
		for z := -40.0; z <= 40; z += 2.5 + rng.Float64() {
			if k := int64(lambda + z*sd); k >= 0 {
				ks[k] = true
			}
		}
		for k := range ks {
			lw := refPoissonLog(k, lambda)
			if f, _ := lw.Float64(); f < math.Log(1e-300) {
				continue
			}
			want := refExp(lw)
			r.add(relOff(PoissonPMF(int(k), lambda), want), fmt.Sprintf("k=%d λ=%.6g", k, lambda))
			lk, _ := math.Lgamma(float64(k) + 1)
			naive := math.Exp(float64(k)*math.Log(lambda) - lambda - lk)
			r.naive = math.Max(r.naive, relOff(naive, want))
		}
	}
	return r
}

// refBinomialLog returns ln C(n,k) + k ln p + (n−k) ln(1−p).
func refBinomialLog(k, n int64, p float64) *big.Float {
	pb := bf(p)
	q := bnew().Sub(bi(1), pb)
	want := bnew().Sub(refLnFact(n), refLnFact(k))
	want.Sub(want, refLnFact(n-k))
	want.Add(want, bnew().Mul(bi(k), refLog(pb)))
	return want.Add(want, bnew().Mul(bi(n-k), refLog(q)))
}

func accBinomial(t *testing.T) *accRow {
	r := &accRow{name: "BinomialPMF", domain: "pmf ≥ 1e-300, n ≤ 1e8", unit: "rel", bound: 1e-13}
	rng := rand.New(rand.NewSource(5))
	for i := 0; i < scale(50); i++ {
		n := int64(math.Exp(rng.Float64() * math.Log(1e8)))
		p := []float64{1e-7, 0.001, 0.1, 0.3, 0.5, 0.77, 0.999}[rng.Intn(7)] * (1 + 0.0005*rng.Float64())
		mean, sd := float64(n)*p, math.Sqrt(float64(n)*p*(1-p))
		ks := map[int64]bool{0: true, 1: true, n: true, n - 1: true}
		for z := -40.0; z <= 40; z += 3 + rng.Float64() {
			if k := int64(mean + z*sd); k >= 0 && k <= n {
				ks[k] = true
			}
		}
		for k := range ks {
			if k < 0 || k > n {
				continue
			}
			lw := refBinomialLog(k, n, p)
			if f, _ := lw.Float64(); f < math.Log(1e-300) {
				continue
			}
			want := refExp(lw)
			r.add(relOff(BinomialPMF(int(k), int(n), p), want), fmt.Sprintf("k=%d n=%d p=%.6g", k, n, p))
			naive := math.Exp(lgammaNaive(float64(n)+1) - lgammaNaive(float64(k)+1) - lgammaNaive(float64(n-k)+1) +
				float64(k)*math.Log(p) + float64(n-k)*math.Log1p(-p))
			r.naive = math.Max(r.naive, relOff(naive, want))
		}
	}
	return r
}

func accHypergeometric(t *testing.T) *accRow {
	r := &accRow{name: "HypergeometricPMF", domain: "pmf ≥ 1e-300, total ≤ 1e8", unit: "rel", bound: 1e-13}
	rng := rand.New(rand.NewSource(6))
	for i := 0; i < scale(60); i++ {
		total := int64(math.Exp(rng.Float64()*math.Log(1e8))) + 2
		succ := rng.Int63n(total + 1)
		draws := rng.Int63n(total + 1)
		lo, hi := max(0, draws+succ-total), min(draws, succ)
		mean := float64(draws) * float64(succ) / float64(total)
		for _, k := range []int64{lo, hi, int64(mean), int64(mean) + 1, int64(mean * 0.9), int64(mean * 1.1)} {
			if k < lo || k > hi {
				continue
			}
			lw := bnew().Add(refLnChoose(succ, k), refLnChoose(total-succ, draws-k))
			lw.Sub(lw, refLnChoose(total, draws))
			if f, _ := lw.Float64(); f < math.Log(1e-300) {
				continue
			}
			r.add(relOff(HypergeometricPMF(int(k), int(total), int(succ), int(draws)), refExp(lw)),
				fmt.Sprintf("k=%d N=%d K=%d n=%d", k, total, succ, draws))
		}
	}
	return r
}

func refLnChoose(n, k int64) *big.Float {
	w := bnew().Sub(refLnFact(n), refLnFact(k))
	return w.Sub(w, refLnFact(n-k))
}

func accLogGamma(t *testing.T) *accRow {
	// Positive reals, the zeros of ln Γ at 1 and 2 included; the measure
	// is ulps of the result.
	r := &accRow{name: "LogGamma", domain: "x in (1e-300, 1e15), near 1 and 2", unit: "ulp", bound: 1}
	rng := rand.New(rand.NewSource(7))
	for i := 0; i < scale(400); i++ {
		x := math.Exp(rng.Float64()*math.Log(1e15)*1.2 - math.Log(1e15)*0.2)
		if i < 20 {
			x = math.Exp(-rng.Float64() * 690)
		}
		if i%4 == 3 {
			// next to the zeros: 1 or 2 plus up to 2^-10 relative
			x = float64(1+i%2) * (1 + (rng.Float64()-0.5)*math.Exp(-rng.Float64()*30))
		}
		want := refLnGamma(bf(x))
		r.add(ulpsOff(LogGamma(x), want), fmt.Sprintf("x=%.17g", x))
		r.naive = math.Max(r.naive, ulpsOff(lgammaNaive(x), want))
	}
	return r
}

func accGammaRatio(t *testing.T) *accRow {
	r := &accRow{name: "GammaRatio", domain: "a, b in (0, 1e12), ratio normal", unit: "rel", bound: 1e-14}
	rng := rand.New(rand.NewSource(8))
	for i := 0; i < scale(300); i++ {
		a := math.Exp(rng.Float64()*math.Log(1e12)*1.1 - math.Log(1e12)*0.1)
		b := a + (rng.Float64()-0.5)*math.Min(2*a, 200)
		if b <= 0 {
			b = a / 2
		}
		lw := bnew().Sub(refLnGamma(bf(a)), refLnGamma(bf(b)))
		if f, _ := lw.Float64(); math.Abs(f) > 700 {
			continue
		}
		want := refExp(lw)
		r.add(relOff(GammaRatio(a, b), want), fmt.Sprintf("a=%.17g b=%.17g", a, b))
		r.naive = math.Max(r.naive, relOff(math.Exp(lgammaNaive(a)-lgammaNaive(b)), want))
	}
	return r
}

func accBeta(t *testing.T) *accRow {
	r := &accRow{name: "Beta", domain: "a, b in (1e-3, 1e10), B normal", unit: "rel", bound: 1e-14}
	rng := rand.New(rand.NewSource(9))
	for i := 0; i < scale(200); i++ {
		a := math.Exp(rng.Float64()*math.Log(1e13) - math.Log(1e3))
		b := math.Exp(rng.Float64()*math.Log(1e13) - math.Log(1e3))
		s := bnew().Add(bf(a), bf(b)) // exact enough at 256 bits
		lw := bnew().Add(refLnGamma(bf(a)), refLnGamma(bf(b)))
		lw.Sub(lw, refLnGamma(s))
		if f, _ := lw.Float64(); math.Abs(f) > 700 {
			continue
		}
		want := refExp(lw)
		r.add(relOff(Beta(a, b), want), fmt.Sprintf("a=%.17g b=%.17g", a, b))
		r.naive = math.Max(r.naive, relOff(math.Exp(lgammaNaive(a)+lgammaNaive(b)-lgammaNaive(a+b)), want))
	}
	return r
}

func accRising(t *testing.T) *accRow {
	// Against the product x(x+1)…(x+n−1) multiplied out in math/big.
	r := &accRow{name: "Rising", domain: "x in ±(1e-3, 1e6), n ≤ 300", unit: "rel", bound: 1e-14}
	rng := rand.New(rand.NewSource(10))
	for i := 0; i < scale(300); i++ {
		x := math.Exp(rng.Float64()*math.Log(1e9) - math.Log(1e3))
		if rng.Intn(3) == 0 {
			x = -x
		}
		n := 1 + rng.Intn(300)
		p := bi(1)
		for j := 0; j < n; j++ {
			p.Mul(p, bnew().Add(bf(x), bi(int64(j))))
		}
		if p.Sign() == 0 {
			continue
		}
		if f, _ := p.Float64(); math.IsInf(f, 0) || math.Abs(f) < 1e-300 {
			continue
		}
		r.add(relOff(Rising(x, n), p), fmt.Sprintf("x=%.17g n=%d", x, n))
	}
	return r
}

func accFalling(t *testing.T) *accRow {
	r := &accRow{name: "Falling", domain: "n ≤ 1e12, result normal", unit: "rel", bound: 1e-14}
	rng := rand.New(rand.NewSource(11))
	for i := 0; i < scale(300); i++ {
		n := int64(math.Exp(rng.Float64() * math.Log(1e12)))
		k := rng.Int63n(min(n, 200) + 1)
		want := bi(1)
		if k > 0 {
			want = bnew().SetInt(new(big.Int).MulRange(n-k+1, n))
		}
		if f, _ := want.Float64(); math.IsInf(f, 0) {
			continue
		}
		r.add(relOff(Falling(int(n), int(k)), want), fmt.Sprintf("n=%d k=%d", n, k))
	}
	return r
}

func accPowOverFactorial(t *testing.T) *accRow {
	r := &accRow{name: "PowOverFactorial", domain: "|x| in (1e-3, 1e6), k ≤ 1e6", unit: "rel", bound: 1e-14}
	rng := rand.New(rand.NewSource(12))
	for i := 0; i < scale(300); i++ {
		x := math.Exp(rng.Float64()*math.Log(1e9) - math.Log(1e3))
		k := int64(math.Exp(rng.Float64() * math.Log(1e6)))
		lw := bnew().Mul(bi(k), refLog(bf(x)))
		lw.Sub(lw, refLnFact(k))
		if f, _ := lw.Float64(); math.Abs(f) > 700 {
			continue
		}
		want := refExp(lw)
		r.add(relOff(PowOverFactorial(x, int(k)), want), fmt.Sprintf("x=%.17g k=%d", x, k))
	}
	return r
}

func accStirling(t *testing.T) *accRow {
	// δ(x) = ln Γ(x+1) − [(x+½)ln x − x + ½ln 2π] at 256 bits.
	r := &accRow{name: "StirlingRemainder", domain: "x in (1e-3, 1e12)", unit: "rel", bound: 1e-14}
	rng := rand.New(rand.NewSource(13))
	half := refHalfLn2Pi()
	for i := 0; i < scale(300); i++ {
		x := math.Exp(rng.Float64()*math.Log(1e15) - math.Log(1e3))
		if i%3 == 0 {
			x = math.Max(1, math.Round(x))
		}
		xb := bf(x)
		s := bnew().Mul(bnew().Add(xb, bf(0.5)), refLog(xb))
		s.Sub(s, xb)
		s.Add(s, half)
		want := bnew().Sub(refLnGamma(bnew().Add(xb, bi(1))), s)
		r.add(relOff(StirlingRemainder(x), want), fmt.Sprintf("x=%.17g", x))
	}
	return r
}

func accMultinomial(t *testing.T) *accRow {
	r := &accRow{name: "LogMultinomial", domain: "2-6 parts of up to 1e8", unit: "ulp", bound: 1}
	rng := rand.New(rand.NewSource(14))
	for i := 0; i < scale(150); i++ {
		ks := make([]int, 2+rng.Intn(5))
		var s int64
		want := bnew()
		for j := range ks {
			ks[j] = int(math.Exp(rng.Float64() * math.Log(1e8)))
			s += int64(ks[j])
			want.Sub(want, refLnFact(int64(ks[j])))
		}
		want.Add(want, refLnFact(s))
		r.add(ulpsOff(LogMultinomial(ks...), want), fmt.Sprint(ks))
	}
	return r
}
