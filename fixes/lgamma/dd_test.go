package lgamma

import (
	"math"
	"math/big"
	"testing"
)

// ddValue returns the exact sum hi+lo as a big.Float.
func ddValue(a dd) *big.Float { return bnew().Add(bf(a.hi), bf(a.lo)) }

func ddRel(a dd, want *big.Float) float64 {
	d := bnew().Sub(ddValue(a), want)
	if want.Sign() != 0 {
		d.Quo(d, want)
	}
	f, _ := d.Float64()
	return math.Abs(f)
}

// The kernels are accurate well beyond float64: ddLog to about 1e-26
// relative, ddExp (used only for final results) to about 1e-20. The
// references are refExp and refLog (ref_test.go).
func TestDoubleDouble(t *testing.T) {
	worstExp, worstLog := 0.0, 0.0
	for _, x := range []float64{1e-300, 1e-20, 0.001, 0.3, 0.5, 0.7, 1, 1.5, 2, 3.7, 10, 123.456, 700, 1e8, 3e15, 1e300} {
		l := ddLog(dd{x, 0})
		worstLog = math.Max(worstLog, ddRel(l, refLog(bf(x))))
		// Below e^-650 the lo part is subnormal and a dd has fewer bits.
		if math.Abs(math.Log(x)) < 650 {
			e := ddExp(dd{math.Log(x), 0})
			worstExp = math.Max(worstExp, ddRel(e, refExp(bf(math.Log(x)))))
		}
	}
	t.Logf("ddExp worst relative error %.3g, ddLog %.3g", worstExp, worstLog)
	if worstExp > 1e-20 || worstLog > 1e-25 {
		t.Errorf("double-double kernels lose precision: exp %g, log %g", worstExp, worstLog)
	}
}
