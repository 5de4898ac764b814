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
	fixPackages = append(fixPackages, "keybits")
	diffCases = append(diffCases,
		diffCase{pkg: "keybits", fn: "ShiftBits", loops: []string{"a := 0; a <= 900; a += 53", "b := 0; b <= 900; b += 61"}, args: "float64(a), float64(b)", typ: "float64", ref: refShiftBits},
		diffCase{pkg: "keybits", fn: "SwipeBits", loops: []string{"l := 2; l <= 1400; l += 233", "t := 1; t <= 1400; t += 311"}, args: "float64(l), float64(t)", typ: "float64", ref: refSwipeBits, call: "SwipeBits(l, t, 10, 4.5)"},
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
// math/big (DLMF 26.3.1 for each C(n, i)).
func refShiftBits(x []float64) *big.Float {
	a, b := int64(x[0]), int64(x[1])
	s := new(big.Int)
	for i := int64(0); i <= min(a, b); i++ {
		s.Add(s, chooseBig(a+b, i))
	}
	if s.Sign() == 0 {
		return fl(math.Inf(-1))
	}
	return fl(log2Big(bf(s)))
}

// refSwipeBits is log10 of Σ_{i=2}^{l} Σ_{j=1}^{min(t, i−1)}
// C(i−1, j−1)·10·4.5^j, exact in math/big (4.5 is a dyadic rational),
// for SwipeBits(l, t, 10, 4.5).
func refSwipeBits(x []float64) *big.Float {
	l, t := int64(x[0]), int64(x[1])
	s := new(big.Float).SetPrec(refPrec)
	for i := int64(2); i <= l; i++ {
		for j := int64(1); j <= min(t, i-1); j++ {
			s.Add(s, mul(mul(bf(chooseBig(i-1, j-1)), fl(10)), powBig(4.5, j)))
		}
	}
	if s.Sign() == 0 {
		return fl(math.Inf(-1))
	}
	return fl(log2Big(s) * math.Log10(2))
}
