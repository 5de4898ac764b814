package thresholds

import (
	"math"
	"math/big"
	"testing"
)

// polyMax multiplies out the rule's generating function exactly with
// math/big, rows Start…rows, and returns its largest coefficient of
// x^s for s ≤ top: ∏ (1 + x^d) for a falling rule, ∏ 1/(1 − x^d) as
// the series Σ x^(j·d) for a rising one. This is the textbook reading
// of the two dynamic programs (common practice), not their loops.
func polyMax(cr CountRule, rows, top int64) *big.Int {
	c := make([]*big.Int, top+1)
	for i := range c {
		c[i] = new(big.Int)
	}
	c[0].SetInt64(1)
	for r := cr.Start; r <= rows; r++ {
		d := cr.part(r)
		next := make([]*big.Int, top+1)
		for s := range next {
			next[s] = new(big.Int).Set(c[s])
			for j := int64(1); int64(s)-j*d >= 0; j++ {
				next[s].Add(next[s], c[int64(s)-j*d])
				if cr.Falling {
					break
				}
			}
		}
		c = next
	}
	m := new(big.Int)
	for _, v := range c {
		if v.Cmp(m) > 0 {
			m.Set(v)
		}
	}
	return m
}

// subsetCount counts the subsets of {1…n} with sum s by visiting each
// of the 2^n subsets.
func subsetCount(n, s int64) int64 {
	count := int64(0)
	for mask := int64(0); mask < 1<<n; mask++ {
		sum := int64(0)
		for i := int64(0); i < n; i++ {
			if mask&(1<<i) != 0 {
				sum += i + 1
			}
		}
		if sum == s {
			count++
		}
	}
	return count
}

// partitionsEuler returns p(0…n) by Euler's pentagonal number theorem
// (DLMF 27.14.1 and 27.14.3), another algorithm than the table's.
func partitionsEuler(n int64) []*big.Int {
	p := make([]*big.Int, n+1)
	p[0] = big.NewInt(1)
	for m := int64(1); m <= n; m++ {
		p[m] = new(big.Int)
		for k := int64(1); ; k++ {
			g1, g2 := k*(3*k-1)/2, k*(3*k+1)/2
			if g1 > m {
				break
			}
			sign := 1
			if k%2 == 0 {
				sign = -1
			}
			for _, g := range []int64{g1, g2} {
				if g <= m {
					if sign > 0 {
						p[m].Add(p[m], p[m-g])
					} else {
						p[m].Sub(p[m], p[m-g])
					}
				}
			}
		}
	}
	return p
}

// Table ends: every entry a rule makes (a falling rule's end is the sum
// of its parts), a fixed end, and an end at the row.
var (
	whole    = func(int64) (int64, bool) { return math.MaxInt64, true }
	diagonal = func(r int64) (int64, bool) { return r, true }
)

func fixed(end int64) func(int64) (int64, bool) {
	return func(int64) (int64, bool) { return end, true }
}

func TestCountTableEntries(t *testing.T) {
	subsets := CountRule{Falling: true, Start: 1, Alpha: 1}
	// The table's entries against a count over every subset.
	for n := int64(1); n <= 12; n++ {
		c := make([]uint64, n*(n+1)/2+1)
		c[0] = 1
		for r := int64(1); r <= n; r++ {
			subsets.countRow(c, nil, r, math.MaxUint64)
		}
		for s := range c {
			if want := subsetCount(n, int64(s)); c[s] != uint64(want) {
				t.Fatalf("subsets of {1…%d} with sum %d: table %d, count %d", n, s, c[s], want)
			}
		}
	}
	// OEIS A025591, the largest count of subsets of {1…n} with one
	// sum, from memory: 1, 1, 1, 2, 2, 3, 5, 8, 14, 23, 40, 70, 124, 221.
	for n, want := range []int64{1, 1, 1, 2, 2, 3, 5, 8, 14, 23, 40, 70, 124, 221} {
		top := int64(n * (n + 1) / 2)
		if got := polyMax(subsets, int64(n), top); got.Int64() != want {
			t.Errorf("A025591(%d) = %v, want %d", n, got, want)
		}
	}
	// Pascal's rows against math/big.
	pascal := CountRule{Falling: true, Start: 1, Beta: 1}
	c := make([]uint64, 41)
	c[0] = 1
	for r := int64(1); r <= 40; r++ {
		pascal.countRow(c, nil, r, math.MaxUint64)
	}
	for s := range c {
		if want := new(big.Int).Binomial(40, int64(s)); want.Uint64() != c[s] {
			t.Fatalf("C(40, %d): table %d, math/big %v", s, c[s], want)
		}
	}
	// Partitions against Euler's recurrence.
	parts := CountRule{Start: 1, Alpha: 1}
	c = make([]uint64, 201)
	c[0] = 1
	for r := int64(1); r <= 200; r++ {
		parts.countRow(c, nil, r, math.MaxUint64)
	}
	p := partitionsEuler(200)
	for s := range c {
		if p[s].Uint64() != c[s] {
			t.Fatalf("p(%d): table %d, Euler %v", s, c[s], p[s])
		}
	}
	// OEIS A000041, from memory: p(100) = 190569292.
	if p[100].Int64() != 190569292 {
		t.Errorf("p(100) = %v, want 190569292", p[100])
	}
}

