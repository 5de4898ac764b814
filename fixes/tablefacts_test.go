package fixes_test

import (
	"math"
	"math/big"
	"testing"

	"github.com/overfact/overfact/fixes/lgamma"
)

// tallykit and ranktest: a binomial probability over another package's
// Choose (a table for small n beside exp of log-gamma differences)
// becomes one helper call.
func init() { fixPackages = append(fixPackages, "tallykit", "ranktest") }

// TestTableFactsFixProbe checks the rewrite of ranktest's Tray.Sprouts
// against math/big where the original is NaN or +Inf: at 1030 seeds,
// rate 1/2 and k = 515, lgamma.BinomialPMF gives C(1030, 515)/2^1030
// within 1e-9 relative, and it matches below the limit too.
func TestTableFactsFixProbe(t *testing.T) {
	for _, c := range []struct{ k, n int }{{515, 1030}, {1500, 3000}, {7, 20}, {514, 1028}} {
		x := new(big.Float).SetPrec(200).SetInt(new(big.Int).Binomial(int64(c.n), int64(c.k)))
		x.Quo(x, new(big.Float).SetPrec(200).SetInt(new(big.Int).Lsh(big.NewInt(1), uint(c.n))))
		want, _ := x.Float64()
		if got := lgamma.BinomialPMF(c.k, c.n, 0.5); math.Abs(got-want) > 1e-9*want {
			t.Errorf("BinomialPMF(%d, %d, 1/2) = %v, exact %v", c.k, c.n, got, want)
		}
	}
}
