package thresholds

import (
	"math/big"
	"testing"
)

// stirling2Closed is S(n, k) by the explicit sum S(n, k) = (1/k!)·
// Σ_{j=0}^{k} (−1)^j·C(k, j)·(k−j)^n (DLMF 26.8.6), independent of the
// recurrence the triangle follows.
func stirling2Closed(n, k int64) *big.Int {
	sum := new(big.Int)
	for j := int64(0); j <= k; j++ {
		term := new(big.Int).Exp(big.NewInt(k-j), big.NewInt(n), nil)
		term.Mul(term, new(big.Int).Binomial(k, j))
		if j%2 == 1 {
			term.Neg(term)
		}
		sum.Add(sum, term)
	}
	return sum.Quo(sum, new(big.Int).MulRange(1, max(k, 1)))
}

// stirling1Closed is c(n, 0..n), the coefficients of the rising
// factorial x(x+1)…(x+n−1) = Σ c(n, k)·x^k (DLMF 26.8.7 with the signs
// taken off), computed by multiplying the polynomial out.
func stirling1Closed(n int64) []*big.Int {
	poly := []*big.Int{big.NewInt(1)}
	for i := int64(0); i < n; i++ { // times (x + i)
		next := make([]*big.Int, len(poly)+1)
		for k := range next {
			next[k] = new(big.Int)
		}
		for k, c := range poly {
			next[k].Add(next[k], new(big.Int).Mul(c, big.NewInt(i)))
			next[k+1].Add(next[k+1], c)
		}
		poly = next
	}
	return poly
}

// closedRow returns row n of the triangle from the closed forms.
func closedRow(tr Triangle, n int64) []*big.Int {
	if tr == StirlingFirst {
		return stirling1Closed(n)
	}
	row := make([]*big.Int, n+1)
	for k := range row {
		row[k] = stirling2Closed(n, int64(k))
	}
	return row
}

func TestTriangleLimit(t *testing.T) {
	for _, tr := range []Triangle{StirlingSecond, StirlingFirst} {
		for _, name := range []string{"int32", "int64", "uint64"} {
			num, ok := Named(name, nil)
			if !ok {
				t.Fatalf("no type %s", name)
			}
			l, k := TriangleLimit(tr, num)
			max := num.maxInt()
			before, at := closedRow(tr, l.FirstBad-1), closedRow(tr, l.FirstBad)
			if largest(before).CmpAbs(max) > 0 {
				t.Errorf("triangle %d, %s: row %d already leaves the type", tr, name, l.FirstBad-1)
			}
			if l.LastGood.Cmp(largest(before)) != 0 {
				t.Errorf("triangle %d, %s: LastGood %v, want %v", tr, name, l.LastGood, largest(before))
			}
			first := int64(-1)
			for j, v := range at {
				if v.CmpAbs(max) > 0 {
					first = int64(j)
					break
				}
			}
			if first < 0 || first != k {
				t.Errorf("triangle %d, %s: row %d first leaves the type at k = %d, said %d", tr, name, l.FirstBad, first, k)
			}
		}
	}
	// OEIS A008277 and A132393, from memory: S(10, 5) = 42525, S(6, 3)
	// = 90; c(5, 2) = 50, c(6, 3) = 225.
	for _, c := range []struct {
		tr   Triangle
		n, k int64
		want int64
	}{{StirlingSecond, 10, 5, 42525}, {StirlingSecond, 6, 3, 90}, {StirlingFirst, 5, 2, 50}, {StirlingFirst, 6, 3, 225}} {
		if got := c.tr.row(c.n)[c.k]; got.Int64() != c.want {
			t.Errorf("triangle %d: T(%d, %d) = %v, want %d", c.tr, c.n, c.k, got, c.want)
		}
		if got := closedRow(c.tr, c.n)[c.k]; got.Int64() != c.want {
			t.Errorf("triangle %d, closed form: T(%d, %d) = %v, want %d", c.tr, c.n, c.k, got, c.want)
		}
	}
}

// TestTriangleFits checks TriangleFits and TriangleAllPast against every
// entry of the box from the closed forms.
func TestTriangleFits(t *testing.T) {
	num, _ := Named("int64", nil)
	lim := num.maxInt()
	for _, tr := range []Triangle{StirlingSecond, StirlingFirst} {
		for nHi := int64(0); nHi <= 34; nHi += 2 {
			rows := make([][]*big.Int, nHi+1)
			for n := range rows {
				rows[n] = closedRow(tr, int64(n))
			}
			for _, kr := range [][2]int64{{0, 1}, {0, 3}, {2, 5}, {1, nHi}, {nHi - 2, nHi}, {3, 40}} {
				fits, allPast := true, kr[1] <= nHi && kr[0] >= 1 && kr[0] <= kr[1]
				for n := int64(0); n <= nHi; n++ {
					for k := max(kr[0], 0); k <= min(kr[1], n); k++ {
						fits = fits && rows[n][k].CmpAbs(lim) <= 0
					}
				}
				if allPast {
					for k := kr[0]; k <= kr[1]; k++ {
						allPast = allPast && rows[nHi][k].CmpAbs(lim) > 0
					}
				}
				if got := TriangleFits(tr, num, nHi, kr[0], kr[1]); got != fits {
					t.Errorf("triangle %d: TriangleFits(%d, %v) = %v, want %v", tr, nHi, kr, got, fits)
				}
				if got := TriangleAllPast(tr, num, nHi, kr[0], kr[1]); got != allPast {
					t.Errorf("triangle %d: TriangleAllPast(%d, %v) = %v, want %v", tr, nHi, kr, got, allPast)
				}
			}
		}
	}
}

// TestBellTriangleLimit checks the Bell triangle's first row past each
// type against the Bell numbers as sums of Stirling numbers of the
// second kind, B(n) = Σ_k S(n, k) (DLMF 26.7.1), from the closed form:
// row n's entries lie between B(n) and B(n+1), its last entry B(n+1).
func TestBellTriangleLimit(t *testing.T) {
	bell := func(n int64) *big.Int {
		sum := new(big.Int)
		for k := int64(0); k <= n; k++ {
			sum.Add(sum, stirling2Closed(n, k))
		}
		return sum
	}
	// OEIS A000110, from memory: B(10) = 115975.
	if got := bell(10); got.Int64() != 115975 {
		t.Errorf("B(10) = %v, want 115975", got)
	}
	for _, name := range []string{"int32", "int64", "uint64"} {
		num, _ := Named(name, nil)
		lim := num.maxInt()
		l, k := BellTriangleLimit(num)
		// Row n−1 ends with B(n), which must fit; row n ends with
		// B(n+1), which must not.
		if bell(l.FirstBad).CmpAbs(lim) > 0 || bell(l.FirstBad+1).CmpAbs(lim) <= 0 {
			t.Errorf("%s: row %d is not the first whose last entry B(n+1) leaves the type", name, l.FirstBad)
		}
		if l.LastGood.Cmp(bell(l.FirstBad)) != 0 {
			t.Errorf("%s: LastGood %v, want B(%d) = %v", name, l.LastGood, l.FirstBad, bell(l.FirstBad))
		}
		if k < 1 || k > l.FirstBad {
			t.Errorf("%s: first k past the type %d, want within row %d", name, k, l.FirstBad)
		}
	}
}
