package cardshuffle

// dealMemo keeps the deal counts already computed, by pack and hand.
var dealMemo = map[[2]int]int64{}

// Deals counts the hands of k cards dealt from a pack of n, by Pascal's
// rule over the last card (in the hand or not), remembering each count.
func Deals(n, k int) int64 { // want Deals:`wrong for some n or some k`
	if k < 0 || k > n {
		return 0
	}
	if k == 0 || k == n {
		return 1
	}
	key := [2]int{n, k}
	if v, ok := dealMemo[key]; ok {
		return v
	}
	v := Deals(n-1, k-1) + Deals(n-1, k) // want `recursion computes C\(n, k\) by Pascal's rule \(Deals\(n-1, k-1\) \+ Deals\(n-1, k\)\) in int64: the sum wraps where C\(n, k\) leaves int64, from n = 67`
	dealMemo[key] = v
	return v
}

// HandGrid lays out the deal counts of every hand from packs of up to
// n cards, row by row.
func HandGrid(n int) [][]int64 {
	rows := make([][]int64, n+1)
	for p := range rows {
		rows[p] = make([]int64, p+1)
		rows[p][0], rows[p][p] = 1, 1
		for h := 1; h < p; h++ {
			rows[p][h] = rows[p-1][h-1] + rows[p-1][h] // want `table rows is filled by Pascal's rule \(rows\[p\]\[h\] = rows\[p-1\]\[h-1\] \+ rows\[p-1\]\[h\]\) in int64`
		}
	}
	return rows
}
