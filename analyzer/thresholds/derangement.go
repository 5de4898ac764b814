package thresholds

import (
	"math"
	"math/big"
)

// Derangement returns the first n whose derangement number D(n), the
// count of permutations of n items that fix none (OEIS A000166: 1, 0,
// 1, 2, 9, 44, …), does not fit t, as the recurrence D(n) = (n−1)·(D(n−1)
// + D(n−2)) forms it (common practice; each step's product is D(n)
// itself, its sum smaller). int64: 21, as D(20) ≈ 8.95e17 fits and
// D(21) ≈ 1.88e19 does not (checked against the definition by
// TestDerangement). LastGood and Peak are D at the n before.
func Derangement(t Num) Limit {
	return memoLimit(cacheKey{shape: "derange", t: t}, func() Limit {
		max := t.maxInt()
		prev, cur := big.NewInt(1), big.NewInt(0) // D(0), D(1)
		for n := int64(2); n < 1<<20; n++ {
			next := new(big.Int).Add(prev, cur)
			next.Mul(next, big.NewInt(n-1))
			if next.CmpAbs(max) > 0 {
				return Limit{FirstBad: n, LastGood: new(big.Int).Set(cur), Peak: new(big.Int).Set(cur)}
			}
			prev, cur = cur, next
		}
		return Limit{FirstBad: math.MaxInt64}
	})
}
