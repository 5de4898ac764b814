package coalesce

// stirlingTable returns the unsigned Stirling numbers of the first kind
// |s(m, k)| for m, k ≤ n.
func stirlingTable(n int) [][]int64 {
	t := make([][]int64, n+1)
	for m := range t {
		t[m] = make([]int64, n+1)
	}
	t[0][0] = 1
	for m := 1; m <= n; m++ {
		for k := 1; k <= m; k++ {
			t[m][k] = t[m-1][k-1] + int64(m-1)*t[m-1][k] // want `table t is filled with the unsigned Stirling numbers of the first kind, c\(m, k\), by the`
		}
	}
	return t
}

// AlleleCountProb returns the probability that a sample of n genes
// carries exactly k distinct alleles: |s(n, k)| θ^k / θ(θ+1)…(θ+n−1).
func AlleleCountProb(n, k int, theta float64) float64 { // want AlleleCountProb:`wrong for some n`
	s := stirlingTable(n) // want `AlleleCountProb builds its result from stirlingTable\(n\), which is wrong for some values of n`
	p := float64(s[n][k])
	for i := 0; i < k; i++ {
		p *= theta
	}
	for i := 0; i < n; i++ {
		p /= theta + float64(i)
	}
	return p
}

// AlleleCountDist returns the whole distribution of the number of
// alleles in a sample of n genes, built gene by gene: the m-th gene is a
// new allele with probability θ/(θ+m−1).
func AlleleCountDist(n int, theta float64) []float64 {
	p := []float64{1}
	for m := 1; m <= n; m++ {
		next := make([]float64, m+1)
		newp := theta / (theta + float64(m-1))
		for k, v := range p {
			next[k] += v * (1 - newp)
			next[k+1] += v * newp
		}
		p = next
	}
	return p
}
