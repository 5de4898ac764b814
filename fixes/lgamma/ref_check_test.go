package lgamma

import (
	"math/big"
	"testing"
)

// The references themselves are checked against published digits before
// anything is measured with them.
func TestReferences(t *testing.T) {
	tests := []struct {
		name   string
		got    *big.Float
		digits string
		source string
	}{
		{"pi", refPi(), "3.14159265358979323846264338327950288419716939937510", "DLMF 3.12.1 digits (from memory)"},
		{"ln 2", refLog(bi(2)), "0.69314718055994530941723212145817656807550013436026", "DLMF 4.2 / A&S Table 4.1 (from memory)"},
		{"e", refExp(bi(1)), "2.71828182845904523536028747135266249775724709369995", "OEIS A001113 (from memory)"},
		{"ln Γ(1/2) = ½ln π", refLnGamma(bf(0.5)), "0.57236494292470008707171367567652935582364740645766", "OEIS A002161 ln √π (from memory)"},
		{"ln 10!", refLnFact(10), "15.104412573075515295225709329251070371882250744292", "ln 3628800 (from memory)"},
	}
	for _, tt := range tests {
		want, _, _ := big.ParseFloat(tt.digits, 10, refPrec, big.ToNearestEven)
		d := bnew().Sub(tt.got, want)
		d.Quo(d, want)
		if f, _ := d.Float64(); f > 1e-45 || f < -1e-45 {
			t.Errorf("%s (%s): reference off by %g relative", tt.name, tt.source, f)
		}
	}
	// Stirling-series branch against the exact-factorial branch.
	for _, n := range []int64{2999, 5000} {
		f := new(big.Int).MulRange(1, n)
		exact := refLog(bnew().SetInt(f))
		d := bnew().Sub(refLnGamma(bi(n+1)), exact)
		if f, _ := d.Float64(); f > 1e-50 || f < -1e-50 {
			t.Errorf("ln %d!: Stirling reference differs from exact by %g", n, f)
		}
	}
}
