package lgamma

import (
	"math"
	"testing"
	"time"
)

// BenchmarkRatio times each function against the formula it replaces in
// the same run, on the same arguments, and reports both per call and
// their ratio (go test -run '^$' -bench Ratio ./fixes/lgamma). The two
// loops alternate in blocks, so both see the same machine load; the
// ratio is the figure docs/numerics.md records, never an assertion.
func BenchmarkRatio(b *testing.B) {
	lg := func(x float64) float64 { v, _ := math.Lgamma(x); return v }
	xs := make([]float64, 256)
	for i := range xs {
		// spread over (0, 200) and beyond: every branch of LogGamma
		xs[i] = math.Exp(float64(i%64)/8-2) + float64(i/64)
	}
	bigN := make([]int, 256)
	for i := range bigN {
		bigN[i] = 1024 + (i*7919)%(1<<20)*(1+i%7*1000)
	}
	type pair struct{ n, k int }
	chooseArgs := make([]pair, 256)
	for i := range chooseArgs {
		n := 10 + (i*7919)%100000
		chooseArgs[i] = pair{n, (i * 104729) % (n/2 + 1)}
	}
	poisson := make([]struct {
		k      int
		lambda float64
	}, 256)
	for i := range poisson {
		l := math.Exp(float64(i%40) / 3)
		poisson[i].lambda, poisson[i].k = l, int(l+math.Sqrt(l)*float64(i%5-2))
		if poisson[i].k < 1 {
			poisson[i].k = 1
		}
	}
	binom := make([]struct {
		k, n int
		p    float64
	}, 256)
	for i := range binom {
		n := 2 + (i*7919)%1000000
		p := 0.01 + float64(i%97)/100
		binom[i].n, binom[i].p = n, p
		binom[i].k = int(float64(n) * p)
	}
	cases := []struct {
		name        string
		fast, naive func(i int) float64
	}{
		{"LogGamma/math.Lgamma", func(i int) float64 { return LogGamma(xs[i]) }, func(i int) float64 { return lg(xs[i]) }},
		{"LogFactorial(n≥1024)/math.Lgamma", func(i int) float64 { return LogFactorial(bigN[i]) },
			func(i int) float64 { return lg(float64(bigN[i]) + 1) }},
		{"Choose/naive", func(i int) float64 { a := chooseArgs[i]; return Choose(a.n, a.k) },
			func(i int) float64 {
				a := chooseArgs[i]
				return math.Exp(lg(float64(a.n)+1) - lg(float64(a.k)+1) - lg(float64(a.n-a.k)+1))
			}},
		{"PoissonPMF/naive", func(i int) float64 { a := poisson[i]; return PoissonPMF(a.k, a.lambda) },
			func(i int) float64 {
				a := poisson[i]
				return math.Exp(float64(a.k)*math.Log(a.lambda) - a.lambda - lg(float64(a.k)+1))
			}},
		{"BinomialPMF/naive", func(i int) float64 { a := binom[i]; return BinomialPMF(a.k, a.n, a.p) },
			func(i int) float64 {
				a := binom[i]
				n, k := float64(a.n), float64(a.k)
				return math.Exp(lg(n+1) - lg(k+1) - lg(n-k+1) + k*math.Log(a.p) + (n-k)*math.Log1p(-a.p))
			}},
	}
	for _, c := range cases {
		b.Run(c.name, func(b *testing.B) {
			var tf, tn time.Duration
			s := 0.0
			for done := 0; done < b.N; done += 256 {
				t0 := time.Now()
				for i := 0; i < 256; i++ {
					s += c.fast(i)
				}
				t1 := time.Now()
				for i := 0; i < 256; i++ {
					s += c.naive(i)
				}
				tf += t1.Sub(t0)
				tn += time.Since(t1)
			}
			sinkF = s
			calls := float64((b.N + 255) / 256 * 256)
			b.ReportMetric(float64(tf.Nanoseconds())/calls, "ns/call")
			b.ReportMetric(float64(tn.Nanoseconds())/calls, "naive-ns/call")
			b.ReportMetric(float64(tf)/float64(tn), "ratio")
		})
	}
}
