package puzzlebox

import "math/big"

// LatticePaths counts monotone paths across a w×h grid.
func LatticePaths(w, h int) int64 { // want LatticePaths:`wrong for some w or some h`
	r := int64(1)
	for i := 0; i < w; i++ { // want `multiplicative binomial loop in int64: the product`
		r = r * int64(w+h-i) / int64(i+1)
	}
	return r
}

// Cell is a grid point.
type Cell struct{ X, Y int }

// PathsAvoiding counts monotone paths from (0,0) to (w,h) missing blocked cells.
func PathsAvoiding(w, h int, blocked map[Cell]bool) *big.Int {
	row := make([]*big.Int, w+1)
	for x := range row {
		row[x] = new(big.Int)
	}
	row[0].SetInt64(1)
	for y := 0; y <= h; y++ {
		for x := 0; x <= w; x++ {
			if blocked[Cell{x, y}] {
				row[x].SetInt64(0)
				continue
			}
			if x > 0 {
				row[x].Add(row[x], row[x-1])
			}
		}
	}
	return row[w]
}

// StirlingSecond counts partitions of n labelled items into k blocks,
// by inclusion–exclusion.
func StirlingSecond(n, k int) int64 { // want StirlingSecond:`wrong for some k`
	sum := int64(0)
	sign := int64(1)
	for j := 0; j <= k; j++ {
		p := int64(1)
		for e := 0; e < n; e++ {
			p *= int64(k - j)
		}
		sum += sign * LatticePaths(j, k-j) * p // want `StirlingSecond builds its result from LatticePaths\(j, k-j\), which is wrong for some values of w`
		sign = -sign
	}
	return sum / int64(ifact(k))
}

// StirlingFirst is the unsigned Stirling number of the first kind.
func StirlingFirst(n, k int) *big.Int {
	memo := map[[2]int]*big.Int{}
	var s func(n, k int) *big.Int
	s = func(n, k int) *big.Int {
		switch {
		case n == 0 && k == 0:
			return big.NewInt(1)
		case n == 0 || k == 0:
			return big.NewInt(0)
		}
		key := [2]int{n, k}
		if v, ok := memo[key]; ok {
			return v
		}
		v := new(big.Int).Mul(big.NewInt(int64(n-1)), s(n-1, k))
		v.Add(v, s(n-1, k-1))
		memo[key] = v
		return v
	}
	return new(big.Int).Set(s(n, k))
}

func derangements(n int) int64 {
	a, b := int64(1), int64(0)
	if n == 0 {
		return 1
	}
	for i := 2; i <= n; i++ {
		a, b = b, int64(i-1)*(a+b) // want `rolling pair a, b = b, int64\(i-1\) \* \(a \+ b\) computes the derangement numbers D\(i\) .* in int64: the step at i = 21 wraps \(D\(20\) ≈ 8.95e17 is the largest that fits\)`
	}
	return b
}

// DerangementProb is the chance that a shuffle of n hats returns none to its owner.
func DerangementProb(n int) float64 { // want DerangementProb:`wrong for some n`
	f := 1.0
	for i := 2; i <= n; i++ { // want `factorial of n in float64 overflows to`
		f *= float64(i)
	}
	return float64(derangements(n)) / f
}

// CentralShare is C(2n, n)/4^n, the chance of a tie in 2n fair tosses.
func CentralShare(n int) float64 {
	r := 1.0
	for i := 1; i <= n; i++ {
		r *= float64(2*i-1) / float64(2*i)
	}
	return r
}
