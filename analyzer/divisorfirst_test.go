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
