package factorialratio

// A divisor shifted left is a product by a power of two: the ratio's
// numerator wraps before the division while the quotient fits. Exact
// values from Python's exact integers.

func factI(n int) int64 { // want factI:`factorial of parameter 0, breaks from 21`
	r := int64(1)
	for i := int64(2); i <= int64(n); i++ { // want `factorial of int64\(n\) in int64 wraps for int64\(n\) ≥ 21`
		r *= i
	}
	return r
}

// Matchings counts the pairings of 2m players, (2m)!/(m!·2^m).
// m = 12: exact 316234143225 (23!!); 24! wraps int64.
func Matchings(m int) int64 { // want Matchings:`wrong for some m \(Matchings, factorialratio/shift\.go:19\)`
	top := factI(2 * m)
	return top / (factI(m) << uint(m)) // want `ratio of factorials in int64: the numerator \(2 \* m\)! wraps for 2 \* m ≥ 21 before the division`
}
