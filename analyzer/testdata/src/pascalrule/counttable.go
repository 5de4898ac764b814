package pascalrule

// Count tables filled by additions row by row in one dimension. The
// first rows that wrap are from thresholds.CountTable, checked against
// math/big binomials, a count over every subset and Euler's pentagonal
// recurrence for the partition numbers (OEIS A025591, A000041).

// Coefficients keeps one row of Pascal's triangle and adds into it in
// place, from the right.
func Coefficients(n int) []int64 {
	row := make([]int64, n+1)
	row[0] = 1
	for i := 1; i <= n; i++ { // want `table row is filled by additions row by row \(row\[j\] = row\[j\] \+ row\[j-1\], j falling\) in int64: after row i it holds that row of Pascal's triangle, row\[j\] = C\(i, j\); its largest entry wraps once n reaches 67 \(the largest a row before, ≈ 7.22e18, fits\)`
		for j := i; j > 0; j-- {
			row[j] = row[j] + row[j-1]
		}
	}
	return row
}

// Splits counts the ways to write m−1 as a sum of positive parts, the
// rows and the table both ending below m.
func Splits(m int) int64 { // want Splits:`wrong for m ≥ 407`
	ways := make([]int64, m)
	ways[0] = 1
	for k := 1; k < m; k++ { // want `table ways is filled by additions row by row \(ways\[s\] \+= ways\[s-k\], s rising\) in int64: each row adds one part that may repeat, and ways\[s\] counts the partitions of s into those parts; its largest entry wraps once m reaches 407`
		for s := k; s < m; s++ {
			ways[s] += ways[s-k]
		}
	}
	return ways[m-1]
}

// TeamSums counts the teams drawn from players rated 1…n by their total
// rating, in a table as long as the largest total.
func TeamSums(n int) []uint32 {
	total := n * (n + 1) / 2
	sums := make([]uint32, total+1)
	sums[0] = 1
	for r := 1; r <= n; r++ { // want `table sums is filled by additions row by row \(sums\[t\] \+= sums\[t-r\], t falling\) in uint32: each row adds one part, and sums\[t\] counts the sets of distinct parts with sum t; its largest entry wraps once n reaches 40`
		for t := total; t >= r; t-- {
			sums[t] += sums[t-r]
		}
	}
	return sums
}

// SmallCoefficients stops at row 30: silent.
func SmallCoefficients() []int64 {
	row := make([]int64, 31)
	row[0] = 1
	for i := 1; i <= 30; i++ {
		for j := i; j >= 1; j-- {
			row[j] += row[j-1]
		}
	}
	return row
}

// CoefficientsMod reduces every entry: silent.
func CoefficientsMod(n int) []int64 {
	row := make([]int64, n+1)
	row[0] = 1
	for i := 1; i <= n; i++ {
		for j := i; j >= 1; j-- {
			row[j] = (row[j] + row[j-1]) % 1_000_000_007
		}
	}
	return row
}

// LowSums keeps only the totals up to 40, which the distinct-part
// counts there never pass: silent.
func LowSums(n int) []int64 {
	var sums [41]int64
	sums[0] = 1
	for r := 1; r <= n; r++ {
		for t := 40; t >= r; t-- {
			sums[t] += sums[t-r]
		}
	}
	return sums[:]
}

// Capped checks every entry before it adds: silent.
func Capped(n int) []uint64 {
	total := n * (n + 1) / 2
	c := make([]uint64, total+1)
	c[0] = 1
	for r := 1; r <= n; r++ {
		for s := total; s >= r; s-- {
			if c[s] > 1<<62 {
				c[s] = 1 << 62
			}
			c[s] += c[s-r]
		}
	}
	return c
}

// FloatSums counts in float64, whose rounding is the answer past 2^53:
// silent.
func FloatSums(n int) []float64 {
	total := n * (n + 1) / 2
	c := make([]float64, total+1)
	c[0] = 1
	for r := 1; r <= n; r++ {
		for s := total; s >= r; s-- {
			c[s] += c[s-r]
		}
	}
	return c
}

// Unseeded never sets an entry: silent.
func Unseeded(n int) []int64 {
	c := make([]int64, n+1)
	for r := 1; r <= n; r++ {
		for s := n; s >= r; s-- {
			c[s] += c[s-r]
		}
	}
	return c
}

// Pick keeps Pascal's row only up to entry k: C(n, k) from one table
// of k+1 counts.
func Pick(n, k int) int64 { // want Pick:`wrong for some n or some k`
	c := make([]int64, k+1)
	c[0] = 1
	for i := 1; i <= n; i++ { // want `table c is filled by additions row by row \(c\[j\] \+= c\[j-1\], j falling\) in int64: after row i it holds that row of Pascal's triangle up to entry k, c\[j\] = C\(i, j\), which wraps where it leaves int64, from n = 67 at k = ⌊n/2⌋`
		for j := min(i, k); j > 0; j-- {
			c[j] += c[j-1]
		}
	}
	return c[k]
}

// PickBounded asks for at most 60 rows: silent.
func PickBounded(n, k int) int64 {
	if n > 60 {
		return -1
	}
	c := make([]int64, k+1)
	c[0] = 1
	for i := 1; i <= n; i++ {
		for j := min(i, k); j > 0; j-- {
			c[j] += c[j-1]
		}
	}
	return c[k]
}

// Triples keeps entries up to 3, C(n, 3), which wraps only past a
// million rows: silent (no first row computed for a fixed small k).
func Triples(n int) int64 {
	c := make([]int64, 4)
	c[0] = 1
	for i := 1; i <= n; i++ {
		for j := min(i, 3); j > 0; j-- {
			c[j] += c[j-1]
		}
	}
	return c[3]
}
