package analyzer

import (
	"math/big"
	"testing"

	"github.com/overfact/overfact/analyzer/thresholds"
)

// partsFirstWrong multiplies C(s_i, p_i) over the running sums s_i of
// the parts in the machine type T, each factor exact (it fits), as the
// loops checkBinomialPartsLoops reports do, and returns the first total
// N whose product differs from math/big's: parts(N) gives the parts.
func partsFirstWrong[T int64 | uint64](parts func(n int64) []int64) int64 {
	for n := int64(1); n < 200; n++ {
		prod, exact := T(1), big.NewInt(1)
		total := int64(0)
		for _, p := range parts(n) {
			total += p
			c := new(big.Int).Binomial(total, p)
			prod *= T(c.Uint64())
			exact.Mul(exact, c)
		}
		if machineBig(prod).Cmp(exact) != 0 {
			return n
		}
	}
	return -1
}

// TestBinomialPartsThresholds checks the two totals the message names:
// with parts of 1 the product is N! (thresholds.Factorial), with two
// equal halves C(N, ⌊N/2⌋) (thresholds.CentralBinomial); the multinomial
// is the product of binomials over running sums (DLMF 26.4.2, from
// memory), which math/big forms exactly here.
func TestBinomialPartsThresholds(t *testing.T) {
	ones := func(n int64) []int64 {
		out := make([]int64, n)
		for i := range out {
			out[i] = 1
		}
		return out
	}
	halves := func(n int64) []int64 { return []int64{n / 2, n - n/2} }
	for name, got := range map[string][2]int64{
		"int64":  {partsFirstWrong[int64](ones), partsFirstWrong[int64](halves)},
		"uint64": {partsFirstWrong[uint64](ones), partsFirstWrong[uint64](halves)},
	} {
		num, _ := thresholds.Named(name, nil)
		if want := thresholds.Factorial(num).FirstBad; got[0] != want {
			t.Errorf("%s, parts of 1: the product is first wrong at total %d, the message says %d", name, got[0], want)
		}
		if want := thresholds.CentralBinomial(num).FirstBad; got[1] != want {
			t.Errorf("%s, two halves: the product is first wrong at total %d, the message says %d", name, got[1], want)
		}
	}
	// From memory: 3 parts of sizes 1, 2, 3 share 6 items in 6!/(1!2!3!)
	// = 60 ways.
	if got := new(big.Int).Mul(new(big.Int).Binomial(3, 2), new(big.Int).Binomial(6, 3)); got.Int64() != 60 {
		t.Errorf("C(3, 2)·C(6, 3) = %v, want 60", got)
	}
}
