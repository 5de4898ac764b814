package wrongcallee

// Two-dimensional tables returned by one function and read by another
// entry by entry, row by row, or summed: the caller's value is built
// from the wrong entries. S(26, 9) is the first Stirling number of the
// second kind past MaxInt64, the largest of row 25 ≈ 1.20e18 (OEIS
// A008277, checked with Python's exact integers), so a caller bounded to
// 15 is right.

// stirling2Rows returns the Stirling numbers of the second kind S(m, j)
// for m, j ≤ n, by S(m, j) = j·S(m−1, j) + S(m−1, j−1).
func stirling2Rows(n int) [][]int64 {
	t := make([][]int64, n+1)
	for m := range t {
		t[m] = make([]int64, n+1)
	}
	t[0][0] = 1
	for m := 1; m <= n; m++ {
		for j := 1; j <= m; j++ {
			t[m][j] = int64(j)*t[m-1][j] + t[m-1][j-1] // want `table t is filled with the Stirling numbers of the second kind`
		}
	}
	return t
}

// BlockShare is the share of the set partitions of n crates into k
// non-empty stacks among all those into any number of stacks, S(n, k)/B(n).
func BlockShare(n, k int) float64 { // want BlockShare:`wrong for some n`
	t := stirling2Rows(n) // want `BlockShare builds its result from stirling2Rows\(n\), which is wrong for some values of n`
	total := 0.0
	for _, v := range t[n] {
		total += float64(v)
	}
	return float64(t[n][k]) / total
}

// PartitionCount sums every row's entries: the Bell numbers B(0) … B(n).
func PartitionCount(n int) int64 { // want PartitionCount:`wrong for some n`
	t := stirling2Rows(n) // want `PartitionCount builds its result from stirling2Rows\(n\), which is wrong for some values of n`
	var s int64
	for _, row := range t {
		for _, v := range row {
			s += v
		}
	}
	return s
}

// SmallBlockShare asks only up to 15 crates: silent.
func SmallBlockShare(n, k int) float64 {
	if n > 15 {
		return 0
	}
	t := stirling2Rows(n)
	total := 0.0
	for _, v := range t[n] {
		total += float64(v)
	}
	return float64(t[n][k]) / total
}

// StackRows reads only the table's shape: silent.
func StackRows(n int) int {
	t := stirling2Rows(n)
	return len(t) * len(t[n])
}

// occupancyGrid returns, for every i, j ≤ n, the chance that i of n
// seats are taken in the first row and j in the second, each row's n
// seats taken with probability 1/2: a product of two distributions whose
// factorials are +Inf from n = 171.
func occupancyGrid(n int) [][]float64 {
	p, _ := Occupancy(n) // want `occupancyGrid builds its result from Occupancy\(n\), which is wrong from n = 171`
	g := make([][]float64, n+1)
	for i := range g {
		g[i] = make([]float64, n+1)
		for j := range g[i] {
			g[i][j] = p[i] * p[j]
		}
	}
	return g
}

// TiedRows sums the diagonal of the grid, the chance that both rows hold
// as many taken seats.
func TiedRows(n int) (tied, ahead, behind float64) {
	g := occupancyGrid(n) // want `TiedRows builds its result from occupancyGrid\(n\), which is wrong from n = 171`
	for i, row := range g {
		for j, v := range row {
			switch {
			case i == j:
				tied += v
			case i > j:
				ahead += v
			default:
				behind += v
			}
		}
	}
	return tied, ahead, behind
}

// GridSide reads only the grid's side: silent.
func GridSide(n int) int {
	g := occupancyGrid(n)
	return len(g)
}
