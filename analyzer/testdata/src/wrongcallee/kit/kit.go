// Package kit holds the counting helpers a seed bank's reports call
// from another package: their facts cross the package boundary.
package kit

// Arrangements is the number of ways to seat n guests at k numbered
// chairs, n!/(n−k)!, with both factorials formed in float64.
func Arrangements(n, k int) float64 { // want Arrangements:`value Γ\(p0 \+ 1\)/Γ\(p0 - p1 \+ 1\), wrong once p0 ≥ 171 or p0 - p1 ≥ 171` Arrangements:`wrong for n ≥ 171`
	return fact(n) / fact(n-k) // want `permutation count`
}

// Total is the number of ways to seat some of n guests in a row.
func Total(n int) float64 { // want Total:`wrong for some n`
	s := 0.0
	for j := 0; j <= n; j++ {
		s += Arrangements(n, j) // want `Total computes`
	}
	return s
}

func fact(n int) float64 { // want fact:`factorial of parameter 0, breaks from 171`
	f := 1.0
	for i := 2; i <= n; i++ {
		f *= float64(i)
	}
	return f
}
