package wrongcallee

// A table of counts returned by one function and read entry by entry by
// another: the caller's value is built from the wrapped entries.

// rowOf returns row n of Pascal's triangle, added up in place.
func rowOf(n int) []int64 {
	row := make([]int64, n+1)
	row[0] = 1
	for i := 1; i <= n; i++ { // want `table row is filled by additions row by row .* its largest entry wraps once n reaches 67`
		for j := i; j >= 1; j-- {
			row[j] += row[j-1]
		}
	}
	return row
}

// TailShare is the share of the 2^n outcomes with at least k heads.
func TailShare(n, k int) float64 { // want TailShare:`wrong for n ≥ 67`
	row := rowOf(n) // want `TailShare builds its result from rowOf\(n\), which is wrong from n = 67`
	sum := 0.0
	for j := k; j <= n; j++ {
		sum += float64(row[j])
	}
	for i := 0; i < n; i++ {
		sum /= 2
	}
	return sum
}

// SmallTailShare asks only up to 40 tosses: silent.
func SmallTailShare(n, k int) float64 {
	if n > 40 {
		return 0
	}
	row := rowOf(n)
	sum := 0.0
	for j := k; j <= n; j++ {
		sum += float64(row[j])
	}
	return sum
}
