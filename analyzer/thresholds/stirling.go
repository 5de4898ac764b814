package thresholds

import (
	"math"
	"math/big"
	"sync"
)

// halfLn2Pi is ½ ln(2π).
const halfLn2Pi = 0.918938533204672741780329736405617639861397473637783412817

// LogFactorialBounds returns Robbins' (1955) two-sided bound on ln n!:
//
//	½ln(2π) + (n+½)ln n − n + 1/(12n+1) < ln n! < ½ln(2π) + (n+½)ln n − n + 1/(12n)
//
// widened by a few units in the last place so that the float64 results
// are bounds too.
//
// Special cases are:
//
//	LogFactorialBounds(0) = 0, 0
//	LogFactorialBounds(n < 0) = NaN, NaN
func LogFactorialBounds(n int64) (lo, hi float64) {
	switch {
	case n < 0:
		return math.NaN(), math.NaN()
	case n == 0:
		return 0, 0
	}
	x := float64(n)
	lx := math.Log(x)
	base := halfLn2Pi + (x+0.5)*lx - x
	return widen(base+1/(12*x+1), base+1/(12*x), (x+0.5)*lx+x+1)
}

const maxStirlingTerms = 20

var stirlingOnce = sync.OnceValue(func() []*big.Rat {
	b := bernoulli(2 * maxStirlingTerms)
	c := make([]*big.Rat, maxStirlingTerms+1)
	for k := 1; k <= maxStirlingTerms; k++ {
		d := big.NewRat(int64(2*k*(2*k-1)), 1)
		c[k] = new(big.Rat).Quo(b[2*k], d)
	}
	return c
})

// StirlingCoefficient returns the k-th coefficient B_{2k}/(2k(2k−1)) of
// Stirling's series (DLMF 5.11.1): 1/12, −1/360, 1/1260, −1/1680, …
// The result is a fresh value.
//
// Special cases are:
//
//	StirlingCoefficient(k) = nil for k < 1 or k > 20
func StirlingCoefficient(k int) *big.Rat {
	if k < 1 || k > maxStirlingTerms {
		return nil
	}
	return new(big.Rat).Set(stirlingOnce()[k])
}

// bernoulli returns B_0 … B_n, computed exactly with the
// Akiyama–Tanigawa algorithm (M. Kaneko, "The Akiyama–Tanigawa algorithm
// for Bernoulli numbers", J. Integer Sequences 3 (2000) 00.2.9). The
// algorithm yields B_1 = +½; only the even-indexed numbers are used here.
func bernoulli(n int) []*big.Rat {
	out := make([]*big.Rat, n+1)
	a := make([]*big.Rat, n+1)
	for m := 0; m <= n; m++ {
		a[m] = big.NewRat(1, int64(m+1))
		for j := m; j >= 1; j-- {
			d := new(big.Rat).Sub(a[j-1], a[j])
			a[j-1] = d.Mul(d, big.NewRat(int64(j), 1))
		}
		out[m] = new(big.Rat).Set(a[0])
	}
	return out
}

// invertStirling returns the real n ≥ 1 at which the leading Stirling
// term of ln n! equals L, by Newton's method. The function is convex and
// increasing there, so the iteration from a point above the root
// decreases monotonically to it.
func invertStirling(L float64) float64 {
	if L <= 0 {
		return 1
	}
	n := math.Max(L, 2)
	for range 100 {
		f := halfLn2Pi + (n+0.5)*math.Log(n) - n - L
		next := n - f/(math.Log(n)+0.5/n)
		if next < 1 {
			return 1
		}
		if math.Abs(next-n) < 1e-9 {
			return next
		}
		n = next
	}
	return n
}
