package analyzer

import (
	"math"
	"math/big"
	"regexp"
	"strconv"
	"testing"

	"golang.org/x/tools/go/analysis/analysistest"
)

// TestDivisorFirstAgainstBig takes the threshold the finding on
// factorialratio's Next (n!/(n+1)!) and Rising (k!/(k+j)!) states and
// checks it against the code's own float64 arithmetic beside math/big:
// one below it the quotient is the exact 1/(n+1) (1/((k+1)⋯(k+j)) for
// every split of the sum), at it the quotient is 0 while the exact
// value, a big.Rat, is a normal float64.
func TestDivisorFirstAgainstBig(t *testing.T) {
	results := analysistest.Run(t, analysistest.TestData(), Analyzer, "factorialratio")
	stated := map[string]int64{}
	re := regexp.MustCompile(`the divisor \((n \+ 1|k \+ j)\)! overflows to \+Inf for (?:n \+ 1|k \+ j) ≥ (\d+)`)
	for _, r := range results {
		for _, d := range r.Diagnostics {
			if m := re.FindStringSubmatch(d.Message); m != nil {
				v, _ := strconv.ParseInt(m[2], 10, 64)
				stated[m[1]] = v
			}
		}
	}
	if len(stated) != 2 {
		t.Fatalf("thresholds found %v, want those of n + 1 and k + j", stated)
	}
	factF := func(n int64) float64 { // factorialratio's factF
		r := 1.0
		for i := int64(2); i <= n; i++ {
			r *= float64(i)
		}
		return r
	}
	// exact is a!/b! from math/big as the nearest float64, and whether it
	// is a normal float64.
	exact := func(a, b int64) (float64, bool) {
		q := new(big.Rat).SetFrac(new(big.Int).MulRange(1, a), new(big.Int).MulRange(1, b))
		f, _ := q.Float64()
		return f, f >= 0x1p-1022
	}
	for _, tc := range []struct {
		form string
		gap  int64 // the divisor's argument minus the numerator's
	}{{"n + 1", 1}, {"k + j", 1}, {"k + j", 2}, {"k + j", 40}} {
		first := stated[tc.form]
		for _, top := range []int64{first - 1, first} {
			a := top - tc.gap
			got := factF(a) / factF(top)
			want, normal := exact(a, top)
			if !normal {
				t.Fatalf("%s: %d!/%d! = %g is not a normal float64", tc.form, a, top, want)
			}
			switch {
			case top < first && math.Abs(got-want) > 1e-13*want:
				t.Errorf("%s: below the stated %d, %d!/%d! = %g, want %g", tc.form, first, a, top, got, want)
			case top == first && got != 0:
				t.Errorf("%s: at the stated %d, %d!/%d! = %g, want 0 (the divisor +Inf)", tc.form, first, a, top, got)
			}
		}
	}
}

// TestFirstIntermediateAgainstBig takes the input each finding on
// factorialratio's intermediate.go states (Triangles, PairNorm, Walks)
// and runs the function's own float64 arithmetic there and one step
// below on the stated line, beside its exact value from math/big (a
// big.Rat; PairNorm's square root from big.Float.Sqrt): one below, the
// float64 value is the exact one to 1e-12; at the stated input it is
// +Inf, NaN or 0 while the exact value is a normal float64.
func TestFirstIntermediateAgainstBig(t *testing.T) {
	results := analysistest.Run(t, analysistest.TestData(), Analyzer, "factorialratio")
	res := map[string]*regexp.Regexp{
		"Triangles": regexp.MustCompile(`intermediate \(a \+ b\)!.* at a = b = c = (\d+) \(all equal\)`),
		"PairNorm":  regexp.MustCompile(`intermediate \(j \+ m\)!.* at j = (\d+), m = 0 `),
		"Walks":     regexp.MustCompile(`intermediate 8\^n.* at n = (\d+) on`),
	}
	stated := map[string]int64{}
	for _, r := range results {
		for _, d := range r.Diagnostics {
			for name, re := range res {
				if m := re.FindStringSubmatch(d.Message); m != nil {
					stated[name], _ = strconv.ParseInt(m[1], 10, 64)
				}
			}
		}
	}
	if len(stated) != len(res) {
		t.Fatalf("inputs found %v, want one for each of %d functions", stated, len(res))
	}
	factF := func(n int) float64 { // factorialratio's factF
		r := 1.0
		for i := 2; i <= n; i++ {
			r *= float64(i)
		}
		return r
	}
	fact := func(n int) *big.Rat { return new(big.Rat).SetInt(new(big.Int).MulRange(1, int64(n))) }
	ratio := func(num, den []int, pow2 int) *big.Rat {
		q := new(big.Rat).SetInt(new(big.Int).Lsh(big.NewInt(1), uint(pow2)))
		for _, n := range num {
			q.Mul(q, fact(n))
		}
		for _, n := range den {
			q.Quo(q, fact(n))
		}
		return q
	}
	sqrt := func(q *big.Rat) float64 {
		f := new(big.Float).SetPrec(200).SetRat(q)
		v, _ := f.Sqrt(f).Float64()
		return v
	}
	funcs := map[string]func(x int) (got, want float64){
		"Triangles": func(x int) (float64, float64) {
			a, b, c := x, x, x
			got := factF(a+b) * factF(b+c) * factF(a+c) / (factF(a) * factF(b) * factF(c) * factF(a+b+c))
			want, _ := ratio([]int{a + b, b + c, a + c}, []int{a, b, c, a + b + c}, 0).Float64()
			return got, want
		},
		"PairNorm": func(x int) (float64, float64) {
			j, m := x, 0
			got := math.Sqrt(factF(j+m) * factF(j-m) * factF(j) * factF(j) / factF(2*j+1))
			return got, sqrt(ratio([]int{j + m, j - m, j, j}, []int{2*j + 1}, 0))
		},
		"Walks": func(n int) (float64, float64) {
			num := math.Pow(8, float64(n)) * factF(n) * factF(n)
			got := num / factF(2*n)
			want, _ := ratio([]int{n, n}, []int{2 * n}, 3*n).Float64()
			return got, want
		},
	}
	for name, f := range funcs {
		first := int(stated[name])
		for _, x := range []int{first - 1, first} {
			got, want := f(x)
			if want < 0x1p-1022 || math.IsInf(want, 0) {
				t.Fatalf("%s(%d): the exact value %g is not a normal float64", name, x, want)
			}
			right := math.Abs(got-want) <= 1e-12*want
			switch {
			case x < first && !right:
				t.Errorf("%s: below the stated %d, at %d the code gives %g, exact %g", name, first, x, got, want)
			case x == first && right:
				t.Errorf("%s: at the stated %d the code still gives the exact %g", name, first, want)
			case x == first && !(math.IsInf(got, 0) || math.IsNaN(got) || got == 0):
				t.Errorf("%s: at the stated %d the code gives %g, want +Inf, NaN or 0", name, first, got)
			}
		}
	}
}
