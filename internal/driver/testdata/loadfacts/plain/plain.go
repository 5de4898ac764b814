// Package plain has loops, products and recursion, none of them a
// product formed in a loop nor a recursion by a product: it carries no
// fact and comes from export data.
package plain

// Hash is a shift-and-xor string hash.
func Hash(s string) uint64 {
	h := uint64(5381)
	for i := 0; i < len(s); i++ {
		h = h<<5 ^ h ^ uint64(s[i])
	}
	return h * 33
}

// Search finds x in a sorted slice.
func Search(xs []int, x int) int {
	lo, hi := 0, len(xs)
	for lo < hi {
		mid := (lo + hi) / 2
		if xs[mid] < x {
			lo = mid + 1
		} else {
			hi = mid
		}
	}
	return lo
}

// Depth is the depth of a nested list, by recursion without a product.
func Depth(n []any) int {
	d := 0
	for _, x := range n {
		if l, ok := x.([]any); ok {
			d = max(d, Depth(l)+1)
		}
	}
	return d
}
