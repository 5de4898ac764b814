package lgamma

import (
	"math"
	"math/big"
	"math/rand"
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

// ddLogFast against the math/big logarithm of ref_test.go, and the
// exactness of its reduction m·r − 1 (the FMA must not round).
func TestDDLogFast(t *testing.T) {
	rng := rand.New(rand.NewSource(11))
	worst := 0.0
	for i := 0; i < 4000; i++ {
		var x dd
		switch i % 4 {
		case 0:
			x = dd{1 + rng.Float64(), 0}
		case 1:
			x = twoSum(math.Exp(rng.Float64()*1400-700), 0)
		case 2:
			v := math.Ldexp(1+rng.Float64(), rng.Intn(2000)-1000)
			x = dd{v, v * 0x1p-54 * (rng.Float64() - 0.5)}
			x = twoSum(x.hi, x.lo)
		default:
			x = ddInt(rng.Int63())
		}
		want := refLog(ddValue(x))
		if r := ddRel(ddLogFast(x), want); r > worst {
			worst = r
		}
		// the reduction
		b := math.Float64bits(x.hi)
		m := math.Float64frombits(b&(1<<52-1) | 1023<<52)
		r := logFastR[int((b>>41)&0x7ff+1)>>1]
		exact := new(big.Float).SetPrec(200).Mul(new(big.Float).SetFloat64(m), new(big.Float).SetFloat64(r))
		exact.Sub(exact, big.NewFloat(1))
		if got := math.FMA(m, r, -1); new(big.Float).SetFloat64(got).Cmp(exact) != 0 || math.Abs(got) > 0x1p-10 {
			t.Fatalf("reduction of %v: m·r − 1 = %v is not exact or too large", x.hi, got)
		}
	}
	if worst > 0x1p-72 {
		t.Errorf("ddLogFast: worst relative error %g > 2^-72", worst)
	}
	t.Logf("ddLogFast: worst relative error %.3g (2^%.1f)", worst, math.Log2(worst))
}
