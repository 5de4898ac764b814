package pascalrule

// Pascal's triangle built one row from the last in two tables. The
// first row whose central entry leaves each type is from math/big
// (thresholds.CentralBinomial; C(66, 33) ≈ 7.22e18 is the last central
// one in int64, C(34, 17) ≈ 2.33e9 the last in uint32, OEIS A000984).

// Layer returns layer n of a binary counting tree.
func Layer(n int) []int64 {
	prev := []int64{1}
	for level := 1; level <= n; level++ { // want `rows prev and cur are built by Pascal's rule \(cur\[k\] = prev\[k\] \+ prev\[k-1\]\) in int64: with ones on the edges row level holds C\(level, ·\), whose central entry wraps from row 67 \(C\(66, 33\) ≈ 7.22e18 is the largest central one that fits\), so once n reaches 67`
		cur := make([]int64, level+1)
		cur[0] = 1
		cur[level] = 1
		for k := 1; k <= level-1; k++ {
			cur[k] = prev[k] + prev[k-1]
		}
		prev = cur
	}
	return prev
}

// Layer32 stops below m rows, in uint32.
func Layer32(m int) []uint32 {
	prev := []uint32{1}
	for i := 1; i < m; i++ { // want `rows prev and next are built by Pascal's rule .* in uint32: .* whose central entry wraps from row 35 .*, so once m reaches 36`
		next := make([]uint32, i+1)
		next[0], next[i] = 1, 1
		for j := 1; j < i; j++ {
			next[j] = prev[j-1] + prev[j]
		}
		prev = next
	}
	return prev
}

// SmallLayer stops at row 40, where every entry fits int64: silent.
func SmallLayer() []int64 {
	prev := []int64{1}
	for i := 1; i <= 40; i++ {
		next := make([]int64, i+1)
		next[0], next[i] = 1, 1
		for j := 1; j < i; j++ {
			next[j] = prev[j-1] + prev[j]
		}
		prev = next
	}
	return prev
}

// LayerMod reduces every entry: silent.
func LayerMod(n int) []int64 {
	prev := []int64{1}
	for i := 1; i <= n; i++ {
		next := make([]int64, i+1)
		next[0], next[i] = 1, 1
		for j := 1; j < i; j++ {
			next[j] = (prev[j-1] + prev[j]) % 998244353
		}
		prev = next
	}
	return prev
}

// LayerFloat builds the rows in float64: silent.
func LayerFloat(n int) []float64 {
	prev := []float64{1}
	for i := 1; i <= n; i++ {
		next := make([]float64, i+1)
		next[0], next[i] = 1, 1
		for j := 1; j < i; j++ {
			next[j] = prev[j-1] + prev[j]
		}
		prev = next
	}
	return prev
}
