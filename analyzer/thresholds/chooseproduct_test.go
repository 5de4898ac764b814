package thresholds

import (
	"math/big"
	"testing"
)

// TestChooseProductWitness checks the witness of C(n, k)·C(n−k, j), a
// trinomial n!/(k!·j!·(n−k−j)!) (DLMF 26.4.2, from memory), and of
// C(a, b)·C(a, b), against a plain math/big scan: the point found has
// every factor in 0 ≤ k ≤ n and in the type and the product past it, and
// no point with a smaller largest coordinate (or an earlier one with the
// same) has.
func TestChooseProductWitness(t *testing.T) {
	cases := []struct {
		name   string
		ns, ks []IntForm
		d      int
	}{
		{"trinomial", []IntForm{{0, []int64{1, 0, 0}}, {0, []int64{1, -1, 0}}}, []IntForm{{0, []int64{0, 1, 0}}, {0, []int64{0, 0, 1}}}, 3},
		{"square", []IntForm{{0, []int64{1, 0}}, {0, []int64{1, 0}}}, []IntForm{{0, []int64{0, 1}}, {0, []int64{0, 1}}}, 2},
	}
	for _, name := range []string{"int32", "int64"} {
		num, _ := Named(name, nil)
		lim := num.maxInt()
		for _, c := range cases {
			lo, hi := make([]int64, c.d), make([]int64, c.d)
			for i := range hi {
				hi[i] = 1 << 40
			}
			x, factors, prod, ok := ChooseProductWitness(num, c.ns, c.ks, lo, hi)
			if !ok {
				t.Fatalf("%s, %s: no witness", name, c.name)
			}
			// witnessAt recomputes the conditions at p with math/big.
			witnessAt := func(p []int64) bool {
				prod := big.NewInt(1)
				for j := range c.ns {
					n, k := c.ns[j].at(p), c.ks[j].at(p)
					if k < 0 || k > n {
						return false
					}
					v := new(big.Int).Binomial(n, k)
					if v.CmpAbs(lim) > 0 {
						return false
					}
					prod.Mul(prod, v)
				}
				return prod.CmpAbs(lim) > 0
			}
			if !witnessAt(x) {
				t.Errorf("%s, %s: %v is no witness", name, c.name, x)
			}
			exact := big.NewInt(1)
			for j := range c.ns {
				exact.Mul(exact, new(big.Int).Binomial(c.ns[j].at(x), c.ks[j].at(x)))
			}
			if exact.Cmp(prod) != 0 || len(factors) != len(c.ns) {
				t.Errorf("%s, %s: product %v, want %v", name, c.name, prod, exact)
			}
			m := int64(0)
			for _, v := range x {
				m = max(m, v)
			}
			// Every point whose largest coordinate is below m is no
			// witness.
			p := make([]int64, c.d)
			var scan func(i int)
			scan = func(i int) {
				if i == c.d {
					if witnessAt(p) {
						t.Errorf("%s, %s: %v is a witness with a smaller largest coordinate than %v", name, c.name, p, x)
					}
					return
				}
				for v := int64(0); v < m; v++ {
					p[i] = v
					scan(i + 1)
				}
			}
			scan(0)
		}
	}
}
