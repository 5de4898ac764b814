package exacttest

import (
	"math"
)

// SignTest is the two-sided p-value of the sign test.
func SignTest(plus, minus int) float64 { // want SignTest:`wrong for some plus or some minus`
	n := plus + minus
	k := min(plus, minus)
	c, p := 1.0, 0.0
	for i := 0; i <= k; i++ {
		p += c // want `sums the running term`
		c = c * float64(n-i) / float64(i+1)
	}
	return math.Min(1, 2*p*math.Pow(0.5, float64(n)))
}

// SignTestLog is SignTest with the terms in log space.
func SignTestLog(plus, minus int) float64 {
	n := plus + minus
	k := min(plus, minus)
	ln2 := math.Log(2)
	p := 0.0
	for i := 0; i <= k; i++ {
		p += math.Exp(lchoose(n, i) - float64(n)*ln2)
	}
	return math.Min(1, 2*p)
}

func wilcoxonCounts(n int) []uint64 {
	top := n * (n + 1) / 2
	c := make([]uint64, top+1)
	c[0] = 1
	for r := 1; r <= n; r++ { // want `table c is filled by additions row by row \(c\[s\] \+= c\[s-r\], s falling\) in uint64: each row adds one part, and c\[s\] counts the sets of distinct parts with sum s; its largest entry wraps once n reaches 73`
		for s := top; s >= r; s-- {
			c[s] += c[s-r]
		}
	}
	return c
}

// WilcoxonP is the exact lower-tail p-value P(W <= w) of the signed-rank
// statistic for n pairs.
func WilcoxonP(w, n int) float64 { // want WilcoxonP:`wrong for n ≥ 73`
	c := wilcoxonCounts(n) // want `WilcoxonP builds its result from wilcoxonCounts\(n\), which is wrong from n = 73`
	sum := 0.0
	for s := 0; s <= w && s < len(c); s++ {
		sum += float64(c[s])
	}
	return sum / math.Pow(2, float64(n))
}
