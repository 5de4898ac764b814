package factorialratio

import "math"

// Triangles is (a+b)!(b+c)!(a+c)!/(a!b!c!(a+b+c)!), the number of ways
// of a three-way pairing: its numerator product leaves float64 long
// before any one factorial does.
func Triangles(a, b, c int) float64 { // want Triangles:`value Γ` Triangles:`wrong for some a or some b or some c`
	return factF(a+b) * factF(b+c) * factF(a+c) / (factF(a) * factF(b) * factF(c) * factF(a+b+c)) // want `ratio of factorials in float64: the intermediate \(a \+ b\)!·\(b \+ c\)!·\(a \+ c\)! overflows to \+Inf first, at a = b = c = 36 \(all equal\) on that line of inputs, before any factor does`
}

// PairNorm is sqrt((j+m)!(j−m)!·j!·j!/(2j+1)!): (j+m)! and (j−m)! are
// a ± pair, held at m = 0 on the line of inputs.
func PairNorm(j, m int) float64 { // want PairNorm:`wrong for some j or some m`
	return math.Sqrt(factF(j+m) * factF(j-m) * factF(j) * factF(j) / factF(2*j+1)) // want `the intermediate \(j \+ m\)!·\(j - m\)!·j!·j! overflows to \+Inf first, at j = 58, m = 0 on that line of inputs`
}

// Walks is 8^n·n!·n!/(2n)!, about 2^n·sqrt(πn): its numerator leaves
// float64 before the divisor (2n)! does.
func Walks(n int) float64 { // want Walks:`value Γ` Walks:`wrong for n ≥ 85.5`
	num := math.Pow(8, float64(n)) * factF(n) * factF(n)
	return num / factF(2*n) // want `the intermediate 8\^n·n!·n! overflows to \+Inf first, at n = 80 on that line of inputs, before any factor does`
}
