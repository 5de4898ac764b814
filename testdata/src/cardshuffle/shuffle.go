// Package cardshuffle counts deals and orderings of a card deck.
package cardshuffle

// Orderings returns the number of ways to order n cards.
func Orderings(n int64) int64 {
	f := int64(1)
	for i := int64(2); i <= n; i++ {
		f *= i
	}
	return f
}

// orderingsRec is the recursive form of Orderings.
func orderingsRec(n int) int {
	if n <= 1 {
		return 1
	}
	return n * orderingsRec(n-1)
}

// Hands returns C(n, k), the number of k-card hands from n cards.
func Hands(n, k int64) int64 {
	return Orderings(n) / (Orderings(k) * Orderings(n-k))
}

func use() int { return orderingsRec(7) }
