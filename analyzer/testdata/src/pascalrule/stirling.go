package pascalrule

// Stirling numbers by their triangle rules (DLMF 26.8.18, 26.8.22). The
// rows in the messages are checked against closed forms with math/big
// by TestTriangleLimit (analyzer/thresholds) and against a triangle
// filled in the machine type by TestTriangleThresholds.

// Partitions is S(n, k), the ways to split n items into k blocks.
func Partitions(n, k int) int64 { // want Partitions:`wrong for some n or some k`
	if n == k {
		return 1
	}
	if k == 0 || k > n {
		return 0
	}
	return int64(k)*Partitions(n-1, k) + Partitions(n-1, k-1) // want `recursion computes the Stirling numbers of the second kind, S\(n, k\), by the rule .* in int64: the sum wraps where the entry leaves int64, from n = 26 at k = 9 \(the largest entry of row 25, ≈ 1\.20e18, fits\)`
}

// splitter keeps the values already computed, keyed by (n, k).
type splitter struct {
	memo map[[2]int]int32
}

// Blocks is the memoised method, the plain term first.
func (s *splitter) Blocks(n, k int) int32 { // want Blocks:`wrong for some s or some n or some k`
	if k == 0 || k > n {
		return 0
	}
	if k == 1 || k == n {
		return 1
	}
	if v, ok := s.memo[[2]int{n, k}]; ok {
		return v
	}
	v := s.Blocks(n-1, k-1) + int32(k)*s.Blocks(n-1, k) // want `recursion computes the Stirling numbers of the second kind, S\(n, k\), .* in int32: the sum wraps where the entry leaves int32, from n = 16 at k = 6`
	s.memo[[2]int{n, k}] = v
	return v
}

// Cycles counts permutations of n items with k cycles.
func Cycles(n, k uint64) uint64 { // want Cycles:`wrong for some n or some k`
	if n == 0 && k == 0 {
		return 1
	}
	if n == 0 || k == 0 {
		return 0
	}
	return (n-1)*Cycles(n-1, k) + Cycles(n-1, k-1) // want `recursion computes the unsigned Stirling numbers of the first kind, c\(n, k\), .* in uint64: the sum wraps where the entry leaves uint64, from n = 22 at k = 1`
}

// SignedTable fills the signed Stirling numbers of the first kind.
func SignedTable(n int) [][]int64 {
	s := make([][]int64, n+1)
	for i := range s {
		s[i] = make([]int64, n+1)
	}
	s[0][0] = 1
	for i := 1; i <= n; i++ {
		for j := 1; j <= i; j++ {
			s[i][j] = s[i-1][j-1] - int64(i-1)*s[i-1][j] // want `table s is filled with the signed Stirling numbers of the first kind, s\(i, j\), .* in int64: .* from row i = 21 at j = 3`
		}
	}
	return s
}

// PartitionTable fills S(i, j) row by row up to n.
func PartitionTable(n int) [][]uint64 {
	t := make([][]uint64, n+1)
	for i := range t {
		t[i] = make([]uint64, n+1)
	}
	t[0][0] = 1
	for i := 1; i <= n; i++ {
		for j := 1; j <= i; j++ {
			t[i][j] = uint64(j)*t[i-1][j] + t[i-1][j-1] // want `table t is filled with the Stirling numbers of the second kind, S\(i, j\), .* in uint64: .* from row i = 27 at j = 8`
		}
	}
	return t
}

// ModPartitions reduces every entry: silent.
func ModPartitions(n, k int) int64 {
	if n == k {
		return 1
	}
	if k == 0 || k > n {
		return 0
	}
	return (int64(k)*ModPartitions(n-1, k) + ModPartitions(n-1, k-1)) % modulus
}

// SmallPartitions stops at row 25, whose entries all fit int64: silent.
func SmallPartitions(n, k int) int64 {
	if n > 25 || k < 0 || k > n {
		return 0
	}
	if n == k {
		return 1
	}
	if k == 0 {
		return 0
	}
	return int64(k)*SmallPartitions(n-1, k) + SmallPartitions(n-1, k-1)
}

// FloatPartitions keeps the table in float64, whose +Inf past the type
// is IEEE's answer: silent.
func FloatPartitions(n int) [][]float64 {
	t := make([][]float64, n+1)
	for i := range t {
		t[i] = make([]float64, n+1)
	}
	t[0][0] = 1
	for i := 1; i <= n; i++ {
		for j := 1; j <= i; j++ {
			t[i][j] = float64(j)*t[i-1][j] + t[i-1][j-1]
		}
	}
	return t
}

// Doubled weighs by a constant, no Stirling rule: silent.
func Doubled(n, k int) int64 {
	if k == 0 || k > n {
		return 0
	}
	if n == k {
		return 1
	}
	return 2*Doubled(n-1, k) + Doubled(n-1, k-1)
}

// FewCycles builds rows 0 … 12 only: silent.
func FewCycles() [13][13]int64 {
	var c [13][13]int64
	c[0][0] = 1
	for i := 1; i < 13; i++ {
		for j := 1; j <= i; j++ {
			c[i][j] = int64(i-1)*c[i-1][j] + c[i-1][j-1]
		}
	}
	return c
}

// BellRows fills the Bell triangle, each row started by the end of the
// one before: row i runs from B(i) to B(i+1).
func BellRows(n int) [][]int64 {
	a := make([][]int64, n+1)
	a[0] = []int64{1}
	for i := 1; i <= n; i++ {
		a[i] = make([]int64, i+1)
		a[i][0] = a[i-1][i-1]
		for j := 1; j <= i; j++ {
			a[i][j] = a[i][j-1] + a[i-1][j-1] // want `table a is filled as the Bell triangle \(a\[i\]\[j\] = a\[i\]\[j-1\] \+ a\[i-1\]\[j-1\]\) in int64: .* from row i = 25 at j = \d+ \(the largest entry of row 24, B\(25\) ≈ 4\.64e18, fits\)`
		}
	}
	return a
}

// OnesRows starts every row with 1: another triangle, silent.
func OnesRows(n int) [][]int64 {
	a := make([][]int64, n+1)
	a[0] = []int64{1}
	for i := 1; i <= n; i++ {
		a[i] = make([]int64, i+1)
		a[i][0] = 1
		for j := 1; j <= i; j++ {
			a[i][j] = a[i][j-1] + a[i-1][j-1]
		}
	}
	return a
}

// FewBellRows stops at row 20: silent.
func FewBellRows() [21][21]int64 {
	var a [21][21]int64
	a[0][0] = 1
	for i := 1; i <= 20; i++ {
		a[i][0] = a[i-1][i-1]
		for j := 1; j <= i; j++ {
			a[i][j] = a[i][j-1] + a[i-1][j-1]
		}
	}
	return a
}
