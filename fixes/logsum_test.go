package fixes_test

import (
	"math"
	"math/big"
)

// The logarithm of a sum of binomials (buildLogSum): keybits's ratings,
// log2 of Σ C(a+b, i) over i ≤ min(a, b), and log10 of the swipe
// patterns' Σ C(i−1, j−1)·starts·degree^j. Past C(1030, 515) the
// original's sum is +Inf; the exact logarithm is about a thousand.
func init() {
	fixPackages = append(fixPackages, "keybits", "fixlogvalue")
	diffCases = append(diffCases,
		diffCase{pkg: "keybits", fn: "ShiftBits", loops: []string{"a := 0; a <= 900; a += 53", "b := 0; b <= 900; b += 61"}, args: "float64(a), float64(b)", typ: "float64", ref: refShiftBits},
		// The logarithm of a float factorial or binomial helper's value
		// (buildLogOfValue): +Inf past 170! and C(1029, 514) in the
		// original, ln n! and ln C(n, k) (a few thousand) exact.
		diffCase{pkg: "fixlogvalue", fn: "OrderNats", loops: []string{"n := 0; n <= 2000; n += 37"}, args: "n", typ: "float64", ref: refLnFactorial},
		diffCase{pkg: "fixlogvalue", fn: "SproutNats", loops: []string{"n := 0; n <= 2400; n += 97", "k := 0; k <= n; k += 1 + n/7"}, args: "n, k", typ: "float64", ref: refLnChoose},
		diffCase{pkg: "fixlogvalue", fn: "SproutBits", loops: []string{"n := 0; n <= 2400; n += 97", "k := 0; k <= n; k += 1 + n/7"}, args: "n, k", typ: "float64", ref: refLog2Choose},
		diffCase{pkg: "keybits", fn: "SwipeBits", loops: []string{"l := 2; l <= 1400; l += 233", "t := 1; t <= 1500; t += 1 + t*4"}, args: "float64(l), float64(t)", typ: "float64", ref: refSwipeBits, call: "SwipeBits(l, t, 10, 4.5)"},
	)
}

// log2Big returns log2 of a positive big.Float to float64 accuracy: x =
// m·2^e with m in [0.5, 1).
func log2Big(x *big.Float) float64 {
	m := new(big.Float)
	e := x.MantExp(m)
	mf, _ := m.Float64()
	return float64(e) + math.Log2(mf)
}

// refShiftBits is log2 Σ_{i ≤ min(a, b)} C(a+b, i), the sum exact in
// math/big, each C(n, i+1) = C(n, i)·(n−i)/(i+1) from the one before
// (DLMF 26.3.1 and 26.3.5).
func refShiftBits(x []float64) *big.Float {
	a, b := int64(x[0]), int64(x[1])
	n := a + b
	s, c := new(big.Int), big.NewInt(1)
	for i := int64(0); i <= min(a, b); i++ {
		s.Add(s, c)
		c.Mul(c, big.NewInt(n-i))
		c.Quo(c, big.NewInt(i+1))
	}
	return fl(log2Big(bf(s)))
}

// refSwipeBits is log10 of Σ_{i=2}^{l} Σ_{j=1}^{min(t, i−1)}
// C(i−1, j−1)·10·d^j with d = 4.5, for SwipeBits(l, t, 10, 4.5): a full
// row (t ≥ i−1) is d·((1+d)^(i−1) − d^(i−1)) by the binomial theorem
// (common practice: Σ_m C(r, m)·d^m = (1+d)^r, less its
// last term d^r), a partial one summed term by term; 4.5 and 5.5 are
// dyadic, so every product is exact to the reference's precision.
func refSwipeBits(x []float64) *big.Float {
	l, t := int64(x[0]), int64(x[1])
	d, d1 := fl(4.5), fl(5.5)
	s := new(big.Float).SetPrec(refPrec)
	pd, pd1 := fl(1), fl(1) // d^(i−1), (1+d)^(i−1)
	for i := int64(2); i <= l; i++ {
		pd, pd1 = mul(pd, d), mul(pd1, d1)
		if t >= i-1 {
			row := new(big.Float).SetPrec(refPrec).Sub(pd1, pd)
			s.Add(s, mul(mul(row, d), fl(10)))
			continue
		}
		c, pw := big.NewInt(1), fl(1) // C(i−1, j−1), d^j
		for j := int64(1); j <= t; j++ {
			pw = mul(pw, d)
			s.Add(s, mul(mul(bf(c), pw), fl(10)))
			c.Mul(c, big.NewInt(i-j))
			c.Quo(c, big.NewInt(j))
		}
	}
	if s.Sign() == 0 {
		return fl(math.Inf(-1))
	}
	return fl(log2Big(s) * math.Log10(2))
}

// refLnFactorial is ln n! from n! exact in math/big.
func refLnFactorial(x []float64) *big.Float {
	return fl(log2Big(bf(factorialBig(int64(x[0])))) * math.Ln2)
}

// refLnChoose is ln C(n, k) from C(n, k) exact in math/big.
func refLnChoose(x []float64) *big.Float {
	return fl(log2Big(bf(chooseBig(int64(x[0]), int64(x[1])))) * math.Ln2)
}

// refLog2Choose is log2 C(n, k) from C(n, k) exact in math/big.
func refLog2Choose(x []float64) *big.Float {
	return fl(log2Big(bf(chooseBig(int64(x[0]), int64(x[1])))))
}
