package thresholds

import (
	"math"
	"math/big"
	"testing"
)

// CentralFalling against a plain math/big scan of n(n−1)…(n−⌊n/2⌋+1).
func TestCentralFalling(t *testing.T) {
	for _, name := range []string{"int32", "int64", "uint64", "float32", "float64"} {
		num, _ := Named(name, nil)
		max := num.MaxInt()
		want := int64(-1)
		for n := int64(1); n < 2000; n++ {
			p := new(big.Int).MulRange(n-n/2+1, n)
			if n/2 == 0 {
				p = big.NewInt(1)
			}
			if p.CmpAbs(max) > 0 {
				want = n
				break
			}
		}
		if got := CentralFalling(num).FirstBad; got != want {
			t.Errorf("%s: CentralFalling = %d, scan = %d", name, got, want)
		}
	}
	f64, _ := Named("float64", nil)
	if l := CentralFalling(f64); l.FirstBad == math.MaxInt64 || l.Peak.Cmp(f64.MaxInt()) > 0 {
		t.Errorf("float64 limit %+v", l)
	}
}
