// Package probecomments holds rewritten code with comments inside it, for
// the fix builders: a seating planner whose author annotated every step.
package probecomments

func fact(n int) int {
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}

func factF(n int) float64 {
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

// Tables counts the ways to seat k guests of n at the top table.
func Tables(n, k int) int {
	// probe:binomial(n, k)
	return fact(n) /* every seating */ / (fact(k) * fact(n-k)) // want "probe binomial"
}

// Share is the same count as a float, split over lines by its author.
func Share(n, k int) float64 {
	// probe:binomial(n, k)
	return factF(n) / // want "probe binomial"
		// orderings within the table and outside it do not matter
		(factF(k) * factF(n-k))
}

// Rows counts row choices with a loop whose steps are explained.
func Rows(n, k int) int {
	b := 1
	// probe:binomialloop(b; n, k)
	for i := 1; i <= k; i++ { // want "probe binomialloop"
		// one more row joins: n-k+i ways over i orders
		b = b * (n - k + i) / i /* exact at every step */
	}
	return b
}
