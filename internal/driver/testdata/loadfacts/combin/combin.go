// Package combin counts the ways a warehouse can stack its pallets.
package combin

// Factorial is the number of orders of n pallets.
func Factorial(n int) int {
	f := 1
	for i := 2; i <= n; i++ {
		f *= i
	}
	return f
}

// Binomial is the number of ways to pick k of n pallets.
func Binomial(n, k int) int {
	return Factorial(n) / (Factorial(k) * Factorial(n-k))
}
