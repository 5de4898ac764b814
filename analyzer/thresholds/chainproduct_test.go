package thresholds

import (
	"math"
	"math/big"
	"testing"
)

// TestChainFirstBad checks ChainFirstBad against a plain scan with
// math/big (every factorial by big.Int.MulRange, every power by
// big.Int.Exp, the value a big.Rat compared with math.MaxFloat64), and, for products with no divisor, against float64 itself:
// the product multiplied left to right as code does is finite one below
// the answer and +Inf at it.
func TestChainFirstBad(t *testing.T) {
	f64, _ := Named("float64", nil)
	cases := [][]ChainPart{
		{{A: 1}},                 // n!
		{{A: 2}, {A: 2}, {A: 2}}, // (2t)!³
		{{A: 1, Base: 2}, {A: 3}, {A: 3}, {A: 3}},                 // 2^t·(3t)!³
		{{A: 1}, {A: 1}, {A: 1}, {A: 1}, {A: 2, B: 1, Div: true}}, // t!⁴/(2t+1)!
		{{A: 3, Base: 2}, {A: 1}, {A: 1}, {A: 2, Div: true}},      // 8^t·t!²/(2t)!
		{{A: 1, B: -3}, {A: 2, B: 5}},                             // (t−3)!·(2t+5)!
		// 2^t·t!·√π, the square of the Hermite functions' normaliser
		// (DLMF 18.3, h_n = √π·2^n·n!), and t!/0.001.
		{{A: 1, Base: 2}, {A: 1}, {Const: math.Sqrt(math.Pi)}},
		{{A: 1}, {Const: 0.001, Div: true}},
	}
	maxF := new(big.Rat).SetFloat64(math.MaxFloat64)
	for i, parts := range cases {
		from := int64(3)
		got := ChainFirstBad(f64, parts, from)
		want := int64(math.MaxInt64)
		for x := from; x < 1200; x++ {
			q := new(big.Rat).SetInt64(1)
			for _, p := range parts {
				v := p.A*x + p.B
				f := new(big.Rat)
				switch {
				case p.Const > 0:
					f.SetFloat64(p.Const)
				case p.Base == 0:
					f.SetInt(new(big.Int).MulRange(1, max(v, 1)))
				default:
					f.SetInt(new(big.Int).Exp(big.NewInt(p.Base), big.NewInt(v), nil))
				}
				if p.Div {
					q.Quo(q, f)
				} else {
					q.Mul(q, f)
				}
			}
			if q.Cmp(maxF) > 0 {
				want = x
				break
			}
		}
		if got != want {
			t.Errorf("case %d: ChainFirstBad = %d, math/big scan %d", i, got, want)
			continue
		}
		div := false
		for _, p := range parts {
			div = div || p.Div
		}
		if div {
			continue
		}
		for _, x := range []int64{want - 1, want} {
			v := 1.0
			for _, p := range parts {
				n := p.A*x + p.B
				if p.Const > 0 {
					v *= p.Const
					continue
				}
				if p.Base != 0 {
					v *= math.Pow(float64(p.Base), float64(n))
					continue
				}
				for k := int64(2); k <= n; k++ {
					v *= float64(k)
				}
			}
			if inf := math.IsInf(v, 1); inf != (x == want) {
				t.Errorf("case %d: float64 product at %d is %g, the answer %d", i, x, v, want)
			}
		}
	}
}
