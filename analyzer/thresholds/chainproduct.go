package thresholds

import (
	"math"
	"math/big"
)

// A ChainPart is one factor of a product or quotient the code forms,
// along a line t ↦ A·t + B of its variables: (A·t + B)! when Base is 0,
// Base^(A·t + B) otherwise; Div puts it in the divisor. A part with
// Const > 0 is that constant instead, exactly as the float64 holds it
// (the √π of 2^n·n!·√π), whatever A, B and Base say.
type ChainPart struct {
	A, B  int64
	Base  int64
	Div   bool
	Const float64
}

// chainScan bounds the t a chain is searched over.
const chainScan = 1 << 16

// ChainFirstBad returns the first t ≥ from at which the exact value of
// the product of parts exceeds t's largest value, or math.MaxInt64 when
// no t below from + 2^16 does (none but from where no part moves). Every argument and exponent must be at
// least 0 from from on. Candidates are found from the logarithm
// (math.Lgamma, whose error is far below the margin of 1e-6 taken) and
// each confirmed with math/big, so the answer is exact.
func ChainFirstBad(t Num, parts []ChainPart, from int64) int64 {
	logMax := t.logMax()
	scan := int64(1)
	for _, p := range parts {
		if p.A != 0 {
			scan = chainScan
		}
	}
	for x := from; x < from+scan; x++ {
		l := 0.0
		for _, p := range parts {
			v := p.A*x + p.B
			var lv float64
			switch {
			case p.Const > 0:
				lv = math.Log(p.Const)
			case p.Base == 0:
				lv, _ = math.Lgamma(float64(v) + 1)
			default:
				lv = float64(v) * math.Log(float64(p.Base))
			}
			if p.Div {
				lv = -lv
			}
			l += lv
		}
		if l > logMax-1e-6 && !ChainFits(t, parts, x, 1) {
			return x
		}
	}
	return math.MaxInt64
}

// ChainFits reports whether the exact value of the product of parts at
// x is at most the k-th power of t's largest value (k = 2: its square
// root fits).
func ChainFits(t Num, parts []ChainPart, x int64, k int) bool {
	num, den := big.NewInt(1), big.NewInt(1)
	for _, p := range parts {
		v := p.A*x + p.B
		f, d := big.NewInt(1), big.NewInt(1)
		switch {
		case p.Const > 0:
			// A float64 is a rational: the comparison stays exact.
			r := new(big.Rat).SetFloat64(p.Const)
			f, d = r.Num(), r.Denom()
		case p.Base == 0:
			f = factorial(v)
		default:
			f = new(big.Int).Exp(big.NewInt(p.Base), big.NewInt(v), nil)
		}
		if p.Div {
			f, d = d, f
		}
		num.Mul(num, f)
		den.Mul(den, d)
	}
	return num.Cmp(new(big.Int).Mul(den, new(big.Int).Exp(t.maxInt(), big.NewInt(int64(k)), nil))) <= 0
}
