package thresholds

import (
	"math"
	"math/big"
)

// Triangle names a triangle of counts filled by a rule of the form
// T(n, k) = w(n, k)·T(n−1, k) + T(n−1, k−1), T(0, 0) = 1, T(n, k) = 0
// for k < 0 or k > n (common practice; DLMF 26.8.18 and 26.8.22):
type Triangle int

const (
	// StirlingSecond: S(n, k) = k·S(n−1, k) + S(n−1, k−1), the ways to
	// split n items into k non-empty blocks (OEIS A008277).
	StirlingSecond Triangle = iota
	// StirlingFirst: c(n, k) = (n−1)·c(n−1, k) + c(n−1, k−1), the
	// permutations of n items with k cycles, the unsigned Stirling
	// numbers of the first kind (OEIS A132393); the signed ones,
	// s(n−1, k−1) − (n−1)·s(n−1, k), have the same magnitudes.
	StirlingFirst
)

// triangleCap is the last row computed exactly when a question is about
// a range: past it every row of either triangle holds entries past any
// machine type (S(n, 2) = 2^(n−1) − 1, c(n, 1) = (n−1)!).
const triangleCap = 512

// weight returns w(n, k) of the triangle's rule.
func (tr Triangle) weight(n, k int64) int64 {
	if tr == StirlingFirst {
		return n - 1
	}
	return k
}

// step returns row n of the triangle from row n−1.
func (tr Triangle) step(prev []*big.Int, n int64) []*big.Int {
	cur := make([]*big.Int, n+1)
	w := new(big.Int)
	for k := int64(0); k <= n; k++ {
		v := new(big.Int)
		if k < n {
			v.Mul(w.SetInt64(tr.weight(n, k)), prev[k])
		}
		if k > 0 {
			v.Add(v, prev[k-1])
		}
		cur[k] = v
	}
	return cur
}

// row returns T(n, 0..n) exactly.
func (tr Triangle) row(n int64) []*big.Int {
	cur := []*big.Int{big.NewInt(1)}
	for i := int64(1); i <= n; i++ {
		cur = tr.step(cur, i)
	}
	return cur
}

// TriangleLimit returns the first row n of the triangle holding an entry
// that does not fit t, and the smallest k of that row whose entry does
// not: the recurrence wraps there first. LastGood and Peak are the
// largest entry of row n−1. int64: S from row 26 (k = 9), c from row 21
// (k = 3); checked against closed forms by TestTriangleLimit.
func TriangleLimit(tr Triangle, t Num) (Limit, int64) {
	type result struct {
		l Limit
		k int64
	}
	r := memo(cacheKey{shape: "triangle", t: t, a: int64(tr)}, func() result {
		max := t.maxInt()
		prev := []*big.Int{big.NewInt(1)}
		for n := int64(1); n <= triangleCap; n++ {
			cur := tr.step(prev, n)
			for k, v := range cur {
				if v.CmpAbs(max) > 0 {
					peak := largest(prev)
					return result{Limit{FirstBad: n, LastGood: peak, Peak: peak}, int64(k)}
				}
			}
			prev = cur
		}
		return result{Limit{FirstBad: math.MaxInt64}, -1}
	})
	return r.l.clone(), r.k
}

// largest returns the largest of vs.
func largest(vs []*big.Int) *big.Int {
	m := new(big.Int)
	for _, v := range vs {
		if v.Cmp(m) > 0 {
			m.Set(v)
		}
	}
	return m
}

// TriangleFits reports whether every entry T(n, k) with 0 ≤ n ≤ nHi and
// kLo ≤ k ≤ kHi fits t. Every entry with k ≥ 1 grows with n, so row nHi
// holds the largest; entries at k ≤ 0 are 0 or 1 (T(n, 0) = [n = 0]),
// and so are S(n, 1) = 1.
func TriangleFits(tr Triangle, t Num, nHi, kLo, kHi int64) bool {
	small := int64(0)
	if tr == StirlingSecond {
		small = 1
	}
	kLo, kHi = max(kLo, 0), min(kHi, nHi)
	switch {
	case kHi <= small || kLo > kHi:
		return true
	case nHi < TriangleLimitRow(tr, t):
		return true
	case nHi > triangleCap:
		return false
	}
	return memo(cacheKey{shape: "trifits" + string(rune('0'+tr)), t: t, a: nHi, b: kLo<<32 | kHi}, func() bool {
		row := tr.row(nHi)
		return largest(row[kLo:kHi+1]).CmpAbs(t.maxInt()) <= 0
	})
}

// TriangleAllPast reports whether every entry T(n, k) with n ≥ nLo and
// kLo ≤ k ≤ kHi ≤ nLo leaves t: entries grow with n, so it is enough
// that the smallest of row nLo over those k does.
func TriangleAllPast(tr Triangle, t Num, nLo, kLo, kHi int64) bool {
	if kLo < 1 || kHi > nLo || kLo > kHi || nLo > triangleCap {
		return false
	}
	return memo(cacheKey{shape: "tripast" + string(rune('0'+tr)), t: t, a: nLo, b: kLo<<32 | kHi}, func() bool {
		max := t.maxInt()
		for _, v := range tr.row(nLo)[kLo : kHi+1] {
			if v.CmpAbs(max) <= 0 {
				return false
			}
		}
		return true
	})
}

// TriangleLimitRow is TriangleLimit's first bad row alone.
func TriangleLimitRow(tr Triangle, t Num) int64 {
	l, _ := TriangleLimit(tr, t)
	return l.FirstBad
}

// BellTriangleLimit returns the first row n of the Bell triangle
// (Aitken's array, OEIS A011971: a(0, 0) = 1, a(n, 0) = a(n−1, n−1),
// a(n, k) = a(n, k−1) + a(n−1, k−1); common practice) holding an entry
// that does not fit t, and the smallest k of that row whose entry does
// not. Row n runs from the Bell number B(n) at k = 0 to B(n+1) at k = n
// (OEIS A000110), so LastGood and Peak, the largest entry of row n−1,
// are B(n). int64: row 25 (B(26) ≈ 4.92e19 at its end).
func BellTriangleLimit(t Num) (Limit, int64) {
	type result struct {
		l Limit
		k int64
	}
	r := memo(cacheKey{shape: "belltri", t: t}, func() result {
		lim := t.maxInt()
		prev := []*big.Int{big.NewInt(1)}
		for n := int64(1); n <= triangleCap; n++ {
			cur := make([]*big.Int, n+1)
			cur[0] = new(big.Int).Set(prev[n-1])
			for k := int64(1); k <= n; k++ {
				cur[k] = new(big.Int).Add(cur[k-1], prev[k-1])
			}
			for k, v := range cur {
				if v.CmpAbs(lim) > 0 {
					peak := new(big.Int).Set(prev[n-1])
					return result{Limit{FirstBad: n, LastGood: peak, Peak: peak}, int64(k)}
				}
			}
			prev = cur
		}
		return result{Limit{FirstBad: math.MaxInt64}, -1}
	})
	return r.l.clone(), r.k
}
