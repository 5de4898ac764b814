// Package pascalrule holds the pascal-rule category's cases: binomial
// coefficients built by Pascal's rule, C(n, k) = C(n−1, k−1) + C(n−1, k)
// (DLMF 26.3.5), in integer types. The thresholds in the messages are
// checked against math/big by TestPascalRuleThresholds.
package pascalrule

// Ways is the plain recursion over int64.
func Ways(n, k int) int64 { // want Ways:`wrong for some n or some k`
	if k == 0 || k == n {
		return 1
	}
	return Ways(n-1, k-1) + Ways(n-1, k) // want `recursion computes C\(n, k\) by Pascal's rule \(Ways\(n-1, k-1\) \+ Ways\(n-1, k\)\) in int64: the sum wraps where C\(n, k\) leaves int64, from n = 67 at k = ⌊n/2⌋ \(C\(66, 33\) ≈ 7\.22e18 is the largest central one that fits\)`
}

var seen = map[[2]int]int32{}

// Memo caches the recursion's values, the k argument first.
func Memo(k, n int) int32 { // want Memo:`wrong for some k or some n`
	if k == 0 || k == n {
		return 1
	}
	if v, ok := seen[[2]int{n, k}]; ok {
		return v
	}
	v := Memo(k, n-1) + Memo(k-1, n-1) // want `recursion computes C\(n, k\) by Pascal's rule .* in int32: the sum wraps where C\(n, k\) leaves int32, from n = 34 at k`
	seen[[2]int{n, k}] = v
	return v
}

const modulus = 1_000_000_007

// Mod reduces every sum modulo a prime: silent.
func Mod(n, k int) int64 {
	if k == 0 || k == n {
		return 1
	}
	return (Mod(n-1, k-1) + Mod(n-1, k)) % modulus
}

// Small refuses rows past 60: silent.
func Small(n, k int) int64 {
	if n > 60 || k < 0 || k > n {
		return 0
	}
	if k == 0 || k == n {
		return 1
	}
	return Small(n-1, k-1) + Small(n-1, k)
}

// Fib is no binomial: one parameter, two shifts. Silent.
func Fib(n int) uint64 {
	if n < 2 {
		return uint64(n)
	}
	return Fib(n-1) + Fib(n-2)
}

// Paths counts lattice paths through a grid of r by c blocks, C(r+c, r),
// a sum over two different parameters.
func Paths(r, c int) int64 { // want Paths:`wrong for some r or some c`
	if r == 0 || c == 0 {
		return 1
	}
	return Paths(r-1, c) + Paths(r, c-1) // want `recursion counts lattice paths, C\(r \+ c, r\), by the rule Paths\(r-1, c\) \+ Paths\(r, c-1\) in int64: the sum wraps where C\(r \+ c, r\) leaves int64, from r \+ c = 67 at r = c`
}

// SmallPaths stops at a 16-by-16 grid: silent.
func SmallPaths(r, c int) int64 {
	if r < 0 || c < 0 || r > 16 || c > 16 {
		return 0
	}
	if r == 0 || c == 0 {
		return 1
	}
	return SmallPaths(r-1, c) + SmallPaths(r, c-1)
}

// Triangle fills rows 0 … n.
func Triangle(n int) [][]int64 {
	c := make([][]int64, n+1)
	for i := 0; i <= n; i++ {
		c[i] = make([]int64, i+1)
		c[i][0], c[i][i] = 1, 1
		for j := 1; j < i; j++ {
			c[i][j] = c[i-1][j] + c[i-1][j-1] // want `table c is filled by Pascal's rule \(c\[i\]\[j\] = c\[i-1\]\[j\] \+ c\[i-1\]\[j-1\]\) in int64: with ones on its edges the entry c\[i\]\[j\] is C\(i, j\), which wraps where it leaves int64, from row i = 67`
		}
	}
	return c
}

// Shifted keeps its rows one ahead of the index.
func Shifted(rows int) [][]uint64 {
	t := make([][]uint64, rows+1)
	t[0] = []uint64{1}
	for i := 0; i < rows; i++ {
		t[i+1] = make([]uint64, i+2)
		t[i+1][0], t[i+1][i+1] = 1, 1
		for j := 0; j < i; j++ {
			t[i+1][j+1] = t[i][j] + t[i][j+1] // want `table t is filled by Pascal's rule .* in uint64: .* from row i \+ 1 = 68`
		}
	}
	return t
}

// Thirty fills a fixed table of 30 rows: silent.
func Thirty() [30][30]int64 {
	var c [30][30]int64
	for i := 0; i < 30; i++ {
		c[i][0] = 1
		for j := 1; j <= i; j++ {
			c[i][j] = c[i-1][j-1] + c[i-1][j]
		}
	}
	return c
}

// Reduced reduces each entry after the sum: silent.
func Reduced(n int) [][]int64 {
	c := make([][]int64, n+1)
	for i := range c {
		c[i] = make([]int64, i+1)
		c[i][0], c[i][i] = 1, 1
		for j := 1; j < i; j++ {
			c[i][j] = c[i-1][j-1] + c[i-1][j]
			c[i][j] %= modulus
		}
	}
	return c
}

// Floats reaches +Inf only past float64, IEEE's answer: silent.
func Floats(n int) [][]float64 {
	c := make([][]float64, n+1)
	for i := range c {
		c[i] = make([]float64, i+1)
		c[i][0], c[i][i] = 1, 1
		for j := 1; j < i; j++ {
			c[i][j] = c[i-1][j-1] + c[i-1][j]
		}
	}
	return c
}
