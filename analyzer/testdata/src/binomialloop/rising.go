package binomialloop

// Multisets counts the multisets of size q drawn from n kinds,
// C(n+q−1, q), by the rising form of the multiplicative formula: its
// n is a sum no operand of the loop holds, so the finding names the sum
// (the product on the last trip is q·C(n+q−1, q), math/big).
func Multisets(n, q int) uint64 { // want Multisets:`wrong for some n or some q`
	var w uint64 = 1
	for i := 1; i <= q; i++ { // want `multiplicative binomial loop in uint64: the product w \* \(uint64\(n - 1 \+ i\)\) wraps before the division for n \+ q - 1 ≥ 63 at k = \(n \+ q - 1\)/2, although C\(n \+ q - 1, \(n \+ q - 1\)/2\) itself fits up to n \+ q - 1 = 67; n \+ q - 1 is not bounded here`
		w = w * uint64(n-1+i) / uint64(i)
	}
	return w
}

// SmallMultisets keeps n, q ≤ 20, so n+q−1 ≤ 39, where every product
// fits uint64: silent.
func SmallMultisets(n, q int) uint64 {
	if n < 1 || n > 20 || q < 0 || q > 20 {
		return 0
	}
	var w uint64 = 1
	for i := 1; i <= q; i++ {
		w = w * uint64(n-1+i) / uint64(i)
	}
	return w
}

// BoundedMultisets keeps n, q ≤ 40: the sum n+q−1 reaches 79, past 63.
func BoundedMultisets(n, q int) int64 { // want BoundedMultisets:`wrong for some n or some q`
	if n < 1 || n > 40 || q < 0 || q > 40 {
		return 0
	}
	var w int64 = 1
	for i := 1; i <= q; i++ { // want `multiplicative binomial loop in int64: the product w \* \(int64\(n - 1 \+ i\)\) wraps before the division for n \+ q - 1 ≥ 62 at k = \(n \+ q - 1\)/2, although C\(n \+ q - 1, \(n \+ q - 1\)/2\) itself fits up to n \+ q - 1 = 66; n \+ q - 1 may reach 79 here`
		w = w * int64(n-1+i) / int64(i)
	}
	return w
}