func TestCountTableRows(t *testing.T) {
	rules := []CountRule{
		{Falling: true, Start: 1, Alpha: 1}, // subsets by sum
		{Falling: true, Start: 1, Beta: 1},  // Pascal's rows
		{Falling: true, Start: 0, Alpha: 1, Beta: 2},
	}
	for _, name := range []string{"int16", "uint32", "int64", "uint64"} {
		num, _ := Named(name, nil)
		max := num.maxInt()
		for _, cr := range rules {
			l := CountTable(num, cr, whole)
			if l.None() {
				t.Fatalf("%s %+v: no first row", name, cr)
			}
			full := func(rows int64) *big.Int {
				top := int64(0)
				for r := cr.Start; r <= rows; r++ {
					top += cr.part(r)
				}
				return polyMax(cr, rows, top)
			}
			if full(l.FirstBad).Cmp(max) <= 0 || full(l.FirstBad-1).Cmp(max) > 0 {
				t.Errorf("%s %+v: row %d should be the first past the type", name, cr, l.FirstBad)
			}
			if l.LastGood.Cmp(full(l.FirstBad-1)) != 0 {
				t.Errorf("%s %+v: LastGood %v, want %v", name, cr, l.LastGood, full(l.FirstBad-1))
			}
		}
		// A rising rule over a table that ends at 60.
		cr := CountRule{Start: 1, Beta: 1}
		l := CountTable(num, cr, fixed(60))
		if l.None() || polyMax(cr, l.FirstBad, 60).Cmp(max) <= 0 || polyMax(cr, l.FirstBad-1, 60).Cmp(max) > 0 {
			t.Errorf("%s rising over 60 entries: first row %d", name, l.FirstBad)
		}
	}
	i64, _ := Named("int64", nil)
	// Pascal's rows: C(67, 33) fits int64, C(68, 34) does not (the
	// central binomial's threshold).
	if got := CountTable(i64, CountRule{Falling: true, Start: 1, Beta: 1}, whole).FirstBad; got != CentralBinomial(i64).FirstBad {
		t.Errorf("Pascal's rows in int64: first row %d, want the central binomial's %d", got, CentralBinomial(i64).FirstBad)
	}
	// A table of 40 entries counting subsets never leaves int64: q(40)
	// and every entry below it are small.
	if l := CountTable(i64, CountRule{Falling: true, Start: 1, Alpha: 1}, fixed(40)); !l.None() {
		t.Errorf("subsets over 40 entries: first row %d, want none", l.FirstBad)
	}
	// A rising rule with no end to its table is not answered.
	if l := CountTable(i64, CountRule{Start: 1, Alpha: 1}, whole); !l.None() {
		t.Errorf("rising without a top: first row %d", l.FirstBad)
	}
}

func TestCountTableDiagonal(t *testing.T) {
	p := partitionsEuler(600)
	for _, name := range []string{"int32", "int64", "uint64"} {
		num, _ := Named(name, nil)
		max := num.maxInt()
		l := CountTable(num, CountRule{Start: 1, Alpha: 1}, diagonal)
		if l.None() || p[l.FirstBad].Cmp(max) <= 0 || p[l.FirstBad-1].Cmp(max) > 0 {
			t.Errorf("%s partitions: first n %d", name, l.FirstBad)
		}
		cr := CountRule{Falling: true, Start: 1, Alpha: 1}
		ld := CountTable(num, cr, diagonal)
		if ld.None() || polyMax(cr, ld.FirstBad, ld.FirstBad).Cmp(max) <= 0 || polyMax(cr, ld.FirstBad-1, ld.FirstBad-1).Cmp(max) > 0 {
			t.Errorf("%s distinct parts: first n %d", name, ld.FirstBad)
		}
		t.Logf("%s: partitions from n = %d, distinct parts from n = %d", name, l.FirstBad, ld.FirstBad)
	}
}
