package gameodds

// partitionMemo caches Stirling numbers of the second kind.
type partitionMemo struct {
	memo map[[2]int]int64
}

// Stirling2 counts the ways to split n distinct tokens into k non-empty groups.
func (m *partitionMemo) Stirling2(n, k int) int64 { // want Stirling2:`wrong for some m or some n or some k`
	if n == k {
		return 1
	}
	if k == 0 || k > n {
		return 0
	}
	key := [2]int{n, k}
	if v, ok := m.memo[key]; ok {
		return v
	}
	v := int64(k)*m.Stirling2(n-1, k) + m.Stirling2(n-1, k-1) // want `recursion computes the Stirling numbers of the second kind, S\(n, k\), .* in int64: the sum wraps where the entry leaves int64, from n = 26 at k = 9`
	if m.memo == nil {
		m.memo = map[[2]int]int64{}
	}
	m.memo[key] = v
	return v
}
