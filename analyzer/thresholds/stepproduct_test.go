package thresholds

import (
	"math"
	"math/big"
	"math/bits"
	"testing"
)

// exactSeq is a StepSeq from an exact sequence, its logarithm from the
// exact value.
func exactSeq(f func(n int64) *big.Int) StepSeq {
	return StepSeq{
		Log:   func(n int64) (float64, bool) { return logBig(f(n)), true },
		Exact: func(n int64) (*big.Int, bool) { return f(n), true },
	}
}

// runStep runs acc = acc*mul(k)/div(k) for k < n in uint64 or int64 as
// the machine does, and reports the first n whose last trip's product
// wraps (math/bits, exact in 128 bits).
func runStep(signed bool, mul, div func(k uint64) uint64, limit int) int64 {
	acc := uint64(1)
	for n := 1; n <= limit; n++ {
		k := uint64(n - 1)
		hi, lo := bits.Mul64(acc, mul(k))
		if hi != 0 || signed && lo > math.MaxInt64 {
			return int64(n)
		}
		acc = lo / div(k)
	}
	return -1
}

// TestStepProduct checks the first wrapping count of two running
// products against the loops run in machine integers (math/bits) and
// the values against math/big: the Catalan numbers' step
// c·2(2k+1)/(k+2) (OEIS A000108, C_n = C(2n, n)/(n+1)) and the
// pairings' step m·(2k+1)(2k+2)/(2(k+1)), whose value is (2n−1)!!
// (OEIS A001147).
func TestStepProduct(t *testing.T) {
	catalanStep := func(n int64) *big.Int { // C_{n−1}·2(2n−1) = C_n·(n+1)
		c := catalan(n)
		return c.Mul(c, big.NewInt(n+1))
	}
	pairs := func(n int64) *big.Int { // (2n−1)!!
		out := big.NewInt(1)
		for i := int64(1); i < 2*n; i += 2 {
			out.Mul(out, big.NewInt(i))
		}
		return out
	}
	pairStep := func(n int64) *big.Int { // (2n−3)!!·(2n−1)(2n) = (2n−1)!!·2n
		p := pairs(n)
		return p.Mul(p, big.NewInt(2*n))
	}
	for _, c := range []struct {
		name        string
		value, step func(int64) *big.Int
		mul, div    func(k uint64) uint64
	}{
		{"catalan", catalan, catalanStep, func(k uint64) uint64 { return 2 * (2*k + 1) }, func(k uint64) uint64 { return k + 2 }},
		{"pairings", pairs, pairStep, func(k uint64) uint64 { return (2*k + 1) * (2*k + 2) }, func(k uint64) uint64 { return 2 * (k + 1) }},
	} {
		for _, name := range []string{"uint64", "int64"} {
			num := mustNamed(t, name, nil)
			first, last, ok := StepProduct(num, 1, exactSeq(c.value), exactSeq(c.step))
			want := runStep(num.Signed, c.mul, c.div, 200)
			if !ok || first != want {
				t.Errorf("%s in %s: first wrapping count %d (ok %v), the loop run in %s wraps first at %d", c.name, name, first, ok, name, want)
			}
			lim := num.MaxInt()
			if c.value(last).Cmp(lim) > 0 || c.value(last+1).Cmp(lim) <= 0 {
				t.Errorf("%s in %s: value fits up to %d, math/big disagrees", c.name, name, last)
			}
			if first > last {
				t.Errorf("%s in %s: the product wraps at %d, past the value's own limit %d", c.name, name, first, last)
			}
		}
	}
	// A value that never leaves the type within the scan gives no answer.
	lin := func(n int64) *big.Int { return big.NewInt(n + 1) }
	if _, _, ok := StepProduct(mustNamed(t, "int64", nil), 1, exactSeq(lin), exactSeq(lin)); ok {
		t.Error("a slowly growing value reported a wrapping step")
	}
}
